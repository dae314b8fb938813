// The .lineward format: byte-identical round trips, atomic saves, and one located message for
// every class of malformed input.
#include "io/drawing_file.h"
#include "test_support.h"

#include <filesystem>
#include <fstream>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::test;
using lineward::io::FileLimits;
using lineward::io::LoadError;

namespace {

const char* kHeader = "{\n  \"format\": \"lineward\",\n  \"version\": 1,\n";

std::string withParts(const std::string& parts) {
    return std::string(kHeader) + "  \"parts\": [\n" + parts + "\n  ]\n}\n";
}

LoadError mustFail(const std::string& text) {
    auto r = io::parseDrawing(text, "t.lineward");
    EXPECT_FALSE(r) << "accepted:\n" << text;
    return r.error.value_or(LoadError{});
}

} // namespace

TEST(FileFormat, SamplesRoundTripByteForByte) {
    for (const char* name :
         {"samples/kestrel-mill-mcc1.lineward", "samples/kestrel-mill-mcc1-review.lineward"}) {
        const std::string text = readFile(sourcePath(name));
        ASSERT_FALSE(text.empty()) << name;
        auto r = io::parseDrawing(text, name);
        ASSERT_TRUE(r) << r.error->text();
        EXPECT_EQ(io::serializeDrawing(*r.drawing), text) << name;
    }
}

TEST(FileFormat, BuiltDrawingSurvivesSaveAndLoad) {
    Drawing d = smallLineup();
    d.sheet.title = "Round trip — ümlauts and \"quotes\"";
    d.sheet.revisions.push_back({"A", "2026-12-01", "R. Quill", "first issue", "issued/plant-A.lineward"});
    d.accepted().push_back({"topology.dangling", {PartId(9)}, "R. Quill", "2026-12-01", "spare"});
    d.settings.vdropBranchPct = 2.5;
    const std::string text = io::serializeDrawing(d);
    auto r = io::parseDrawing(text);
    ASSERT_TRUE(r) << r.error->text();
    EXPECT_EQ(*r.drawing, d);
    EXPECT_EQ(io::serializeDrawing(*r.drawing), text);
}

TEST(FileFormat, OnePartPerLineSoAnEditIsAOneLineDiff) {
    Drawing d = smallLineup();
    const std::string before = io::serializeDrawing(d);
    ASSERT_FALSE(d.part(PartId(9))->set("hp", 30.0).has_value());
    const std::string after = io::serializeDrawing(d);
    std::istringstream a(before), b(after);
    std::string la, lb;
    int differing = 0;
    while (std::getline(a, la) && std::getline(b, lb))
        differing += la != lb;
    EXPECT_EQ(differing, 1);
}

TEST(FileFormat, AtomicSaveReplacesAndFailedSaveKeepsOldFile) {
    const auto dir = std::filesystem::temp_directory_path() / "lineward-atomic-test";
    std::filesystem::remove_all(dir);
    std::filesystem::create_directories(dir);
    const auto path = dir / "a.lineward";
    Drawing d = smallLineup();
    ASSERT_FALSE(io::saveDrawing(d, path).has_value());
    EXPECT_EQ(readFile(path.string()), io::serializeDrawing(d));
    // Saving into a folder that does not exist fails with a reason and creates nothing.
    auto why = io::saveDrawing(d, dir / "missing" / "b.lineward");
    ASSERT_TRUE(why.has_value());
    EXPECT_NE(why->find("temporary"), std::string::npos);
    // A failed rename (target is a folder) leaves no temporary file behind.
    std::filesystem::create_directories(dir / "c.lineward");
    EXPECT_TRUE(io::saveDrawing(d, dir / "c.lineward").has_value());
    int files = 0;
    for (auto& e : std::filesystem::directory_iterator(dir))
        files += e.is_regular_file();
    EXPECT_EQ(files, 1);
    EXPECT_EQ(readFile(path.string()), io::serializeDrawing(d));
    std::filesystem::remove_all(dir);
}

TEST(FileFormat, MissingFileIsAClearError) {
    auto r = io::loadDrawing("/nonexistent/folder/x.lineward");
    ASSERT_FALSE(r);
    EXPECT_NE(r.error->text().find("cannot read"), std::string::npos);
}

struct BadCase {
    const char* name;
    std::string text;
    int line;
    const char* expect; ///< text the message must contain
};

