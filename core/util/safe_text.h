// Text from a file made safe to print on a terminal: control characters shown, not obeyed.
#pragma once

#include <string>
#include <string_view>

namespace lineward {

/// `text` with every control character escaped so it prints as one inert line: C0 controls
/// (ESC, CR, LF, TAB, ...) and DEL as \xNN (\n, \r, \t for the common three), C1 controls and
/// the Unicode line and paragraph separators as \uNNNN, and bytes that are not UTF-8 as \xNN.
/// Printable text, including any other non-ASCII letter, is unchanged.
std::string escapeControls(std::string_view text);

} // namespace lineward
