// Reads the .lineward text: every value is type- and range-checked, every error located.
#include "io/drawing_file.h"
#include "io/json_checks.h"
#include "io/located_json.h"

#include <cmath>
#include <fstream>
#include <set>
#include <sstream>
#include <unordered_set>

namespace lineward::io {

std::string LoadError::text() const {
    std::ostringstream s;
    s << file;
    if (line > 0)
        s << ":" << line << ":" << column;
    s << ": " << message;
    return s.str();
}

namespace {

class Reader : JsonChecks {
public:
    Reader(const LocatedJson& doc, const FileLimits& limits) : JsonChecks(limits), m_doc(doc) {}

    Drawing read() {
        const json& root = m_doc.root;
        if (!root.is_object())
            throw Failure{"", "expected an object at the top of the file, found " +
                                  std::string(typeName(root))};
        checkKeys(root, "",
                  {"format", "version", "sheet", "revisions", "settings", "parts", "wires",
                   "buckets", "accepted", "comments"});
        if (!root.contains("format") || text(root.at("format"), "/format") != kFormatName)
            throw Failure{"/format", "expected \"format\": \"lineward\" (is this a Lineward "
                                     "drawing?)"};
        if (!root.contains("version"))
            throw Failure{"", "missing \"version\""};
        const double version = number(root.at("version"), "/version");
        if (version != kFormatVersion)
            throw Failure{"/version", "file format version " + formatNumber(version) +
                                          " is not supported; this program reads version " +
                                          std::to_string(kFormatVersion)};
        Drawing d;
        if (root.contains("sheet"))
            readSheet(root.at("sheet"), d.sheet);
        if (root.contains("revisions"))
            readRevisions(root.at("revisions"), d.sheet);
        if (root.contains("settings"))
            readSettings(root.at("settings"), d.settings);
        if (root.contains("parts"))
            readParts(root.at("parts"), d);
        if (root.contains("wires"))
            readWires(root.at("wires"), d);
        if (root.contains("buckets"))
            readBuckets(root.at("buckets"), d);
        if (root.contains("accepted"))
            readAccepted(root.at("accepted"), d);
        if (root.contains("comments"))
            readComments(root.at("comments"), d);
        return d;
    }

private:
    void readSheet(const json& j, SheetInfo& s) {
        object(j, "/sheet");
        checkKeys(
            j, "/sheet",
            {"title", "project", "drawing_no", "drawn_by", "checked_by", "units", "rule_set"});
        s.title = optText(j, "/sheet", "title");
        s.project = optText(j, "/sheet", "project");
        s.drawingNo = optText(j, "/sheet", "drawing_no");
        s.drawnBy = optText(j, "/sheet", "drawn_by");
        s.checkedBy = optText(j, "/sheet", "checked_by");
        if (j.contains("units")) {
            auto u = text(j.at("units"), "/sheet/units");
            if (u != "us" && u != "si")
                throw Failure{"/sheet/units",
                              "units must be \"us\" or \"si\", found \"" + cut(u) + "\""};
            s.units = u == "si" ? UnitSystem::SI : UnitSystem::US;
        }
        if (j.contains("rule_set")) {
            s.ruleSet = text(j.at("rule_set"), "/sheet/rule_set");
            if (s.ruleSet != "NEC 2023")
                throw Failure{"/sheet/rule_set", "rule set \"" + cut(s.ruleSet) +
                                                     "\" is not available; use \"NEC 2023\""};
        }
    }

    void readRevisions(const json& j, SheetInfo& s) {
        list(j, "/revisions", m_limits.maxListItems);
        for (std::size_t i = 0; i < j.size(); ++i) {
            const std::string ptr = "/revisions/" + std::to_string(i);
            object(j[i], ptr);
            checkKeys(j[i], ptr, {"rev", "date", "by", "note", "file"});
            s.revisions.push_back({optText(j[i], ptr, "rev"), optText(j[i], ptr, "date"),
                                   optText(j[i], ptr, "by"), optText(j[i], ptr, "note"),
                                   optText(j[i], ptr, "file")});
        }
    }

    void setting(const json& j, const char* key, double& out, double lo, double hi) {
        if (!j.contains(key))
            return;
        const std::string ptr = std::string("/settings/") + key;
        const double v = number(j.at(key), ptr);
        if (v < lo || v > hi)
            throw Failure{ptr, std::string(key) + " " + formatNumber(v) + " is outside " +
                                   formatNumber(lo) + " to " + formatNumber(hi)};
        out = v;
    }

