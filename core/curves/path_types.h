// The light types of a path's curves (no network headers): a protective part with its band and
// a motor's starting profile. The check result holds them; path_curves.h computes them.
#pragma once

#include "curves/trip_curve.h"
#include "sizing/motor_sizing.h"
#include "topology/motor_branch.h"

#include <optional>

namespace lineward {

/// A protective part on a path with its band.
struct PathDevice {
    const Part* part = nullptr;
    TripCurve curve;
};

/// A motor's starting current against time: (amps, seconds) corners of a step curve.
struct StartProfile {
    double asymA = 0, lockedRotorA = 0, runningA = 0, accelS = 0;
    static constexpr double kAsymS =
        0.1; ///< asymmetrical inrush lasts a few cycles (common practice)
    bool lraAssumed = false;
};

/// What the check computed for one motor, once: its branch, full-load current (NEC Table
/// 430.250/430.248, no trace text) and starting profile. The rules, schedules and curves read
/// these instead of computing them again.
struct MotorFacts {
    MotorBranch branch;
    std::optional<MotorFlc> flc;
    std::optional<StartProfile> start;
};

} // namespace lineward
