// The reviewer's records in the drawing: review comments through the file (round trip, old
// files without them, every bad entry located), stale acceptances, and a deleted part taking its
// comments and its place in acceptances with it.
#include "check/check.h"
#include "io/drawing_file.h"
#include "report/curve_sheets.h"
#include "report/report_format.h"
#include "report/schedules.h"
#include "test_support.h"

#include <algorithm>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::test;

namespace {

const char* kHeader = "{\n  \"format\": \"lineward\",\n  \"version\": 1,\n";
const std::string kMotor =
    R"(    {"id":1,"kind":"motor","tag":"M-1","x":0,"y":0,"rot":0,"hp":10,"volts":460})";

std::string withComments(const std::string& comments) {
    return std::string(kHeader) + "  \"parts\": [\n" + kMotor + "\n  ],\n  \"comments\": [\n" +
           comments + "\n  ]\n}\n";
}

Drawing mismatchedMotor() {
    Drawing d = smallLineup();
    EXPECT_FALSE(d.part(PartId(9))->set("volts", 400.0)); // 13 % off a 460 V bus
    return d;
}

} // namespace

TEST(ReviewComments, SurviveSaveAndLoadByteForByte) {
    Drawing d = smallLineup();
    d.comments().push_back({1, PartId(9), "R. Quill", "2026-12-02",
                            "Is the 25 hp rating the "
                            "nameplate or the load?",
                            false});
    d.comments().push_back({4, PartId(8), "T. Okafor", "2026-12-03",
                            "Length from the tray plan: \"100 ft\" <check>", true});
    const std::string text = io::serializeDrawing(d);
    EXPECT_NE(text.find("\"comments\": [\n    {\"id\":1,\"part\":9,"), std::string::npos) << text;
    auto r = io::parseDrawing(text);
    ASSERT_TRUE(r) << r.error->text();
    EXPECT_EQ(r.drawing->comments(), d.comments());
    EXPECT_EQ(io::serializeDrawing(*r.drawing), text);
    EXPECT_EQ(r.drawing->nextCommentId(), 5u);
}

TEST(ReviewComments, ADrawingWithoutCommentsKeepsItsBytes) {
    // Files written before comments existed have no "comments" key, and a drawing without
    // comments is written without one: the samples round trip unchanged (FileFormat test), and
    // an old file reads with no comments.
    const Drawing d = smallLineup();
    const std::string text = io::serializeDrawing(d);
    EXPECT_EQ(text.find("comments"), std::string::npos);
    auto r = io::parseDrawing(text);
    ASSERT_TRUE(r) << r.error->text();
    EXPECT_TRUE(r.drawing->comments().empty());
}

struct BadComment {
    const char* name;
    std::string entry;
    const char* message;
};

class BadCommentEntry : public ::testing::TestWithParam<BadComment> {};

TEST_P(BadCommentEntry, IsRefusedWithWhereAndWhy) {
    const auto& c = GetParam();
    auto r = io::parseDrawing(withComments("    " + c.entry), "t.lineward");
    ASSERT_FALSE(r) << c.name << " was accepted";
    EXPECT_NE(r.error->message.find(c.message), std::string::npos) << r.error->text();
    EXPECT_EQ(r.error->line, 8) << r.error->text(); // the comment's own line
    EXPECT_GT(r.error->column, 0);
}

INSTANTIATE_TEST_SUITE_P(
    AllClasses, BadCommentEntry,
    ::testing::Values(
        BadComment{"missing_part", R"({"id":1,"part":7,"text":"x"})",
                   "pinned to part 7, which does not exist"},
        BadComment{"no_part", R"({"id":1,"text":"x"})", "has no \"part\""},
        BadComment{"no_id", R"({"part":1,"text":"x"})", "has no \"id\""},
        BadComment{"empty_text", R"({"id":1,"part":1,"text":""})", "has no \"text\""},
        BadComment{"resolved_not_bool", R"({"id":1,"part":1,"text":"x","resolved":"yes"})",
                   "resolved must be true or false"},
        BadComment{"unknown_key", R"({"id":1,"part":1,"text":"x","colour":"red"})", "colour"},
        BadComment{"not_an_object", R"("a comment")", "expected"}),
    [](const auto& info) { return std::string(info.param.name); });

