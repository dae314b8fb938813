// Hostile and huge input: ids of any value, any order, over-size lists refused while parsing,
// physical ranges, non-finite results guarded, CSV formulas and terminal controls made inert.
#include "check/check.h"
#include "io/drawing_file.h"
#include "report/report_format.h"
#include "report/schedules.h"
#include "rules/rule_context.h"
#include "studies/finite_guard.h"
#include "test_support.h"
#include "util/safe_text.h"

#include <algorithm>
#include <cmath>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::test;

namespace {

const std::string kHead = "{\n  \"format\": \"lineward\",\n  \"version\": 1,\n";

std::string motorJson(std::uint64_t id, const std::string& extra = "") {
    return "    {\"id\":" + std::to_string(id) +
           ",\"kind\":\"motor\",\"tag\":\"M\",\"hp\":10,\"volts\":460" + extra + "}";
}

std::string partsFile(const std::vector<std::string>& parts, const std::string& tail = "") {
    std::string s = kHead + "  \"parts\": [\n";
    for (std::size_t i = 0; i < parts.size(); ++i)
        s += parts[i] + (i + 1 < parts.size() ? ",\n" : "\n");
    return s + "  ]" + tail + "\n}\n";
}

} // namespace

TEST(HostileIds, HugeIdLoadsWithoutADenseTable) {
    // Before: the part index was a vector indexed by id value, so this one part asked for
    // 32 GB and the load ended in std::bad_alloc.
    const std::string text = partsFile(
        {motorJson(4000000000u)},
        ",\n  \"buckets\": [\n    {\"id\":4000000000,\"tag\":\"B\",\"parts\":[4000000000]}\n  ]");
    auto r = io::parseDrawing(text, "huge-id.lineward");
    ASSERT_TRUE(r) << r.error->text();
    ASSERT_NE(r.drawing->part(PartId(4000000000u)), nullptr);
    EXPECT_EQ(r.drawing->part(PartId(3999999999u)), nullptr);
    EXPECT_EQ(r.drawing->bucketOf(PartId(4000000000u))->id.value, 4000000000u);
    EXPECT_EQ(io::serializeDrawing(*r.drawing),
              io::serializeDrawing(*io::parseDrawing(io::serializeDrawing(*r.drawing)).drawing));
    // Ids past the format's limit are refused with the reason, not loaded.
    auto over = io::parseDrawing(partsFile({motorJson(4000000001u)}), "t.lineward");
    ASSERT_FALSE(over);
    EXPECT_NE(over.error->message.find("whole-number id from 1 to 4000000000, found 4000000001"),
              std::string::npos)
        << over.error->message;
    // A whole number past 2^53 is quoted as written, not as the nearest double (…616).
    std::string huge = motorJson(1);
    huge.replace(huge.find("\"id\":1"), 6, "\"id\":18446744073709551615");
    auto max64 = io::parseDrawing(partsFile({huge}), "t.lineward");
    ASSERT_FALSE(max64);
    EXPECT_NE(max64.error->message.find("found 18446744073709551615"), std::string::npos)
        << max64.error->message;
}

TEST(HostileKeys, AKeyWrittenWithEscapesIsLocatedAtItsOpeningQuote) {
    // "\u0041bc" decodes to "Abc" (3 bytes) but takes 10 in the file: the error must point at
    // the quote that opens it, not 7 columns to the right.
    const std::string text = partsFile({motorJson(1, ",\"\\u0041bc\":1")});
    auto r = io::parseDrawing(text, "t.lineward");
    ASSERT_FALSE(r);
    const std::size_t at = text.find("\"\\u0041bc\"");
    const std::size_t lineStart = text.rfind('\n', at) + 1;
    EXPECT_EQ(r.error->column, at - lineStart + 1) << r.error->text();
}

TEST(HostileKeys, AnUnknownKeyWithSlashOrTildeIsLocatedAtItself) {
    // RFC 6901 escapes in the error's path: the key "a/b~c" is found on its own line.
    const std::string text = partsFile({motorJson(2), motorJson(1, ",\"a/b~c\":1")});
    auto r = io::parseDrawing(text, "t.lineward");
    ASSERT_FALSE(r);
    EXPECT_NE(r.error->message.find("'a/b~c'"), std::string::npos) << r.error->text();
    // The error points at the key itself, not at the start of its part.
    const std::size_t at = text.find("\"a/b~c\"");
    const std::size_t lineStart = text.rfind('\n', at) + 1;
    EXPECT_EQ(r.error->line, 1 + std::count(text.begin(), text.begin() + at, '\n'))
        << r.error->text();
    EXPECT_EQ(r.error->column, at - lineStart + 1) << r.error->text();
}

