// What every rule family receives: the analysis the check built once (drawing, network, supply
// tree, motor branches, tables, study results), read-only.
#pragma once

#include "curves/path_types.h"
#include "rules/finding.h"
#include "studies/study_view.h"

#include <unordered_map>
#include <vector>

namespace lineward {

/// Read-only inputs of one check: the view of the check result the rules judge, with the facts
/// the check computed once per motor.
struct RuleContext : StudyView {
    const std::vector<MotorFacts>& motors; ///< one per motor branch, in the branches' order
    const std::unordered_map<PartId, const MotorFacts*>& factsByMotor;
    /// The facts of a motor, or nothing where the check found no branch for it.
    const MotorFacts* facts(PartId motor) const;
};

/// Current drawn by a static load at its rated voltage.
double loadAmps(const Part& load);

void checkMotorBranches(const RuleContext& ctx, std::vector<Finding>& out);
void checkFeeders(const RuleContext& ctx, std::vector<Finding>& out);
void checkDuty(const RuleContext& ctx, std::vector<Finding>& out);
void checkVoltage(const RuleContext& ctx, std::vector<Finding>& out);
void checkCurves(const RuleContext& ctx, std::vector<Finding>& out);
/// The study issues (what a study could not compute) as findings.
void reportStudyIssues(const StudyView& ctx, std::vector<Finding>& out);

} // namespace lineward
