// Samples every curve at 160 log-spaced currents across the plot's current axis.
#include "curves/curve_set.h"

#include "curves/path_curves.h"
#include "model/ratings.h"

#include <algorithm>
#include <cmath>

namespace lineward {

namespace {

// A curve sampled at 161 log-spaced currents across the plot's axis.
template <typename Fn>
PlotSeries sampled(const CurveSet& set, PlotSeries::Kind kind, std::string label, Fn fn) {
    PlotSeries s{kind, std::move(label), {}, {}, {}};
    for (int k = 0; k <= 160; ++k) {
        const double a = set.minA * std::pow(set.maxA / set.minA, k / 160.0);
        auto [tmin, tmax] = fn(a);
        s.amps.push_back(a);
        s.minS.push_back(tmin);
        s.maxS.push_back(tmax);
    }
    return s;
}

// The axis spans half the smallest pickup to twice the available fault, in whole decades.
void chooseAxis(CurveSet& set, const std::vector<PathDevice>& devices,
                const std::optional<StartProfile>& prof) {
    double lo = 1e9;
    const double hi = std::max(set.faultA * 2, 100.0);
    for (const auto& dv : devices)
        lo = std::min(lo, dv.curve.pickupA() * 0.5);
    if (prof)
        lo = std::min(lo, prof->runningA * 0.5);
    if (lo > 1e8)
        lo = 1;
    set.minA = std::max(0.5, std::pow(10.0, std::floor(std::log10(lo))));
    set.maxA = std::min(1e5, std::pow(10.0, std::ceil(std::log10(hi))));
}

void addDeviceBands(CurveSet& set, const StudyView& ctx, const std::vector<PathDevice>& devices) {
    for (const auto& dv : devices) {
        // A device across a transformer sees the current scaled by the voltage ratio.
        const Part& p = *dv.part;
        const NodeIndex at =
            isTwoTerminal(p.kind) ? ctx.flow.lineNode(p.id) : ctx.net.nodeOf(p.id, 0);
        const double v = ctx.net.graph()[at].nominalV;
        const double ratio = set.voltsBase > 0 && v > 0 ? set.voltsBase / v : 1.0;
        const TripCurve c = dv.curve;
        const std::string label =
            c.label() +
            (ratio != 1.0 ? " (at " + std::to_string(static_cast<int>(set.voltsBase)) + " V)" : "");
        set.series.push_back(sampled(set, PlotSeries::Kind::Band, label, [&](double a) {
            return std::pair{c.minTime(a * ratio), c.maxTime(a * ratio)};
        }));
    }
}

void addMotorSeries(CurveSet& set, const Part& motor, const StartProfile& prof) {
    PlotSeries s{PlotSeries::Kind::StartProfile,
                 motor.tag + " start: " + std::to_string(static_cast<int>(prof.lockedRotorA)) +
                     " A for " + std::to_string(prof.accelS).substr(0, 4) + " s",
                 {},
                 {},
                 {}};
    const double pts[][2] = {{prof.asymA, 0.01},
                             {prof.asymA, StartProfile::kAsymS},
                             {prof.lockedRotorA, StartProfile::kAsymS},
                             {prof.lockedRotorA, prof.accelS},
                             {prof.runningA, prof.accelS},
                             {prof.runningA, 1000}};
    for (const auto& p : pts) {
        s.amps.push_back(p[0]);
        s.minS.push_back(p[1]);
        s.maxS.push_back(p[1]);
    }
    set.series.push_back(std::move(s));
    // The motor's safe stall times at locked-rotor current, as markers.
    PlotSeries stall{
        PlotSeries::Kind::StallPoints, motor.tag + " safe stall (hot, cold)", {}, {}, {}};
    const auto m = MotorRatings::of(motor);
    for (const auto& stallS : {m.stallHotS, m.stallColdS})
        if (auto t = stallS) {
            stall.amps.push_back(prof.lockedRotorA);
            stall.minS.push_back(*t);
            stall.maxS.push_back(*t);
        }
    if (!stall.amps.empty())
        set.series.push_back(std::move(stall));
}

// The damage curve of the cable nearest the part: its own cable for a motor, or itself.
void addDamageCurve(CurveSet& set, const StudyView& ctx, const Part& part) {
    const Part* cable = part.kind == PartKind::Cable ? &part : nullptr;
    for (auto c : cable ? std::vector<PartId>{} : ctx.net.branchChain(part.id))
        if (!cable && ctx.drawing.part(c)->kind == PartKind::Cable)
            cable = ctx.drawing.part(c);
    if (!cable)
        return;
    if (auto i2t = cableDamageI2t(ctx, *cable)) {
        const double v = *i2t;
        set.series.push_back(sampled(
            set, PlotSeries::Kind::DamageCurve,
            cable->tag + " damage (" + CableRatings::of(*cable).size + ")", [&](double a) {
                const double tt = v / (a * a);
                return tt > 10 || tt < 0.01 ? std::pair{kNoTrip, kNoTrip} : std::pair{tt, tt};
            }));
    }
}

} // namespace

CurveSet buildCurveSet(const StudyView& ctx, PartId id) {
    CurveSet set;
    const Part* part = ctx.drawing.part(id);
    if (!part)
        return set;
    set.title = "Curves: " + part->tag;
    set.faultA = availableFaultA(ctx, *part);
    const auto devices = devicesOnPath(ctx, id);
    std::optional<StartProfile> prof;
    if (part->kind == PartKind::Motor)
        prof = startProfile(ctx, *part);
    chooseAxis(set, devices, prof);
    const NodeIndex here =
        isTwoTerminal(part->kind) ? ctx.flow.lineNode(id) : ctx.net.nodeOf(id, 0);
    set.voltsBase = ctx.net.graph()[here].nominalV;
    addDeviceBands(set, ctx, devices);
    if (prof)
        addMotorSeries(set, *part, *prof);
    addDamageCurve(set, ctx, *part);
    return set;
}

} // namespace lineward
