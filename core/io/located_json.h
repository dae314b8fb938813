// Parses JSON text with nlohmann-json while remembering where each key and element starts, so
// that errors found after parsing can still name a line and column.
#pragma once

#include <cstddef>
#include <nlohmann/json.hpp>
#include <optional>
#include <string>
#include <string_view>
#include <unordered_map>
#include <utility>
#include <vector>

namespace lineward::io {

/// Line and column (both from 1) of a byte offset in a text.
struct TextPos {
    int line = 1, column = 1;
};
TextPos textPosition(std::string_view text, std::size_t offset);

/// Bounds that protect the parser from hostile input. All are enforced while parsing, at the
/// token that crosses them, so a huge file is refused before it is held in memory.
struct JsonLimits {
    std::size_t maxDepth = 16;
    std::size_t maxStringBytes = 65536;
    std::size_t maxKeyBytes = 256;
    /// Values of every kind (numbers, texts, lists, objects) in the whole document.
    std::size_t maxValues = 4'000'000;
    /// Items in a list not named in `listLimits`.
    std::size_t maxListItems = 200'000;
    /// Items in the lists at these places; "*" stands for any list index ("/buckets/*/parts").
    std::vector<std::pair<std::string, std::size_t>> listLimits;
    /// Record the offset of keys and elements (costly; needed only to place an error).
    bool recordOffsets = true;
    /// With recordOffsets: record only this pointer and its parents (empty: record all).
    std::string locate;
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
