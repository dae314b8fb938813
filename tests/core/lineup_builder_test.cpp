// The lineup builder: a whole lineup from the sample load list checks with no violation, each
// branch is the bucket `lineward-cli size` proposes, and buckets land beside a bus's own.
#include "check/check.h"
#include "io/drawing_file.h"
#include "lineup/lineup_builder.h"
#include "model/ratings.h"
#include "test_support.h"

#include <fstream>
#include <gtest/gtest.h>
#include <sstream>

using namespace lineward;
using lineward::test::sourcePath;
using lineward::test::testTables;

namespace {

LoadList sampleList() {
    std::ifstream in(std::string(LINEWARD_SOURCE_DIR) + "/samples/kestrel-mill-pellet-loads.csv");
    std::stringstream ss;
    ss << in.rdbuf();
    return readLoadList(ss.str());
}

std::string violations(const CheckReport& r) {
    std::string s;
    for (const auto& f : r.findings)
        if (f.severity == Severity::Violation)
            s += f.ruleId + ": " + f.message + "\n";
    return s;
}

} // namespace

TEST(LineupBuilder, SampleListBuildsALineupThatChecksWithNoViolation) {
    const auto list = sampleList();
    ASSERT_TRUE(list.ok());
    const auto lineup = buildLineup(list.rows, {}, testTables());
    EXPECT_TRUE(lineup.refused.empty());
    EXPECT_EQ(lineup.drawing.buckets().size(), 16u);
    const auto report = checkDrawing(lineup.drawing, testTables());
    EXPECT_EQ(report.openCounts[2], 0) << violations(report);
}

TEST(LineupBuilder, EveryBranchConductorIsTheSizeProposal) {
    const auto list = sampleList();
    const auto lineup = buildLineup(list.rows, {}, testTables());
    for (const auto& row : list.rows) {
        SizeOptions o;
        o.device = row.protection == LoadProtection::InstBreaker ? ScpdType::InstantaneousBreaker
                   : row.protection == LoadProtection::Fuse      ? ScpdType::TimeDelayFuse
                                                                 : ScpdType::InverseTimeBreaker;
        std::string why;
        const auto p = proposeBucket(row.motor, o, testTables(), why);
        ASSERT_TRUE(p) << why;
        const Part* cable = lineup.drawing.partByTag("C-" + row.motor.tag);
        ASSERT_NE(cable, nullptr) << row.motor.tag;
        EXPECT_EQ(CableRatings::of(*cable).size, p->conductorSize) << row.motor.tag;
        EXPECT_EQ(CableRatings::of(*cable).lengthFt, row.lengthFt) << row.motor.tag;
    }
}

TEST(LineupBuilder, FeederFollowsTheLoad) {
    // One 100 hp 460 V motor: FLC 124 A (NEC 2023 Table 430.250); 430.24 load 1.25 × 124 =
    // 155 A → a 175 A main (240.6(A)), a 150 kVA transformer (180 A rated at 480 V).
    const auto list = readLoadList("tag,hp,volts\nP-1,100,460\n");
    ASSERT_TRUE(list.ok());
    const auto lineup = buildLineup(list.rows, {}, testTables());
    const auto& d = lineup.drawing;
    EXPECT_EQ(BreakerRatings::of(*d.partByTag("CB-MAIN")).tripA, 175.0);
    EXPECT_EQ(TransformerRatings::of(*d.partByTag("TX-1")).kva, 150.0);
    EXPECT_EQ(BusRatings::of(*d.partByTag("MCC-1")).amps, 600.0);
    EXPECT_EQ(checkDrawing(d, testTables()).openCounts[2], 0)
        << violations(checkDrawing(d, testTables()));
}

