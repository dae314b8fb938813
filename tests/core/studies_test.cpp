// Studies against published methods and analytic results: infinite-bus transformer faults,
// an independent series (point-to-point) calculation, ties, κ, voltage drop, motor starting,
// and properties on generated radial networks.
#include "check/check.h"
#include "curves/path_curves.h"
#include "sizing/motor_sizing.h"
#include "studies/admittance.h"
#include "studies/study.h"
#include "studies/study_view.h"
#include "studies/tree_solver.h"
#include "test_support.h"

#include <cmath>
#include <complex>
#include <gtest/gtest.h>
#include <random>

using namespace lineward;
using namespace lineward::test;

namespace {

// Source → transformer → bus, optionally → cable → second bus.
Drawing transformerLineup(double sourceMva, double kva, double zPct, double xr,
                          const char* cableSize = nullptr, double lengthFt = 0, double sets = 1) {
    DrawingBuilder b;
    auto src =
        b.add(PartKind::Source, "U", {{"kv", 13.8}, {"fault_mva", sourceMva}, {"x_over_r", 15.0}});
    auto tx = b.add(
        PartKind::Transformer, "TX",
        {{"kva", kva}, {"pri_v", 13800.0}, {"sec_v", 480.0}, {"z_pct", zPct}, {"x_over_r", xr}});
    auto bus = b.add(PartKind::Bus, "SWBD", {{"volts", 480.0}, {"amps", 3000.0}});
    b.wire(src, 0, tx, 0);
    b.wire(tx, 1, bus, 0);
    if (cableSize) {
        auto c = b.add(PartKind::Cable, "C",
                       {{"size", std::string(cableSize)},
                        {"length_ft", lengthFt},
                        {"sets", sets},
                        {"raceway", std::string("steel")}});
        auto bus2 = b.add(PartKind::Bus, "MCC", {{"volts", 480.0}, {"amps", 800.0}});
        b.wire(bus, 0, c, 0);
        b.wire(c, 1, bus2, 0);
    }
    b.drawing().settings.motorContributionX = 0;
    return b.drawing();
}

} // namespace

TEST(FaultStudy, MaximumFaultConservatismFollowsTheDrawingSettings) {
    // The lineup above with c_max 1.1 (IEC 60909-0 Table 1, low voltage, from memory), the
    // transformer's %Z 7.5 % below nameplate (common practice) and cables at 75 °C: the source
    // impedance is c·U²/S (its stated level holds at its own terminals), every EMF is c.
    Drawing d = transformerLineup(500, 1500, 5.75, 6.5, "500 kcmil", 200, 2);
    d.settings.faultCMax = 1.1;
    d.settings.txZTolerancePct = 7.5;
    d.settings.faultConductorC = 75;
    Studied s(std::move(d));
    const double v = 480, zb = v * v / 1.5e6;
    auto polar = [](double mag, double xr) { return std::polar(mag, std::atan(xr)); };
    const std::complex<double> zSrc = 1.1 * polar(v * v / 500e6, 15);
    const std::complex<double> zTx = polar(0.0575 * 0.925 * zb, 6.5);
    const std::complex<double> zCable = std::complex<double>(0.029, 0.048) * 0.2 / 2.0;
    const double iSwbd = 1.1 * v / std::sqrt(3.0) / std::abs(zSrc + zTx) / 1000;
    const double iMcc = 1.1 * v / std::sqrt(3.0) / std::abs(zSrc + zTx + zCable) / 1000;
    EXPECT_NEAR(s.faultAt(PartId(3)).ikKa, iSwbd, iSwbd * 1e-6);
    EXPECT_NEAR(s.faultAt(PartId(5)).ikKa, iMcc, iMcc * 1e-6);
    // The source's own terminals still see its stated 500 MVA: 500 / (√3 × 13.8) = 20.92 kA.
    EXPECT_NEAR(s.faultAt(PartId(1)).ikKa, 500 / (std::sqrt(3.0) * 13.8), 1e-6);
    // The same lineup with the defaults (c 1.0, nameplate %Z, 20 °C) gives less current.
    Studied plain(transformerLineup(500, 1500, 5.75, 6.5, "500 kcmil", 200, 2));
    EXPECT_LT(plain.faultAt(PartId(5)).ikKa, iMcc * 0.95);
}

