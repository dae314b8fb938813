// Synthetic plants of realistic MCC lineups for benchmarks and the editor's responsiveness test.
#pragma once

#include "model/drawing.h"

namespace lineward::bench {

/// Utility sources (one per ten lineups) feeding lineups: transformer, main breaker, switchboard,
/// feeder breaker and cable, MCC bus and `bucketsPerLineup` motor buckets (breaker, contactor,
/// overload, cable, motor). Lineups are added until the drawing has at least `parts` parts.
Drawing makePlant(int parts, int bucketsPerLineup = 12);

} // namespace lineward::bench
