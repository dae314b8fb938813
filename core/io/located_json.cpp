// SAX handler over a counting iterator: nlohmann-json tokenises, we keep the offsets.
#include "io/located_json.h"

#include <iterator>
#include <vector>

namespace lineward::io {

TextPos textPosition(std::string_view text, std::size_t offset) {
    TextPos pos;
    offset = std::min(offset, text.size());
    for (std::size_t i = 0; i < offset; ++i) {
        if (text[i] == '\n') {
            ++pos.line;
            pos.column = 1;
        } else {
            ++pos.column;
        }
    }
    return pos;
}

std::size_t LocatedJson::offsetOf(std::string pointer) const {
    while (true) {
        if (auto it = offsets.find(pointer); it != offsets.end())
            return it->second;
        auto slash = pointer.rfind('/');
        if (slash == std::string::npos || pointer.empty())
            return 0;
        pointer.resize(slash);
    }
}

namespace {

// Iterator that publishes how far the lexer has read.
class CountingIterator {
public:
    using iterator_category = std::forward_iterator_tag;
    using value_type = char;
    using difference_type = std::ptrdiff_t;
    using pointer = const char*;
    using reference = const char&;

    CountingIterator() = default;
    CountingIterator(const char* p, const char** cursor) : m_p(p), m_cursor(cursor) {}
    reference operator*() const { return *m_p; }
    CountingIterator& operator++() {
        ++m_p;
        if (m_cursor)
            *m_cursor = m_p;
        return *this;
    }
    CountingIterator operator++(int) {
        auto c = *this;
        ++*this;
        return c;
    }
    bool operator==(const CountingIterator& o) const { return m_p == o.m_p; }

private:
    const char* m_p = nullptr;
    const char** m_cursor = nullptr;
};

using json = nlohmann::json;

class LocatingSax {
public:
    LocatingSax(const char* base, const char** cursor, const JsonLimits& limits, LocatedJson& out,
                JsonSyntaxError& err)
        : m_base(base), m_cursor(cursor), m_limits(limits), m_out(out), m_err(err) {}

    bool null() { return value(json(nullptr)); }
    bool boolean(bool b) { return value(json(b)); }
    bool number_integer(json::number_integer_t v) { return value(json(v)); }
    bool number_unsigned(json::number_unsigned_t v) { return value(json(v)); }
    bool number_float(json::number_float_t v, const std::string&) { return value(json(v)); }
    bool string(std::string& s) {
        if (s.size() > m_limits.maxStringBytes)
            return fail("a text value is longer than " + std::to_string(m_limits.maxStringBytes) +
                        " bytes");
        return value(json(std::move(s)));
    }
    bool binary(json::binary_t&) { return fail("binary values are not accepted"); }
    bool start_object(std::size_t) { return open(json::object()); }
    bool start_array(std::size_t) { return open(json::array()); }
    bool end_object() { return close(); }
    bool end_array() { return close(); }
    bool key(std::string& k) {
        json* obj = m_stack.back();
        if (k.size() > m_limits.maxKeyBytes)
            return fail("a key is longer than " + std::to_string(m_limits.maxKeyBytes) + " bytes");
        if (obj->contains(k))
            return fail("duplicate key '" + k + "'");
        // The cursor sits just past the closing quote; step back over the key as written (its
        // escapes make it longer than the decoded key) to the opening quote.
        const std::size_t start = openingQuote(here());
        m_key = k;
        if (m_limits.recordOffsets)
            record(m_paths.back() + "/" + escape(k), start);
        return true;
    }
    bool parse_error(std::size_t position, const std::string&,
                     const nlohmann::detail::exception& ex) {
        m_err.offset = position > 0 ? position - 1 : 0;
        std::string msg = ex.what();
        // Drop nlohmann's "[json.exception.x.n] " tag and its own "parse error at line L,
        // column C: " prefix; we state the position ourselves.
        if (msg.rfind("[json.exception", 0) == 0)
            if (auto close = msg.find("] "); close != std::string::npos)
                msg = msg.substr(close + 2);
        if (msg.rfind("parse error", 0) == 0)
            if (auto colon = msg.find(": "); colon != std::string::npos)
                msg = msg.substr(colon + 2);
        // The parser quotes the token it stopped at, and a token can be the whole file (a
        // 60 MB number): keep the message to one readable line.
        if (msg.size() > kMaxParseMessage)
            msg = msg.substr(0, kMaxParseMessage) + "… (the rest of the token is not shown)";
        m_err.message = msg;
        return false;
    }
    static constexpr std::size_t kMaxParseMessage = 160;

    bool failed() const { return m_failed; }

private:
    std::size_t here() const { return static_cast<std::size_t>(*m_cursor - m_base); }