TEST(FaultStudy, InfiniteBusTransformer) {
    // I = FLA × 100 / %Z: 1000 kVA at 480 V, FLA = 1000 / (√3 × 0.48) = 1202.8 A;
    // 5.75 %Z → 20.92 kA (the infinite-bus method taught with NEC 110.9 / 110.10 duty checks).
    Studied s(transformerLineup(1e5, 1000, 5.75, 6));
    EXPECT_NEAR(s.faultAt(PartId(3)).ikKa, 20.92, 0.02);
    EXPECT_NEAR(s.faultAt(PartId(3)).xOverR, 6.0, 0.05); // source X/R barely shifts it
}

TEST(FaultStudy, SeriesSumAndPointToPointAgreeWithNodalSolve) {
    // 1500 kVA, 5.75 %Z, X/R 6.5 behind a 500 MVA source (X/R 15); then 200 ft of 2 sets of
    // 500 kcmil Cu in steel conduit (NEC Chapter 9 Table 9: R 0.029, X 0.048 Ω/1000 ft).
    Studied s(transformerLineup(500, 1500, 5.75, 6.5, "500 kcmil", 200, 2));
    const double v = 480, zb = v * v / 1.5e6; // ohm base on the transformer rating
    auto polar = [](double mag, double xr) { return std::polar(mag, std::atan(xr)); };
    // Independent series sum in ohms at 480 V.
    const std::complex<double> zSrc = polar(v * v / 500e6, 15), zTx = polar(0.0575 * zb, 6.5);
    // The maximum fault current takes the conductors at 20 °C (default setting): Table 9's
    // 75 °C resistance × (1 + 0.00323 × (20 − 75)) (NEC Chapter 9 Table 8 Note 2, from memory).
    const double cold = 1 + 0.00323 * (20 - 75);
    const std::complex<double> zCable = std::complex<double>(0.029 * cold, 0.048) * 0.2 / 2.0;
    const double iSwbd = v / std::sqrt(3.0) / std::abs(zSrc + zTx) / 1000;
    const double iMcc = v / std::sqrt(3.0) / std::abs(zSrc + zTx + zCable) / 1000;
    EXPECT_NEAR(s.faultAt(PartId(3)).ikKa, iSwbd, iSwbd * 1e-6);
    EXPECT_NEAR(s.faultAt(PartId(5)).ikKa, iMcc, iMcc * 1e-6);
    // The published point-to-point method (from memory): f = √3·L·I / (C·n·E), M = 1/(1+f),
    // with C = 1000 / |Z per 1000 ft per phase| (ft/Ω); it adds magnitudes, so it reads a
    // little low. Agreement within 5 % is expected.
    const double c = 1000.0 / std::abs(std::complex<double>(0.029, 0.048));
    const double f = std::sqrt(3.0) * 200 * iSwbd * 1000 / (c * 2 * v);
    const double pointToPoint = iSwbd / (1 + f);
    EXPECT_NEAR(s.faultAt(PartId(5)).ikKa, pointToPoint, pointToPoint * 0.05);
    EXPECT_LT(s.faultAt(PartId(5)).ikKa, s.faultAt(PartId(3)).ikKa);
}

namespace {
// Two equal sources and transformers on two buses joined by a tie breaker.
Drawing doubleEnded(bool tieOpen) {
    DrawingBuilder b;
    std::vector<PartId> buses;
    for (const char* side : {"A", "B"}) {
        auto src =
            b.add(PartKind::Source, std::string("U-") + side, {{"kv", 13.8}, {"fault_mva", 250.0}});
        auto tx = b.add(PartKind::Transformer, std::string("TX-") + side,
                        {{"kva", 1500.0}, {"pri_v", 13800.0}, {"sec_v", 480.0}, {"z_pct", 5.75}});
        auto bus =
            b.add(PartKind::Bus, std::string("BUS-") + side, {{"volts", 480.0}, {"amps", 2000.0}});
        b.wire(src, 0, tx, 0);
        b.wire(tx, 1, bus, 0);
        buses.push_back(bus);
    }
    auto tie = b.add(PartKind::Breaker, "TIE",
                     {{"trip_a", 2000.0}, {"interrupting_ka", 65.0}, {"open", tieOpen}});
    b.wire(buses[0], 0, tie, 0);
    b.wire(tie, 1, buses[1], 0);
    b.drawing().settings.motorContributionX = 0;
    return b.drawing();
}
} // namespace