    void readSettings(const json& j, Settings& s) {
        object(j, "/settings");
        checkKeys(j, "/settings",
                  {"vdrop_branch_pct", "vdrop_total_pct", "start_dip_pct", "start_terminal_pct",
                   "coordination_margin_s", "ambient_c", "asymmetry_factor", "start_pf",
                   "motor_contribution_x", "fault_c_max", "fault_conductor_c", "tx_z_tolerance_pct",
                   "fault_c_min", "arc_flash_caution_cal", "arc_flash_max_time_s",
                   "arc_flash_findings", "motor_contribution_method", "curve_bands"});
        setting(j, "vdrop_branch_pct", s.vdropBranchPct, 0.1, 50);
        setting(j, "vdrop_total_pct", s.vdropTotalPct, 0.1, 50);
        setting(j, "start_dip_pct", s.startDipPct, 1, 90);
        setting(j, "start_terminal_pct", s.startTerminalPct, 10, 100);
        setting(j, "coordination_margin_s", s.coordinationMarginS, 0, 10);
        setting(j, "ambient_c", s.ambientC, -40, 90);
        setting(j, "asymmetry_factor", s.asymmetryFactor, 1, 3);
        setting(j, "start_pf", s.startPf, 0.05, 1);
        setting(j, "motor_contribution_x", s.motorContributionX, 0, 20);
        setting(j, "fault_c_max", s.faultCMax, 0.9, 1.2);
        setting(j, "fault_conductor_c", s.faultConductorC, -40, 250);
        setting(j, "tx_z_tolerance_pct", s.txZTolerancePct, 0, 20);
        setting(j, "fault_c_min", s.faultCMin, 0.8, 1.1);
        setting(j, "arc_flash_caution_cal", s.arcFlashCautionCal, 1.2, 100);
        setting(j, "arc_flash_max_time_s", s.arcFlashMaxTimeS, 0.01, 10);
        if (j.contains("arc_flash_findings")) {
            if (!j.at("arc_flash_findings").is_boolean())
                throw Failure{"/settings/arc_flash_findings",
                              "arc_flash_findings must be true or false"};
            s.arcFlashFindings = j.at("arc_flash_findings").get<bool>();
        }
        if (j.contains("motor_contribution_method")) {
            const auto v =
                text(j.at("motor_contribution_method"), "/settings/motor_contribution_method");
            if (v != "multiple" && v != "iec60909")
                throw Failure{"/settings/motor_contribution_method",
                              "motor_contribution_method must be \"multiple\" or \"iec60909\", "
                              "found \"" +
                                  cut(v) + "\""};
            s.motorContribution =
                v == "iec60909" ? MotorContribution::Iec60909 : MotorContribution::Multiple;
        }
        if (j.contains("curve_bands")) {
            const auto v = text(j.at("curve_bands"), "/settings/curve_bands");
            if (v != "typical" && v != "listing_limits")
                throw Failure{"/settings/curve_bands",
                              "curve_bands must be \"typical\" or \"listing_limits\", found \"" +
                                  cut(v) + "\""};
            s.curveBands = v == "listing_limits" ? CurveBands::ListingLimits : CurveBands::Typical;
        }
    }

    FieldValue fieldValue(const FieldSpec& spec, const json& j, const std::string& ptr) {
        switch (spec.type) {
        case FieldType::Number:
        case FieldType::Integer:
            return number(j, ptr);
        case FieldType::Flag:
            if (!j.is_boolean())
                throw Failure{ptr, "expected true or false, found " + std::string(typeName(j))};
            return j.get<bool>();
        case FieldType::Choice:
        case FieldType::Text:
            return text(j, ptr);
        }
        return {};
    }

