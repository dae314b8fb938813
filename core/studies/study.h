// Study results: fault currents and voltages at every node and part, computed once per check.
#pragma once

#include "studies/network_model.h"
#include "topology/flow.h"

#include <optional>
#include <unordered_map>
#include <vector>

namespace lineward {

/// Three-phase bolted fault at a solve bus.
struct FaultAtBus {
    double ikKa = 0;   ///< symmetrical r.m.s.
    double xOverR = 0; ///< of the Thevenin impedance at the fault
    double kappa = 0;  ///< IEC 60909-0: 1.02 + 0.98·e^(−3R/X)
    double peakKa = 0; ///< κ·√2·Ik
};

/// Steady state and motor starting at a solve bus or motor.
struct MotorStart {
    double busDipPct = 0;          ///< at the motor's bus
    double terminalPctOfRated = 0; ///< motor terminal voltage while starting, % of its rating
    double lockedRotorA = 0;
    bool lraAssumed = false; ///< 6 × FLC used (common practice) for want of data
    /// Set where a drive or soft starter limits the starting current (lockedRotorA then holds
    /// that current): how it was found.
    std::string limitBasis;
    int bus = -1; ///< solve bus of the motor's feeding bus
};

struct StudyResults {
    NetworkModel model;
    std::vector<FaultAtBus> fault; ///< by solve bus: maximum (duty) conditions
    /// Minimum fault current in kA by solve bus (c_min, conductors at their insulation
    /// rating, no motors); empty when it could not be solved.
    std::vector<double> minFaultKa;
    std::vector<Complex> voltage;        ///< steady state, per unit of nominal, by solve bus
    std::vector<double> originVoltagePu; ///< |V| at the bus's supplying transformer or source
    bool loadFlowConverged = false;
    /// False where the network's equations could not be solved (a singular admittance matrix):
    /// `fault` is then empty and the duty checks are not performed.
    bool faultSolved = true;
    std::unordered_map<PartId, MotorStart> starts;
    std::unordered_map<PartId, double> loadAmps; ///< steady-state current of each part
    std::vector<StudyIssue> issues; ///< what could not be computed, for the rules to report

    /// Solve bus of a network node, or −1.
    int busOf(NodeIndex n) const;
    const FaultAtBus* faultAtNode(NodeIndex n) const;
    /// Minimum fault current at a node in kA; nothing where it is unknown.
    std::optional<double> minFaultAtNode(NodeIndex n) const;
};

/// Runs the fault, load-flow and motor-starting studies.
StudyResults runStudies(const Network& net, const Flow& flow, const Tables& tables,
                        const Settings& s);

/// IEC 60909-0 peak factor κ = 1.02 + 0.98·e^(−3R/X).
double peakFactor(double xOverR);

} // namespace lineward
