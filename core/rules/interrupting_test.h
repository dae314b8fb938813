// The test circuit behind a protective device's interrupting rating, and the factor by which a
// system X/R above the test circuit's X/R reduces what the rating is worth (asymmetry derating).
#pragma once

#include "model/part.h"

#include <optional>
#include <string>

namespace lineward {

/// How a rating was tested. Test power factors from memory (UL 489 for molded- and
/// insulated-case breakers by interrupting rating, IEEE C37.13 for low-voltage power breakers,
/// UL 248 for fuses), as IEEE Std 1015 tabulates them; the multiplying factors follow the
/// method of IEEE Std 1015 / IEEE Std 551 (from memory): a rating tested on peak current
/// (molded case, fused power breakers) scales with the half-cycle peak, one tested on
/// asymmetrical r.m.s. current (unfused power breakers, fuses) with the half-cycle r.m.s.
struct InterruptingTest {
    double powerFactorPct = 0;
    double xOverR = 0;     ///< of the test circuit, √(1/pf² − 1)
    bool peakBasis = true; ///< peak (true) or asymmetrical r.m.s. (false)
    std::string standard;  ///< "UL 489 molded case, rated above 20 kA"
};

/// The test circuit of a breaker, instantaneous-only breaker or fuse rated `ratingKa`; nothing
/// for other parts.
std::optional<InterruptingTest> interruptingTest(const Part& device, double ratingKa);

/// The factor (≥ 1) by which the available symmetrical current is multiplied before it is
/// compared with the rating: 1 where the system X/R is at or below the test X/R.
double asymmetryFactor(const InterruptingTest& test, double systemXr);

/// The same ratio's formula with its numbers, for a trace.
std::string asymmetryFactorText(const InterruptingTest& test, double systemXr);

} // namespace lineward
