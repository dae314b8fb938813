// The study.* rules: each thing a study could not compute becomes a finding, so a missing
// result is never silent (a duty check that was not performed says so through these).
#include "rules/rule_catalog.h"
#include "rules/rule_context.h"

namespace lineward {

namespace {

RuleId ruleOf(StudyIssueKind k) {
    switch (k) {
    case StudyIssueKind::CableNoData:
        return "study.cable.no_data";
    case StudyIssueKind::NotFinite:
        return "study.not_finite";
    case StudyIssueKind::FaultSolveFailed:
    case StudyIssueKind::LoadFlowSolveFailed:
        return "study.solve.failed";
    case StudyIssueKind::LoadFlowDiverged:
        return "study.loadflow.diverged";
    case StudyIssueKind::RatioMismatch:
        return "study.ratio.mismatch";
    }
    return "study.not_finite";
}

} // namespace

void reportStudyIssues(const StudyView& ctx, std::vector<Finding>& out) {
    for (const auto& issue : ctx.study.issues)
        out.push_back(makeFinding(ruleOf(issue.kind), issue.parts, issue.message));
}

} // namespace lineward
