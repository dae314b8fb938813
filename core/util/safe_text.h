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

/// Serialised JSON (UTF-8, its C0 controls already escaped by the serialiser) made inert on a
/// terminal too: DEL, the C1 controls and the Unicode line and paragraph separators become
/// \uNNNN escapes, which mean the same characters to a JSON reader. Everything else is kept.
std::string inertJson(std::string_view dumped);

} // namespace lineward
