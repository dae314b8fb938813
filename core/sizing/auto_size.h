// A complete compliant motor bucket proposed from the motor and a chosen device type; used by
// `lineward-cli size`, Add bucket and Import load list.
#pragma once

#include "sizing/motor_sizing.h"

#include <map>

namespace lineward {

/// Everything a designer needs to build the bucket and its branch circuit.
struct BucketProposal {
    MotorFlc flc;
    double conductorMinA = 0;
    std::string conductorSize;
    double conductorAmpacityA = 0;
    int terminationC = 75;
    std::map<ScpdType, double> scpdMaxA; ///< largest permitted rating or setting per device type
    ScpdType device = ScpdType::InverseTimeBreaker;
    double deviceRatingA = 0;           ///< proposed rating, or instantaneous setting
    std::optional<double> overloadMaxA; ///< 430.32(A)(1), when the nameplate FLA is known
    double overloadSettingA = 0;        ///< proposed: the nameplate FLA (else the FLC)
    std::string tripClass;
    double disconnectMinA = 0;
    std::string nemaSize;
    std::string egcSize;
    std::vector<TraceStep> trace;
};

/// Installation choices for the proposal; absent values follow the code's defaults.
struct SizeOptions {
    ScpdType device = ScpdType::InverseTimeBreaker;
    Material material = Material::Cu;
    int insulationC = 90;
    std::optional<int> terminationC; ///< absent: 60 °C to 100 A, 75 °C above (110.14(C)(1))
    double ambientC = 30;
    int conductors = 3;
    double asymmetryFactor = 1.5;
};

/// Proposes a bucket; returns the reason when it cannot (no FLC, no conductor large enough...).
std::optional<BucketProposal> proposeBucket(const Part& motor, const SizeOptions& o,
                                            const Tables& t, std::string& why);

} // namespace lineward
