// Topology: nodes from wired terminals, feeding, loops, voltage levels and overload presence.
#include "check/check.h"
#include "test_support.h"
#include "topology/network.h"

#include <algorithm>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::test;

namespace {

std::vector<std::string> rulesOf(const Drawing& d) {
    std::vector<std::string> ids;
    for (const auto& f : checkDrawing(d, testTables()).findings)
        ids.push_back(f.ruleId);
    std::sort(ids.begin(), ids.end());
    return ids;
}

int countRule(const Drawing& d, const std::string& rule) {
    const auto ids = rulesOf(d);
    return static_cast<int>(std::count(ids.begin(), ids.end(), rule));
}

} // namespace

TEST(Network, BusIsOneNodeAndBranchesJoinNodes) {
    Drawing d = smallLineup();
    Network net(d);
    // Nodes: source/pri, sec/main line, bus, cb/k, k/ol, ol/cable, cable/motor = 7.
    EXPECT_EQ(net.nodeCount(), 7u);
    EXPECT_EQ(boost::num_edges(net.graph()), 6u);                  // tx, main, cb, k, ol, cable
    EXPECT_EQ(net.nodeOf(PartId(3), 1), net.nodeOf(PartId(4), 0)); // main load = bus
    EXPECT_EQ(net.nodeOf(PartId(4), 0), net.nodeOf(PartId(5), 0)); // bus = CB-1 line
    EXPECT_TRUE(net.partEnergized(PartId(9)));
    EXPECT_DOUBLE_EQ(net.graph()[net.nodeOf(PartId(9), 0)].nominalV, 480.0);
    EXPECT_DOUBLE_EQ(net.graph()[net.nodeOf(PartId(1), 0)].nominalV, 13800.0);
}

TEST(Network, BranchChainRunsFromMotorToItsBus) {
    Drawing d = smallLineup();
    Network net(d);
    const auto chain = net.branchChain(PartId(9));
    const std::vector<PartId> expect{PartId(8), PartId(7), PartId(6), PartId(5)};
    EXPECT_EQ(chain, expect);
}

TEST(Topology, CleanLineupHasNoFindings) {
    // Its one note says its generic branch breaker is undecided against the main at the
    // listing limits (taps_and_methods_test.cpp works the numbers); nothing else.
    const std::vector<std::string> expect{"curve.selectivity.listing"};
    EXPECT_EQ(rulesOf(smallLineup()), expect);
}

TEST(Topology, UnwiredMotorIsUnfedAndDangling) {
    Drawing d = smallLineup();
    Part m = Part::make(PartKind::Motor, d.nextPartId(), "M-2");
    ASSERT_FALSE(m.set("volts", 460.0));
    ASSERT_FALSE(m.set("hp", 5.0));
    d.addPart(m);
    EXPECT_EQ(countRule(d, "topology.unfed"), 1);
    EXPECT_EQ(countRule(d, "topology.dangling"), 1);
}

TEST(Topology, OpenBreakerDeEnergizesButDoesNotUnfeed) {
    Drawing d = smallLineup();
    ASSERT_FALSE(d.part(PartId(5))->set("open", true));
    EXPECT_EQ(countRule(d, "topology.deenergized"), 1);
    EXPECT_EQ(countRule(d, "topology.unfed"), 0);
    const auto r = checkDrawing(d, testTables());
    EXPECT_FALSE(r.hasOpenAtLeast(Severity::Caution)); // a note only
}

TEST(Topology, ParallelTransformersWithClosedTieFormALoop) {
    Drawing d = smallLineup();
    Part tx2 = *d.part(PartId(2));
    tx2.id = d.nextPartId();
    tx2.tag = "TX-2";
    d.addPart(tx2);
    Part tie = *d.part(PartId(3));
    tie.id = d.nextPartId();
    tie.tag = "CB-TIE";
    d.addPart(tie);
    d.addWire(Wire{d.nextWireId(), {PartId(1), 0}, {tx2.id, 0}});
    d.addWire(Wire{d.nextWireId(), {tx2.id, 1}, {tie.id, 0}});
    d.addWire(Wire{d.nextWireId(), {tie.id, 1}, {PartId(4), 0}});
    EXPECT_EQ(countRule(d, "topology.loop"), 1);
    // Opening the tie removes the loop; the transformer side stays energized.
    ASSERT_FALSE(d.part(tie.id)->set("open", true));
    EXPECT_EQ(countRule(d, "topology.loop"), 0);
    EXPECT_EQ(countRule(d, "topology.deenergized"), 0);
}

TEST(Topology, TwoSourcesOnOneClosedNetworkAreALoop) {
    Drawing d = smallLineup();
    Part src2 = *d.part(PartId(1));
    src2.id = d.nextPartId();
    src2.tag = "GEN";
    d.addPart(src2);
    d.addWire(Wire{d.nextWireId(), {src2.id, 0}, {PartId(2), 0}});
    const auto r = checkDrawing(d, testTables());
    auto it = std::find_if(r.findings.begin(), r.findings.end(),
                           [](const Finding& f) { return f.ruleId == "topology.loop"; });
    ASSERT_NE(it, r.findings.end());
    EXPECT_EQ(it->parts.size(), 2u); // both sources named
}

