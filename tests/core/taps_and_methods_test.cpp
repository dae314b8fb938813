// Transformer taps and off-nominal ratios in the studies, the motor voltage range, the IEC
// 60909 motor contribution and the listing-limit curve bands. Each expected value is computed
// here independently (series impedances in ohms) or quoted with its source.
#include "check/check.h"
#include "curves/trip_curve.h"
#include "io/drawing_file.h"
#include "studies/network_model.h"
#include "studies/study.h"
#include "test_support.h"

#include <cmath>
#include <complex>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::test;

namespace {

// The solve bus of a part's first terminal, and its fault currents.
int busOf(const Studied& s, PartId part) {
    return s.r.busOf(s.net->nodeOf(part, 0));
}
double minKa(const Studied& s, PartId part) {
    return *s.r.minFaultAtNode(s.net->nodeOf(part, 0));
}

// 13.8 kV source of `mva` (X/R 15) → 1000 kVA, 5.75 %Z, X/R 6 transformer → 480 V bus (id 3).
Drawing tappedLineup(double tapPct, double priV = 13800, double mva = 1e5) {
    DrawingBuilder b;
    auto src = b.add(PartKind::Source, "U", {{"kv", 13.8}, {"fault_mva", mva}, {"x_over_r", 15.0}});
    auto tx = b.add(PartKind::Transformer, "TX",
                    {{"kva", 1000.0},
                     {"pri_v", priV},
                     {"sec_v", 480.0},
                     {"z_pct", 5.75},
                     {"x_over_r", 6.0},
                     {"tap_pct", tapPct}});
    auto bus = b.add(PartKind::Bus, "SWBD", {{"volts", 480.0}, {"amps", 3000.0}});
    b.wire(src, 0, tx, 0);
    b.wire(tx, 1, bus, 0);
    b.drawing().settings.motorContributionX = 0;
    return b.drawing();
}

std::complex<double> polar(double mag, double xr) {
    return std::polar(mag, std::atan(xr));
}

// Independent series sum in ohms on the secondary: the source referred through the tapped
// ratio, the transformer's %Z on its rated secondary voltage (480 V, 1000 kVA).
std::complex<double> secondaryOhms(double noLoadV, double mva) {
    return polar(noLoadV * noLoadV / (mva * 1e6), 15) + polar(0.0575 * 480 * 480 / 1e6, 6);
}

} // namespace

TEST(TransformerTap, MinusFivePercentRaisesTheSecondaryAndItsFaultCurrent) {
    // −5 % primary tap: 0.95 × the rated primary turns, so at no load the secondary is
    // 480 / 0.95 = 505.26 V (105.26 % of nominal).
    const double mva = 500;
    Studied s(tappedLineup(-5.0, 13800, mva));
    ASSERT_TRUE(s.r.loadFlowConverged);
    EXPECT_NEAR(s.vAt(PartId(3)), 1.0 / 0.95, 1e-9);
    const double v = 480 / 0.95;
    const double expected = v / std::sqrt(3.0) / std::abs(secondaryOhms(v, mva)) / 1000;
    EXPECT_NEAR(s.faultAt(PartId(3)).ikKa, expected, expected * 1e-9);
    // Against the untapped transformer: the voltage rises by 1/0.95, and the source's share of
    // the impedance, referred through the new ratio, rises with its square.
    Studied plain(tappedLineup(0.0, 13800, mva));
    const double ratio =
        (v / std::abs(secondaryOhms(v, mva))) / (480 / std::abs(secondaryOhms(480, mva)));
    EXPECT_NEAR(s.faultAt(PartId(3)).ikKa / plain.faultAt(PartId(3)).ikKa, ratio, 1e-9);
    EXPECT_GT(ratio, 1.04);
}

TEST(TransformerTap, PlusTapLowersTheVoltageButNeverTheMaximumFault) {
    // +2.5 %: the secondary sits at 480 / 1.025 = 468.29 V. The maximum fault keeps a prefault
    // voltage of the nominal 480 V (the higher of the two); the minimum fault takes the lower.
    const double mva = 500;
    Studied s(tappedLineup(2.5, 13800, mva));
    EXPECT_NEAR(s.vAt(PartId(3)), 1.0 / 1.025, 1e-9);
    const double v = 480 / 1.025;
    const double z = std::abs(secondaryOhms(v, mva));
    EXPECT_NEAR(s.faultAt(PartId(3)).ikKa, 480 / std::sqrt(3.0) / z / 1000, 1e-9);
    // c_min 0.95 on the EMF and on the source's impedance (its stated level at its terminals).
    const std::complex<double> zMin =
        0.95 * polar(v * v / (mva * 1e6), 15) + polar(0.0575 * 480 * 480 / 1e6, 6);
    EXPECT_NEAR(minKa(s, PartId(3)), 0.95 * v / std::sqrt(3.0) / std::abs(zMin) / 1000, 1e-9);
}

