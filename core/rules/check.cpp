// Runs the rule families, marks accepted deviations and orders the findings.
#include "rules/check.h"

#include "rules/drawing_rules.h"
#include "rules/rule_context.h"
#include "rules/topology_rules.h"
#include "studies/finite_guard.h"
#include "topology/flow.h"
#include "topology/network.h"

#include <algorithm>

namespace lineward {

bool CheckReport::hasOpenAtLeast(Severity threshold) const {
    for (int s = static_cast<int>(threshold); s <= 2; ++s)
        if (openCounts[static_cast<std::size_t>(s)] > 0)
            return true;
    return false;
}

namespace {

void markAccepted(const Drawing& d, std::vector<Finding>& findings) {
    for (auto& f : findings) {
        for (const auto& a : d.accepted()) {
            if (a.rule != f.ruleId)
                continue;
            // An acceptance names the parts it covers; it applies when it covers the finding's
            // first part (the part the finding is about).
            if (!f.parts.empty() &&
                std::find(a.parts.begin(), a.parts.end(), f.parts.front()) != a.parts.end()) {
                f.accepted = true;
                f.acceptedNote = a.note + " (" + a.by + ", " + a.date + ")";
            }
        }
    }
}

} // namespace

CheckReport checkDrawing(const Drawing& drawing, const Tables& tables) {
    CheckReport report;
    Network net(drawing);
    Flow flow(net);
    const StudyResults study = runStudies(net, flow, tables, drawing.settings);
    const RuleContext ctx{drawing, net, flow, tables, study};
    checkDrawingRules(drawing, report.findings);
    checkTopology(net, report.findings);
    checkMotorBranches(ctx, report.findings);
    checkFeeders(ctx, report.findings);
    checkDuty(ctx, report.findings);
    checkVoltage(ctx, report.findings);
    checkCurves(ctx, report.findings);
    report.findings.insert(report.findings.end(), study.notes.begin(), study.notes.end());
    guardFindingNumbers(report.findings);
    markAccepted(drawing, report.findings);
    std::stable_sort(report.findings.begin(), report.findings.end(),
                     [](const Finding& a, const Finding& b) {
                         if (a.severity != b.severity)
                             return a.severity > b.severity;
                         const auto pa = a.parts.empty() ? 0u : a.parts.front().value;
                         const auto pb = b.parts.empty() ? 0u : b.parts.front().value;
                         if (pa != pb)
                             return pa < pb;
                         return a.ruleId < b.ruleId;
                     });
    for (const auto& f : report.findings) {
        if (f.accepted)
            ++report.acceptedCount;
        else
            ++report.openCounts[static_cast<std::size_t>(f.severity)];
    }
    return report;
}

} // namespace lineward
