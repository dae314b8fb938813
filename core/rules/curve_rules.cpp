// The curve.* rules: nuisance tripping on start, overload relay against stall and start,
// cable damage, and selectivity between each device and the one above it.
#include "curves/path_curves.h"
#include "model/ratings.h"
#include "rules/rule_catalog.h"
#include "rules/rule_context.h"
#include "sizing/motor_sizing.h"

#include <cmath>
#include <unordered_map>

namespace lineward {

namespace {

std::string kA(double a) {
    return fmt(a / 1000.0, 2) + " kA";
}
std::string secs(double t) {
    return std::isinf(t) ? std::string("no trip") : fmt(t, 3) + " s";
}

void motorChecks(const RuleContext& ctx, const Part& m, std::vector<Finding>& out) {
    const MotorFacts* facts = ctx.facts(m.id);
    const auto prof = facts ? facts->start : startProfile(ctx, m); // a motor outside a branch
    if (!prof)
        return;
    const auto devices = devicesOnPath(ctx, m.id);
    for (const auto& d : devices) {
        if (d.part->kind == PartKind::Overload) {
            const double hot = d.curve.maxTimeHot(prof->lockedRotorA),
                         cold = d.curve.minTime(prof->lockedRotorA);
            if (auto stall = MotorRatings::of(m).stallHotS; stall && hot > *stall) {
                auto f = makeFinding("curve.overload.stall", {d.part->id, m.id},
                                     d.part->tag + " may take " + secs(hot) +
                                         " hot at locked rotor (" + fmt(prof->lockedRotorA, 0) +
                                         " A); " + m.tag + " is safe for " + fmt(*stall, 1) + " s");
                f.computed = hot;
                f.limit = *stall;
                f.unit = "s";
                f.trace = {{"relay", d.curve.label()},
                           {"model", "thermal, preloaded at setting (IEC 60947-4-1 class limits)"}};
                f.fix = Fix{"choose a faster trip class", {}};
                out.push_back(std::move(f));
            }
            if (cold < prof->accelS) {
                auto f =
                    makeFinding("curve.overload.start", {d.part->id, m.id},
                                d.part->tag + " may trip in " + secs(cold) + " at locked rotor; " +
                                    m.tag + " needs " + fmt(prof->accelS, 1) + " s to start");
                f.computed = cold;
                f.limit = prof->accelS;
                f.unit = "s";
                f.trace = {{"relay", d.curve.label()}};
                f.fix = Fix{"choose a slower trip class", {}};
                out.push_back(std::move(f));
            }
            continue;
        }
        if (d.part->kind == PartKind::InstBreaker)
            continue; // branch.inst.inrush judges it
        const struct {
            double amps, seconds;
            const char* what;
        } points[] = {{prof->asymA, StartProfile::kAsymS, "asymmetrical inrush"},
                      {prof->lockedRotorA, prof->accelS, "locked rotor until accelerated"},
                      {prof->runningA, 3600.0, "running current"}};
        for (const auto& pt : points) {
            const double t = d.curve.minTime(pt.amps);
            if (t > pt.seconds)
                continue;
            auto f = makeFinding("curve.nuisance", {d.part->id, m.id},
                                 d.part->tag + " may trip in " + secs(t) + " on " + m.tag + "'s " +
                                     pt.what + " (" + fmt(pt.amps, 0) + " A for " +
                                     fmt(pt.seconds, 2) + " s)");
            f.computed = t;
            f.limit = pt.seconds;
            f.unit = "s";
            f.trace = {{"device", d.curve.label()},
                       {"starting profile", fmt(prof->asymA, 0) + " A for 0.1 s, " +
                                                fmt(prof->lockedRotorA, 0) + " A for " +
                                                fmt(prof->accelS, 1) + " s, then " +
                                                fmt(prof->runningA, 1) + " A"}};
            f.fix =
                Fix{"raise " + d.part->tag + "'s setting or rating within the code's limits", {}};
            out.push_back(std::move(f));
            break;
        }
    }
}

void cableDamage(const RuleContext& ctx, const Part& c, std::vector<Finding>& out) {
    auto i2t = cableDamageI2t(ctx, c);
    const double fault = availableFaultA(ctx, c);
    auto amp =
        cableAmpacity(CableRatings::of(c).size, conditionsOf(c, ctx.settings()), ctx.tables, false);
    if (!i2t || fault <= 0 || !amp)
        return;
    // The cable is judged against its own protection: the device at its supply end (with the
    // overload relay of a motor branch), the device NEC 240.4 makes responsible for it. Devices
    // further up are set to be slower (selectivity), and crediting them would hide a local device
    // that is too slow; a chain of any length also costs one step per cable this way.
    const auto devices = devicesOnPath(ctx, c.id, PathExtent::OwnProtection);
    if (devices.empty())
        return;
    // The adiabatic damage curve is a short-circuit curve: judge the currents the cable takes
    // for 1 s or less (common practice); in the instantaneous region duty.withstand judges
    // the let-through.
    const double lo = std::max(2.0 * amp->amps, std::sqrt(*i2t / 1.0));
    for (int k = 0; k <= 24; ++k) {
        const double i = lo * std::pow(fault / lo, k / 24.0);
        if (i >= fault || i <= 0)
            break;
        double combined = kNoTrip;
        for (const auto& d :
             devices) // an overload relay acts through its bucket's listed contactor
            combined = std::min(combined, d.curve.maxTime(i));
        if (combined <= 0.05)
            break; // instantaneous region: duty.withstand's domain
        const double damage = *i2t / (i * i);
        if (combined <= damage)
            continue;
        auto f =
            makeFinding("curve.cable.damage", {c.id},
                        c.tag + " would be damaged at " + kA(i) + ": its protection clears in " +
                            secs(combined) + ", the cable lasts " + secs(damage));
        f.computed = combined;
        f.limit = damage;
        f.unit = "s";
        f.trace = {{"damage curve", fmt(*i2t, 0) + " A²s (ICEA P-32-382)"}, {"current", kA(i)}};
        f.fix = Fix{"use a larger cable or faster protection", {}};
        out.push_back(std::move(f));
        return;
    }
}

double nominalV(const RuleContext& ctx, const Part& p) {
    return ctx.net
        .graph()[isTwoTerminal(p.kind) ? ctx.flow.lineNode(p.id) : ctx.net.nodeOf(p.id, 0)]
        .nominalV;
}

// `overloadBelow`: the overload relay of the motor branch `d` heads, if any; it and `d` act
// together as the downstream protection.
void selectivity(const RuleContext& ctx, const Part& d, const Part* overloadBelow,
                 std::vector<Finding>& out) {
    auto path = devicesOnPath(ctx, d.id, PathExtent::NearestUpstream);
    if (path.empty() || path.front().part->id != d.id)
        return;
    const TripCurve& down = path.front().curve;
    auto olCurve = overloadBelow ? TripCurve::of(*overloadBelow) : std::nullopt;
    const PathDevice* up = nullptr;
    for (std::size_t i = 1; i < path.size(); ++i)
        if (path[i].part->kind != PartKind::Overload) {
            up = &path[i];
            break;
        }
    if (!up)
        return;
    // Currents on the far side of a transformer scale with the voltage ratio.
    const double vd = nominalV(ctx, d), vu = nominalV(ctx, *up->part);
    const double ratio = vd > 0 && vu > 0 ? vd / vu : 1.0;
    const double fault = availableFaultA(ctx, d);
    const double margin = ctx.settings().coordinationMarginS;
    const double lo =
        1.25 * (olCurve ? std::min(down.pickupA(), olCurve->pickupA()) : down.pickupA());
    if (fault <= lo)
        return;
    auto downMax = [&](double i) {
        double t = down.maxTime(i);
        if (olCurve) // relay, contactor and device act together as one listed combination
            t = std::min(t, olCurve->maxTime(i));
        return t;
    };
    double goodUpTo = 0;
    for (int k = 0; k <= 40; ++k) {
        const double i = lo * std::pow(fault / lo, k / 40.0);
        const double dmax = downMax(i), umin = up->curve.minTime(i * ratio);
        if (std::isinf(umin) || (!std::isinf(dmax) && umin > dmax + margin)) {
            goodUpTo = i;
            continue;
        }
        auto f = makeFinding("curve.selectivity", {d.id, up->part->id},
                             d.tag + " and " + up->part->tag + " are selective only up to " +
                                 kA(goodUpTo) + " of the " + kA(fault) + " available");
        f.computed = goodUpTo / 1000.0;
        f.limit = fault / 1000.0;
        f.unit = "kA";
        f.trace = {
            {"downstream", down.label() + (olCurve ? " with " + olCurve->label() : std::string())},
            {"upstream", up->curve.label() + (ratio != 1.0 ? " (currents × " + fmt(ratio, 3) +
                                                                 " across the transformer)"
                                                           : "")},
            {"at " + kA(i), "downstream clears by " + secs(dmax) + ", upstream may trip in " +
                                secs(umin) + " (margin " + fmt(margin, 2) + " s)"}};
        f.fix =
            Fix{"raise " + up->part->tag + "'s short-time or instantaneous setting, or add a delay",
                {}};
        out.push_back(std::move(f));
        return;
    }
}

} // namespace

void checkCurves(const RuleContext& ctx, std::vector<Finding>& out) {
    std::unordered_map<PartId, const Part*> overloadOf; // branch device → its overload relay
    for (const auto& b : ctx.branches)
        if (b.scpd && b.overload)
            overloadOf[b.scpd->id] = b.overload;
    for (const auto& p : ctx.drawing.parts()) {
        if (!ctx.net.partEnergized(p.id))
            continue;
        if (p.kind == PartKind::Motor)
            motorChecks(ctx, p, out);
        else if (p.kind == PartKind::Cable)
            cableDamage(ctx, p, out);
        else if (p.kind == PartKind::Breaker || p.kind == PartKind::Fuse ||
                 p.kind == PartKind::InstBreaker)
            selectivity(ctx, p, overloadOf.count(p.id) ? overloadOf.at(p.id) : nullptr, out);
    }
}

} // namespace lineward
