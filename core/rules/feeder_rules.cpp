// The feeder.*, conductor.*, bus.* and transformer.* rules of docs/rules.md.
#include "model/ratings.h"
#include "rules/feeder_calc.h"
#include "rules/rule_catalog.h"
#include "sizing/motor_sizing.h"

#include <cmath>
#include <unordered_set>

namespace lineward {

namespace {

struct FeederCheck {
    const RuleContext& ctx;
    FeederMotorMap motors;
    std::unordered_set<PartId> branchParts; // parts inside a motor branch (Article 430 applies)
    std::vector<Finding>& out;
};

// The 240.6 rating of a feeder's breaker or fuse; nothing for other devices.
std::optional<double> deviceRating(const Part& d) {
    if (d.kind == PartKind::Breaker || d.kind == PartKind::Fuse)
        return ampereRatingA(d);
    return std::nullopt;
}

void feederConductor(FeederCheck& c, const Part& cable) {
    const auto load = feederLoad(c.ctx, c.motors, c.ctx.flow.loadNode(cable.id));
    if (load.motors + load.loads == 0)
        return;
    const std::string size = CableRatings::of(cable).size;
    const auto cond = conditionsOf(cable, c.ctx.settings());
    auto amp = cableAmpacity(size, cond, c.ctx.tables, false);
    const double need = load.required();
    if (!amp || amp->amps >= need - 1e-9)
        return;
    amp = cableAmpacity(size, cond, c.ctx.tables); // again, with its trace
    auto f = makeFinding("feeder.conductor.ampacity", {cable.id},
                         "cable " + cable.tag + " carries " + fmt(amp->amps) +
                             " A; its loads need " + fmt(need) + " A");
    f.computed = amp->amps;
    f.limit = need;
    f.unit = "A";
    f.trace = load.trace(c.ctx);
    f.trace.insert(f.trace.end(), amp->trace.begin(), amp->trace.end());
    CableConditions perSet = cond;
    perSet.sets = 1;
    if (auto next = smallestCable(need / cond.sets, perSet, c.ctx.tables, size))
        f.fix = Fix{"use " + next->first +
                        (cond.sets > 1 ? " in each of " + std::to_string(cond.sets) + " sets" : ""),
                    {{cable.id, CableRatings::kSize, next->first}}};
    c.out.push_back(std::move(f));
}

void conductorProtection(FeederCheck& c, const Part& cable) {
    // Motor feeders follow Article 430 Part V, not 240.4 (240.4(G)); feeder.device.rating
    // applies to them instead.
    if (feederLoad(c.ctx, c.motors, c.ctx.flow.loadNode(cable.id)).motors > 0)
        return;
    auto dev = c.ctx.flow.protectionAbove(c.ctx.flow.lineNode(cable.id));
    if (!dev)
        return;
    const Part& d = *c.ctx.drawing.part(*dev);
    auto rating = deviceRating(d);
    const std::string size = CableRatings::of(cable).size;
    const auto cond = conditionsOf(cable, c.ctx.settings());
    auto amp = cableAmpacity(size, cond, c.ctx.tables, false);
    if (!rating || !amp)
        return;
    auto small =
        cond.sets == 1 ? c.ctx.tables.smallConductorLimit(size, cond.material) : std::nullopt;
    const bool nextUpOk = *rating <= 800 && !c.ctx.tables.isStandardRating(amp->amps) &&
                          c.ctx.tables.nextStandardAtOrAbove(amp->amps) == *rating;
    const bool ampOk = *rating <= amp->amps + 1e-9 || nextUpOk;
    const bool smallOk = !small || *rating <= *small + 1e-9;
    if (ampOk && smallOk)
        return;
    amp = cableAmpacity(size, cond, c.ctx.tables); // again, with its trace
    const double limit = smallOk ? (nextUpOk ? *rating : amp->amps) : std::min(amp->amps, *small);
    auto f = makeFinding(
        "conductor.protection", {cable.id, d.id},
        "cable " + cable.tag + " (" + fmt(amp->amps) + " A) is protected by " + d.tag + " at " +
            fmt(*rating, 0) + " A" +
            (smallOk ? "" : "; 240.4(D) limits " + size + " to " + fmt(*small, 0) + " A"));
    f.computed = *rating;
    f.limit = limit;
    f.unit = "A";
    f.trace = amp->trace;
    f.trace.push_back(
        {"240.4(B)", *rating <= 800
                         ? "next standard rating above the ampacity: " +
                               fmt(c.ctx.tables.nextStandardAtOrAbove(amp->amps).value_or(0), 0) +
                               " A"
                         : "not available above 800 A"});
    auto perSet = cond;
    perSet.sets = 1;
    auto next = smallestCable(*rating / cond.sets, perSet, c.ctx.tables, size);
    if (next && (!c.ctx.tables.smallConductorLimit(next->first, cond.material) ||
                 *c.ctx.tables.smallConductorLimit(next->first, cond.material) >= *rating))
        f.fix = Fix{"use " + next->first, {{cable.id, CableRatings::kSize, next->first}}};
    else if (auto lower = c.ctx.tables.standardAtOrBelow(limit))
        f.fix = Fix{"set " + d.tag + " to " + fmt(*lower, 0) + " A",
                    {{d.id, ampereRatingKey(d.kind), *lower}}};
    c.out.push_back(std::move(f));
}

void feederDevice(FeederCheck& c, const Part& d) {
    const auto type = scpdTypeOf(d);
    auto rating = deviceRating(d);
    if (!type || !rating)
        return;
    const auto load = feederLoad(c.ctx, c.motors, c.ctx.flow.loadNode(d.id));
    if (load.motors == 0)
        return; // 240.4 governs feeders without motors
    const auto lim = feederDeviceLimit(c.ctx, c.motors, c.ctx.flow.loadNode(d.id), *type);
    if (*rating <= lim.maxA + 1e-9)
        return;
    auto f = makeFinding("feeder.device.rating", {d.id},
                         d.tag + " rated " + fmt(*rating, 0) + " A exceeds the 430.62(A) limit " +
                             fmt(lim.maxA, 0) + " A for the motors it feeds");
    f.computed = *rating;
    f.limit = lim.maxA;
    f.unit = "A";
    f.trace = lim.trace;
    f.fix = Fix{"set " + d.tag + " to " + fmt(lim.maxA, 0) + " A",
                {{d.id, ampereRatingKey(d.kind), lim.maxA}}};
    c.out.push_back(std::move(f));
}

void busLoad(FeederCheck& c, const Part& bus) {
    const auto load = feederLoad(c.ctx, c.motors, c.ctx.net.nodeOf(bus.id, 0));
    const double rating = BusRatings::of(bus).amps, need = load.required();
    if (need <= rating + 1e-9)
        return;
    auto f = makeFinding("bus.load", {bus.id},
                         "bus " + bus.tag + " rated " + fmt(rating, 0) +
                             " A carries a calculated load of " + fmt(need) + " A");
    f.computed = need;
    f.limit = rating;
    f.unit = "A";
    f.trace = load.trace(c.ctx);
    f.fix = Fix{"use a bus rated " +
                    fmt(c.ctx.tables.nextStandardAtOrAbove(need).value_or(need), 0) + " A or more",
                {{bus.id, BusRatings::kAmps,
                  c.ctx.tables.nextStandardAtOrAbove(need).value_or(std::ceil(need))}}};
    c.out.push_back(std::move(f));
}

} // namespace

void checkTransformers(const RuleContext& ctx, const FeederMotorMap& motors,
                       std::vector<Finding>& out);

void checkFeeders(const RuleContext& ctx, std::vector<Finding>& out) {
    const auto& branches = ctx.branches;
    FeederCheck c{ctx, feederMotors(ctx), {}, out};
    for (const auto& b : branches)
        for (const Part* p : b.chain)
            c.branchParts.insert(p->id);
    for (const auto& p : ctx.drawing.parts()) {
        if (!ctx.net.partEnergized(p.id))
            continue;
        const bool inBranch = c.branchParts.count(p.id) > 0;
        if (p.kind == PartKind::Cable && !inBranch) {
            feederConductor(c, p);
            conductorProtection(c, p);
        } else if ((p.kind == PartKind::Breaker || p.kind == PartKind::Fuse) && !inBranch) {
            feederDevice(c, p);
        } else if (p.kind == PartKind::Bus) {
            busLoad(c, p);
        }
    }
    checkTransformers(ctx, c.motors, out);
}

} // namespace lineward
