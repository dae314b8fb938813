// Shared helpers of the sizing rule families.
#include "rules/rule_context.h"

#include <cmath>

namespace lineward {

double loadAmps(const Part& l) {
    const double kva =
        l.number("kva").value_or(l.number("kw").value_or(0) / l.number("pf").value());
    const double v = l.number("volts").value_or(1);
    const bool one = l.number("phases").value_or(3) == 1;
    return kva * 1000.0 / (one ? v : std::sqrt(3.0) * v);
}

} // namespace lineward
