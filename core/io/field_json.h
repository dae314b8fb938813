// One rating value as JSON, the way the file writes it (whole numbers without a fraction); the
// reports and the command line's JSON use the same spelling. Also a part, the sheet data and
// the settings as the file writes them, for readers that compare them key by key.
#pragma once

#include "model/drawing.h"
#include "model/field.h"

#include <nlohmann/json.hpp>

namespace lineward::io {

nlohmann::ordered_json fieldValueJson(const FieldValue& v);
/// A part as one line of the file's "parts" list (absent ratings left out).
nlohmann::ordered_json partJson(const Part& p);
/// The file's "sheet" object (the revisions are a list of their own).
nlohmann::ordered_json sheetJson(const SheetInfo& s);
/// The file's "settings" object.
nlohmann::ordered_json settingsJson(const Settings& s);

} // namespace lineward::io
