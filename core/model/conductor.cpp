// Conductor size names; areas of AWG sizes from the AWG definition (d = 0.005·92^((36−n)/39) in).
#include "model/conductor.h"

#include <algorithm>
#include <array>
#include <cmath>
#include <string>

namespace lineward {

namespace {
constexpr std::array<std::string_view, 28> kAwg{
    "14 AWG",    "12 AWG",    "10 AWG",     "8 AWG",      "6 AWG",      "4 AWG",      "3 AWG",
    "2 AWG",     "1 AWG",     "1/0 AWG",    "2/0 AWG",    "3/0 AWG",    "4/0 AWG",    "250 kcmil",
    "300 kcmil", "350 kcmil", "400 kcmil",  "500 kcmil",  "600 kcmil",  "700 kcmil",  "750 kcmil",
    "800 kcmil", "900 kcmil", "1000 kcmil", "1250 kcmil", "1500 kcmil", "1750 kcmil", "2000 kcmil"};
constexpr std::array<std::string_view, 19> kMetric{
    "1.5 mm2", "2.5 mm2", "4 mm2",   "6 mm2",   "10 mm2",  "16 mm2",  "25 mm2",
    "35 mm2",  "50 mm2",  "70 mm2",  "95 mm2",  "120 mm2", "150 mm2", "185 mm2",
    "240 mm2", "300 mm2", "400 mm2", "500 mm2", "630 mm2"};
constexpr double kMm2PerCmil = 5.067075e-4;
} // namespace

std::span<const std::string_view> awgSizes() {
    return kAwg;
}
std::span<const std::string_view> metricSizes() {
    return kMetric;
}

bool isKnownConductorSize(std::string_view size) {
    auto a = awgSizes(), m = metricSizes();
    return std::find(a.begin(), a.end(), size) != a.end() ||
           std::find(m.begin(), m.end(), size) != m.end();
}

std::optional<double> conductorAreaMm2(std::string_view size) {
    if (!isKnownConductorSize(size))
        return std::nullopt;
    const std::string s(size);
    if (s.ends_with(" mm2"))
        return std::stod(s);
    if (s.ends_with(" kcmil"))
        return std::stod(s) * 1000.0 * kMm2PerCmil;
    int gauge = 0;
    if (s.find("/0") != std::string::npos)
        gauge = 1 - std::stoi(s); // 1/0 -> 0, 2/0 -> -1, ...
    else
        gauge = std::stoi(s);
    const double dInch = 0.005 * std::pow(92.0, (36.0 - gauge) / 39.0);
    return dInch * dInch * 1e6 * kMm2PerCmil; // circular mils = (d in mils)^2
}

} // namespace lineward
