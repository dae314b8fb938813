// Drawing rules: checks of the drawing as a document (tags) rather than of the circuit.
#pragma once

#include "model/drawing.h"
#include "rules/finding.h"

#include <vector>

namespace lineward {

/// Appends the findings of every drawing.* rule.
void checkDrawingRules(const Drawing& drawing, std::vector<Finding>& out);

} // namespace lineward
