// Synthetic plants of realistic MCC lineups for benchmarks and the editor's responsiveness test.
#pragma once

#include "model/drawing.h"

namespace lineward::bench {

/// Ties between the switchboards of neighbouring lineup pairs (1–2, 3–4, ...): none (the plain
/// radial plant), drawn but open, or closed (each closed tie makes one loop through the two
/// transformers, the tie breaker and the tie cable).
enum class Ties { None, Open, Closed };

/// Utility sources (one per ten lineups) feeding lineups: transformer, main breaker, switchboard,
/// feeder breaker and cable, MCC bus and `bucketsPerLineup` motor buckets (breaker, contactor,
/// overload, cable, motor). Lineups are added until the drawing has at least `parts` parts.
Drawing makePlant(int parts, int bucketsPerLineup = 12, Ties ties = Ties::None);

} // namespace lineward::bench