TEST(FaultStudy, ClosedTieDoublesOpenTieSeparates) {
    Studied open(doubleEnded(true));
    Studied closed(doubleEnded(false));
    const double single = open.faultAt(PartId(3)).ikKa;
    EXPECT_NEAR(open.faultAt(PartId(6)).ikKa, single, 1e-9); // each side alone, equal
    // Two identical paths in parallel: half the impedance, twice the current (analytic).
    EXPECT_NEAR(closed.faultAt(PartId(3)).ikKa, 2 * single, 2 * single * 1e-9);
    EXPECT_NEAR(closed.faultAt(PartId(6)).ikKa, 2 * single, 2 * single * 1e-9);
}

TEST(FaultStudy, PeakFactorByIec60909) {
    // κ read from the curve of κ against R/X in IEC 60909-0 (Figure 8 of the 2016 edition),
    // to the two decimals a reading gives (from memory): R/X 0.1 → 1.75, 0.2 → 1.56,
    // 0.3 → 1.42, 0.5 → 1.24, 1.0 → 1.07; κ tends to 2 as R → 0 and to 1.02 for large R/X.
    const std::pair<double, double> readings[] = {
        {0.1, 1.75}, {0.2, 1.56}, {0.3, 1.42}, {0.5, 1.24}, {1.0, 1.07}};
    for (const auto& [rOverX, kappa] : readings)
        EXPECT_NEAR(peakFactor(1.0 / rOverX), kappa, 0.01) << "R/X " << rOverX;
    EXPECT_NEAR(peakFactor(10.0), 1.746, 1e-3);
    EXPECT_NEAR(peakFactor(1e9), 2.0, 1e-6);
    EXPECT_NEAR(peakFactor(0.1), 1.02, 1e-6);
    Studied s(transformerLineup(1e5, 1000, 5.75, 6));
    const auto& f = s.faultAt(PartId(3));
    EXPECT_NEAR(f.peakKa, peakFactor(f.xOverR) * std::sqrt(2.0) * f.ikKa, 1e-9);
}

TEST(FaultStudy, MotorsContribute) {
    Drawing d = smallLineup();
    const double without = [&] {
        Drawing x = d;
        x.settings.motorContributionX = 0;
        return Studied(x).faultAt(PartId(4)).ikKa;
    }();
    Studied with(d);
    EXPECT_GT(with.faultAt(PartId(4)).ikKa, without);
    // 4 × 34 A at the 460 V rating is 4 × 34 × 480/460 = 141.9 A on the 480 V bus, less the
    // 8 AWG cable's share: a contribution of at most 0.1419 kA.
    EXPECT_LT(with.faultAt(PartId(4)).ikKa - without, 0.1419);
}

TEST(VoltageStudy, MatchesTable9EffectiveImpedanceMethod) {
    // NEC Chapter 9 Table 9, Note 2 method: Ze = R·cos θ + X·sin θ. 6 AWG Cu in steel conduit
    // (R 0.49, X 0.064 Ω/1000 ft) at 0.85 pf: Ze = 0.4503 Ω/1000 ft. A 40 kVA, 0.85 pf load at
    // 480 V (48.1 A) over 200 ft: ΔV = √3 × 48.1 × 0.4503 × 0.2 = 7.50 V = 1.56 %.
    Drawing d = transformerLineup(1e5, 1000, 5.75, 6, "6 AWG", 200, 1);
    Part load = Part::make(PartKind::Load, d.nextPartId(), "LD");
    ASSERT_FALSE(load.set("kva", 40.0));
    ASSERT_FALSE(load.set("pf", 0.85));
    ASSERT_FALSE(load.set("volts", 480.0));
    d.addPart(load);
    d.addWire(Wire{d.nextWireId(), {PartId(5), 0}, {load.id, 0}});
    Studied s(d);
    ASSERT_TRUE(s.r.loadFlowConverged);
    const double dropPct = (s.vAt(PartId(3)) - s.vAt(PartId(5))) * 100;
    const double ze = 0.49 * 0.85 + 0.064 * std::sin(std::acos(0.85));
    const double amps = 40e3 / (std::sqrt(3.0) * 480);
    const double formula = std::sqrt(3.0) * amps * ze * 0.2 / 480 * 100;
    EXPECT_NEAR(formula, 1.56, 0.01);
    // The load flow holds power constant, so the current rises a little as voltage falls.
    EXPECT_NEAR(dropPct, formula, 0.05);
}

