// Bucket proposal: each value is the smallest (or for devices the largest permitted) choice
// that the rules in core/rules accept; tests check that a proposed bucket checks clean.
#include "sizing/auto_size.h"

#include "model/ratings.h"

#include <cmath>

namespace lineward {

namespace {

std::string chooseTripClass(const Part& motor, const Tables& t) {
    // The relay must not trip during acceleration: its shortest time at 7.2 × setting must
    // exceed the acceleration time (IEC 60947-4-1 Table 3 limits).
    const double accel = MotorRatings::of(motor).accelS;
    for (const char* name : {"10", "20", "30"})
        if (const auto* c = t.tripClass(name); c && c->tpMinS > accel)
            return name;
    return "30";
}

} // namespace

std::optional<BucketProposal> proposeBucket(const Part& motor, const SizeOptions& o,
                                            const Tables& t, std::string& why) {
    BucketProposal p;
    auto flc = motorFlc(motor, t);
    if (!flc) {
        why = "no table FLC for this hp and voltage and no nameplate FLA";
        return std::nullopt;
    }
    p.flc = *flc;
    p.trace = flc->trace;
    const MotorType type = motorTypeOf(motor);
    p.conductorMinA = 1.25 * flc->amps;
    CableConditions c{o.material, o.insulationC, 75, o.ambientC, o.conductors, 1};
    c.terminationC = o.terminationC.value_or(p.conductorMinA <= 100 ? 60 : 75);
    p.terminationC = c.terminationC;
    auto cable = smallestCable(p.conductorMinA, c, t);
    if (!cable) {
        why = "no single conductor in Table 310.16 carries " + fmt(p.conductorMinA) + " A";
        return std::nullopt;
    }
    p.conductorSize = cable->first;
    p.conductorAmpacityA = cable->second.amps;
    p.trace.push_back({"conductor", "1.25 × " + fmt(flc->amps) + " = " + fmt(p.conductorMinA) +
                                        " A → " + cable->first + " (" + fmt(p.conductorAmpacityA) +
                                        " A)"});
    for (auto d : {ScpdType::InverseTimeBreaker, ScpdType::InstantaneousBreaker,
                   ScpdType::TimeDelayFuse, ScpdType::NonTimeDelayFuse})
        p.scpdMaxA[d] = scpdLimit(d, type, flc->amps, t).maxA;
    p.device = o.device;
    const auto lim = scpdLimit(o.device, type, flc->amps, t);
    p.deviceRatingA = lim.maxA;
    if (o.device == ScpdType::InstantaneousBreaker) {
        // Lowest setting that clears the asymmetrical inrush; the table value where no LRA is
        // known.
        if (auto lra = lockedRotorA(motor, t, &p.trace)) {
            const double need =
                std::ceil(*lra * o.asymmetryFactor / (1 - kInstantaneousTolerance) / 5) * 5;
            p.deviceRatingA = need <= lim.maxA ? need : std::min(need, lim.excMaxA);
            if (need > lim.excMaxA)
                p.trace.push_back(
                    {"instantaneous setting",
                     "inrush needs " + fmt(need, 0) + " A, above the 430.52(C)(3) ceiling"});
        }
    }
    const auto m = MotorRatings::of(motor);
    if (auto fla = m.fla) {
        p.overloadMaxA = overloadLimit(motor, *fla).maxA;
        p.overloadSettingA = *fla;
    } else {
        p.overloadSettingA = flc->amps;
    }
    p.tripClass = chooseTripClass(motor, t);
    p.disconnectMinA = std::round(115.0 * flc->amps) / 100.0; // 1.15 × FLC to the cent
    p.nemaSize = smallestNemaSize(motorHp(motor), m.volts, m.phases,
                                  std::max(flc->amps, m.fla.value_or(flc->amps)), t)
                     .value_or(""); // empty: no NEMA size is large enough
    const double egcDevice = o.device == ScpdType::InstantaneousBreaker
                                 ? scpdLimit(ScpdType::TimeDelayFuse, type, flc->amps, t).maxA
                                 : p.deviceRatingA;
    if (auto egc = egcSize(egcDevice, o.material, p.conductorSize, p.conductorSize, t))
        p.egcSize = egc->size;
    return p;
}

} // namespace lineward
