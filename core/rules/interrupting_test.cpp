#include "rules/interrupting_test.h"

#include "model/ratings.h"
#include "util/trace.h"

#include <cmath>
#include <numbers>

namespace lineward {

namespace {

InterruptingTest make(double pfPct, bool peak, std::string standard) {
    const double pf = pfPct / 100.0;
    return {pfPct, std::sqrt(1.0 / (pf * pf) - 1.0), peak, std::move(standard)};
}

// Half-cycle peak and asymmetrical r.m.s. multiples of the symmetrical r.m.s. current
// (the usual closed forms; from memory, IEEE Std 1015).
double peakMultiple(double xr) {
    return 1.0 + std::exp(-std::numbers::pi / xr);
}
double rmsMultiple(double xr) {
    return std::sqrt(1.0 + 2.0 * std::exp(-2.0 * std::numbers::pi / xr));
}

} // namespace

std::optional<InterruptingTest> interruptingTest(const Part& d, double ratingKa) {
    // UL 489 test power factors by interrupting rating (from memory): 10 kA or less 45–50 %,
    // above 10 kA to 20 kA 25–30 %, above 20 kA 15–20 %; the upper end of each band is the
    // lower X/R and so the conservative one.
    auto moldedCase = [&](const std::string& what) {
        if (ratingKa <= 10.0)
            return make(50, true, what + " (UL 489), rated 10 kA or less");
        if (ratingKa <= 20.0)
            return make(30, true, what + " (UL 489), rated above 10 kA to 20 kA");
        return make(20, true, what + " (UL 489), rated above 20 kA");
    };
    switch (d.kind) {
    case PartKind::Breaker:
        switch (BreakerRatings::of(d).construction) {
        case BreakerConstruction::Power:
            return make(15, false, "low-voltage power breaker, unfused (IEEE C37.13)");
        case BreakerConstruction::PowerFused:
            return make(20, true, "low-voltage power breaker, fused (IEEE C37.13)");
        case BreakerConstruction::MoldedCase:
            return moldedCase("molded-case breaker");
        }
        return std::nullopt;
    case PartKind::InstBreaker:
        return moldedCase("instantaneous-only breaker");
    case PartKind::Fuse:
        return make(20, false, "fuse (UL 248)");
    default:
        return std::nullopt;
    }
}

double asymmetryFactor(const InterruptingTest& t, double systemXr) {
    if (!(systemXr > t.xOverR))
        return 1.0;
    return t.peakBasis ? peakMultiple(systemXr) / peakMultiple(t.xOverR)
                       : rmsMultiple(systemXr) / rmsMultiple(t.xOverR);
}

std::string asymmetryFactorText(const InterruptingTest& t, double systemXr) {
    const std::string sys = fmt(systemXr, 1), test = fmt(t.xOverR, 2);
    if (t.peakBasis)
        return "peak basis: (1 + e^(−π/" + sys + ")) / (1 + e^(−π/" + test +
               ")) = " + fmt(asymmetryFactor(t, systemXr), 3);
    return "asymmetrical r.m.s. basis: √(1 + 2e^(−2π/" + sys + ")) / √(1 + 2e^(−2π/" + test +
           ")) = " + fmt(asymmetryFactor(t, systemXr), 3);
}

} // namespace lineward
