// Field specifications: the ratings each part kind carries, with units and accepted ranges.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <variant>
#include <vector>

namespace lineward {

/// The value of one rating: absent, a number, a flag or a word from a fixed list.
using FieldValue = std::variant<std::monostate, double, bool, std::string>;

enum class FieldType { Number, Integer, Flag, Choice, Text };

/// One rating of a part kind: its key in the file, label and unit for people, and its limits.
struct FieldSpec {
    std::string_view key;
    std::string_view label;
    std::string_view unit; ///< empty where the value has no unit
    FieldType type = FieldType::Number;
    double minValue = 0.0;     ///< smallest accepted value (Number/Integer)
    double maxValue = 0.0;     ///< largest accepted value (Number/Integer)
    bool minExclusive = false; ///< true where the minimum itself is refused (e.g. 0 kVA)
    bool required = false;     ///< a drawing without it is refused
    FieldValue defaultValue = {};
    std::vector<std::string_view> choices = {}; ///< accepted words (Choice)
    std::string_view help = {};
    /// Unit and scale people edit the value in, where it differs from the file's (the file keeps
    /// a source's voltage in kV; the Inspector shows every voltage in V).
    std::string_view shownUnit = {};
    double shownScale = 1.0;
};

/// How a message names a rating: by its file key (loader, command line) or by its label and
/// unit (the editor: "Rated output (hp)").
enum class FieldNaming { Key, People };

/// The rating's name as `naming` asks: "hp", or "Rated output (hp)".
std::string fieldName(const FieldSpec& spec, FieldNaming naming);
/// The unit people see for the rating (shownUnit, else unit).
std::string_view peopleUnit(const FieldSpec& spec);
/// Words people read for a choice value ("squirrel_cage" → "squirrel cage"); other values as
/// they are.
std::string_view choiceLabel(std::string_view choice);

/// Checks one value against its spec. Returns the reason it is refused, or nothing when accepted.
std::optional<std::string> validateField(const FieldSpec& spec, const FieldValue& value,
                                         FieldNaming naming = FieldNaming::Key);

/// Shortest text that reads back to the same number, in plain digits from 1e-6 to 1e15
/// (messages and the Inspector; the file writer formats its own numbers).
std::string formatNumber(double v);


} // namespace lineward
