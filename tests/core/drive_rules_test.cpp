// Drives and soft starters in a motor branch: the branch.drive.* and branch.soft_starter.*
// rules, overload protection by the drive (430.124(A)), the limited starting current in the
// nuisance-trip check and the starting study, and a file round trip of both kinds.
#include "io/drawing_file.h"
#include "model/ratings.h"
#include "studies/study.h"
#include "test_support.h"

#include <gtest/gtest.h>

using namespace lineward;
using lineward::test::DrawingBuilder;
using lineward::test::findRule;
using lineward::test::testTables;

namespace {

// 25 hp, 460 V motor, nameplate FLA 32 A: table FLC 34 A (NEC 2023 Table 430.250, from memory).
constexpr double kFlc = 34.0;

enum class Starter { Drive, Soft, AcrossTheLine };

struct BranchOptions {
    Starter starter = Starter::Drive;
    double breakerA = 60;
    double instX = 10;
    std::string inputCable; ///< a cable between the breaker and the drive, where given
    std::vector<std::pair<std::string_view, FieldValue>> starterValues = {};
    bool overload = true; ///< for a soft starter or contactor
};

// Utility, 150 kVA transformer, main, MCC bus and one 25 hp motor branch: breaker, [input
// cable], starter, [overload relay], 8 AWG cable, motor. Drive nameplate in code: 38 A in,
// 34 A out (input values of the test, not reference values).
Drawing driveBranch(const BranchOptions& o) {
    DrawingBuilder b;
    auto src = b.add(PartKind::Source, "UTIL", {{"kv", 13.8}, {"fault_ka", 20.0}});
    auto tx = b.add(PartKind::Transformer, "TX",
                    {{"kva", 150.0}, {"pri_v", 13800.0}, {"sec_v", 480.0}, {"z_pct", 5.75}});
    // The main at the branch device's rating, the most 430.62(A) allows for one motor.
    auto main = b.add(PartKind::Breaker, "CB-M",
                      {{"trip_type", std::string("electronic")},
                       {"trip_a", o.breakerA},
                       {"interrupting_ka", 65.0},
                       {"lt_delay_s", 20.0},
                       {"st_pickup_x", 9.0},
                       {"st_delay_s", 0.3}});
    auto bus = b.add(PartKind::Bus, "MCC", {{"volts", 480.0}, {"amps", 600.0}});
    auto cb = b.add(PartKind::Breaker, "CB-1",
                    {{"trip_a", o.breakerA}, {"interrupting_ka", 65.0}, {"inst_x", o.instX}});
    b.wire(src, 0, tx, 0);
    b.wire(tx, 1, main, 0);
    b.wire(main, 1, bus, 0);
    b.wire(bus, 0, cb, 0);
    PartId last = cb;
    if (!o.inputCable.empty()) {
        auto in = b.add(PartKind::Cable, "C-IN", {{"size", o.inputCable}, {"length_ft", 20.0}});
        b.wire(last, 1, in, 0);
        last = in;
    }
    PartId starter;
    switch (o.starter) {
    case Starter::Drive:
        starter = b.add(PartKind::Vfd, "VFD-1",
                        {{"hp", 25.0}, {"volts", 480.0}, {"input_a", 38.0}, {"output_a", 34.0}});
        break;
    case Starter::Soft:
        starter =
            b.add(PartKind::SoftStarter, "SS-1", {{"hp", 25.0}, {"volts", 480.0}, {"amps", 34.0}});
        break;
    case Starter::AcrossTheLine:
        starter = b.add(PartKind::Contactor, "K-1", {{"nema_size", std::string("2")}});
        break;
    }
    if (!o.starterValues.empty())
        if (auto err = b.drawing().part(starter)->set(o.starterValues))
            ADD_FAILURE() << *err;
    b.wire(last, 1, starter, 0);
    last = starter;
    std::vector<PartId> bucket{cb, starter};
    if (o.starter != Starter::Drive && o.overload) {
        auto ol = b.add(PartKind::Overload, "OL-1", {{"setting_a", 32.0}});
        b.wire(last, 1, ol, 0);
        last = ol;
        bucket.push_back(ol);
    }
    auto c = b.add(PartKind::Cable, "C-1", {{"size", std::string("8 AWG")}, {"length_ft", 100.0}});
    auto m = b.add(PartKind::Motor, "M-1", {{"hp", 25.0}, {"volts", 460.0}, {"fla", 32.0}});
    b.wire(last, 1, c, 0);
    b.wire(c, 1, m, 0);
    b.bucket("MCC-1A", bucket);
    return b.drawing();
}

CheckReport check(const BranchOptions& o) {
    return checkDrawing(driveBranch(o), testTables());
}

std::string violations(const CheckReport& r) {
    std::string s;
    for (const auto& f : r.findings)
        if (f.severity == Severity::Violation)
            s += f.ruleId + ": " + f.message + "\n";
    return s;
}

} // namespace