    Part readPart(const json& j, const std::string& ptr) {
        object(j, ptr);
        if (!j.contains("kind"))
            throw Failure{ptr, "part has no \"kind\""};
        const std::string key = text(j.at("kind"), ptr + "/kind");
        auto kind = kindFromKey(key);
        if (!kind)
            throw Failure{ptr + "/kind", "unknown part kind '" + cut(key) + "'"};
        if (!j.contains("id"))
            throw Failure{ptr, "part has no \"id\""};
        Part p = Part::make(*kind, PartId(idValue(j.at("id"), ptr + "/id")), "");
        for (auto& v : p.values)
            v = {}; // a value absent from the file takes its default below, not twice
        const auto& fields = kindInfo(*kind).fields;
        for (const auto& [k, v] : j.items()) {
            const std::string fptr = ptr + "/" + pointerToken(k);
            if (k == "id" || k == "kind")
                continue;
            if (k == "tag")
                p.tag = text(v, fptr);
            else if (k == "x")
                p.x = number(v, fptr);
            else if (k == "y")
                p.y = number(v, fptr);
            else if (k == "rot") {
                const double r = number(v, fptr);
                if (r != 0 && r != 90 && r != 180 && r != 270)
                    throw Failure{fptr, "rot must be 0, 90, 180 or 270, found " + formatNumber(r)};
                p.rotation = static_cast<int>(r);
            } else if (auto idx = fieldIndex(*kind, k)) {
                p.values[*idx] = fieldValue(fields[*idx], v, fptr);
                if (auto why = validateField(fields[*idx], p.values[*idx]))
                    throw Failure{fptr, partName(p) + ": " + *why};
            } else {
                throw Failure{fptr, std::string(kindInfo(*kind).name) + " has no rating '" +
                                        cut(k) + "'"};
            }
        }
        for (std::size_t i = 0; i < fields.size(); ++i)
            if (std::holds_alternative<std::monostate>(p.values[i]))
                p.values[i] = fields[i].defaultValue;
        if (std::abs(p.x) > 1e7 || std::abs(p.y) > 1e7)
            throw Failure{ptr, partName(p) + ": position is off the Sheet"};
        if (auto problems = validatePart(p); !problems.empty())
            throw Failure{ptr, partName(p) + ": " + problems.front()};
        return p;
    }

    static std::string partName(const Part& p) {
        return std::string(kindInfo(p.kind).key) + " " + std::to_string(p.id.value) +
               (p.tag.empty() ? "" : " (" + cut(p.tag) + ")");
    }

    void readParts(const json& j, Drawing& d) {
        list(j, "/parts", m_limits.maxParts);
        // Collected, then added with one sort: loading costs the same in any id order.
        std::vector<Part> parts;
        parts.reserve(j.size());
        std::unordered_set<std::uint32_t> ids;
        for (std::size_t i = 0; i < j.size(); ++i) {
            const std::string ptr = "/parts/" + std::to_string(i);
            Part p = readPart(j[i], ptr);
            if (!ids.insert(p.id.value).second)
                throw Failure{ptr + "/id", "duplicate part id " + std::to_string(p.id.value)};
            parts.push_back(std::move(p));
        }
        d.addParts(std::move(parts));
    }

    WireEnd wireEnd(const Drawing& d, const json& j, const std::string& ptr) {
        const std::string s = text(j, ptr);
        const auto dot = s.find('.');
        if (dot == std::string::npos || dot == 0)
            throw Failure{ptr, "expected \"<part id>.<terminal>\", found \"" + cut(s) + "\""};
        std::uint32_t id = 0;
        for (char c : s.substr(0, dot)) {
            if (c < '0' || c > '9' || id > 400000000u)
                throw Failure{ptr, "expected a part id before '.', found \"" + cut(s) + "\""};
            id = id * 10 + static_cast<std::uint32_t>(c - '0');
        }
        const Part* p = d.part(PartId(id));
        if (!p)
            throw Failure{ptr,
                          "wire end names part " + std::to_string(id) + ", which does not exist"};
        const auto term = s.substr(dot + 1);
        const auto& terms = kindInfo(p->kind).terminals;
        for (std::size_t t = 0; t < terms.size(); ++t)
            if (terms[t] == term)
                return {p->id, static_cast<int>(t)};
        std::string names;
        for (auto t : terms)
            names += (names.empty() ? "" : ", ") + std::string(t);
        throw Failure{ptr, std::string(kindInfo(p->kind).name) + " " + cut(p->tag) +
                               " has no terminal '" + cut(term) + "' (it has: " + names + ")"};
    }

    void readWires(const json& j, Drawing& d) {
        list(j, "/wires", m_limits.maxWires);
        std::vector<Wire> wires;
        wires.reserve(j.size());
        std::unordered_set<std::uint32_t> ids;
        for (std::size_t i = 0; i < j.size(); ++i) {
            const std::string ptr = "/wires/" + std::to_string(i);
            object(j[i], ptr);
            checkKeys(j[i], ptr, {"id", "from", "to"});
            for (const char* k : {"id", "from", "to"})
                if (!j[i].contains(k))
                    throw Failure{ptr, std::string("wire has no \"") + k + "\""};
            Wire w{WireId(idValue(j[i].at("id"), ptr + "/id")),
                   wireEnd(d, j[i].at("from"), ptr + "/from"),
                   wireEnd(d, j[i].at("to"), ptr + "/to")};
            if (!ids.insert(w.id.value).second)
                throw Failure{ptr + "/id", "duplicate wire id " + std::to_string(w.id.value)};
            if (w.a == w.b)
                throw Failure{ptr, "wire joins a terminal to itself"};
            wires.push_back(w);
        }
        d.addWires(std::move(wires));
    }

