// What a Curves plot shows for one part: the bands of the protective parts on its path, the
// motor's starting profile, the cable's damage curve and the fault current available there.
#pragma once

#include "model/drawing.h"
#include "model/ids.h"

#include <string>
#include <vector>

namespace lineward {

/// One curve on the plot, sampled at rising currents. Infinite times mean "no trip".
struct PlotSeries {
    enum class Kind { Band, StartProfile, DamageCurve, StallPoints };
    Kind kind = Kind::Band;
    std::string label;
    std::vector<double> amps, minS, maxS; ///< for profile and damage curves minS == maxS
};

/// Everything the renderer needs; built by the core so the plot computes nothing.
struct CurveSet {
    std::string title;
    std::vector<PlotSeries> series;
    double faultA = 0;             ///< available at the part (0: unknown)
    double minA = 0.5, maxA = 1e5; ///< current axis, whole decades
    double voltsBase = 0;          ///< currents are referred to this voltage
};

struct StudyView;
/// The curve set of a part's path, from the check result's view (many plots of one drawing
/// share one study); empty series when the part is not found or unfed.
CurveSet buildCurveSet(const StudyView& ctx, PartId part);

} // namespace lineward
