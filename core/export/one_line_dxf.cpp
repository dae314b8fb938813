// Lays the drawing out as the Sheet does (symbols at their places and rotations, bus bars
// spanning the parts wired to them, wires leaving terminals vertically and crossing at
// mid-height) and writes it with DxfWriter, in inches with y up.
#include "export/one_line_dxf.h"

#include "export/dxf_symbols.h"
#include "export/dxf_writer.h"
#include "io/drawing_file.h"

#include <algorithm>
#include <cmath>
#include <limits>
#include <numbers>
#include <unordered_map>

namespace lineward::dxf {

namespace {

constexpr double kHalf = 20.0;        // terminals 20 Sheet units above and below the centre
constexpr double kTagHeight = 8.0;    // Sheet units; the Sheet's tag is 10-unit bold type
constexpr double kRatingHeight = 3.5; // small enough that a column of ratings fits its part
constexpr double kRatingStep = 5.0;
constexpr double kLabelGap = 8.0;

const std::unordered_map<std::string_view, Aci>& layerColours() {
    // Ours: parts black/white (7), wires grey, ratings dark grey, badges red, buckets cyan.
    static const std::unordered_map<std::string_view, Aci> c{{kWireLayer, 8},     {kTagLayer, 7},
                                                             {kRatingLayer, 251}, {kBadgeLayer, 1},
                                                             {kBucketLayer, 4},   {kTitleLayer, 7}};
    return c;
}

Aci severityAci(Severity s) {
    switch (s) {
    case Severity::Violation:
        return 1; // red
    case Severity::Caution:
        return 30; // orange
    case Severity::Note:
        return 5; // blue
    }
    return 7;
}

// Sheet coordinates (y down, 0.1 in) to DXF (inches, y up).
Point out(SymbolPoint p) {
    return {p.x * kInchesPerSheetUnit, -p.y * kInchesPerSheetUnit};
}

struct Frame {
    double x, y, c, s; // position and rotation of a part
    SymbolPoint toSheet(SymbolPoint l) const {
        return {x + l.x * c - l.y * s, y + l.x * s + l.y * c};
    }
    SymbolPoint toLocal(SymbolPoint p) const {
        const double dx = p.x - x, dy = p.y - y;
        return {dx * c + dy * s, -dx * s + dy * c};
    }
};

Frame frameOf(const Part& p) {
    const double a = p.rotation * std::numbers::pi / 180.0;
    // Quarter turns exactly: no 1e-16 crumbs in the coordinates.
    const double c = std::round(std::cos(a) * 1e12) / 1e12,
                 s = std::round(std::sin(a) * 1e12) / 1e12;
    return {p.x, p.y, c, s};
}

struct Extents {
    double minX = std::numeric_limits<double>::max(), minY = minX;
    double maxX = std::numeric_limits<double>::lowest(), maxY = maxX;
    void add(SymbolPoint p) {
        minX = std::min(minX, p.x);
        minY = std::min(minY, p.y);
        maxX = std::max(maxX, p.x);
        maxY = std::max(maxY, p.y);
    }
    bool empty() const { return minX > maxX; }
};

class Layout {
public:
    Layout(const CheckResult& r, DxfWriter& w) : m_d(*r.drawing), m_r(r), m_w(w) {}

    void run() {
        computeBusSpans();
        for (const auto& p : m_d.parts())
            drawPart(p);
        for (const auto& wire : m_d.wires())
            drawWire(wire);
        drawBadges();
        drawBuckets();
        drawTitleBlock();
    }
    const Extents& extents() const { return m_ext; }

private:
    void computeBusSpans() {
        for (const auto& w : m_d.wires())
            for (auto [bus, other] : {std::pair{w.a, w.b}, std::pair{w.b, w.a}}) {
                const Part* b = m_d.part(bus.part);
                const Part* o = m_d.part(other.part);
                if (!b || !o || b->kind != PartKind::Bus || o->kind == PartKind::Bus)
                    continue;
                const double x = frameOf(*b).toLocal(terminal(*o, other.terminal, {})).x;
                auto [it, fresh] = m_span.try_emplace(bus.part, x, x);
                it->second.first = std::min(it->second.first, x);
                it->second.second = std::max(it->second.second, x);
            }
    }