TEST(VoltageStudy, MotorStartingDipMatchesSourceRatio) {
    // A motor at locked rotor on a transformer behind an infinite bus: with no other load the
    // terminal voltage is |Z_LR / (Z_LR + Z_T)| (voltage divider; the classic
    // short-circuit-ratio estimate of starting dip). 500 kVA, 5 %Z, X/R 5; 100 hp, 460 V
    // motor, LRA 750 A (given), starting pf 0.3, bolted to the secondary bus.
    DrawingBuilder b;
    auto src = b.add(PartKind::Source, "U", {{"kv", 13.8}, {"fault_mva", 1e5}});
    auto tx = b.add(
        PartKind::Transformer, "TX",
        {{"kva", 500.0}, {"pri_v", 13800.0}, {"sec_v", 480.0}, {"z_pct", 5.0}, {"x_over_r", 5.0}});
    auto bus = b.add(PartKind::Bus, "B", {{"volts", 480.0}, {"amps", 800.0}});
    auto m = b.add(PartKind::Motor, "M",
                   {{"hp", 100.0}, {"volts", 480.0}, {"lra", 750.0}, {"fla", 120.0}});
    b.wire(src, 0, tx, 0);
    b.wire(tx, 1, bus, 0);
    b.wire(bus, 0, m, 0);
    Studied s(b.drawing());
    const auto& ms = s.r.starts.at(m);
    const double zb = 480.0 * 480 / 500e3;
    const std::complex<double> zt = std::polar(0.05 * zb, std::atan(5.0));
    const std::complex<double> zlr = std::polar(480 / std::sqrt(3.0) / 750, std::acos(0.3));
    const double expectTerminal = std::abs(zlr / (zlr + zt)) * 100;
    // Before the start, with the motor not yet running and nothing else connected, the bus
    // sits at the source EMF (1 pu; the 100,000 MVA source adds a few millionths): the divider
    // gives both the terminal voltage and the dip, which is measured from that voltage.
    EXPECT_NEAR(ms.terminalPctOfRated, expectTerminal, 0.01);
    EXPECT_NEAR(ms.busDipPct, 100.0 - expectTerminal, 0.01);
}

TEST(DutyRules, IceaWithstandLimit) {
    // ICEA P-32-382 (from memory): (I/A)²·t = 0.0297·log10((T2+234)/(T1+234)) for copper.
    // 1/0 AWG (105,600 cmil), 90 °C → 250 °C: I²t = 105600² × 0.0297 × log10(484/324) = 5.76e7 A²s.
    Drawing d = transformerLineup(1e5, 1000, 5.75, 6, "1/0 AWG", 10, 1);
    // Feeder breaker stated to clear in 0.5 s at this fault: lets through about 20.9 kA² × 0.5.
    Part cb = Part::make(PartKind::Breaker, d.nextPartId(), "CB");
    ASSERT_FALSE(cb.set("trip_a", 150.0));
    ASSERT_FALSE(cb.set("interrupting_ka", 65.0));
    ASSERT_FALSE(cb.set("clear_s", 0.5));
    d.addPart(cb);
    const auto w = std::find_if(d.wires().begin(), d.wires().end(),
                                [](const Wire& x) { return x.b.part == PartId(4); });
    ASSERT_NE(w, d.wires().end());
    const auto bus = w->a;
    d.removeWire(w->id);
    d.addWire(Wire{d.nextWireId(), bus, {cb.id, 0}});
    d.addWire(Wire{d.nextWireId(), {cb.id, 1}, {PartId(4), 0}});
    const auto r = checkDrawing(d, testTables());
    auto it = std::find_if(r.findings.begin(), r.findings.end(),
                           [](const Finding& f) { return f.ruleId == "duty.withstand"; });
    ASSERT_NE(it, r.findings.end());
    EXPECT_NEAR(*it->limit, 105600.0 * 105600 * 0.0297 * std::log10(484.0 / 324.0), 1.0);
    // With a stated let-through below the limit the cable passes.
    ASSERT_FALSE(d.part(cb.id)->set("let_through_a2s", 5e7));
    const auto r2 = checkDrawing(d, testTables());
    EXPECT_TRUE(std::none_of(r2.findings.begin(), r2.findings.end(), [](const Finding& f) {
        return f.ruleId.rfind("duty.withstand", 0) == 0;
    }));
}

