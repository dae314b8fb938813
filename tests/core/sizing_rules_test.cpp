// Each sizing rule with a passing and a failing case, on the small lineup of test_support
// (25 hp 460 V motor, FLC 34 A by NEC 2023 Table 430.250) and on purpose-built feeders.
#include "check/check.h"
#include "sizing/auto_size.h"
#include "test_support.h"

#include <algorithm>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::test;

namespace {

std::vector<Finding> findings(const Drawing& d, const std::string& rule) {
    std::vector<Finding> out;
    for (auto& f : checkDrawing(d, testTables()).findings)
        if (f.ruleId == rule)
            out.push_back(f);
    return out;
}

void set(Drawing& d, int id, const char* key, FieldValue v) {
    auto why = d.part(PartId(id))->set(key, std::move(v));
    ASSERT_FALSE(why) << *why;
}

// Applies a finding's fix the way the editor will, then re-checks.
void applyFix(Drawing& d, const Finding& f) {
    ASSERT_TRUE(f.fix.has_value());
    ASSERT_FALSE(f.fix->changes.empty()) << f.fix->description;
    for (const auto& c : f.fix->changes)
        ASSERT_FALSE(d.part(c.part)->set(c.field, c.value)) << c.field;
}

} // namespace

TEST(BranchRules, SmallLineupIsClean) {
    // Clean: nothing that asks for action (its one note is about generic curves).
    auto r = checkDrawing(smallLineup(), testTables());
    for (const auto& f : r.findings)
        if (f.severity != Severity::Note)
            ADD_FAILURE() << f.ruleId << ": " << f.message;
}

TEST(BranchRules, ConductorTooSmallAndItsFix) {
    Drawing d = smallLineup();
    set(d, 8, "size", std::string("10 AWG")); // 35 A < 1.25 × 34 = 42.5 A (NEC 430.22)
    auto f = findings(d, "branch.conductor.ampacity");
    ASSERT_EQ(f.size(), 1u);
    EXPECT_DOUBLE_EQ(*f[0].computed, 35);
    EXPECT_DOUBLE_EQ(*f[0].limit, 42.5);
    applyFix(d, f[0]);
    EXPECT_EQ(*d.part(PartId(8))->word("size"), "8 AWG");
    EXPECT_TRUE(findings(d, "branch.conductor.ampacity").empty());
}

TEST(BranchRules, HotAmbientDeratesTheConductor) {
    Drawing d = smallLineup();
    set(d, 8, "ambient_c", 50.0); // 55 A × 0.82 = 45.1 A, capped at 50 A: still passes
    EXPECT_TRUE(findings(d, "branch.conductor.ampacity").empty());
    set(d, 8, "conductors", 6.0); // 55 × 0.82 × 0.8 = 36.1 A < 42.5 A
    EXPECT_EQ(findings(d, "branch.conductor.ampacity").size(), 1u);
}

TEST(BranchRules, BreakerAboveTable430_52) {
    Drawing d = smallLineup();
    set(d, 5, "trip_a", 90.0); // 250 % × 34 = 85 → next standard 90 A is allowed (Exc. No. 1)
    EXPECT_TRUE(findings(d, "branch.scpd.rating").empty());
    set(d, 5, "trip_a", 100.0);
    auto f = findings(d, "branch.scpd.rating");
    ASSERT_EQ(f.size(), 1u);
    EXPECT_DOUBLE_EQ(*f[0].limit, 90);
    // Exception No. 2: up to 400 % × 34 = 136 → 125 A for a motor that will not start.
    set(d, 9, "hard_to_start", true);
    EXPECT_TRUE(findings(d, "branch.scpd.rating").empty());
    EXPECT_EQ(findings(d, "branch.scpd.exception").size(), 1u);
    set(d, 5, "trip_a", 150.0);
    EXPECT_EQ(findings(d, "branch.scpd.rating").size(), 1u);
}