class MalformedFile : public ::testing::TestWithParam<BadCase> {};

TEST_P(MalformedFile, RefusedWithLocatedMessage) {
    const auto& c = GetParam();
    LoadError e = mustFail(c.text);
    EXPECT_EQ(e.line, c.line) << e.text();
    EXPECT_GT(e.column, 0) << e.text();
    EXPECT_NE(e.message.find(c.expect), std::string::npos) << e.text();
    EXPECT_EQ(e.text().rfind("t.lineward:" + std::to_string(c.line) + ":", 0), 0u) << e.text();
}

const std::string kMotor =
    R"(    {"id":1,"kind":"motor","tag":"M-1","x":0,"y":0,"rot":0,"hp":10,"volts":460})";

INSTANTIATE_TEST_SUITE_P(
    AllClasses, MalformedFile,
    ::testing::Values(
        BadCase{"truncated", std::string(kHeader) + "  \"parts\": [\n    {\"id\": 1,\n", 6,
                "unexpected end of input"},
        BadCase{"not_json", "format: lineward\n", 1, "syntax error"},
        BadCase{"top_level_list", "[1, 2]\n", 1, "expected an object"},
        BadCase{"wrong_format", "{\n  \"format\": \"other\",\n  \"version\": 1\n}\n", 2,
                "\"format\": \"lineward\""},
        BadCase{"unknown_version", "{\n  \"format\": \"lineward\",\n  \"version\": 7\n}\n", 3,
                "version 7 is not supported"},
        BadCase{"wrong_type",
                withParts(R"(    {"id":1,"kind":"motor","tag":"M","hp":"ten","volts":460})"), 5,
                "expected a number, found text"},
        BadCase{"unknown_kind", withParts(R"(    {"id":1,"kind":"flux_capacitor"})"), 5,
                "unknown part kind 'flux_capacitor'"},
        BadCase{"unknown_rating", withParts(R"(    {"id":1,"kind":"motor","hpp":10,"volts":460})"),
                5, "has no rating 'hpp'"},
        BadCase{"duplicate_id", withParts(kMotor + ",\n" + kMotor), 6, "duplicate part id 1"},
        BadCase{"duplicate_key",
                withParts(R"(    {"id":1,"kind":"motor","hp":10,"hp":20,"volts":460})"), 5,
                "duplicate key 'hp'"},
        BadCase{"negative", withParts(R"(    {"id":1,"kind":"motor","hp":-5,"volts":460})"), 5,
                "hp -5 hp is below the smallest accepted value 0.1 hp"},
        BadCase{
            "zero_kva",
            withParts(
                R"(    {"id":1,"kind":"transformer","kva":0,"pri_v":480,"sec_v":208,"z_pct":4})"),
            5, "kva 0 kVA is below the smallest accepted value 1 kVA"},
        BadCase{"huge", withParts(R"(    {"id":1,"kind":"motor","hp":1e300,"volts":460})"), 5,
                "above the largest accepted value"},
        BadCase{"overflow_to_infinity",
                withParts(R"(    {"id":1,"kind":"motor","hp":1e999,"volts":460})"), 5,
                "number overflow"},
        BadCase{"nan_as_text", withParts(R"(    {"id":1,"kind":"motor","hp":"NaN","volts":460})"),
                5, "expected a number"},
        BadCase{"missing_required", withParts(R"(    {"id":1,"kind":"motor","hp":10})"), 5,
                "volts is required"},
        BadCase{"both_hp_and_kw",
                withParts(R"(    {"id":1,"kind":"motor","hp":10,"kw":7.5,"volts":460})"), 5,
                "exactly one of hp and kw"},
        BadCase{"bad_conductor_size",
                withParts(R"(    {"id":1,"kind":"cable","size":"7 AWG","length_ft":10})"), 5,
                "not a conductor size"},
        BadCase{"deep_nesting",
                std::string(kHeader) + "  \"sheet\": " + std::string(40, '[') +
                    std::string(40, ']') + "\n}\n",
                4, "nesting is deeper"}),
    [](const auto& info) { return std::string(info.param.name); });

