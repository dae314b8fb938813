// What each arc-flash label says (NFPA 70E 2024 130.5(H); NEC 2023 110.16), one per bus and
// bucket, read from the one check result: the numbers are the study's, only put into words.
#pragma once

#include "check/check.h"

#include <optional>
#include <string>
#include <vector>

namespace lineward {

/// The caution every label carries.
inline constexpr const char* kArcFlashLabelCaution =
    "IEEE 1584-2018 model on the drawing's data. This study supports, and does not replace, a "
    "licensed engineer's arc-flash risk assessment and the local code. Verify before work.";

/// NEC 2023 110.16(B): what service equipment's label adds.
struct ServiceLabelData {
    double nominalV = 0;
    std::optional<double> availableFaultKa; ///< the bolted fault at the service equipment
    std::string deviceTag;                  ///< the service overcurrent device; empty: none
    std::optional<double> clearingS;        ///< its clearing time at the available fault
    std::string date;
};

/// One label's content.
struct ArcFlashLabel {
    PartId part;                    ///< the bus (a bucket's bus)
    std::optional<BucketId> bucket; ///< set for a bucket
    std::string tag;                ///< equipment tag (bucket tag for a bucket)
    std::string equipment;          ///< "Switchboard", "MCC bucket on MCC-1", ...
    double nominalV = 0;
    int phases = 3;
    bool computed = false; ///< false: outside the model; `notComputedWhy` says why
    std::string notComputedWhy;
    double energyCal = 0, energyJ = 0; ///< at the working distance, governing case
    double workingDistanceMm = 0, boundaryMm = 0;
    bool aboveLimit = false;    ///< above 40 cal/cm² (common practice: no energized work)
    std::string clearingTag;    ///< the device that clears the arc; empty: none found
    double arcingTimeS = 0;     ///< of the governing case
    bool timeCapped = false;    ///< the arcing time is the drawing's cap
    bool approachKnown = false; ///< a row of NFPA 70E Table 130.4(E)(a) covers the voltage
    std::string limitedMovable, limitedFixed, restricted;
    std::string date; ///< date of the assessment
    std::optional<ServiceLabelData> service;
};

/// One label per bus and bucket of the result's arc-flash study, in its order. `date` is the
/// date of the assessment (the caller's; the core keeps no clock).
std::vector<ArcFlashLabel> arcFlashLabels(const CheckResult& result, const std::string& date);

/// A length for a label: "1540 mm (5 ft 1 in)".
std::string labelLength(double mm);

} // namespace lineward
