// Builds the check result: network, supply tree, studies, motor facts, then the rule families;
// marks accepted deviations and orders the findings.
#include "check/check.h"

#include "curves/arc_flash_study.h"
#include "curves/path_curves.h"
#include "model/ratings.h"
#include "rules/arc_flash_rules.h"
#include "rules/drawing_rules.h"
#include "rules/rule_catalog.h"
#include "rules/rule_context.h"
#include "rules/topology_rules.h"
#include "studies/study.h"
#include "studies/study_view.h"
#include "topology/flow.h"
#include "topology/network.h"

#include <algorithm>
#include <cmath>
#include <unordered_map>

namespace lineward {

bool CheckReport::hasOpenAtLeast(Severity threshold) const {
    for (int s = static_cast<int>(threshold); s <= 2; ++s)
        if (openCounts[static_cast<std::size_t>(s)] > 0)
            return true;
    return false;
}

CheckResult::CheckResult() = default;
CheckResult::~CheckResult() = default;

std::optional<StudyView> CheckResult::view() const {
    if (!net || !flow || !study)
        return std::nullopt;
    return StudyView{*drawing, *net, *flow, *tables, *study, branches};
}

const MotorFacts* CheckResult::motorFacts(PartId motor) const {
    for (const auto& m : motors)
        if (m.branch.motor->id == motor)
            return &m;
    return nullptr;
}

bool acceptanceCovers(const Accepted& a, const Finding& f) {
    // An acceptance names the parts it covers; it applies when it covers the finding's first
    // part (the part the finding is about).
    return a.rule == f.ruleId && !f.parts.empty() &&
           std::find(a.parts.begin(), a.parts.end(), f.parts.front()) != a.parts.end();
}

void guardFindingNumbers(std::vector<Finding>& findings) {
    for (auto& f : findings)
        for (auto* v : {&f.computed, &f.limit})
            if (*v && !std::isfinite(**v)) {
                f.trace.push_back({v == &f.computed ? "computed" : "limit",
                                   std::isnan(**v) ? "could not be computed (not a number)"
                                                   : "unbounded (no finite value)"});
                v->reset();
            }
}

namespace {

// Marks each finding an acceptance covers; returns the acceptances that cover none (stale).
std::vector<std::size_t> markAccepted(const Drawing& d, std::vector<Finding>& findings) {
    const auto& accepted = d.accepted();
    std::vector<bool> used(accepted.size(), false);
    for (auto& f : findings) {
        for (std::size_t i = 0; i < accepted.size(); ++i) {
            const auto& a = accepted[i];
            if (!acceptanceCovers(a, f))
                continue;
            used[i] = true;
            f.accepted = true;
            f.acceptedNote = a.note + " (" + a.by + ", " + a.date + ")";
        }
    }
    std::vector<std::size_t> stale;
    for (std::size_t i = 0; i < accepted.size(); ++i)
        if (!used[i])
            stale.push_back(i);
    return stale;
}

// Runs one stage; an internal error in it becomes a finding instead of ending the check (the
// editor calls this from a worker thread and a Qt slot, where an exception would end the
// program and lose the user's work).
template <typename Fn> void runStage(const char* family, std::vector<Finding>& out, Fn&& fn) {
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

void computeMotorFacts(CheckResult& r, const StudyView& view) {
    for (const auto& b : r.branches) {
        MotorFacts m{b, motorFlc(*b.motor, *r.tables, false), startProfile(view, *b.motor)};
        r.motors.push_back(std::move(m));
    }
    for (const auto& p : r.drawing->parts())
        if (p.kind == PartKind::Cable && r.net->partEnergized(p.id))
            if (auto a = cableAmpacity(CableRatings::of(p).size,
                                       conditionsOf(p, r.drawing->settings), *r.tables, false))
                r.cableAmpacityA.emplace(p.id, a->amps);
}

void analyse(CheckResult& r, std::vector<Finding>& out) {
    const Drawing& drawing = *r.drawing;
    runStage("drawing", out, [&] { checkDrawingRules(drawing, out); });
    runStage("topology", out, [&] {
        auto net = std::make_unique<const Network>(drawing);
        checkTopology(*net, out);
        r.net = std::move(net);
    });
    if (!r.net)
        return;
    runStage("study", out, [&] {
        r.flow = std::make_unique<const Flow>(*r.net);
        r.branches = findMotorBranches(drawing, *r.net);
        r.study = std::make_unique<const StudyResults>(
            runStudies(*r.net, *r.flow, *r.tables, drawing.settings));
    });
    if (!r.study)
        return;
    // Every protective part's band once for the rules and the arc-flash study (the panels and
    // the Submittal, which ask for a few paths, build theirs per use).
    std::unique_ptr<const PathDeviceTable> devices;
    runStage("curves", out, [&] { devices = std::make_unique<const PathDeviceTable>(*r.view()); });
    StudyView view = *r.view();
    view.devices = devices.get();
    runStage("motor facts", out, [&] { computeMotorFacts(r, view); });
    std::unordered_map<PartId, const MotorFacts*> factsByMotor;
    for (const auto& m : r.motors)
        factsByMotor.emplace(m.branch.motor->id, &m);
    const RuleContext ctx{view, r.motors, factsByMotor};
    runStage("motor branch", out, [&] { checkMotorBranches(ctx, out); });
    runStage("feeder", out, [&] { checkFeeders(ctx, out); });
    runStage("short-circuit duty", out, [&] { checkDuty(ctx, out); });
    runStage("voltage", out, [&] { checkVoltage(ctx, out); });
    runStage("time-current curve", out, [&] { checkCurves(ctx, out); });
    runStage("study", out, [&] { reportStudyIssues(ctx, out); });
    runStage("arc flash", out, [&] {
        auto af = std::make_shared<const std::vector<ArcFlashEquipment>>(arcFlashStudy(view));
        if (drawing.settings.arcFlashFindings)
            checkArcFlash(view, *af, out);
        r.arcFlash = std::move(af);
    });
}

void finishReport(const Drawing& drawing, CheckReport& report) {
    guardFindingNumbers(report.findings);
    report.staleAccepted = markAccepted(drawing, report.findings);
    // A check that stopped early is missing findings: it cannot tell a stale acceptance.
    if (std::any_of(report.findings.begin(), report.findings.end(),
                    [](const Finding& f) { return f.ruleId == "check.incomplete"; }))
        report.staleAccepted.clear();
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
}

} // namespace

std::shared_ptr<const CheckResult> runCheck(std::shared_ptr<const Drawing> drawing,
                                            const Tables& tables, std::uint64_t generation) {
    auto r = std::make_shared<CheckResult>();
    r->drawing = std::move(drawing);
    r->tables = &tables;
    r->generation = generation;
    analyse(*r, r->report.findings);
    finishReport(*r->drawing, r->report);
    return r;
}

std::shared_ptr<const CheckResult> runCheck(const Drawing& drawing, const Tables& tables,
                                            std::uint64_t generation) {
    return runCheck(std::make_shared<const Drawing>(drawing), tables, generation);
}

CheckReport checkDrawing(const Drawing& drawing, const Tables& tables) {
    return runCheck(drawing, tables)->report;
}

} // namespace lineward