TEST(DriveRules, ADriveBranchWithinEveryLimitHasNoViolation) {
    // 60 A breaker: within 430.52 (250 % × 34 = 85 → 90 A, Table 430.52(C)(1)) and within the
    // assumed listing maximum 1.75 × 38 = 66.5 A; 8 AWG input cable: 50 A at 75 °C (NEC 2023
    // Table 310.16, from memory) ≥ 1.25 × 38 = 47.5 A (430.122(A)).
    const auto r = check({.inputCable = "8 AWG"});
    EXPECT_EQ(r.openCounts[2], 0) << violations(r);
}

TEST(DriveRules, TheDriveProvidesOverloadProtection) {
    // 430.124(A): no relay in a drive's branch and no topology.motor.no_overload; the same
    // branch with a contactor and no relay lacks it.
    EXPECT_EQ(findRule(check({}), "topology.motor.no_overload"), nullptr);
    EXPECT_NE(findRule(check({.starter = Starter::AcrossTheLine, .overload = false}),
                       "topology.motor.no_overload"),
              nullptr);
}

TEST(DriveRules, InputConductorsAreSizedFromTheDrivesInputCurrent) {
    // 10 AWG Cu: 35 A at 75 °C (NEC 2023 Table 310.16, from memory) < 1.25 × 38 A = 47.5 A
    // (430.122(A)); 1.25 × FLC 34 A = 42.5 A would also fail, so 430.22 is not what flags it:
    // it is not applied to the drive's input cable.
    const auto r = check({.inputCable = "10 AWG"});
    const Finding* f = findRule(r, "branch.drive.input_conductor");
    ASSERT_NE(f, nullptr) << violations(r);
    EXPECT_DOUBLE_EQ(*f->limit, 47.5);
    EXPECT_DOUBLE_EQ(*f->computed, 35.0);
    ASSERT_TRUE(f->fix);
    ASSERT_EQ(f->fix->changes.size(), 1u);
    EXPECT_EQ(std::get<std::string>(f->fix->changes[0].value), "8 AWG");
    for (const auto& g : r.findings)
        EXPECT_FALSE(g.ruleId == "branch.conductor.ampacity" && g.parts.front() == f->parts.front())
            << "430.22 judged the drive's input cable: " << g.message;
    EXPECT_EQ(findRule(check({.inputCable = "8 AWG"}), "branch.drive.input_conductor"), nullptr);
}

