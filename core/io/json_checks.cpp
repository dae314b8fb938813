// Checked reading of JSON values (see json_checks.h).
#include "io/json_checks.h"

#include <cmath>

namespace lineward::io {

const char* typeName(const json& j) {
    if (j.is_null())
        return "null";
    if (j.is_boolean())
        return "true/false";
    if (j.is_number())
        return "a number";
    if (j.is_string())
        return "text";
    if (j.is_array())
        return "a list";
    return "an object";
}

std::string cut(const std::string& s) {
    constexpr std::size_t kMax = 60;
    return s.size() <= kMax ? s : s.substr(0, kMax) + "...";
}

const json& JsonChecks::list(const json& j, const std::string& ptr, std::size_t max) {
    if (!j.is_array())
        throw Failure{ptr, "expected a list, found " + std::string(typeName(j))};
    if (j.size() > max)
        throw Failure{ptr, "list has " + std::to_string(j.size()) + " items; at most " +
                               std::to_string(max) + " are accepted"};
    return j;
}

void JsonChecks::object(const json& j, const std::string& ptr) {
    if (!j.is_object())
        throw Failure{ptr, "expected an object, found " + std::string(typeName(j))};
}

// A key as one JSON Pointer token (RFC 6901: ~ as ~0, / as ~1), so the located error finds
// the key even when it holds those characters.
std::string JsonChecks::pointerToken(const std::string& k) {
    std::string t;
    for (char c : k)
        t += c == '~' ? std::string("~0") : c == '/' ? std::string("~1") : std::string(1, c);
    return t;
}

void JsonChecks::checkKeys(const json& j, const std::string& ptr,
                           std::initializer_list<std::string_view> keys) {
    for (const auto& [k, v] : j.items()) {
        bool known = false;
        for (auto key : keys)
            known = known || key == k;
        if (!known)
            throw Failure{ptr + "/" + pointerToken(k), "unknown key '" + cut(k) + "'"};
    }
}

std::string JsonChecks::text(const json& j, const std::string& ptr) {
    if (!j.is_string())
        throw Failure{ptr, "expected text, found " + std::string(typeName(j))};
    const auto& s = j.get_ref<const std::string&>();
    if (s.size() > m_limits.maxTextBytes)
        throw Failure{ptr,
                      "text is longer than " + std::to_string(m_limits.maxTextBytes) + " bytes"};
    return s;
}

std::string JsonChecks::optText(const json& obj, const std::string& ptr, const char* key) {
    return obj.contains(key) ? text(obj.at(key), ptr + "/" + key) : std::string();
}

double JsonChecks::number(const json& j, const std::string& ptr) {
    if (!j.is_number())
        throw Failure{ptr, "expected a number, found " + std::string(typeName(j))};
    const double v = j.get<double>();
    if (!std::isfinite(v))
        throw Failure{ptr, "number is out of range"};
    return v;
}

std::uint32_t JsonChecks::idValue(const json& j, const std::string& ptr) {
    const double v = number(j, ptr);
    if (v < 1 || v > 4e9 || v != std::floor(v)) {
        // Quote a whole number as written (a double would misquote 2^64 − 1).
        const std::string found =
            j.is_number_unsigned() ? std::to_string(j.get<std::uint64_t>()) : formatNumber(v);
        throw Failure{ptr, "expected a whole-number id from 1 to 4000000000, found " + found};
    }
    return static_cast<std::uint32_t>(v);
}

} // namespace lineward::io
