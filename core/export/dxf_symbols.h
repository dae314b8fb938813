// The part symbols as plain geometry for the DXF export: the same strokes as
// resources/symbols/*.svg (which the Sheet paints), in the symbol's own frame of Sheet units
// (y down, centre at 0,0, terminals at 0,-20 and 0,20).
#pragma once

#include "model/part_kind.h"

#include <vector>

namespace lineward::dxf {

/// A point in a symbol's frame (Sheet units, y down).
struct SymbolPoint {
    double x = 0.0, y = 0.0;
};

/// One stroke of a symbol: a circle, or a polyline (a straight line has two points).
struct Stroke {
    std::vector<SymbolPoint> points; ///< polyline points; empty for a circle
    bool closed = false;
    SymbolPoint centre;  ///< circle centre
    double radius = 0.0; ///< circle radius; 0 for a polyline
    /// Drawn upright whatever the part's rotation, turned about `uprightCentre` (the motor's M).
    bool upright = false;
    SymbolPoint uprightCentre;
};

/// The strokes of a kind's symbol (the bus bar is drawn from its span, not from here).
const std::vector<Stroke>& symbolStrokes(PartKind kind);

} // namespace lineward::dxf
