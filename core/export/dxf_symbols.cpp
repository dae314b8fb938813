// Symbol strokes transcribed from resources/symbols/*.svg; the test
// DxfSymbols.MatchTheSheetSymbolFiles reads those files and fails when the two differ.
#include "export/dxf_symbols.h"

#include <array>

namespace lineward::dxf {

namespace {

Stroke line(double x1, double y1, double x2, double y2) {
    return Stroke{{{x1, y1}, {x2, y2}}};
}

Stroke rect(double x, double y, double w, double h) {
    return Stroke{{{x, y}, {x + w, y}, {x + w, y + h}, {x, y + h}}, true};
}

Stroke circle(double cx, double cy, double r) {
    Stroke s;
    s.centre = {cx, cy};
    s.radius = r;
    return s;
}

Stroke path(std::vector<SymbolPoint> pts, bool closed = false) {
    return Stroke{std::move(pts), closed};
}

// A cubic Bézier from p0 to p3 as 12 straight pieces (appended after p0).
void cubic(std::vector<SymbolPoint>& pts, SymbolPoint p0, SymbolPoint c1, SymbolPoint c2,
           SymbolPoint p3) {
    constexpr int kPieces = 12; // finer than a printed line at symbol size
    for (int i = 1; i <= kPieces; ++i) {
        const double t = double(i) / kPieces, u = 1 - t;
        pts.push_back(
            {u * u * u * p0.x + 3 * u * u * t * c1.x + 3 * u * t * t * c2.x + t * t * t * p3.x,
             u * u * u * p0.y + 3 * u * u * t * c1.y + 3 * u * t * t * c2.y + t * t * t * p3.y});
    }
}

Stroke curve(SymbolPoint start, std::initializer_list<std::array<SymbolPoint, 3>> pieces) {
    Stroke s{{start}};
    SymbolPoint at = start;
    for (const auto& c : pieces) {
        cubic(s.points, at, c[0], c[1], c[2]);
        at = c[2];
    }
    return s;
}

std::vector<Stroke> strokesOf(PartKind kind) {
    switch (kind) {
    case PartKind::Source:
        return {circle(0, -2, 13),
                curve({-8, -2}, {{{{-6, -9}, {-2, -9}, {0, -2}}}, {{{2, 5}, {6, 5}, {8, -2}}}}),
                line(0, 11, 0, 20)};
    case PartKind::Transformer:
        return {line(0, -20, 0, -18), circle(0, -7, 11), circle(0, 7, 11), line(0, 18, 0, 20)};
    case PartKind::Bus:
        return {line(-20, 0, 20, 0)};
    case PartKind::Breaker:
        return {line(0, -20, 0, -9), rect(-9, -9, 18, 18), line(0, 9, 0, 20)};
    case PartKind::InstBreaker:
        return {line(0, -20, 0, -9), rect(-9, -9, 18, 18),
                path({{2, -6}, {-3, 1}, {2, 1}, {-2, 7}}), line(0, 9, 0, 20)};
    case PartKind::Fuse:
        return {line(0, -20, 0, 20), rect(-5, -11, 10, 22)};
    case PartKind::Disconnect:
        return {line(0, -20, 0, -8), line(0, 8, -4, -8), line(0, 8, 0, 20), circle(0, 8, 1.2)};
    case PartKind::Contactor:
        return {line(0, -20, 0, -8), line(-8, -8, 8, -8), line(0, 8, -3, -6), line(-8, 8, 8, 8),
                line(0, 8, 0, 20)};
    case PartKind::Overload:
        return {line(0, -20, 0, -8),
                curve({0, -8}, {{{{8, -8}, {8, 0}, {0, 0}}}, {{{-8, 0}, {-8, 8}, {0, 8}}}}),
                line(0, 8, 0, 20)};
    case PartKind::Vfd:
        return {
            line(0, -20, 0, -10),
            rect(-11, -10, 22, 20),
            line(-11, 10, 11, -10),
            curve({-8, -5}, {{{{-7, -9}, {-5, -9}, {-4, -5}}}, {{{-3, -1}, {-1, -1}, {0, -5}}}}),
            line(2, 4, 8, 4),
            line(2, 7, 8, 7),
            line(0, 10, 0, 20)};
    case PartKind::SoftStarter:
        return {line(0, -20, 0, -10),
                rect(-11, -10, 22, 20),
                path({{-8, 6}, {-3, 6}, {4, -5}, {8, -5}}),
                path({{0, -14}, {15, -14}, {15, -4}}),
                line(12, -4, 18, -4),
                line(15, 5, 13, -2),
                path({{15, 5}, {15, 14}, {0, 14}}),
                line(0, 10, 0, 20)};
    case PartKind::Cable:
        return {line(0, -20, 0, 20), line(-6, -4, 6, 2), line(-6, 1, 6, 7)};
    case PartKind::Motor: {
        Stroke m = path({{-6, 14}, {-6, 2}, {0, 9}, {6, 2}, {6, 14}});
        m.upright = true;
        m.uprightCentre = {0, 8};
        return {line(0, -20, 0, -6), circle(0, 8, 13), m};
    }
    case PartKind::Load:
        return {line(0, -20, 0, -4), path({{-10, -4}, {10, -4}, {0, 14}}, true)};
    }
    return {};
}

} // namespace

const std::vector<Stroke>& symbolStrokes(PartKind kind) {
    static const auto all = [] {
        std::array<std::vector<Stroke>, kPartKindCount> a;
        for (int k = 0; k < kPartKindCount; ++k)
            a[k] = strokesOf(static_cast<PartKind>(k));
        return a;
    }();
    return all[static_cast<int>(kind)];
}

} // namespace lineward::dxf