    std::vector<PartId> partIds(const Drawing& d, const json& j, const std::string& ptr) {
        list(j, ptr, m_limits.maxListItems);
        std::vector<PartId> ids;
        std::set<std::uint32_t> seen;
        for (std::size_t i = 0; i < j.size(); ++i) {
            const std::string eptr = ptr + "/" + std::to_string(i);
            auto id = idValue(j[i], eptr);
            if (!d.part(PartId(id)))
                throw Failure{eptr, "part " + std::to_string(id) + " does not exist"};
            if (!seen.insert(id).second)
                throw Failure{eptr, "part " + std::to_string(id) + " is listed twice"};
            ids.push_back(PartId(id));
        }
        return ids;
    }

    void readBuckets(const json& j, Drawing& d) {
        list(j, "/buckets", m_limits.maxBuckets);
        std::unordered_set<std::uint32_t> member, ids;
        std::vector<Bucket> buckets;
        for (std::size_t i = 0; i < j.size(); ++i) {
            const std::string ptr = "/buckets/" + std::to_string(i);
            object(j[i], ptr);
            checkKeys(j[i], ptr, {"id", "tag", "sccr_ka", "parts"});
            if (!j[i].contains("id"))
                throw Failure{ptr, "bucket has no \"id\""};
            Bucket b;
            b.id = BucketId(idValue(j[i].at("id"), ptr + "/id"));
            if (!ids.insert(b.id.value).second)
                throw Failure{ptr + "/id", "duplicate bucket id " + std::to_string(b.id.value)};
            b.tag = optText(j[i], ptr, "tag");
            if (j[i].contains("sccr_ka")) {
                const double v = number(j[i].at("sccr_ka"), ptr + "/sccr_ka");
                // Listed short-circuit current ratings start at a few kA (common practice); the
                // editor asks for 1 to 300 kA, and the file holds the same range.
                if (!(v >= 1 && v <= 300))
                    throw Failure{ptr + "/sccr_ka",
                                  "sccr_ka " + formatNumber(v) +
                                      " kA is outside 1 to 300 kA (a bucket's short-circuit "
                                      "current rating)"};
                b.sccrKa = v;
            }
            if (j[i].contains("parts"))
                b.parts = partIds(d, j[i].at("parts"), ptr + "/parts");
            for (std::size_t k = 0; k < b.parts.size(); ++k)
                if (!member.insert(b.parts[k].value).second)
                    throw Failure{ptr + "/parts/" + std::to_string(k),
                                  "part " + std::to_string(b.parts[k].value) +
                                      " is already in another bucket"};
            buckets.push_back(std::move(b));
        }
        d.addBuckets(std::move(buckets));
    }

    void readAccepted(const json& j, Drawing& d) {
        list(j, "/accepted", m_limits.maxListItems);
        for (std::size_t i = 0; i < j.size(); ++i) {
            const std::string ptr = "/accepted/" + std::to_string(i);
            object(j[i], ptr);
            checkKeys(j[i], ptr, {"rule", "parts", "by", "date", "note"});
            Accepted a;
            a.rule = optText(j[i], ptr, "rule");
            if (a.rule.empty())
                throw Failure{ptr, "accepted deviation has no \"rule\""};
            if (j[i].contains("parts"))
                a.parts = partIds(d, j[i].at("parts"), ptr + "/parts");
            a.by = optText(j[i], ptr, "by");
            a.date = optText(j[i], ptr, "date");
            a.note = optText(j[i], ptr, "note");
            d.accepted().push_back(std::move(a));
        }
    }