TEST(BranchRules, ABreakerBelowTheRunningCurrentCannotCarryTheMotor) {
    // NEC 2023 430.52(B): the device carries the starting and running current. The motor's
    // FLC is 34 A (Table 430.250, 25 hp 460 V) and its nameplate 32 A: 35 A carries it, 30 A
    // does not, and the fix is the table maximum (250 % × 34 = 85 → 90 A), not 34 A.
    Drawing d = smallLineup();
    set(d, 5, "trip_a", 35.0);
    EXPECT_TRUE(findings(d, "branch.scpd.low").empty());
    set(d, 5, "trip_a", 30.0);
    auto f = findings(d, "branch.scpd.low");
    ASSERT_EQ(f.size(), 1u);
    EXPECT_EQ(f[0].severity, Severity::Violation);
    EXPECT_DOUBLE_EQ(*f[0].computed, 30);
    EXPECT_DOUBLE_EQ(*f[0].limit, 34);
    applyFix(d, f[0]);
    EXPECT_DOUBLE_EQ(*d.part(PartId(5))->number("trip_a"), 90);
    EXPECT_TRUE(findings(d, "branch.scpd.low").empty());
    EXPECT_TRUE(findings(d, "branch.scpd.rating").empty());
}

TEST(BranchRules, AnOverloadSetBelowTheNameplateTripsTheMotorAtLoad) {
    Drawing d = smallLineup(); // nameplate FLA 32 A
    set(d, 7, "setting_a", 32.0);
    EXPECT_TRUE(findings(d, "branch.overload.low").empty());
    set(d, 7, "setting_a", 28.0);
    auto f = findings(d, "branch.overload.low");
    ASSERT_EQ(f.size(), 1u);
    EXPECT_EQ(f[0].severity, Severity::Violation);
    EXPECT_DOUBLE_EQ(*f[0].limit, 32);
    applyFix(d, f[0]); // raised to the nameplate current, within the 430.32 limit
    EXPECT_DOUBLE_EQ(*d.part(PartId(7))->number("setting_a"), 32);
    EXPECT_TRUE(findings(d, "branch.overload.low").empty());
    EXPECT_TRUE(findings(d, "branch.overload.setting").empty());
}

TEST(BranchRules, MissingShortCircuitDevice) {
    Drawing d = smallLineup();
    d.removePart(PartId(5));
    d.addWire(Wire{d.nextWireId(), {PartId(4), 0}, {PartId(6), 0}});
    EXPECT_EQ(findings(d, "branch.scpd.missing").size(), 1u);
}

TEST(BranchRules, OverloadSettingLimits) {
    // NEC 430.32(A)(1) limits the current at which the relay trips: FLA 32 A, SF 1.15 default →
    // 125 % = 40 A, 430.32(C) 140 % = 44.8 A. The relay surely trips above its ultimate trip
    // multiple (default 1.15 ×, common practice) of the setting, so the dial may go to
    // 40 / 1.15 = 34.78 A.
    Drawing d = smallLineup();
    set(d, 7, "setting_a", 34.7);
    EXPECT_TRUE(findings(d, "branch.overload.setting").empty());
    EXPECT_TRUE(findings(d, "branch.overload.exception").empty());
    set(d, 7, "setting_a", 36.0); // trips at 41.4 A: between 40 and 44.8
    auto c = findings(d, "branch.overload.exception");
    ASSERT_EQ(c.size(), 1u);
    EXPECT_NEAR(*c[0].computed, 41.4, 1e-9);
    set(d, 7, "setting_a", 40.0); // the dial at 125 % trips at 46 A: a violation
    auto f = findings(d, "branch.overload.setting");
    ASSERT_EQ(f.size(), 1u);
    EXPECT_NEAR(*f[0].computed, 46.0, 1e-9);
    EXPECT_DOUBLE_EQ(*f[0].limit, 40.0);
    applyFix(d, f[0]);
    EXPECT_DOUBLE_EQ(*d.part(PartId(7))->number("setting_a"), 34.7); // ⌊40 / 1.15⌋ to 0.1 A
    EXPECT_TRUE(findings(d, "branch.overload.setting").empty());
    // A relay whose data says it trips by 1.25 × is judged on that: 34.7 × 1.25 = 43.4 A.
    set(d, 7, "ultimate_trip_x", 1.25);
    EXPECT_EQ(findings(d, "branch.overload.exception").size(), 1u);
    set(d, 7, "ultimate_trip_x", 1.15);
    // SF 1.0 and no marked rise: 115 % = 36.8 A (NEC 430.32(A)(1)); 34.7 × 1.15 = 39.9 A is
    // within 430.32(C)'s 130 % = 41.6 A.
    set(d, 9, "sf", 1.0);
    EXPECT_EQ(findings(d, "branch.overload.exception").size(), 1u);
    // Set at the nameplate current, 32 × 1.15 = 36.8 A: exactly the limit, compliant.
    set(d, 7, "setting_a", 32.0);
    EXPECT_TRUE(findings(d, "branch.overload.exception").empty());
    EXPECT_TRUE(findings(d, "branch.overload.setting").empty());
    d.part(PartId(9))->values[*fieldIndex(PartKind::Motor, "fla")] = FieldValue{};
    EXPECT_EQ(findings(d, "branch.overload.no_fla").size(), 1u);
}

