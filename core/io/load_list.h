// The load list: a CSV file of motors (one row a bucket) read for `lineward-cli new` and
// File → Import Load List; the format is docs/load-list.md.
#pragma once

#include "model/part.h"

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace lineward {

/// The bucket's short-circuit device a row asks for.
enum class LoadProtection { Breaker, InstBreaker, Fuse };
/// The starter a row asks for: full voltage (non-reversing, reversing), soft starter or
/// variable-frequency drive (their buckets: docs/load-list.md).
enum class LoadStarter { Fvnr, Fvr, Soft, Vfd };

std::string_view loadProtectionKey(LoadProtection p);
std::string_view loadStarterKey(LoadStarter s);

/// One accepted row: the motor (validated as a motor in a drawing is) and the bucket's choices.
struct LoadRow {
    int line = 0;            ///< 1-based line of the row in the file
    int tagColumn = 1;       ///< 1-based column of the tag cell (where a tag clash is reported)
    std::string description; ///< free text, never interpreted
    Part motor;              ///< tag, hp or kW, volts, phases and FLA set; other ratings default
    LoadProtection protection = LoadProtection::Breaker;
    LoadStarter starter = LoadStarter::Fvnr;
    double lengthFt = 0;
};

/// A refused row or header: where (1-based line and column of the cell) and why.
struct LoadListIssue {
    int line = 0, column = 0;
    std::string reason;
};

/// Defaults of the optional columns (docs/load-list.md states them).
inline constexpr int kLoadListDefaultPhases = 3;
/// Branch cable length where the list gives none (common practice for a first layout; the
/// designer replaces it with the routed length).
inline constexpr double kLoadListDefaultLengthFt = 100.0;

/// Everything read from a load list: accepted rows in file order, refused rows and notes
/// (extra columns ignored).
struct LoadList {
    std::vector<LoadRow> rows;
    std::vector<LoadListIssue> refused;
    std::vector<std::string> notes;
    bool ok() const { return refused.empty() && !rows.empty(); }
};

/// Reads a load list. Never throws on bad text: every problem becomes a refused entry with its
/// line and column. An empty list (no rows) is refused at line 1.
LoadList readLoadList(std::string_view text);

/// One row from named cells (column name → text, as a load list's header names them): the
/// same checks and defaults as a row of a file, for a row typed into a form (Add Bucket).
/// Returns the reason in `bad` (its line 0) when refused.
std::optional<LoadRow> loadRowFrom(const std::vector<std::pair<std::string, std::string>>& cells,
                                   LoadListIssue& bad);

/// "file:line:column: reason", the located message the command line prints.
std::string locatedIssue(std::string_view file, const LoadListIssue& issue);

} // namespace lineward
