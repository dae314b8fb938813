// Motor branch sizing: worked examples whose method and numbers come from NEC 2023 Article 430
// and its tables, and the auto-size proposal.
#include "check/check.h"
#include "io/drawing_file.h"
#include "sizing/auto_size.h"
#include "sizing/motor_sizing.h"
#include "test_support.h"

#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::test;

namespace {

Part motor(double hp, double volts,
           std::initializer_list<std::pair<const char*, FieldValue>> more = {}) {
    Part m = Part::make(PartKind::Motor, PartId(1), "M");
    EXPECT_FALSE(m.set("hp", hp));
    EXPECT_FALSE(m.set("volts", volts));
    for (auto& [k, v] : more)
        EXPECT_FALSE(m.set(k, v)) << k;
    return m;
}

BucketProposal propose(const Part& m, ScpdType device, std::optional<int> termination = 75) {
    SizeOptions o;
    o.device = device;
    o.terminationC = termination;
    std::string why;
    auto p = proposeBucket(m, o, testTables(), why);
    EXPECT_TRUE(p.has_value()) << why;
    return p.value_or(BucketProposal{});
}

} // namespace

// NEC 2023 Annex D, Example D8 (from memory): a 25 hp, 460 V, Design B, SF 1.15 squirrel-cage
// motor, nameplate 32 A, on non-time-delay fuses, 75 °C terminations.
TEST(WorkedExample, AnnexD8TwentyFiveHorsepower) {
    const Part m = motor(25, 460, {{"fla", 32.0}, {"sf", 1.15}});
    const auto p = propose(m, ScpdType::NonTimeDelayFuse);
    EXPECT_DOUBLE_EQ(p.flc.amps, 34);                                  // Table 430.250
    EXPECT_DOUBLE_EQ(p.conductorMinA, 42.5);                           // 430.22: 1.25 × 34
    EXPECT_EQ(p.conductorSize, "8 AWG");                               // Table 310.16, 75 °C: 50 A
    EXPECT_DOUBLE_EQ(*p.overloadMaxA, 40);                             // 430.32(A)(1): 1.25 × 32
    EXPECT_DOUBLE_EQ(p.scpdMaxA.at(ScpdType::NonTimeDelayFuse), 110);  // 300 % = 102 → 110
    EXPECT_DOUBLE_EQ(p.scpdMaxA.at(ScpdType::InverseTimeBreaker), 90); // 250 % = 85 → 90
    EXPECT_DOUBLE_EQ(p.scpdMaxA.at(ScpdType::TimeDelayFuse), 60);      // 175 % = 59.5 → 60
    EXPECT_DOUBLE_EQ(p.scpdMaxA.at(ScpdType::InstantaneousBreaker), 272); // 800 % setting
    EXPECT_DOUBLE_EQ(p.disconnectMinA, 39.1);                             // 430.110(A): 1.15 × 34
    EXPECT_EQ(p.nemaSize, "2"); // NEMA ICS 2: size 2 = 25 hp at 460 V
    // Table 250.122 gives 6 AWG for a 110 A device, but 250.122(A) never asks for more than
    // the 8 AWG circuit conductors.
    EXPECT_EQ(p.egcSize, "8 AWG");
}

// Same example, the two 30 hp wound-rotor motors: FLC 40 A, nameplate 38 A, 40 °C rise.
TEST(WorkedExample, AnnexD8WoundRotor) {
    const Part m = motor(
        30, 460,
        {{"fla", 38.0}, {"sf", 1.0}, {"temp_rise_c", 40.0}, {"rotor", std::string("wound_rotor")}});
    const auto p = propose(m, ScpdType::NonTimeDelayFuse);
    EXPECT_DOUBLE_EQ(p.flc.amps, 40);
    EXPECT_DOUBLE_EQ(p.conductorMinA, 50);
    EXPECT_EQ(p.conductorSize, "8 AWG");
    EXPECT_DOUBLE_EQ(*p.overloadMaxA, 47.5); // 125 %: marked rise ≤ 40 °C
    EXPECT_DOUBLE_EQ(p.scpdMaxA.at(ScpdType::NonTimeDelayFuse), 60); // wound rotor 150 % = 60
}