TEST(BranchRules, ContactorSize) {
    Drawing d = smallLineup();
    set(d, 6, "nema_size", std::string("1")); // size 1 = 10 hp at 460 V < 25 hp
    auto f = findings(d, "branch.contactor.size");
    ASSERT_EQ(f.size(), 1u);
    applyFix(d, f[0]);
    EXPECT_EQ(*d.part(PartId(6))->word("nema_size"), "2");
    d.part(PartId(6))->values[*fieldIndex(PartKind::Contactor, "nema_size")] = FieldValue{};
    set(d, 6, "ac3_a", 32.0); // below FLC 34 A
    EXPECT_EQ(findings(d, "branch.contactor.size").size(), 1u);
    set(d, 6, "ac3_a", 38.0);
    EXPECT_TRUE(findings(d, "branch.contactor.size").empty());
}

TEST(BranchRules, DisconnectRatingAndHorsepower) {
    Drawing d = smallLineup();
    Part ds = Part::make(PartKind::Disconnect, d.nextPartId(), "DS-1");
    ASSERT_FALSE(ds.set("amps", 30.0));      // < 1.15 × 34 = 39.1 A (430.110(A))
    ASSERT_FALSE(ds.set("hp_rating", 20.0)); // < 25 hp (430.109(A)(1))
    d.addPart(ds);
    // Insert between bus and CB-1: rewire bus → DS → CB-1.
    const auto w = std::find_if(d.wires().begin(), d.wires().end(), [](const Wire& x) {
        return x.a.part == PartId(4) && x.b.part == PartId(5);
    });
    ASSERT_NE(w, d.wires().end());
    d.removeWire(w->id);
    d.addWire(Wire{d.nextWireId(), {PartId(4), 0}, {ds.id, 0}});
    d.addWire(Wire{d.nextWireId(), {ds.id, 1}, {PartId(5), 0}});
    auto rating = findings(d, "branch.disconnect.rating");
    ASSERT_EQ(rating.size(), 1u);
    applyFix(d, rating[0]);
    EXPECT_DOUBLE_EQ(*d.part(ds.id)->number("amps"), 60);
    EXPECT_EQ(findings(d, "branch.disconnect.hp").size(), 1u);
    set(d, static_cast<int>(ds.id.value), "hp_rating", 25.0);
    EXPECT_TRUE(findings(d, "branch.disconnect.hp").empty());
}

TEST(BranchRules, GroundingConductor) {
    Drawing d = smallLineup(); // CB-1 80 A → Table 250.122: 8 AWG
    set(d, 8, "egc_size", std::string("8 AWG"));
    EXPECT_TRUE(findings(d, "branch.egc.size").empty());
    set(d, 8, "egc_size", std::string("10 AWG"));
    auto f = findings(d, "branch.egc.size");
    ASSERT_EQ(f.size(), 1u);
    applyFix(d, f[0]);
    EXPECT_TRUE(findings(d, "branch.egc.size").empty());
}

TEST(BranchRules, FlcFromNameplateOrUnknown) {
    Drawing d = smallLineup();
    set(d, 9, "hp", 12.0); // no 12 hp row in Table 430.250
    EXPECT_EQ(findings(d, "branch.flc.nameplate").size(), 1u);
    d.part(PartId(9))->values[*fieldIndex(PartKind::Motor, "fla")] = FieldValue{};
    EXPECT_EQ(findings(d, "branch.flc.unknown").size(), 1u);
}

