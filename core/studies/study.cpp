// Fault study (Thevenin impedance from Z = Y⁻¹ at each bus), load flow (fixed-point on the
// same solver of Y) and motor starting (superposition on the load-flow state).
#include "studies/study.h"

#include "model/ratings.h"
#include "sizing/motor_sizing.h"
#include "studies/admittance.h"
#include "studies/finite_guard.h"
#include "studies/loop_solver.h"
#include "topology/motor_branch.h"

#include <cmath>

namespace lineward {

double peakFactor(double xOverR) {
    if (xOverR <= 0)
        return 1.02; // purely resistive: no DC offset beyond the formula's floor
    return 1.02 + 0.98 * std::exp(-3.0 / xOverR);
}

int StudyResults::busOf(NodeIndex n) const {
    return n < model.busOfNode.size() ? model.busOfNode[n] : -1;
}

const FaultAtBus* StudyResults::faultAtNode(NodeIndex n) const {
    const int b = busOf(n);
    return b >= 0 && static_cast<std::size_t>(b) < fault.size()
               ? &fault[static_cast<std::size_t>(b)]
               : nullptr;
}

std::optional<double> StudyResults::minFaultAtNode(NodeIndex n) const {
    const int b = busOf(n);
    if (b < 0 || static_cast<std::size_t>(b) >= minFaultKa.size() ||
        !(minFaultKa[static_cast<std::size_t>(b)] > 0))
        return std::nullopt;
    return minFaultKa[static_cast<std::size_t>(b)];
}

namespace {

// Z entries from the loop solver (the tree solver corrected for each loop), or from the sparse
// LU when a tree carries too many loops for the dense correction.
struct ZSource {
    std::unique_ptr<LoopSolver> loops;
    std::unique_ptr<Admittance> lu;
    bool failed = false; ///< nothing factorised: the study cannot be solved