TEST(ReviewComments, ARepeatedIdIsRefused) {
    auto r = io::parseDrawing(withComments(R"(    {"id":2,"part":1,"text":"a"},)"
                                           "\n"
                                           R"(    {"id":2,"part":1,"text":"b"})"),
                              "t.lineward");
    ASSERT_FALSE(r);
    EXPECT_NE(r.error->message.find("duplicate comment id 2"), std::string::npos)
        << r.error->text();
    EXPECT_EQ(r.error->line, 9);
}

TEST(StaleAcceptance, AnAcceptanceThatMatchesNoFindingIsListed) {
    Drawing d = mismatchedMotor();
    d.accepted().push_back({"topology.voltage.mismatch",
                            {PartId(9)},
                            "R. Quill",
                            "2026-12-01",
                            "motor rewound for 480 V"});
    auto r = checkDrawing(d, testTables());
    EXPECT_EQ(r.acceptedCount, 1);
    EXPECT_TRUE(r.staleAccepted.empty());
    // The motor is set right: the acceptance covers nothing now, and the check says so.
    ASSERT_FALSE(d.part(PartId(9))->set("volts", 460.0));
    r = checkDrawing(d, testTables());
    EXPECT_EQ(r.acceptedCount, 0);
    ASSERT_EQ(r.staleAccepted, std::vector<std::size_t>{0});
    const std::string text = reportText(d, r, "t.lineward");
    EXPECT_NE(text.find("1 stale acceptance(s)"), std::string::npos) << text;
    EXPECT_NE(text.find("topology.voltage.mismatch on M-1 — accepted by R. Quill, 2026-12-01: "
                        "\"motor rewound for 480 V\""),
              std::string::npos)
        << text;
    const auto json = reportJson(d, r, "t.lineward");
    ASSERT_EQ(json["stale_accepted"].size(), 1u);
    EXPECT_EQ(json["stale_accepted"][0]["rule"], "topology.voltage.mismatch");
    EXPECT_EQ(json["stale_accepted"][0]["parts"][0], "M-1");
}

TEST(StaleAcceptance, AnAcceptanceOfAnotherPartOrRuleIsStale) {
    Drawing d = mismatchedMotor();
    d.accepted().push_back({"topology.voltage.mismatch", {PartId(8)}, "A", "d", "wrong part"});
    d.accepted().push_back({"branch.no.such.rule", {PartId(9)}, "A", "d", "wrong rule"});
    d.accepted().push_back({"topology.voltage.mismatch", {PartId(9)}, "A", "d", "right"});
    const auto r = checkDrawing(d, testTables());
    EXPECT_EQ(r.staleAccepted, (std::vector<std::size_t>{0, 1}));
    EXPECT_EQ(r.acceptedCount, 1);
}

TEST(ReviewRecords, ADeletedPartTakesItsCommentsAndLeavesAcceptances) {
    Drawing d = mismatchedMotor();
    d.accepted().push_back({"topology.voltage.mismatch", {PartId(9), PartId(8)}, "A", "d", "n"});
    d.comments().push_back({1, PartId(9), "A", "d", "on the motor", false});
    d.comments().push_back({2, PartId(5), "A", "d", "on the breaker", false});
    d.removeParts({PartId(9)});
    ASSERT_EQ(d.comments().size(), 1u);
    EXPECT_EQ(d.comments()[0].id, 2u);
    EXPECT_EQ(d.accepted()[0].parts, std::vector<PartId>{PartId(8)});
    // The file then names no part that is gone, so it opens again.
    auto r = io::parseDrawing(io::serializeDrawing(d));
    ASSERT_TRUE(r) << r.error->text();
    d.removePart(PartId(5));
    EXPECT_TRUE(d.comments().empty());
    // The acceptance is stale now (its finding went with the motor) and listed as such.
    EXPECT_EQ(checkDrawing(d, testTables()).staleAccepted, std::vector<std::size_t>{0});
}