TEST(HostileIds, AnyIdOrderGivesTheSameDrawing) {
    // Descending and shuffled ids: loaded with one sort, identical to ascending.
    constexpr int n = 3000;
    std::vector<std::string> asc, desc, mixed;
    for (int i = 1; i <= n; ++i)
        asc.push_back(motorJson(static_cast<std::uint64_t>(i) * 7));
    desc.assign(asc.rbegin(), asc.rend());
    for (int i = 0; i < n; ++i)
        mixed.push_back(asc[static_cast<std::size_t>((i * 1237) % n)]);
    const auto a = io::parseDrawing(partsFile(asc));
    ASSERT_TRUE(a);
    for (const auto* parts : {&desc, &mixed}) {
        auto r = io::parseDrawing(partsFile(*parts));
        ASSERT_TRUE(r) << r.error->text();
        EXPECT_EQ(*r.drawing, *a.drawing);
        EXPECT_EQ(r.drawing->indexOf(PartId(7 * 1234)), 1233u);
    }
    // A repeated id in any order is still refused at the repeat.
    desc.push_back(motorJson(7));
    auto dup = io::parseDrawing(partsFile(desc), "t.lineward");
    ASSERT_FALSE(dup);
    EXPECT_NE(dup.error->message.find("duplicate part id 7"), std::string::npos);
    EXPECT_EQ(dup.error->line, 5 + n);
}

TEST(HostileIds, BulkAddLeavesTheDrawingUnchangedOnARepeat) {
    Drawing d = smallLineup();
    const Drawing before = d;
    std::vector<Part> more{Part::make(PartKind::Motor, PartId(50), "M-50"),
                           Part::make(PartKind::Motor, PartId(3), "M-3")}; // 3 is the main breaker
    EXPECT_THROW(d.addParts(more), std::invalid_argument);
    EXPECT_EQ(d, before);
    more.pop_back();
    d.addParts(more);
    EXPECT_EQ(d.parts().back().id, PartId(50));
}

namespace {

// A file of `items` revisions (or bucket members), about `bytes` long.
std::string hugeList(bool revisions, std::size_t items) {
    std::string s = kHead;
    if (revisions) {
        s += "  \"revisions\": [\n";
        for (std::size_t i = 0; i < items; ++i)
            s += "    {\"rev\":\"A\",\"date\":\"2026-12-02\",\"by\":\"x\",\"note\":\"n\"}" +
                 std::string(i + 1 < items ? ",\n" : "\n");
        return s + "  ]\n}\n";
    }
    s +=
        "  \"parts\": [\n" + motorJson(1) + "\n  ],\n  \"buckets\": [\n    {\"id\":1,\"parts\":[\n";
    for (std::size_t i = 0; i < items; ++i)
        s += i + 1 < items ? "1,\n" : "1\n";
    return s + "]}\n  ]\n}\n";
}

} // namespace

TEST(HostileSize, SixtyMegabytesOfRevisionsStopAtTheFirstItemOverTheLimit) {
    // ~60 MB. The parser stops at item 10,001 (line 10,005), so the message points at the item
    // that crossed the limit; before, the whole file was held and the message pointed at the
    // list's key (line 4) after a second full parse.
    const std::string text = hugeList(true, 1'100'000);
    ASSERT_GT(text.size(), 55u << 20);
    auto r = io::parseDrawing(text, "revs.lineward");
    ASSERT_FALSE(r);
    EXPECT_EQ(r.error->line, 4 + 10001) << r.error->text();
    EXPECT_GT(r.error->column, 0);
    EXPECT_NE(r.error->message.find("at most 10000"), std::string::npos) << r.error->text();
    EXPECT_LT(r.error->text().size(), 200u);
}

