// The table files built into the programs (resources/tables/*.csv).
#pragma once

#include <span>
#include <string_view>

namespace lineward::tables {

/// One table file: its name and its text.
struct EmbeddedFile {
    std::string_view name;
    std::string_view text;
};

std::span<const EmbeddedFile> embeddedTableFiles();

} // namespace lineward::tables
