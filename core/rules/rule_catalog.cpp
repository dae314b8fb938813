// Rule catalogue look-ups; the rows are in rules/rule_table.h.
#include "rules/rule_catalog.h"

#include <array>
#include <stdexcept>
#include <string>

namespace lineward {

std::string_view severityName(Severity s) {
    switch (s) {
    case Severity::Violation:
        return "violation";
    case Severity::Caution:
        return "caution";
    case Severity::Note:
        return "note";
    }
    return "note";
}

std::optional<Severity> severityFromName(std::string_view s) {
    for (auto v : {Severity::Note, Severity::Caution, Severity::Violation})
        if (severityName(v) == s)
            return v;
    return std::nullopt;
}

std::span<const RuleInfo> ruleCatalog() {
    return catalog_data::kRules;
}

std::optional<RuleId> RuleId::find(std::string_view id) {
    for (std::size_t i = 0; i < catalog_data::kRules.size(); ++i)
        if (catalog_data::kRules[i].id == id)
            return RuleId(i);
    return std::nullopt;
}

Finding makeFinding(RuleId rule, std::vector<PartId> parts, std::string message) {
    const auto& info = rule.info();
    Finding f;
    f.ruleId = std::string(info.id);
    f.severity = info.severity;
    f.clause = std::string(info.clause);
    f.parts = std::move(parts);
    f.message = std::move(message);
    return f;
}

} // namespace lineward
