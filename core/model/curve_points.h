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

/// The physical span of a user's curve point (common practice: low-voltage time-current curves
/// are drawn from fractions of an ampere to a few hundred kA, and from about a quarter cycle
/// to a few hours).
inline constexpr double kMinCurveA = 0.01, kMaxCurveA = 1e6;
inline constexpr double kMinCurveS = 0.0005, kMaxCurveS = 1e5;

/// Parses "amps:min_s:max_s; ..." (currents rising, 0 < min ≤ max); the reason when refused.
std::optional<std::string> parseCurvePoints(const std::string& text, std::vector<CurvePoint>& out);

} // namespace lineward