    std::pair<double, double> barSpan(const Part& bus) const {
        auto it = m_span.find(bus.id);
        return it == m_span.end() ? std::pair{-60.0, 60.0}
                                  : std::pair{it->second.first - 30, it->second.second + 30};
    }

    SymbolPoint terminal(const Part& p, int t, SymbolPoint toward) const {
        const Frame f = frameOf(p);
        if (p.kind == PartKind::Bus) {
            const auto [l, r] = barSpan(p);
            return f.toSheet({std::clamp(f.toLocal(toward).x, l, r), 0});
        }
        if (isTwoTerminal(p.kind))
            return f.toSheet({0, t == 0 ? -kHalf : kHalf});
        return f.toSheet({0, p.kind == PartKind::Source ? kHalf : -kHalf});
    }

    // The symbol's box in Sheet coordinates, upright (as the Sheet's uprightSymbolRect).
    std::pair<SymbolPoint, SymbolPoint> symbolBox(const Part& p) const {
        const Frame f = frameOf(p);
        std::vector<SymbolPoint> corners;
        if (p.kind == PartKind::Bus) {
            const auto [l, r] = barSpan(p);
            corners = {{l, -6}, {r, -6}, {r, 6}, {l, 6}};
        } else {
            corners = {{-16, -22}, {16, -22}, {16, 22}, {-16, 22}};
        }
        SymbolPoint lo{1e300, 1e300}, hi{-1e300, -1e300};
        for (auto c : corners) {
            const auto s = f.toSheet(c);
            lo = {std::min(lo.x, s.x), std::min(lo.y, s.y)};
            hi = {std::max(hi.x, s.x), std::max(hi.y, s.y)};
        }
        return {lo, hi};
    }

    void poly(std::string_view layer, const std::vector<SymbolPoint>& pts, bool closed,
              double width = 0, Aci colour = 256) {
        std::vector<Point> o;
        for (auto p : pts) {
            o.push_back(out(p));
            m_ext.add(p);
        }
        m_w.polyline(layer, o, closed, width * kInchesPerSheetUnit, colour);
    }

    void text(std::string_view layer, SymbolPoint at, double height, std::string_view s,
              Aci colour = 256) {
        m_ext.add(at);
        m_ext.add({at.x + height * 0.7 * static_cast<double>(s.size()), at.y - height});
        m_w.text(layer, out(at), height * kInchesPerSheetUnit, s, colour);
    }

    void drawPart(const Part& p) {
        const std::string layer = partLayer(p.kind);
        const Frame f = frameOf(p);
        if (p.kind == PartKind::Bus) {
            const auto [l, r] = barSpan(p);
            poly(layer, {f.toSheet({l, 0}), f.toSheet({r, 0})}, false, 6.0);
        } else {
            for (const auto& s : symbolStrokes(p.kind))
                drawStroke(layer, f, s);
        }
        if (p.isOpen()) // an open switching device: the Sheet's bold gap mark
            poly(layer, {f.toSheet({-12, 12}), f.toSheet({12, -12})}, false, 2.2);
        // Tag and ratings to the right of the symbol, read upright.
        const auto [lo, hi] = symbolBox(p);
        const double x = hi.x + kLabelGap;
        double y = (lo.y + hi.y) / 2 - 2;
        text(kTagLayer, {x, y}, kTagHeight, p.tag);
        auto lines = ratingLines(p);
        if (p.isOpen())
            lines.insert(lines.begin(), "open");
        for (const auto& line : lines) {
            y += kRatingStep;
            text(kRatingLayer, {x, y}, kRatingHeight, line);
        }
    }

