// Path collection walks the supply tree upward; profiles come from sizing and the studies.
#include "curves/path_curves.h"

#include "model/ratings.h"
#include "sizing/motor_sizing.h"
#include "topology/network.h"

#include <cmath>

namespace lineward {

PathDeviceTable::PathDeviceTable(const StudyView& ctx) {
    std::unordered_map<const Part*, const Part*> contactorOf;
    for (const auto& b : ctx.branches)
        if (b.overload)
            contactorOf.emplace(b.overload, b.contactor);
    for (const auto& p : ctx.drawing.parts()) {
        // Nothing for a part that is not protective; generic bands as the drawing sets them.
        auto c = TripCurve::of(p, ctx.settings().curveBands);

        if (!c)
            continue;
        double clears = kNoTrip;
        if (p.kind == PartKind::Overload) {
            const auto k = contactorOf.find(&p);
            clears = overloadBreakingA(ctx.tables, p, k == contactorOf.end() ? nullptr : k->second);
        }
        m_devices.emplace(p.id, PathDevice{&p, std::move(*c), clears});
    }
}

const PathDevice* PathDeviceTable::find(PartId part) const {
    const auto it = m_devices.find(part);
    return it == m_devices.end() ? nullptr : &it->second;
}

std::vector<PathDevice> devicesOnPath(const StudyView& ctx, PartId id, PathExtent extent) {
    std::vector<PathDevice> out;
    const Part* p = ctx.drawing.part(id);
    if (!p)
        return out;
    auto add = [&](const Part* q) {
        if (ctx.devices) {
            if (const PathDevice* d = ctx.devices->find(q->id))
                out.push_back(*d);
            return;
        }
        if (auto c = TripCurve::of(*q, ctx.settings().curveBands))
            out.push_back(
                {q, *c, q->kind == PartKind::Overload ? overloadBreakingA(ctx, *q) : kNoTrip});
    };
    NodeIndex top = ctx.net.nodeOf(id, 0);
    if (isTwoTerminal(p->kind)) {
        add(p);
        top = ctx.flow.lineNode(id);
    }
    // Up the supply tree from one part with a curve to the next (overload relays included);
    // the tree knows each node's nearest one, so cables and switches in between cost nothing.
    auto done = [&] {
        if (extent == PathExtent::ToSource || out.empty())
            return false;
        for (std::size_t i = extent == PathExtent::OwnProtection ? 0 : 1; i < out.size(); ++i)
            if (out[i].part->kind != PartKind::Overload)
                return true;
        return false;
    };
    for (std::size_t guard = 0; guard < ctx.drawing.parts().size() && !done(); ++guard) {
        auto dev = ctx.flow.curveDeviceAbove(top);
        if (!dev)
            break;
        add(ctx.drawing.part(*dev));
        top = ctx.flow.lineNode(*dev);
    }
    return out;
}

double overloadBreakingA(const StudyView& ctx, const Part& overload, std::string* how) {
    const Part* contactor = nullptr;
    for (const auto& b : ctx.branches)
        if (b.overload == &overload) {
            contactor = b.contactor;
            break;
        }
    return overloadBreakingA(ctx.tables, overload, contactor, how);
}

double overloadBreakingA(const Tables& tables, const Part& overload, const Part* contactor,
                         std::string* how) {
    const double x = kContactorBreakingX;
    if (contactor) {
        const auto k = ContactorRatings::of(*contactor);
        std::optional<double> ie = k.ac3A;
        std::string what = "AC-3 rating";
        if (!ie && k.nemaSize)
            if (const auto* row = tables.nemaRow(*k.nemaSize)) {
                ie = row->continuousA;
                what = "NEMA size " + *k.nemaSize + " continuous rating";
            }
        if (ie && *ie > 0) {
            if (how)
                *how = contactor->tag + " breaks " + fmt(x, 0) + " × its " + what + " " +
                       fmt(*ie, 0) + " A = " + fmt(x * *ie, 0) +
                       " A (IEC 60947-4-1 AC-3, from memory)";
            return x * *ie;
        }
    }
    const double setting = OverloadRatings::of(overload).settingA;
    if (how)
        *how = "no rated contactor: " + fmt(x, 0) + " × " + overload.tag + "'s setting " +
               fmt(setting, 1) + " A = " + fmt(x * setting, 0) + " A (common practice)";
    return x * setting;
}

std::optional<StartProfile> startProfile(const StudyView& ctx, const Part& m) {
    auto flc = motorFlc(m, ctx.tables, false);
    const auto motor = MotorRatings::of(m);
    const double running = motor.fla ? *motor.fla : flc ? flc->amps : 0; // 0: nothing to run on
    if (running <= 0)
        return std::nullopt;
    StartProfile s;
    s.runningA = running;
    const auto lr =
        startingCurrent(m, startingDevice(ctx.drawing, ctx.net.branchChain(m.id)), ctx.tables);
    if (!lr)
        return std::nullopt;
    s.lraAssumed = lr->assumed;
    s.lockedRotorA = lr->amps;
    // A drive or soft starter ramps the current up: no asymmetrical offset (common practice).
    s.asymA = lr->limited ? lr->amps : lr->amps * ctx.settings().asymmetryFactor;
    if (lr->limited)
        s.limitBasis = lr->basis;
    s.accelS = motor.accelS;
    return s;
}

std::optional<double> cableDamageI2t(const StudyView& ctx, const Part& cable) {
    const auto c = CableRatings::of(cable);
    const std::string& size = c.size;
    const double ins = c.insulationC, sets = c.sets;
    const bool al = c.material == Material::Al;
    double perSet = 0;
    if (size.ends_with(" mm2")) {
        const double k =
            ins >= 90 ? (al ? 94 : 143) : (al ? 76 : 115); // IEC 60364-4-43 (from memory)
        perSet = std::pow(k * std::stod(size), 2);
    } else if (auto area = ctx.tables.areaCmil(size)) {
        const double t2 = ins >= 90 ? 250 : 150, k = al ? 0.0125 : 0.0297, base = al ? 228 : 234;
        perSet = k * std::log10((t2 + base) / (ins + base)) * *area * *area; // ICEA P-32-382
    } else {
        return std::nullopt;
    }
    return perSet * sets * sets; // the current divides among the sets
}

double availableFaultA(const StudyView& ctx, const Part& p) {
    const NodeIndex n = isTwoTerminal(p.kind) ? ctx.flow.lineNode(p.id) : ctx.net.nodeOf(p.id, 0);
    const auto* f = ctx.study.faultAtNode(n);
    return f ? f->ikKa * 1000.0 : 0.0;
}

} // namespace lineward
