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
    /// A variable-frequency drive or soft starter in series in the branch (the one nearest the
    /// motor where there are several); either replaces the across-the-line start.
    const Part* drive = nullptr;
    const Part* softStarter = nullptr;
    std::vector<const Part*> cables;
    /// The cables between the drive and the bus (its input conductors, NEC 430.122(A)); the
    /// other cables of a drive's branch are its output conductors.
    std::vector<const Part*> driveInputCables;
};

/// The drive or soft starter nearest the motor among a branch chain's parts (nearest the
/// motor first), or null: the motor starts across the line.
const Part* startingDevice(const Drawing& d, const std::vector<PartId>& chain);

/// The branch of every motor the network reaches, in the drawing's part order.
std::vector<MotorBranch> findMotorBranches(const Drawing& d, const Network& net);

} // namespace lineward