    void drawStroke(const std::string& layer, const Frame& f, const Stroke& s) {
        auto place = [&](SymbolPoint l) {
            if (!s.upright)
                return f.toSheet(l);
            // Turned with the part about the letter's centre, the letter itself kept upright.
            const SymbolPoint c = f.toSheet(s.uprightCentre);
            return SymbolPoint{c.x + l.x - s.uprightCentre.x, c.y + l.y - s.uprightCentre.y};
        };
        if (s.radius > 0) {
            const SymbolPoint c = place(s.centre);
            m_ext.add({c.x - s.radius, c.y - s.radius});
            m_ext.add({c.x + s.radius, c.y + s.radius});
            m_w.circle(layer, out(c), s.radius * kInchesPerSheetUnit);
            return;
        }
        std::vector<SymbolPoint> pts;
        for (auto p : s.points)
            pts.push_back(place(p));
        poly(layer, pts, s.closed);
    }

    void drawWire(const Wire& w) {
        const Part* a = m_d.part(w.a.part);
        const Part* b = m_d.part(w.b.part);
        if (!a || !b)
            return;
        const SymbolPoint pa = terminal(*a, w.a.terminal, terminal(*b, w.b.terminal, {}));
        const SymbolPoint pb = terminal(*b, w.b.terminal, pa);
        if (std::abs(pa.x - pb.x) < 1e-9 || std::abs(pa.y - pb.y) < 1e-9) {
            poly(kWireLayer, {pa, pb}, false);
        } else {
            const double midY = (pa.y + pb.y) / 2;
            poly(kWireLayer, {pa, {pa.x, midY}, {pb.x, midY}, pb}, false);
        }
    }

    void drawBadges() {
        std::unordered_map<PartId, Severity> worst;
        for (const auto& f : m_r.report.findings) {
            if (f.accepted)
                continue;
            for (auto id : f.parts) {
                auto [it, fresh] = worst.try_emplace(id, f.severity);
                if (f.severity > it->second)
                    it->second = f.severity;
            }
        }
        for (const auto& p : m_d.parts()) {
            auto it = worst.find(p.id);
            if (it == worst.end())
                continue;
            const auto [lo, hi] = symbolBox(p);
            const SymbolPoint at = p.kind == PartKind::Bus ? SymbolPoint{hi.x + 2, lo.y - 6}
                                                           : SymbolPoint{hi.x - 2, lo.y + 8};
            const Aci colour = severityAci(it->second);
            // Our badge shapes, as on the Sheet: octagon, diamond, circle.
            std::vector<SymbolPoint> shape;
            const double r = 6.5;
            if (it->second == Severity::Violation) {
                for (int i = 0; i < 8; ++i) {
                    const double a = (22.5 + 45.0 * i) * std::numbers::pi / 180;
                    shape.push_back({at.x + r * std::cos(a), at.y + r * std::sin(a)});
                }
            } else if (it->second == Severity::Caution) {
                shape = {{at.x, at.y - r}, {at.x + r, at.y}, {at.x, at.y + r}, {at.x - r, at.y}};
            } else {
                for (int i = 0; i < 16; ++i) {
                    const double a = 22.5 * i * std::numbers::pi / 180;
                    shape.push_back({at.x + r * 0.85 * std::cos(a), at.y + r * 0.85 * std::sin(a)});
                }
            }
            poly(kBadgeLayer, shape, true, 0, colour);
            text(kBadgeLayer, {at.x + r + 1, at.y - r}, kRatingHeight,
                 std::string(severityName(it->second)), colour);
        }
    }

    void drawBuckets() {
        for (const auto& b : m_d.buckets()) {
            Extents e;
            for (auto id : b.parts)
                if (const Part* p = m_d.part(id)) {
                    const auto [lo, hi] = symbolBox(*p);
                    e.add(lo);
                    e.add(hi);
                }
            if (e.empty())
                continue;
            const double l = e.minX - 10, t = e.minY - 12, r = e.maxX + 60, btm = e.maxY + 4;
            poly(kBucketLayer, {{l, t}, {r, t}, {r, btm}, {l, btm}}, true);
            text(kBucketLayer, {l + 2, t - 2}, kRatingHeight, b.tag);
        }
    }