TEST(DutyRules, InterruptingBracingAndSccr) {
    Drawing d = smallLineup(); // 75 kVA 5.75 %Z behind 20 kA at 13.8 kV: about 1.5 kA at 480 V
    ASSERT_FALSE(d.part(PartId(4))->set("bracing_ka", 10.0));
    auto count = [&](const char* rule) {
        int n = 0;
        for (const auto& f : checkDrawing(d, testTables()).findings)
            n += f.ruleId == rule;
        return n;
    };
    EXPECT_EQ(count("duty.interrupting"), 0);
    EXPECT_EQ(count("duty.bracing"), 0);
    EXPECT_EQ(count("duty.sccr"), 0);
    ASSERT_FALSE(d.part(PartId(2))->set("kva", 2500.0)); // now about 46 kA at the bus
    EXPECT_EQ(count("duty.bracing"), 1);
    ASSERT_FALSE(d.part(PartId(5))->set("interrupting_ka", 25.0));
    EXPECT_EQ(count("duty.interrupting"), 1);
    // The motor contribution the fault current includes is stated in the trace, with the
    // drawing's setting.
    for (const auto& f : checkDrawing(d, testTables()).findings)
        if (f.ruleId == "duty.interrupting") {
            const auto step = std::find_if(f.trace.begin(), f.trace.end(), [](const auto& s) {
                return s.name == "motor contribution";
            });
            ASSERT_NE(step, f.trace.end());
            EXPECT_NE(step->value.find(fmt(d.settings.motorContributionX, 1) + " × its FLC"),
                      std::string::npos)
                << step->value;
        }
    EXPECT_EQ(count("duty.sccr"), 0); // bucket rated 65 kA
    Bucket b = *d.bucket(BucketId(1));
    b.sccrKa = 22.0;
    ASSERT_TRUE(d.updateBucket(b));
    EXPECT_EQ(count("duty.sccr"), 1);
}

// A source straight on a 480 V bus: the bus sees the source's fault current and X/R, with no
// motor to add to them.
static Drawing sourceOnBus(double faultKa, double xOverR, PartKind device,
                           std::initializer_list<std::pair<const char*, FieldValue>> values) {
    DrawingBuilder b;
    auto src =
        b.add(PartKind::Source, "U", {{"kv", 0.48}, {"fault_ka", faultKa}, {"x_over_r", xOverR}});
    auto bus = b.add(PartKind::Bus, "SWBD", {{"volts", 480.0}, {"amps", 800.0}});
    auto dev = b.add(device, "D-1", values);
    auto c = b.add(PartKind::Cable, "C-1", {{"size", std::string("3 AWG")}, {"length_ft", 50.0}});
    auto ld = b.add(PartKind::Load, "LD-1", {{"kva", 50.0}, {"volts", 480.0}});
    b.wire(src, 0, bus, 0);
    b.wire(bus, 0, dev, 0);
    b.wire(dev, 1, c, 0);
    b.wire(c, 1, ld, 0);
    return b.drawing();
}

