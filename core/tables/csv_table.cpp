// Table files are simple: no quoting, commas separate cells, blank cells mean "no value".
#include "tables/csv_table.h"

#include <charconv>
#include <cmath>

namespace lineward::tables {

namespace {

std::string trim(std::string_view s) {
    const auto a = s.find_first_not_of(" \t\r"), b = s.find_last_not_of(" \t\r");
    return a == std::string_view::npos ? std::string() : std::string(s.substr(a, b - a + 1));
}

std::vector<std::string> split(std::string_view line) {
    std::vector<std::string> cells;
    std::size_t start = 0;
    while (true) {
        const auto comma = line.find(',', start);
        cells.push_back(trim(line.substr(start, comma - start)));
        if (comma == std::string_view::npos)
            return cells;
        start = comma + 1;
    }
}

} // namespace

std::size_t CsvTable::column(std::string_view name) const {
    for (std::size_t i = 0; i < header.size(); ++i)
        if (header[i] == name)
            return i;
    throw TableError(file, 0, "no column '" + std::string(name) + "'");
}

void CsvTable::fail(std::size_t row, const std::string& what) const {
    throw TableError(file, row < lines.size() ? lines[row] : 0, what);
}

std::optional<double> CsvTable::number(std::size_t row, std::size_t col) const {
    const std::string& cell = rows.at(row).at(col);
    if (cell.empty())
        return std::nullopt;
    double v = 0;
    const auto res = std::from_chars(cell.data(), cell.data() + cell.size(), v);
    if (res.ec != std::errc() || res.ptr != cell.data() + cell.size() || !std::isfinite(v))
        fail(row, "column '" + header.at(col) + "': '" + cell + "' is not a number");
    return v;
}

double CsvTable::required(std::size_t row, std::size_t col) const {
    auto v = number(row, col);
    if (!v)
        fail(row, "column '" + header.at(col) + "' is blank");
    return *v;
}

CsvTable parseCsvTable(std::string_view text, const std::string& file) {
    CsvTable t;
    t.file = file;
    int lineNo = 0;
    std::size_t pos = 0;
    while (pos <= text.size()) {
        auto nl = text.find('\n', pos);
        if (nl == std::string_view::npos)
            nl = text.size();
        const std::string line = trim(text.substr(pos, nl - pos));
        pos = nl + 1;
        ++lineNo;
        if (line.empty())
            continue;
        if (line[0] == '#') {
            const std::string body = trim(std::string_view(line).substr(1));
            if (body.rfind("table:", 0) == 0)
                t.name = trim(std::string_view(body).substr(6));
            else if (body.rfind("source:", 0) == 0)
                t.source = trim(std::string_view(body).substr(7));
            continue;
        }
        auto cells = split(line);
        if (t.header.empty()) {
            t.header = std::move(cells);
            continue;
        }
        if (cells.size() != t.header.size())
            throw TableError(file, lineNo,
                             "row has " + std::to_string(cells.size()) + " cells; the header has " +
                                 std::to_string(t.header.size()));
        t.rows.push_back(std::move(cells));
        t.lines.push_back(lineNo);
    }
    if (t.source.empty())
        throw TableError(file, 0, "no '# source:' line naming the published table and edition");
    if (t.name.empty())
        throw TableError(file, 0, "no '# table:' line");
    if (t.rows.empty())
        throw TableError(file, 0, "no rows");
    return t;
}

} // namespace lineward::tables
