// Keeps the documents true: docs/rules.md matches the rule catalogue, and samples/README.md
// lists exactly the findings the mistake sample produces.
#include "check/check.h"
#include "io/drawing_file.h"
#include "model/part_kind.h"
#include "rules/rule_catalog.h"
#include "test_support.h"

#include <filesystem>
#include <gtest/gtest.h>
#include <map>
#include <regex>
#include <set>
#include <sstream>

using namespace lineward;
using namespace lineward::test;

namespace {

// Cells of a markdown table row, trimmed.
std::vector<std::string> cells(const std::string& line) {
    std::vector<std::string> out;
    std::stringstream s(line);
    std::string cell;
    std::getline(s, cell, '|'); // before the first bar
    while (std::getline(s, cell, '|')) {
        const auto a = cell.find_first_not_of(' '), b = cell.find_last_not_of(' ');
        out.push_back(a == std::string::npos ? "" : cell.substr(a, b - a + 1));
    }
    return out;
}

std::string unquote(const std::string& s) {
    return s.size() >= 2 && s.front() == '`' && s.back() == '`' ? s.substr(1, s.size() - 2) : s;
}

} // namespace

TEST(Docs, RulesDocumentMatchesCatalogue) {
    const std::string doc = readFile(sourcePath("docs/rules.md"));
    ASSERT_FALSE(doc.empty());
    std::map<std::string, std::vector<std::string>> rows; // id -> cells
    std::istringstream in(doc);
    for (std::string line; std::getline(in, line);) {
        if (line.rfind("| `", 0) != 0)
            continue;
        auto c = cells(line);
        ASSERT_GE(c.size(), 4u) << line;
        rows[unquote(c[0])] = c;
    }
    std::set<std::string> inCode;
    for (const auto& r : ruleCatalog()) {
        inCode.insert(std::string(r.id));
        auto it = rows.find(std::string(r.id));
        ASSERT_NE(it, rows.end()) << "docs/rules.md lacks rule " << r.id;
        EXPECT_EQ(it->second[1], r.clause) << r.id;
        EXPECT_EQ(it->second[2], severityName(r.severity)) << r.id;
    }
    for (const auto& [id, c] : rows)
        EXPECT_TRUE(inCode.count(id)) << "docs/rules.md lists " << id << ", which the code lacks";
}

TEST(Samples, CleanSampleChecksClean) {
    auto r = io::loadDrawing(sourcePath("samples/kestrel-mill-mcc1.lineward"));
    ASSERT_TRUE(r) << r.error->text();
    const auto report = checkDrawing(*r.drawing, testTables());
    // Clean but for the one deviation samples/README.md names: SWBD-1's arc-flash energy,
    // accepted by the checker with its reason.
    int accepted = 0;
    for (const auto& f : report.findings) {
        if (!f.accepted) {
            ADD_FAILURE() << f.ruleId << ": " << f.message;
            continue;
        }
        ++accepted;
        EXPECT_EQ(f.ruleId, "arcflash.energy.caution");
        EXPECT_EQ(f.message.rfind("SWBD-1 ", 0), 0u) << f.message;
        EXPECT_FALSE(f.acceptedNote.empty());
    }
    EXPECT_EQ(accepted, 1);
    EXPECT_GE(r.drawing->buckets().size(), 12u);
}

TEST(Samples, MistakeSampleReportsExactlyTheListedFindings) {
    // samples/README.md lists each deliberate mistake as: | `rule.id` | `TAG` | what is wrong |
    const std::string readme = readFile(sourcePath("samples/README.md"));
    ASSERT_FALSE(readme.empty());
    std::multiset<std::pair<std::string, std::string>> listed;
    const auto section = readme.find("## Deliberate mistakes");
    ASSERT_NE(section, std::string::npos);
    std::istringstream in(readme.substr(section));
    for (std::string line; std::getline(in, line);) {
        if (line.rfind("| `", 0) != 0)
            continue;
        auto c = cells(line);
        ASSERT_GE(c.size(), 3u) << line;
        listed.insert({unquote(c[0]), unquote(c[1])});
    }
    ASSERT_GE(listed.size(), 6u);

    auto r = io::loadDrawing(sourcePath("samples/kestrel-mill-mcc1-review.lineward"));
    ASSERT_TRUE(r) << r.error->text();
    std::multiset<std::pair<std::string, std::string>> found;
    for (const auto& f : checkDrawing(*r.drawing, testTables()).findings)
        found.insert({f.ruleId, r.drawing->part(f.parts.front())->tag});
    EXPECT_EQ(found, listed);
}

TEST(Docs, FileFormatDocumentsEveryKindAndField) {
    const std::string doc = readFile(sourcePath("docs/file-format.md"));
    ASSERT_FALSE(doc.empty());
    for (int k = 0; k < kPartKindCount; ++k) {
        const auto& info = kindInfo(static_cast<PartKind>(k));
        const auto heading = doc.find("### `" + std::string(info.key) + "`");
        ASSERT_NE(heading, std::string::npos) << "no section for kind " << info.key;
        const auto next = doc.find("\n#", heading + 4);
        const std::string section = doc.substr(heading, next - heading);
        for (const auto& f : info.fields)
            EXPECT_NE(section.find("| `" + std::string(f.key) + "` |"), std::string::npos)
                << info.key << "." << f.key << " is not documented";
        for (auto t : info.terminals)
            EXPECT_NE(section.find("`" + std::string(t) + "`"), std::string::npos)
                << info.key << " terminal " << t << " is not documented";
    }
}

TEST(Docs, EveryRuleHasATestThatNamesIt) {
    // Each rule in the catalogue is named, quoted, by at least one test source (where its
    // failing and passing cases live), so a rule cannot be added untested.
    std::string tests;
    for (const char* dir : {"tests/core", "tests/ui"})
        for (const auto& e : std::filesystem::directory_iterator(sourcePath(dir)))
            if (e.path().extension() == ".cpp")
                tests += readFile(e.path().string());
    tests += readFile(sourcePath("tests/cli_exit_codes.cmake"));
    for (const auto& r : ruleCatalog())
        EXPECT_NE(tests.find("\"" + std::string(r.id) + "\""), std::string::npos)
            << "no test names rule " << r.id;
}

TEST(Docs, UserGuideStatesTheReviewSampleCounts) {
    // The guide quotes the status bar for the review sample; it must say what a user sees.
    const std::string guide = readFile(sourcePath("docs/user-guide.md"));
    const std::regex counts(R"((\d+) violations · (\d+) cautions · (\d+) notes?)");
    std::smatch m;
    ASSERT_TRUE(std::regex_search(guide, m, counts)) << "the guide quotes no counts";
    auto r = io::loadDrawing(sourcePath("samples/kestrel-mill-mcc1-review.lineward"));
    ASSERT_TRUE(r);
    const auto report = checkDrawing(*r.drawing, testTables());
    EXPECT_EQ(std::stoi(m[1]), report.openCounts[2]);
    EXPECT_EQ(std::stoi(m[2]), report.openCounts[1]);
    EXPECT_EQ(std::stoi(m[3]), report.openCounts[0]);
}
