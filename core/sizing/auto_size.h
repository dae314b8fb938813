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
    /// A drive row (sizeForDrive): the drive's rated output and input currents and the largest
    /// short-circuit device assumed for its listing; the conductor and device above follow them.
    std::optional<double> driveOutputA, driveInputA, driveMaxScpdA;
    /// A soft-starter row: the starter's rated current.
    std::optional<double> softStarterA;
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

/// A drive's rated input current assumed from its output current where only the motor is known:
/// 1.1 × (common practice, from memory: a six-pulse drive with a DC-link choke draws about
/// 100–110 % of its output current from the line at rated load). Enter the nameplate value.
inline constexpr double kAssumedDriveInputX = 1.1;

/// Turns a proposal into a drive bucket's: drive output current = the motor current (the larger
/// of table FLC and nameplate FLA, to 0.1 A up), input = kAssumedDriveInputX × output, the
/// conductor sized at 125 % of the input current (430.122(A); it also covers the output side's
/// 125 % FLC), the EGC per 250.122 with 250.122(B) against the 430.22 size, and the
/// short-circuit device no larger than the drive's assumed listing maximum
/// (kAssumedDriveScpdX × input, down to a standard rating) nor the 430.52 limit.
/// Returns the reason where no conductor carries the current.
std::optional<std::string> sizeForDrive(BucketProposal& p, const Part& motor, const SizeOptions& o,
                                        const Tables& t);
/// Turns a proposal into a soft-starter bucket's: the starter rated at the motor current (the
/// larger of table FLC and nameplate FLA), rounded up to a whole ampere; an instantaneous-only
/// breaker set just above the starter's default current limit instead of the across-the-line
/// inrush.
void sizeForSoftStarter(BucketProposal& p, const Part& motor, const Tables& t);

/// Proposes a bucket; returns the reason when it cannot (no FLC, no conductor large enough...).
std::optional<BucketProposal> proposeBucket(const Part& motor, const SizeOptions& o,
                                            const Tables& t, std::string& why);

} // namespace lineward
