// Rule catalogue. Add a row here, a row in docs/rules.md, and the check itself.
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

namespace {

constexpr std::array kRules{
    RuleInfo{"topology.unfed", "part fed by nothing", "common practice",
             Severity::Violation,
             "no path of parts and wires joins the part to a source, even with every device closed"},
    RuleInfo{"topology.deenergized", "part de-energized by an open device", "common practice",
             Severity::Note, "every path from a source to the part passes an open device"},
    RuleInfo{"topology.loop", "closed loop", "common practice", Severity::Note,
             "closed branches > nodes − components (a closed tie or parallel path); the "
             "studies solve it by nodal analysis"},
    RuleInfo{"topology.voltage.mismatch", "voltage mismatch", "NEMA MG 1-12.44; NEC 2023 110.3(B)",
             Severity::Violation,
             "motor: |V_system − V_rated| ≤ 10 % of V_rated; bus, load, transformer winding: "
             "|V_system − V_rated| ≤ 5 % of V_rated"},
    RuleInfo{"topology.motor.no_overload", "motor without overload protection",
             "NEC 2023 430.32", Severity::Violation,
             "an overload relay lies in the branch between the motor and its feeding bus"},
    RuleInfo{"topology.inst_breaker.no_overload",
             "instantaneous-only breaker without an overload relay in its bucket",
             "NEC 2023 430.52(C)(3)", Severity::Violation,
             "the bucket holding the instantaneous-only breaker also holds an overload relay"},
    RuleInfo{"drawing.tag.duplicate", "duplicate tag", "common practice", Severity::Caution,
             "no two parts share a tag"},
    RuleInfo{"topology.dangling", "unconnected terminal", "common practice", Severity::Caution,
             "every terminal of a part has at least one wire"},
};

} // namespace

std::span<const RuleInfo> ruleCatalog() { return kRules; }

const RuleInfo& ruleInfo(std::string_view id) {
    for (const auto& r : kRules)
        if (r.id == id)
            return r;
    throw std::out_of_range("unknown rule id " + std::string(id));
}

Finding makeFinding(std::string_view ruleId, std::vector<PartId> parts, std::string message) {
    const auto& info = ruleInfo(ruleId);
    Finding f;
    f.ruleId = std::string(info.id);
    f.severity = info.severity;
    f.clause = std::string(info.clause);
    f.parts = std::move(parts);
    f.message = std::move(message);
    return f;
}

} // namespace lineward
