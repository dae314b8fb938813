// The catalogue of every rule: id, clause, severity and formula. docs/rules.md mirrors it and a
// test keeps the two equal.
#pragma once

#include "rules/finding.h"

#include <span>
#include <string_view>

namespace lineward {

/// Fixed facts about one rule.
struct RuleInfo {
    std::string_view id;      ///< dotted id of our own, e.g. "topology.unfed"
    std::string_view title;   ///< short title shown in the Findings list
    std::string_view clause;  ///< code clause or source ("NEC 2023 430.32", "common practice")
    Severity severity;        ///< severity when the rule is broken
    std::string_view formula; ///< the test, in words or symbols
};

std::span<const RuleInfo> ruleCatalog();
/// The rule with this id; throws std::out_of_range for an unknown id.
const RuleInfo& ruleInfo(std::string_view id);

/// A finding pre-filled from the catalogue.
Finding makeFinding(std::string_view ruleId, std::vector<PartId> parts, std::string message);

} // namespace lineward