TEST(TransformerTap, AWindingRatedBelowTheSystemVoltageRaisesTheSecondary) {
    // A 13.2 kV primary winding on a 13.8 kV system: 480 × 13.8 / 13.2 = 501.8 V at no load.
    Studied s(tappedLineup(0.0, 13200));
    EXPECT_NEAR(s.vAt(PartId(3)), 13.8 / 13.2, 1e-9);
    // The nominal voltage stays the drawing's; only the base moved.
    EXPECT_DOUBLE_EQ(s.r.model.nominalV[static_cast<std::size_t>(busOf(s, PartId(3)))], 480.0);
    EXPECT_NEAR(s.r.model.baseV[static_cast<std::size_t>(busOf(s, PartId(3)))], 480 * 13.8 / 13.2,
                1e-9);
}

TEST(TransformerTap, ParallelTransformersOnDifferentTapsAreReported) {
    auto parallel = [](double tapB) {
        Drawing d = tappedLineup(0.0);
        Part tx = Part::make(PartKind::Transformer, d.nextPartId(), "TX-B");
        for (auto [k, v] : std::initializer_list<std::pair<const char*, double>>{{"kva", 1000.0},
                                                                                 {"pri_v", 13800.0},
                                                                                 {"sec_v", 480.0},
                                                                                 {"z_pct", 5.75},
                                                                                 {"tap_pct", tapB}})
            EXPECT_FALSE(tx.set(k, v));
        d.addPart(tx);
        d.addWire(Wire{d.nextWireId(), {PartId(1), 0}, {tx.id, 0}});
        d.addWire(Wire{d.nextWireId(), {tx.id, 1}, {PartId(3), 0}});
        return checkDrawing(d, testTables());
    };
    const auto same = parallel(0.0);
    EXPECT_EQ(findRule(same, "study.ratio.mismatch"), nullptr);
    const auto differ = parallel(2.5);
    const Finding* f = findRule(differ, "study.ratio.mismatch");
    ASSERT_NE(f, nullptr);
    EXPECT_EQ(f->severity, Severity::Caution);
    EXPECT_NE(f->message.find("circulating current"), std::string::npos) << f->message;
}

TEST(MotorVoltageRange, AWrongTapPutsA460VMotorAbove110Percent) {
    // smallLineup: 480 V bus, 25 hp 460 V motor. At tap 0 it runs near 480/460 = 104 % (inside
    // NEMA MG 1-12.44's ±10 %, from memory); a −7.5 % tap raises the bus to 480 / 0.925 =
    // 518.9 V, 112.8 % of 460 V less the small drops: a violation.
    Drawing d = smallLineup();
    EXPECT_EQ(findRule(checkDrawing(d, testTables()), "voltage.motor.range"), nullptr);
    ASSERT_FALSE(d.part(PartId(2))->set("tap_pct", -7.5));
    const auto r = checkDrawing(d, testTables());
    const Finding* f = findRule(r, "voltage.motor.range");
    ASSERT_NE(f, nullptr);
    EXPECT_EQ(f->severity, Severity::Violation);
    EXPECT_GT(*f->computed, 110.0);
    EXPECT_LT(*f->computed, 480 / 0.925 / 460 * 100 + 1e-6);
    EXPECT_DOUBLE_EQ(*f->limit, 110.0);
    EXPECT_NE(f->fix->description.find("tap"), std::string::npos);
}

