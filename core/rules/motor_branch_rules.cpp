// The branch.* rules of docs/rules.md: NEC 2023 Article 430 checks of each motor's branch.
#include "model/ratings.h"
#include "rules/branch_check.h"

#include <algorithm>
#include <cmath>

namespace lineward {

namespace {

void conductor(BranchCheck& c) {
    const double need = 1.25 * c.flc.amps;
    for (const Part* cable : c.b.cables) {
        // A drive's input conductors are sized from its input current (branch.drive.*).
        if (std::find(c.b.driveInputCables.begin(), c.b.driveInputCables.end(), cable) !=
            c.b.driveInputCables.end())
            continue;
        const std::string size = CableRatings::of(*cable).size;
        const auto cond = conditionsOf(*cable, c.ctx.settings());
        auto amp = cableAmpacity(size, cond, c.ctx.tables, false);
        if (!amp || amp->amps >= need - 1e-9)
            continue; // metric sizes and sizes outside Table 310.16 are not judged here
        amp = cableAmpacity(size, cond, c.ctx.tables); // again, with its trace
        auto& f = c.add("branch.conductor.ampacity", *cable,
                        "cable " + cable->tag + " feeding " + c.motorName() + " needs 1.25 × " +
                            fmt(c.flc.amps) + " A = " + fmt(need) + " A; " + size + " carries " +
                            fmt(amp->amps) + " A");
        f.computed = amp->amps;
        f.limit = need;
        f.unit = "A";
        f.trace.push_back({"required", "1.25 × FLC = 1.25 × " + fmt(c.flc.amps) + " = " +
                                           fmt(need) + " A (NEC 430.22)"});
        f.trace.insert(f.trace.end(), amp->trace.begin(), amp->trace.end());
        f.trace.push_back({"240.4(D)", "not applied: Article 430 permits the motor branch device "
                                       "to exceed it (240.4(G))"});
        CableConditions perSet = cond;
        if (auto next = smallestCable(need, perSet, c.ctx.tables, size))
            f.fix = Fix{"use " + next->first + " (" + fmt(next->second.amps) + " A)",
                        {{cable->id, CableRatings::kSize, next->first}}};
    }
}

void ratedDevice(BranchCheck& c, const Part& d, ScpdType type, const ScpdLimit& lim) {
    const double rating = branchSettingA(d);
    // 430.52(B): the device must carry the starting and running current; one rated below the
    // running current opens with the motor at load.
    const auto fla = MotorRatings::of(*c.b.motor).fla;
    const double running = fla ? std::max(c.flc.amps, *fla) : c.flc.amps;
    if (rating < running - 1e-9) {
        auto& f =
            c.add("branch.scpd.low", d,
                  std::string(scpdTypeName(type)) + " " + d.tag + " rated " + fmt(rating, 0) +
                      " A is below the " + fmt(running) + " A running current of " + c.motorName());
        f.computed = rating;
        f.limit = running;
        f.unit = "A";
        f.trace.push_back({"running current", fmt(running) + " A (the larger of table FLC " +
                                                  fmt(c.flc.amps) + " A and nameplate FLA)"});
        f.trace.push_back(scpdRowStep(*c.b.motor));
        f.trace.push_back({"Table 430.52(C)(1)", fmt(lim.pct, 0) + " % × " + fmt(c.flc.amps) +
                                                     " A = " + fmt(lim.rawA) + " A → " +
                                                     fmt(lim.maxA, 0) + " A (Exc. No. 1)"});
        f.fix = Fix{"set " + d.tag + " to " + fmt(lim.maxA, 0) + " A",
                    {{d.id, branchSettingKey(d.kind), lim.maxA}}};
        return;
    }
    if (rating <= lim.maxA + 1e-9)
        return;
    const bool withinExc = rating <= lim.excMaxA + 1e-9;
    const bool hard = MotorRatings::of(*c.b.motor).hardToStart;
    const RuleId rule =
        withinExc && hard ? RuleId("branch.scpd.exception") : RuleId("branch.scpd.rating");
    auto& f =
        c.add(rule, d,
              std::string(scpdTypeName(type)) + " " + d.tag + " rated " + fmt(rating, 0) +
                  " A exceeds " + fmt(lim.maxA, 0) + " A for " + c.motorName() +
                  (withinExc && hard ? "; Exception No. 2 allows up to " + fmt(lim.excMaxA, 0) +
                                           " A for a motor that "
                                           "will not start"
                                     : ""));
    f.computed = rating;
    f.limit = withinExc && hard ? lim.excMaxA : lim.maxA;
    f.unit = "A";
    f.trace.push_back(scpdRowStep(*c.b.motor));
    f.trace.push_back({"Table 430.52(C)(1)", fmt(lim.pct, 0) + " % × " + fmt(c.flc.amps) +
                                                 " A = " + fmt(lim.rawA) + " A"});
    f.trace.push_back({"next standard size (Exc. No. 1, 240.6(A))", fmt(lim.maxA, 0) + " A"});
    f.trace.push_back(
        {"Exception No. 2 ceiling", fmt(lim.excPct, 0) + " % → " + fmt(lim.excMaxA, 0) +
                                        " A, only where the motor will not start" +
                                        (lim.excNote.empty() ? "" : " (" + lim.excNote + ")")});
    if (!hard && withinExc)
        f.trace.push_back({"hard-to-start flag", "not set on the motor"});
    if (!(withinExc && hard))
        f.fix = Fix{"set " + d.tag + " to " + fmt(lim.maxA, 0) + " A",
                    {{d.id, branchSettingKey(d.kind), lim.maxA}}};
}

void instantaneous(BranchCheck& c, const Part& d, const ScpdLimit& lim) {
    const auto mcp = InstBreakerRatings::of(d);
    const double setting = mcp.pickupA;
    std::vector<TraceStep> inrushTrace;
    auto lra = lockedRotorA(*c.b.motor, c.ctx.tables, &inrushTrace);
    double asym = c.ctx.settings().asymmetryFactor;
    // A drive or soft starter limits the start: its starting current, with no asymmetrical
    // offset, stands for the inrush (the check's starting profile).
    if (const MotorFacts* facts = c.ctx.facts(c.b.motor->id);
        facts && facts->start && !facts->start->limitBasis.empty()) {
        lra = facts->start->lockedRotorA;
        asym = 1.0;
        inrushTrace = {{"starting current", facts->start->limitBasis}};
    }
    const double needSetting = lra ? *lra * asym / (1.0 - kInstantaneousTolerance) : 0;
    // 430.52(C)(3): above the table value only where the table setting cannot carry the start;
    // the inrush calculation shows whether it can.
    const bool excJustified = lra && needSetting > lim.maxA;
    const double allowed = excJustified ? lim.excMaxA : lim.maxA;
    if (setting > allowed + 1e-9) {
        auto& f = c.add("branch.inst.setting", d,
                        d.tag + " set at " + fmt(setting, 0) + " A exceeds " + fmt(allowed, 0) +
                            " A for " + c.motorName());
        f.computed = setting;
        f.limit = allowed;
        f.unit = "A";
        f.trace.push_back(scpdRowStep(*c.b.motor));
        f.trace.push_back({"Table 430.52(C)(1)", fmt(lim.pct, 0) + " % × " + fmt(c.flc.amps) +
                                                     " A = " + fmt(lim.maxA) + " A"});
        f.trace.insert(f.trace.end(), inrushTrace.begin(), inrushTrace.end());
        f.trace.push_back({"430.52(C)(3) increase",
                           excJustified
                               ? "justified by the inrush, up to " + fmt(lim.excMaxA, 0) + " A"
                               : "not justified: the table setting "
                                 "carries the start"});
        f.fix = Fix{"set " + d.tag + " to " + fmt(std::floor(allowed), 0) + " A",
                    {{d.id, InstBreakerRatings::kPickupA, std::floor(allowed)}}};
    }
    if (!lra)
        return;
    const double lowEdge = setting * (1.0 - kInstantaneousTolerance), inrush = *lra * asym;
    if (lowEdge >= inrush - 1e-9)
        return;
    auto& f =
        c.add("branch.inst.inrush", d,
              d.tag + " lowest pickup " + fmt(lowEdge, 0) + " A is below the asymmetrical inrush " +
                  fmt(inrush, 0) + " A of " + c.motorName() + "; it may trip on start");
    f.computed = lowEdge;
    f.limit = inrush;
    f.unit = "A";
    f.trace.insert(f.trace.end(), inrushTrace.begin(), inrushTrace.end());
    f.trace.push_back(
        {"asymmetrical inrush", fmt(*lra, 0) + " A × " + fmt(asym, 2) +
                                    " (setting, common practice) = " + fmt(inrush, 0) + " A"});
    f.trace.push_back(
        {"lowest pickup", fmt(setting, 0) + " A × (1 − " + fmt(kInstantaneousTolerance, 2) +
                              " tolerance, common practice) = " + fmt(lowEdge, 0) + " A"});
    const double fixTo = std::ceil(needSetting / 5.0) * 5.0;
    if (fixTo <= lim.excMaxA && (!mcp.pickupMaxA || fixTo <= *mcp.pickupMaxA))
        f.fix = Fix{"set " + d.tag + " to " + fmt(fixTo, 0) + " A",
                    {{d.id, InstBreakerRatings::kPickupA, fixTo}}};
    else
        f.fix = Fix{"no setting within 430.52(C)(3) clears the inrush: review the motor data or "
                    "starting method",
                    {}};
}

void scpd(BranchCheck& c) {
    if (!c.b.scpd) {
        auto& f = c.add("branch.scpd.missing", *c.b.motor,
                        c.motorName() + " has no short-circuit protective device in its branch");
        f.fix = Fix{"add a breaker or fuses at the head of the branch", {}};
        return;
    }
    const Part& d = *c.b.scpd;
    const ScpdType type = *scpdTypeOf(d);
    const auto lim = scpdLimit(type, motorTypeOf(*c.b.motor), c.flc.amps, c.ctx.tables);
    if (type == ScpdType::InstantaneousBreaker)
        instantaneous(c, d, lim);
    else
        ratedDevice(c, d, type, lim);
}

} // namespace

void checkMotorBranches(const RuleContext& ctx, std::vector<Finding>& out) {
    for (const auto& facts : ctx.motors) {
        const MotorBranch& b = facts.branch;
        const auto& flc = facts.flc; // computed once by the check
        if (!flc) {
            auto f = makeFinding("branch.flc.unknown", {b.motor->id},
                                 b.motor->tag + ": no table full-load current for " +
                                     fmt(motorHp(*b.motor), 2) + " hp at " +
                                     fmt(MotorRatings::of(*b.motor).volts, 0) +
                                     " V and no nameplate FLA; the branch cannot be sized");
            f.fix = Fix{"enter the nameplate full-load current (fla)", {}};
            out.push_back(std::move(f));
            continue;
        }
        if (!flc->fromTable) {
            auto f =
                makeFinding("branch.flc.nameplate", {b.motor->id},
                            b.motor->tag + ": no row in the FLC table; sized from nameplate FLA " +
                                fmt(flc->amps) + " A");
            f.trace = motorFlc(*b.motor, ctx.tables)->trace;
            out.push_back(std::move(f));
        }
        BranchCheck c{ctx, b, *flc, out};
        conductor(c);
        scpd(c);
        checkBranchDevices(c);
        checkBranchStarters(c);
    }
}

} // namespace lineward
