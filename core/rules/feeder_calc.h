// Feeder load by NEC 430.24 and 215.2(A)(1), and the 430.62(A) feeder device limit.
#pragma once

#include "rules/rule_context.h"

#include <unordered_map>

namespace lineward {

/// The loads a feeder, bus or transformer carries, summed the way the code sums them.
struct FeederLoad {
    double largestFlc = 0;
    PartId largestMotor;
    double otherFlc = 0; ///< every other motor's FLC
    double continuousA = 0, nonContinuousA = 0;
    int motors = 0, loads = 0;
    /// 1.25 × largest FLC + other FLC + 1.25 × continuous + non-continuous
    double required() const {
        return 1.25 * largestFlc + otherFlc + 1.25 * continuousA + nonContinuousA;
    }
    /// Plain sum of the running currents (for transformer loading).
    double running() const { return largestFlc + otherFlc + continuousA + nonContinuousA; }
    std::vector<TraceStep> trace(const RuleContext& ctx) const;
};

/// Per-motor values the feeder rules sum (named apart from the check result's MotorFacts).
struct FeederMotor {
    double flc = 0;
    const Part* scpd = nullptr;
};
using FeederMotorMap = std::unordered_map<PartId, FeederMotor>;
FeederMotorMap feederMotors(const RuleContext& ctx);

FeederLoad feederLoad(const RuleContext& ctx, const FeederMotorMap& motors, NodeIndex from);

/// 430.62(A) (with 430.63 for other loads): largest branch device + other motors' FLC + other
/// loads, rounded down to a standard rating. Instantaneous breakers count at the Table 430.52
/// percentage for the feeder device's type.
struct FeederDeviceLimit {
    double rawA = 0, maxA = 0;
    std::vector<TraceStep> trace;
};
FeederDeviceLimit feederDeviceLimit(const RuleContext& ctx, const FeederMotorMap& motors,
                                    NodeIndex from, ScpdType feederType);

} // namespace lineward
