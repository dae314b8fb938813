// Report rendering. Text groups findings under the part they are about (their first part).
#include "report/report_format.h"

#include "io/field_json.h"
#include "util/safe_text.h"

#include <cmath>
#include <map>
#include <sstream>

namespace lineward {

namespace {

std::string partLabel(const Drawing& d, PartId id) {
    const Part* p = d.part(id);
    if (!p)
        return "#" + std::to_string(id.value);
    return (p->tag.empty() ? "#" + std::to_string(id.value) : escapeControls(p->tag)) + " (" +
           std::string(kindInfo(p->kind).name) + ")";
}

// Two decimals are enough for people; JSON keeps full precision.
std::string rounded(double v) {
    return formatNumber(std::round(v * 100.0) / 100.0);
}

} // namespace

std::string findingHeadline(const Finding& f) {
    return std::string(severityName(f.severity)) + " · " + f.ruleId + " · " + f.clause + " · " +
           escapeControls(f.message);
}

std::string checkStatusWords(const CheckReport& r) {
    std::string out;
    auto put = [&](int n, const char* one, const char* many) {
        if (n > 0)
            out += (out.empty() ? "" : ", ") + std::to_string(n) + " " + (n == 1 ? one : many);
    };
    put(r.openCounts[2], "open violation", "open violations");
    put(r.openCounts[1], "open caution", "open cautions");
    put(r.openCounts[0], "open note", "open notes");
    if (out.empty())
        out = "no open findings";
    put(r.acceptedCount, "accepted", "accepted");
    put(static_cast<int>(r.staleAccepted.size()), "stale acceptance", "stale acceptances");
    return out;
}

std::string staleAcceptanceText(const Drawing& d, const Accepted& a) {
    std::string tags;
    for (auto id : a.parts)
        if (const Part* p = d.part(id))
            tags += (tags.empty() ? "" : ", ") + escapeControls(p->tag);
    return escapeControls(a.rule) + " on " + (tags.empty() ? std::string("no part") : tags) +
           " — accepted by " + escapeControls(a.by.empty() ? "(no name)" : a.by) + ", " +
           escapeControls(a.date.empty() ? "(no date)" : a.date) + ": \"" + escapeControls(a.note) +
           "\"";
}

std::string reportText(const Drawing& d, const CheckReport& r, const std::string& file) {
    std::ostringstream s;
    s << escapeControls(file) << ": " << r.openCounts[2] << " violation(s), " << r.openCounts[1]
      << " caution(s), " << r.openCounts[0] << " note(s)";
    if (r.acceptedCount)
        s << ", " << r.acceptedCount << " accepted";
    if (!r.staleAccepted.empty())
        s << ", " << r.staleAccepted.size() << " stale acceptance(s)";
    s << "\n";
    std::map<std::uint32_t, std::vector<const Finding*>> byPart;
    for (const auto& f : r.findings)
        byPart[f.parts.empty() ? 0u : f.parts.front().value].push_back(&f);
    for (const auto& [pid, list] : byPart) {
        s << "\n" << (pid ? partLabel(d, PartId(pid)) : std::string("(drawing)")) << "\n";
        for (const Finding* f : list) {
            s << "  " << (f->accepted ? "[accepted] " : "") << findingHeadline(*f) << "\n";
            if (f->computed && f->limit)
                s << "      computed " << rounded(*f->computed) << " " << f->unit << ", limit "
                  << rounded(*f->limit) << " " << f->unit << "\n";
            for (const auto& t : f->trace)
                s << "      " << escapeControls(t.name) << ": " << escapeControls(t.value) << "\n";
            if (f->fix)
                s << "      fix: " << escapeControls(f->fix->description) << "\n";
            if (f->accepted)
                s << "      accepted: " << escapeControls(f->acceptedNote) << "\n";
        }
    }
    if (!r.staleAccepted.empty()) {
        s << "\nStale acceptances (they match no finding any longer; withdraw or renew them)\n";
        for (auto i : r.staleAccepted)
            s << "  " << staleAcceptanceText(d, d.accepted()[i]) << "\n";
    }
    return s.str();
}

nlohmann::ordered_json reportJson(const Drawing& d, const CheckReport& r, const std::string& file) {
    using oj = nlohmann::ordered_json;
    oj j;
    j["file"] = file;
    j["counts"] = {{"violation", r.openCounts[2]},
                   {"caution", r.openCounts[1]},
                   {"note", r.openCounts[0]},
                   {"accepted", r.acceptedCount}};
    oj list = oj::array();
    for (const auto& f : r.findings) {
        oj e;
        e["rule"] = f.ruleId;
        e["severity"] = severityName(f.severity);
        e["clause"] = f.clause;
        oj parts = oj::array();
        for (auto id : f.parts) {
            const Part* p = d.part(id);
            parts.push_back({{"id", id.value}, {"tag", p ? p->tag : ""}});
        }
        e["parts"] = parts;
        e["message"] = f.message;
        e["computed"] = f.computed ? oj(*f.computed) : oj(nullptr);
        e["limit"] = f.limit ? oj(*f.limit) : oj(nullptr);
        e["unit"] = f.unit;
        oj trace = oj::array();
        for (const auto& t : f.trace)
            trace.push_back({{"name", t.name}, {"value", t.value}});
        e["trace"] = trace;
        if (f.fix) {
            oj changes = oj::array();
            for (const auto& c : f.fix->changes)
                changes.push_back({{"part", c.part.value},
                                   {"field", c.field},
                                   {"value", io::fieldValueJson(c.value)}});
            e["fix"] = {{"description", f.fix->description}, {"changes", changes}};
        } else {
            e["fix"] = nullptr;
        }
        e["accepted"] = f.accepted;
        if (f.accepted)
            e["accepted_note"] = f.acceptedNote;
        list.push_back(std::move(e));
    }
    j["findings"] = list;
    oj stale = oj::array();
    for (auto i : r.staleAccepted) {
        const Accepted& a = d.accepted()[i];
        oj tags = oj::array();
        for (auto id : a.parts)
            if (const Part* p = d.part(id))
                tags.push_back(p->tag);
        stale.push_back(
            {{"rule", a.rule}, {"parts", tags}, {"by", a.by}, {"date", a.date}, {"note", a.note}});
    }
    j["stale_accepted"] = stale;
    return j;
}

} // namespace lineward
