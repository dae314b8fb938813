// A user's own time-current curve for a protective part: points entered as text in a rating,
// validated where every rating is validated.
#pragma once

#include <optional>
#include <string>
#include <vector>

namespace lineward {

/// One point of a user-entered curve.
struct CurvePoint {
    double amps, minS, maxS;
};

/// Parses "amps:min_s:max_s; ..." (currents rising, 0 < min ≤ max); the reason when refused.
std::optional<std::string> parseCurvePoints(const std::string& text, std::vector<CurvePoint>& out);

} // namespace lineward
