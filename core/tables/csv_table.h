// Reading of the table files: '#' comment lines (table name and source), a header, rows.
#pragma once

#include <optional>
#include <stdexcept>
#include <string>
#include <string_view>
#include <vector>

namespace lineward::tables {

/// A table that cannot be used: which file, which line, what is wrong.
class TableError : public std::runtime_error {
public:
    TableError(const std::string& file, int line, const std::string& what)
        : std::runtime_error(file + (line > 0 ? ":" + std::to_string(line) : "") + ": " + what) {}
};

/// A table file as text cells, with the line of each row for messages.
struct CsvTable {
    std::string file;
    std::string name;   ///< from "# table: NAME"
    std::string source; ///< from "# source: ..." (required: every table names its edition)
    std::vector<std::string> header;
    std::vector<std::vector<std::string>> rows;
    std::vector<int> lines;

    /// Column index of a header name; throws TableError when absent.
    std::size_t column(std::string_view name) const;
    /// The number in a cell; nothing for a blank cell; throws TableError for anything else.
    std::optional<double> number(std::size_t row, std::size_t col) const;
    /// The number in a cell that must not be blank.
    double required(std::size_t row, std::size_t col) const;
    [[noreturn]] void fail(std::size_t row, const std::string& what) const;
};

/// Parses a table file; throws TableError on a missing source line, ragged rows or no rows.
CsvTable parseCsvTable(std::string_view text, const std::string& file);

} // namespace lineward::tables
