// The catalogue of every rule: id, clause, severity and formula. docs/rules.md mirrors it and a
// test keeps the two equal.
#pragma once

#include "rules/rule_table.h"

#include <optional>
#include <span>
#include <string_view>

namespace lineward {

/// A rule of the catalogue, named by its id. Made from a string literal it is checked while
/// compiling: `makeFinding("topology.unfed", ...)` with a misspelt id does not build.
class RuleId {
public:
    consteval RuleId(const char* id) : m_index(indexOf(id)) {}
    /// The rule with this id when the id comes from outside (a file, a command line).
    static std::optional<RuleId> find(std::string_view id);
    const RuleInfo& info() const { return catalog_data::kRules[m_index]; }
    std::string_view id() const { return info().id; }
    friend bool operator==(RuleId, RuleId) = default;

private:
    explicit constexpr RuleId(std::size_t index) : m_index(index) {}
    static consteval std::size_t indexOf(std::string_view id) {
        for (std::size_t i = 0; i < catalog_data::kRules.size(); ++i)
            if (catalog_data::kRules[i].id == id)
                return i;
        throw "unknown rule id: add it to core/rules/rule_table.h"; // a compile error here
    }
    std::size_t m_index;
};

std::span<const RuleInfo> ruleCatalog();

/// A finding pre-filled from the catalogue.
Finding makeFinding(RuleId rule, std::vector<PartId> parts, std::string message);

} // namespace lineward
