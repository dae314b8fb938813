// A rating as people read and type it: the Inspector's, the Add Bucket dialog's and the
// multi-edit form's one way to show a value and to read typed text back into a value.
#pragma once

#include "model/part.h"

#include <QString>

namespace lineward::ui {

/// The value in the unit people edit it in (13.8 kV → "13800"), a choice as its label
/// ("thermal-magnetic"), a flag as "yes" or "no", nothing as "".
QString shownFieldText(const FieldSpec& spec, const FieldValue& v);

/// Reads typed text into a value of `spec` (numbers in the shown unit; a choice by its word or
/// its label; a flag as yes/no); returns the reason it is refused, or "" with `out` set. Empty
/// text is "no value". The part's own validation (Part::set) decides the range afterwards.
QString parseFieldText(const FieldSpec& spec, const QString& text, FieldValue& out);

/// "Rated output (hp)": the rating's name for people.
QString peopleFieldName(const FieldSpec& spec);

/// The changes of one typed rating.
using FieldChanges = std::vector<std::pair<std::string_view, FieldValue>>;

/// What typing `text` into rating `key` of a part of `kind` asks for: that value, and, where the
/// rating is one of an either-or pair, the other cleared. Returns the reason it is refused
/// (parseFieldText's), or "" with the changes appended to `out`.
QString typedFieldChanges(PartKind kind, std::string_view key, const QString& text,
                          FieldChanges& out);

/// The parts as the changes make them, all or none, each checked by the part's own validation
/// (Part::set). Returns the first refusal (named by the part's tag when there are several), or ""
/// with the copies that differ from their part in `after`. The Inspector, multi-edit and the
/// Schedules panel's cells all edit through this one check.
QString changedParts(const std::vector<const Part*>& parts, const FieldChanges& changes,
                     std::vector<Part>& after);

/// The undo text of a rating edit: "Set Trip rating (A) of CB-1", "Set … of 3 parts".
QString setFieldText(const QString& what, const std::vector<const Part*>& parts);

/// How a refused value is shown: "Refused: <reason>".
QString refusedText(const QString& why);

} // namespace lineward::ui
