// Validation of single ratings against their field specification.
#include "model/field.h"

#include <algorithm>
#include <charconv>
#include <cmath>
#include <cstdio>

namespace lineward {

std::string formatNumber(double v) {
    char buf[64];
    auto res = std::to_chars(buf, buf + sizeof buf, v);
    return std::string(buf, res.ptr);
}

namespace {

constexpr std::string_view kRangeWhy =
    "no low-voltage equipment is rated outside it (check the unit: V or kV, VA or kVA)";

// Whole numbers in full (100000, not 1e+05): messages are for people.
std::string readable(double v) {
    if (v == std::floor(v) && std::abs(v) < 1e15) {
        char buf[32];
        std::snprintf(buf, sizeof buf, "%.0f", v);
        return buf;
    }
    return formatNumber(v);
}

std::string withUnit(const FieldSpec& spec, double v) {
    std::string s = readable(v);
    if (!spec.unit.empty())
        s += " " + std::string(spec.unit);
    return s;
}

std::optional<std::string> checkNumber(const FieldSpec& spec, double v) {
    const std::string key(spec.key);
    if (std::isnan(v))
        return key + " is not a number (NaN)";
    if (std::isinf(v))
        return key + " is infinite";
    if (spec.type == FieldType::Integer && v != std::floor(v))
        return key + " must be a whole number (got " + formatNumber(v) + ")";
    // The range is physical: what low-voltage motor-control equipment has. A value outside it
    // is a slip (a unit, a missing digit), and a tiny one would make the studies divide by
    // almost nothing.
    const std::string range = "the accepted range is " + readable(spec.minValue) + " to " +
                              withUnit(spec, spec.maxValue) + ": " + std::string(kRangeWhy);
    if (v < spec.minValue || (spec.minExclusive && v == spec.minValue)) {
        if (spec.minExclusive && spec.minValue == 0.0)
            return key + " must be greater than 0 (got " + withUnit(spec, v) + "); " + range;
        return key + " " + withUnit(spec, v) + " is below the smallest accepted value " +
               withUnit(spec, spec.minValue) + "; " + range;
    }
    if (v > spec.maxValue)
        return key + " " + withUnit(spec, v) + " is above the largest accepted value " +
               withUnit(spec, spec.maxValue) + "; " + range;
    return std::nullopt;
}

} // namespace

std::optional<std::string> validateField(const FieldSpec& spec, const FieldValue& value) {
    const std::string key(spec.key);
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
        return checkNumber(spec, std::get<double>(value));
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
                list += (list.empty() ? "" : ", ") + std::string(c);
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

std::string describeValue(const FieldSpec& spec, const FieldValue& value) {
    if (auto d = std::get_if<double>(&value))
        return withUnit(spec, *d);
    if (auto b = std::get_if<bool>(&value))
        return *b ? "yes" : "no";
    if (auto s = std::get_if<std::string>(&value))
        return *s;
    return "(none)";
}

} // namespace lineward
