// Reference tables against their published values: spot rows at both ends and the middle of
// each table, the source named beside each row. Values were transcribed from memory of the
// published tables (see each CSV's source line); these rows pin them so a typo cannot creep in.
#include "tables/tables.h"
#include "test_support.h"

#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::test;

struct FlcRow {
    double hp, volts;
    int phases;
    double amps;
    const char* source;
};
class FlcTableTest : public ::testing::TestWithParam<FlcRow> {};
TEST_P(FlcTableTest, MatchesPublishedValue) {
    const auto& r = GetParam();
    auto a = testTables().flc(r.hp, r.volts, r.phases);
    ASSERT_TRUE(a.has_value()) << r.source;
    EXPECT_DOUBLE_EQ(*a, r.amps) << r.source;
}
INSTANTIATE_TEST_SUITE_P(
    Nec2023, FlcTableTest,
    ::testing::Values(FlcRow{0.5, 115, 3, 4.4, "NEC 2023 Table 430.250, 1/2 hp 115 V"},
                      FlcRow{25, 460, 3, 34, "NEC 2023 Table 430.250, 25 hp 460 V"},
                      FlcRow{25, 480, 3, 34, "NEC 2023 Table 430.250 heading: 440-480 V use 460 V"},
                      FlcRow{10, 208, 3, 30.8, "NEC 2023 Table 430.250, 10 hp 208 V"},
                      FlcRow{10, 200, 3, 32.2, "NEC 2023 Table 430.250, 10 hp 200 V"},
                      FlcRow{100, 460, 3, 124, "NEC 2023 Table 430.250, 100 hp 460 V"},
                      FlcRow{200, 230, 3, 480, "NEC 2023 Table 430.250, 200 hp 230 V"},
                      FlcRow{500, 575, 3, 472, "NEC 2023 Table 430.250, 500 hp 575 V"},
                      FlcRow{60, 2300, 3, 16, "NEC 2023 Table 430.250, 60 hp 2300 V"},
                      FlcRow{0.1667, 115, 1, 4.4, "NEC 2023 Table 430.248, 1/6 hp 115 V"},
                      FlcRow{2, 230, 1, 12, "NEC 2023 Table 430.248, 2 hp 230 V"},
                      FlcRow{10, 230, 1, 50, "NEC 2023 Table 430.248, 10 hp 230 V"}));

TEST(FlcTable, NoRowMeansNoValue) {
    EXPECT_FALSE(
        testTables().flc(3, 115, 3)); // NEC 2023 Table 430.250 has no 115 V value above 2 hp
    EXPECT_FALSE(testTables().flc(250, 230, 3));
    EXPECT_FALSE(testTables().flc(12, 460, 3)); // no 12 hp row
    EXPECT_FALSE(testTables().flc(25, 400, 3)); // 400 V is no column and in no range
}

struct AmpRow {
    const char* size;
    Material m;
    int column;
    double amps;
};
class AmpacityTable : public ::testing::TestWithParam<AmpRow> {};
TEST_P(AmpacityTable, MatchesNec2023Table310_16) {
    const auto& r = GetParam();
    EXPECT_EQ(testTables().ampacityAt(r.size, r.m, r.column), r.amps) << r.size;
}
INSTANTIATE_TEST_SUITE_P(Nec2023Table310_16, AmpacityTable,
                         ::testing::Values(AmpRow{"14 AWG", Material::Cu, 60, 15},
                                           AmpRow{"14 AWG", Material::Cu, 90, 25},
                                           AmpRow{"8 AWG", Material::Cu, 75, 50},
                                           AmpRow{"10 AWG", Material::Cu, 75, 35},
                                           AmpRow{"2/0 AWG", Material::Cu, 75, 175},
                                           AmpRow{"250 kcmil", Material::Cu, 75, 255},
                                           AmpRow{"500 kcmil", Material::Cu, 90, 430},
                                           AmpRow{"2000 kcmil", Material::Cu, 90, 750},
                                           AmpRow{"12 AWG", Material::Al, 75, 20},
                                           AmpRow{"4/0 AWG", Material::Al, 75, 180},
                                           AmpRow{"2000 kcmil", Material::Al, 60, 470}));

