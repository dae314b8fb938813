// A part on the Sheet: its kind, tag, place and ratings.
#pragma once

#include "model/ids.h"
#include "model/part_kind.h"

#include <optional>
#include <string>
#include <utility>
#include <vector>

namespace lineward {

/// A part of the drawing. Ratings are stored in the order of the kind's field list.
struct Part {
    PartId id;
    PartKind kind = PartKind::Load;
    std::string tag;                ///< the user's label, e.g. "M-101"
    double x = 0.0, y = 0.0;        ///< Sheet position (grid units of 1/10 in)
    int rotation = 0;               ///< 0, 90, 180 or 270 degrees
    std::vector<FieldValue> values; ///< one per field of the kind

    /// A part of this kind with every field at its default.
    static Part make(PartKind kind, PartId id, std::string tag);

    const FieldValue& value(std::string_view key) const;
    /// The number in field `key`, or its default, or nothing when absent.
    std::optional<double> number(std::string_view key) const;
    std::optional<std::string> word(std::string_view key) const;
    bool flag(std::string_view key) const;
    /// Sets a field after validating it; returns the reason when refused (the part is unchanged).
    std::optional<std::string> set(std::string_view key, FieldValue v,
                                   FieldNaming naming = FieldNaming::Key);
    /// Sets several fields as one change (an either-or pair switched in one edit); all or none.
    std::optional<std::string>
    set(const std::vector<std::pair<std::string_view, FieldValue>>& changes,
        FieldNaming naming = FieldNaming::Key);

    bool isOpen() const { return kindInfo(kind).switching && flag("open"); }
    bool operator==(const Part&) const = default;
};

/// Checks the relations between a part's fields (one of hp/kW given, setting within its range,
/// ...). Returns each reason a part is refused.
std::vector<std::string> validatePart(const Part& part, FieldNaming naming = FieldNaming::Key);

} // namespace lineward
