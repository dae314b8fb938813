// The DXF export: the R12 writer's structure and text encoding, the one-line's layers, tags,
// ratings, wires and badges, symbols equal to the Sheet's SVG files, and the atomic write.
#include "check/check.h"
#include "export/dxf_symbols.h"
#include "export/dxf_writer.h"
#include "export/one_line_dxf.h"
#include "io/drawing_file.h"
#include "test_support.h"

#include <algorithm>
#include <filesystem>
#include <fstream>
#include <gtest/gtest.h>
#include <limits>
#include <map>
#include <regex>
#include <set>
#include <sstream>

using namespace lineward;
using namespace lineward::dxf;
using lineward::test::readFile;
using lineward::test::sourcePath;

namespace {

struct Entity {
    std::string type;
    std::multimap<int, std::string> groups;
    std::string get(int code) const {
        auto it = groups.find(code);
        return it == groups.end() ? std::string() : it->second;
    }
};

// Reads group code / value pairs; fails the test on a code that is not a number.
std::vector<std::pair<int, std::string>> pairs(const std::string& dxf) {
    std::vector<std::pair<int, std::string>> out;
    std::istringstream in(dxf);
    std::string code, value;
    while (std::getline(in, code) && std::getline(in, value)) {
        std::size_t used = 0;
        const int c = std::stoi(code, &used);
        EXPECT_EQ(used, code.size()) << "group code line: " << code;
        out.emplace_back(c, value);
    }
    return out;
}

// Entities of one section ("ENTITIES", "TABLES"), each with its groups.
std::vector<Entity> section(const std::string& dxf, const std::string& name) {
    std::vector<Entity> out;
    bool in = false;
    auto all = pairs(dxf);
    for (std::size_t i = 0; i < all.size(); ++i) {
        const auto& [c, v] = all[i];
        if (c == 2 && i > 0 && all[i - 1].second == "SECTION")
            in = v == name;
        else if (in && c == 0 && v == "ENDSEC")
            in = false;
        else if (in && c == 0)
            out.push_back({v, {}});
        else if (in && !out.empty())
            out.back().groups.emplace(c, v);
    }
    return out;
}

std::shared_ptr<const CheckResult> checkedSample(const std::string& name) {
    auto loaded = io::loadDrawing(sourcePath("samples/" + name));
    EXPECT_TRUE(loaded) << (loaded.error ? loaded.error->text() : "");
    return runCheck(*loaded.drawing, lineward::test::testTables());
}

} // namespace

TEST(DxfWriter, WritesTheSectionsOfAnR12File) {
    DxfWriter w;
    w.addLayer("LW-A", 3);
    w.line("LW-A", {0, 0}, {1.5, 2});
    w.text("LW-A", {1, 1}, 0.2, "hello");
    const std::string dxf = w.finish({0, 0}, {2, 2}, 1);
    EXPECT_EQ(dxf.rfind("0\nSECTION\n2\nHEADER\n", 0), 0u);
    EXPECT_TRUE(dxf.ends_with("0\nENDSEC\n0\nEOF\n"));
    EXPECT_NE(dxf.find("$ACADVER\n1\nAC1009\n"), std::string::npos);
    EXPECT_NE(dxf.find("$INSUNITS\n70\n1\n"), std::string::npos);
    const auto ents = section(dxf, "ENTITIES");
    ASSERT_EQ(ents.size(), 2u);
    EXPECT_EQ(ents[0].type, "LINE");
    EXPECT_EQ(ents[0].get(11), "1.5");
    EXPECT_EQ(ents[0].get(21), "2.0");
    EXPECT_EQ(ents[1].get(1), "hello");
    std::set<std::string> layers;
    for (const auto& e : section(dxf, "TABLES"))
        if (e.type == "LAYER")
            layers.insert(e.get(2));
    EXPECT_EQ(layers, (std::set<std::string>{"0", "LW-A"}));
}

