// Feeder sums. Motors without a table or nameplate FLC are left out (branch.flc.unknown says so).
#include "rules/feeder_calc.h"

#include "model/ratings.h"
#include "sizing/motor_sizing.h"

namespace lineward {

FeederMotorMap feederMotors(const RuleContext& ctx) {
    FeederMotorMap m;
    for (const auto& facts : ctx.motors) // the FLC the check computed once per motor
        if (facts.flc)
            m[facts.branch.motor->id] = FeederMotor{facts.flc->amps, facts.branch.scpd};
    return m;
}

namespace {
double voltageRatio(const RuleContext& ctx, PartId load, NodeIndex from) {
    const double there = ctx.net.graph()[ctx.net.nodeOf(load, 0)].nominalV;
    const double here = ctx.net.graph()[from].nominalV;
    return here > 0 && there > 0 ? there / here : 1.0;
}
} // namespace

FeederLoad feederLoad(const RuleContext& ctx, const FeederMotorMap& motors, NodeIndex from) {
    FeederLoad l;
    std::vector<std::pair<double, PartId>> flcs;
    for (auto id : ctx.flow.loadsBelow(from)) {
        const Part& p = *ctx.drawing.part(id);
        // Loads beyond a transformer count at this node's voltage (current × V_there / V_here).
        const double ratio = voltageRatio(ctx, id, from);
        if (p.kind == PartKind::Motor) {
            auto it = motors.find(id);
            if (it == motors.end())
                continue;
            flcs.push_back({it->second.flc * ratio, id});
        } else {
            (LoadRatings::of(p).continuous ? l.continuousA : l.nonContinuousA) +=
                loadAmps(p) * ratio;
            ++l.loads;
        }
    }
    l.motors = static_cast<int>(flcs.size());
    for (const auto& [a, id] : flcs) {
        if (a > l.largestFlc || !l.largestMotor.valid()) {
            l.otherFlc += l.largestFlc;
            l.largestFlc = a;
            l.largestMotor = id;
        } else {
            l.otherFlc += a;
        }
    }
    return l;
}

std::vector<TraceStep> FeederLoad::trace(const RuleContext& ctx) const {
    std::vector<TraceStep> t;
    t.push_back({"loads", std::to_string(motors) + " motor(s), " + std::to_string(loads) +
                              " other load(s)"});
    if (motors)
        t.push_back({"largest motor", ctx.tag(largestMotor) + ", FLC " + fmt(largestFlc) + " A"});
    t.push_back({"other motors' FLC", fmt(otherFlc) + " A"});
    t.push_back({"continuous / non-continuous loads",
                 fmt(continuousA) + " A / " + fmt(nonContinuousA) + " A"});
    t.push_back({"required", "1.25 × " + fmt(largestFlc) + " + " + fmt(otherFlc) + " + 1.25 × " +
                                 fmt(continuousA) + " + " + fmt(nonContinuousA) + " = " +
                                 fmt(required()) + " A (NEC 430.24, 215.2(A)(1))"});
    return t;
}

FeederDeviceLimit feederDeviceLimit(const RuleContext& ctx, const FeederMotorMap& motors,
                                    NodeIndex from, ScpdType feederType) {
    FeederDeviceLimit r;
    double sumFlc = 0, bestExtra = 0, bestRating = -1, other = 0;
    std::string bestTag;
    for (auto id : ctx.flow.loadsBelow(from)) {
        const Part& p = *ctx.drawing.part(id);
        const double ratio = voltageRatio(ctx, id, from);
        if (p.kind != PartKind::Motor) {
            other += (LoadRatings::of(p).continuous ? 1.25 : 1.0) * loadAmps(p) * ratio;
            continue;
        }
        auto it = motors.find(id);
        if (it == motors.end())
            continue;
        const double flc = it->second.flc * ratio;
        sumFlc += flc;
        double rating = flc;
        if (const Part* d = it->second.scpd) {
            const auto type = *scpdTypeOf(*d);
            if (type == ScpdType::InstantaneousBreaker)
                rating = scpdLimit(feederType, motorTypeOf(p), flc, ctx.tables).rawA;
            else
                rating = ampereRatingA(*d) * ratio;
        }
        // The largest-rated branch device counts in full (ties: the one adding most).
        if (rating > bestRating + 1e-9 ||
            (rating > bestRating - 1e-9 && rating - flc > bestExtra)) {
            bestRating = rating;
            bestExtra = rating - flc;
            bestTag = p.tag + " branch device " + fmt(rating, 0) + " A, FLC " + fmt(flc) + " A";
        }
    }
    r.rawA = sumFlc + bestExtra + other;
    r.maxA = ctx.tables.standardAtOrBelow(r.rawA, isFuse(feederType)).value_or(r.rawA);
    r.trace.push_back({"largest branch device", bestTag});
    r.trace.push_back({"sum of motor FLC", fmt(sumFlc) + " A"});
    r.trace.push_back({"other loads (430.63)", fmt(other) + " A"});
    r.trace.push_back({"limit", fmt(r.rawA) + " A, rounded down to the standard " + fmt(r.maxA, 0) +
                                    " A (NEC 430.62(A), 240.6(A))"});
    return r;
}

} // namespace lineward