// 10 hp at 208 V: the 208 V column of Table 430.250, inverse-time breaker, 60 °C terminations
// (110.14(C)(1)(a), circuit under 100 A).
TEST(WorkedExample, TenHorsepower208V) {
    const Part m = motor(10, 208);
    const auto p = propose(m, ScpdType::InverseTimeBreaker, std::nullopt);
    EXPECT_DOUBLE_EQ(p.flc.amps, 30.8);
    EXPECT_DOUBLE_EQ(p.conductorMinA, 38.5);
    EXPECT_EQ(p.terminationC, 60);
    EXPECT_EQ(p.conductorSize, "8 AWG");                          // 60 °C: 10 AWG 30 A, 8 AWG 40 A
    EXPECT_DOUBLE_EQ(p.deviceRatingA, 80);                        // 250 % = 77 → 80
    EXPECT_DOUBLE_EQ(p.scpdMaxA.at(ScpdType::TimeDelayFuse), 60); // 175 % = 53.9 → 60
    EXPECT_EQ(p.nemaSize, "2");                                   // size 1 = 7.5 hp at 200 V
    EXPECT_EQ(p.egcSize, "8 AWG");                                // 80 A → 8 AWG
}

// 100 hp at 460 V above 100 A: 75 °C terminations by default (110.14(C)(1)(b)).
TEST(WorkedExample, HundredHorsepower460V) {
    const Part m = motor(100, 460, {{"fla", 120.0}, {"sf", 1.15}});
    const auto p = propose(m, ScpdType::InverseTimeBreaker, std::nullopt);
    EXPECT_DOUBLE_EQ(p.flc.amps, 124);
    EXPECT_DOUBLE_EQ(p.conductorMinA, 155);
    EXPECT_EQ(p.terminationC, 75);
    EXPECT_EQ(p.conductorSize, "2/0 AWG");  // 1/0 = 150 A < 155; 2/0 = 175 A
    EXPECT_DOUBLE_EQ(p.deviceRatingA, 350); // 250 % = 310 → 350
    EXPECT_DOUBLE_EQ(p.scpdMaxA.at(ScpdType::NonTimeDelayFuse), 400); // 300 % = 372 → 400
    EXPECT_DOUBLE_EQ(*p.overloadMaxA, 150);
    EXPECT_EQ(p.nemaSize, "4");
    EXPECT_EQ(p.egcSize, "3 AWG"); // 350 A → 3 AWG
}

// 2 hp single-phase 230 V: Table 430.248 gives 12 A.
TEST(WorkedExample, TwoHorsepowerSinglePhase) {
    const Part m = motor(2, 230, {{"phases", 1.0}});
    const auto p = propose(m, ScpdType::TimeDelayFuse, std::nullopt);
    EXPECT_DOUBLE_EQ(p.flc.amps, 12);
    EXPECT_EQ(p.conductorSize, "14 AWG");  // 15 A needed, 60 °C 14 AWG = 15 A
    EXPECT_DOUBLE_EQ(p.deviceRatingA, 25); // 175 % = 21 → 25
    EXPECT_EQ(p.nemaSize, "0");            // size 00 = 1 hp at 230 V single-phase
}

TEST(Sizing, KilowattMotorUsesNextHorsepowerRow) {
    Part m = Part::make(PartKind::Motor, PartId(1), "M");
    ASSERT_FALSE(m.set("kw", 15.0)); // 20.1 hp → 25 hp row
    ASSERT_FALSE(m.set("volts", 460.0));
    auto flc = motorFlc(m, testTables());
    ASSERT_TRUE(flc);
    EXPECT_DOUBLE_EQ(flc->hpUsed, 25);
    EXPECT_DOUBLE_EQ(flc->amps, 34);
}

TEST(Sizing, AmpacityAppliesAmbientAdjustmentAndTerminationLimit) {
    // Example of domain.md §7 (invented numbers): 10 AWG Cu, 90 °C insulation, 75 °C
    // terminations, 40 °C ambient, 3 conductors: min(40 × 0.91, 35) = 35 A. With 6 conductors:
    // 40 × 0.91 × 0.8 = 29.1 A.
    CableConditions c{Material::Cu, 90, 75, 40, 3, 1};
    EXPECT_NEAR(cableAmpacity("10 AWG", c, testTables())->amps, 35.0, 1e-9);
    c.conductors = 6;
    EXPECT_NEAR(cableAmpacity("10 AWG", c, testTables())->amps, 29.12, 1e-9);
    c.sets = 2;
    EXPECT_NEAR(cableAmpacity("10 AWG", c, testTables())->amps, 58.24, 1e-9);
}

TEST(Sizing, LockedRotorCurrentFromCodeLetter) {
    // NEC 2023 Table 430.7(B), letter G upper bound 6.29 kVA/hp: 25 hp at 460 V →
    // 6.29 × 25 × 1000 / (√3 × 460) = 197.4 A.
    const Part m = motor(25, 460, {{"code_letter", std::string("G")}});
    EXPECT_NEAR(*lockedRotorA(m, testTables(), nullptr), 197.4, 0.1);
    const Part given = motor(25, 460, {{"lra", 210.0}});
    EXPECT_DOUBLE_EQ(*lockedRotorA(given, testTables(), nullptr), 210);
}