namespace {
// Bus → instantaneous-only breaker → contactor → overload → motor, all in one bucket.
Drawing instLineup(double pickupA, double hp = 25) {
    DrawingBuilder b;
    auto src = b.add(PartKind::Source, "U", {{"kv", 0.48}, {"fault_ka", 30.0}});
    auto bus = b.add(PartKind::Bus, "B", {{"volts", 480.0}, {"amps", 600.0}});
    auto mcp = b.add(PartKind::InstBreaker, "MCP",
                     {{"amps", 50.0}, {"pickup_a", pickupA}, {"interrupting_ka", 65.0}});
    auto k = b.add(PartKind::Contactor, "K", {{"nema_size", std::string("2")}});
    auto ol = b.add(PartKind::Overload, "OL", {{"setting_a", 32.0}});
    auto m =
        b.add(PartKind::Motor, "M",
              {{"hp", hp}, {"volts", 460.0}, {"fla", 32.0}, {"code_letter", std::string("G")}});
    b.wire(src, 0, bus, 0);
    b.wire(bus, 0, mcp, 0);
    b.wire(mcp, 1, k, 0);
    b.wire(k, 1, ol, 0);
    b.wire(ol, 1, m, 0);
    b.bucket("B1", {mcp, k, ol});
    return b.drawing();
}
} // namespace

TEST(BranchRules, InstantaneousSettingAndInrush) {
    // 25 hp, code G: LRA 197.4 A; × 1.5 = 296 A inrush; needs setting ≥ 370 A (±20 %).
    // 800 % × 34 = 272 A cannot carry the start, so 430.52(C)(3) allows up to 1300 % = 442 A.
    auto inrush = findings(instLineup(270), "branch.inst.inrush");
    ASSERT_EQ(inrush.size(), 1u);
    EXPECT_NEAR(*inrush[0].limit, 296.1, 0.1);
    Drawing d = instLineup(270);
    applyFix(d, inrush[0]);
    EXPECT_DOUBLE_EQ(*d.part(PartId(3))->number("pickup_a"), 375);
    EXPECT_TRUE(findings(d, "branch.inst.inrush").empty());
    EXPECT_TRUE(findings(d, "branch.inst.setting").empty());
    EXPECT_TRUE(findings(instLineup(440), "branch.inst.setting").empty());
    auto over = findings(instLineup(450), "branch.inst.setting"); // above 1300 %
    ASSERT_EQ(over.size(), 1u);
    EXPECT_NEAR(*over[0].limit, 442, 1e-9);
}

// Three motors on one feeder: NEC 2023 Annex D Example D8 (from memory): 25 hp squirrel cage
// (FLC 34 A, 110 A non-time-delay fuses) and two 30 hp wound rotor (FLC 40 A, 60 A fuses).
// Feeder conductor ≥ 1.25 × 40 + 40 + 34 = 124 A; feeder fuse ≤ 110 + 40 + 40 = 190 → 175 A.
namespace {
Drawing annexD8Feeder(double feederFuseA, const char* feederSize) {
    DrawingBuilder b;
    auto src = b.add(PartKind::Source, "U", {{"kv", 0.48}, {"fault_ka", 30.0}});
    auto swbd = b.add(PartKind::Bus, "SWBD", {{"volts", 480.0}, {"amps", 400.0}});
    auto ff = b.add(
        PartKind::Fuse, "FU-F",
        {{"fuse_type", std::string("fast")}, {"amps", feederFuseA}, {"interrupting_ka", 200.0}});
    auto fc =
        b.add(PartKind::Cable, "C-F", {{"size", std::string(feederSize)}, {"length_ft", 100.0}});
    auto mcc = b.add(PartKind::Bus, "MCC", {{"volts", 480.0}, {"amps", 400.0}});
    b.wire(src, 0, swbd, 0);
    b.wire(swbd, 0, ff, 0);
    b.wire(ff, 1, fc, 0);
    b.wire(fc, 1, mcc, 0);
    struct M {
        const char* tag;
        double hp, fla, fuse;
        const char* rotor;
        const char* nema;
    };
    for (const M& m :
         {M{"M-1", 25, 32, 110, "squirrel_cage", "2"}, M{"M-2", 30, 38, 60, "wound_rotor", "3"},
          M{"M-3", 30, 38, 60, "wound_rotor", "3"}}) {
        auto fu = b.add(
            PartKind::Fuse, std::string("FU-") + m.tag,
            {{"fuse_type", std::string("fast")}, {"amps", m.fuse}, {"interrupting_ka", 200.0}});
        auto k = b.add(PartKind::Contactor, std::string("K-") + m.tag,
                       {{"nema_size", std::string(m.nema)}});
        auto ol = b.add(PartKind::Overload, std::string("OL-") + m.tag, {{"setting_a", m.fla}});
        auto c = b.add(PartKind::Cable, std::string("C-") + m.tag,
                       {{"size", std::string("8 AWG")}, {"length_ft", 50.0}});
        auto mo = b.add(PartKind::Motor, m.tag,
                        {{"hp", m.hp},
                         {"volts", 460.0},
                         {"fla", m.fla},
                         {"rotor", std::string(m.rotor)},
                         {"temp_rise_c", 40.0}});
        b.wire(mcc, 0, fu, 0);
        b.wire(fu, 1, k, 0);
        b.wire(k, 1, ol, 0);
        b.wire(ol, 1, c, 0);
        b.wire(c, 1, mo, 0);
    }
    return b.drawing();
}
} // namespace