TEST(DxfWriter, RefusesLayerNamesR12CannotHoldAndUndeclaredLayers) {
    DxfWriter w;
    EXPECT_THROW(w.addLayer("lower", 7), std::invalid_argument);
    EXPECT_THROW(w.addLayer(std::string(32, 'A'), 7), std::invalid_argument);
    EXPECT_THROW(w.addLayer("A B", 7), std::invalid_argument);
    EXPECT_THROW(w.line("NOPE", {0, 0}, {1, 1}), std::logic_error);
    w.addLayer("LW-OK", 7);
    const double nan = std::numeric_limits<double>::quiet_NaN();
    EXPECT_THROW(w.line("LW-OK", {0, 0}, {nan, 1}), std::invalid_argument);
}

TEST(DxfWriter, TextCannotBreakTheFileAndKeepsEveryCharacter) {
    EXPECT_EQ(encodeText("P-101"), "P-101");
    EXPECT_EQ(encodeText("Pump\xC3\xBC 2"), "Pump\\U+00FC 2"); // ü
    EXPECT_EQ(encodeText("\xE2\x80\x94"), "\\U+2014");         // em dash
    EXPECT_EQ(encodeText("\xF0\x9F\x94\xA5"), "\\U+FFFD");     // beyond the basic plane
    const std::string hostile = encodeText("M-1\n0\nEOF\r\x1b[31m\x7f\xff");
    for (char c : hostile)
        EXPECT_TRUE(c >= 0x20 && c < 0x7f) << "raw byte " << int(static_cast<unsigned char>(c));
    EXPECT_NE(hostile.find("M-1\\n0\\nEOF"), std::string::npos) << hostile;

    // A hostile tag in a drawing leaves the file's pair structure intact.
    lineward::test::DrawingBuilder b;
    b.add(PartKind::Motor, "M-1\n0\nEOF", {{"hp", 10.0}, {"volts", 460.0}});
    const std::string dxf = oneLineDxf(*runCheck(b.drawing(), lineward::test::testTables()));
    EXPECT_TRUE(dxf.ends_with("0\nEOF\n"));
    EXPECT_EQ(std::count(dxf.begin(), dxf.end(), '\n') % 2, 0);
    int eofs = 0;
    for (const auto& [c, v] : pairs(dxf))
        eofs += c == 0 && v == "EOF";
    EXPECT_EQ(eofs, 1);
}

class DxfSample : public ::testing::TestWithParam<const char*> {};

TEST_P(DxfSample, EveryLayerTagRatingAndWireIsThere) {
    const auto result = checkedSample(GetParam());
    const Drawing& d = *result->drawing;
    const std::string dxf = oneLineDxf(*result);

    std::set<std::string> declared;
    for (const auto& e : section(dxf, "TABLES"))
        if (e.type == "LAYER")
            declared.insert(e.get(2));
    for (const auto& l : allLayers())
        EXPECT_TRUE(declared.count(l)) << l;
    EXPECT_EQ(allLayers().size(), 14u + 6u); // one per part kind, then wires .. title block

    const auto ents = section(dxf, "ENTITIES");
    std::multiset<std::string> tags, ratings;
    std::map<std::string, int> onLayer;
    for (const auto& e : ents) {
        if (e.type == "VERTEX" || e.type == "SEQEND")
            continue;
        ++onLayer[e.get(8)];
        if (e.type == "TEXT" && e.get(8) == kTagLayer)
            tags.insert(e.get(1));
        if (e.type == "TEXT" && e.get(8) == kRatingLayer)
            ratings.insert(e.get(1));
    }
    ASSERT_FALSE(d.parts().empty());
    std::set<std::string_view> kinds;
    std::multiset<std::string> partTags; // a drawing may repeat a tag (the review sample does)
    for (const auto& p : d.parts())
        partTags.insert(encodeText(p.tag));
    for (const auto& p : d.parts()) {
        EXPECT_EQ(tags.count(encodeText(p.tag)), partTags.count(encodeText(p.tag))) << p.tag;
        for (const auto& line : ratingLines(p))
            EXPECT_TRUE(ratings.count(encodeText(line))) << p.tag << ": " << line;
        EXPECT_GE(onLayer[partLayer(p.kind)], 1) << p.tag;
        kinds.insert(kindInfo(p.kind).key);
    }
    EXPECT_EQ(tags.size(), d.parts().size());
    EXPECT_GE(kinds.size(), 10u);
    EXPECT_EQ(onLayer[std::string(kWireLayer)], static_cast<int>(d.wires().size()));
    EXPECT_GE(onLayer[std::string(kTitleLayer)], 3);
    EXPECT_NE(dxf.find(encodeText(d.sheet.drawingNo)), std::string::npos);

    // A badge (shape and word) for each part with an open finding, none for the others.
    std::set<PartId> flagged;
    for (const auto& f : result->report.findings)
        if (!f.accepted)
            flagged.insert(f.parts.begin(), f.parts.end());
    EXPECT_EQ(onLayer[std::string(kBadgeLayer)], 2 * static_cast<int>(flagged.size()));
    EXPECT_EQ(onLayer[std::string(kBucketLayer)], 2 * static_cast<int>(d.buckets().size()));
}