TEST(Tables, AmbientAndAdjustmentFactors) {
    const auto& t = testTables();
    // NEC 2023 Table 310.15(B)(1)(1)
    EXPECT_DOUBLE_EQ(*t.ambientFactor(30, 90), 1.00);
    EXPECT_DOUBLE_EQ(*t.ambientFactor(40, 90), 0.91);
    EXPECT_DOUBLE_EQ(*t.ambientFactor(40, 75), 0.88);
    EXPECT_DOUBLE_EQ(*t.ambientFactor(10, 60), 1.29);
    EXPECT_DOUBLE_EQ(*t.ambientFactor(85, 90), 0.29);
    EXPECT_FALSE(t.ambientFactor(60, 60).has_value()); // 60 °C conductor not usable at 56-60 °C
    // NEC 2023 Table 310.15(C)(1)
    EXPECT_DOUBLE_EQ(t.adjustmentFactor(3), 1.0);
    EXPECT_DOUBLE_EQ(t.adjustmentFactor(6), 0.8);
    EXPECT_DOUBLE_EQ(t.adjustmentFactor(9), 0.7);
    EXPECT_DOUBLE_EQ(t.adjustmentFactor(20), 0.5);
    EXPECT_DOUBLE_EQ(t.adjustmentFactor(41), 0.35);
}

TEST(Tables, StandardRatingsSmallConductorsAndEgc) {
    const auto& t = testTables();
    // NEC 2023 240.6(A)
    EXPECT_EQ(t.nextStandardAtOrAbove(85), 90);
    EXPECT_EQ(t.nextStandardAtOrAbove(15), 15);
    EXPECT_EQ(t.nextStandardAtOrAbove(601), 700);
    EXPECT_EQ(t.standardAtOrBelow(190), 175);
    EXPECT_EQ(t.nextStandardAtOrAbove(6000), 6000);
    EXPECT_FALSE(t.nextStandardAtOrAbove(6001));
    // NEC 2023 240.4(D)
    EXPECT_EQ(t.smallConductorLimit("14 AWG", Material::Cu), 15);
    EXPECT_EQ(t.smallConductorLimit("10 AWG", Material::Cu), 30);
    EXPECT_EQ(t.smallConductorLimit("10 AWG", Material::Al), 25);
    EXPECT_FALSE(t.smallConductorLimit("8 AWG", Material::Cu));
    // NEC 2023 Table 250.122
    EXPECT_EQ(t.egcFor(15, Material::Cu), "14 AWG");
    EXPECT_EQ(t.egcFor(60, Material::Cu), "10 AWG");
    EXPECT_EQ(t.egcFor(70, Material::Cu), "8 AWG");
    EXPECT_EQ(t.egcFor(400, Material::Cu), "3 AWG");
    EXPECT_EQ(t.egcFor(400, Material::Al), "1 AWG");
    EXPECT_EQ(t.egcFor(4000, Material::Cu), "500 kcmil");
}

TEST(Tables, Table430_52AndCodeLetters) {
    const auto& t = testTables();
    // NEC 2023 Table 430.52(C)(1)
    const auto& cage = t.scpdRow(MotorType::SquirrelCage);
    EXPECT_EQ(cage.pct[static_cast<int>(ScpdType::NonTimeDelayFuse)], 300);
    EXPECT_EQ(cage.pct[static_cast<int>(ScpdType::TimeDelayFuse)], 175);
    EXPECT_EQ(cage.pct[static_cast<int>(ScpdType::InstantaneousBreaker)], 800);
    EXPECT_EQ(cage.pct[static_cast<int>(ScpdType::InverseTimeBreaker)], 250);
    EXPECT_EQ(
        t.scpdRow(MotorType::DesignBPremium).pct[static_cast<int>(ScpdType::InstantaneousBreaker)],
        1100);
    EXPECT_EQ(t.scpdRow(MotorType::WoundRotor).pct[static_cast<int>(ScpdType::InverseTimeBreaker)],
              150);
    // 430.52(C)(1) Exception No. 2 and 430.52(C)(3)
    EXPECT_EQ(cage.excPct[static_cast<int>(ScpdType::TimeDelayFuse)], 225);
    EXPECT_EQ(cage.excPct[static_cast<int>(ScpdType::InstantaneousBreaker)], 1300);
    EXPECT_EQ(t.scpdRow(MotorType::DesignBPremium)
                  .excPct[static_cast<int>(ScpdType::InstantaneousBreaker)],
              1700);
    // NEC 2023 Table 430.7(B)
    EXPECT_DOUBLE_EQ(*t.codeLetterKvaPerHp('A'), 3.14);
    EXPECT_DOUBLE_EQ(*t.codeLetterKvaPerHp('G'), 6.29);
    EXPECT_DOUBLE_EQ(*t.codeLetterKvaPerHp('U'), 22.39);
    EXPECT_FALSE(t.codeLetterKvaPerHp('I'));
}

