// The last step of the studies: no result is ever NaN or infinite. A value that could not be
// computed is removed and a study issue says what and why (the rules report it).
#pragma once

#include "studies/study.h"

#include <vector>

namespace lineward {

/// Replaces every non-finite study result (fault, voltage, current, start) with "unknown" and
/// adds a NotFinite study issue naming it. Voltages that are not finite also mark the load
/// flow as not settled, so voltage checks are skipped rather than judged on garbage.
void guardStudyResults(StudyResults& r, const Network& net);

} // namespace lineward
