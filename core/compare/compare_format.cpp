// Comparison rendering: text sections in a fixed order, and the JSON object docs/compare.md
// describes. Text from the files is escaped in the text; JSON leaves it to the caller's
// inertJson.
#include "compare/compare_format.h"

#include "util/safe_text.h"

#include <sstream>

namespace lineward {

namespace {

using ojson = nlohmann::ordered_json;

ojson stringArray(const std::vector<std::string>& items) {
    ojson a = ojson::array();
    for (const auto& s : items)
        a.push_back(s);
    return a;
}

ojson changesJson(const std::vector<ValueChange>& changes) {
    ojson j = ojson::object();
    for (const auto& v : changes)
        j[v.key] = ojson::array({v.oldValue, v.newValue});
    return j;
}

ojson partJsonRef(const Part& p) {
    return ojson{{"id", p.id.value}, {"tag", p.tag}, {"kind", kindInfo(p.kind).key}};
}

ojson wireJson(const WireOnOneSide& w) {
    auto end = [](const WireEndRef& e) {
        return ojson{{"part", e.part.value}, {"tag", e.tag}, {"terminal", e.terminal}};
    };
    return ojson{{"id", w.id.value}, {"from", end(w.a)}, {"to", end(w.b)}};
}

ojson bucketJson(const BucketOnOneSide& b) {
    return ojson{{"id", b.id.value}, {"tag", b.tag}, {"parts", stringArray(b.partTags)}};
}

ojson findingJson(const FindingRef& f) {
    return ojson{{"rule", f.rule},
                 {"severity", severityName(f.severity)},
                 {"parts", stringArray(f.tags)},
                 {"message", f.message},
                 {"accepted", f.accepted}};
}

ojson acceptedJson(const AcceptedRef& a) {
    return ojson{{"rule", a.rule},
                 {"parts", stringArray(a.tags)},
                 {"by", a.by},
                 {"date", a.date},
                 {"note", a.note}};
}

ojson commentJson(const CommentRef& x) {
    return ojson{{"id", "C" + std::to_string(x.id)},
                 {"part", x.tag},
                 {"status", x.resolved ? "resolved" : "open"},
                 {"by", x.by},
                 {"date", x.date},
                 {"text", x.text}};
}

template <typename T, typename F> ojson listJson(const std::vector<T>& items, F toJson) {
    ojson a = ojson::array();
    for (const auto& item : items)
        a.push_back(toJson(item));
    return a;
}

std::string joined(const std::vector<std::string>& tags) {
    std::string out;
    for (const auto& t : tags)
        out += (out.empty() ? "" : ", ") + escapeControls(t);
    return out.empty() ? "(no parts)" : out;
}

std::string changeText(const ValueChange& v) {
    return escapeControls(v.key) + " " + escapeControls(valueText(v.oldValue)) + " → " +
           escapeControls(valueText(v.newValue));
}

std::string endText(const WireEndRef& e) {
    return escapeControls(e.tag) + "." + e.terminal;
}

// "Parts added (2)" and its lines; nothing when the list is empty.
template <typename T, typename F>
void section(std::ostringstream& s, const char* title, const std::vector<T>& items, F line) {
    if (items.empty())
        return;
    s << "\n" << title << " (" << items.size() << ")\n";
    for (const auto& item : items)
        s << "  " << line(item) << "\n";
}

std::string findingText(const FindingRef& f) {
    return std::string(severityName(f.severity)) + " · " + f.rule + " · " + joined(f.tags) + " · " +
           escapeControls(f.message) + (f.accepted ? " [accepted]" : "");
}

} // namespace

std::string partTagOrId(const Part& p) {
    return p.tag.empty() ? "#" + std::to_string(p.id.value) : p.tag;
}

std::string comparisonText(const DrawingComparison& c, const std::string& oldFile,
                           const std::string& newFile) {
    std::ostringstream s;
    s << escapeControls(oldFile) << " → " << escapeControls(newFile) << ": "
      << (c.same() ? "the same drawing" : "the drawings differ") << "\n";
    auto partLine = [](const char* mark) {
        return [mark](const PartOnOneSide& p) {
            return std::string(mark) + " " + escapeControls(partTagOrId(p.part)) + " (" +
                   std::string(kindInfo(p.part.kind).name) + ", id " +
                   std::to_string(p.part.id.value) + ")";
        };
    };
    section(s, "Parts added", c.partsAdded, partLine("+"));
    section(s, "Parts removed", c.partsRemoved, partLine("-"));
    section(s, "Parts changed", c.partsChanged, [](const PartChange& p) {
        std::string line = "~ " + escapeControls(p.tag) + " (" +
                           std::string(kindInfo(p.kind).name) + ", id " +
                           std::to_string(p.newId.value);
        if (p.oldId != p.newId)
            line += ", was id " + std::to_string(p.oldId.value);
        line += "):";
        for (std::size_t i = 0; i < p.fields.size(); ++i)
            line += (i ? "; " : " ") + changeText(p.fields[i]);
        return line;
    });
    auto wireLine = [](const char* mark) {
        return [mark](const WireOnOneSide& w) {
            return std::string(mark) + " " + endText(w.a) + " – " + endText(w.b) + " (wire " +
                   std::to_string(w.id.value) + ")";
        };
    };
    section(s, "Wires added", c.wiresAdded, wireLine("+"));
    section(s, "Wires removed", c.wiresRemoved, wireLine("-"));
    auto bucketLine = [](const char* mark) {
        return [mark](const BucketOnOneSide& b) {
            return std::string(mark) + " " + escapeControls(b.tag) + ": " + joined(b.partTags);
        };
    };
    section(s, "Buckets added", c.bucketsAdded, bucketLine("+"));
    section(s, "Buckets removed", c.bucketsRemoved, bucketLine("-"));
    section(s, "Buckets changed", c.bucketsChanged, [](const BucketChange& b) {
        std::string line = "~ " + escapeControls(b.tag) + ":";
        for (std::size_t i = 0; i < b.fields.size(); ++i)
            line += (i ? "; " : " ") + changeText(b.fields[i]);
        return line;
    });
    section(s, "Sheet", c.sheet, [](const ValueChange& v) { return "~ " + changeText(v); });
    section(s, "Settings", c.settings, [](const ValueChange& v) { return "~ " + changeText(v); });
    auto acceptedLine = [](const char* mark) {
        return [mark](const AcceptedRef& a) {
            return std::string(mark) + " " + a.rule + " · " + joined(a.tags) + " · " +
                   escapeControls(a.by) + " " + escapeControls(a.date) + ": " +
                   escapeControls(a.note);
        };
    };
    section(s, "Accepted deviations added", c.acceptedAdded, acceptedLine("+"));
    section(s, "Accepted deviations removed", c.acceptedRemoved, acceptedLine("-"));
    auto commentLine = [](const char* mark) {
        return [mark](const CommentRef& x) {
            return std::string(mark) + " C" + std::to_string(x.id) + " on " +
                   escapeControls(x.tag) + " · " + (x.resolved ? "resolved" : "open") + " · " +
                   escapeControls(x.by) + " " + escapeControls(x.date) + ": " +
                   escapeControls(x.text);
        };
    };
    section(s, "Comments added", c.commentsAdded, commentLine("+"));
    section(s, "Comments removed", c.commentsRemoved, commentLine("-"));
    section(s, "Comments changed", c.commentsChanged, [](const CommentChange& x) {
        std::string line = "~ C" + std::to_string(x.newId) + " on " + escapeControls(x.tag);
        if (x.oldId != x.newId)
            line += " (was C" + std::to_string(x.oldId) + ")";
        line += ":";
        for (std::size_t i = 0; i < x.fields.size(); ++i)
            line += (i ? "; " : " ") + changeText(x.fields[i]);
        return line;
    });
    section(s, "Findings new", c.findingsNew, findingText);
    section(s, "Findings resolved", c.findingsResolved, findingText);
    section(s, "Findings still open", c.findingsOpen, findingText);
    return s.str();
}

ojson comparisonJson(const DrawingComparison& c, const std::string& oldFile,
                     const std::string& newFile) {
    ojson j;
    j["old"] = oldFile;
    j["new"] = newFile;
    j["same"] = c.same();
    auto part = [](const PartOnOneSide& p) { return partJsonRef(p.part); };
    j["parts_added"] = listJson(c.partsAdded, part);
    j["parts_removed"] = listJson(c.partsRemoved, part);
    j["parts_changed"] = listJson(c.partsChanged, [](const PartChange& p) {
        ojson o{{"id", p.newId.value},
                {"old_id", p.oldId.value},
                {"tag", p.tag},
                {"kind", kindInfo(p.kind).key}};
        o["fields"] = changesJson(p.fields);
        return o;
    });
    j["wires_added"] = listJson(c.wiresAdded, wireJson);
    j["wires_removed"] = listJson(c.wiresRemoved, wireJson);
    j["buckets_added"] = listJson(c.bucketsAdded, bucketJson);
    j["buckets_removed"] = listJson(c.bucketsRemoved, bucketJson);
    j["buckets_changed"] = listJson(c.bucketsChanged, [](const BucketChange& b) {
        ojson o{{"id", b.newId.value}, {"old_id", b.oldId.value}, {"tag", b.tag}};
        o["fields"] = changesJson(b.fields);
        return o;
    });
    j["sheet"] = changesJson(c.sheet);
    j["settings"] = changesJson(c.settings);
    j["accepted_added"] = listJson(c.acceptedAdded, acceptedJson);
    j["accepted_removed"] = listJson(c.acceptedRemoved, acceptedJson);
    j["comments_added"] = listJson(c.commentsAdded, commentJson);
    j["comments_removed"] = listJson(c.commentsRemoved, commentJson);
    j["comments_changed"] = listJson(c.commentsChanged, [](const CommentChange& x) {
        ojson o{{"id", "C" + std::to_string(x.newId)},
                {"old_id", "C" + std::to_string(x.oldId)},
                {"part", x.tag}};
        o["fields"] = changesJson(x.fields);
        return o;
    });
    j["findings_new"] = listJson(c.findingsNew, findingJson);
    j["findings_resolved"] = listJson(c.findingsResolved, findingJson);
    j["findings_open"] = listJson(c.findingsOpen, findingJson);
    return j;
}

} // namespace lineward
