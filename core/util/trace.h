// Calculation traces and the number text they carry: the lowest layer, so every folder that
// explains a number (sizing, studies, curves, rules) shares one form.
#pragma once

#include <string>

namespace lineward {

/// One named input or intermediate value of a calculation, in the order it was used.
struct TraceStep {
    std::string name;
    std::string value;
};

/// A number as text with at most `decimals` decimals and no trailing zeros ("2.5", "40").
std::string fmt(double v, int decimals = 1);

} // namespace lineward
