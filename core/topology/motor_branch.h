// A motor's branch circuit: the parts from the motor back to its bus, found once per check from
// the network and read by the rules, the curves, the schedules and the Submittal.
#pragma once

#include "model/drawing.h"

#include <vector>

namespace lineward {

class Network;

/// The parts of one motor's branch circuit, found from the motor back to its bus.
struct MotorBranch {
    const Part* motor = nullptr;
    std::vector<const Part*> chain; ///< nearest the motor first
    const Part* scpd = nullptr;     ///< the protective part nearest the bus
    const Part* disconnect = nullptr;
    const Part* contactor = nullptr;
    const Part* overload = nullptr;
    std::vector<const Part*> cables;
};

/// The branch of every motor the network reaches, in the drawing's part order.
std::vector<MotorBranch> findMotorBranches(const Drawing& d, const Network& net);

} // namespace lineward
