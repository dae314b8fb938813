// Schedules: tables of motors, cables and devices with their computed values, for the editor's
// Schedules panel, CSV export and the Submittal.
#pragma once

#include "check/check.h"

#include <optional>
#include <string>
#include <vector>

namespace lineward {

/// A cell that shows one rating of one part as the drawing holds it, so the editor can edit it
/// there (the motor row's overload setting is the overload's `setting_a`).
struct ScheduleField {
    PartId part;
    std::string_view key; ///< the field table's key (static storage)
    bool operator==(const ScheduleField&) const = default;
};

/// What the check found about a row's parts: the worst open severity and how many findings are
/// open (not accepted), and how many are accepted. Accepted findings do not mark a row.
struct RowFindings {
    std::optional<Severity> worst;
    int open = 0, worstCount = 0, accepted = 0;
};

/// One schedule: a name, column headers and rows of text cells; beside each row, the rating
/// each cell shows (where a cell shows one rating of one part) and the row's findings.
struct Schedule {
    std::string name; ///< "motors", "cables", "devices", "arcflash"
    std::vector<std::string> headers;
    std::vector<std::vector<std::string>> rows;
    /// Per row, per column: the one rating the cell shows, or nothing (a computed value, or a
    /// cell made of several ratings). Empty or shorter than the row where nothing is editable.
    std::vector<std::vector<std::optional<ScheduleField>>> fields;
    /// Per row (empty for the arc-flash schedule, whose rows are studies, not parts).
    std::vector<RowFindings> findings;
};

/// Motor, cable, device and arc-flash schedules of a drawing, read from its check result.
std::vector<Schedule> buildSchedules(const CheckResult& result);

/// RFC 4180 CSV: CRLF line ends, fields quoted where they hold a comma, quote or line break.
std::string toCsv(const Schedule& s);
/// A cell as CSV must carry it so no spreadsheet runs it as a formula: text starting with
/// = + - @, a tab or a CR gets a leading apostrophe; numbers are left alone.
std::string csvSafeCell(const std::string& cell);

} // namespace lineward
