// The IEEE Std 1584-2018 arc-flash model against the standard's worked examples (Annex D.1,
// medium voltage; Annex D.2, low voltage), its interpolation edges, the enclosure size factor,
// a monotonic property and the model's stated range.
//
// About the reference values: the text of Annex D was not among the stored published material
// searched for this work (searched again on 2026-12-03: what reproduced the annex was the test
// code of an arc-flash calculation program, which we do not read). The inputs and the published
// intermediate values below are as recalled from the annex ("from memory"); every one of them
// was re-derived by hand from the equations (the arithmetic is shown beside each) and the two
// agree to the published precision. The coefficients they use are pinned below: Table 1
// (VCB, VCBB, HCB, VOA) and Table 2 rows were checked against a reference page reproducing
// the standard's tables; the others are from memory. Verify against the printed standard
// before relying on them.
#include "studies/arc_flash.h"
#include "test_support.h"

#include <cmath>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::arcflash;
using lineward::test::testTables;

namespace {

const ArcFlashTables& af() {
    return testTables().arcFlash;
}

// IEEE 1584-2018 Annex D.1 (from memory): 4.16 kV, VCB, Ibf 15 kA, gap 104 mm, working
// distance 914.4 mm, enclosure 1143 mm high x 762 mm wide x 762 mm deep, arcing time 197 ms at
// the full arcing current and 223 ms at the reduced one.
Input annexD1() {
    return {4.16, 15, 104, 914.4, ElectrodeConfig::VCB, {1143, 762, 762}};
}

// IEEE 1584-2018 Annex D.2 (from memory): 0.48 kV, VCB, Ibf 45 kA, gap 32 mm, working
// distance 609.6 mm, enclosure 610 x 610 x 254 mm, arcing time 61.3 ms at the full arcing
// current and 319 ms at the reduced one.
Input annexD2() {
    return {0.48, 45, 32, 609.6, ElectrodeConfig::VCB, {610, 610, 254}};
}

} // namespace

