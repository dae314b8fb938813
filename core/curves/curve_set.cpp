// Samples every curve at 160 log-spaced currents across the plot's current axis.
#include "curves/curve_set.h"

#include "curves/path_curves.h"
#include "studies/study.h"

#include <algorithm>
#include <cmath>

namespace lineward {

CurveSet buildCurveSet(const Drawing& d, const Tables& t, PartId id) {
    Network net(d);
    Flow flow(net);
    const StudyResults study = runStudies(net, flow, t, d.settings);
    const RuleContext ctx{d, net, flow, t, study};
    return buildCurveSet(ctx, id);
}

CurveSet buildCurveSet(const RuleContext& ctx, PartId id) {
    CurveSet set;
    const Drawing& d = ctx.drawing;
    const Network& net = ctx.net;
    const Flow& flow = ctx.flow;
    const Part* part = d.part(id);
    if (!part)
        return set;
    set.title = "Curves: " + part->tag;
    set.faultA = availableFaultA(ctx, *part);
    auto devices = devicesOnPath(ctx, id);
    // The axis spans half the smallest pickup to twice the available fault, in whole decades.
    double lo = 1e9, hi = std::max(set.faultA * 2, 100.0);
    for (const auto& dv : devices)
        lo = std::min(lo, dv.curve.pickupA() * 0.5);
    std::optional<StartProfile> prof;
    if (part->kind == PartKind::Motor && (prof = startProfile(ctx, *part)))
        lo = std::min(lo, prof->runningA * 0.5);
    if (lo > 1e8)
        lo = 1;
    set.minA = std::max(0.5, std::pow(10.0, std::floor(std::log10(lo))));
    set.maxA = std::min(1e5, std::pow(10.0, std::ceil(std::log10(hi))));
    const NodeIndex here = isTwoTerminal(part->kind) ? flow.lineNode(id) : net.nodeOf(id, 0);
    set.voltsBase = net.graph()[here].nominalV;
    auto sampled = [&](PlotSeries::Kind kind, std::string label, auto fn) {
        PlotSeries s{kind, std::move(label), {}, {}, {}};
        for (int k = 0; k <= 160; ++k) {
            const double a = set.minA * std::pow(set.maxA / set.minA, k / 160.0);
            auto [tmin, tmax] = fn(a);
            s.amps.push_back(a);
            s.minS.push_back(tmin);
            s.maxS.push_back(tmax);
        }
        set.series.push_back(std::move(s));
    };
    for (const auto& dv : devices) {
        // A device across a transformer sees the current scaled by the voltage ratio.
        const double v = net.graph()[isTwoTerminal(dv.part->kind) ? flow.lineNode(dv.part->id) : net.nodeOf(dv.part->id, 0)].nominalV;
        const double ratio = set.voltsBase > 0 && v > 0 ? set.voltsBase / v : 1.0;
        const TripCurve c = dv.curve;
        sampled(PlotSeries::Kind::Band, c.label() + (ratio != 1.0 ? " (at " + std::to_string(static_cast<int>(set.voltsBase)) + " V)" : ""),
                [&](double a) { return std::pair{c.minTime(a * ratio), c.maxTime(a * ratio)}; });
    }
    if (prof) {
        PlotSeries s{PlotSeries::Kind::StartProfile, part->tag + " start: " + std::to_string(static_cast<int>(prof->lockedRotorA)) +
                                                         " A for " + std::to_string(prof->accelS).substr(0, 4) + " s", {}, {}, {}};
        const double pts[][2] = {{prof->asymA, 0.01}, {prof->asymA, StartProfile::kAsymS}, {prof->lockedRotorA, StartProfile::kAsymS},
                                 {prof->lockedRotorA, prof->accelS}, {prof->runningA, prof->accelS}, {prof->runningA, 1000}};
        for (const auto& p : pts) {
            s.amps.push_back(p[0]);
            s.minS.push_back(p[1]);
            s.maxS.push_back(p[1]);
        }
        set.series.push_back(std::move(s));
        // The motor's safe stall times at locked-rotor current, as markers.
        PlotSeries stall{PlotSeries::Kind::StallPoints, part->tag + " safe stall (hot, cold)", {}, {}, {}};
        for (const char* key : {"stall_hot_s", "stall_cold_s"})
            if (auto t = part->number(key)) {
                stall.amps.push_back(prof->lockedRotorA);
                stall.minS.push_back(*t);
                stall.maxS.push_back(*t);
            }
        if (!stall.amps.empty())
            set.series.push_back(std::move(stall));
    }
    // The cable on the path nearest the part: its own cable for a motor, or itself.
    const Part* cable = part->kind == PartKind::Cable ? part : nullptr;
    if (!cable)
        for (auto c : net.branchChain(id))
            if (d.part(c)->kind == PartKind::Cable) {
                cable = d.part(c);
                break;
            }
    if (cable)
        if (auto i2t = cableDamageI2t(ctx, *cable)) {
            const double v = *i2t;
            sampled(PlotSeries::Kind::DamageCurve, cable->tag + " damage (" + cable->word("size").value_or("") + ")",
                    [&](double a) {
                        const double tt = v / (a * a);
                        return tt > 10 || tt < 0.01 ? std::pair{kNoTrip, kNoTrip} : std::pair{tt, tt};
                    });
        }
    return set;
}

} // namespace lineward
