// The checks every value read from a file goes through: its JSON type, its length, its range,
// and the keys an object may hold. A refused value throws a Failure naming its JSON Pointer
// and what was expected; the drawing reader turns that into a located error.
#pragma once

#include "io/drawing_file.h"

#include <cstdint>
#include <initializer_list>
#include <nlohmann/json.hpp>
#include <string>
#include <string_view>

namespace lineward::io {

using json = nlohmann::json;

/// A refused value: where (JSON Pointer) and why.
struct Failure {
    std::string pointer;
    std::string message;
};

/// The JSON type in the words a message uses ("a number", "text", "a list" ...).
const char* typeName(const json& j);

/// Text from the file as a message quotes it: cut short, so a message stays a line, however
/// long the text.
std::string cut(const std::string& s);

/// Checked reading of JSON values, within the file's limits.
class JsonChecks {
public:
    explicit JsonChecks(const FileLimits& limits) : m_limits(limits) {}

protected:
    const json& list(const json& j, const std::string& ptr, std::size_t max);
    void object(const json& j, const std::string& ptr);
    /// A key as one JSON Pointer token (RFC 6901: ~ as ~0, / as ~1), so the located error finds
    /// the key even when it holds those characters.
    static std::string pointerToken(const std::string& k);
    void checkKeys(const json& j, const std::string& ptr,
                   std::initializer_list<std::string_view> keys);
    std::string text(const json& j, const std::string& ptr);
    std::string optText(const json& obj, const std::string& ptr, const char* key);
    double number(const json& j, const std::string& ptr);
    std::uint32_t idValue(const json& j, const std::string& ptr);

    const FileLimits& m_limits;
};

} // namespace lineward::io