TEST(ArcFlash, AnnexD1MediumVoltageEveryStep) {
    const Input in = annexD1();
    const Result r = evaluate(af(), in, 197, 223);
    ASSERT_TRUE(r.range.ok());

    // Equation (1), Table 1 VCB rows, lg 15 = 1.176091, lg 104 = 2.017033:
    // 600 V: 10^(-0.04287 + 1.035*1.176091 - 0.083*2.017033) = 10^1.007... = 10.175...;
    //   x (-4.783e-9*15^4 + 1.962e-6*15^3 - 0.000229*15^2 + 0.003141*15 + 1.092) = x 1.09254...
    EXPECT_NEAR(r.currents.iarc600, 11.117, 0.0005);   // IEEE 1584-2018 Annex D.1
    EXPECT_NEAR(r.currents.iarc2700, 12.816, 0.0005);  // IEEE 1584-2018 Annex D.1
    EXPECT_NEAR(r.currents.iarc14300, 14.116, 0.0005); // IEEE 1584-2018 Annex D.1
    // Equation (17), Voc > 2.7 kV: Iarc = (14.116 - 12.816)/11.6 x (4.16 - 14.3) + 14.116
    EXPECT_NEAR(r.currents.iarc, 12.979, 0.0005); // IEEE 1584-2018 Annex D.1
    // Equation (2), Table 2 VCB at 4.16 kV: VarCf = 0.0469; (1 - 0.5 VarCf) = 0.97656
    EXPECT_NEAR(r.currents.varCf, 0.0469, 0.00005);
    EXPECT_NEAR(r.currents.iarcMin, 12.675, 0.0005); // IEEE 1584-2018 Annex D.1
    // Above 600 V the factor reduces the three intermediate currents (4.6), by hand:
    // 11.1167 x 0.976564 = 10.856; 12.8158 x 0.976564 = 12.515; 14.1165 x 0.976564 = 13.786
    EXPECT_NEAR(r.currents.iarcMin600, 10.856, 0.0005);   // IEEE 1584-2018 Annex D.1
    EXPECT_NEAR(r.currents.iarcMin2700, 12.515, 0.0005);  // IEEE 1584-2018 Annex D.1
    EXPECT_NEAR(r.currents.iarcMin14300, 13.786, 0.0005); // IEEE 1584-2018 Annex D.1

    // Table 6, VCB typical: Width1 = (660.4 + (762 - 660.4) x (4.16 + 4)/20)/25.4 = 27.632;
    // Height1 = 0.03937 x 1143 = 45.000; EES = 36.316;
    // Equation (14): CF = -0.000302 x 36.316² + 0.03441 x 36.316 + 0.4325 = 1.284
    EXPECT_FALSE(r.enclosure.shallow);
    EXPECT_NEAR(r.enclosure.width1, 27.632, 0.0005);
    EXPECT_NEAR(r.enclosure.height1, 45.000, 0.0005);
    EXPECT_NEAR(r.enclosure.ees, 36.316, 0.0005);
    EXPECT_NEAR(r.enclosure.cf, 1.284, 0.0005); // IEEE 1584-2018 Annex D.1

    // Equations (3) to (5) at T = 197 ms, then Equation (20): E = 12.152 J/cm² (2.904 cal/cm²)
    EXPECT_NEAR(r.full.e600, 8.652, 0.0005);
    EXPECT_NEAR(r.full.e2700, 11.977, 0.0005);
    EXPECT_NEAR(r.full.e14300, 13.367, 0.0005);
    EXPECT_NEAR(r.full.eJcm2, 12.152, 0.0005); // IEEE 1584-2018 Annex D.1
    EXPECT_NEAR(r.full.eCalCm2(), 2.904, 0.0005);
    // Equations (7) to (9), then (23): AFB = 1606 mm
    EXPECT_NEAR(r.full.afb600, 1285.4, 0.05);
    EXPECT_NEAR(r.full.afb2700, 1591.4, 0.05);
    EXPECT_NEAR(r.full.afb14300, 1707.4, 0.05);
    EXPECT_NEAR(r.full.afbMm, 1606, 0.5); // IEEE 1584-2018 Annex D.1

    // The reduced case at T = 223 ms, Equations (3) to (5) and (7) to (9) with the reduced
    // intermediate currents (re-derived by hand from Tables 3 to 5, which are from memory):
    EXPECT_NEAR(r.reduced.e600, 8.980, 0.0005);
    EXPECT_NEAR(r.reduced.e2700, 13.018, 0.0005);
    EXPECT_NEAR(r.reduced.e14300, 15.602, 0.0005);
    EXPECT_NEAR(r.reduced.afb600, 1315.7, 0.05);
    EXPECT_NEAR(r.reduced.afb2700, 1678.2, 0.05);
    EXPECT_NEAR(r.reduced.afb14300, 1884.4, 0.05);
    // then Equations (20) and (23): E = 13.343 J/cm² (3.189 cal/cm²), AFB = 1704 mm
    EXPECT_NEAR(r.reduced.eJcm2, 13.343, 0.0005); // IEEE 1584-2018 Annex D.1
    EXPECT_NEAR(r.reduced.afbMm, 1704, 0.5);      // IEEE 1584-2018 Annex D.1
    EXPECT_TRUE(r.reducedGoverns);
    EXPECT_DOUBLE_EQ(r.governing().eJcm2, r.reduced.eJcm2);
}