TEST(Sizing, LockedRotorCurrentFromTheDesignLetterTable) {
    // No code letter: a Design B 25 hp motor at 460 V takes Table 430.251(B)'s 183 A (NEC,
    // as the 2008 edition prints it), at 200 V 420 A; 7.5 hp at 575 V 50.8 A.
    std::vector<TraceStep> trace;
    EXPECT_DOUBLE_EQ(*lockedRotorA(motor(25, 460), testTables(), &trace), 183);
    ASSERT_FALSE(trace.empty());
    EXPECT_NE(trace.back().value.find("Table 430.251(B)"), std::string::npos);
    EXPECT_DOUBLE_EQ(*lockedRotorA(motor(25, 200), testTables(), nullptr), 420);
    EXPECT_DOUBLE_EQ(*lockedRotorA(motor(7.5, 575), testTables(), nullptr), 50.8);
    const auto viaStudies = lockedRotor(motor(25, 460), testTables(), nullptr);
    ASSERT_TRUE(viaStudies);
    EXPECT_FALSE(viaStudies->assumed);
    // A Design A motor is not limited by the table: the assumed 6 × FLC (34 A) remains.
    const auto a =
        lockedRotor(motor(25, 460, {{"design", std::string("A")}}), testTables(), nullptr);
    ASSERT_TRUE(a);
    EXPECT_TRUE(a->assumed);
    EXPECT_DOUBLE_EQ(a->amps, 6 * 34);
    // A code letter on the nameplate is the motor's own and comes first.
    EXPECT_NEAR(
        *lockedRotorA(motor(25, 460, {{"code_letter", std::string("G")}}), testTables(), nullptr),
        197.4, 0.1);
}

TEST(Sizing, ProportionalEgcIncrease) {
    // NEC 2023 250.122(B) with Chapter 9 Table 8 areas: phase 6 AWG (26,240 cmil) instead of
    // the minimum 8 AWG (16,510): ratio 1.589 × 10 AWG (10,380 cmil) = 16,497 cmil → 8 AWG.
    auto e = egcSize(60, Material::Cu, "6 AWG", "8 AWG", testTables());
    ASSERT_TRUE(e);
    EXPECT_EQ(e->size, "8 AWG");
    // Phase 4 AWG (41,740): ratio 2.528 × 10,380 = 26,243 cmil, just above 6 AWG → 4 AWG.
    EXPECT_EQ(egcSize(60, Material::Cu, "4 AWG", "8 AWG", testTables())->size, "4 AWG");
}

TEST(Sizing, InstantaneousProposalClearsInrushWithinCode) {
    const Part m = motor(25, 460, {{"code_letter", std::string("G")}});
    const auto p = propose(m, ScpdType::InstantaneousBreaker);
    // 197.4 A × 1.5 / 0.8 = 370.1 → 375 A; above 800 % (272 A), within 1300 % (442 A).
    EXPECT_DOUBLE_EQ(p.deviceRatingA, 375);
}

TEST(OneDefault, AClearedServiceFactorReadsAsItsDefaultBeforeAndAfterSaving) {
    // NEC 2023 430.32(A)(1): 125 % of FLA for a service factor of 1.15 or more, 115 % below.
    // The field table's default service factor is 1.15; a cleared field must mean the same
    // thing in the editor as it does once the file is saved and read again.
    Drawing d = smallLineup();
    Part* motor = nullptr;
    for (const auto& p : d.parts())
        if (p.kind == PartKind::Motor)
            motor = d.part(p.id);
    ASSERT_NE(motor, nullptr);
    ASSERT_FALSE(motor->set("sf", 1.0));
    EXPECT_DOUBLE_EQ(overloadLimit(*motor, 10).pctA, 115);
    ASSERT_FALSE(motor->set("sf", FieldValue{}));
    EXPECT_EQ(motor->number("sf"), 1.15); // the default, shown and saved
    EXPECT_DOUBLE_EQ(overloadLimit(*motor, 10).pctA, 125);
    const auto again = io::parseDrawing(io::serializeDrawing(d));
    ASSERT_TRUE(again.drawing);
    EXPECT_DOUBLE_EQ(overloadLimit(*again.drawing->part(motor->id), 10).pctA, 125);
    auto said = [](const Drawing& x) {
        std::vector<std::string> out;
        for (const auto& f : checkDrawing(x, testTables()).findings)
            out.push_back(f.ruleId + ": " + f.message);
        return out;
    };
    EXPECT_EQ(said(*again.drawing), said(d));
}

