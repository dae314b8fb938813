// The load-list reader: accepted rows with their defaults, and every refused row located.
#include "io/load_list.h"
#include "model/ratings.h"

#include <fstream>
#include <gtest/gtest.h>
#include <sstream>

using namespace lineward;

TEST(LoadList, ReadsRowsWithStatedDefaults) {
    const auto l = readLoadList("Tag,HP,Volts\n"
                                "P-201,25,460\n");
    ASSERT_TRUE(l.ok()) << l.refused.front().reason;
    ASSERT_EQ(l.rows.size(), 1u);
    const auto& r = l.rows[0];
    const auto m = MotorRatings::of(r.motor);
    EXPECT_EQ(r.motor.tag, "P-201");
    EXPECT_EQ(r.line, 2);
    EXPECT_EQ(m.hp, 25.0);
    EXPECT_EQ(m.volts, 460.0);
    EXPECT_EQ(m.phases, kLoadListDefaultPhases);
    EXPECT_FALSE(m.fla.has_value());
    EXPECT_EQ(r.protection, LoadProtection::Breaker);
    EXPECT_EQ(r.starter, LoadStarter::Fvnr);
    EXPECT_EQ(r.lengthFt, kLoadListDefaultLengthFt);
}

TEST(LoadList, ReadsEveryColumnInAnyOrderAndCase) {
    const auto l =
        readLoadList("# Kestrel Mill pellet line\n"
                     "LENGTH_FT, starter ,Protection,fla,phases,volts,kw,description,tag\n"
                     "\n"
                     "80,fvr,INST_BREAKER,14.2,3,460,7.5,\"Mixer, north \"\"A\"\"\",MX-301\r\n"
                     "120,vfd,fuse,,3,460,15,,F-302\n");
    ASSERT_TRUE(l.ok()) << l.refused.front().reason;
    ASSERT_EQ(l.rows.size(), 2u);
    const auto& a = l.rows[0];
    EXPECT_EQ(a.line, 4);
    EXPECT_EQ(a.description, "Mixer, north \"A\"");
    EXPECT_EQ(MotorRatings::of(a.motor).kw, 7.5);
    EXPECT_FALSE(MotorRatings::of(a.motor).hp.has_value());
    EXPECT_EQ(MotorRatings::of(a.motor).fla, 14.2);
    EXPECT_EQ(a.protection, LoadProtection::InstBreaker);
    EXPECT_EQ(a.starter, LoadStarter::Fvr);
    EXPECT_EQ(a.lengthFt, 80.0);
    EXPECT_EQ(l.rows[1].protection, LoadProtection::Fuse);
    EXPECT_EQ(l.rows[1].starter, LoadStarter::Vfd);
}

TEST(LoadList, ExtraColumnsAreIgnoredWithANote) {
    const auto l = readLoadList("tag,hp,volts,area\nP-1,10,460,north\n");
    ASSERT_TRUE(l.ok());
    ASSERT_EQ(l.notes.size(), 1u);
    EXPECT_NE(l.notes[0].find("'area'"), std::string::npos) << l.notes[0];
    EXPECT_NE(l.notes[0].find("column 14"), std::string::npos) << l.notes[0];
}

struct BadRow {
    const char* row;
    int column;
    const char* reasonPart;
};

class LoadListBadRow : public ::testing::TestWithParam<BadRow> {};

TEST_P(LoadListBadRow, IsRefusedWithLineColumnAndReason) {
    const auto& p = GetParam();
    const std::string text = std::string("tag,hp,kw,volts,protection,starter,length_ft\n"
                                         "P-1,10,,460,breaker,fvnr,50\n") +
                             p.row + "\nP-3,5,,460,,,\n";
    const auto l = readLoadList(text);
    EXPECT_EQ(l.rows.size(), 2u) << "the good rows around the bad one are still read";
    ASSERT_EQ(l.refused.size(), 1u);
    const auto& i = l.refused[0];
    EXPECT_EQ(i.line, 3);
    EXPECT_EQ(i.column, p.column) << i.reason;
    EXPECT_NE(i.reason.find(p.reasonPart), std::string::npos) << i.reason;
    EXPECT_FALSE(l.ok());
}