INSTANTIATE_TEST_SUITE_P(Samples, DxfSample,
                         ::testing::Values("kestrel-mill-mcc1.lineward",
                                           "kestrel-mill-mcc1-review.lineward"));

TEST(DxfExport, ReviewSampleHasBadgesAndCleanSampleNone) {
    auto count = [](const std::string& dxf) {
        int n = 0;
        for (const auto& e : section(dxf, "ENTITIES"))
            n += e.type == "TEXT" && e.get(8) == kBadgeLayer;
        return n;
    };
    EXPECT_EQ(count(oneLineDxf(*checkedSample("kestrel-mill-mcc1.lineward"))), 0);
    EXPECT_GT(count(oneLineDxf(*checkedSample("kestrel-mill-mcc1-review.lineward"))), 3);
}

TEST(DxfExport, PlacesARotatedSymbolAsTheSheetDoesInInchesYUp) {
    lineward::test::DrawingBuilder b;
    const PartId cb =
        b.add(PartKind::Breaker, "CB-R", {{"trip_a", 100.0}, {"interrupting_ka", 65.0}});
    b.drawing().part(cb)->x = 100;
    b.drawing().part(cb)->y = 200;
    b.drawing().part(cb)->rotation = 90;
    const auto ents =
        section(oneLineDxf(*runCheck(b.drawing(), lineward::test::testTables())), "ENTITIES");
    // The breaker's line stroke (0,-20)–(0,-9) turned a quarter clockwise on the Sheet lands at
    // (120,200)–(109,200) Sheet units: (12,-20)–(10.9,-20) inches with y up.
    bool found = false;
    for (std::size_t i = 0; i + 2 < ents.size(); ++i)
        if (ents[i].type == "POLYLINE" && ents[i].get(8) == "LW-PART-BREAKER" &&
            ents[i + 1].get(10) == "12.0" && ents[i + 1].get(20) == "-20.0" &&
            ents[i + 2].get(10) == "10.9" && ents[i + 2].get(20) == "-20.0")
            found = true;
    EXPECT_TRUE(found);
}

TEST(DxfExport, WritesAtomicallyAndSaysWhyItCannot) {
    const auto dir = std::filesystem::temp_directory_path() / "lineward-dxf-test";
    std::filesystem::remove_all(dir);
    std::filesystem::create_directories(dir);
    const auto result = checkedSample("kestrel-mill-mcc1.lineward");
    const auto out = dir / "one-line.dxf";
    { std::ofstream(out) << "old"; }
    EXPECT_FALSE(writeOneLineDxf(*result, out).has_value());
    EXPECT_EQ(readFile(out.string()), oneLineDxf(*result));
    const auto why = writeOneLineDxf(*result, dir / "missing-folder" / "x.dxf");
    ASSERT_TRUE(why.has_value());
    EXPECT_NE(why->find("missing-folder"), std::string::npos) << *why;
    EXPECT_EQ(readFile(out.string()), oneLineDxf(*result)); // the earlier file is untouched
    std::filesystem::remove_all(dir);
}

