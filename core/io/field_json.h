// One rating value as JSON, the way the file writes it (whole numbers without a fraction); the
// reports and the command line's JSON use the same spelling.
#pragma once

#include "model/field.h"

#include <nlohmann/json.hpp>

namespace lineward::io {

nlohmann::ordered_json fieldValueJson(const FieldValue& v);

} // namespace lineward::io
