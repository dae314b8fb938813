// The .lineward file format: a versioned JSON text of our own, one part per line.
#pragma once

#include "model/drawing.h"

#include <filesystem>
#include <optional>
#include <string>
#include <string_view>

namespace lineward::io {

inline constexpr std::string_view kFormatName = "lineward";
inline constexpr int kFormatVersion = 1;

/// Bounds a file must stay within; larger input is refused before it can exhaust memory.
struct FileLimits {
    std::size_t maxFileBytes = 64u << 20;
    std::size_t maxParts = 100000;
    std::size_t maxWires = 200000;
    std::size_t maxBuckets = 20000;
    std::size_t maxListItems = 10000; ///< revisions, accepted deviations, parts in a bucket
    std::size_t maxTextBytes = 4096;
    std::size_t maxValues = 4'000'000; ///< numbers, texts, lists and objects in the whole file
};

/// Why a file was refused: where (line and column from 1) and what was expected.
struct LoadError {
    std::string file;
    int line = 0, column = 0;
    std::string message;
    /// "file:line:column: message"
    std::string text() const;
};

/// Either a drawing or the reason it could not be read.
struct LoadResult {
    std::optional<Drawing> drawing;
    std::optional<LoadError> error;
    explicit operator bool() const { return drawing.has_value(); }
};

/// Reads a drawing from JSON text. `fileName` is used only in messages.
LoadResult parseDrawing(std::string_view text, std::string_view fileName = "<text>",
                        const FileLimits& limits = {});
/// Reads a drawing from disk (size checked before reading). Never runs code or opens other files.
LoadResult loadDrawing(const std::filesystem::path& path, const FileLimits& limits = {});

/// The file text of a drawing: deterministic, so load then save gives the same bytes.
std::string serializeDrawing(const Drawing& drawing);

/// Writes `bytes` to `path` atomically: temporary file in the same folder, flush, rename.
/// Returns the reason on failure; the old file is then left as it was.
std::optional<std::string> writeFileAtomic(const std::filesystem::path& path,
                                           std::string_view bytes);
/// serializeDrawing + writeFileAtomic.
std::optional<std::string> saveDrawing(const Drawing& drawing, const std::filesystem::path& path);

} // namespace lineward::io
