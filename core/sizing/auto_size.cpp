// Bucket proposal: each value is the smallest (or for devices the largest permitted) choice
// that the rules in core/rules accept; tests check that a proposed bucket checks clean.
#include "sizing/auto_size.h"

#include "model/ratings.h"

#include <algorithm>
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

namespace {

double motorCurrentA(const BucketProposal& p, const Part& motor) {
    return std::max(p.flc.amps, MotorRatings::of(motor).fla.value_or(p.flc.amps));
}

} // namespace

std::optional<std::string> sizeForDrive(BucketProposal& p, const Part& motor, const SizeOptions& o,
                                        const Tables& t) {
    // To 0.1 A up; the 1e-9 keeps a product such as 1.1 × 11 = 12.100000000000001 at 12.1.
    const double out = std::ceil(motorCurrentA(p, motor) * 10.0 - 1e-9) / 10.0;
    const double in = std::ceil(kAssumedDriveInputX * out * 10.0 - 1e-9) / 10.0;
    p.driveOutputA = out;
    p.driveInputA = in;
    p.trace.push_back({"drive", "output " + fmt(out) + " A (motor current); input " +
                                    fmt(kAssumedDriveInputX, 2) + " × " + fmt(out) + " = " +
                                    fmt(in) + " A assumed (common practice, from memory)"});
    p.conductorMinA = 1.25 * in;
    CableConditions c{o.material, o.insulationC, 75, o.ambientC, o.conductors, 1};
    c.terminationC = o.terminationC.value_or(p.conductorMinA <= 100 ? 60 : 75);
    p.terminationC = c.terminationC;
    auto cable = smallestCable(p.conductorMinA, c, t);
    if (!cable)
        return "no single conductor in Table 310.16 carries " + fmt(p.conductorMinA) + " A";
    p.conductorSize = cable->first;
    p.conductorAmpacityA = cable->second.amps;
    p.trace.push_back({"conductor", "1.25 × drive input " + fmt(in) + " = " + fmt(p.conductorMinA) +
                                        " A (430.122(A)) → " + cable->first + " (" +
                                        fmt(p.conductorAmpacityA) + " A)"});
    const bool fuse = p.device == ScpdType::TimeDelayFuse || p.device == ScpdType::NonTimeDelayFuse;
    const double listed = kAssumedDriveScpdX * in;
    p.driveMaxScpdA = listed;
    if (auto rated = t.standardAtOrBelow(listed, fuse); rated && *rated < p.deviceRatingA) {
        p.deviceRatingA = *rated;
        p.trace.push_back({"short-circuit device",
                           fmt(*rated, 0) + " A: the largest standard rating within " +
                               fmt(kAssumedDriveScpdX, 2) + " × " + fmt(in) + " = " +
                               fmt(listed, 1) +
                               " A, the drive listing's maximum assumed (common practice)"});
    }
    // 250.122(B): the EGC grows with the phase conductor over the size 430.22 needs.
    CableConditions one = c;
    auto minPhase = smallestCable(1.25 * p.flc.amps, one, t, "14 AWG", false);
    if (auto egc = egcSize(p.deviceRatingA, o.material, p.conductorSize,
                           minPhase ? minPhase->first : p.conductorSize, t))
        p.egcSize = egc->size;
    return std::nullopt;
}

void sizeForSoftStarter(BucketProposal& p, const Part& motor, const Tables& t) {
    p.softStarterA = std::ceil(motorCurrentA(p, motor) - 1e-9);
    if (p.device != ScpdType::InstantaneousBreaker)
        return;
    // The instantaneous setting needs to clear only the starter's current limit (no
    // asymmetrical inrush), at the field's default multiple of the FLC: the lowest setting
    // above it, within the 430.52(C)(3) table value.
    const double x =
        SoftStarterRatings::of(Part::make(PartKind::SoftStarter, PartId(1), "SS")).startLimitX;
    const double need = std::ceil(x * p.flc.amps / (1 - kInstantaneousTolerance) / 5) * 5;
    const auto lim = scpdLimit(p.device, motorTypeOf(motor), p.flc.amps, t);
    p.deviceRatingA = std::min(need, lim.maxA);
    p.trace.push_back({"instantaneous setting",
                       fmt(p.deviceRatingA, 0) + " A: above the soft starter's " + fmt(x, 1) +
                           " × FLC start limit at the −20 % pickup tolerance (common practice)"});
}

} // namespace lineward