TEST(ReviewRecords, SchedulesSayWhatIsOpenAndWhatIsAccepted) {
    Drawing d = mismatchedMotor();
    auto motorFindings = [](const Drawing& drawing) {
        const auto result = runCheck(drawing, testTables());
        for (const auto& s : buildSchedules(*result))
            if (s.name == "motors") {
                const auto col = static_cast<std::size_t>(
                    std::find(s.headers.begin(), s.headers.end(), "Findings") - s.headers.begin());
                EXPECT_LT(col, s.headers.size());
                for (const auto& row : s.rows)
                    if (row[0] == "M-1" && col < row.size())
                        return row[col];
            }
        return std::string("(no row)");
    };
    const std::string open = motorFindings(d);
    EXPECT_NE(open.find("violation"), std::string::npos) << open;
    EXPECT_EQ(open.find("accepted"), std::string::npos) << open;
    d.accepted().push_back({"topology.voltage.mismatch", {PartId(9)}, "A", "d", "n"});
    const std::string after = motorFindings(d);
    EXPECT_NE(after.find("1 accepted"), std::string::npos) << after;
    // The small lineup's one finding is a note about its generic branch breaker's curve.
    EXPECT_EQ(motorFindings(smallLineup()), "1 note");
}

TEST(ReviewRecords, TheCheckStatusInWords) {
    CheckReport r;
    EXPECT_EQ(checkStatusWords(r), "no open findings");
    r.acceptedCount = 1;
    EXPECT_EQ(checkStatusWords(r), "no open findings, 1 accepted");
    r.openCounts = {0, 2, 3};
    EXPECT_EQ(checkStatusWords(r), "3 open violations, 2 open cautions, 1 accepted");
    r.openCounts = {1, 0, 1};
    r.acceptedCount = 0;
    r.staleAccepted = {0, 2};
    EXPECT_EQ(checkStatusWords(r), "1 open violation, 1 open note, 2 stale acceptances");
}

TEST(CurveSheets, EveryPathWithAProtectionFindingGetsOne) {
    // The review sample: conductor.protection on the lighting feeder cable C-LP1 is not in a
    // motor branch, so it gets a sheet of its own beside the motors'.
    auto loaded = io::loadDrawing(sourcePath("samples/kestrel-mill-mcc1-review.lineward"));
    ASSERT_TRUE(loaded) << loaded.error->text();
    const auto result = runCheck(*loaded.drawing, testTables());
    const auto parts = curveSheetParts(*result);
    const Drawing& d = *result->drawing;
    auto has = [&](const char* tag) {
        const Part* p = d.partByTag(tag);
        return p && std::find(parts.begin(), parts.end(), p->id) != parts.end();
    };
    EXPECT_TRUE(has("C-LP1"));
    for (const auto& m : result->motors)
        EXPECT_TRUE(has(m.branch.motor->tag.c_str())) << m.branch.motor->tag;
    // A finding on a branch device (MCP-105) is plotted on its motor's sheet, not twice.
    EXPECT_FALSE(has("MCP-105"));
    EXPECT_TRUE(has("P-105"));
    std::vector<PartId> unique(parts);
    std::sort(unique.begin(), unique.end());
    EXPECT_EQ(std::unique(unique.begin(), unique.end()), unique.end());
    EXPECT_TRUE(isProtectionRule("curve.selectivity"));
    EXPECT_TRUE(isProtectionRule("conductor.protection"));
    EXPECT_FALSE(isProtectionRule("topology.loop"));
}