TEST(HostileSize, BucketMembersAreLimitedWhileParsing) {
    const std::string text = hugeList(false, 20'000'000); // ~40 MB of "1,\n"
    auto r = io::parseDrawing(text, "members.lineward");
    ASSERT_FALSE(r);
    EXPECT_EQ(r.error->line, 8 + 10001) << r.error->text();
    EXPECT_NE(r.error->message.find("\"parts\""), std::string::npos) << r.error->text();
}

TEST(HostileSize, TheMessageStaysShortWhateverTheFileQuotes) {
    // A 60 kB key used to be quoted whole in "unknown key '...'".
    const std::string longKey(60000, 'k');
    auto r = io::parseDrawing(partsFile({motorJson(1, ",\"" + longKey + "\":1")}), "t.lineward");
    ASSERT_FALSE(r);
    EXPECT_LT(r.error->message.size(), 120u) << r.error->message.substr(0, 200);
    EXPECT_EQ(r.error->line, 5);
    // A 4 kB wire end is quoted cut short.
    const std::string longEnd(4000, '9');
    r = io::parseDrawing(partsFile({motorJson(1)}, ",\n  \"wires\": [{\"id\":1,\"from\":\"" +
                                                       longEnd + "\",\"to\":\"1.in\"}]"));
    ASSERT_FALSE(r);
    EXPECT_LT(r.error->message.size(), 160u) << r.error->message.substr(0, 200);
}

TEST(HostileSize, TotalValuesAreBounded) {
    io::FileLimits small;
    small.maxValues = 1000;
    std::vector<std::string> parts;
    for (int i = 1; i <= 200; ++i)
        parts.push_back(motorJson(static_cast<std::uint64_t>(i)));
    auto r = io::parseDrawing(partsFile(parts), "t.lineward", small);
    ASSERT_FALSE(r);
    EXPECT_NE(r.error->message.find("more than 1000 values"), std::string::npos);
    EXPECT_GT(r.error->line, 5);
}

struct TinyCase {
    const char* name;
    std::string part;
    const char* key;
    const char* range; ///< the accepted range the message must state
};

class PhysicalRange : public ::testing::TestWithParam<TinyCase> {};

TEST_P(PhysicalRange, TinyRatingIsRefusedWithTheRangeAndAReason) {
    const auto& c = GetParam();
    auto r = io::parseDrawing(partsFile({c.part}), "t.lineward");
    ASSERT_FALSE(r) << c.name << " was accepted";
    const std::string& m = r.error->message;
    EXPECT_NE(m.find(c.key), std::string::npos) << m;
    EXPECT_NE(m.find(c.range), std::string::npos) << m;
    EXPECT_NE(m.find("no low-voltage equipment"), std::string::npos) << m;
    EXPECT_EQ(r.error->line, 5);
}

INSTANTIATE_TEST_SUITE_P(
    Tiny, PhysicalRange,
    ::testing::Values(
        TinyCase{"motor_denormal_volts", R"(    {"id":1,"kind":"motor","hp":10,"volts":4.9e-324})",
                 "volts", "100 to 15000 V"},
        TinyCase{"source_1e_300_kv", R"(    {"id":1,"kind":"source","kv":1e-300,"fault_ka":30})",
                 "kv", "0.1 to 765 kV"},
        TinyCase{
            "transformer_1e_9_kva",
            R"(    {"id":1,"kind":"transformer","kva":1e-9,"pri_v":480,"sec_v":208,"z_pct":4})",
            "kva", "1 to 100000 kVA"},
        TinyCase{"cable_1e_12_ft",
                 R"(    {"id":1,"kind":"cable","size":"12 AWG","length_ft":1e-12})", "length_ft",
                 "0.1 to 20000 ft"},
        TinyCase{"breaker_tiny_trip",
                 R"(    {"id":1,"kind":"breaker","trip_a":1e-30,"interrupting_ka":65})", "trip_a",
                 "0.5 to 6000 A"}),
    [](const auto& info) { return std::string(info.param.name); });