TEST(DriveRules, ShortCircuitDeviceWithinTheDrivesListing) {
    // No listed maximum given: 1.75 × 38 A = 66.5 A assumed (common practice, from memory);
    // 80 A exceeds it (and is within 430.52's 90 A), the fix is 60 A (NEC 2023 240.6(A)).
    const auto over = check({.breakerA = 80});
    const Finding* f = findRule(over, "branch.drive.scpd");
    ASSERT_NE(f, nullptr) << violations(over);
    EXPECT_DOUBLE_EQ(*f->limit, 66.5);
    bool named = false;
    for (const auto& step : f->trace)
        named = named || (step.value.find("1.75") != std::string::npos &&
                          step.value.find("assumed") != std::string::npos);
    EXPECT_TRUE(named) << "the trace names the assumed multiple";
    ASSERT_TRUE(f->fix);
    EXPECT_DOUBLE_EQ(std::get<double>(f->fix->changes.at(0).value), 60.0);
    // The drive's own listing (max_scpd_a) replaces the assumption.
    EXPECT_EQ(findRule(check({.breakerA = 80, .starterValues = {{"max_scpd_a", 80.0}}}),
                       "branch.drive.scpd"),
              nullptr);
    const auto tight = check({.breakerA = 60, .starterValues = {{"max_scpd_a", 50.0}}});
    ASSERT_NE(findRule(tight, "branch.drive.scpd"), nullptr);
    EXPECT_DOUBLE_EQ(*findRule(tight, "branch.drive.scpd")->limit, 50.0);
}

TEST(DriveRules, OutputCurrentCarriesTheMotor) {
    // Motor current: the larger of table FLC 34 A and FLA 32 A.
    const auto r = check({.starterValues = {{"output_a", 30.0}}});
    const Finding* f = findRule(r, "branch.drive.output");
    ASSERT_NE(f, nullptr);
    EXPECT_DOUBLE_EQ(*f->limit, kFlc);
    EXPECT_DOUBLE_EQ(*f->computed, 30.0);
    EXPECT_EQ(findRule(check({}), "branch.drive.output"), nullptr);
}

TEST(DriveRules, NoNuisanceTripOnADrivesStart) {
    // A 40 A breaker, instantaneous 6 × = 240 A (192 A at its −20 % edge): across the line the
    // 25 hp motor's 183 A locked-rotor current (NEC 2023 Table 430.251(B), from memory) × 1.5
    // asymmetry (common practice) = 274.5 A trips it; behind the drive the start draws the
    // drive's 38 A input current.
    const auto atl = check({.starter = Starter::AcrossTheLine, .breakerA = 40, .instX = 6});
    ASSERT_NE(findRule(atl, "curve.nuisance"), nullptr);
    const auto drive = check({.breakerA = 40, .instX = 6});
    EXPECT_EQ(findRule(drive, "curve.nuisance"), nullptr)
        << findRule(drive, "curve.nuisance")->message;
}

TEST(DriveRules, StartingThroughADriveOrSoftStarterDrawsTheLimitedCurrent) {
    const auto atl = runCheck(driveBranch({.starter = Starter::AcrossTheLine}), testTables());
    const auto vfd = runCheck(driveBranch({}), testTables());
    const auto soft = runCheck(driveBranch({.starter = Starter::Soft}), testTables());
    auto startOf = [](const CheckResult& r) {
        return r.study->starts.at(r.drawing->partByTag("M-1")->id);
    };
    const MotorStart a = startOf(*atl), v = startOf(*vfd), s = startOf(*soft);
    const PartId motor = soft->drawing->partByTag("M-1")->id;
    // Across the line: 183 A for 25 hp Design B at 460 V (NEC 2023 Table 430.251(B), from
    // memory).
    EXPECT_DOUBLE_EQ(a.lockedRotorA, 183.0);
    EXPECT_TRUE(a.limitBasis.empty());
    EXPECT_DOUBLE_EQ(v.lockedRotorA, 38.0); // the drive's rated input current
    EXPECT_NE(v.limitBasis.find("VFD-1"), std::string::npos);
    EXPECT_DOUBLE_EQ(s.lockedRotorA, 3.5 * kFlc); // start_limit_x default 3.5 × FLC
    EXPECT_LT(v.busDipPct, s.busDipPct);
    EXPECT_LT(s.busDipPct, a.busDipPct);
    // The profile the curves and rules read is the same limited current, without asymmetry.
    const auto* facts = soft->motorFacts(motor);
    ASSERT_TRUE(facts && facts->start);
    EXPECT_DOUBLE_EQ(facts->start->asymA, 3.5 * kFlc);
    EXPECT_FALSE(facts->start->limitBasis.empty());
}