TEST(MotorContribution, Iec60909MotorImpedanceFromLockedRotorCurrent) {
    // IEC 60909-0 3.8.2 (from memory): Z_M = U_rM / (√3 · I_LR); R/X 0.42 for low voltage.
    EXPECT_DOUBLE_EQ(iecMotorROverX(460, 18.65), 0.42);
    EXPECT_DOUBLE_EQ(iecMotorROverX(4000, 500), 0.15);
    EXPECT_DOUBLE_EQ(iecMotorROverX(4000, 2500), 0.10); // 1250 kW per pole pair (4 poles)
    Drawing d = smallLineup();
    ASSERT_FALSE(d.part(PartId(9))->set("lra", 200.0));
    d.settings.motorContribution = MotorContribution::Iec60909;
    Network net(d);
    const NetworkModel m = buildNetworkModel(net, testTables(), d.settings);
    ASSERT_EQ(m.motors.size(), 1u);
    const double vb = m.baseV[static_cast<std::size_t>(m.motors[0].bus)];
    const std::complex<double> zOhm = m.motors[0].z * (vb * vb / (kBaseMva * 1e6));
    EXPECT_NEAR(std::abs(zOhm), 460 / std::sqrt(3.0) / 200, 1e-9);
    EXPECT_NEAR(zOhm.real() / zOhm.imag(), 0.42, 1e-9);
    // The fixed multiple (4 × FLC 34 A) feeds less than the locked-rotor method (200 A).
    Drawing multiple = d;
    multiple.settings.motorContribution = MotorContribution::Multiple;
    Studied a(d), b(multiple);
    EXPECT_GT(a.faultAt(PartId(4)).ikKa, b.faultAt(PartId(4)).ikKa);
    // The setting survives the file, and a bad value is refused with where and why.
    d.settings.curveBands = CurveBands::ListingLimits;
    const auto back = io::parseDrawing(io::serializeDrawing(d));
    ASSERT_TRUE(back.drawing) << back.error->text();
    EXPECT_EQ(back.drawing->settings.motorContribution, MotorContribution::Iec60909);
    EXPECT_EQ(back.drawing->settings.curveBands, CurveBands::ListingLimits);
    std::string text = io::serializeDrawing(d);
    text.replace(text.find("\"iec60909\""), 10, "\"iec61363\"");
    const auto bad = io::parseDrawing(text);
    ASSERT_TRUE(bad.error);
    EXPECT_NE(bad.error->text().find("motor_contribution_method must be"), std::string::npos)
        << bad.error->text();
}

TEST(CurveBands, ListingLimitsAreUl489CalibrationTimes) {
    // UL 489 maximum tripping times (from memory): 200 % — 2 min to 30 A, 4 min to 50 A,
    // 6 min to 100 A, ... 30 min above 5000 A; 135 % — 1 h to 50 A, 2 h above.
    EXPECT_DOUBLE_EQ(TripCurve::listingTime200(30), 120);
    EXPECT_DOUBLE_EQ(TripCurve::listingTime200(100), 360);
    EXPECT_DOUBLE_EQ(TripCurve::listingTime200(400), 720);
    EXPECT_DOUBLE_EQ(TripCurve::listingTime200(6000), 1800);
    EXPECT_DOUBLE_EQ(TripCurve::listingTime135(50), 3600);
    EXPECT_DOUBLE_EQ(TripCurve::listingTime135(100), 7200);
    Part cb = Part::make(PartKind::Breaker, PartId(1), "CB");
    ASSERT_FALSE(cb.set("trip_a", 100.0));
    ASSERT_FALSE(cb.set("frame_a", 100.0));
    ASSERT_FALSE(cb.set("interrupting_ka", 65.0));
    const auto typical = TripCurve::of(cb);
    const auto listing = TripCurve::of(cb, CurveBands::ListingLimits);
    ASSERT_TRUE(typical && listing);
    EXPECT_NEAR(listing->maxTime(200), 360, 1e-9);
    EXPECT_NEAR(listing->maxTime(135), 7200, 1e-6);
    // Never faster than the typical band; the minimum band and instantaneous are unchanged.
    for (double a : {136.0, 150.0, 200.0, 300.0, 500.0, 900.0, 1300.0, 5000.0}) {
        EXPECT_GE(listing->maxTime(a), typical->maxTime(a)) << a;
        EXPECT_DOUBLE_EQ(listing->minTime(a), typical->minTime(a)) << a;
    }
    EXPECT_DOUBLE_EQ(listing->maxTime(1300), 0.025);
}