INSTANTIATE_TEST_SUITE_P(
    Rows, LoadListBadRow,
    ::testing::Values(BadRow{"P-2,-10,,460,breaker,fvnr,50", 5, "hp"},
                      BadRow{"P-2,,,460,breaker,fvnr,50", 5, "missing"},
                      BadRow{"P-2,10,7.5,460,breaker,fvnr,50", 8, "not both"},
                      BadRow{"P-2,ten,,460,breaker,fvnr,50", 5, "'ten' is not a number"},
                      BadRow{"P-2,10,,460 V,breaker,fvnr,50", 9, "not a number"},
                      BadRow{"P-2,10,,,breaker,fvnr,50", 9, "volts"},
                      BadRow{"P-2,10,,460,mccb,fvnr,50", 13, "'mccb' is not one of"},
                      BadRow{"P-2,10,,460,breaker,dol,50", 21, "'dol' is not one of"},
                      BadRow{"P-2,10,,460,breaker,fvnr,-3", 26, "length_ft"},
                      BadRow{",10,,460,breaker,fvnr,50", 1, "tag"},
                      BadRow{"P-1,10,,460,breaker,fvnr,50", 1, "already used on line 2"},
                      BadRow{"P-2,10,,460,\"breaker,fvnr,50", 13, "closing quote"},
                      BadRow{"P-2,10,,nan,breaker,fvnr,50", 9, "not a number"}));

TEST(LoadList, MissingRequiredColumnRefusesTheHeader) {
    auto l = readLoadList("tag,hp\nP-1,10\n");
    ASSERT_EQ(l.refused.size(), 1u);
    EXPECT_EQ(l.refused[0].line, 1);
    EXPECT_NE(l.refused[0].reason.find("volts"), std::string::npos);
    EXPECT_TRUE(l.rows.empty());
    l = readLoadList("tag,volts,Volts,hp\n");
    ASSERT_EQ(l.refused.size(), 1u);
    EXPECT_EQ(l.refused[0].column, 11);
    EXPECT_TRUE(readLoadList("").refused.size() == 1u);
    EXPECT_FALSE(readLoadList("tag,hp,volts\n").ok());
}

TEST(LoadList, LocatedIssueNamesFileLineAndColumn) {
    EXPECT_EQ(locatedIssue("loads.csv", {7, 12, "hp: bad"}), "loads.csv:7:12: hp: bad");
}

TEST(LoadList, SampleListIsReadWithoutRefusals) {
    std::ifstream in(std::string(LINEWARD_SOURCE_DIR) + "/samples/kestrel-mill-pellet-loads.csv");
    ASSERT_TRUE(in) << "samples/kestrel-mill-pellet-loads.csv";
    std::stringstream ss;
    ss << in.rdbuf();
    const auto l = readLoadList(ss.str());
    EXPECT_TRUE(l.refused.empty()) << locatedIssue("sample", l.refused.front());
    EXPECT_EQ(l.rows.size(), 16u);
    EXPECT_TRUE(l.notes.empty());
}

TEST(LoadList, ARowTypedIntoAFormHasTheFileRowsChecksAndDefaults) {
    LoadListIssue bad;
    auto row = loadRowFrom({{"tag", "P-9"}, {"hp", "15"}, {"volts", "460"}, {"fla", ""}}, bad);
    ASSERT_TRUE(row) << bad.reason;
    EXPECT_EQ(MotorRatings::of(row->motor).hp, 15.0);
    EXPECT_EQ(row->lengthFt, kLoadListDefaultLengthFt);
    EXPECT_EQ(row->protection, LoadProtection::Breaker);
    EXPECT_FALSE(loadRowFrom({{"tag", "P-9"}, {"hp", "15"}, {"volts", "460 V"}}, bad));
    EXPECT_NE(bad.reason.find("'460 V' is not a number"), std::string::npos) << bad.reason;
    EXPECT_FALSE(loadRowFrom({{"tag", "P-9"}, {"hp", ""}, {"kw", ""}, {"volts", "460"}}, bad));
    EXPECT_NE(bad.reason.find("missing"), std::string::npos) << bad.reason;
}
