// A small writer of DXF Release 12 (AC1009) text: layers, lines, circles, polylines and single
// lines of text. We write R12 ourselves rather than link a DXF library; docs/dxf.md says why.
#pragma once

#include <string>
#include <string_view>
#include <vector>

namespace lineward::dxf {

/// A point in drawing units (the one-line export uses inches, y up).
struct Point {
    double x = 0.0, y = 0.0;
};

/// AutoCAD Color Index values the export uses (1 red, 5 blue, 7 black/white, ...).
using Aci = int;

/// Collects layers and entities, then writes the whole file in one string.
class DxfWriter {
public:
    /// Declares a layer (name: A–Z, 0–9, '-', '_' only, at most 31 characters, as R12 allows;
    /// throws std::invalid_argument otherwise). Entities may only go on declared layers.
    void addLayer(std::string_view name, Aci colour);
    void line(std::string_view layer, Point a, Point b);
    void circle(std::string_view layer, Point centre, double radius);
    /// An open or closed polyline; `width` > 0 gives it a constant drawn width.
    void polyline(std::string_view layer, const std::vector<Point>& points, bool closed,
                  double width = 0.0, Aci colour = 256);
    /// One line of text, left-aligned on its baseline at `at`. `utf8` is encoded with
    /// encodeText; `colour` 256 means "by layer".
    void text(std::string_view layer, Point at, double height, std::string_view utf8,
              Aci colour = 256);
    /// Header variables: the drawing's extents and its insertion units (1 = inches).
    std::string finish(Point extMin, Point extMax, int insUnits) const;

    std::size_t entityCount() const { return m_entityCount; }

private:
    void requireLayer(std::string_view layer) const;
    struct Layer {
        std::string name;
        Aci colour;
    };
    std::vector<Layer> m_layers;
    std::string m_entities;
    std::size_t m_entityCount = 0;
};

/// Text for a DXF R12 group value: printable ASCII as it is; every other character as the
/// \U+XXXX escape DXF readers decode (an R12 file holds one code page, so this is how any tag
/// travels). Control characters and bytes that are not UTF-8 (a tag is whatever text a file
/// gave) are first shown as visible escapes (escapeControls: "\n", "\x1b"), so a value can
/// never end early or start a new group.
std::string encodeText(std::string_view utf8);

} // namespace lineward::dxf
