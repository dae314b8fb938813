// DXF R12 text: group code and value on alternate lines; HEADER, TABLES (LTYPE, LAYER, STYLE)
// and ENTITIES sections, then EOF. Numbers are written in the shortest form that reads back.
#include "export/dxf_writer.h"

#include "util/safe_text.h"

#include <algorithm>
#include <charconv>
#include <cmath>
#include <stdexcept>

namespace lineward::dxf {

namespace {

std::string number(double v) {
    if (!std::isfinite(v))
        throw std::invalid_argument("DXF coordinate is not a finite number");
    if (v == 0.0)
        v = 0.0; // no "-0"
    char buf[32];
    auto [end, ec] = std::to_chars(buf, buf + sizeof buf, v);
    std::string s(buf, end);
    // A reader wants a real to look like one ("1.0", not "1").
    if (s.find_first_of(".e") == std::string::npos)
        s += ".0";
    return s;
}

void group(std::string& out, int code, std::string_view value) {
    out += std::to_string(code);
    out += '\n';
    out += value;
    out += '\n';
}

void group(std::string& out, int code, double value) {
    group(out, code, number(value));
}

void point(std::string& out, int code, Point p) {
    group(out, code, p.x);
    group(out, code + 10, p.y);
    group(out, code + 20, 0.0);
}

bool validLayerName(std::string_view name) {
    if (name.empty() || name.size() > 31)
        return false;
    return std::all_of(name.begin(), name.end(), [](char c) {
        return (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9') || c == '-' || c == '_';
    });
}

// Reads one UTF-8 sequence from valid UTF-8 (escapeControls has made it so).
char32_t nextCodePoint(std::string_view s, std::size_t& i) {
    const auto b = static_cast<unsigned char>(s[i]);
    const int len = b < 0x80 ? 1 : b < 0xE0 ? 2 : b < 0xF0 ? 3 : 4;
    char32_t cp = len == 1 ? b : len == 2 ? (b & 0x1F) : len == 3 ? (b & 0x0F) : (b & 0x07);
    for (int k = 1; k < len && i + k < s.size(); ++k)
        cp = (cp << 6) | (static_cast<unsigned char>(s[i + k]) & 0x3F);
    i += len;
    return cp;
}

} // namespace

std::string encodeText(std::string_view utf8) {
    const std::string safe = escapeControls(utf8);
    std::string out;
    out.reserve(safe.size());
    for (std::size_t i = 0; i < safe.size();) {
        const char32_t cp = nextCodePoint(safe, i);
        if (cp >= 0x20 && cp < 0x7F) {
            out += static_cast<char>(cp);
        } else {
            // DXF's escape has four hex digits; a character beyond the basic plane has no
            // escape in R12 and is shown as the replacement character.
            const unsigned v = cp > 0xFFFF ? 0xFFFD : static_cast<unsigned>(cp);
            char buf[8];
            static constexpr char hex[] = "0123456789ABCDEF";
            for (int k = 0; k < 4; ++k)
                buf[k] = hex[(v >> (12 - 4 * k)) & 0xF];
            out += "\\U+";
            out.append(buf, 4);
        }
    }
    return out;
}

void DxfWriter::addLayer(std::string_view name, Aci colour) {
    if (!validLayerName(name))
        throw std::invalid_argument("DXF layer name not allowed in R12: " + escapeControls(name));
    m_layers.push_back({std::string(name), colour});
}

void DxfWriter::requireLayer(std::string_view layer) const {
    for (const auto& l : m_layers)
        if (l.name == layer)
            return;
    throw std::logic_error("DXF entity on an undeclared layer: " + std::string(layer));
}

void DxfWriter::line(std::string_view layer, Point a, Point b) {
    requireLayer(layer);
    group(m_entities, 0, "LINE");
    group(m_entities, 8, layer);
    point(m_entities, 10, a);
    point(m_entities, 11, b);
    ++m_entityCount;
}

void DxfWriter::circle(std::string_view layer, Point centre, double radius) {
    requireLayer(layer);
    group(m_entities, 0, "CIRCLE");
    group(m_entities, 8, layer);
    point(m_entities, 10, centre);
    group(m_entities, 40, radius);
    ++m_entityCount;
}

void DxfWriter::polyline(std::string_view layer, const std::vector<Point>& points, bool closed,
                         double width, Aci colour) {
    requireLayer(layer);
    if (points.size() < 2)
        return;
    // R12 has no lightweight polyline: a POLYLINE header, one VERTEX each, then SEQEND.
    group(m_entities, 0, "POLYLINE");
    group(m_entities, 8, layer);
    if (colour != 256)
        group(m_entities, 62, std::to_string(colour));
    group(m_entities, 66, "1");
    point(m_entities, 10, Point{});
    group(m_entities, 70, closed ? "1" : "0");
    if (width > 0) {
        group(m_entities, 40, width);
        group(m_entities, 41, width);
    }
    for (const auto& p : points) {
        group(m_entities, 0, "VERTEX");
        group(m_entities, 8, layer);
        point(m_entities, 10, p);
    }
    group(m_entities, 0, "SEQEND");
    group(m_entities, 8, layer);
    ++m_entityCount;
}

void DxfWriter::text(std::string_view layer, Point at, double height, std::string_view utf8,
                     Aci colour) {
    requireLayer(layer);
    group(m_entities, 0, "TEXT");
    group(m_entities, 8, layer);
    if (colour != 256)
        group(m_entities, 62, std::to_string(colour));
    point(m_entities, 10, at);
    group(m_entities, 40, height);
    group(m_entities, 1, encodeText(utf8));
    ++m_entityCount;
}

std::string DxfWriter::finish(Point extMin, Point extMax, int insUnits) const {
    std::string out;
    out.reserve(m_entities.size() + 4096);
    group(out, 0, "SECTION");
    group(out, 2, "HEADER");
    group(out, 9, "$ACADVER");
    group(out, 1, "AC1009");
    group(out, 9, "$INSBASE");
    point(out, 10, Point{});
    group(out, 9, "$EXTMIN");
    point(out, 10, extMin);
    group(out, 9, "$EXTMAX");
    point(out, 10, extMax);
    // Later releases read the drawing's unit from $INSUNITS; R12 readers skip what they do not
    // know, and the title block states the unit in words as well.
    group(out, 9, "$INSUNITS");
    group(out, 70, std::to_string(insUnits));
    group(out, 0, "ENDSEC");

    group(out, 0, "SECTION");
    group(out, 2, "TABLES");
    group(out, 0, "TABLE");
    group(out, 2, "LTYPE");
    group(out, 70, "1");
    group(out, 0, "LTYPE");
    group(out, 2, "CONTINUOUS");
    group(out, 70, "0");
    group(out, 3, "Solid line");
    group(out, 72, "65");
    group(out, 73, "0");
    group(out, 40, 0.0);
    group(out, 0, "ENDTAB");
    group(out, 0, "TABLE");
    group(out, 2, "LAYER");
    group(out, 70, std::to_string(m_layers.size() + 1));
    auto layer = [&out](std::string_view name, Aci colour) {
        group(out, 0, "LAYER");
        group(out, 2, name);
        group(out, 70, "0");
        group(out, 62, std::to_string(colour));
        group(out, 6, "CONTINUOUS");
    };
    layer("0", 7); // every DXF drawing has layer 0
    for (const auto& l : m_layers)
        layer(l.name, l.colour);
    group(out, 0, "ENDTAB");
    group(out, 0, "TABLE");
    group(out, 2, "STYLE");
    group(out, 70, "1");
    group(out, 0, "STYLE");
    group(out, 2, "STANDARD");
    group(out, 70, "0");
    group(out, 40, 0.0);
    group(out, 41, 1.0);
    group(out, 50, 0.0);
    group(out, 71, "0");
    group(out, 42, 0.2);
    group(out, 3, "txt");
    group(out, 4, "");
    group(out, 0, "ENDTAB");
    group(out, 0, "ENDSEC");

    group(out, 0, "SECTION");
    group(out, 2, "BLOCKS");
    group(out, 0, "ENDSEC");

    group(out, 0, "SECTION");
    group(out, 2, "ENTITIES");
    out += m_entities;
    group(out, 0, "ENDSEC");
    group(out, 0, "EOF");
    return out;
}

} // namespace lineward::dxf
