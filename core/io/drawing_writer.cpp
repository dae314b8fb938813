// Writes the .lineward text: fixed key order, one part/wire/bucket per line.
#include "io/drawing_file.h"
#include "io/field_json.h"

#include <nlohmann/json.hpp>

namespace lineward::io {

namespace {

using ojson = nlohmann::ordered_json;

std::string endName(const Drawing& d, const WireEnd& e) {
    const Part* p = d.part(e.part);
    std::string term = "?";
    if (p && e.terminal >= 0 &&
        static_cast<std::size_t>(e.terminal) < kindInfo(p->kind).terminals.size())
        term = std::string(kindInfo(p->kind).terminals[e.terminal]);
    return std::to_string(e.part.value) + "." + term;
}

} // namespace

ojson partJson(const Part& p) {
    ojson j;
    j["id"] = p.id.value;
    j["kind"] = kindInfo(p.kind).key;
    j["tag"] = p.tag;
    j["x"] = fieldValueJson(p.x);
    j["y"] = fieldValueJson(p.y);
    j["rot"] = p.rotation;
    const auto& fields = kindInfo(p.kind).fields;
    for (std::size_t i = 0; i < fields.size() && i < p.values.size(); ++i)
        if (!std::holds_alternative<std::monostate>(p.values[i]))
            j[std::string(fields[i].key)] = fieldValueJson(p.values[i]);
    return j;
}

namespace {

ojson idList(const std::vector<PartId>& ids) {
    ojson a = ojson::array();
    for (auto id : ids)
        a.push_back(id.value);
    return a;
}

} // namespace

ojson sheetJson(const SheetInfo& s) {
    ojson j;
    j["title"] = s.title;
    j["project"] = s.project;
    j["drawing_no"] = s.drawingNo;
    j["drawn_by"] = s.drawnBy;
    j["checked_by"] = s.checkedBy;
    j["units"] = s.units == UnitSystem::SI ? "si" : "us";
    j["rule_set"] = s.ruleSet;
    return j;
}

ojson settingsJson(const Settings& s) {
    ojson j;
    j["vdrop_branch_pct"] = fieldValueJson(s.vdropBranchPct);
    j["vdrop_total_pct"] = fieldValueJson(s.vdropTotalPct);
    j["start_dip_pct"] = fieldValueJson(s.startDipPct);
    j["start_terminal_pct"] = fieldValueJson(s.startTerminalPct);
    j["coordination_margin_s"] = fieldValueJson(s.coordinationMarginS);
    j["ambient_c"] = fieldValueJson(s.ambientC);
    j["asymmetry_factor"] = fieldValueJson(s.asymmetryFactor);
    j["start_pf"] = fieldValueJson(s.startPf);
    j["motor_contribution_x"] = fieldValueJson(s.motorContributionX);
    j["fault_c_max"] = fieldValueJson(s.faultCMax);
    j["fault_conductor_c"] = fieldValueJson(s.faultConductorC);
    j["tx_z_tolerance_pct"] = fieldValueJson(s.txZTolerancePct);
    j["fault_c_min"] = fieldValueJson(s.faultCMin);
    // Written only where set, so that files made before these settings keep their bytes.
    const Settings defaults;
    if (s.arcFlashCautionCal != defaults.arcFlashCautionCal)
        j["arc_flash_caution_cal"] = fieldValueJson(s.arcFlashCautionCal);
    if (s.arcFlashMaxTimeS != defaults.arcFlashMaxTimeS)
        j["arc_flash_max_time_s"] = fieldValueJson(s.arcFlashMaxTimeS);
    if (!s.arcFlashFindings)
        j["arc_flash_findings"] = false;
    if (s.motorContribution == MotorContribution::Iec60909)
        j["motor_contribution_method"] = "iec60909";
    if (s.curveBands == CurveBands::ListingLimits)
        j["curve_bands"] = "listing_limits";
    return j;
}

namespace {

// Writes `"name": [` then one dumped item per line.
template <typename Range, typename ToJson>
void writeList(std::string& out, std::string_view name, const Range& items, ToJson toJson,
               bool last) {
    out += "  \"" + std::string(name) + "\": [";
    bool first = true;
    for (const auto& item : items) {
        out += first ? "\n    " : ",\n    ";
        out += toJson(item).dump();
        first = false;
    }
    out += first ? "]" : "\n  ]";
    out += last ? "\n" : ",\n";
}

} // namespace

std::string serializeDrawing(const Drawing& d) {
    std::string out = "{\n";
    out += "  \"format\": \"" + std::string(kFormatName) + "\",\n";
    out += "  \"version\": " + std::to_string(kFormatVersion) + ",\n";
    out += "  \"sheet\": " + sheetJson(d.sheet).dump() + ",\n";
    writeList(
        out, "revisions", d.sheet.revisions,
        [](const Revision& r) {
            ojson j;
            j["rev"] = r.rev;
            j["date"] = r.date;
            j["by"] = r.by;
            j["note"] = r.note;
            if (!r.file.empty()) // only where a Submittal kept the issued drawing
                j["file"] = r.file;
            return j;
        },
        false);
    out += "  \"settings\": " + settingsJson(d.settings).dump() + ",\n";
    writeList(out, "parts", d.parts(), partJson, false);
    writeList(
        out, "wires", d.wires(),
        [&](const Wire& w) {
            ojson j;
            j["id"] = w.id.value;
            j["from"] = endName(d, w.a);
            j["to"] = endName(d, w.b);
            return j;
        },
        false);
    writeList(
        out, "buckets", d.buckets(),
        [](const Bucket& b) {
            ojson j;
            j["id"] = b.id.value;
            j["tag"] = b.tag;
            if (b.sccrKa)
                j["sccr_ka"] = fieldValueJson(*b.sccrKa);
            j["parts"] = idList(b.parts);
            return j;
        },
        false);
    writeList(
        out, "accepted", d.accepted(),
        [](const Accepted& a) {
            ojson j;
            j["rule"] = a.rule;
            j["parts"] = idList(a.parts);
            j["by"] = a.by;
            j["date"] = a.date;
            j["note"] = a.note;
            return j;
        },
        d.comments().empty());
    // Written only when there are any, so a drawing without comments keeps the bytes it had
    // before comments existed.
    if (!d.comments().empty())
        writeList(
            out, "comments", d.comments(),
            [](const Comment& c) {
                ojson j;
                j["id"] = c.id;
                j["part"] = c.part.value;
                j["by"] = c.by;
                j["date"] = c.date;
                j["text"] = c.text;
                j["resolved"] = c.resolved;
                return j;
            },
            true);
    out += "}\n";
    return out;
}

nlohmann::ordered_json fieldValueJson(const FieldValue& v) {
    if (auto d = std::get_if<double>(&v)) {
        // Whole numbers are written without a fraction so files read naturally.
        if (*d == static_cast<double>(static_cast<long long>(*d)) && std::abs(*d) < 1e15)
            return static_cast<long long>(*d);
        return *d;
    }
    if (auto b = std::get_if<bool>(&v))
        return *b;
    if (auto s = std::get_if<std::string>(&v))
        return *s;
    return nullptr;
}

} // namespace lineward::io