// IEEE Std 1015 method (from memory): a rating tested at X/R 4.9 (UL 489 above 20 kA, power
// factor 20 %) met by a system X/R of 8 is worth 22 / ((1 + e^(−π/8)) / (1 + e^(−π/4.899)))
// = 22 / 1.0973 = 20.05 kA, below 21.9 kA: a violation although 22 > 21.9.
TEST(DutyRules, InterruptingRatingDeratedForSystemXr) {
    Drawing d = sourceOnBus(21.9, 8.0, PartKind::Breaker,
                            {{"trip_a", 100.0}, {"interrupting_ka", 22.0}, {"inst_x", 10.0}});
    const auto r = checkDrawing(d, testTables());
    const Finding* f = findRule(r, "duty.interrupting");
    ASSERT_NE(f, nullptr);
    EXPECT_NEAR(*f->computed, 21.9, 0.01);
    const double mf = (1 + std::exp(-M_PI / 8.0)) / (1 + std::exp(-M_PI / std::sqrt(24.0)));
    EXPECT_NEAR(mf, 1.0973, 5e-4);
    EXPECT_NEAR(*f->limit, 22.0 / mf, 0.01);
    auto has = [&](std::string_view name, std::string_view text) {
        return std::any_of(f->trace.begin(), f->trace.end(), [&](const TraceStep& s) {
            return s.name == name && s.value.find(text) != std::string::npos;
        });
    };
    EXPECT_TRUE(has("rating's test circuit", "power factor 20 %")) << f->trace.size();
    EXPECT_TRUE(has("X/R multiplying factor", "= 1.097"));
    ASSERT_TRUE(f->fix && !f->fix->changes.empty());
    EXPECT_EQ(std::get<double>(f->fix->changes.front().value), 25.0); // 21.9 × 1.097 = 24.0

    // At X/R 4 (below the test circuit's 4.9) the same breaker is worth its full 22 kA.
    ASSERT_FALSE(d.part(PartId(1))->set("x_over_r", 4.0));
    EXPECT_EQ(findRule(checkDrawing(d, testTables()), "duty.interrupting"), nullptr);

    // An unfused low-voltage power breaker is tested at 15 % (X/R 6.59) on r.m.s. current:
    // at X/R 8, MF = √(1 + 2e^(−2π/8)) / √(1 + 2e^(−2π/6.59)) = 1.0318, worth 21.32 kA.
    ASSERT_FALSE(d.part(PartId(1))->set("x_over_r", 8.0));
    ASSERT_FALSE(d.part(PartId(3))->set("construction", std::string("power")));
    const auto r2 = checkDrawing(d, testTables());
    const Finding* f2 = findRule(r2, "duty.interrupting");
    ASSERT_NE(f2, nullptr);
    const double xt = std::sqrt(1 / 0.0225 - 1);
    const double mf2 =
        std::sqrt(1 + 2 * std::exp(-2 * M_PI / 8.0)) / std::sqrt(1 + 2 * std::exp(-2 * M_PI / xt));
    EXPECT_NEAR(*f2->limit, 22.0 / mf2, 0.01);
    EXPECT_LT(*f2->limit, 21.9);
    // Rated 25 kA it passes (25 / 1.032 = 24.2 kA).
    ASSERT_FALSE(d.part(PartId(3))->set("interrupting_ka", 25.0));
    EXPECT_EQ(findRule(checkDrawing(d, testTables()), "duty.interrupting"), nullptr);
}

TEST(DutyRules, LowRatedMoldedCaseUsesItsOwnTestCircuit) {
    // Rated 10 kA: tested at power factor 50 % (X/R 1.73). At X/R 3, 9.5 kA available:
    // MF = (1 + e^(−π/3)) / (1 + e^(−π/1.732)) = 1.3509 / 1.1630 = 1.1616 → 8.61 kA, short.
    Drawing d = sourceOnBus(9.5, 3.0, PartKind::Breaker,
                            {{"trip_a", 100.0}, {"interrupting_ka", 10.0}, {"inst_x", 10.0}});
    const auto report = checkDrawing(d, testTables()); // the finding lives in the report
    const Finding* f = findRule(report, "duty.interrupting");
    ASSERT_NE(f, nullptr);
    const double mf = (1 + std::exp(-M_PI / 3.0)) / (1 + std::exp(-M_PI / std::sqrt(3.0)));
    EXPECT_NEAR(*f->limit, 10.0 / mf, 0.01);
    // A fuse rated 200 kA at the same place is far from its limit.
    Drawing d2 =
        sourceOnBus(9.5, 3.0, PartKind::Fuse, {{"amps", 100.0}, {"interrupting_ka", 200.0}});
    EXPECT_EQ(findRule(checkDrawing(d2, testTables()), "duty.interrupting"), nullptr);
}