TEST(ArcFlash, AnnexD2LowVoltageEveryStep) {
    const Input in = annexD2();
    const Result r = evaluate(af(), in, 61.3, 319);
    ASSERT_TRUE(r.range.ok());

    // Equation (1), Table 1 VCB 600 V row: lg 45 = 1.653213, lg 32 = 1.505150:
    // 10^(-0.04287 + 1.035 x 1.653213 - 0.083 x 1.505150) = 10^1.5432 = 34.92;
    // x (-4.783e-9 x 45^4 + 1.962e-6 x 45^3 - 0.000229 x 45² + 0.003141 x 45 + 1.092) = x 0.9292
    EXPECT_NEAR(r.currents.iarc600, 32.449, 0.0005); // IEEE 1584-2018 Annex D.2
    // Equation (25): Iarc = 1/sqrt((0.6/0.48)² x (1/32.449² - (0.36 - 0.2304)/(0.36 x 45²)))
    EXPECT_NEAR(r.currents.iarc, 28.793, 0.0005); // IEEE 1584-2018 Annex D.2
    // Equation (2), Table 2 VCB at 0.48 kV: VarCf = 0.2465, applied to the final current only
    EXPECT_NEAR(r.currents.varCf, 0.2465, 0.00005);
    EXPECT_NEAR(r.currents.iarcMin, 25.244, 0.0005); // IEEE 1584-2018 Annex D.2
    EXPECT_DOUBLE_EQ(r.currents.iarcMin600, 0.0);    // not used below 600 V

    // Table 6, VCB typical (depth 254 mm > 203.2 mm): Width1 = Height1 = 0.03937 x 610 = 24.016
    // EES = 24.016; Equation (14): CF = -0.000302 x 24.016² + 0.03441 x 24.016 + 0.4325 = 1.085
    EXPECT_FALSE(r.enclosure.shallow);
    EXPECT_NEAR(r.enclosure.ees, 24.016, 0.0005);
    EXPECT_NEAR(r.enclosure.cf, 1.085, 0.0005); // IEEE 1584-2018 Annex D.2

    // Equation (6) at T = 61.3 ms: E = 11.585 J/cm² (2.769 cal/cm²); Equation (10): 1029 mm
    EXPECT_NEAR(r.full.eJcm2, 11.585, 0.0005); // IEEE 1584-2018 Annex D.2
    EXPECT_NEAR(r.full.eCalCm2(), 2.769, 0.0005);
    EXPECT_NEAR(r.full.afbMm, 1029, 0.5); // IEEE 1584-2018 Annex D.2
    // The reduced current at T = 319 ms: E = 53.156 J/cm² (12.705 cal/cm²), AFB = 2669 mm
    EXPECT_NEAR(r.reduced.eJcm2, 53.156, 0.0005); // IEEE 1584-2018 Annex D.2
    EXPECT_NEAR(r.reduced.eCalCm2(), 12.705, 0.0005);
    EXPECT_NEAR(r.reduced.afbMm, 2669, 0.5); // IEEE 1584-2018 Annex D.2
    EXPECT_TRUE(r.reducedGoverns);
}

// At 600 V the low-voltage path (Equation (25)) and the interpolation (Equation (18)) both
// give Iarc_600; at 2.7 kV Equation (18)'s two terms meet Equation (17). Approaching either
// edge from both sides, the current, energy and boundary must not jump.
TEST(ArcFlash, InterpolationIsContinuousAt600VAnd2700V) {
    for (ElectrodeConfig c : {ElectrodeConfig::VCB, ElectrodeConfig::VCBB, ElectrodeConfig::HCB,
                              ElectrodeConfig::VOA, ElectrodeConfig::HOA}) {
        for (double edge : {0.6, 2.7}) {
            // The gap must be valid on both sides of 600 V (19.05 to 76.2 mm).
            Input below{edge - 1e-7, 20, 25.4, 610, c, {660.4, 660.4, 660.4}};
            Input above = below;
            above.vocKv = edge + 1e-7;
            const Result a = evaluate(af(), below, 100, 100);
            const Result b = evaluate(af(), above, 100, 100);
            ASSERT_TRUE(a.range.ok() && b.range.ok());
            SCOPED_TRACE(std::string(electrodeConfigKey(c)) + " at " + std::to_string(edge));
            EXPECT_NEAR(a.currents.iarc / b.currents.iarc, 1.0, 1e-5);
            EXPECT_NEAR(a.full.eJcm2 / b.full.eJcm2, 1.0, 1e-5);
            EXPECT_NEAR(a.full.afbMm / b.full.afbMm, 1.0, 1e-5);
        }
    }
    // At exactly 600 V, Equation (25) reduces to Iarc = Iarc_600.
    const Result at600 =
        evaluate(af(), {0.6, 20, 25.4, 610, ElectrodeConfig::VCB, {508, 508, 508}}, 100, 100);
    EXPECT_NEAR(at600.currents.iarc, at600.currents.iarc600, 1e-12);
}

