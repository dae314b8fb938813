// Curve sheets: the motors, then the paths the protection findings name, without repeats.
#include "report/curve_sheets.h"

#include <algorithm>
#include <array>
#include <unordered_map>
#include <unordered_set>

namespace lineward {

bool isProtectionRule(std::string_view id) {
    static constexpr std::array<std::string_view, 11> kRules = {
        "conductor.protection",    "transformer.protection", "branch.scpd.rating",
        "branch.scpd.low",         "branch.inst.setting",    "branch.inst.inrush",
        "branch.overload.setting", "branch.overload.low",    "feeder.device.rating",
        "duty.withstand",          "duty.withstand.assumed"};
    return id.starts_with("curve.") || std::find(kRules.begin(), kRules.end(), id) != kRules.end();
}

std::vector<PartId> curveSheetParts(const CheckResult& result) {
    // A part of a motor branch is plotted on its motor's sheet.
    std::unordered_map<PartId, PartId> motorOf;
    for (const auto& b : result.branches) {
        motorOf[b.motor->id] = b.motor->id;
        for (const Part* p : b.chain)
            motorOf.emplace(p->id, b.motor->id);
        for (const Part* p : {b.scpd, b.disconnect, b.contactor, b.overload})
            if (p)
                motorOf.emplace(p->id, b.motor->id);
        for (const Part* p : b.cables)
            motorOf.emplace(p->id, b.motor->id);
    }
    std::unordered_set<PartId> wanted;
    for (const auto& m : result.motors)
        wanted.insert(m.branch.motor->id);
    for (const auto& f : result.report.findings)
        if (!f.parts.empty() && isProtectionRule(f.ruleId)) {
            auto it = motorOf.find(f.parts.front());
            wanted.insert(it == motorOf.end() ? f.parts.front() : it->second);
        }
    std::vector<PartId> out;
    for (const auto& p : result.drawing->parts())
        if (wanted.count(p.id))
            out.push_back(p.id);
    return out;
}

} // namespace lineward