TEST(LineupBuilder, DriveAndSoftStarterRowsBuildTheirBucketsAndCheckClean) {
    const auto list = readLoadList("tag,hp,volts,fla,protection,starter\n"
                                   "P-1,7.5,460,10.5,breaker,vfd\n"
                                   "P-2,40,460,49,fuse,vfd\n"
                                   "P-3,20,460,25,breaker,soft\n"
                                   "P-4,10,460,13,inst_breaker,vfd\n"
                                   "P-5,60,460,72,inst_breaker,soft\n");
    ASSERT_TRUE(list.ok());
    const auto lineup = buildLineup(list.rows, {}, testTables());
    ASSERT_TRUE(lineup.refused.empty());
    const Drawing& d = lineup.drawing;
    const auto report = checkDrawing(d, testTables());
    EXPECT_EQ(report.openCounts[2], 0) << violations(report);
    for (const auto& f : report.findings)
        EXPECT_NE(f.ruleId, "curve.nuisance") << f.message;
    // A drive bucket: no contactor, no overload relay (430.124(A)); its output current is the
    // motor current, the larger of FLC 11 A (NEC 2023 Table 430.250, from memory) and FLA
    // 10.5 A; input 1.1 × output = 12.1 A (common practice); the cable carries 1.25 × 12.1 =
    // 15.1 A (430.122(A)): 12 AWG, 20 A at 60 °C terminations (NEC 2023 Table 310.16, from
    // memory), where 125 % FLC = 13.75 A alone would take 14 AWG (15 A).
    EXPECT_EQ(d.partByTag("OL-P-1"), nullptr);
    EXPECT_EQ(d.partByTag("K-P-1"), nullptr);
    const auto vfd = VfdRatings::of(*d.partByTag("VFD-P-1"));
    EXPECT_DOUBLE_EQ(vfd.outputA, 11.0);
    EXPECT_DOUBLE_EQ(vfd.inputA, 12.1);
    EXPECT_EQ(CableRatings::of(*d.partByTag("C-P-1")).size, "12 AWG");
    // Its breaker: within 1.75 × 12.1 = 21.2 A (the listing maximum assumed, common practice)
    // → 20 A (240.6(A)), below the 430.52 limit 250 % × 11 = 27.5 → 30 A.
    EXPECT_DOUBLE_EQ(BreakerRatings::of(*d.partByTag("CB-P-1")).tripA, 20.0);
    // An instantaneous-only breaker cannot stand without a relay: the drive row gets an
    // inverse-time breaker and a note says why.
    EXPECT_EQ(d.partByTag("MCP-P-4"), nullptr);
    EXPECT_NE(d.partByTag("CB-P-4"), nullptr);
    // A soft-starter bucket keeps its overload relay and has no contactor (the bypass is a
    // field of the soft starter).
    EXPECT_NE(d.partByTag("OL-P-3"), nullptr);
    EXPECT_EQ(d.partByTag("K-P-3"), nullptr);
    const auto ss = SoftStarterRatings::of(*d.partByTag("SS-P-3"));
    EXPECT_DOUBLE_EQ(ss.amps, 27.0);
    EXPECT_TRUE(ss.bypass);
    int said = 0;
    for (const auto& n : lineup.notes)
        said += n.find("assumed") != std::string::npos ||
                n.find("inverse-time breaker instead") != std::string::npos;
    EXPECT_GE(said, 4);
    for (const auto& n : lineup.notes)
        EXPECT_EQ(n.find("no drive part"), std::string::npos) << n;
}