// A 460 V motor on a 480 V system is normal practice (NEMA MG 1-12.44: ±10 % of rating);
// a 230 V motor on the same bus is not.
struct VoltCase {
    double motorV;
    bool mismatch;
};
class MotorVoltage : public ::testing::TestWithParam<VoltCase> {};
TEST_P(MotorVoltage, JudgedAgainstSystemVoltage) {
    Drawing d = smallLineup();
    ASSERT_FALSE(d.part(PartId(9))->set("volts", GetParam().motorV));
    EXPECT_EQ(countRule(d, "topology.voltage.mismatch"), GetParam().mismatch ? 1 : 0);
}
INSTANTIATE_TEST_SUITE_P(NemaUtilisation, MotorVoltage,
                         ::testing::Values(VoltCase{460, false}, VoltCase{480, false},
                                           VoltCase{230, true}, VoltCase{575, true},
                                           VoltCase{200, true}));

TEST(Topology, TransformerPrimaryMustMatchItsSystem) {
    Drawing d = smallLineup();
    ASSERT_FALSE(d.part(PartId(2))->set("pri_v", 4160.0));
    const auto r = checkDrawing(d, testTables());
    ASSERT_EQ(countRule(d, "topology.voltage.mismatch"), 1);
    auto it = std::find_if(r.findings.begin(), r.findings.end(), [](const Finding& f) {
        return f.ruleId == "topology.voltage.mismatch";
    });
    EXPECT_EQ(it->parts.front(), PartId(2));
    EXPECT_DOUBLE_EQ(*it->computed, 13800.0);
    EXPECT_DOUBLE_EQ(*it->limit, 4160.0);
}

TEST(Topology, MotorWithoutOverloadInItsBranch) {
    Drawing d = smallLineup();
    // Remove the overload relay and close the gap with a wire from contactor to cable.
    d.removePart(PartId(7));
    d.addWire(Wire{d.nextWireId(), {PartId(6), 1}, {PartId(8), 0}});
    EXPECT_EQ(countRule(d, "topology.motor.no_overload"), 1);
}

TEST(Topology, OverloadUpstreamOfABranchJunctionDoesNotCount) {
    // Two motors tapped off one overload relay's load side: the relay is not in either
    // motor's own branch (each branch stops at the junction).
    Drawing d = smallLineup();
    Part m2 = *d.part(PartId(9));
    m2.id = d.nextPartId();
    m2.tag = "M-2";
    d.addPart(m2);
    d.addWire(Wire{d.nextWireId(), {PartId(7), 1}, {m2.id, 0}});
    EXPECT_EQ(countRule(d, "topology.motor.no_overload"), 2);
}

TEST(Topology, InstantaneousBreakerNeedsOverloadInItsBucket) {
    DrawingBuilder b;
    auto src = b.add(PartKind::Source, "U", {{"kv", 0.48}, {"fault_ka", 30.0}});
    auto bus = b.add(PartKind::Bus, "B", {{"volts", 480.0}, {"amps", 600.0}});
    auto mcp = b.add(PartKind::InstBreaker, "MCP",
                     {{"amps", 50.0}, {"pickup_a", 300.0}, {"interrupting_ka", 65.0}});
    auto k = b.add(PartKind::Contactor, "K", {{"nema_size", std::string("1")}});
    auto ol = b.add(PartKind::Overload, "OL", {{"setting_a", 14.0}});
    auto m = b.add(PartKind::Motor, "M", {{"hp", 10.0}, {"volts", 460.0}});
    b.wire(src, 0, bus, 0);
    b.wire(bus, 0, mcp, 0);
    b.wire(mcp, 1, k, 0);
    b.wire(k, 1, ol, 0);
    b.wire(ol, 1, m, 0);
    Drawing d = b.drawing();
    EXPECT_EQ(countRule(d, "topology.inst_breaker.no_overload"), 1); // in no bucket
    d.addBucket(Bucket{d.nextBucketId(), "B1", 65.0, {mcp, k}});
    EXPECT_EQ(countRule(d, "topology.inst_breaker.no_overload"), 1); // bucket lacks the relay
    Bucket full = *d.bucket(BucketId(1));
    full.parts.push_back(ol);
    ASSERT_TRUE(d.updateBucket(full));
    EXPECT_EQ(countRule(d, "topology.inst_breaker.no_overload"), 0);
}

TEST(Check, AcceptedDeviationIsMarkedAndNotCounted) {
    Drawing d = smallLineup();
    ASSERT_FALSE(d.part(PartId(9))->set("volts", 400.0)); // 13 % off a 460 V rating
    auto r = checkDrawing(d, testTables());
    ASSERT_EQ(countRule(d, "topology.voltage.mismatch"), 1);
    const int before = r.openCounts[2];
    d.accepted().push_back({"topology.voltage.mismatch",
                            {PartId(9)},
                            "R. Quill",
                            "2026-12-01",
                            "motor rewound for 480 V; nameplate to be replaced"});
    r = checkDrawing(d, testTables());
    EXPECT_EQ(r.openCounts[2], before - 1);
    EXPECT_EQ(r.acceptedCount, 1);
    auto it = std::find_if(r.findings.begin(), r.findings.end(), [](const Finding& f) {
        return f.ruleId == "topology.voltage.mismatch";
    });
    ASSERT_NE(it, r.findings.end());
    EXPECT_TRUE(it->accepted);
    EXPECT_NE(it->acceptedNote.find("R. Quill"), std::string::npos);
}

TEST(DrawingRules, DuplicateTagsAreACaution) {
    Drawing d = smallLineup();
    d.part(PartId(8))->tag = "M-1"; // cable given the motor's tag
    const auto r = checkDrawing(d, testTables());
    ASSERT_EQ(countRule(d, "drawing.tag.duplicate"), 1);
    auto it = std::find_if(r.findings.begin(), r.findings.end(),
                           [](const Finding& f) { return f.ruleId == "drawing.tag.duplicate"; });
    EXPECT_EQ(it->severity, Severity::Caution);
    EXPECT_EQ(it->parts.size(), 2u);
}