TEST(SoftStarterRules, RatingBypassAndOverload) {
    EXPECT_EQ(check({.starter = Starter::Soft}).openCounts[2], 0)
        << violations(check({.starter = Starter::Soft}));
    const auto low = check({.starter = Starter::Soft, .starterValues = {{"amps", 30.0}}});
    const Finding* f = findRule(low, "branch.soft_starter.rating");
    ASSERT_NE(f, nullptr);
    EXPECT_DOUBLE_EQ(*f->limit, kFlc);
    // A bypass rated 30 A AC-3 cannot carry the 34 A motor; 40 A can; no bypass, no check.
    EXPECT_NE(findRule(check({.starter = Starter::Soft, .starterValues = {{"bypass_a", 30.0}}}),
                       "branch.soft_starter.bypass"),
              nullptr);
    EXPECT_EQ(findRule(check({.starter = Starter::Soft, .starterValues = {{"bypass_a", 40.0}}}),
                       "branch.soft_starter.bypass"),
              nullptr);
    EXPECT_EQ(findRule(check({.starter = Starter::Soft,
                              .starterValues = {{"bypass", false}, {"bypass_a", 30.0}}}),
                       "branch.soft_starter.bypass"),
              nullptr);
    // A soft starter does not protect the motor: its branch still needs the relay (430.32).
    EXPECT_NE(findRule(check({.starter = Starter::Soft, .overload = false}),
                       "topology.motor.no_overload"),
              nullptr);
}

TEST(SoftStarterRules, NoNuisanceTripAtTheCurrentLimit) {
    // A 50 A breaker, instantaneous 6 × = 300 A (240 A at −20 %): across the line the 274.5 A
    // asymmetrical inrush (183 A × 1.5) trips it; the soft starter limits the start to
    // 3.5 × 34 = 119 A (common practice, 3–4 × FLC), which it carries for the 5 s start.
    ASSERT_NE(findRule(check({.starter = Starter::AcrossTheLine, .breakerA = 50, .instX = 6}),
                       "curve.nuisance"),
              nullptr);
    EXPECT_EQ(
        findRule(check({.starter = Starter::Soft, .breakerA = 50, .instX = 6}), "curve.nuisance"),
        nullptr);
}

TEST(DriveFile, BothKindsSurviveASaveAndLoad) {
    Drawing d = driveBranch({.starterValues = {{"max_scpd_a", 70.0}}});
    Part ss = Part::make(PartKind::SoftStarter, d.nextPartId(), "SS-9");
    ASSERT_FALSE(ss.set({{"hp", 40.0},
                         {"volts", 480.0},
                         {"amps", 52.0},
                         {"start_limit_x", 3.0},
                         {"bypass", false},
                         {"bypass_a", 60.0}}));
    d.addPart(ss);
    const std::string text = io::serializeDrawing(d);
    EXPECT_NE(text.find("\"kind\":\"vfd\""), std::string::npos) << text.substr(0, 400);
    EXPECT_NE(text.find("\"kind\":\"soft_starter\""), std::string::npos);
    auto back = io::parseDrawing(text);
    ASSERT_TRUE(back) << back.error->text();
    EXPECT_EQ(io::serializeDrawing(*back.drawing), text);
    const auto v = VfdRatings::of(*back.drawing->partByTag("VFD-1"));
    EXPECT_DOUBLE_EQ(v.inputA, 38.0);
    EXPECT_DOUBLE_EQ(v.outputA, 34.0);
    EXPECT_EQ(v.maxScpdA, 70.0);
    const auto s = SoftStarterRatings::of(*back.drawing->partByTag("SS-9"));
    EXPECT_DOUBLE_EQ(s.startLimitX, 3.0);
    EXPECT_FALSE(s.bypass);
    EXPECT_EQ(s.bypassA, 60.0);
    // A drive without its input current is refused with the field named.
    std::string bad = text;
    const auto at = bad.find("\"input_a\"");
    ASSERT_NE(at, std::string::npos);
    bad.replace(at, 9, "\"input_x\"");
    auto refused = io::parseDrawing(bad);
    EXPECT_FALSE(refused);
}