namespace {

// Source → 150 kVA transformer (about 3 kA at the MCC: below the current where CB-UP's
// long-time minimum meets CB-DN's instantaneous) → switchboard → CB-UP (400 A electronic, long-time
// pickup 0.5 → Ir 200 A, 10 s; short time 10 × Ir, 0.3 s) → MCC → CB-DN (100 A thermal-magnetic) →
// cable → 40 kVA load.
Drawing upDownPair() {
    DrawingBuilder b;
    auto src = b.add(PartKind::Source, "U", {{"kv", 13.8}, {"fault_mva", 500.0}});
    auto tx = b.add(PartKind::Transformer, "TX",
                    {{"kva", 150.0}, {"pri_v", 13800.0}, {"sec_v", 480.0}, {"z_pct", 5.75}});
    auto swbd = b.add(PartKind::Bus, "SWBD", {{"volts", 480.0}, {"amps", 1200.0}});
    auto up = b.add(PartKind::Breaker, "CB-UP",
                    {{"trip_a", 400.0},
                     {"frame_a", 400.0},
                     {"interrupting_ka", 65.0},
                     {"trip_type", std::string("electronic")},
                     {"lt_pickup_x", 0.5},
                     {"lt_delay_s", 10.0},
                     {"st_pickup_x", 10.0},
                     {"st_delay_s", 0.3}});
    auto mcc = b.add(PartKind::Bus, "MCC", {{"volts", 480.0}, {"amps", 400.0}});
    auto dn = b.add(PartKind::Breaker, "CB-DN",
                    {{"trip_a", 100.0}, {"frame_a", 100.0}, {"interrupting_ka", 65.0}});
    auto c = b.add(PartKind::Cable, "C", {{"size", std::string("1 AWG")}, {"length_ft", 50.0}});
    auto ld = b.add(PartKind::Load, "LD", {{"kva", 40.0}, {"volts", 480.0}});
    b.wire(src, 0, tx, 0);
    b.wire(tx, 1, swbd, 0);
    b.wire(swbd, 0, up, 0);
    b.wire(up, 1, mcc, 0);
    b.wire(mcc, 0, dn, 0);
    b.wire(dn, 1, c, 0);
    b.wire(c, 1, ld, 0);
    return b.drawing();
}

} // namespace

TEST(CurveBands, APairSelectiveOnlyOnTypicalBandsGetsTheListingCaution) {
    // At 250 A the upstream unit (Ir 200 A, 10 s at 6 × Ir, −20 %) may trip in
    // 0.8 × 10 × 36 / 1.25² = 184 s. The 100 A breaker's typical maximum there is
    // 40 × 3 / (2.5² − 1) = 22.9 s (selective); at the listing limit 360 × (2 / 2.5)² = 230 s.
    Drawing d = upDownPair();
    const auto typical = checkDrawing(d, testTables());
    EXPECT_EQ(findRule(typical, "curve.selectivity"), nullptr);
    const Finding* f = findRule(typical, "curve.selectivity.listing");
    ASSERT_NE(f, nullptr);
    EXPECT_EQ(f->severity, Severity::Note);
    EXPECT_NE(f->message.find("manufacturers' curves"), std::string::npos) << f->message;
    // With the listing limits as the drawing's bands, the pair is simply not selective, and
    // the trace says which bands judged it.
    d.settings.curveBands = CurveBands::ListingLimits;
    const auto listing = checkDrawing(d, testTables());
    EXPECT_EQ(findRule(listing, "curve.selectivity.listing"), nullptr);
    const Finding* g = findRule(listing, "curve.selectivity");
    ASSERT_NE(g, nullptr);
    bool said = false;
    for (const auto& step : g->trace)
        said |= step.name == "bands" && step.value.find("listing limits") != std::string::npos;
    EXPECT_TRUE(said);
    // A slower upstream unit (Ir 300 A) is selective at the listing limits too: no caution.
    Drawing slower = upDownPair();
    ASSERT_FALSE(slower.part(PartId(4))->set("lt_pickup_x", 0.75));
    ASSERT_FALSE(slower.part(PartId(4))->set("lt_delay_s", 24.0));
    const auto ok = checkDrawing(slower, testTables());
    EXPECT_EQ(findRule(ok, "curve.selectivity.listing"), nullptr);
    EXPECT_EQ(findRule(ok, "curve.selectivity"), nullptr);
}

TEST(CurveBands, TheSmallLineupsBranchBreakerIsUndecidedAtTheListingLimits) {
    // CB-1 (80 A thermal-magnetic, inst 6×) under CB-M (80 A electronic, 20 s): OL-1 is
    // credited up to 8 × its size 2 contactor's 45 A = 360 A; at 400 A CB-1's listing maximum
    // is 360 × (2 / 5)² = 57.6 s while CB-M may trip in 0.8 × 20 × 36 / 5² = 23 s (typical
    // band: 40 × 3 / 24 = 5 s, selective). An electronic downstream unit is not re-judged.
    const auto r = checkDrawing(smallLineup(), testTables());
    const Finding* f = findRule(r, "curve.selectivity.listing");
    ASSERT_NE(f, nullptr);
    EXPECT_EQ(f->severity, Severity::Note);
    EXPECT_NE(f->message.find("CB-1 and CB-M"), std::string::npos) << f->message;
    // Selective up to the last current checked below the relay's reach, not beyond it.
    EXPECT_GT(*f->computed, 0.30);
    EXPECT_LE(*f->computed, 0.36 + 1e-9);
}