    // Review comments: each pinned to an existing part, with an id of its own and some text.
    void readComments(const json& j, Drawing& d) {
        list(j, "/comments", m_limits.maxListItems);
        std::unordered_set<std::uint32_t> ids;
        for (std::size_t i = 0; i < j.size(); ++i) {
            const std::string ptr = "/comments/" + std::to_string(i);
            object(j[i], ptr);
            checkKeys(j[i], ptr, {"id", "part", "by", "date", "text", "resolved"});
            Comment c;
            if (!j[i].contains("id"))
                throw Failure{ptr, "review comment has no \"id\""};
            c.id = idValue(j[i].at("id"), ptr + "/id");
            if (!ids.insert(c.id).second)
                throw Failure{ptr + "/id", "duplicate comment id " + std::to_string(c.id)};
            if (!j[i].contains("part"))
                throw Failure{ptr, "review comment " + std::to_string(c.id) +
                                       " has no \"part\" (a comment is pinned to a part)"};
            c.part = PartId(idValue(j[i].at("part"), ptr + "/part"));
            if (!d.part(c.part))
                throw Failure{ptr + "/part",
                              "review comment " + std::to_string(c.id) + " is pinned to part " +
                                  std::to_string(c.part.value) + ", which does not exist"};
            c.by = optText(j[i], ptr, "by");
            c.date = optText(j[i], ptr, "date");
            c.text = optText(j[i], ptr, "text");
            if (c.text.empty())
                throw Failure{ptr, "review comment " + std::to_string(c.id) + " has no \"text\""};
            if (j[i].contains("resolved")) {
                if (!j[i].at("resolved").is_boolean())
                    throw Failure{ptr + "/resolved",
                                  "resolved must be true or false, found " +
                                      std::string(typeName(j[i].at("resolved")))};
                c.resolved = j[i].at("resolved").get<bool>();
            }
            d.comments().push_back(std::move(c));
        }
    }

    const LocatedJson& m_doc;
};

// The file's list limits, enforced by the parser as it reads (not after the whole file is held).
JsonLimits parserLimits(const FileLimits& l) {
    JsonLimits j;
    j.maxStringBytes = l.maxTextBytes;
    j.maxValues = l.maxValues;
    j.maxListItems = l.maxListItems;
    j.listLimits = {{"/parts", l.maxParts},
                    {"/wires", l.maxWires},
                    {"/buckets", l.maxBuckets},
                    {"/revisions", l.maxListItems},
                    {"/accepted", l.maxListItems},
                    {"/comments", l.maxListItems},
                    {"/buckets/*/parts", l.maxListItems},
                    {"/accepted/*/parts", l.maxListItems}};
    return j;
}

LoadResult failAt(std::string_view text, std::string_view file, std::size_t offset,
                  std::string message) {
    auto pos = textPosition(text, offset);
    return LoadResult{std::nullopt,
                      LoadError{std::string(file), pos.line, pos.column, std::move(message)}};
}

} // namespace

LoadResult parseDrawing(std::string_view text, std::string_view fileName,
                        const FileLimits& limits) {
    if (text.size() > limits.maxFileBytes)
        return LoadResult{
            std::nullopt,
            LoadError{std::string(fileName), 0, 0,
                      "file is larger than " + std::to_string(limits.maxFileBytes >> 20) + " MiB"}};
    // Parse fast first; only a refused file is parsed again with every offset recorded, so
    // its message can name the line and column.
    JsonSyntaxError syntax;
    JsonLimits fast = parserLimits(limits);
    fast.recordOffsets = false;
    auto doc = parseLocated(text, fast, syntax);
    if (!doc)
        return failAt(text, fileName, syntax.offset, syntax.message);
    try {
        Reader reader(*doc, limits);
        return LoadResult{reader.read(), std::nullopt};
    } catch (const Failure& f) {
        doc.reset(); // the second parse records only the refused value's place and its parents
        JsonLimits locate = parserLimits(limits);
        locate.locate = f.pointer;
        auto located = parseLocated(text, locate, syntax);
        return failAt(text, fileName, located ? located->offsetOf(f.pointer) : 0, f.message);
    } catch (const std::exception& e) {
        return failAt(text, fileName, 0, e.what());
    }
}

LoadResult loadDrawing(const std::filesystem::path& path, const FileLimits& limits) {
    const std::string name = path.string();
    std::error_code ec;
    const auto size = std::filesystem::file_size(path, ec);
    if (ec)
        return LoadResult{std::nullopt, LoadError{name, 0, 0, "cannot read: " + ec.message()}};
    if (size > limits.maxFileBytes)
        return LoadResult{
            std::nullopt,
            LoadError{name, 0, 0,
                      "file is larger than " + std::to_string(limits.maxFileBytes >> 20) + " MiB"}};
    std::ifstream in(path, std::ios::binary);
    if (!in)
        return LoadResult{std::nullopt, LoadError{name, 0, 0, "cannot open for reading"}};
    std::string text(size, '\0');
    in.read(text.data(), static_cast<std::streamsize>(size));
    text.resize(static_cast<std::size_t>(in.gcount()));
    return parseDrawing(text, name, limits);
}

} // namespace lineward::io
