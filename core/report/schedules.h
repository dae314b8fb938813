// Schedules: tables of motors, cables and devices with their computed values, for the editor's
// Schedules panel, CSV export and the Submittal.
#pragma once

#include "check/check.h"

#include <string>
#include <vector>

namespace lineward {

/// One schedule: a name, column headers and rows of text cells.
struct Schedule {
    std::string name; ///< "motors", "cables", "devices", "arcflash"
    std::vector<std::string> headers;
    std::vector<std::vector<std::string>> rows;
};

/// Motor, cable, device and arc-flash schedules of a drawing, read from its check result.
std::vector<Schedule> buildSchedules(const CheckResult& result);

/// RFC 4180 CSV: CRLF line ends, fields quoted where they hold a comma, quote or line break.
std::string toCsv(const Schedule& s);
/// A cell as CSV must carry it so no spreadsheet runs it as a formula: text starting with
/// = + - @, a tab or a CR gets a leading apostrophe; numbers are left alone.
std::string csvSafeCell(const std::string& cell);

} // namespace lineward