TEST(FeederRules, AnnexD8ThreeMotorFeeder) {
    const Drawing ok = annexD8Feeder(175, "1/0 AWG"); // 1/0: 150 A ≥ 124 A
    auto r = checkDrawing(ok, testTables());
    for (const auto& f : r.findings)
        // The example sizes the circuits; curves, let-through data and arc flash (the example
        // draws no device above the feeder, so an arc there would last the time cap) are not
        // part of it.
        if (f.ruleId != "duty.withstand.assumed" && f.ruleId.rfind("curve.", 0) != 0 &&
            f.ruleId.rfind("arcflash.", 0) != 0)
            ADD_FAILURE() << f.ruleId << ": " << f.message;

    auto cond = findings(annexD8Feeder(175, "1 AWG"), "feeder.conductor.ampacity"); // 130 ≥ 124: ok
    EXPECT_TRUE(cond.empty());
    cond = findings(annexD8Feeder(100, "2 AWG"), "feeder.conductor.ampacity"); // 115 < 124
    ASSERT_EQ(cond.size(), 1u);
    EXPECT_DOUBLE_EQ(*cond[0].limit, 124);

    auto dev = findings(annexD8Feeder(200, "3/0 AWG"), "feeder.device.rating");
    ASSERT_EQ(dev.size(), 1u);
    EXPECT_DOUBLE_EQ(*dev[0].limit, 175);
}

TEST(FeederRules, MotorFeedersAreGovernedBy430NotBy240_4) {
    // NEC 2023 240.4(G) sends motor feeders to Article 430 Part V: a 150 A 1/0 feeder on the
    // 175 A fuse of Example D8 is compliant.
    EXPECT_TRUE(findings(annexD8Feeder(175, "1/0 AWG"), "conductor.protection").empty());
}

namespace {
// A 480 V → 208 V, 45 kVA lighting transformer with primary breaker and secondary feeder.
Drawing lightingTransformer(double primaryA, double secondaryA, const char* secSize,
                            double loadKva) {
    DrawingBuilder b;
    auto src = b.add(PartKind::Source, "U", {{"kv", 0.48}, {"fault_ka", 30.0}});
    auto bus = b.add(PartKind::Bus, "B", {{"volts", 480.0}, {"amps", 400.0}});
    auto cbp = b.add(PartKind::Breaker, "CB-P", {{"trip_a", primaryA}, {"interrupting_ka", 65.0}});
    auto tx = b.add(PartKind::Transformer, "TX-L",
                    {{"kva", 45.0}, {"pri_v", 480.0}, {"sec_v", 208.0}, {"z_pct", 3.5}});
    auto cbs =
        b.add(PartKind::Breaker, "CB-S", {{"trip_a", secondaryA}, {"interrupting_ka", 22.0}});
    auto c = b.add(PartKind::Cable, "C-S", {{"size", std::string(secSize)}, {"length_ft", 20.0}});
    auto pnl = b.add(PartKind::Bus, "LP",
                     {{"bus_type", std::string("panelboard")}, {"volts", 208.0}, {"amps", 225.0}});
    auto ld =
        b.add(PartKind::Load, "LTG", {{"kva", loadKva}, {"volts", 208.0}, {"continuous", false}});
    b.wire(src, 0, bus, 0);
    b.wire(bus, 0, cbp, 0);
    b.wire(cbp, 1, tx, 0);
    b.wire(tx, 1, cbs, 0);
    b.wire(cbs, 1, c, 0);
    b.wire(c, 1, pnl, 0);
    b.wire(pnl, 0, ld, 0);
    return b.drawing();
}
} // namespace

