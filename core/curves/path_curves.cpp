// Path collection walks the supply tree upward; profiles come from sizing and the studies.
#include "curves/path_curves.h"

#include "model/ratings.h"
#include "sizing/motor_sizing.h"

#include <cmath>

namespace lineward {

std::vector<PathDevice> devicesOnPath(const StudyView& ctx, PartId id, PathExtent extent) {
    std::vector<PathDevice> out;
    const Part* p = ctx.drawing.part(id);
    if (!p)
        return out;
    auto add = [&](const Part* q) {
        if (auto c = TripCurve::of(*q))
            out.push_back({q, *c});
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

std::optional<StartProfile> startProfile(const StudyView& ctx, const Part& m) {
    auto flc = motorFlc(m, ctx.tables, false);
    const auto motor = MotorRatings::of(m);
    const double running = motor.fla ? *motor.fla : flc ? flc->amps : 0; // 0: nothing to run on
    if (running <= 0)
        return std::nullopt;
    StartProfile s;
    s.runningA = running;
    const auto lr = lockedRotor(m, ctx.tables, nullptr);
    if (!lr)
        return std::nullopt;
    s.lraAssumed = lr->assumed;
    s.lockedRotorA = lr->amps;
    s.asymA = lr->amps * ctx.settings().asymmetryFactor;
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
