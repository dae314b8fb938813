// Escaping of control characters for terminal output, with a small UTF-8 decoder.
#include "util/safe_text.h"

#include <cstdio>

namespace lineward {

namespace {

std::string hexByte(unsigned char c) {
    char buf[8];
    std::snprintf(buf, sizeof buf, "\\x%02x", c);
    return buf;
}

// Length of the valid UTF-8 sequence starting at `i` and its code point, or 0 when invalid.
std::size_t decode(std::string_view s, std::size_t i, char32_t& cp) {
    const auto b = [&](std::size_t k) { return static_cast<unsigned char>(s[i + k]); };
    const unsigned char c = b(0);
    std::size_t len = c >= 0xF0 && c <= 0xF4 ? 4 : c >= 0xE0 ? 3 : c >= 0xC2 ? 2 : 0;
    if (c >= 0xF5 || len == 0 || i + len > s.size())
        return 0;
    cp = c & (len == 2 ? 0x1F : len == 3 ? 0x0F : 0x07);
    for (std::size_t k = 1; k < len; ++k) {
        if ((b(k) & 0xC0) != 0x80)
            return 0;
        cp = (cp << 6) | (b(k) & 0x3F);
    }
    const bool overlong = (len == 3 && cp < 0x800) || (len == 4 && cp < 0x10000);
    if (overlong || cp > 0x10FFFF || (cp >= 0xD800 && cp <= 0xDFFF))
        return 0;
    return len;
}

} // namespace

std::string escapeControls(std::string_view text) {
    std::string out;
    out.reserve(text.size());
    for (std::size_t i = 0; i < text.size();) {
        const auto c = static_cast<unsigned char>(text[i]);
        if (c < 0x80) {
            if (c == '\n')
                out += "\\n";
            else if (c == '\r')
                out += "\\r";
            else if (c == '\t')
                out += "\\t";
            else if (c < 0x20 || c == 0x7F)
                out += hexByte(c);
            else
                out += static_cast<char>(c);
            ++i;
            continue;
        }
        char32_t cp = 0;
        const std::size_t len = decode(text, i, cp);
        if (len == 0) {
            out += hexByte(c);
            ++i;
            continue;
        }
        if ((cp >= 0x80 && cp <= 0x9F) || cp == 0x2028 || cp == 0x2029) {
            char buf[12];
            std::snprintf(buf, sizeof buf, "\\u%04x", static_cast<unsigned>(cp));
            out += buf;
        } else {
            out.append(text.substr(i, len));
        }
        i += len;
    }
    return out;
}

std::string inertJson(std::string_view in) {
    std::string out;
    out.reserve(in.size());
    auto u = [&](unsigned code) {
        char buf[8];
        std::snprintf(buf, sizeof buf, "\\u%04x", code);
        out += buf;
    };
    for (std::size_t i = 0; i < in.size(); ++i) {
        const auto c = static_cast<unsigned char>(in[i]);
        const auto next = [&](std::size_t k) {
            return i + k < in.size() ? static_cast<unsigned char>(in[i + k]) : 0u;
        };
        if (c == 0x7f) {
            u(0x7f);
        } else if (c == 0xc2 && next(1) >= 0x80 && next(1) <= 0x9f) {
            u(next(1)); // U+0080..U+009F
            ++i;
        } else if (c == 0xe2 && next(1) == 0x80 && (next(2) == 0xa8 || next(2) == 0xa9)) {
            u(next(2) == 0xa8 ? 0x2028 : 0x2029);
            i += 2;
        } else {
            out += static_cast<char>(c);
        }
    }
    return out;
}

} // namespace lineward