TEST(FiniteGuard, NonFiniteStudyResultsBecomeAFinding) {
    Drawing d = smallLineup();
    Network net(d);
    Flow flow(net);
    StudyResults r = runStudies(net, flow, testTables(), d.settings);
    ASSERT_FALSE(r.fault.empty());
    ASSERT_FALSE(r.loadAmps.empty());
    r.fault[0].ikKa = std::nan("");
    r.loadAmps.begin()->second = INFINITY;
    r.voltage[0] = Complex(NAN, 0);
    guardStudyResults(r, net);
    EXPECT_TRUE(std::isfinite(r.fault[0].ikKa));
    for (const auto& [id, a] : r.loadAmps)
        EXPECT_TRUE(std::isfinite(a));
    EXPECT_FALSE(r.loadFlowConverged);
    int notes = 0;
    for (const auto& f : r.issues)
        if (f.kind == StudyIssueKind::NotFinite) {
            ++notes;
            EXPECT_NE(f.message.find("could not be computed"), std::string::npos);
        }
    EXPECT_EQ(notes, 3);
    // The rules, not the studies, make the findings: each issue becomes one study.not_finite.
    const std::vector<MotorBranch> branches = findMotorBranches(d, net);
    std::vector<Finding> out;
    reportStudyIssues(StudyView{d, net, flow, testTables(), r, branches}, out);
    EXPECT_EQ(std::count_if(out.begin(), out.end(),
                            [](const Finding& f) { return f.ruleId == "study.not_finite"; }),
              3);
}

TEST(FiniteGuard, FindingNumbersAreNeverNonFinite) {
    std::vector<Finding> fs(1);
    fs[0].computed = std::nan("");
    fs[0].limit = INFINITY;
    guardFindingNumbers(fs);
    EXPECT_FALSE(fs[0].computed);
    EXPECT_FALSE(fs[0].limit);
    EXPECT_EQ(fs[0].trace.size(), 2u);
}

TEST(FiniteGuard, ExtremeButAcceptedRatingsGiveOnlyFiniteResults) {
    // The largest load on the weakest source the ranges allow: the load flow cannot settle.
    const std::string text =
        partsFile({R"(    {"id":1,"kind":"source","tag":"U","kv":0.1,"fault_ka":0.1})",
                   R"(    {"id":2,"kind":"cable","tag":"C","size":"14 AWG","length_ft":20000})",
                   R"(    {"id":3,"kind":"load","tag":"L","kva":100000,"volts":100})"},
                  ",\n  \"wires\": [{\"id\":1,\"from\":\"1.out\",\"to\":\"2.line\"},"
                  "{\"id\":2,\"from\":\"2.load\",\"to\":\"3.in\"}]");
    auto loaded = io::parseDrawing(text);
    ASSERT_TRUE(loaded) << loaded.error->text();
    Network net(*loaded.drawing);
    Flow flow(net);
    const auto r = runStudies(net, flow, testTables(), loaded.drawing->settings);
    for (const auto& f : r.fault)
        EXPECT_TRUE(std::isfinite(f.ikKa) && std::isfinite(f.peakKa));
    for (const auto& v : r.voltage)
        EXPECT_TRUE(std::isfinite(std::abs(v)));
    for (const auto& [id, a] : r.loadAmps)
        EXPECT_TRUE(std::isfinite(a)) << id.value;
    for (const auto& f : checkDrawing(*loaded.drawing, testTables()).findings) {
        EXPECT_TRUE(!f.computed || std::isfinite(*f.computed)) << f.ruleId;
        EXPECT_TRUE(!f.limit || std::isfinite(*f.limit)) << f.ruleId;
    }
}

TEST(CsvSafety, FormulaCellsAreNeutralisedAndNumbersKept) {
    // OWASP "CSV injection" guidance: a leading = + - @ (or tab, CR) makes a formula.
    EXPECT_EQ(csvSafeCell("=HYPERLINK(\"http://x\")"), "'=HYPERLINK(\"http://x\")");
    EXPECT_EQ(csvSafeCell("+1+2"), "'+1+2");
    EXPECT_EQ(csvSafeCell("-A1"), "'-A1");
    EXPECT_EQ(csvSafeCell("@SUM(A1)"), "'@SUM(A1)");
    EXPECT_EQ(csvSafeCell("\t=1"), "'\t=1");
    EXPECT_EQ(csvSafeCell("-5"), "-5");
    EXPECT_EQ(csvSafeCell("-0.25"), "-0.25");
    EXPECT_EQ(csvSafeCell("M-101"), "M-101");
    EXPECT_EQ(csvSafeCell(""), "");
    Schedule s{"motors", {"tag", "fla"}, {{"=cmd|' /C calc'!A0", "-3"}}};
    EXPECT_EQ(toCsv(s), "tag,fla\r\n'=cmd|' /C calc'!A0,-3\r\n");
}

