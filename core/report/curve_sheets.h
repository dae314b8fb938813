// Which paths get a curve sheet in the Submittal: every motor branch, and every path that has a
// coordination or protection finding (feeders, mains and other branches too).
#pragma once

#include "check/check.h"

#include <string_view>
#include <vector>

namespace lineward {

/// True for a rule whose finding is read on a time-current plot: the curve.* rules and the
/// protective-device and conductor-protection rules.
bool isProtectionRule(std::string_view ruleId);

/// The parts whose paths get a curve sheet, each once, in drawing order: each motor, and for
/// each open or accepted protection finding, its part (a part of a motor branch stands for that
/// motor, whose sheet shows its whole branch).
std::vector<PartId> curveSheetParts(const CheckResult& result);

} // namespace lineward
