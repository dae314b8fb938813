// A rating as people read and type it: the Inspector's, the Add Bucket dialog's and the
// multi-edit form's one way to show a value and to read typed text back into a value.
#pragma once

#include "model/field.h"

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

} // namespace lineward::ui