// Property: on generated radial networks without motors, fault current never rises and
// voltage drop never falls going away from the source.
class RadialProperty : public ::testing::TestWithParam<int> {};
TEST_P(RadialProperty, FaultFallsAndDropGrowsDownstream) {
    std::mt19937 rng(static_cast<unsigned>(GetParam()));
    // Sizes and loads kept so every feeder can carry what it feeds (a collapsing network is
    // reported by study.loadflow.diverged and tested below).
    const char* sizes[] = {"4/0 AWG", "2/0 AWG", "1 AWG", "250 kcmil", "500 kcmil", "350 kcmil"};
    DrawingBuilder b;
    auto src = b.add(PartKind::Source, "U", {{"kv", 13.8}, {"fault_mva", 300.0}});
    auto tx = b.add(PartKind::Transformer, "TX",
                    {{"kva", 1500.0}, {"pri_v", 13800.0}, {"sec_v", 480.0}, {"z_pct", 5.75}});
    auto root = b.add(PartKind::Bus, "B0", {{"volts", 480.0}, {"amps", 3000.0}});
    b.wire(src, 0, tx, 0);
    b.wire(tx, 1, root, 0);
    std::vector<PartId> buses{root};
    std::vector<std::pair<PartId, PartId>> links; // (upstream bus, downstream bus)
    for (int i = 1; i < 25; ++i) {
        const PartId up =
            buses[std::uniform_int_distribution<std::size_t>(0, buses.size() - 1)(rng)];
        auto c = b.add(PartKind::Cable, "C" + std::to_string(i),
                       {{"size", std::string(sizes[rng() % 6])},
                        {"length_ft", static_cast<double>(20 + rng() % 300)}});
        auto bus =
            b.add(PartKind::Bus, "B" + std::to_string(i), {{"volts", 480.0}, {"amps", 400.0}});
        auto ld = b.add(PartKind::Load, "L" + std::to_string(i),
                        {{"kva", static_cast<double>(2 + rng() % 10)}, {"volts", 480.0}});
        b.wire(up, 0, c, 0);
        b.wire(c, 1, bus, 0);
        b.wire(bus, 0, ld, 0);
        buses.push_back(bus);
        links.push_back({up, bus});
    }
    Studied s(b.drawing());
    ASSERT_TRUE(s.r.loadFlowConverged);
    for (auto [up, down] : links) {
        EXPECT_LE(s.faultAt(down).ikKa, s.faultAt(up).ikKa + 1e-9);
        EXPECT_LE(s.vAt(down), s.vAt(up) + 1e-12);
    }
}
INSTANTIATE_TEST_SUITE_P(Seeds, RadialProperty, ::testing::Range(1, 9));

TEST(VoltageStudy, CollapsingNetworkIsReported) {
    // 2 MVA of load through 1000 ft of 8 AWG cannot be carried.
    Drawing d = transformerLineup(1e5, 2500, 5.75, 6, "8 AWG", 1000, 1);
    Part load = Part::make(PartKind::Load, d.nextPartId(), "BIG");
    ASSERT_FALSE(load.set("kva", 2000.0));
    ASSERT_FALSE(load.set("volts", 480.0));
    d.addPart(load);
    d.addWire(Wire{d.nextWireId(), {PartId(5), 0}, {load.id, 0}});
    const auto r = checkDrawing(d, testTables());
    EXPECT_TRUE(std::any_of(r.findings.begin(), r.findings.end(), [](const Finding& f) {
        return f.ruleId == "study.loadflow.diverged";
    }));
}

TEST(FaultStudy, TreeRecursionEqualsSparseLu) {
    // The linear-time tree path must give what one LU solve per bus gives.
    Drawing d = smallLineup();
    Network net(d);
    Flow flow(net);
    const auto model = buildNetworkModel(net, testTables(), d.settings);
    auto tree = TreeSolver::build(model, true);
    ASSERT_TRUE(tree.has_value());
    Admittance y(model, true);
    ASSERT_TRUE(y.ok());
    for (int k = 0; k < model.busCount(); ++k) {
        const auto col = y.zColumn(k);
        EXPECT_NEAR(std::abs(tree->zth(k) - col[k]), 0.0, 1e-9 * std::abs(col[k]));
        for (int b = 0; b < model.busCount(); ++b) {
            if (auto t = tree->transfer(k, b)) {
                EXPECT_NEAR(std::abs(*t - col[b]), 0.0, 1e-9 * std::abs(col[b]));
            }
        }
    }
    // Solving Y v = i: the tree recursion equals the LU solve.
    Eigen::VectorXcd inj = Eigen::VectorXcd::Zero(model.busCount());
    for (int k = 0; k < model.busCount(); ++k)
        inj[k] = Complex(0.01 * k, -0.02);
    const auto lu = y.solve(inj);
    const auto tv = tree->solve(std::vector<Complex>(inj.data(), inj.data() + inj.size()));
    for (int k = 0; k < model.busCount(); ++k)
        EXPECT_NEAR(std::abs(tv[static_cast<std::size_t>(k)] - lu[k]), 0.0, 1e-9);
    // Two sources on one closed tie are still a tree of branches (sources are shunts)...
    Studied closed(doubleEnded(false));
    EXPECT_TRUE(TreeSolver::build(closed.r.model, true).has_value());
    // ...but two cables in parallel make a loop: the tree alone cannot solve it (the loop
    // solver corrects for the chord; tests/core/meshed_solver_test.cpp).
    Part twin = *d.part(PartId(8));
    twin.id = d.nextPartId();
    twin.tag = "C-1B";
    d.addPart(twin);
    d.addWire(Wire{d.nextWireId(), {PartId(7), 1}, {twin.id, 0}});
    d.addWire(Wire{d.nextWireId(), {twin.id, 1}, {PartId(9), 0}});
    Studied meshed(d);
    EXPECT_FALSE(TreeSolver::build(meshed.r.model, true).has_value());
    // Two equal cables in parallel: the motor terminal sees half the cable impedance.
    EXPECT_GT(meshed.faultAt(PartId(9)).ikKa, Studied(smallLineup()).faultAt(PartId(9)).ikKa);
}

