// Load-list reader: a small CSV tokenizer that keeps each cell's line and column, then one
// motor per row built through the same field validation as a motor in a drawing.
#include "io/load_list.h"

#include "model/ratings.h"
#include "util/safe_text.h"

#include <algorithm>
#include <array>
#include <charconv>
#include <cmath>
#include <map>
#include <optional>

namespace lineward {

namespace {

struct Cell {
    std::string text;
    int column = 0; ///< 1-based, in characters
};

struct Columns {
    std::map<std::string, std::size_t> index; ///< known column name → cell position
};

constexpr std::array<std::string_view, 10> kKnownColumns{
    "tag",    "description", "hp",         "kw",      "volts",
    "phases", "fla",         "protection", "starter", "length_ft"};

std::string lower(std::string_view s) {
    std::string out(s);
    std::transform(out.begin(), out.end(), out.begin(),
                   [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    return out;
}

std::string trim(std::string_view s) {
    const auto b = s.find_first_not_of(" \t");
    if (b == std::string_view::npos)
        return {};
    return std::string(s.substr(b, s.find_last_not_of(" \t") - b + 1));
}

std::string quoted(std::string_view s) {
    return "'" + escapeControls(s) + "'";
}

// Splits one line into cells; a quoted cell may hold commas and "" for a quote. Returns the
// column and reason of an unterminated quote instead.
std::optional<std::vector<Cell>> splitLine(std::string_view line, LoadListIssue& bad) {
    std::vector<Cell> cells;
    std::size_t i = 0;
    int column = 1;
    auto advance = [&](std::size_t n) {
        for (std::size_t k = 0; k < n && i < line.size(); ++k, ++i)
            if ((static_cast<unsigned char>(line[i]) & 0xC0) != 0x80)
                ++column;
    };
    while (true) {
        while (i < line.size() && (line[i] == ' ' || line[i] == '\t'))
            advance(1);
        Cell c;
        c.column = column;
        if (i < line.size() && line[i] == '"') {
            advance(1);
            bool closed = false;
            while (i < line.size()) {
                if (line[i] == '"') {
                    if (i + 1 < line.size() && line[i + 1] == '"') {
                        c.text += '"';
                        advance(2);
                        continue;
                    }
                    advance(1);
                    closed = true;
                    break;
                }
                c.text += line[i];
                advance(1);
            }
            if (!closed) {
                bad.column = c.column;
                bad.reason = "a quoted cell has no closing quote on its line";
                return std::nullopt;
            }
            while (i < line.size() && (line[i] == ' ' || line[i] == '\t'))
                advance(1);
            if (i < line.size() && line[i] != ',') {
                bad.column = column;
                bad.reason = "text after a quoted cell's closing quote";
                return std::nullopt;
            }
        } else {
            const std::size_t start = i;
            while (i < line.size() && line[i] != ',')
                advance(1);
            c.text = trim(line.substr(start, i - start));
        }
        cells.push_back(std::move(c));
        if (i >= line.size())
            break;
        advance(1); // the comma
    }
    return cells;
}

std::optional<double> parseNumber(const std::string& s) {
    double v = 0;
    const char* end = s.data() + s.size();
    auto [ptr, ec] = std::from_chars(s.data(), end, v);
    if (ec != std::errc() || ptr != end || !std::isfinite(v))
        return std::nullopt;
    return v;
}

// Reads one data row into `row`; the first problem becomes `bad`.
class RowReader {
public:
    RowReader(const Columns& cols, const std::vector<Cell>& cells, int endColumn)
        : m_cols(cols), m_cells(cells), m_end(endColumn) {}

    bool has(const char* name) const { return m_cols.index.count(name) > 0; }
    const std::string* text(const char* name) const {
        auto it = m_cols.index.find(name);
        if (it == m_cols.index.end() || it->second >= m_cells.size())
            return nullptr;
        return &m_cells[it->second].text;
    }
    bool given(const char* name) const {
        const auto* t = text(name);
        return t && !t->empty();
    }
    int column(const char* name) const {
        auto it = m_cols.index.find(name);
        if (it == m_cols.index.end() || it->second >= m_cells.size())
            return m_end;
        return m_cells[it->second].column;
    }
    std::optional<double> number(const char* name, LoadListIssue& bad) const {
        auto v = parseNumber(*text(name));
        if (!v)
            fail(bad, name, std::string(name) + ": " + quoted(*text(name)) + " is not a number");
        return v;
    }
    void fail(LoadListIssue& bad, const char* name, std::string why) const {
        bad.column = column(name);
        bad.reason = std::move(why);
    }

private:
    const Columns& m_cols;
    const std::vector<Cell>& m_cells;
    int m_end;
};

template <typename E, std::size_t N>
std::optional<E> choiceOf(const std::string& text, const std::array<E, N>& values,
                          std::string_view (*key)(E)) {
    const std::string l = lower(text);
    for (E v : values)
        if (key(v) == l)
            return v;
    return std::nullopt;
}

bool setMotorNumber(Part& motor, const RowReader& r, const char* column, std::string_view key,
                    LoadListIssue& bad) {
    auto v = r.number(column, bad);
    if (!v)
        return false;
    if (auto err = motor.set(key, *v)) {
        r.fail(bad, column, *err); // the field check names the field
        return false;
    }
    return true;
}

// The bucket's columns of a row: protection, starter and cable length, with their defaults.
bool readBucketChoices(const RowReader& r, LoadRow& row, LoadListIssue& bad) {
    if (r.given("protection")) {
        auto p = choiceOf(
            *r.text("protection"),
            std::array{LoadProtection::Breaker, LoadProtection::InstBreaker, LoadProtection::Fuse},
            loadProtectionKey);
        if (!p) {
            r.fail(bad, "protection",
                   "protection: " + quoted(*r.text("protection")) +
                       " is not one of breaker, inst_breaker, fuse");
            return false;
        }
        row.protection = *p;
    }
    if (r.given("starter")) {
        auto s = choiceOf(
            *r.text("starter"),
            std::array{LoadStarter::Fvnr, LoadStarter::Fvr, LoadStarter::Soft, LoadStarter::Vfd},
            loadStarterKey);
        if (!s) {
            r.fail(bad, "starter",
                   "starter: " + quoted(*r.text("starter")) +
                       " is not one of fvnr, fvr, soft, vfd");
            return false;
        }
        row.starter = *s;
    }
    row.lengthFt = kLoadListDefaultLengthFt;
    if (r.given("length_ft")) {
        auto v = r.number("length_ft", bad);
        if (!v)
            return false;
        if (*v <= 0 || *v > 10000) {
            r.fail(bad, "length_ft", "length_ft: must be above 0 and at most 10000 ft");
            return false;
        }
        row.lengthFt = *v;
    }
    return true;
}

std::optional<LoadRow> readRow(const RowReader& r, int line, LoadListIssue& bad) {
    LoadRow row;
    row.line = line;
    if (!r.given("tag")) {
        r.fail(bad, "tag", "tag: every row needs a tag");
        return std::nullopt;
    }
    row.motor = Part::make(PartKind::Motor, PartId(1), *r.text("tag"));
    row.tagColumn = r.column("tag");
    if (r.given("description"))
        row.description = *r.text("description");
    const bool hp = r.given("hp"), kw = r.given("kw");
    if (hp == kw) {
        r.fail(bad, hp ? "kw" : (r.has("hp") ? "hp" : "kw"),
               hp ? "give hp or kw, not both" : "hp or kw: the motor's rating is missing");
        return std::nullopt;
    }
    if (!setMotorNumber(row.motor, r, hp ? "hp" : "kw", hp ? MotorRatings::kHp : MotorRatings::kKw,
                        bad))
        return std::nullopt;
    if (!r.given("volts")) {
        r.fail(bad, "volts", "volts: the motor's rated voltage is missing");
        return std::nullopt;
    }
    if (!setMotorNumber(row.motor, r, "volts", MotorRatings::kVolts, bad))
        return std::nullopt;
    if (r.given("phases") && !setMotorNumber(row.motor, r, "phases", MotorRatings::kPhases, bad))
        return std::nullopt;
    if (r.given("fla") && !setMotorNumber(row.motor, r, "fla", MotorRatings::kFla, bad))
        return std::nullopt;
    if (!readBucketChoices(r, row, bad))
        return std::nullopt;
    if (auto problems = validatePart(row.motor); !problems.empty()) {
        r.fail(bad, "tag", problems.front());
        return std::nullopt;
    }
    return row;
}

// Reads the header; false (with `bad`) when a required column is missing or repeated.
bool readHeader(const std::vector<Cell>& cells, Columns& cols, std::vector<std::string>& notes,
                int line, LoadListIssue& bad) {
    for (std::size_t i = 0; i < cells.size(); ++i) {
        const std::string name = lower(cells[i].text);
        if (std::find(kKnownColumns.begin(), kKnownColumns.end(), name) == kKnownColumns.end()) {
            notes.push_back("line " + std::to_string(line) + ", column " +
                            std::to_string(cells[i].column) + ": column " + quoted(cells[i].text) +
                            " is not a load-list column; ignored");
            continue;
        }
        if (!cols.index.emplace(name, i).second) {
            bad = {line, cells[i].column, "column " + quoted(name) + " appears twice"};
            return false;
        }
    }
    for (const char* need : {"tag", "volts"})
        if (!cols.index.count(need)) {
            bad = {line, 1, std::string("the header has no ") + need + " column"};
            return false;
        }
    if (!cols.index.count("hp") && !cols.index.count("kw")) {
        bad = {line, 1, "the header has neither an hp nor a kw column"};
        return false;
    }
    return true;
}

} // namespace

std::string_view loadProtectionKey(LoadProtection p) {
    switch (p) {
    case LoadProtection::Breaker:
        return "breaker";
    case LoadProtection::InstBreaker:
        return "inst_breaker";
    case LoadProtection::Fuse:
        return "fuse";
    }
    return "breaker";
}

std::string_view loadStarterKey(LoadStarter s) {
    switch (s) {
    case LoadStarter::Fvnr:
        return "fvnr";
    case LoadStarter::Fvr:
        return "fvr";
    case LoadStarter::Soft:
        return "soft";
    case LoadStarter::Vfd:
        return "vfd";
    }
    return "fvnr";
}

LoadList readLoadList(std::string_view text) {
    LoadList out;
    if (text.substr(0, 3) == "\xEF\xBB\xBF")
        text.remove_prefix(3); // a byte-order mark some spreadsheets write
    Columns cols;
    bool haveHeader = false;
    std::map<std::string, int> tagLine;
    int line = 0;
    std::size_t pos = 0;
    while (pos <= text.size()) {
        std::size_t nl = text.find('\n', pos);
        if (nl == std::string_view::npos)
            nl = text.size();
        std::string_view raw = text.substr(pos, nl - pos);
        pos = nl + 1;
        ++line;
        if (!raw.empty() && raw.back() == '\r')
            raw.remove_suffix(1);
        const std::string t = trim(raw);
        if (t.empty() || t.front() == '#')
            continue;
        LoadListIssue bad{line, 0, {}};
        auto cells = splitLine(raw, bad);
        if (!cells) {
            out.refused.push_back(bad);
            if (!haveHeader)
                return out;
            continue;
        }
        if (!haveHeader) {
            if (!readHeader(*cells, cols, out.notes, line, bad)) {
                out.refused.push_back(bad);
                return out;
            }
            haveHeader = true;
            continue;
        }
        RowReader r(cols, *cells, static_cast<int>(raw.size()) + 1);
        auto row = readRow(r, line, bad);
        if (row) {
            const std::string& tag = row->motor.tag;
            if (auto [it, fresh] = tagLine.emplace(tag, line); !fresh) {
                out.refused.push_back({line, r.column("tag"),
                                       "tag " + quoted(tag) + " is already used on line " +
                                           std::to_string(it->second)});
                continue;
            }
            out.rows.push_back(std::move(*row));
        } else {
            out.refused.push_back(bad);
        }
    }
    if (!haveHeader)
        out.refused.push_back({1, 1, "the file has no header line (tag, hp or kw, volts, ...)"});
    else if (out.rows.empty() && out.refused.empty())
        out.refused.push_back({line, 1, "the list has a header but no rows"});
    return out;
}

std::optional<LoadRow> loadRowFrom(const std::vector<std::pair<std::string, std::string>>& cells,
                                   LoadListIssue& bad) {
    Columns cols;
    std::vector<Cell> row;
    for (const auto& [name, text] : cells) {
        cols.index.emplace(lower(name), row.size());
        row.push_back({trim(text), static_cast<int>(row.size()) + 1});
    }
    bad = {};
    return readRow(RowReader(cols, row, static_cast<int>(row.size()) + 1), 0, bad);
}

std::string locatedIssue(std::string_view file, const LoadListIssue& issue) {
    return std::string(file) + ":" + std::to_string(issue.line) + ":" +
           std::to_string(issue.column) + ": " + issue.reason;
}

} // namespace lineward