    ZSource(const NetworkModel& m, bool withMotors) {
        auto built = LoopSolver::build(m, withMotors);
        if (built.outcome == LoopSolver::Outcome::Solved) {
            loops = std::move(built.solver);
        } else if (built.outcome == LoopSolver::Outcome::Singular) {
            failed = true;
        } else {
            lu = std::make_unique<Admittance>(m, withMotors);
            failed = !lu->ok();
        }
    }
};

// The model for the maximum fault current: every branch at its maximum-fault impedance, each
// source's impedance c·U²/S (IEC 60909-0: the stated fault level holds at the source with a
// prefault voltage of c).
NetworkModel faultModel(const NetworkModel& m, double c, bool maximum) {
    NetworkModel f;
    f.busOfNode = m.busOfNode;
    f.baseV = m.baseV;
    f.nominalV = m.nominalV;
    f.branches = m.branches;
    for (auto& b : f.branches)
        b.z = maximum ? b.zMaxFault : b.zMinFault;
    f.sources = m.sources;
    for (auto& s : f.sources)
        s.z *= c;
    if (maximum)
        f.motors = m.motors;
    return f;
}

// The prefault voltage at a bus in per unit of its base (its no-load voltage through the
// transformers' ratios and taps): for the maximum fault the higher of that and the nominal
// voltage, for the minimum the lower, so a tap can only make either case more conservative.
double prefaultPu(const NetworkModel& m, int bus, bool maximum) {
    const double nominalOverBase =
        m.nominalV[static_cast<std::size_t>(bus)] / m.baseV[static_cast<std::size_t>(bus)];
    return maximum ? std::max(1.0, nominalOverBase) : std::min(1.0, nominalOverBase);
}

// The least current a bolted three-phase fault draws at each bus: what an instantaneous or
// short-time pickup must reach to clear quickly.
void minimumFaultStudy(StudyResults& r, const Settings& s) {
    const double c = s.faultCMin;
    const NetworkModel model = faultModel(r.model, c, false);
    const ZSource z(model, false);
    if (z.failed)
        return; // the maximum study has reported the matrix
    r.minFaultKa.resize(static_cast<std::size_t>(r.model.busCount()));
    for (int k = 0; k < r.model.busCount(); ++k) {
        const Complex zth = z.loops ? z.loops->zth(k) : z.lu->zColumn(k)[k];
        r.minFaultKa[static_cast<std::size_t>(k)] =
            c * prefaultPu(r.model, k, false) / std::abs(zth) * r.model.baseAmps(k) / 1000.0;
    }
}

void faultStudy(StudyResults& r, const Settings& s) {
    r.fault.assign(static_cast<std::size_t>(r.model.busCount()), {});
    const double c = s.faultCMax;
    const NetworkModel model = faultModel(r.model, c, true); // outlives the solver built on it
    const ZSource z(model, true);
    if (z.failed) {
        r.fault.clear(); // no fault current anywhere: no duty check may pass on a zero
        r.faultSolved = false;
        r.issues.push_back(
            {StudyIssueKind::FaultSolveFailed,
             {},
             "the short-circuit study could not be solved: the network's admittance matrix "
             "did not factorise (singular); no fault current is known, so the interrupting, "
             "bracing, SCCR and withstand checks were not performed"});
        return;
    }
    for (int k = 0; k < r.model.busCount(); ++k) {
        // The LU path costs one sparse solve per bus (quadratic); only heavily meshed
        // networks (more than LoopSolver::kMaxChordsPerTree loops in one tree) take it.
        const Complex zth = z.loops ? z.loops->zth(k) : z.lu->zColumn(k)[k];
        FaultAtBus f;
        f.ikKa = c * prefaultPu(r.model, k, true) / std::abs(zth) * r.model.baseAmps(k) / 1000.0;
        f.xOverR = zth.real() > 0 ? zth.imag() / zth.real() : 1e6;
        f.kappa = peakFactor(f.xOverR);
        f.peakKa = f.kappa * std::sqrt(2.0) * f.ikKa;
        r.fault[static_cast<std::size_t>(k)] = f;
    }
}

// The load flow's fixed-point iteration stops when no bus voltage moved by more than 1e-9 per
// unit in a step (a millionth of the hundredths of a percent the drop findings show); a
// radial low-voltage system settles in well under 20 steps, so 200 without settling means the
// loads exceed what the sources can deliver and the study says it diverged.
constexpr int kLoadFlowMaxIterations = 200;
constexpr double kLoadFlowTolerancePu = 1e-9;

Eigen::VectorXcd loadCurrents(const NetworkModel& m, const Eigen::VectorXcd& v) {
    Eigen::VectorXcd i = Eigen::VectorXcd::Zero(m.busCount());
    for (const auto& l : m.loads)
        i[l.bus] += std::conj(l.s / v[l.bus]);
    return i;
}

// Solves Y v = i with the loop solver (linear), else the sparse LU.
struct LoadFlowSolver {
    const ZSource& z;
    Eigen::VectorXcd solve(const Eigen::VectorXcd& b) const {
        if (!z.loops)
            return z.lu->solve(b);
        const std::vector<Complex> in(b.data(), b.data() + b.size());
        const auto out = z.loops->solve(in);
        return Eigen::Map<const Eigen::VectorXcd>(out.data(),
                                                  static_cast<Eigen::Index>(out.size()));
    }
};

void loadFlow(StudyResults& r, const LoadFlowSolver& y) {
    const auto& m = r.model;
    const int n = m.busCount();
    Eigen::VectorXcd src = Eigen::VectorXcd::Zero(n);
    for (const auto& s : m.sources)
        src[s.bus] += 1.0 / s.z; // EMF of 1 per unit behind the source impedance
    Eigen::VectorXcd v = Eigen::VectorXcd::Constant(n, Complex(1, 0));
    for (int it = 0; it < kLoadFlowMaxIterations; ++it) {
        const Eigen::VectorXcd next = y.solve(src - loadCurrents(m, v));
        const double change = (next - v).cwiseAbs().maxCoeff();
        v = next;
        if (change < kLoadFlowTolerancePu) {
            r.loadFlowConverged = true;
            break;
        }
    }
    r.voltage.assign(v.data(), v.data() + n);
}

// The load flow solves on each bus's base (its no-load voltage); every voltage the checks and
// reports read is in per unit of the bus's nominal voltage.
void toNominal(StudyResults& r) {
    for (std::size_t b = 0; b < r.voltage.size(); ++b)
        r.voltage[b] *= r.model.baseV[b] / r.model.nominalV[b];
}

void originVoltages(StudyResults& r, const Network& net, const Flow& flow) {
    // The node each node's voltage comes from (the node fed by a transformer, or the source
    // node), passed down the supply tree in one pass.
    const Drawing& d = net.drawing();
    std::vector<NodeIndex> origin(net.nodeCount());
    for (std::size_t node = 0; node < origin.size(); ++node)
        origin[node] = node;
    for (auto v : flow.topDown()) {
        auto feed = flow.feedingBranch(v);
        if (feed && d.part(*feed)->kind != PartKind::Transformer)
            origin[v] = origin[*flow.parentNode(v)];
    }
    r.originVoltagePu.assign(static_cast<std::size_t>(r.model.busCount()), 1.0);
    for (std::size_t node = 0; node < net.nodeCount(); ++node) {
        const int bus = r.model.busOfNode[node];
        if (bus < 0)
            continue;
        const int ob = r.model.busOfNode[origin[node]];
        r.originVoltagePu[static_cast<std::size_t>(bus)] =
            ob >= 0 ? std::abs(r.voltage[static_cast<std::size_t>(ob)]) : 1.0;
    }
}

// Current of every load at each node plus everything the node feeds: summed bottom up in one
// pass over the supply tree.
std::vector<Complex> currentsBelow(const StudyResults& r, const Network& net, const Flow& flow) {
    std::vector<Complex> below(net.nodeCount(), Complex(0, 0));
    for (const auto& l : r.model.loads)
        below[net.nodeOf(l.part, 0)] += std::conj(l.s / r.voltage[static_cast<std::size_t>(l.bus)]);
    const auto& order = flow.topDown();
    for (auto it = order.rbegin(); it != order.rend(); ++it)
        if (auto parent = flow.parentNode(*it))
            below[*parent] += below[*it];
    return below;
}

void partCurrents(StudyResults& r, const Network& net, const Flow& flow) {
    const Drawing& d = net.drawing();
    std::unordered_map<PartId, Complex> own;
    for (const auto& l : r.model.loads)
        own[l.part] = std::conj(l.s / r.voltage[static_cast<std::size_t>(l.bus)]);
    const auto below = currentsBelow(r, net, flow);
    for (const auto& p : d.parts()) {
        const NodeIndex at = isTwoTerminal(p.kind) ? flow.lineNode(p.id) : net.nodeOf(p.id, 0);
        const int bus = r.busOf(at);
        if (bus < 0)
            continue;
        Complex i = 0;
        if (isTwoTerminal(p.kind)) {
            if (p.isOpen())
                continue;
            i = below[flow.loadNode(p.id)];
        } else if (auto it = own.find(p.id); it != own.end()) {
            i = it->second;
        } else if (p.kind == PartKind::Bus) {
            i = below[at];
        } else {
            continue;
        }
        r.loadAmps[p.id] = std::abs(i) * r.model.baseAmps(bus);
    }
}

void motorStarting(StudyResults& r, const Network& net, const Flow& flow, const ZSource& z,
                   const Tables& t, const Settings& s) {
    const Drawing& d = net.drawing();
    for (const auto& l : r.model.loads) {
        const Part& p = *d.part(l.part);
        if (p.kind != PartKind::Motor)
            continue;
        MotorStart ms;
        auto chain = net.branchChain(p.id);
        // A drive or soft starter in the branch limits the current drawn while starting.
        const auto lr = startingCurrent(p, startingDevice(d, chain), t);
        if (!lr)
            continue; // no current to start with: the motor's own findings say what is missing
        ms.lraAssumed = lr->assumed;
        ms.lockedRotorA = lr->amps;
        if (lr->limited)
            ms.limitBasis = lr->basis;
        const int m = l.bus;
        const double vb = r.model.baseV[static_cast<std::size_t>(m)];
        const double rated = MotorRatings::of(p).volts;
        const double zOhm = rated / std::sqrt(3.0) / lr->amps;
        const Complex zlr = std::polar(zOhm / (vb * vb / (kBaseMva * 1e6)), std::acos(s.startPf));
        const NodeIndex busNode = chain.empty() ? net.nodeOf(p.id, 0) : flow.lineNode(chain.back());
        ms.bus = r.busOf(busNode);
        // Driving-point and transfer impedances: from the loop solver, else a Z column.
        std::optional<Complex> zth, zbm;
        if (z.loops) {
            zth = z.loops->zth(m);
            if (ms.bus >= 0)
                zbm = z.loops->transfer(m, ms.bus);
        } else {
            const Eigen::VectorXcd zcol = z.lu->zColumn(m);
            zth = zcol[m];
            if (ms.bus >= 0)
                zbm = zcol[ms.bus];
        }
        const Complex iRun = std::conj(l.s / r.voltage[static_cast<std::size_t>(m)]);
        const Complex vOpen = r.voltage[static_cast<std::size_t>(m)] + *zth * iRun;
        const Complex iStart = vOpen / (zlr + *zth);
        const Complex vTerm = vOpen - *zth * iStart;
        ms.terminalPctOfRated = std::abs(vTerm) * vb / rated * 100.0;
        if (ms.bus >= 0) {
            // The dip is measured from the bus voltage just before the start: the other loads
            // running, this motor not yet (its running current taken out of the load flow's
            // state), to the voltage while it is at locked rotor.
            const Complex before = r.voltage[static_cast<std::size_t>(ms.bus)] + *zbm * iRun;
            const Complex during = before - *zbm * iStart;
            ms.busDipPct = (std::abs(before) - std::abs(during)) / std::abs(before) * 100.0;
        }
        r.starts[p.id] = ms;
    }
}

} // namespace

StudyResults runStudies(const Network& net, const Flow& flow, const Tables& t, const Settings& s) {
    StudyResults r;
    r.model = buildNetworkModel(net, t, s);
    r.issues = r.model.issues;
    if (r.model.busCount() == 0)
        return r;
    faultStudy(r, s);
    if (r.faultSolved)
        minimumFaultStudy(r, s);
    // The load flow and starting use Y without motor shunts.
    const ZSource z(r.model, false);
    if (z.failed) {
        r.issues.push_back(
            {StudyIssueKind::LoadFlowSolveFailed,
             {},
             "the load flow could not be solved: the network's admittance matrix did not "
             "factorise (singular); the voltage-drop and motor-starting checks were not "
             "performed"});
        guardStudyResults(r, net);
        return r;
    }
    loadFlow(r, LoadFlowSolver{z});
    if (!r.loadFlowConverged) {
        r.issues.push_back({StudyIssueKind::LoadFlowDiverged,
                            {},
                            "the load flow did not settle: the network cannot carry its loads at a "
                            "usable voltage (look for long, small feeders); voltage checks are "
                            "skipped"});
    }
    partCurrents(r, net, flow);
    motorStarting(r, net, flow, z, t, s);
    toNominal(r);
    originVoltages(r, net, flow);
    guardStudyResults(r, net);
    return r;
}

} // namespace lineward
