// Runs the rule families, marks accepted deviations and orders the findings.
#include "rules/check.h"

#include "rules/drawing_rules.h"
#include "rules/rule_catalog.h"
#include "rules/rule_context.h"
#include "rules/topology_rules.h"
#include "studies/finite_guard.h"
#include "topology/flow.h"
#include "topology/network.h"

#include <algorithm>
#include <optional>

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

// Runs one family; an internal error in it becomes a finding instead of ending the check (the
// editor calls this from a worker thread and a Qt slot, where an exception would end the
// program and lose the user's work).
template <typename Fn> void runFamily(const char* family, std::vector<Finding>& out, Fn&& fn) {
    try {
        fn();
    } catch (const std::exception& e) {
        out.push_back(makeFinding("check.incomplete", {},
                                  std::string("the ") + family +
                                      " checks stopped on an internal error and their findings "
                                      "are missing: " +
                                      e.what()));
    }
}

void runRuleFamilies(const Drawing& drawing, const Tables& tables, std::vector<Finding>& out) {
    runFamily("drawing", out, [&] { checkDrawingRules(drawing, out); });
    std::optional<Network> net;
    runFamily("topology", out, [&] {
        net.emplace(drawing);
        checkTopology(*net, out);
    });
    if (!net)
        return;
    std::optional<Flow> flow;
    std::optional<StudyResults> study;
    runFamily("study", out, [&] {
        flow.emplace(*net);
        study = runStudies(*net, *flow, tables, drawing.settings);
    });
    if (!study)
        return;
    const RuleContext ctx{drawing, *net, *flow, tables, *study};
    runFamily("motor branch", out, [&] { checkMotorBranches(ctx, out); });
    runFamily("feeder", out, [&] { checkFeeders(ctx, out); });
    runFamily("short-circuit duty", out, [&] { checkDuty(ctx, out); });
    runFamily("voltage", out, [&] { checkVoltage(ctx, out); });
    runFamily("time-current curve", out, [&] { checkCurves(ctx, out); });
    out.insert(out.end(), study->notes.begin(), study->notes.end());
}

} // namespace

CheckReport checkDrawing(const Drawing& drawing, const Tables& tables) {
    CheckReport report;
    runRuleFamilies(drawing, tables, report.findings);
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
