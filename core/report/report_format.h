// Text and JSON renderings of a check report, shared by the command line and the editor.
#pragma once

#include "check/check.h"
#include "model/drawing.h"

#include <nlohmann/json.hpp>
#include <string>

namespace lineward {

/// A readable report grouped by part, with each finding's numbers, trace and fix.
std::string reportText(const Drawing& drawing, const CheckReport& report, const std::string& file);
/// The report as JSON: {"file", "counts", "findings": [...], "stale_accepted": [...]}.
nlohmann::ordered_json reportJson(const Drawing& drawing, const CheckReport& report,
                                  const std::string& file);
/// The check status in words, for a title block: "3 open violations, 2 open cautions, 1
/// accepted", or "no open findings" (", 1 accepted" where some are accepted).
std::string checkStatusWords(const CheckReport& report);
/// A stale acceptance in one line: "rule on TAGS — accepted by NAME, DATE: \"note\"" (text from
/// the file with its control characters escaped).
std::string staleAcceptanceText(const Drawing& drawing, const Accepted& accepted);
/// One line: "violation · topology.unfed · common practice · message".
std::string findingHeadline(const Finding& f);

/// The caution printed with every report and submittal.
inline constexpr const char* kSafetyCaution =
    "Lineward supports, and does not replace, the judgement of a licensed engineer and the "
    "code in force where the equipment is installed. Results depend on the data entered; check "
    "equipment against its listing and the manufacturer's data. The authority having "
    "jurisdiction has the final word.";

} // namespace lineward