TEST(ArcFlash, EnclosureSizeFactor) {
    // A 508 mm cube is the standard's reference box: Width1 = Height1 = 0.03937 x 508 = 20.0,
    // EES = 20.0, CF = -0.000302 x 400 + 0.03441 x 20 + 0.4325 = 0.9999 for VCB (Table 7).
    Input in{0.48, 20, 25, 457.2, ElectrodeConfig::VCB, {508, 508, 508}};
    EnclosureFactor f = enclosureFactor(af(), in);
    EXPECT_NEAR(f.ees, 20.0, 0.001);
    EXPECT_NEAR(f.cf, -0.000302 * 400 + 0.03441 * 20 + 0.4325, 1e-9);
    EXPECT_NEAR(f.cf, 1.0, 0.001);

    // Shallow (under 600 V, both sides under 508 mm, depth <= 203.2 mm): Table 6 takes the
    // actual sizes, 0.03937 x 355.6 = 14.0 and 0.03937 x 304.8 = 12.0, EES = 13.0;
    // Equation (15): CF = 1/(0.002222 x 169 - 0.02556 x 13 + 0.6222) = 1/0.66544 = 1.5028
    in.enclosure = {355.6, 304.8, 203.2};
    f = enclosureFactor(af(), in);
    EXPECT_TRUE(f.shallow);
    EXPECT_NEAR(f.ees, 13.0, 0.001);
    EXPECT_NEAR(f.cf, 1.0 / (0.002222 * f.ees * f.ees - 0.02556 * f.ees + 0.6222), 1e-9);
    EXPECT_NEAR(f.cf, 1.5028, 0.0001);

    // The same box 254 mm deep is typical: sides under 508 mm count as 20 in, EES = 20.
    in.enclosure.depthMm = 254;
    f = enclosureFactor(af(), in);
    EXPECT_FALSE(f.shallow);
    EXPECT_NEAR(f.ees, 20.0, 1e-9);

    // VCBB stretches the height too (Equation (12)): 1000 mm at 4.16 kV,
    // (660.4 + 339.6 x 14.16/24)/25.4 = 33.888 in.
    in = {4.16, 20, 104, 914.4, ElectrodeConfig::VCBB, {1000, 1000, 1000}};
    f = enclosureFactor(af(), in);
    EXPECT_NEAR(f.height1, (660.4 + 339.6 * 14.16 / 24) / 25.4, 1e-9);
    EXPECT_NEAR(f.width1, f.height1, 1e-12);

    // A smaller enclosure focuses the arc: less room, more energy at the same distance.
    Input small{0.48, 30, 25, 457.2, ElectrodeConfig::VCB, {508, 508, 508}};
    Input large = small;
    large.enclosure = {1200, 1200, 1200};
    EXPECT_GT(evaluate(af(), small, 100, 100).full.eJcm2,
              evaluate(af(), large, 100, 100).full.eJcm2);

    // Open air has no enclosure: CF = 1.
    in.config = ElectrodeConfig::VOA;
    f = enclosureFactor(af(), in);
    EXPECT_FALSE(f.applies);
    EXPECT_DOUBLE_EQ(f.cf, 1.0);
}

// Incident energy is proportional to arcing time in Equations (3) to (6): it must never fall
// as the clearing time rises, at any voltage, current or configuration in range.
TEST(ArcFlash, EnergyNeverFallsAsClearingTimeRises) {
    for (ElectrodeConfig c : {ElectrodeConfig::VCB, ElectrodeConfig::VCBB, ElectrodeConfig::HCB,
                              ElectrodeConfig::VOA, ElectrodeConfig::HOA})
        for (double v : {0.208, 0.48, 0.6, 1.0, 4.16, 13.8})
            for (double ibf : {1.0, 10.0, 40.0}) {
                const double gap = v <= 0.6 ? 25 : 104;
                Input in{v, ibf, gap, 914.4, c, {914.4, 914.4, 914.4}};
                double lastE = 0, lastAfb = 0;
                for (double t = 5; t <= 5000; t *= 1.5) {
                    const Result r = evaluate(af(), in, t, t);
                    ASSERT_TRUE(r.range.ok());
                    EXPECT_GT(r.full.eJcm2, lastE);
                    EXPECT_GT(r.full.afbMm, lastAfb);
                    EXPECT_GE(r.reduced.eJcm2, 0.0);
                    lastE = r.full.eJcm2;
                    lastAfb = r.full.afbMm;
                }
            }
}

