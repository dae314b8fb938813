// Validation of single ratings against their field specification.
#include "model/field.h"

#include <algorithm>
#include <charconv>
#include <cmath>
#include <cstdio>

namespace lineward {

std::string formatNumber(double v) {
    // Plain digits where a person reads them as such (300000, not 3e+05); exponent form only
    // for the very large and very small, where plain digits would run to hundreds.
    char buf[400];
    const double a = std::fabs(v);
    const bool plain = a == 0 || (a >= 1e-6 && a < 1e15);
    auto res = plain ? std::to_chars(buf, buf + sizeof buf, v, std::chars_format::fixed)
                     : std::to_chars(buf, buf + sizeof buf, v);
    return std::string(buf, res.ptr);
}

std::string fieldName(const FieldSpec& spec, FieldNaming naming) {
    if (naming == FieldNaming::Key)
        return std::string(spec.key);
    std::string name(spec.label);
    if (const auto unit = peopleUnit(spec); !unit.empty())
        name += " (" + std::string(unit) + ")";
    return name;
}

std::string_view peopleUnit(const FieldSpec& spec) {
    return spec.shownUnit.empty() ? spec.unit : spec.shownUnit;
}

std::string_view choiceLabel(std::string_view choice) {
    // Only the words whose file spelling is not plain English; letters, sizes and classes read
    // as they are.
    static constexpr std::pair<std::string_view, std::string_view> kWords[] = {
        {"thermal_magnetic", "thermal-magnetic"},
        {"time_delay", "time-delay"},
        {"fast", "fast-acting"},
        {"cu", "copper"},
        {"al", "aluminum"},
        {"steel", "steel conduit"},
        {"pvc", "PVC conduit"},
        {"aluminum", "aluminum conduit"},
        {"squirrel_cage", "squirrel cage"},
        {"wound_rotor", "wound rotor"},
        {"mcc", "MCC"},
    };
    for (const auto& [key, words] : kWords)
        if (key == choice)
            return words;
    return choice;
}

namespace {

constexpr std::string_view kRangeWhy =
    "no low-voltage equipment is rated outside it (check the unit and the digits)";

// Whole numbers in full (100000, not 1e+05): messages are for people.
std::string readable(double v) {
    if (v == std::floor(v) && std::abs(v) < 1e15) {
        char buf[32];
        std::snprintf(buf, sizeof buf, "%.0f", v);
        return buf;
    }
    return formatNumber(v);
}

std::string withUnit(const FieldSpec& spec, double v, FieldNaming naming = FieldNaming::Key) {
    const bool shown = naming == FieldNaming::People && !spec.shownUnit.empty();
    std::string s = readable(shown ? v * spec.shownScale : v);
    const auto unit = shown ? spec.shownUnit : spec.unit;
    if (!unit.empty())
        s += " " + std::string(unit);
    return s;
}

std::optional<std::string> checkNumber(const FieldSpec& spec, double v, FieldNaming naming) {
    const std::string key = fieldName(spec, naming);
    auto unit = [&](double x) { return withUnit(spec, x, naming); };
    if (std::isnan(v))
        return key + " is not a number (NaN)";
    if (std::isinf(v))
        return key + " is infinite";
    if (spec.type == FieldType::Integer && v != std::floor(v))
        return key + " must be a whole number (got " + formatNumber(v) + ")";
    // The range is physical: what low-voltage motor-control equipment has. A value outside it
    // is a slip (a unit, a missing digit), and a tiny one would make the studies divide by
    // almost nothing.
    // Built only for a refusal: a valid number costs no formatting.
    auto range = [&] {
        const auto shownMin = naming == FieldNaming::People && !spec.shownUnit.empty()
                                  ? spec.minValue * spec.shownScale
                                  : spec.minValue;
        return "the accepted range is " + readable(shownMin) + " to " + unit(spec.maxValue) + ": " +
               std::string(kRangeWhy);
    };
    if (v < spec.minValue || (spec.minExclusive && v == spec.minValue)) {
        if (spec.minExclusive && spec.minValue == 0.0)
            return key + " must be greater than 0 (got " + unit(v) + "); " + range();
        return key + " " + unit(v) + " is below the smallest accepted value " +
               unit(spec.minValue) + "; " + range();
    }
    if (v > spec.maxValue)
        return key + " " + unit(v) + " is above the largest accepted value " + unit(spec.maxValue) +
               "; " + range();
    return std::nullopt;
}

} // namespace

std::optional<std::string> validateField(const FieldSpec& spec, const FieldValue& value,
                                         FieldNaming naming) {
    const std::string key = fieldName(spec, naming);
    if (std::holds_alternative<std::monostate>(value)) {
        if (spec.required)
            return key + " is required";
        return std::nullopt;
    }
    switch (spec.type) {
    case FieldType::Number:
    case FieldType::Integer:
        if (!std::holds_alternative<double>(value))
            return key + " must be a number";
        return checkNumber(spec, std::get<double>(value), naming);
    case FieldType::Flag:
        if (!std::holds_alternative<bool>(value))
            return key + " must be true or false";
        return std::nullopt;
    case FieldType::Choice: {
        if (!std::holds_alternative<std::string>(value))
            return key + " must be one of its listed words";
        const auto& s = std::get<std::string>(value);
        if (std::find(spec.choices.begin(), spec.choices.end(), s) == spec.choices.end()) {
            std::string list;
            for (auto c : spec.choices)
                list += (list.empty() ? "" : ", ") +
                        std::string(naming == FieldNaming::Key ? c : choiceLabel(c));
            const std::string shown = s.size() > 60 ? s.substr(0, 60) + "..." : s;
            return key + " '" + shown + "' is not one of: " + list;
        }
        return std::nullopt;
    }
    case FieldType::Text:
        if (!std::holds_alternative<std::string>(value))
            return key + " must be text";
        if (std::get<std::string>(value).size() > 4096)
            return key + " is longer than 4096 characters";
        return std::nullopt;
    }
    return std::nullopt;
}

} // namespace lineward