TEST(FeederRules, ConductorProtection240_4) {
    // Secondary 125 A breaker on 1/0 AWG (150 A at 75 °C): protected.
    EXPECT_TRUE(
        findings(lightingTransformer(70, 125, "1/0 AWG", 30), "conductor.protection").empty());
    // 2 AWG (115 A, not a standard rating) on 125 A: 240.4(B) permits the next size up.
    EXPECT_TRUE(
        findings(lightingTransformer(70, 125, "2 AWG", 30), "conductor.protection").empty());
    // 3 AWG (100 A, a standard rating) on 125 A: not protected.
    auto f = findings(lightingTransformer(70, 125, "3 AWG", 30), "conductor.protection");
    ASSERT_EQ(f.size(), 1u);
    EXPECT_DOUBLE_EQ(*f[0].limit, 100);
}

TEST(FeederRules, TransformerProtection450_3B) {
    // 45 kVA: primary 54.1 A at 480 V, secondary 124.9 A at 208 V.
    // Secondary 125 A ≤ 125 % (156 A → 175 A) so the primary may be 250 % = 135.3 A.
    EXPECT_TRUE(
        findings(lightingTransformer(125, 125, "1/0 AWG", 30), "transformer.protection").empty());
    auto f = findings(lightingTransformer(150, 125, "1/0 AWG", 30), "transformer.protection");
    ASSERT_EQ(f.size(), 1u);
    EXPECT_NEAR(*f[0].limit, 135.3, 0.1);
    // Secondary 200 A is above 175 A: primary only, 125 % = 67.7 A → next standard 70 A.
    auto g = findings(lightingTransformer(80, 200, "3/0 AWG", 30), "transformer.protection");
    ASSERT_EQ(g.size(), 1u);
    EXPECT_DOUBLE_EQ(*g[0].limit, 70);
    EXPECT_TRUE(
        findings(lightingTransformer(70, 200, "3/0 AWG", 30), "transformer.protection").empty());
}

TEST(FeederRules, TransformerLoad) {
    EXPECT_TRUE(findings(lightingTransformer(70, 125, "1/0 AWG", 40), "transformer.load").empty());
    auto f = findings(lightingTransformer(70, 150, "2/0 AWG", 50),
                      "transformer.load"); // 138.8 A > 124.9 A
    ASSERT_EQ(f.size(), 1u);
    EXPECT_EQ(f[0].severity, Severity::Caution);
}

TEST(FeederRules, BusAndTransformerLoad) {
    Drawing d = annexD8Feeder(175, "1/0 AWG");
    set(d, 5, "amps", 100.0); // MCC bus 100 A < 124 A calculated
    EXPECT_EQ(findings(d, "bus.load").size(), 1u);
}

