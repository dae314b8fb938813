// The one Curves renderer: a log-log time-current plot drawn with QPainter, used by the Curves
// panel, the Submittal and `lineward-cli curves`.
#pragma once

#include "curves/curve_set.h"

#include <QRectF>

class QPainter;

namespace lineward::ui {

/// Draws the plot into `area`: decades and minor lines, shaded bands, the starting profile,
/// the damage curve, the available fault current and a legend beside the plot, with axis
/// titles. `textPt`: the smallest text size (the Submittal's readable minimum); 0: the panel's.
void paintCurves(QPainter& p, const QRectF& area, const CurveSet& set, double textPt = 0);

/// Writes the plot to a file chosen by its extension (.svg, .png or .pdf); the reason on failure.
QString saveCurves(const CurveSet& set, const QString& path);

} // namespace lineward::ui
