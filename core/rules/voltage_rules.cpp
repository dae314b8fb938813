// The voltage.* rules: steady-state drop against the drawing's limits, and motor starting.
#include "model/ratings.h"
#include "rules/rule_catalog.h"
#include "rules/rule_context.h"
#include "sizing/motor_sizing.h"
#include "studies/network_model.h"

#include <cmath>

namespace lineward {

namespace {

// The assumption behind every motor's running load in the load flow.
TraceStep runningMotorsStep() {
    return {"running motors", "nameplate FLA (else table FLC) at power factor " +
                                  fmt(kRunningPf, 2) + " (assumed, common practice)"};
}

double vAt(const RuleContext& ctx, NodeIndex n) {
    const int b = ctx.study.busOf(n);
    return b >= 0 && static_cast<std::size_t>(b) < ctx.study.voltage.size()
               ? std::abs(ctx.study.voltage[static_cast<std::size_t>(b)])
               : 0.0;
}

void drops(const RuleContext& ctx, const Part& load, std::vector<Finding>& out) {
    const NodeIndex at = ctx.net.nodeOf(load.id, 0);
    const int bus = ctx.study.busOf(at);
    if (bus < 0 || ctx.study.voltage.empty())
        return;
    auto chain = ctx.net.branchChain(load.id);
    const NodeIndex head = chain.empty() ? at : ctx.flow.lineNode(chain.back());
    const double vLoad = vAt(ctx, at), vHead = vAt(ctx, head);
    const double branchPct = (vHead - vLoad) * 100.0;
    const double totalPct =
        (ctx.study.originVoltagePu[static_cast<std::size_t>(bus)] - vLoad) * 100.0;
    const auto& s = ctx.settings();
    if (branchPct > s.vdropBranchPct + 1e-9) {
        auto f = makeFinding("voltage.drop.branch", {load.id},
                             load.tag + " branch drop " + fmt(branchPct, 2) + " % exceeds " +
                                 fmt(s.vdropBranchPct, 1) + " %");
        f.computed = branchPct;
        f.limit = s.vdropBranchPct;
        f.unit = "%";
        f.trace = {{"voltage at the branch's bus", fmt(vHead * 100, 2) + " % of nominal"},
                   {"voltage at the load", fmt(vLoad * 100, 2) + " % of nominal"},
                   {"method", "load flow on the nodal admittance matrix; each load draws its rated "
                              "power (a motor √3 × rated V × FLA) as constant power"},
                   runningMotorsStep()};
        for (auto id : chain)
            if (ctx.drawing.part(id)->kind == PartKind::Cable)
                f.fix = Fix{"use a larger cable for " + ctx.tag(id) + " or shorten the run", {}};
        out.push_back(std::move(f));
    }
    if (totalPct > s.vdropTotalPct + 1e-9) {
        auto f = makeFinding("voltage.drop.total", {load.id},
                             load.tag + " total drop " + fmt(totalPct, 2) + " % exceeds " +
                                 fmt(s.vdropTotalPct, 1) + " %");
        f.computed = totalPct;
        f.limit = s.vdropTotalPct;
        f.unit = "%";
        f.trace = {{"voltage at the supplying transformer or source",
                    fmt(ctx.study.originVoltagePu[static_cast<std::size_t>(bus)] * 100, 2) + " %"},
                   {"voltage at the load", fmt(vLoad * 100, 2) + " %"},
                   runningMotorsStep()};
        f.fix = Fix{"use larger feeder or branch conductors", {}};
        out.push_back(std::move(f));
    }
}

// NEMA MG 1-12.44 (from memory): a motor runs successfully at rated frequency within ±10 % of
// its rated voltage. Steady state, from the load flow: the voltage at the motor's terminals
// follows every drop and every transformer's ratio and tap.
constexpr double kMotorVoltageBandPct = 10.0;

void motorRange(const RuleContext& ctx, const Part& motor, std::vector<Finding>& out) {
    const NodeIndex at = ctx.net.nodeOf(motor.id, 0);
    const int bus = ctx.study.busOf(at);
    const double rated = MotorRatings::of(motor).volts;
    if (bus < 0 || rated <= 0)
        return;
    const double nominal = ctx.study.model.nominalV[static_cast<std::size_t>(bus)];
    const double volts = vAt(ctx, at) * nominal;
    const double pct = volts / rated * 100.0;
    if (std::abs(pct - 100.0) <= kMotorVoltageBandPct + 1e-9)
        return;
    const bool high = pct > 100.0;
    auto f = makeFinding("voltage.motor.range", {motor.id},
                         motor.tag + " runs at " + fmt(volts, 0) + " V, " + fmt(pct, 1) +
                             " % of its rated " + fmt(rated, 0) + " V (outside ±" +
                             fmt(kMotorVoltageBandPct, 0) + " %)");
    f.computed = pct;
    f.limit = high ? 100.0 + kMotorVoltageBandPct : 100.0 - kMotorVoltageBandPct;
    f.unit = "%";
    f.trace = {{"voltage at the motor", fmt(vAt(ctx, at) * 100, 2) + " % of the bus's nominal " +
                                            fmt(nominal, 0) + " V = " + fmt(volts, 0) + " V"},
               {"supply", "every source at its rated voltage; each transformer at its turns "
                          "ratio and primary tap"},
               {"band", "±" + fmt(kMotorVoltageBandPct, 0) +
                            " % of rated voltage (NEMA MG 1-12.44, from memory)"},
               runningMotorsStep()};
    f.fix = Fix{high ? "set the supplying transformer's primary tap higher (a + tap lowers the "
                       "secondary) or use a motor rated for the system voltage"
                     : "set the supplying transformer's primary tap lower (a − tap raises the "
                       "secondary), or use larger conductors",
                {}};
    out.push_back(std::move(f));
}

void starting(const RuleContext& ctx, const Part& motor, const MotorStart& ms,
              std::vector<Finding>& out) {
    const auto& s = ctx.settings();
    if (ms.busDipPct <= s.startDipPct + 1e-9 && ms.terminalPctOfRated >= s.startTerminalPct - 1e-9)
        return;
    std::vector<TraceStep> trace{
        ms.limitBasis.empty()
            ? TraceStep{"locked-rotor current",
                        fmt(ms.lockedRotorA, 0) + " A" +
                            (ms.lraAssumed ? " (" + fmt(kAssumedLockedRotorMultiple, 0) +
                                                 " × table FLC assumed, common practice)"
                                           : std::string())}
            : TraceStep{"starting current", ms.limitBasis},
        {"starting power factor", fmt(s.startPf, 2) + " (setting)"},
        {"method", "superposition on the load-flow state: the motor at locked-rotor impedance, "
                   "others running"}};
    if (ms.busDipPct > s.startDipPct + 1e-9) {
        auto f = makeFinding("voltage.start.dip", {motor.id},
                             "starting " + motor.tag + " dips its bus " + fmt(ms.busDipPct, 1) +
                                 " % (limit " + fmt(s.startDipPct, 0) + " %)");
        f.computed = ms.busDipPct;
        f.limit = s.startDipPct;
        f.unit = "%";
        f.trace = trace;
        f.fix = Fix{
            "reduce the starting current (reduced-voltage starter or drive) or stiffen the supply",
            {}};
        out.push_back(std::move(f));
    }
    if (ms.terminalPctOfRated < s.startTerminalPct - 1e-9) {
        auto f = makeFinding("voltage.start.terminal", {motor.id},
                             motor.tag + " sees " + fmt(ms.terminalPctOfRated, 1) +
                                 " % of its rated voltage while "
                                 "starting (limit " +
                                 fmt(s.startTerminalPct, 0) + " %)");
        f.computed = ms.terminalPctOfRated;
        f.limit = s.startTerminalPct;
        f.unit = "%";
        f.trace = trace;
        f.fix = Fix{"use a larger branch cable or a stiffer supply", {}};
        out.push_back(std::move(f));
    }
}

} // namespace

void checkVoltage(const RuleContext& ctx, std::vector<Finding>& out) {
    if (!ctx.study.loadFlowConverged)
        return;
    for (const auto& p : ctx.drawing.parts()) {
        if (p.kind != PartKind::Motor && p.kind != PartKind::Load)
            continue;
        drops(ctx, p, out);
        if (p.kind == PartKind::Motor)
            motorRange(ctx, p, out);
        if (auto it = ctx.study.starts.find(p.id); it != ctx.study.starts.end())
            starting(ctx, p, it->second, out);
    }
}

} // namespace lineward