TEST(ArcFlash, OutsideTheModelIsRefusedWithAReason) {
    auto refused = [](Input in, const char* why) {
        const Result r = evaluate(af(), in, 100, 100);
        ASSERT_FALSE(r.range.ok()) << why;
        bool found = false;
        for (const auto& o : r.range.outside)
            found = found || o.find(why) != std::string::npos;
        EXPECT_TRUE(found) << "expected '" << why << "' in " << r.range.outside.front();
        EXPECT_DOUBLE_EQ(r.full.eJcm2, 0.0); // no silent number
    };
    const Input ok = annexD2();
    Input in = ok;
    in.vocKv = 0.12;
    refused(in, "outside 208 V to 15 kV");
    in = ok;
    in.vocKv = 34.5;
    refused(in, "outside 208 V to 15 kV");
    in = ok;
    in.ibfKa = 120;
    refused(in, "0.5 to 106 kA");
    in = annexD1();
    in.ibfKa = 70;
    refused(in, "0.2 to 65 kA");
    in = ok;
    in.gapMm = 100;
    refused(in, "6.35 to 76.2 mm");
    in = annexD1();
    in.gapMm = 10;
    refused(in, "19.05 to 254 mm");
    in = ok;
    in.workingDistanceMm = 300;
    refused(in, "under the model's 305 mm");
    in = ok;
    in.enclosure.widthMm = 100; // 4 x 32 mm = 128 mm
    refused(in, "four times the gap");
    in = ok;
    in.enclosure.depthMm = 0;
    refused(in, "must all be positive");
    in = ok;
    in.ibfKa = std::nan("");
    refused(in, "bolted fault current");
    EXPECT_FALSE(evaluate(af(), ok, 0, 100).range.ok());

    // Stated cautions that do not stop the calculation.
    in = {0.208, 1.5, 25, 457.2, ElectrodeConfig::VCB, {355.6, 304.8, 203.2}};
    Result r = evaluate(af(), in, 100, 100);
    ASSERT_TRUE(r.range.ok());
    ASSERT_EQ(r.range.notes.size(), 1u);
    EXPECT_NE(r.range.notes[0].find("240 V"), std::string::npos);
    in = annexD1();
    in.enclosure.heightMm = 1500;
    r = evaluate(af(), in, 100, 100);
    ASSERT_TRUE(r.range.ok());
    ASSERT_EQ(r.range.notes.size(), 1u);
    EXPECT_NE(r.range.notes[0].find("1244.6"), std::string::npos);
    EXPECT_DOUBLE_EQ(r.enclosure.height1, 49.0); // VCB above 1244.6 mm: 49 in (Table 6)
}

TEST(ArcFlash, TypicalEquipmentValuesFromTables8And10) {
    const auto* mcc = af().typicalFor("mcc", 480);
    ASSERT_NE(mcc, nullptr);
    EXPECT_DOUBLE_EQ(mcc->gapMm, 25);                // IEEE 1584-2018 Table 8, LV MCC
    EXPECT_DOUBLE_EQ(mcc->workingDistanceMm, 457.2); // IEEE 1584-2018 Table 10, 18 in
    const auto* swbd = af().typicalFor("switchboard", 480);
    ASSERT_NE(swbd, nullptr);
    EXPECT_DOUBLE_EQ(swbd->gapMm, 32);                // Table 8, LV switchgear
    EXPECT_DOUBLE_EQ(swbd->workingDistanceMm, 609.6); // Table 10, 24 in
    const auto* mv = af().typicalFor("switchboard", 4160);
    ASSERT_NE(mv, nullptr);
    EXPECT_DOUBLE_EQ(mv->gapMm, 104);               // Table 8, 5 kV switchgear
    EXPECT_DOUBLE_EQ(mv->workingDistanceMm, 914.4); // Table 10, 36 in
    EXPECT_NE(af().typicalFor("panelboard", 208), nullptr);
    EXPECT_NE(af().typicalFor("cable_junction", 600), nullptr);
    EXPECT_EQ(af().typicalFor("mcc", 13800)->gapMm, 152);
    EXPECT_EQ(af().typicalFor("nonsense", 480), nullptr);
}

