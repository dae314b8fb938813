// Conductor size names (AWG/kcmil and mm²) and their order from smallest to largest.
#pragma once

#include <optional>
#include <span>
#include <string>
#include <string_view>

namespace lineward {

/// US sizes from 14 AWG to 2000 kcmil, smallest first (NEC Chapter 9 Table 8 sizes).
std::span<const std::string_view> awgSizes();
/// Metric sizes from 1.5 mm² to 630 mm², smallest first (IEC 60228 series).
std::span<const std::string_view> metricSizes();
/// True where `size` is a name from either list.
bool isKnownConductorSize(std::string_view size);
/// Cross-sectional area in mm² (AWG/kcmil converted exactly from circular mils).
std::optional<double> conductorAreaMm2(std::string_view size);

} // namespace lineward
