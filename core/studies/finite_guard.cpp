// Finds non-finite study results, blanks them and says which could not be computed.
#include "studies/finite_guard.h"

#include <cmath>

namespace lineward {

namespace {

bool finite(Complex c) {
    return std::isfinite(c.real()) && std::isfinite(c.imag());
}

// A part at the solve bus, to name it by: one attached at one of its nodes, else one beside it.
std::optional<PartId> partAtBus(const StudyResults& r, const Network& net, std::size_t bus) {
    const auto& g = net.graph();
    for (std::size_t n = 0; n < r.model.busOfNode.size(); ++n) {
        if (r.model.busOfNode[n] != static_cast<int>(bus))
            continue;
        if (!g[n].attached.empty())
            return g[n].attached.front();
        for (auto [e, end] = boost::out_edges(n, g); e != end; ++e)
            return g[*e].part;
    }
    return std::nullopt;
}

std::string tagOf(const Drawing& d, PartId id) {
    const Part* p = d.part(id);
    return p && !p->tag.empty() ? p->tag : "#" + std::to_string(id.value);
}

void note(StudyResults& r, std::vector<PartId> parts, const std::string& what) {
    r.issues.push_back(
        {StudyIssueKind::NotFinite, std::move(parts),
         what + " could not be computed: the arithmetic left the range of numbers (an extreme "
                "rating, or a network that cannot carry its load); it is shown as unknown"});
}

} // namespace

void guardStudyResults(StudyResults& r, const Network& net) {
    const Drawing& d = net.drawing();
    for (std::size_t b = 0; b < r.fault.size(); ++b) {
        auto& f = r.fault[b];
        if (std::isfinite(f.ikKa) && std::isfinite(f.xOverR) && std::isfinite(f.kappa) &&
            std::isfinite(f.peakKa))
            continue;
        f = FaultAtBus{};
        const auto at = partAtBus(r, net, b);
        note(r, at ? std::vector{*at} : std::vector<PartId>{},
             "the fault current at " + (at ? tagOf(d, *at) : "a bus"));
    }
    for (std::size_t b = 0; b < r.minFaultKa.size(); ++b)
        if (!std::isfinite(r.minFaultKa[b])) {
            r.minFaultKa[b] = 0; // 0: unknown; no pickup check passes or fails on it
            const auto at = partAtBus(r, net, b);
            note(r, at ? std::vector{*at} : std::vector<PartId>{},
                 "the minimum fault current at " + (at ? tagOf(d, *at) : "a bus"));
        }
    bool voltageBad = false;
    for (std::size_t b = 0; b < r.voltage.size(); ++b)
        if (!finite(r.voltage[b])) {
            r.voltage[b] = Complex(1, 0);
            voltageBad = true;
        }
    for (auto& v : r.originVoltagePu)
        if (!std::isfinite(v)) {
            v = 1.0;
            voltageBad = true;
        }
    if (voltageBad) {
        r.loadFlowConverged = false;
        note(r, {}, "the steady-state voltage");
    }
    for (auto it = r.loadAmps.begin(); it != r.loadAmps.end();) {
        if (std::isfinite(it->second)) {
            ++it;
            continue;
        }
        note(r, {it->first}, "the running current of " + tagOf(d, it->first));
        it = r.loadAmps.erase(it);
    }
    for (auto it = r.starts.begin(); it != r.starts.end();) {
        const auto& s = it->second;
        if (std::isfinite(s.busDipPct) && std::isfinite(s.terminalPctOfRated) &&
            std::isfinite(s.lockedRotorA)) {
            ++it;
            continue;
        }
        note(r, {it->first}, "the starting voltage of " + tagOf(d, it->first));
        it = r.starts.erase(it);
    }
}

} // namespace lineward
