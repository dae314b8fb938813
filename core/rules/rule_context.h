// What every rule family receives: the analysis the check built once (drawing, network, supply
// tree, motor branches, tables, study results), read-only.
#pragma once

#include "rules/finding.h"
#include "studies/study_view.h"

#include <vector>

namespace lineward {

/// Read-only inputs of one check: the view of the check result the rules judge.
using RuleContext = StudyView;

/// Current drawn by a static load at its rated voltage.
double loadAmps(const Part& load);

void checkMotorBranches(const RuleContext& ctx, std::vector<Finding>& out);
void checkFeeders(const RuleContext& ctx, std::vector<Finding>& out);
void checkDuty(const RuleContext& ctx, std::vector<Finding>& out);
void checkVoltage(const RuleContext& ctx, std::vector<Finding>& out);
void checkCurves(const RuleContext& ctx, std::vector<Finding>& out);
/// The study issues (what a study could not compute) as findings.
void reportStudyIssues(const RuleContext& ctx, std::vector<Finding>& out);

} // namespace lineward
