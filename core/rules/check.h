// The check engine: drawing → network → rules → findings, in one call.
#pragma once

#include "model/drawing.h"
#include "rules/finding.h"
#include "tables/tables.h"

#include <array>
#include <vector>

namespace lineward {

/// Everything one check of a drawing found.
struct CheckReport {
    std::vector<Finding> findings; ///< sorted: severity (worst first), first part, rule
    /// Open (not accepted) findings by severity: note, caution, violation.
    std::array<int, 3> openCounts{0, 0, 0};
    int acceptedCount = 0;
    /// True where an open finding is at or above `threshold`.
    bool hasOpenAtLeast(Severity threshold) const;
};

/// Runs every rule on the drawing. Pure: the same drawing gives the same report.
CheckReport checkDrawing(const Drawing& drawing, const Tables& tables);

} // namespace lineward
