// Lookups on the typed tables, with the code's voltage ranges for table columns.
#include "tables/tables.h"

#include <algorithm>
#include <cmath>

namespace lineward {

namespace {

// NEC 430.248/430.250 headings: listed currents apply to system ranges 110-120, 220-240,
// 440-480 and 550-600 V; 200 and 208 V have columns of their own.
std::optional<double> columnFor(double v, const std::vector<double>& columns) {
    for (double c : columns)
        if (std::abs(c - v) < 0.5)
            return c;
    const std::pair<std::pair<double, double>, double> ranges[] = {
        {{110, 120}, 115}, {{220, 240}, 230}, {{440, 480}, 460}, {{550, 600}, 575}};
    for (const auto& [range, col] : ranges)
        if (v >= range.first && v <= range.second &&
            std::find(columns.begin(), columns.end(), col) != columns.end())
            return col;
    return std::nullopt;
}

int conductorColumn(int c) {
    return c <= 60 ? 0 : c <= 75 ? 1 : 2;
}

} // namespace

namespace {
std::optional<double> hpLookup(const FlcTable& t, double hp, double ratedVolts, double* columnV) {
    auto col = columnFor(ratedVolts, t.volts);
    if (!col)
        return std::nullopt;
    const auto c =
        static_cast<std::size_t>(std::find(t.volts.begin(), t.volts.end(), *col) - t.volts.begin());
    for (std::size_t r = 0; r < t.hp.size(); ++r)
        if (std::abs(t.hp[r] - hp) < 1e-3) {
            if (columnV)
                *columnV = *col;
            return t.amps[r][c];
        }
    return std::nullopt;
}
} // namespace

std::optional<double> Tables::maxLockedRotorA(double hp, double ratedVolts, double* columnV) const {
    return hpLookup(lra3, hp, ratedVolts, columnV);
}

std::optional<double> Tables::flc(double hp, double ratedVolts, int phases, double* columnV,
                                  bool synchronous) const {
    const FlcTable& t = phases == 1 ? flc1 : synchronous ? flcSync : flc3;
    return hpLookup(t, hp, ratedVolts, columnV);
}

const ScpdRow& Tables::scpdRow(MotorType m) const {
    for (const auto& r : scpd)
        if (r.motor == m)
            return r;
    return scpd.front();
}

std::optional<double> Tables::codeLetterKvaPerHp(char letter) const {
    for (const auto& [l, range] : codeLetters)
        if (l == letter)
            return range[1];
    return std::nullopt;
}

std::optional<double> Tables::ampacityAt(const std::string& size, Material m, int columnC) const {
    for (const auto& r : ampacity)
        if (r.size == size)
            return (m == Material::Cu ? r.cu : r.al)[conductorColumn(columnC)];
    return std::nullopt;
}

std::optional<double> Tables::ambientFactor(double ambientC, int columnC) const {
    for (const auto& [maxC, f] : ambient)
        if (ambientC <= maxC)
            return f[conductorColumn(columnC)];
    return std::nullopt;
}

double Tables::adjustmentFactor(int n) const {
    for (const auto& [upTo, pct] : adjustment)
        if (n <= upTo)
            return pct / 100.0;
    return adjustment.back().second / 100.0;
}

std::optional<double> Tables::nextStandardAtOrAbove(double amps, bool fuse) const {
    for (double s : fuse ? fuseRatings : standardRatings)
        if (s >= amps - 1e-9)
            return s;
    return std::nullopt;
}

std::optional<double> Tables::standardAtOrBelow(double amps, bool fuse) const {
    std::optional<double> best;
    for (double s : fuse ? fuseRatings : standardRatings)
        if (s <= amps + 1e-9)
            best = s;
    return best;
}

bool Tables::isStandardRating(double amps, bool fuse) const {
    const auto& list = fuse ? fuseRatings : standardRatings;
    return std::any_of(list.begin(), list.end(),
                       [&](double s) { return std::abs(s - amps) < 1e-9; });
}

std::optional<double> Tables::smallConductorLimit(const std::string& size, Material m) const {
    for (const auto& [s, mat, a] : smallConductor)
        if (s == size && mat == m)
            return a;
    return std::nullopt;
}

std::optional<std::string> Tables::egcFor(double deviceA, Material m) const {
    for (const auto& [maxA, cu, al] : egc)
        if (deviceA <= maxA + 1e-9)
            return m == Material::Cu ? cu : al;
    return std::nullopt;
}

std::optional<double> Tables::areaCmil(const std::string& size) const {
    for (const auto& [s, cmil, cu, al] : conductors)
        if (s == size)
            return cmil;
    return std::nullopt;
}

const ImpedanceRow* Tables::impedanceRow(const std::string& size) const {
    for (const auto& r : impedance)
        if (r.size == size)
            return &r;
    return nullptr;
}

const TripClassRow* Tables::tripClass(const std::string& name) const {
    for (const auto& r : tripClasses)
        if (r.name == name)
            return &r;
    return nullptr;
}

const NemaRow* Tables::nemaRow(const std::string& size) const {
    for (const auto& r : nema)
        if (r.size == size)
            return &r;
    return nullptr;
}

std::optional<double> Tables::nemaHp(const NemaRow& row, double volts, int phases) const {
    int col = 0;
    if (phases == 1)
        col = volts <= 130 ? 115 : 230;
    else if (volts >= 190 && volts <= 210)
        col = 200;
    else if (volts >= 220 && volts <= 240)
        col = 230;
    else if (volts >= 440 && volts <= 480)
        col = 460;
    else if (volts >= 550 && volts <= 600)
        col = 575;
    const auto& m = phases == 1 ? row.hp1ph : row.hp3ph;
    auto it = m.find(col);
    return it == m.end() ? std::nullopt : std::optional<double>(it->second);
}

const ApproachRow* Tables::approachFor(double systemVolts) const {
    if (!(systemVolts >= 0))
        return nullptr;
    for (const auto& r : approach)
        if (systemVolts <= r.vMax)
            return &r;
    return nullptr;
}

} // namespace lineward
