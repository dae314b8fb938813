// The last step of the studies and of the check: no result is ever NaN or infinite. A value
// that could not be computed is removed and a finding says what and why.
#pragma once

#include "rules/finding.h"
#include "studies/study.h"

#include <vector>

namespace lineward {

/// Replaces every non-finite study result (fault, voltage, current, start) with "unknown" and
/// adds a `study.not_finite` note naming it. Voltages that are not finite also mark the load
/// flow as not settled, so voltage checks are skipped rather than judged on garbage.
void guardStudyResults(StudyResults& r, const Network& net);

/// Drops a finding's computed value or limit where it is not finite (there is no number to
/// show), keeping the finding and saying so in its trace.
void guardFindingNumbers(std::vector<Finding>& findings);

} // namespace lineward
