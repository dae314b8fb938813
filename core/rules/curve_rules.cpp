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
            if (!prof->limitBasis.empty())
                f.trace.push_back({"starting current", prof->limitBasis});
            f.fix =
                Fix{"raise " + d.part->tag + "'s setting or rating within the code's limits", {}};
            out.push_back(std::move(f));
            break;
        }
    }
}

// Which generic bands judged a pair, for the traces.
std::string bandsInWords(CurveBands b) {
    return b == CurveBands::ListingLimits
               ? "generic bands at the listing limits (UL 489 maximum tripping times at 135 % "
                 "and 200 %, from memory; fuses UL 248; relays by trip class)"
               : "typical generic bands (common practice; drawing setting curve_bands)";
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
        // An overload relay acts through its bucket's contactor, so only up to the current
        // the contactor can break; above it only the short-circuit device clears.
        double combined = kNoTrip;
        bool relayBeyondContactor = false;
        for (const auto& d : devices) {
            if (i > d.clearsUpToA) {
                relayBeyondContactor = true;
                continue;
            }
            combined = std::min(combined, d.curve.maxTime(i));
        }
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
        f.trace = {{"damage curve", fmt(*i2t, 0) + " A²s (ICEA P-32-382)"},
                   {"current", kA(i)},
                   {"bands", bandsInWords(ctx.settings().curveBands)}};
        if (relayBeyondContactor)
            for (const auto& d : devices)
                if (d.part->kind == PartKind::Overload) {
                    std::string how;
                    overloadBreakingA(ctx, *d.part, &how);
                    f.trace.push_back({d.part->tag + " not credited above its contactor", how});
                }
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

// The current from which a device clears in its instantaneous or short-time region, with the
// band's upper tolerance (the generic bands of trip_curve.cpp: 1.2 × a thermal-magnetic or
// instantaneous-only pickup, 1.1 × an electronic short-time or instantaneous pickup); nothing
// for fuses and for breakers without such a region.
std::optional<std::pair<double, std::string>> fastRegionFromA(const Part& d) {
    if (d.kind == PartKind::InstBreaker) {
        const double p = InstBreakerRatings::of(d).pickupA;
        return std::pair{1.2 * p, "instantaneous pickup " + fmt(p, 0) + " A × 1.2 (tolerance)"};
    }
    if (d.kind != PartKind::Breaker)
        return std::nullopt;
    const auto b = BreakerRatings::of(d);
    if (b.tripType == TripType::ThermalMagnetic) {
        const double x = b.instX.value_or(kAssumedThermalMagneticInstX);
        return std::pair{1.2 * x * b.tripA,
                         "instantaneous pickup " + fmt(x, 1) + " × " + fmt(b.tripA, 0) + " A" +
                             (b.instX ? "" : " (assumed)") + " × 1.2 (tolerance)"};
    }
    std::optional<std::pair<double, std::string>> best;
    auto consider = [&](std::optional<double> x, const char* what) {
        if (!x)
            return;
        const double a = 1.1 * *x * b.tripA;
        if (!best || a < best->first)
            best = std::pair{a, std::string(what) + " pickup " + fmt(*x, 1) + " × " +
                                    fmt(b.tripA, 0) + " A × 1.1 (tolerance)"};
    };
    consider(b.stPickupX, "short-time");
    consider(b.instX, "instantaneous");
    return best;
}

// A fault at the far end of a cable at the least current the system gives must reach its
// protection's instantaneous or short-time region, or it lasts the long-time band.
void minimumFaultReach(const RuleContext& ctx, const Part& c, std::vector<Finding>& out) {
    const auto devId = ctx.flow.protectionAbove(ctx.flow.lineNode(c.id));
    const auto imin = ctx.study.minFaultAtNode(ctx.flow.loadNode(c.id));
    if (!devId || !imin)
        return;
    const Part& dev = *ctx.drawing.part(*devId);
    const auto fast = fastRegionFromA(dev);
    const double vc = nominalV(ctx, c), vd = nominalV(ctx, dev);
    const double ratio = vc > 0 && vd > 0 ? vc / vd : 1.0; // referred across a transformer
    const double amps = *imin * 1000.0 * ratio;
    if (!fast || amps >= fast->first)
        return;
    const PathDevice* known = ctx.devices ? ctx.devices->find(dev.id) : nullptr;
    const auto curve = known ? std::optional<TripCurve>(known->curve) : TripCurve::of(dev);
    const double t = curve ? curve->maxTime(amps) : kNoTrip;
    auto f =
        makeFinding("curve.min_fault.reach", {dev.id, c.id},
                    dev.tag + "'s fast region (from " + kA(fast->first) +
                        ") is not reached by the " + kA(amps) + " minimum fault at the end of " +
                        c.tag + ": it clears that fault in " + secs(t));
    f.computed = amps / 1000.0;
    f.limit = fast->first / 1000.0;
    f.unit = "kA";
    const auto& s = ctx.settings();
    f.trace = {{"minimum-fault conditions",
                "voltage factor c = " + fmt(s.faultCMin, 2) +
                    " (drawing setting); conductors at their insulation rating; no motor "
                    "contribution"},
               {"minimum fault at the end of " + c.tag,
                kA(*imin * 1000.0) + (ratio != 1.0
                                          ? " (× " + fmt(ratio, 3) + " as " + dev.tag + " sees it)"
                                          : std::string())},
               {dev.tag + " fast region", fast->second + " = " + kA(fast->first)},
               {"clearing time at the minimum fault", secs(t)}};
    f.fix = Fix{"lower " + dev.tag + "'s instantaneous or short-time pickup below " + kA(amps) +
                    " (within the inrush and selectivity limits), or use a larger cable",
                {}};
    out.push_back(std::move(f));
}

// `overloadBelow`: the overload relay of the motor branch `d` heads, if any; it and `d` act
// together as the downstream protection.
void selectivity(const RuleContext& ctx, const Part& d, const Part* overloadBelow,
                 std::vector<Finding>& out) {
    auto path = devicesOnPath(ctx, d.id, PathExtent::NearestUpstream);
    if (path.empty() || path.front().part->id != d.id)
        return;
    const TripCurve& down = path.front().curve;
    // The relay's band and breaking limit from the check's table; its reason in words is
    // composed only for a finding.
    const PathDevice* ol =
        overloadBelow && ctx.devices ? ctx.devices->find(overloadBelow->id) : nullptr;
    const auto olCurve = ol              ? std::optional<TripCurve>(ol->curve)
                         : overloadBelow ? TripCurve::of(*overloadBelow)
                                         : std::nullopt;
    const double olBreakA = ol              ? ol->clearsUpToA
                            : overloadBelow ? overloadBreakingA(ctx, *overloadBelow)
                                            : kNoTrip;
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
    // The first current at which the upstream device may trip before the downstream one has
    // cleared, with the downstream band `down`; nothing where they are selective throughout.
    struct Overlap {
        double at, goodUpTo, dmax, umin;
    };
    auto firstOverlap = [&](const TripCurve& downCurve) -> std::optional<Overlap> {
        double goodUpTo = 0;
        for (int k = 0; k <= 40; ++k) {
            const double i = lo * std::pow(fault / lo, k / 40.0);
            // Relay, contactor and device act together as one listed combination, the relay
            // only up to what its contactor can break.
            double dmax = downCurve.maxTime(i);
            if (olCurve && i <= olBreakA)
                dmax = std::min(dmax, olCurve->maxTime(i));
            const double umin = up->curve.minTime(i * ratio);
            if (std::isinf(umin) || (!std::isinf(dmax) && umin > dmax + margin)) {
                goodUpTo = i;
                continue;
            }
            return Overlap{i, goodUpTo, dmax, umin};
        }
        return std::nullopt;
    };
    const CurveBands bands = ctx.settings().curveBands;
    auto trace = [&](const TripCurve& downCurve, const Overlap& o) {
        std::vector<TraceStep> t{
            {"downstream",
             downCurve.label() + (olCurve ? " with " + olCurve->label() : std::string())},
            {"upstream", up->curve.label() + (ratio != 1.0 ? " (currents × " + fmt(ratio, 3) +
                                                                 " across the transformer)"
                                                           : "")},
            {"at " + kA(o.at), "downstream clears by " + secs(o.dmax) + ", upstream may trip in " +
                                   secs(o.umin) + " (margin " + fmt(margin, 2) + " s)"}};
        if (olCurve) {
            std::string olBreakHow;
            overloadBreakingA(ctx, *overloadBelow, &olBreakHow);
            t.push_back({overloadBelow->tag + " credited up to " + kA(olBreakA), olBreakHow});
        }
        return t;
    };
    const auto overlap = firstOverlap(down);
    if (overlap) {
        auto f = makeFinding("curve.selectivity", {d.id, up->part->id},
                             d.tag + " and " + up->part->tag + " are selective only up to " +
                                 kA(overlap->goodUpTo) + " of the " + kA(fault) + " available");
        f.computed = overlap->goodUpTo / 1000.0;
        f.limit = fault / 1000.0;
        f.unit = "kA";
        f.trace = trace(down, *overlap);
        f.trace.push_back({"bands", bandsInWords(bands)});
        f.fix =
            Fix{"raise " + up->part->tag + "'s short-time or instantaneous setting, or add a delay",
                {}};
        out.push_back(std::move(f));
        return;
    }
    // Selective on the typical generic bands: would the slowest clearing the listing standard
    // allows still be? Where not, only the manufacturers' curves can decide the pair.
    if (bands != CurveBands::Typical || !down.generic() || !up->curve.generic())
        return;
    const auto listed = TripCurve::of(d, CurveBands::ListingLimits);
    if (!listed)
        return;
    if (const auto o = firstOverlap(*listed)) {
        auto f = makeFinding("curve.selectivity.listing", {d.id, up->part->id},
                             d.tag + " and " + up->part->tag +
                                 " are selective on typical generic bands but not at the listing "
                                 "limits above " +
                                 kA(o->goodUpTo) + "; check them with the manufacturers' curves");
        f.computed = o->goodUpTo / 1000.0;
        f.limit = fault / 1000.0;
        f.unit = "kA";
        f.trace = trace(*listed, *o);
        f.trace.push_back({"bands", "selective on " + bandsInWords(CurveBands::Typical) +
                                        "; this step uses " +
                                        bandsInWords(CurveBands::ListingLimits)});
        f.fix = Fix{"confirm the pair with the manufacturers' published curves (enter them as "
                    "curve points), or raise " +
                        up->part->tag + "'s setting so the listing limits are selective too",
                    {}};
        out.push_back(std::move(f));
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
        else if (p.kind == PartKind::Cable) {
            cableDamage(ctx, p, out);
            minimumFaultReach(ctx, p, out);
        } else if (p.kind == PartKind::Breaker || p.kind == PartKind::Fuse ||
                   p.kind == PartKind::InstBreaker)
            selectivity(ctx, p, overloadOf.count(p.id) ? overloadOf.at(p.id) : nullptr, out);
    }
}

} // namespace lineward