TEST(LineupBuilder, BucketsForAnExistingBusGoRightOfItsBuckets) {
    auto loaded = io::loadDrawing(sourcePath("samples/kestrel-mill-mcc1.lineward"));
    ASSERT_TRUE(loaded);
    const Drawing& d = *loaded.drawing;
    const Part* mcc = d.partByTag("MCC-1");
    const auto list = readLoadList("tag,hp,volts,fla\nP-120,15,460,19\nP-105,5,460,\n");
    const auto plan = planBuckets(d, mcc->id, list.rows, 65, testTables());
    ASSERT_EQ(plan.buckets.size(), 1u);
    ASSERT_EQ(plan.refused.size(), 1u) << "P-105 is a tag the drawing already has";
    EXPECT_EQ(plan.refused[0].line, 3);
    double right = 0;
    for (const auto& p : d.parts())
        if (p.y > mcc->y)
            right = std::max(right, p.x);
    EXPECT_GT(plan.buckets[0].parts.front().x, right - 111);
    Drawing after = d;
    after.addParts(plan.allParts());
    after.addWires(plan.allWires());
    after.addBuckets(plan.allBuckets());
    EXPECT_EQ(checkDrawing(after, testTables()).openCounts[2], 0)
        << violations(checkDrawing(after, testTables()));
}

TEST(LineupBuilder, ImportOntoTheSameBusGivesTheSameBuckets) {
    // The window's Import (planBuckets onto a bus) and `lineward-cli new` (buildLineup) share one
    // function: importing the list onto the new lineup's empty bus gives the same parts, wires
    // and buckets.
    const auto list = sampleList();
    const auto lineup = buildLineup(list.rows, {}, testTables());
    Drawing empty = lineup.drawing;
    std::vector<PartId> bucketParts;
    for (const auto& p : lineup.drawing.parts())
        if (p.id.value > 4)
            bucketParts.push_back(p.id);
    empty.removeParts(bucketParts);
    for (const auto& b : lineup.drawing.buckets())
        empty.removeBucket(b.id);
    const Part* bus = empty.partByTag("MCC-1");
    ASSERT_NE(bus, nullptr);
    const double duty = *lineup.drawing.buckets().front().sccrKa;
    const auto plan = planBuckets(empty, bus->id, list.rows, duty, testTables());
    Drawing imported = empty;
    imported.addParts(plan.allParts());
    imported.addWires(plan.allWires());
    imported.addBuckets(plan.allBuckets());
    // Ids differ (a drawing never reuses a removed part's id); everything else is equal.
    auto sameButId = [](Part a, Part b) {
        a.id = b.id;
        return a == b;
    };
    for (const auto& p : lineup.drawing.parts()) {
        const Part* q = imported.partByTag(p.tag);
        ASSERT_NE(q, nullptr) << p.tag;
        EXPECT_TRUE(sameButId(*q, p)) << p.tag;
    }
    auto tagsOf = [](const Drawing& d, const Bucket& b) {
        std::vector<std::string> tags;
        for (PartId id : b.parts)
            tags.push_back(d.part(id)->tag);
        return tags;
    };
    ASSERT_EQ(imported.buckets().size(), lineup.drawing.buckets().size());
    for (std::size_t i = 0; i < imported.buckets().size(); ++i) {
        const Bucket &a = imported.buckets()[i], &b = lineup.drawing.buckets()[i];
        EXPECT_EQ(a.tag, b.tag);
        EXPECT_EQ(a.sccrKa, b.sccrKa);
        EXPECT_EQ(tagsOf(imported, a), tagsOf(lineup.drawing, b));
    }
    EXPECT_EQ(imported.wires().size(), lineup.drawing.wires().size());
}

TEST(LineupBuilder, ARowWhoseBucketTagsClashIsRefused) {
    // "K-X" is the contactor tag of motor "X": the later row is refused, the earlier one kept.
    const auto list = readLoadList("hp,tag,volts\n10,K-X,460\n10,X,460\n");
    ASSERT_TRUE(list.ok());
    const auto lineup = buildLineup(list.rows, {}, testTables());
    ASSERT_EQ(lineup.refused.size(), 1u);
    EXPECT_EQ(lineup.refused[0].line, 3);
    EXPECT_EQ(lineup.refused[0].column, 4);
    EXPECT_NE(lineup.refused[0].reason.find("'K-X'"), std::string::npos);
    EXPECT_EQ(lineup.drawing.buckets().size(), 1u);
}