// The coefficient files against the published tables, a few values of each row family pinned
// so a typo cannot creep in; each row names its table and whether it was checked.
struct Coefficient {
    const char* table; // "t1" (k1..k10), "t2" (k1..k7), "t3-5" (k1..k13), "t7" (b1..b3, a, b)
    ElectrodeConfig config;
    int column; // t1, t3-5: 0 = 600 V, 1 = 2700 V, 2 = 14 300 V; t7: 0 typical, 1 shallow
    int k;      // 1-based coefficient number (t7: 1..3 = b1..b3, 4 = A, 5 = B)
    double value;
    const char* source;
};
class ArcFlashCoefficients : public ::testing::TestWithParam<Coefficient> {};
TEST_P(ArcFlashCoefficients, MatchThePublishedTable) {
    const auto& c = GetParam();
    const auto& t = af();
    double got = 0;
    const std::string table = c.table;
    if (table == "t1")
        got = t.arcingCurrent.at(c.config)[c.column][c.k - 1];
    else if (table == "t2")
        got = t.varCf.at(c.config)[c.k - 1];
    else if (table == "t3-5")
        got = t.energy.at(c.config)[c.column][c.k - 1];
    else {
        const auto& r = t.enclosure.at(c.config)[c.column];
        const double v[] = {r.b1, r.b2, r.b3, r.a, r.b};
        got = v[c.k - 1];
    }
    EXPECT_DOUBLE_EQ(got, c.value) << c.source;
}
INSTANTIATE_TEST_SUITE_P(
    Ieee1584_2018, ArcFlashCoefficients,
    ::testing::Values(
        Coefficient{"t1", ElectrodeConfig::VCB, 0, 1, -0.04287,
                    "IEEE 1584-2018 Table 1, VCB 600 V k1 (checked against a reproduction)"},
        Coefficient{"t1", ElectrodeConfig::VCB, 0, 10, 1.092,
                    "IEEE 1584-2018 Table 1, VCB 600 V k10 (checked against a reproduction)"},
        Coefficient{"t1", ElectrodeConfig::VCB, 2, 1, 0.005795,
                    "IEEE 1584-2018 Table 1, VCB 14 300 V k1 (checked against a reproduction)"},
        Coefficient{"t1", ElectrodeConfig::VCBB, 1, 6, 2.901e-08,
                    "IEEE 1584-2018 Table 1, VCBB 2700 V k6 (checked against a reproduction)"},
        Coefficient{"t1", ElectrodeConfig::HCB, 2, 5, -5.043e-11,
                    "IEEE 1584-2018 Table 1, HCB 14 300 V k5 (checked against a reproduction)"},
        Coefficient{"t1", ElectrodeConfig::VOA, 0, 3, -0.18,
                    "IEEE 1584-2018 Table 1, VOA 600 V k3 (checked against a reproduction)"},
        Coefficient{"t1", ElectrodeConfig::VOA, 2, 2, 1.0102,
                    "IEEE 1584-2018 Table 1, VOA 14 300 V k2 (checked against a reproduction)"},
        Coefficient{"t1", ElectrodeConfig::HOA, 0, 1, 0.111147,
                    "IEEE 1584-2018 Table 1, HOA 600 V k1 (from memory)"},
        Coefficient{"t2", ElectrodeConfig::VCB, 0, 7, 0.30226,
                    "IEEE 1584-2018 Table 2, VCB k7 (checked against a reproduction)"},
        Coefficient{"t2", ElectrodeConfig::VCBB, 0, 1, 1.138e-06,
                    "IEEE 1584-2018 Table 2, VCBB k1 (checked against a reproduction)"},
        Coefficient{"t2", ElectrodeConfig::HOA, 0, 6, -0.1599,
                    "IEEE 1584-2018 Table 2, HOA k6 (checked against a reproduction)"},
        Coefficient{"t3-5", ElectrodeConfig::VCB, 0, 1, 0.753364,
                    "IEEE 1584-2018 Table 3, VCB k1 (from memory)"},
        Coefficient{"t3-5", ElectrodeConfig::VCB, 0, 12, -1.598,
                    "IEEE 1584-2018 Table 3, VCB k12 (from memory)"},
        Coefficient{"t3-5", ElectrodeConfig::VCB, 1, 13, 0.9778,
                    "IEEE 1584-2018 Table 4, VCB k13 (from memory)"},
        Coefficient{"t3-5", ElectrodeConfig::HOA, 2, 11, -0.05,
                    "IEEE 1584-2018 Table 5, HOA k11 (from memory)"},
        Coefficient{"t7", ElectrodeConfig::VCB, 0, 1, -0.000302,
                    "IEEE 1584-2018 Table 7, typical VCB b1 (from memory)"},
        Coefficient{"t7", ElectrodeConfig::HCB, 1, 3, 0.4778,
                    "IEEE 1584-2018 Table 7, shallow HCB b3 (from memory)"},
        Coefficient{"t7", ElectrodeConfig::VCB, 0, 4, 4,
                    "IEEE 1584-2018 Table 6, A = 4 for VCB (checked against a reproduction)"},
        Coefficient{"t7", ElectrodeConfig::VCBB, 0, 5, 24,
                    "IEEE 1584-2018 Table 6, B = 24 for VCBB (checked against a reproduction)"},
        Coefficient{"t7", ElectrodeConfig::HCB, 0, 5, 22,
                    "IEEE 1584-2018 Table 6, B = 22 for HCB (checked against a reproduction)"}));