// The proposal and the rules must agree: a bucket built from proposeBucket checks clean.
struct ProposalCase {
    double hp, volts;
    ScpdType device;
};
class ProposalChecksClean : public ::testing::TestWithParam<ProposalCase> {};
TEST_P(ProposalChecksClean, NoBranchFindings) {
    const auto& pc = GetParam();
    Part m = Part::make(PartKind::Motor, PartId(1), "M");
    ASSERT_FALSE(m.set("hp", pc.hp));
    ASSERT_FALSE(m.set("volts", pc.volts));
    ASSERT_FALSE(m.set("code_letter", std::string("G")));
    SizeOptions o;
    o.device = pc.device;
    std::string why;
    auto p = proposeBucket(m, o, testTables(), why);
    ASSERT_TRUE(p) << why;
    ASSERT_FALSE(m.set("fla", p->flc.amps));

    DrawingBuilder b;
    const double systemV = pc.volts > 500 ? 600.0 : pc.volts > 300 ? 480.0 : 208.0;
    auto src = b.add(PartKind::Source, "U", {{"kv", systemV / 1000.0}, {"fault_ka", 30.0}});
    auto bus = b.add(PartKind::Bus, "B", {{"volts", systemV}, {"amps", 2000.0}});
    PartId dev;
    switch (pc.device) {
    case ScpdType::InverseTimeBreaker:
        dev = b.add(PartKind::Breaker, "D",
                    {{"trip_a", p->deviceRatingA}, {"interrupting_ka", 65.0}});
        break;
    case ScpdType::InstantaneousBreaker:
        dev = b.add(PartKind::InstBreaker, "D",
                    {{"amps", 400.0}, {"pickup_a", p->deviceRatingA}, {"interrupting_ka", 65.0}});
        break;
    default:
        dev = b.add(PartKind::Fuse, "D",
                    {{"fuse_type",
                      std::string(pc.device == ScpdType::TimeDelayFuse ? "time_delay" : "fast")},
                     {"amps", p->deviceRatingA},
                     {"interrupting_ka", 200.0}});
    }
    auto k = b.add(PartKind::Contactor, "K", {{"nema_size", p->nemaSize}});
    auto ol = b.add(PartKind::Overload, "OL",
                    {{"setting_a", p->overloadSettingA}, {"trip_class", p->tripClass}});
    auto c = b.add(PartKind::Cable, "C",
                   {{"size", p->conductorSize},
                    {"length_ft", 100.0},
                    {"termination_c", static_cast<double>(p->terminationC)},
                    {"egc_size", p->egcSize}});
    m.id = b.drawing().nextPartId();
    b.drawing().addPart(m);
    b.wire(src, 0, bus, 0);
    b.wire(bus, 0, dev, 0);
    b.wire(dev, 1, k, 0);
    b.wire(k, 1, ol, 0);
    b.wire(ol, 1, c, 0);
    b.wire(c, 1, m.id, 0);
    b.bucket("B1", {dev, k, ol});
    for (const auto& f : checkDrawing(b.drawing(), testTables()).findings)
        // Sizing does not choose let-through data, coordinate with a (here absent) feeder, or
        // clear an arc on the bus (no device above it: the arc lasts the time cap).
        if (f.ruleId != "duty.withstand.assumed" && f.ruleId.rfind("curve.", 0) != 0 &&
            f.ruleId.rfind("arcflash.", 0) != 0)
            ADD_FAILURE() << f.ruleId << ": " << f.message;
}
INSTANTIATE_TEST_SUITE_P(SeveralMotors, ProposalChecksClean,
                         ::testing::Values(ProposalCase{3, 460, ScpdType::TimeDelayFuse},
                                           ProposalCase{25, 460, ScpdType::InverseTimeBreaker},
                                           ProposalCase{25, 460, ScpdType::InstantaneousBreaker},
                                           ProposalCase{10, 208, ScpdType::NonTimeDelayFuse},
                                           ProposalCase{75, 460, ScpdType::InverseTimeBreaker},
                                           ProposalCase{150, 460, ScpdType::TimeDelayFuse},
                                           ProposalCase{40, 575, ScpdType::InstantaneousBreaker}));

TEST(BranchRules, ADesignEMotorIsJudgedOnThePremiumRowAndTheTraceSaysSo) {
    // NEC 2023 Table 430.52(C)(1) has no Design E row (from memory): the trace names the row
    // used. 25 hp, 460 V: FLC 34 A (Table 430.250); a 150 A inverse-time breaker is above
    // 250 % × 34 = 85 A → 90 A on either row.
    Drawing d = smallLineup();
    set(d, 9, "design", std::string("E"));
    set(d, 5, "trip_a", 150.0);
    auto f = findings(d, "branch.scpd.rating");
    ASSERT_EQ(f.size(), 1u);
    const auto row = std::find_if(f[0].trace.begin(), f[0].trace.end(), [](const TraceStep& s) {
        return s.name == "Table 430.52(C)(1) row";
    });
    ASSERT_NE(row, f[0].trace.end());
    EXPECT_NE(row->value.find("marked Design E"), std::string::npos) << row->value;
    set(d, 9, "design", std::string("B"));
    f = findings(d, "branch.scpd.rating");
    ASSERT_EQ(f.size(), 1u);
    const auto rowB = std::find_if(f[0].trace.begin(), f[0].trace.end(), [](const TraceStep& s) {
        return s.name == "Table 430.52(C)(1) row";
    });
    ASSERT_NE(rowB, f[0].trace.end());
    EXPECT_EQ(rowB->value, "AC polyphase squirrel cage, other than Design B premium efficiency");
}
