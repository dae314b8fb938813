// The duty.* rules: interrupting ratings (110.9), SCCR and bracing (110.10, 430.8, 409.22),
// and conductor short-circuit withstand (ICEA P-32-382 / IEC adiabatic).
#include "curves/trip_curve.h"
#include "model/conductor.h"
#include "model/ratings.h"
#include "rules/interrupting_test.h"
#include "rules/rule_catalog.h"
#include "rules/rule_context.h"
#include "sizing/motor_sizing.h"
#include "studies/network_model.h"

#include <cmath>

namespace lineward {

namespace {

// The assumption behind the running motors' share of every fault current.
TraceStep motorContributionStep(const RuleContext& ctx) {
    if (ctx.settings().motorContribution == MotorContribution::Iec60909)
        return {"motor contribution",
                "each running motor feeds through Z_M = U_rM / (√3 · I_LR) at R/X 0.42 (low "
                "voltage) or 0.15 / 0.10 (medium voltage) (IEC 60909-0 3.8.2, from memory; drawing "
                "setting motor_contribution_method)"};
    const double x = ctx.settings().motorContributionX;
    if (x <= 0)
        return {"motor contribution", "none (drawing setting 0)"};
    return {"motor contribution",
            "each running motor feeds " + fmt(x, 1) + " × its FLC at X/R " + fmt(kMotorXr, 0) +
                " (fixed-multiple method: drawing setting and X/R assumed, common practice)"};
}

// The conservatism of the maximum fault current, from the drawing's settings.
TraceStep maxFaultStep(const RuleContext& ctx) {
    const auto& s = ctx.settings();
    return {"maximum-fault conditions",
            "voltage factor c = " + fmt(s.faultCMax, 2) + "; conductors at " +
                fmt(s.faultConductorC, 0) + " °C (NEC Table 9 resistance × " +
                fmt(resistanceFactorFrom75C(false, s.faultConductorC), 3) + " copper, × " +
                fmt(resistanceFactorFrom75C(true, s.faultConductorC), 3) +
                " aluminium); transformer %Z " +
                (s.txZTolerancePct > 0 ? "− " + fmt(s.txZTolerancePct, 1) + " % (tolerance)"
                                       : std::string("at nameplate")) +
                " (drawing settings)"};
}

void interrupting(const RuleContext& ctx, const Part& d, std::vector<Finding>& out) {
    const auto* f = ctx.study.faultAtNode(ctx.flow.lineNode(d.id));
    const auto data = protectiveDataOf(d);
    if (!f || !data)
        return;
    const double rating = data->interruptingKa;
    // A system X/R above the rating's test circuit makes the first peak (or the asymmetrical
    // current) larger than the test's at the same symmetrical current: the rating is worth
    // less (IEEE Std 1015 method, from memory).
    const auto test = interruptingTest(d, rating);
    const double mf = test ? asymmetryFactor(*test, f->xOverR) : 1.0;
    const double worth = rating / mf;
    if (worth >= f->ikKa - 1e-9)
        return;
    const bool derated = mf > 1.0;
    auto x =
        makeFinding("duty.interrupting", {d.id},
                    d.tag + " interrupting rating " + fmt(rating) + " kA" +
                        (derated ? " (" + fmt(worth, 2) + " kA at X/R " + fmt(f->xOverR, 1) + ")"
                                 : std::string()) +
                        " is below the " + fmt(f->ikKa, 2) + " kA available at its line side");
    x.computed = f->ikKa;
    x.limit = worth;
    x.unit = "kA";
    x.trace = {
        {"available fault current", fmt(f->ikKa, 2) + " kA symmetrical, X/R " + fmt(f->xOverR, 1)},
        maxFaultStep(ctx),
        motorContributionStep(ctx),
        {"interrupting rating", fmt(rating) + " kA"}};
    if (test) {
        x.trace.push_back({"rating's test circuit", test->standard + ": power factor " +
                                                        fmt(test->powerFactorPct, 0) + " %, X/R " +
                                                        fmt(test->xOverR, 2) + " (from memory)"});
        x.trace.push_back(
            {"X/R multiplying factor", derated ? asymmetryFactorText(*test, f->xOverR)
                                               : "1 (system X/R at or below the test circuit's)"});
        if (derated)
            x.trace.push_back({"rating at this X/R",
                               fmt(rating) + " / " + fmt(mf, 3) + " = " + fmt(worth, 2) + " kA"});
    }
    const double need = f->ikKa * mf;
    const double next = std::max(10.0, std::ceil(need / 5.0 - 1e-9) * 5.0);
    x.fix = Fix{"use a device rated " + fmt(next, 0) + " kA or more (or series-rated, listed)",
                {{d.id, ProtectiveData::kInterruptingKa, next}}};
    out.push_back(std::move(x));
}

void bracing(const RuleContext& ctx, const Part& bus, std::vector<Finding>& out) {
    const auto* f = ctx.study.faultAtNode(ctx.net.nodeOf(bus.id, 0));
    const auto rating = BusRatings::of(bus).bracingKa;
    if (!f || !rating || *rating >= f->ikKa - 1e-9)
        return;
    auto x = makeFinding("duty.bracing", {bus.id},
                         bus.tag + " bus bracing " + fmt(*rating) + " kA is below the " +
                             fmt(f->ikKa, 2) + " kA available");
    x.computed = f->ikKa;
    x.limit = *rating;
    x.unit = "kA";
    x.trace = {{"available fault current",
                fmt(f->ikKa, 2) + " kA symmetrical, peak " + fmt(f->peakKa, 2) + " kA"},
               maxFaultStep(ctx),
               motorContributionStep(ctx)};
    const double next = std::ceil(f->ikKa / 5.0) * 5.0;
    x.fix =
        Fix{"brace the bus for " + fmt(next, 0) + " kA", {{bus.id, BusRatings::kBracingKa, next}}};
    out.push_back(std::move(x));
}

void sccr(const RuleContext& ctx, const Bucket& b, std::vector<Finding>& out) {
    if (!b.sccrKa || b.parts.empty())
        return;
    const FaultAtBus* worst = nullptr;
    for (auto id : b.parts) {
        const Part* p = ctx.drawing.part(id);
        const NodeIndex n = isTwoTerminal(p->kind) ? ctx.flow.lineNode(id) : ctx.net.nodeOf(id, 0);
        const auto* f = ctx.study.faultAtNode(n);
        if (f && (!worst || f->ikKa > worst->ikKa))
            worst = f;
    }
    if (!worst || *b.sccrKa >= worst->ikKa - 1e-9)
        return;
    auto x = makeFinding("duty.sccr", {b.parts.front()},
                         "bucket " + b.tag + " SCCR " + fmt(*b.sccrKa) + " kA is below the " +
                             fmt(worst->ikKa, 2) + " kA available");
    x.computed = worst->ikKa;
    x.limit = *b.sccrKa;
    x.unit = "kA";
    x.trace = {{"bucket", b.tag},
               {"available fault current", fmt(worst->ikKa, 2) + " kA"},
               maxFaultStep(ctx),
               motorContributionStep(ctx)};
    x.fix =
        Fix{"use a combination listed for " + fmt(std::ceil(worst->ikKa / 5) * 5, 0) + " kA", {}};
    out.push_back(std::move(x));
}

// Clearing time of a device at a current, from its ratings, until the time-current curves
// replace it: instantaneous regions clear in 1.5 cycles (0.025 s) and current-limiting fuses
// within a half cycle (0.008 s) above 20 × rating (common practice). Nothing where the
// current falls in an inverse-time region.
std::optional<double> clearingTime(const Part& d, double amps) {
    if (d.kind == PartKind::InstBreaker)
        return amps >= InstBreakerRatings::of(d).pickupA ? std::optional(0.025) : std::nullopt;
    if (d.kind == PartKind::Fuse)
        return amps >= 20 * FuseRatings::of(d).amps ? std::optional(0.008) : std::nullopt;
    if (d.kind != PartKind::Breaker)
        return std::nullopt;
    const auto b = BreakerRatings::of(d);
    if (b.instX && amps >= *b.instX * b.tripA)
        return 0.025;
    if (b.stPickupX && amps >= *b.stPickupX * b.tripA)
        return b.stDelayS.value_or(kAssumedShortTimeDelayS) + 0.05;
    return std::nullopt;
}

// What the device lets through at the fault: the stated I²t, else the stated clearing time,
// else the assumed clearing time; `stated` tells which.
std::optional<double> letThrough(const Part& d, double amps, bool& stated, std::string* how) {
    const auto data = protectiveDataOf(d);
    if (!data)
        return std::nullopt;
    if (auto i2t = data->letThroughA2s) {
        stated = true;
        if (how)
            *how = fmt(*i2t, 0) + " A²s (stated let-through)";
        return *i2t;
    }
    auto t = data->clearS;
    stated = t.has_value();
    if (!t)
        t = clearingTime(d, amps);
    if (!t)
        return std::nullopt;
    if (how)
        *how = fmt(amps, 0) + "² A² × " + fmt(*t, 3) + " s (" +
               (stated ? "stated" : "assumed, common practice") + " clearing time)";
    return amps * amps * *t;
}

// I²t the cable takes: ICEA P-32-382 for AWG/kcmil, IEC adiabatic k²S² for mm² (per set).
std::optional<double> cableI2t(const RuleContext& ctx, const Part& cable, std::string* how) {
    const auto c = CableRatings::of(cable);
    const std::string& size = c.size;
    const double ins = c.insulationC;
    const bool al = c.material == Material::Al;
    if (size.ends_with(" mm2")) {
        const double k =
            ins >= 90 ? (al ? 94 : 143) : (al ? 76 : 115); // IEC 60364-4-43 Table 43A (from memory)
        const double s = std::stod(size);
        if (how)
            *how = "k²S² = (" + fmt(k, 0) + " × " + fmt(s, 1) + ")²";
        return std::pow(k * s, 2);
    }
    auto area = ctx.tables.areaCmil(size);
    if (!area)
        return std::nullopt;
    const double t2 = ins >= 90 ? 250 : 150; // thermoset / thermoplastic limits (ICEA, from memory)
    const double k = al ? 0.0125 : 0.0297, base = al ? 228 : 234;
    if (how)
        *how = fmt(k, 4) + " × log10((" + fmt(t2, 0) + " + " + fmt(base, 0) + ") / (" +
               fmt(ins, 0) + " + " + fmt(base, 0) + ")) × " + fmt(*area, 0) + "² cmil²";
    return k * std::log10((t2 + base) / (ins + base)) * *area * *area;
}

void withstand(const RuleContext& ctx, const Part& cable, std::vector<Finding>& out) {
    const auto* f = ctx.study.faultAtNode(ctx.flow.lineNode(cable.id));
    auto devId = ctx.flow.protectionAbove(ctx.flow.lineNode(cable.id));
    if (!f || !devId)
        return;
    const Part& dev = *ctx.drawing.part(*devId);
    const double sets = CableRatings::of(cable).sets;
    const double perSet = f->ikKa * 1000.0 / sets;
    bool stated = false;
    std::string devHow, cableHow;
    auto let = letThrough(dev, perSet, stated, nullptr);
    auto limit = cableI2t(ctx, cable, nullptr);
    if (!let || !limit || *let <= *limit)
        return;
    letThrough(dev, perSet, stated, &devHow); // the explanations only when reporting
    cableI2t(ctx, cable, &cableHow);
    auto x = makeFinding(stated ? RuleId("duty.withstand") : RuleId("duty.withstand.assumed"),
                         {cable.id, dev.id},
                         cable.tag + " takes " + fmt(*limit, 0) + " A²s; " + dev.tag +
                             " lets through " + fmt(*let, 0) + " A²s at " + fmt(f->ikKa, 2) +
                             " kA" + (stated ? "" : " (assumed; enter its let-through I²t)"));
    x.computed = *let;
    x.limit = *limit;
    x.unit = "A²s";
    x.trace = {{"fault current at the cable",
                fmt(f->ikKa, 2) + " kA" + (sets > 1 ? ", per set " + fmt(perSet, 0) + " A" : "")},
               maxFaultStep(ctx),
               {"cable withstand", cableHow + " = " + fmt(*limit, 0) + " A²s"},
               {"let-through of " + dev.tag, devHow + " = " + fmt(*let, 0) + " A²s"}};
    auto cur = ctx.tables.areaCmil(CableRatings::of(cable).size);
    for (auto s2 : awgSizes()) {
        auto a = ctx.tables.areaCmil(std::string(s2));
        if (cur && a && *a > *cur && *a >= *cur * std::sqrt(*let / *limit)) {
            x.fix =
                Fix{"use " + std::string(s2), {{cable.id, CableRatings::kSize, std::string(s2)}}};
            break;
        }
    }
    if (!stated && x.fix)
        x.fix->description += ", or enter " + dev.tag + "'s let-through I²t";
    out.push_back(std::move(x));
}

} // namespace

void checkDuty(const RuleContext& ctx, std::vector<Finding>& out) {
    for (const auto& p : ctx.drawing.parts()) {
        if (!ctx.net.partEnergized(p.id))
            continue;
        if (kindInfo(p.kind).protective)
            interrupting(ctx, p, out);
        else if (p.kind == PartKind::Bus)
            bracing(ctx, p, out);
        else if (p.kind == PartKind::Cable)
            withstand(ctx, p, out);
    }
    for (const auto& b : ctx.drawing.buckets())
        sccr(ctx, b, out);
}

} // namespace lineward
