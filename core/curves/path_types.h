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
    /// The highest current the part can interrupt: unlimited for breakers and fuses; for an
    /// overload relay, the breaking capability of the contactor it opens (it clears nothing
    /// above that; the short-circuit device must).
    double clearsUpToA = kNoTrip;
};

/// An AC-3 contactor breaks 8 × its rated operational current (IEC 60947-4-1 Table 7, for
/// Ie ≤ 100 A, from memory; used for every size, which is generous above 100 A where the table
/// asks less).
inline constexpr double kContactorBreakingX = 8.0;

/// A motor's starting current against time: (amps, seconds) corners of a step curve.
struct StartProfile {
    double asymA = 0, lockedRotorA = 0, runningA = 0, accelS = 0;
    static constexpr double kAsymS =
        0.1; ///< asymmetrical inrush lasts a few cycles (common practice)
    bool lraAssumed = false;
    /// Set where a drive or soft starter limits the start (asymA and lockedRotorA then hold
    /// the limited current): how it was found, for traces.
    std::string limitBasis;
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