TEST(FileFormatWires, WireToMissingPartOrTerminal) {
    const std::string base = std::string(kHeader) + "  \"parts\": [\n" + kMotor + "\n  ],\n";
    auto e = mustFail(
        base + "  \"wires\": [\n    {\"id\":1,\"from\":\"1.in\",\"to\":\"2.line\"}\n  ]\n}\n");
    EXPECT_EQ(e.line, 8);
    EXPECT_NE(e.message.find("part 2, which does not exist"), std::string::npos) << e.text();
    e = mustFail(base +
                 "  \"wires\": [\n    {\"id\":1,\"from\":\"1.out\",\"to\":\"1.in\"}\n  ]\n}\n");
    EXPECT_EQ(e.line, 8);
    EXPECT_NE(e.message.find("has no terminal 'out' (it has: in)"), std::string::npos) << e.text();
    e = mustFail(base + "  \"wires\": [\n    {\"id\":1,\"from\":\"x\",\"to\":\"1.in\"}\n  ]\n}\n");
    EXPECT_NE(e.message.find("expected \"<part id>.<terminal>\""), std::string::npos) << e.text();
}

TEST(FileFormatLimits, OverSizeLimitsAreRefused) {
    FileLimits small;
    small.maxParts = 2;
    std::string parts;
    for (int i = 1; i <= 3; ++i)
        parts += std::string(i > 1 ? ",\n" : "") + "    {\"id\":" + std::to_string(i) +
                 ",\"kind\":\"motor\",\"hp\":10,\"volts\":460}";
    auto r = io::parseDrawing(withParts(parts), "t.lineward", small);
    ASSERT_FALSE(r);
    EXPECT_NE(r.error->message.find("at most 2"), std::string::npos) << r.error->text();
    EXPECT_EQ(r.error->line, 7); // the first part over the limit, found while parsing

    small = FileLimits{};
    small.maxFileBytes = 100;
    r = io::parseDrawing(withParts(parts), "t.lineward", small);
    ASSERT_FALSE(r);
    EXPECT_NE(r.error->message.find("larger than"), std::string::npos);

    const std::string longTag(5000, 'x');
    r = io::parseDrawing(withParts("    {\"id\":1,\"kind\":\"motor\",\"tag\":\"" + longTag +
                                   "\",\"hp\":10,\"volts\":460}"));
    ASSERT_FALSE(r);
    EXPECT_NE(r.error->message.find("longer than 4096"), std::string::npos);
}

TEST(FileFormatBuckets, BucketsAndAcceptedNameExistingParts) {
    const std::string base = std::string(kHeader) + "  \"parts\": [\n" + kMotor + "\n  ],\n";
    auto e =
        mustFail(base + "  \"buckets\": [\n    {\"id\":1,\"tag\":\"B\",\"parts\":[1,5]}\n  ]\n}\n");
    EXPECT_NE(e.message.find("part 5 does not exist"), std::string::npos) << e.text();
    EXPECT_EQ(e.line, 8);
    e = mustFail(
        base +
        "  \"buckets\": [\n    {\"id\":1,\"parts\":[1]},\n    {\"id\":2,\"parts\":[1]}\n  ]\n}\n");
    EXPECT_NE(e.message.find("already in another bucket"), std::string::npos) << e.text();
    EXPECT_EQ(e.line, 9);
    e = mustFail(base + "  \"buckets\": [\n    {\"id\":1,\"sccr_ka\":-3}\n  ]\n}\n");
    EXPECT_NE(e.message.find("sccr_ka -3 kA"), std::string::npos) << e.text();
    // A denormal rating is no rating: refused with the range, not shown as "SCCR 0 kA".
    e = mustFail(base + "  \"buckets\": [\n    {\"id\":1,\"sccr_ka\":4.9e-324}\n  ]\n}\n");
    EXPECT_NE(e.message.find("outside 1 to 300 kA"), std::string::npos) << e.text();
}

TEST(FileFormatErrors, AHugeBadTokenGivesAShortMessage) {
    // The parser quotes the token it stopped at; a 100 kB malformed number must still give a
    // one-line message a dialog can show.
    const std::string text =
        std::string(kHeader) + "  \"parts\": [1" + std::string(100000, '9') + "x]\n}\n";
    const auto e = mustFail(text);
    EXPECT_LT(e.message.size(), 400u) << e.message.substr(0, 400);
    EXPECT_EQ(e.line, 4); // the line of "parts", after the three header lines
}
