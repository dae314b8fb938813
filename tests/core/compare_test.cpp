// Comparing two revisions: pairing parts, value changes in the file's spelling, wires, buckets,
// sheet and settings, and findings new / resolved / still open.
#include "compare/compare_format.h"
#include "compare/drawing_compare.h"
#include "io/drawing_file.h"
#include "test_support.h"

#include <algorithm>
#include <gtest/gtest.h>

namespace lineward {
namespace {

using test::smallLineup;
using test::testTables;

const PartChange* changeOf(const DrawingComparison& c, const std::string& tag) {
    for (const auto& p : c.partsChanged)
        if (p.tag == tag)
            return &p;
    return nullptr;
}

const ValueChange* fieldOf(const PartChange& p, const std::string& key) {
    for (const auto& v : p.fields)
        if (v.key == key)
            return &v;
    return nullptr;
}

bool hasFinding(const std::vector<FindingRef>& list, const std::string& rule,
                const std::string& tag) {
    return std::any_of(list.begin(), list.end(), [&](const FindingRef& f) {
        return f.rule == rule && std::find(f.tags.begin(), f.tags.end(), tag) != f.tags.end();
    });
}

Part& partByTag(Drawing& d, const std::string& tag) {
    const Part* p = d.partByTag(tag);
    EXPECT_NE(p, nullptr) << tag;
    return *d.part(p->id);
}

TEST(Compare, SameDrawingIsTheSameAndKeepsItsFindingsOpen) {
    const Drawing d = smallLineup();
    const auto c = compareDrawings(d, d, testTables());
    EXPECT_TRUE(c.same());
    EXPECT_TRUE(c.partsChanged.empty());
    EXPECT_TRUE(c.findingsNew.empty());
    EXPECT_TRUE(c.findingsResolved.empty());
    EXPECT_EQ(c.findingsOpen.size(), checkDrawing(d, testTables()).findings.size());
}

TEST(Compare, ChangedRatingGivesOldAndNewValueAndTheNewFinding) {
    const Drawing before = smallLineup();
    Drawing after = before;
    // 430.32(A)(1): 125 % of the 32 A nameplate is 40 A, so 45 A is too high.
    ASSERT_FALSE(partByTag(after, "OL-1").set("setting_a", 45.0));
    const auto c = compareDrawings(before, after, testTables());
    EXPECT_FALSE(c.same());
    ASSERT_EQ(c.partsChanged.size(), 1u);
    const PartChange& p = c.partsChanged.front();
    EXPECT_EQ(p.tag, "OL-1");
    EXPECT_EQ(p.oldId, p.newId);
    ASSERT_EQ(p.fields.size(), 1u);
    EXPECT_EQ(p.fields[0].key, "setting_a");
    EXPECT_EQ(p.fields[0].oldValue.dump(), "32"); // the file's spelling: no fraction
    EXPECT_EQ(p.fields[0].newValue.dump(), "45");
    EXPECT_TRUE(hasFinding(c.findingsNew, "branch.overload.setting", "OL-1"));
    EXPECT_TRUE(c.findingsResolved.empty());
    // Backwards, the same finding is resolved.
    const auto back = compareDrawings(after, before, testTables());
    EXPECT_TRUE(hasFinding(back.findingsResolved, "branch.overload.setting", "OL-1"));
    EXPECT_TRUE(back.findingsNew.empty());
}

TEST(Compare, FindingWhoseMessageChangesStaysOpen) {
    Drawing a = smallLineup();
    ASSERT_FALSE(partByTag(a, "OL-1").set("setting_a", 45.0));
    Drawing b = a;
    ASSERT_FALSE(partByTag(b, "OL-1").set("setting_a", 46.0)); // still above 40 A
    const auto c = compareDrawings(a, b, testTables());
    EXPECT_TRUE(hasFinding(c.findingsOpen, "branch.overload.setting", "OL-1"));
    EXPECT_FALSE(hasFinding(c.findingsNew, "branch.overload.setting", "OL-1"));
    EXPECT_FALSE(hasFinding(c.findingsResolved, "branch.overload.setting", "OL-1"));
}

TEST(Compare, RemovedPartTakesItsWiresAndRaisesTheFindingsOfItsAbsence) {
    const Drawing before = smallLineup();
    Drawing after = before;
    const PartId ol = before.partByTag("OL-1")->id;
    const PartId k = before.partByTag("K-1")->id;
    const PartId cable = before.partByTag("C-1")->id;
    after.removePart(ol);
    after.addWire(Wire{after.nextWireId(), {k, 1}, {cable, 0}});
    const auto c = compareDrawings(before, after, testTables());
    ASSERT_EQ(c.partsRemoved.size(), 1u);
    EXPECT_EQ(c.partsRemoved[0].part.tag, "OL-1");
    EXPECT_EQ(c.wiresRemoved.size(), 2u);
    ASSERT_EQ(c.wiresAdded.size(), 1u);
    EXPECT_EQ(c.wiresAdded[0].a.tag, "K-1");
    EXPECT_EQ(c.wiresAdded[0].b.tag, "C-1");
    EXPECT_TRUE(hasFinding(c.findingsNew, "topology.motor.no_overload", "M-1"));
    // The bucket lost the part: its members changed, named by tag.
    ASSERT_EQ(c.bucketsChanged.size(), 1u);
    EXPECT_EQ(c.bucketsChanged[0].fields[0].key, "parts");
    EXPECT_EQ(valueText(c.bucketsChanged[0].fields[0].oldValue), "CB-1, K-1, OL-1");
    EXPECT_EQ(valueText(c.bucketsChanged[0].fields[0].newValue), "CB-1, K-1");
    const auto back = compareDrawings(after, before, testTables());
    ASSERT_EQ(back.partsAdded.size(), 1u);
    EXPECT_EQ(back.partsAdded[0].part.tag, "OL-1");
    EXPECT_TRUE(hasFinding(back.findingsResolved, "topology.motor.no_overload", "M-1"));
}

// The same drawing with every id moved (another person drew it in another order).
Drawing renumbered(const Drawing& d, std::uint32_t offset) {
    Drawing out;
    out.sheet = d.sheet;
    out.settings = d.settings;
    auto id = [&](PartId p) { return PartId(p.value + offset); };
    std::vector<Part> parts;
    for (Part p : d.parts()) {
        p.id = id(p.id);
        parts.push_back(p);
    }
    out.addParts(parts);
    for (const auto& w : d.wires())
        out.addWire(Wire{WireId(w.id.value + offset),
                         {id(w.a.part), w.a.terminal},
                         {id(w.b.part), w.b.terminal}});
    for (Bucket b : d.buckets()) {
        for (auto& p : b.parts)
            p = id(p);
        out.addBucket(b);
    }
    return out;
}

TEST(Compare, RenumberedDrawingIsTheSame) {
    const Drawing d = smallLineup();
    const auto c = compareDrawings(d, renumbered(d, 100), testTables());
    EXPECT_TRUE(c.same()) << comparisonText(c, "a", "b");
    EXPECT_TRUE(c.findingsNew.empty());
    EXPECT_TRUE(c.findingsResolved.empty());
}

TEST(Compare, RetaggedPartIsAChangeNotARemovalAndAnAddition) {
    const Drawing before = smallLineup();
    Drawing after = renumbered(before, 7); // ids moved too: paired by its place
    partByTag(after, "M-1").tag = "P-1";
    const auto c = compareDrawings(before, after, testTables());
    EXPECT_TRUE(c.partsAdded.empty());
    EXPECT_TRUE(c.partsRemoved.empty());
    const PartChange* p = changeOf(c, "P-1");
    ASSERT_NE(p, nullptr);
    EXPECT_NE(p->oldId, p->newId);
    const ValueChange* tag = fieldOf(*p, "tag");
    ASSERT_NE(tag, nullptr);
    EXPECT_EQ(valueText(tag->oldValue), "M-1");
    EXPECT_EQ(valueText(tag->newValue), "P-1");
}

TEST(Compare, SheetSettingsBucketsAndAcceptedDeviations) {
    const Drawing before = smallLineup();
    Drawing after = before;
    after.sheet.checkedBy = "R. Vance";
    after.sheet.revisions.push_back({"C", "2026-12-01", "R. Vance", "feeder resized", ""});
    after.settings.vdropBranchPct = 2.5;
    Bucket b = after.buckets().front();
    b.sccrKa = 42.0;
    after.updateBucket(b);
    after.addBucket(Bucket{after.nextBucketId(), "MCC-1B", 65.0, {}});
    after.accepted().push_back(
        {"bus.load", {after.partByTag("MCC")->id}, "R. Vance", "2026-12-01", "temporary"});
    const auto c = compareDrawings(before, after, testTables());
    ASSERT_EQ(c.sheet.size(), 2u);
    EXPECT_EQ(c.sheet[0].key, "checked_by");
    EXPECT_EQ(c.sheet[1].key, "revisions");
    ASSERT_EQ(c.settings.size(), 1u);
    EXPECT_EQ(c.settings[0].key, "vdrop_branch_pct");
    EXPECT_EQ(c.settings[0].oldValue.dump(), "3");
    EXPECT_EQ(c.settings[0].newValue.dump(), "2.5");
    ASSERT_EQ(c.bucketsChanged.size(), 1u);
    EXPECT_EQ(c.bucketsChanged[0].fields[0].key, "sccr_ka");
    ASSERT_EQ(c.bucketsAdded.size(), 1u);
    EXPECT_EQ(c.bucketsAdded[0].tag, "MCC-1B");
    ASSERT_EQ(c.acceptedAdded.size(), 1u);
    EXPECT_EQ(c.acceptedAdded[0].tags, std::vector<std::string>{"MCC"});
}

TEST(Compare, JsonHasThePromisedKeysAndShapes) {
    const Drawing before = smallLineup();
    Drawing after = before;
    ASSERT_FALSE(partByTag(after, "OL-1").set("setting_a", 45.0));
    const auto j = comparisonJson(compareDrawings(before, after, testTables()), "a", "b");
    for (const char* key : {"parts_added", "parts_removed", "parts_changed", "wires_added",
                            "wires_removed", "findings_new", "findings_resolved", "findings_open"})
        EXPECT_TRUE(j.contains(key) && j[key].is_array()) << key;
    EXPECT_FALSE(j["same"].get<bool>());
    const auto& p = j["parts_changed"][0];
    EXPECT_EQ(p["tag"], "OL-1");
    EXPECT_EQ(p["fields"]["setting_a"].dump(), "[32,45]");
    const auto& f = j["findings_new"][0];
    EXPECT_EQ(f["rule"], "branch.overload.setting");
    EXPECT_EQ(f["severity"], "violation");
    EXPECT_EQ(f["parts"][0], "OL-1");
}

TEST(Compare, TextEscapesControlCharactersFromTheFile) {
    const Drawing before = smallLineup();
    Drawing after = before;
    partByTag(after, "M-1").tag = "M-1\x1b[2J";
    const std::string text = comparisonText(compareDrawings(before, after, testTables()), "a", "b");
    EXPECT_EQ(text.find('\x1b'), std::string::npos);
    EXPECT_NE(text.find("M-1\\x1b[2J"), std::string::npos) << text;
}

// Review comments: one resolved, one reworded, one deleted and one new between revisions.
Drawing withComments() {
    Drawing d = smallLineup();
    d.comments().push_back({1, d.partByTag("OL-1")->id, "R. Vance", "2026-11-20",
                            "setting from the nameplate?", false});
    d.comments().push_back({2, d.partByTag("M-1")->id, "R. Vance", "2026-11-20", "FLA?", false});
    d.comments().push_back({3, d.partByTag("MCC")->id, "T. Okafor", "2026-11-21", "bracing", false});
    return d;
}

const CommentChange* commentChangeOf(const DrawingComparison& c, std::uint32_t id) {
    for (const auto& x : c.commentsChanged)
        if (x.newId == id)
            return &x;
    return nullptr;
}

TEST(Compare, CommentsAddedRemovedResolvedAndReworded) {
    const Drawing before = withComments();
    Drawing after = before;
    auto& comments = after.comments();
    comments[0].resolved = true;           // C1 resolved
    comments[1].text = "FLA from the data sheet"; // C2 reworded
    comments.erase(comments.begin() + 2);  // C3 deleted
    comments.push_back({4, after.partByTag("CB-1")->id, "T. Okafor", "2026-12-01", "trip?", false});
    const auto c = compareDrawings(before, after, testTables());
    EXPECT_FALSE(c.same()); // only comments differ, and that is a difference (exit 1)
    EXPECT_TRUE(c.partsChanged.empty());
    ASSERT_EQ(c.commentsAdded.size(), 1u);
    EXPECT_EQ(c.commentsAdded[0].id, 4u);
    EXPECT_EQ(c.commentsAdded[0].tag, "CB-1");
    ASSERT_EQ(c.commentsRemoved.size(), 1u);
    EXPECT_EQ(c.commentsRemoved[0].id, 3u);
    EXPECT_EQ(c.commentsRemoved[0].tag, "MCC");
    ASSERT_EQ(c.commentsChanged.size(), 2u);
    const CommentChange* resolved = commentChangeOf(c, 1);
    ASSERT_NE(resolved, nullptr);
    ASSERT_EQ(resolved->fields.size(), 1u);
    EXPECT_EQ(resolved->fields[0].key, "status");
    EXPECT_EQ(valueText(resolved->fields[0].oldValue), "open");
    EXPECT_EQ(valueText(resolved->fields[0].newValue), "resolved");
    const CommentChange* reworded = commentChangeOf(c, 2);
    ASSERT_NE(reworded, nullptr);
    ASSERT_EQ(reworded->fields.size(), 1u);
    EXPECT_EQ(reworded->fields[0].key, "text");
    EXPECT_EQ(valueText(reworded->fields[0].newValue), "FLA from the data sheet");
    EXPECT_EQ(reworded->tag, "M-1");

    const std::string text = comparisonText(c, "a", "b");
    EXPECT_NE(text.find("Comments added (1)\n  + C4 on CB-1 · open · T. Okafor 2026-12-01: trip?"),
              std::string::npos)
        << text;
    EXPECT_NE(text.find("Comments removed (1)\n  - C3 on MCC"), std::string::npos) << text;
    EXPECT_NE(text.find("~ C1 on OL-1: status open → resolved"), std::string::npos) << text;

    const auto j = comparisonJson(c, "a", "b");
    ASSERT_TRUE(j["comments_added"].is_array());
    EXPECT_EQ(j["comments_added"][0]["id"], "C4");
    EXPECT_EQ(j["comments_added"][0]["part"], "CB-1");
    EXPECT_EQ(j["comments_added"][0]["status"], "open");
    EXPECT_EQ(j["comments_removed"][0]["text"], "bracing");
    ASSERT_EQ(j["comments_changed"].size(), 2u);
    EXPECT_EQ(j["comments_changed"][0]["id"], "C1");
    EXPECT_EQ(j["comments_changed"][0]["fields"]["status"].dump(), "[\"open\",\"resolved\"]");
}

TEST(Compare, CommentsRenumberedWithTheirPartsAreTheSame) {
    const Drawing before = withComments();
    Drawing after = renumbered(before, 50);
    for (Comment x : before.comments()) {
        x.id += 10; // renumbered comments, same author, date and text on the paired parts
        x.part = PartId(x.part.value + 50);
        after.comments().push_back(x);
    }
    const auto c = compareDrawings(before, after, testTables());
    EXPECT_TRUE(c.same()) << comparisonText(c, "a", "b");
    // A comment moved to another part is one removed and one added, not a change.
    Drawing moved = before;
    moved.comments()[1].part = moved.partByTag("OL-1")->id;
    const auto m = compareDrawings(before, moved, testTables());
    EXPECT_EQ(m.commentsAdded.size(), 1u);
    EXPECT_EQ(m.commentsRemoved.size(), 1u);
    EXPECT_TRUE(m.commentsChanged.empty());
}

// The samples: the colleague's earlier layout (with the mistakes samples/README.md lists)
// against the issued revision B. Each value mistake is a change with the mistaken value as the
// old one and the corrected value as the new one; every finding of the earlier layout is
// resolved.
TEST(Compare, ReviewSampleAgainstIssuedSample) {
    auto review = io::loadDrawing(test::sourcePath("samples/kestrel-mill-mcc1-review.lineward"));
    auto issued = io::loadDrawing(test::sourcePath("samples/kestrel-mill-mcc1.lineward"));
    ASSERT_TRUE(review && issued);
    const auto oldResult = runCheck(*review.drawing, testTables());
    const auto newResult = runCheck(*issued.drawing, testTables());
    const auto c = compareDrawings(*oldResult, *newResult);
    struct Row {
        const char* tag;
        const char* key;
        const char* oldValue;
        const char* newValue;
    };
    for (const Row& r :
         {Row{"OL-101", "setting_a", "45", "32"}, Row{"MCP-102", "pickup_a", "270", "375"},
          Row{"FU-103", "amps", "12", "25"}, Row{"C-103", "egc_size", "14 AWG", "12 AWG"},
          Row{"CB-104", "interrupting_ka", "10", "65"}, Row{"P-105", "volts", "230", "460"},
          Row{"DS-106", "hp_rating", "10", "15"}, Row{"K-107", "nema_size", "3", "4"},
          Row{"C-109", "size", "10 AWG", "8 AWG"}, Row{"CB-112", "trip_a", "100", "70"},
          Row{"OL-112", "setting_a", "22", "25.4"}, Row{"FU-110", "amps", "15", "10"},
          Row{"C-F1", "size", "4/0 AWG", "250 kcmil"}, Row{"MCC-1", "amps", "400", "600"},
          Row{"MCC-1", "bracing_ka", "10", "42"}, Row{"K-109", "tag", "K-108", "K-109"}}) {
        const PartChange* p = changeOf(c, r.tag);
        ASSERT_NE(p, nullptr) << r.tag << "\n" << comparisonText(c, "review", "issued");
        const ValueChange* v = fieldOf(*p, r.key);
        ASSERT_NE(v, nullptr) << r.tag << " " << r.key;
        EXPECT_EQ(valueText(v->oldValue), r.oldValue) << r.tag << " " << r.key;
        EXPECT_EQ(valueText(v->newValue), r.newValue) << r.tag << " " << r.key;
    }
    std::vector<std::string> removed;
    for (const auto& p : c.partsRemoved)
        removed.push_back(p.part.tag);
    for (const char* tag : {"CB-HT1", "C-HT1", "HT-1", "TX-2", "CB-TIE"})
        EXPECT_NE(std::find(removed.begin(), removed.end(), tag), removed.end()) << tag;
    std::vector<std::string> added;
    for (const auto& p : c.partsAdded)
        added.push_back(p.part.tag);
    EXPECT_NE(std::find(added.begin(), added.end(), "OL-104"), added.end());
    EXPECT_EQ(c.findingsResolved.size() + c.findingsOpen.size(), oldResult->report.findings.size());
    EXPECT_EQ(c.findingsNew.size() + c.findingsOpen.size(), newResult->report.findings.size());
    EXPECT_TRUE(hasFinding(c.findingsResolved, "topology.loop", "CB-TIE"));
    EXPECT_TRUE(hasFinding(c.findingsResolved, "branch.overload.setting", "OL-101"));
    EXPECT_TRUE(c.findingsNew.empty()) << comparisonText(c, "review", "issued");
}

} // namespace
} // namespace lineward
