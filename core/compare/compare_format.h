// Text and JSON renderings of a comparison of two revisions (the command line's `compare`).
#pragma once

#include "compare/drawing_compare.h"

#include <nlohmann/json.hpp>
#include <string>

namespace lineward {

/// A readable listing: one section per kind of difference, each line escaped for a terminal.
std::string comparisonText(const DrawingComparison& c, const std::string& oldFile,
                           const std::string& newFile);
/// One JSON object (docs/compare.md): "old", "new", "same", parts_added, parts_removed,
/// parts_changed, wires_added, wires_removed, buckets_added, buckets_removed, buckets_changed,
/// sheet, settings, accepted_added, accepted_removed, comments_added, comments_removed,
/// comments_changed, findings_new, findings_resolved, findings_open.
nlohmann::ordered_json comparisonJson(const DrawingComparison& c, const std::string& oldFile,
                                      const std::string& newFile);
/// "P-101" for a part ("#15" where it has no tag).
std::string partTagOrId(const Part& p);

} // namespace lineward