TEST(OneDefault, AnEmptyRatingWithADefaultReadsAsTheDefault) {
    // A drawing whose load has no power factor in its values (as an older editor left it):
    // every reader gets the field table's 0.9.
    Part load = Part::make(PartKind::Load, PartId(1), "L");
    load.values.assign(load.values.size(), FieldValue{});
    EXPECT_EQ(load.number("pf"), 0.9);
    EXPECT_EQ(load.number("kva"), std::nullopt); // no default: still nothing
}

// NEC 2023 430.52(C)(1) Exception No. 1 rounds up to the next standard rating of the device
// type: for fuses 240.6(A) adds 1, 3, 6, 10 and 601 A. A 1 hp 460 V motor has a Table 430.250
// FLC of 2.1 A (from memory): time-delay fuse 175 % = 3.675 A → 6 A, non-time-delay fuse
// 300 % = 6.3 A → 10 A, inverse-time breaker 250 % = 5.25 A → 15 A (the breaker list starts
// at 15 A).
TEST(ScpdLimit, FusesRoundUpToTheFuseOnlyStandardRatings) {
    const Part m = motor(1, 460);
    const auto flc = motorFlc(m, testTables(), false);
    ASSERT_TRUE(flc);
    EXPECT_DOUBLE_EQ(flc->amps, 2.1);
    const auto type = motorTypeOf(m);
    EXPECT_DOUBLE_EQ(scpdLimit(ScpdType::TimeDelayFuse, type, flc->amps, testTables()).maxA, 6);
    EXPECT_DOUBLE_EQ(scpdLimit(ScpdType::NonTimeDelayFuse, type, flc->amps, testTables()).maxA, 10);
    EXPECT_DOUBLE_EQ(scpdLimit(ScpdType::InverseTimeBreaker, type, flc->amps, testTables()).maxA,
                     15);
}

// Exception No. 2(a) permits a non-time-delay fuse "not exceeding 600 amperes" up to 400 % of
// FLC, and 2(d) fuses of 601–6000 A up to 300 %. 150 hp at 460 V: FLC 180 A (Table 430.250,
// from memory); 400 % = 720 A but a fuse above 600 A falls under 2(d), whose 300 % = 540 A
// permits none: the ceiling is 600 A (it was 700 A before 2(d) was applied). 250 hp: FLC
// 302 A; the 2(d) ceiling 300 % = 906 A is the table value itself, which Exception No. 1
// already raises to the standard 1000 A: 2(d) takes nothing away there.
TEST(ScpdLimit, ExceptionTwoDLimitsNonTimeDelayFusesAbove600A) {
    const auto limit = [](double hp) {
        const Part m = motor(hp, 460);
        const auto flc = motorFlc(m, testTables(), false);
        EXPECT_TRUE(flc);
        return scpdLimit(ScpdType::NonTimeDelayFuse, motorTypeOf(m), flc ? flc->amps : 0,
                         testTables());
    };
    const auto l150 = limit(150);
    EXPECT_DOUBLE_EQ(l150.excMaxA, 600);
    EXPECT_NE(l150.excNote.find("2(a)"), std::string::npos) << l150.excNote;
    const auto l250 = limit(250);
    EXPECT_DOUBLE_EQ(l250.excMaxA, 1000); // Exc. No. 1 already gives 1000 A (300 % = 906 A)
    EXPECT_NE(l250.excNote.find("2(d)"), std::string::npos) << l250.excNote;
}

// NEC 2023 Table 430.250, synchronous-type unity power factor columns (from memory): 100 hp at
// 460 V is 101 A where the induction motor of the same rating is 124 A; outside the table's
// 25–200 hp the nameplate FLA sizes the branch.
TEST(MotorFlc, SynchronousMotorsReadTheirOwnColumns) {
    const auto flc = [](const Part& m) { return motorFlc(m, testTables(), true); };
    const auto induction = flc(motor(100, 460));
    ASSERT_TRUE(induction);
    EXPECT_DOUBLE_EQ(induction->amps, 124);
    const auto sync = flc(motor(100, 460, {{"rotor", std::string("synchronous")}}));
    ASSERT_TRUE(sync);
    EXPECT_DOUBLE_EQ(sync->amps, 101);
    EXPECT_NE(sync->trace.back().value.find("synchronous"), std::string::npos);
    const auto small = flc(motor(10, 460, {{"rotor", std::string("synchronous")}, {"fla", 13.0}}));
    ASSERT_TRUE(small);
    EXPECT_FALSE(small->fromTable);
    EXPECT_DOUBLE_EQ(small->amps, 13);
}
