// Parsing of user curve points ("amps:min_s:max_s; ...").
#include "model/curve_points.h"

#include <cmath>
#include <sstream>

namespace lineward {

std::optional<std::string> parseCurvePoints(const std::string& text, std::vector<CurvePoint>& out) {
    out.clear();
    std::stringstream all(text);
    std::string item;
    while (std::getline(all, item, ';')) {
        if (item.find_first_not_of(" \t") == std::string::npos)
            continue;
        CurvePoint p{};
        char c1 = 0, c2 = 0;
        std::stringstream one(item);
        if (!(one >> p.amps >> c1 >> p.minS >> c2 >> p.maxS) || c1 != ':' || c2 != ':' ||
            !(one >> std::ws).eof())
            return "curve point '" + item + "' is not amps:min_s:max_s";
        if (!(p.amps > 0) || !(p.minS > 0) || !(p.maxS >= p.minS) || !std::isfinite(p.maxS))
            return "curve point '" + item + "' needs amps > 0 and 0 < min_s ≤ max_s";
        if (p.amps < kMinCurveA || p.amps > kMaxCurveA)
            return "curve point '" + item + "': current outside 0.01 to 1000000 A (the span of a " +
                   "low-voltage time-current curve)";
        if (p.minS < kMinCurveS || p.maxS > kMaxCurveS)
            return "curve point '" + item + "': time outside 0.0005 to 100000 s (faster than a " +
                   "current-limiting fuse clears, or slower than any curve is drawn)";
        if (!out.empty() && p.amps <= out.back().amps)
            return "curve point currents must rise from point to point";
        out.push_back(p);
    }
    if (out.size() == 1)
        return "a curve needs at least two points";
    return std::nullopt;
}

} // namespace lineward
