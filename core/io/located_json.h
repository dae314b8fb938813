// Parses JSON text with nlohmann-json while remembering where each key and element starts, so
// that errors found after parsing can still name a line and column.
#pragma once

#include <cstddef>
#include <nlohmann/json.hpp>
#include <optional>
#include <string>
#include <string_view>
#include <unordered_map>

namespace lineward::io {

/// Line and column (both from 1) of a byte offset in a text.
struct TextPos {
    int line = 1, column = 1;
};
TextPos textPosition(std::string_view text, std::size_t offset);

/// Bounds that protect the parser from hostile input.
struct JsonLimits {
    std::size_t maxDepth = 16;
    std::size_t maxStringBytes = 65536;
    /// Record the offset of every key and element (costly; needed only to place an error).
    bool recordOffsets = true;
};

/// A parsed document with the byte offset of every key ("/parts/3/hp") and array element
/// ("/parts/3").
struct LocatedJson {
    nlohmann::json root;
    std::unordered_map<std::string, std::size_t> offsets;
    /// Offset of the pointer, or of its nearest located parent.
    std::size_t offsetOf(std::string pointer) const;
};

/// A syntax or limit error with its byte offset.
struct JsonSyntaxError {
    std::size_t offset = 0;
    std::string message;
};

/// Parses `text`; on failure fills `error` and returns nothing. Duplicate keys are refused.
std::optional<LocatedJson> parseLocated(std::string_view text, const JsonLimits& limits,
                                        JsonSyntaxError& error);

} // namespace lineward::io