TEST(OneAssumption, StudyAndCurvesAssumeTheSameLockedRotorCurrent) {
    // A motor with neither an LRA nor a code letter, and a nameplate FLA below its table FLC:
    // the start study and the starting curve must assume the same locked-rotor current
    // (6 × table FLC, common practice), and say it was assumed.
    Drawing d = smallLineup();
    Part* motor = nullptr;
    for (const auto& p : d.parts())
        if (p.kind == PartKind::Motor)
            motor = d.part(p.id);
    ASSERT_NE(motor, nullptr);
    ASSERT_FALSE(motor->set("lra", FieldValue{}));
    ASSERT_FALSE(motor->set("code_letter", FieldValue{}));
    // Design A: Table 430.251(B) covers only Designs B, C and D, so nothing states the current.
    ASSERT_FALSE(motor->set("design", std::string("A")));
    const auto flc = motorFlc(*motor, testTables(), false);
    ASSERT_TRUE(flc);
    ASSERT_FALSE(motor->set("fla", 0.85 * flc->amps));
    // The one check result carries both: the start study and the motor's starting profile.
    const auto result = runCheck(d, testTables());
    ASSERT_TRUE(result->study);
    const StudyResults& study = *result->study;
    ASSERT_TRUE(study.starts.count(motor->id));
    const MotorFacts* facts = result->motorFacts(motor->id);
    ASSERT_NE(facts, nullptr);
    const auto& profile = facts->start;
    ASSERT_TRUE(profile);
    EXPECT_TRUE(study.starts.at(motor->id).lraAssumed);
    EXPECT_TRUE(profile->lraAssumed);
    EXPECT_DOUBLE_EQ(study.starts.at(motor->id).lockedRotorA, profile->lockedRotorA);
    EXPECT_DOUBLE_EQ(profile->lockedRotorA, kAssumedLockedRotorMultiple * flc->amps);
}

TEST(FailuresAreResults, AFactorisationThatFailsIsAFindingNotZeros) {
    // Two cables in parallel make the network meshed, so the studies factorise the loop
    // correction (or, with many loops, Y itself). When that fails, no fault current is known: the
    // check must say so, and no duty check may pass against a fault current of zero.
    Drawing d = smallLineup();
    Part twin = *d.part(PartId(8));
    twin.id = d.nextPartId();
    twin.tag = "C-1B";
    d.addPart(twin);
    d.addWire(Wire{d.nextWireId(), {PartId(7), 1}, {twin.id, 0}});
    d.addWire(Wire{d.nextWireId(), {twin.id, 1}, {PartId(9), 0}});
    auto count = [](const CheckReport& r, std::string_view id) {
        return std::count_if(r.findings.begin(), r.findings.end(),
                             [&](const Finding& f) { return f.ruleId == id; });
    };
    ASSERT_EQ(count(checkDrawing(d, testTables()), "study.solve.failed"), 0);
    Admittance::failForTests = true;
    Studied failed(d);
    const auto report = checkDrawing(d, testTables());
    Admittance::failForTests = false;
    EXPECT_FALSE(failed.r.faultSolved);
    EXPECT_EQ(failed.r.faultAtNode(failed.net->nodeOf(PartId(9), 0)), nullptr);
    EXPECT_EQ(count(report, "study.solve.failed"), 2); // the fault study and the load flow
    for (const auto& f : report.findings) {
        if (f.ruleId == "study.solve.failed") {
            EXPECT_NE(f.message.find("were not performed"), std::string::npos) << f.message;
        }
    }
}