// The DXF's symbols are the Sheet's: read each resources/symbols/<kind>.svg (line, rect, circle
// and path elements with M, L, C and Z) and compare with the export's strokes.
TEST(DxfSymbols, MatchTheSheetSymbolFiles) {
    const std::regex element(R"(<(line|rect|circle|path)\s([^>]*)/>)");
    const std::regex attr(R"(([a-z0-9]+)="([^"]*)\")");
    for (int k = 0; k < kPartKindCount; ++k) {
        const auto kind = static_cast<PartKind>(k);
        const std::string key(kindInfo(kind).key);
        const std::string svg = readFile(sourcePath("resources/symbols/" + key + ".svg"));
        ASSERT_FALSE(svg.empty()) << key;
        const auto& strokes = symbolStrokes(kind);
        std::size_t i = 0;
        for (auto it = std::sregex_iterator(svg.begin(), svg.end(), element);
             it != std::sregex_iterator(); ++it, ++i) {
            ASSERT_LT(i, strokes.size()) << key << ": the SVG has more strokes";
            std::map<std::string, std::string> a;
            const std::string attrs = (*it)[2];
            for (auto m = std::sregex_iterator(attrs.begin(), attrs.end(), attr);
                 m != std::sregex_iterator(); ++m)
                a[(*m)[1]] = (*m)[2];
            auto n = [&](const char* name) { return std::stod(a.at(name)); };
            const Stroke& s = strokes[i];
            const std::string type = (*it)[1];
            std::vector<SymbolPoint> want;
            if (type == "circle") {
                EXPECT_DOUBLE_EQ(s.radius, n("r")) << key;
                EXPECT_DOUBLE_EQ(s.centre.x, n("cx")) << key;
                EXPECT_DOUBLE_EQ(s.centre.y, n("cy")) << key;
                continue;
            }
            if (type == "line")
                want = {{n("x1"), n("y1")}, {n("x2"), n("y2")}};
            if (type == "rect")
                want = {{n("x"), n("y")},
                        {n("x") + n("width"), n("y")},
                        {n("x") + n("width"), n("y") + n("height")},
                        {n("x"), n("y") + n("height")}};
            std::vector<std::size_t> at; // where each SVG point lands in the stroke
            if (type == "path") {
                std::string d = a.at("d");
                EXPECT_EQ(s.closed, d.find('Z') != std::string::npos) << key;
                std::replace(d.begin(), d.end(), ',', ' ');
                std::istringstream in(d);
                std::string tok;
                std::size_t index = 0;
                char cmd = 'M';
                while (in >> tok) {
                    if (std::isalpha(static_cast<unsigned char>(tok[0]))) {
                        cmd = tok[0];
                        tok = tok.substr(1);
                        if (cmd == 'C')
                            index += 12;
                        if (cmd == 'L')
                            ++index;
                        if (tok.empty())
                            continue;
                    }
                    double y = 0;
                    in >> y;
                    if (cmd == 'C') { // control points are not on the curve: keep the end only
                        std::string c2x, c2y, ex, ey;
                        in >> c2x >> c2y >> ex >> ey;
                        want.push_back({std::stod(ex), std::stod(ey)});
                    } else {
                        want.push_back({std::stod(tok), y});
                    }
                    at.push_back(index);
                }
            } else {
                for (std::size_t j = 0; j < want.size(); ++j)
                    at.push_back(j);
                EXPECT_EQ(s.points.size(), want.size()) << key;
            }
            for (std::size_t j = 0; j < want.size(); ++j) {
                ASSERT_LT(at[j], s.points.size()) << key;
                EXPECT_NEAR(s.points[at[j]].x, want[j].x, 1e-9) << key << " point " << j;
                EXPECT_NEAR(s.points[at[j]].y, want[j].y, 1e-9) << key << " point " << j;
            }
        }
        EXPECT_EQ(i, strokes.size()) << key << ": the export has more strokes than the SVG";
    }
}

TEST(DxfExport, DocsListEveryLayer) {
    const std::string doc = readFile(sourcePath("docs/dxf.md"));
    ASSERT_FALSE(doc.empty());
    for (const auto& l : allLayers())
        EXPECT_NE(doc.find("| `" + l + "` |"), std::string::npos) << "docs/dxf.md lacks " << l;
}