    void drawTitleBlock() {
        // Below the drawing, flush with its right edge: 420 x 118 Sheet units (42 x 11.8 in).
        const double w = 420, h = 118;
        const double right = m_ext.empty() ? w : m_ext.maxX;
        const double top = (m_ext.empty() ? 0 : m_ext.maxY) + 40;
        const double left = right - w;
        poly(kTitleLayer, {{left, top}, {right, top}, {right, top + h}, {left, top + h}}, true);
        poly(kTitleLayer, {{left, top + 28}, {right, top + 28}}, false);
        const SheetInfo& s = m_d.sheet;
        text(kTitleLayer, {left + 6, top + 20}, 12, s.title.empty() ? "One-line diagram" : s.title);
        std::string rev = s.revisions.empty() ? "-" : s.revisions.back().rev;
        const std::vector<std::string> rows = {
            "Project: " + s.project,
            "Drawing no.: " + s.drawingNo + "    Revision: " + rev,
            "Drawn by: " + s.drawnBy + "    Checked by: " + s.checkedBy,
            "Rules: " + s.ruleSet + "    Units: inches, scale 1:1 (Sheet grid 0.1 in)",
            "Checked with Lineward. It supports and does not replace a licensed engineer;",
            "the authority having jurisdiction has the final word."};
        double y = top + 40;
        for (const auto& row : rows) {
            text(kTitleLayer, {left + 6, y}, 5.5, row);
            y += 13;
        }
    }

    const Drawing& m_d;
    const CheckResult& m_r;
    DxfWriter& m_w;
    Extents m_ext;
    std::unordered_map<PartId, std::pair<double, double>> m_span;
};

std::string upper(std::string_view s) {
    std::string u(s);
    for (auto& c : u)
        if (c >= 'a' && c <= 'z')
            c = static_cast<char>(c - 'a' + 'A');
    return u;
}

std::string valueText(const FieldSpec& spec, const FieldValue& v) {
    if (const auto* d = std::get_if<double>(&v)) {
        std::string t = formatNumber(*d);
        if (!spec.unit.empty())
            t += " " + std::string(spec.unit);
        return t;
    }
    if (const auto* b = std::get_if<bool>(&v))
        return *b ? "yes" : "no";
    if (const auto* s = std::get_if<std::string>(&v))
        return *s;
    return {};
}

} // namespace

std::string partLayer(PartKind kind) {
    return "LW-PART-" + upper(kindInfo(kind).key);
}

std::vector<std::string> allLayers() {
    std::vector<std::string> all;
    for (int k = 0; k < kPartKindCount; ++k)
        all.push_back(partLayer(static_cast<PartKind>(k)));
    for (auto l : {kWireLayer, kTagLayer, kRatingLayer, kBadgeLayer, kBucketLayer, kTitleLayer})
        all.emplace_back(l);
    return all;
}

std::vector<std::string> ratingLines(const Part& part) {
    std::vector<std::string> lines;
    const auto fields = kindInfo(part.kind).fields;
    for (std::size_t i = 0; i < fields.size() && i < part.values.size(); ++i) {
        if (std::holds_alternative<std::monostate>(part.values[i]))
            continue;
        lines.push_back(std::string(fields[i].key) + " = " + valueText(fields[i], part.values[i]));
    }
    return lines;
}

std::string oneLineDxf(const CheckResult& result) {
    DxfWriter w;
    for (const auto& l : allLayers()) {
        auto it = layerColours().find(l);
        w.addLayer(l, it == layerColours().end() ? 7 : it->second);
    }
    Layout layout(result, w);
    layout.run();
    const Extents& e = layout.extents();
    // Sheet y grows downward: the DXF's lowest y is the Sheet's largest.
    return w.finish(out({e.minX, e.maxY}), out({e.maxX, e.minY}), 1);
}

std::optional<std::string> writeOneLineDxf(const CheckResult& result,
                                           const std::filesystem::path& path) {
    std::string text;
    try {
        text = oneLineDxf(result);
    } catch (const std::exception& e) {
        return std::string("cannot lay out the DXF: ") + e.what();
    }
    return io::writeFileAtomic(path, text);
}

} // namespace lineward::dxf
