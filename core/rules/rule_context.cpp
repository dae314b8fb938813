// Shared helpers of the sizing rule families.
#include "rules/rule_context.h"

#include "model/ratings.h"

#include <cmath>

namespace lineward {

const MotorFacts* RuleContext::facts(PartId motor) const {
    auto it = factsByMotor.find(motor);
    return it == factsByMotor.end() ? nullptr : it->second;
}

double loadAmps(const Part& load) {
    const auto l = LoadRatings::of(load);
    if (l.volts <= 0)
        return 0; // a required rating: only a part built in code lacks it
    return l.apparentKva() * 1000.0 / (l.phases == 1 ? l.volts : std::sqrt(3.0) * l.volts);
}

} // namespace lineward