TEST(CsvSafety, ExportedScheduleOfAHostileTagIsInert) {
    Drawing d = smallLineup();
    d.part(PartId(9))->tag = "=1+2";
    int shown = 0;
    for (const auto& s : buildSchedules(*runCheck(d, testTables()))) {
        const bool holds = std::any_of(s.rows.begin(), s.rows.end(), [](const auto& row) {
            return std::find(row.begin(), row.end(), "=1+2") != row.end();
        });
        if (!holds)
            continue;
        ++shown;
        const std::string csv = toCsv(s);
        EXPECT_NE(csv.find("'=1+2"), std::string::npos) << csv;
        EXPECT_EQ(csv.find(",=1+2"), std::string::npos) << csv;
        EXPECT_NE(csv.rfind("=1+2", 0), 0u) << csv; // nor at the start of the first cell
    }
    EXPECT_GT(shown, 0); // the tag is in a schedule, so the check above was made
}

TEST(TerminalSafety, ControlCharactersAreShownNotObeyed) {
    EXPECT_EQ(escapeControls("M-1"), "M-1");
    EXPECT_EQ(escapeControls("\x1b]0;owned\x07"), "\\x1b]0;owned\\x07");
    EXPECT_EQ(escapeControls("a\rb\nc\td"), "a\\rb\\nc\\td");
    EXPECT_EQ(escapeControls("\x7f"), "\\x7f");
    EXPECT_EQ(escapeControls("\xc2\x9b"
                             "2J"),
              "\\u009b2J"); // C1 CSI in UTF-8
    EXPECT_EQ(escapeControls("\x9b"
                             "2J"),
              "\\x9b2J"); // a lone 8-bit CSI
    EXPECT_EQ(escapeControls("line\xe2\x80\xa8"
                             "two"),
              "line\\u2028two");
    EXPECT_EQ(escapeControls("I²t 90 °C"), "I²t 90 °C");
}

TEST(TerminalSafety, JsonKeepsItsMeaningAndLosesItsControls) {
    EXPECT_EQ(inertJson("{\"tag\": \"\xc2\x9b"
                        "2J\"}"),
              "{\"tag\": \"\\u009b2J\"}");
    EXPECT_EQ(inertJson("\"a\xe2\x80\xa9"
                        "b\x7f\""),
              "\"a\\u2029b\\u007f\"");
    EXPECT_EQ(inertJson("\"I²t 90 °C \xc2\xa0\""), "\"I²t 90 °C \xc2\xa0\""); // no-break space kept
}

TEST(TerminalSafety, ReportTextKeepsEachFindingOnItsLine) {
    Drawing d = smallLineup();
    d.part(PartId(9))->tag = "M\x1b[2J\r\nfake: all clear";
    const auto report = checkDrawing(d, testTables());
    const std::string text = reportText(d, report, "x.lineward");
    EXPECT_EQ(text.find('\x1b'), std::string::npos);
    EXPECT_EQ(text.find('\r'), std::string::npos);
    EXPECT_EQ(text.find("\nfake: all clear"), std::string::npos);
}

TEST(Docs, FuzzDictionaryHasEveryKey) {
    const std::string dict = readFile(sourcePath("tests/fuzz/lineward.dict"));
    ASSERT_FALSE(dict.empty());
    auto has = [&](std::string_view w) {
        return dict.find("\"\\\"" + std::string(w) + "\\\"\"") != std::string::npos;
    };
    for (int k = 0; k < kPartKindCount; ++k) {
        const auto& info = kindInfo(static_cast<PartKind>(k));
        EXPECT_TRUE(has(info.key)) << info.key;
        for (const auto& f : info.fields) {
            EXPECT_TRUE(has(f.key)) << info.key << "." << f.key;
            for (auto c : f.choices)
                EXPECT_TRUE(has(c)) << info.key << "." << f.key << " = " << c;
        }
        for (auto t : info.terminals)
            EXPECT_TRUE(has(t)) << info.key << " terminal " << t;
    }
}
