// One motor branch under check: shared by the two files of the branch.* family.
#pragma once

#include "model/ratings.h"
#include "rules/rule_catalog.h"
#include "rules/rule_context.h"
#include "sizing/motor_sizing.h"

namespace lineward {

/// The branch, its FLC and where findings go.
struct BranchCheck {
    const RuleContext& ctx;
    const MotorBranch& b;
    const MotorFlc& flc;
    std::vector<Finding>& out;

    /// Adds a finding about `about` (and the motor), starting its trace with the FLC steps.
    Finding& add(RuleId rule, const Part& about, std::string message) {
        std::vector<PartId> parts{about.id};
        if (about.id != b.motor->id)
            parts.push_back(b.motor->id);
        out.push_back(makeFinding(rule, parts, std::move(message)));
        out.back().trace = motorFlc(*b.motor, ctx.tables)->trace; // the text only when reporting
        return out.back();
    }
    std::string motorName() const {
        return b.motor->tag + " (" + fmt(motorHp(*b.motor), 2) + " hp, " +
               fmt(MotorRatings::of(*b.motor).volts, 0) + " V)";
    }
};

/// Overload relay, contactor, disconnect and EGC checks (motor_branch_devices.cpp).
void checkBranchDevices(BranchCheck& c);
/// Drive and soft-starter checks (motor_branch_starters.cpp).
void checkBranchStarters(BranchCheck& c);

} // namespace lineward