    // Offset of the quote that opens the string whose closing quote ends just before `end`: the
    // nearest quote not escaped (an even run of backslashes before it). Linear in the key.
    std::size_t openingQuote(std::size_t end) const {
        if (end < 2)
            return 0;
        for (std::size_t i = end - 1; i-- > 0;) {
            if (m_base[i] != '"')
                continue;
            std::size_t slashes = 0;
            while (slashes < i && m_base[i - 1 - slashes] == '\\')
                ++slashes;
            if (slashes % 2 == 0)
                return i;
        }
        return 0;
    }

    static std::string escape(const std::string& k) {
        std::string out;
        for (char c : k) {
            if (c == '~')
                out += "~0";
            else if (c == '/')
                out += "~1";
            else
                out += c;
        }
        return out;
    }

    // Records where a pointer starts, if it is one the caller asked to locate.
    void record(const std::string& path, std::size_t offset) {
        const auto& want = m_limits.locate;
        if (want.empty() ||
            (want.starts_with(path) && (want.size() == path.size() || want[path.size()] == '/')))
            m_out.offsets[path] = offset;
    }

    std::size_t listLimit(const std::string& pattern) const {
        for (const auto& [at, max] : m_limits.listLimits)
            if (at == pattern)
                return max;
        return m_limits.maxListItems;
    }

    bool fail(std::string msg) {
        m_failed = true;
        m_err.offset = here();
        m_err.message = std::move(msg);
        return false;
    }

    // Places a value in its parent; returns the new value's pointer path.
    // Returns null (after fail) when a limit is crossed.
    json* place(json v, std::string& path) {
        if (++m_values > m_limits.maxValues) {
            fail("the file holds more than " + std::to_string(m_limits.maxValues) +
                 " values; it is refused as too large");
            return nullptr;
        }
        if (m_stack.empty()) {
            m_out.root = std::move(v);
            path = "";
            return &m_out.root;
        }
        json* parent = m_stack.back();
        if (parent->is_array()) {
            if (parent->size() >= m_listLimit.back()) {
                const auto& pattern = m_patterns.back();
                fail("the list \"" + pattern.substr(pattern.rfind('/') + 1) + "\" has more than " +
                     std::to_string(m_listLimit.back()) + " items; at most " +
                     std::to_string(m_listLimit.back()) + " are accepted");
                return nullptr;
            }
            if (m_limits.recordOffsets) {
                path = m_paths.back() + "/" + std::to_string(parent->size());
                record(path, here() > 0 ? here() - 1 : 0);
            }
            parent->push_back(std::move(v));
            return &parent->back();
        }
        if (m_limits.recordOffsets)
            path = m_paths.back() + "/" + escape(m_key);
        json& slot = (*parent)[m_key];
        slot = std::move(v);
        return &slot;
    }

    bool value(json v) {
        std::string path;
        return place(std::move(v), path) != nullptr;
    }

    bool open(json container) {
        if (m_stack.size() >= m_limits.maxDepth)
            return fail("nesting is deeper than " + std::to_string(m_limits.maxDepth) + " levels");
        const bool isList = container.is_array();
        // The place with list indices as "*": what listLimits are keyed by.
        std::string pattern;
        if (!m_stack.empty())
            pattern = m_patterns.back() + "/" + (m_stack.back()->is_array() ? "*" : m_key);
        std::string path;
        json* slot = place(std::move(container), path);
        if (!slot)
            return false;
        m_stack.push_back(slot);
        m_paths.push_back(path);
        m_listLimit.push_back(isList ? listLimit(pattern) : 0);
        m_patterns.push_back(std::move(pattern));
        return true;
    }

    bool close() {
        m_stack.pop_back();
        m_paths.pop_back();
        m_patterns.pop_back();
        m_listLimit.pop_back();
        return true;
    }

    const char* m_base;
    const char** m_cursor;
    const JsonLimits& m_limits;
    LocatedJson& m_out;
    JsonSyntaxError& m_err;
    std::vector<json*> m_stack;
    std::vector<std::string> m_paths;
    std::vector<std::string> m_patterns;
    std::vector<std::size_t> m_listLimit;
    std::size_t m_values = 0;
    std::string m_key;
    bool m_failed = false;
};

} // namespace

std::optional<LocatedJson> parseLocated(std::string_view text, const JsonLimits& limits,
                                        JsonSyntaxError& error) {
    LocatedJson out;
    const char* base = text.data();
    const char* cursor = base;
    LocatingSax sax(base, &cursor, limits, out, error);
    CountingIterator first(base, &cursor), last(base + text.size(), nullptr);
    const bool ok = json::sax_parse(first, last, &sax, json::input_format_t::json, true, false);
    if (!ok)
        return std::nullopt;
    return out;
}

} // namespace lineward::io