TEST(Tables, ConductorPropertiesImpedanceTransformerNemaTripClasses) {
    const auto& t = testTables();
    // NEC 2023 Chapter 9 Table 8
    EXPECT_EQ(t.areaCmil("14 AWG"), 4110);
    EXPECT_EQ(t.areaCmil("4/0 AWG"), 211600);
    EXPECT_EQ(t.areaCmil("2000 kcmil"), 2000000);
    // NEC 2023 Chapter 9 Table 9
    const auto* r = t.impedanceRow("12 AWG");
    ASSERT_NE(r, nullptr);
    EXPECT_DOUBLE_EQ(r->xlSteel, 0.068);
    EXPECT_DOUBLE_EQ(*r->cuR[2], 2.0);
    r = t.impedanceRow("500 kcmil");
    ASSERT_NE(r, nullptr);
    EXPECT_DOUBLE_EQ(r->xlPvcAl, 0.039);
    EXPECT_DOUBLE_EQ(*r->cuR[0], 0.027);
    EXPECT_EQ(t.impedanceRow("700 kcmil"), nullptr);
    // NEC 2023 Table 450.3(B)
    ASSERT_EQ(t.transformerProtection.size(), 6u);
    EXPECT_DOUBLE_EQ(t.transformerProtection[0].pct, 125);
    EXPECT_DOUBLE_EQ(t.transformerProtection[3].pct, 250);
    // NEMA ICS 2 Table 2-4-1 (from memory)
    const auto* s2 = t.nemaRow("2");
    ASSERT_NE(s2, nullptr);
    EXPECT_EQ(s2->continuousA, 45);
    EXPECT_EQ(t.nemaHp(*s2, 460, 3), 25);
    EXPECT_EQ(t.nemaHp(*s2, 208, 3), 10);
    EXPECT_EQ(t.nemaHp(*t.nemaRow("9"), 575, 3), 1600);
    EXPECT_EQ(t.nemaHp(*t.nemaRow("00"), 230, 1), 1);
    // IEC 60947-4-1 Table 3 (from memory)
    EXPECT_EQ(t.tripClass("10A")->tpMinS, 2);
    EXPECT_EQ(t.tripClass("30")->tpMaxS, 30);
}

TEST(Tables, EveryTableNamesItsSource) {
    for (const auto& [name, source] : testTables().sources)
        EXPECT_FALSE(source.empty()) << name;
    // The 22 NEC, NEMA, IEC and IEEE tables, and NFPA 70E Table 130.4(E)(a).
    EXPECT_EQ(testTables().sources.size(), 23u);
}

TEST(Tables, MalformedTablesStopWithFileAndLine) {
    using tables::EmbeddedFile;
    auto fails = [](std::string_view text, const char* expect) {
        std::vector<EmbeddedFile> files{{"bad.csv", text}};
        try {
            loadTables(files);
            ADD_FAILURE() << "accepted: " << text;
        } catch (const tables::TableError& e) {
            EXPECT_NE(std::string(e.what()).find(expect), std::string::npos) << e.what();
        }
    };
    fails("# table: standard_ratings\namps\n15\n", "no '# source:'");
    fails("# table: standard_ratings\n# source: x\namps,devices\n15,all\nabc,all\n",
          "bad.csv:5: column 'amps': 'abc' is not a number");
    fails("# table: standard_ratings\n# source: x\namps,devices\n20,all\n15,all\n",
          "must increase");
    fails("# table: standard_ratings\n# source: x\namps,devices\n15,breaker\n",
          "devices must be 'all' or 'fuse'");
    fails("# table: standard_ratings\n# source: x\namps\n15\n", "devices");
    fails("# table: ampacity\n# source: x\nsize,cu_60\n14 AWG,15,20\n",
          "bad.csv:4: row has 3 cells");
    fails("# table: standard_ratings\n# source: x\namps,devices\n15,all\n",
          "table 'flc_3ph' is missing");
    fails("# table: nonsense\n# source: x\na\n1\n", "unknown table 'nonsense'");
}
