// Article 430 calculations. Each returns the numbers a finding or a proposal needs, and a trace
// naming the table or clause behind every step.
#include "sizing/motor_sizing.h"

#include "model/conductor.h"
#include "model/ratings.h"

#include <cmath>
#include <cstdio>

namespace lineward {

double motorHp(const Part& motor) {
    const auto m = MotorRatings::of(motor);
    if (m.hp)
        return *m.hp;
    return m.kw.value_or(0) / kKwPerHp; // the kind's validation gives one of the two
}

MotorType motorTypeOf(const Part& motor) {
    const auto m = MotorRatings::of(motor);
    if (m.phases == 1)
        return MotorType::SinglePhase;
    if (m.rotor == Rotor::WoundRotor)
        return MotorType::WoundRotor;
    if (m.rotor == Rotor::Synchronous)
        return MotorType::Synchronous;
    if (m.premiumEff || m.design == "E")
        return MotorType::DesignBPremium;
    return MotorType::SquirrelCage;
}

TraceStep scpdRowStep(const Part& motor) {
    const auto m = MotorRatings::of(motor);
    std::string row;
    switch (motorTypeOf(motor)) {
    case MotorType::SinglePhase:
        row = "single-phase motors";
        break;
    case MotorType::SquirrelCage:
        row = "AC polyphase squirrel cage, other than Design B premium efficiency";
        break;
    case MotorType::DesignBPremium:
        row = m.design == "E" && !m.premiumEff
                  ? "Design B premium efficiency — the motor is marked Design E, which the 2023 "
                    "table has no row for; judged on the row written for high starting current"
                  : "Design B premium efficiency";
        break;
    case MotorType::Synchronous:
        row = "synchronous";
        break;
    case MotorType::WoundRotor:
        row = "wound rotor";
        break;
    }
    return {"Table 430.52(C)(1) row", row};
}

std::optional<MotorFlc> motorFlc(const Part& motor, const Tables& t, bool withTrace) {
    MotorFlc r;
    const auto m = MotorRatings::of(motor);
    const int phases = m.phases;
    const double volts = m.volts;
    const FlcTable& table = phases == 1 ? t.flc1 : t.flc3;
    double hp = motorHp(motor);
    if (!m.hp && m.kw) {
        // A kW rating takes the next hp row at or above its equivalent (common practice).
        const double eq = hp;
        for (double row : table.hp)
            if (row >= eq - 1e-6) {
                hp = row;
                break;
            }
        if (withTrace)
            r.trace.push_back({"kW as hp", fmt(*m.kw, 2) + " kW / " + fmt(kKwPerHp, 3) + " = " +
                                               fmt(eq, 2) + " hp → table row " + fmt(hp, 2) +
                                               " hp"});
    }
    // A synchronous motor reads the table's synchronous columns (unity power factor; the
    // table's note multiplies by 1.1 or 1.25 for 0.9 or 0.8 power factor).
    const bool sync = phases == 3 && m.rotor == Rotor::Synchronous;
    if (auto a = t.flc(hp, volts, phases, &r.columnV, sync)) {
        r.amps = *a;
        r.hpUsed = hp;
        if (withTrace)
            r.trace.push_back({"FLC", fmt(*a, 1) + " A (NEC Table " +
                                          std::string(phases == 1 ? "430.248" : "430.250") +
                                          (sync ? ", synchronous, unity power factor" : "") + ", " +
                                          fmt(hp, 2) + " hp, " + fmt(r.columnV, 0) + " V column)"});
        return r;
    }
    if (auto fla = m.fla) {
        r.amps = *fla;
        r.fromTable = false;
        if (withTrace)
            r.trace.push_back({"FLC", fmt(*fla, 1) +
                                          " A from the nameplate: the table has no row for " +
                                          fmt(hp, 2) + " hp at " + fmt(volts, 0) + " V"});
        return r;
    }
    return std::nullopt;
}

std::optional<ScpdType> scpdTypeOf(const Part& d) {
    switch (d.kind) {
    case PartKind::Breaker:
        return ScpdType::InverseTimeBreaker;
    case PartKind::InstBreaker:
        return ScpdType::InstantaneousBreaker;
    case PartKind::Fuse:
        return FuseRatings::of(d).type == FuseType::Fast ? ScpdType::NonTimeDelayFuse
                                                         : ScpdType::TimeDelayFuse;
    default:
        return std::nullopt;
    }
}

ScpdLimit scpdLimit(ScpdType type, MotorType motor, double flc, const Tables& t) {
    const auto& row = t.scpdRow(motor);
    const auto i = static_cast<std::size_t>(type);
    ScpdLimit l;
    l.pct = row.pct[i];
    l.rawA = l.pct / 100.0 * flc;
    l.excPct = row.excPct[i];
    if (type == ScpdType::InverseTimeBreaker && flc > 100)
        l.excPct = row.excItbAbove100;
    if (type == ScpdType::InstantaneousBreaker) {
        l.maxA = l.rawA; // a setting: no standard sizes
        l.excMaxA = l.excPct / 100.0 * flc;
        return l;
    }
    // 430.52(C)(1) Exception No. 1: the next higher standard rating of that device type is
    // permitted; for fuses 240.6(A) adds 1, 3, 6, 10 and 601 A.
    const bool fuse = isFuse(type);
    l.maxA = t.nextStandardAtOrAbove(l.rawA, fuse).value_or(l.rawA);
    l.roundedUp = l.maxA > l.rawA + 1e-9;
    // Exception No. 2 sets a ceiling ("shall in no case exceed"): round down.
    double ceiling = l.excPct / 100.0 * flc;
    if (type == ScpdType::NonTimeDelayFuse && ceiling > kExc2aFuseMaxA) {
        // Exception No. 2(a) holds for fuses up to 600 A; 2(d) lets fuses of 601–6000 A go
        // to 300 % of FLC: the larger of the two that applies.
        const double d = kExc2dPct / 100.0 * flc;
        ceiling = std::max(d, kExc2aFuseMaxA);
        l.excNote = d > kExc2aFuseMaxA
                        ? "Exception No. 2(d): a fuse of 601–6000 A, at most " + fmt(kExc2dPct, 0) +
                              " % × FLC = " + fmt(d, 0) + " A"
                        : "Exception No. 2(a) covers fuses up to " + fmt(kExc2aFuseMaxA, 0) +
                              " A; 2(d)'s " + fmt(kExc2dPct, 0) + " % (" + fmt(d, 0) +
                              " A) reaches no fuse above it";
    }
    l.excMaxA = t.standardAtOrBelow(ceiling, fuse).value_or(l.maxA);
    l.excMaxA = std::max(l.excMaxA, l.maxA);
    return l;
}

std::optional<double> lockedRotorA(const Part& motor, const Tables& t,
                                   std::vector<TraceStep>* trace) {
    const auto m = MotorRatings::of(motor);
    if (auto lra = m.lra) {
        if (trace)
            trace->push_back({"locked-rotor current", fmt(*lra, 0) + " A (given)"});
        return *lra;
    }
    const auto& letter = m.codeLetter;
    const double hp = motorHp(motor), v = m.volts;
    const bool one = m.phases == 1;
    auto kvaHp = letter && !letter->empty() ? t.codeLetterKvaPerHp((*letter)[0]) : std::nullopt;
    if (!kvaHp) {
        // No code letter: a polyphase Design B, C or D induction motor takes the maximum of its
        // design from Table 430.251(B) (the table's own use is selecting disconnects and
        // controllers; its maximum errs on the side of a deeper starting dip).
        const bool designBcd = m.design == "B" || m.design == "C" || m.design == "D";
        if (one || !designBcd || m.rotor != Rotor::SquirrelCage)
            return std::nullopt;
        double column = 0;
        const auto lra = t.maxLockedRotorA(hp, v, &column);
        if (!lra)
            return std::nullopt;
        if (trace)
            trace->push_back({"locked-rotor current",
                              fmt(*lra, 1) + " A (Design " + m.design + ", " + fmt(hp, 2) +
                                  " hp, " + fmt(column, 0) +
                                  " V column of NEC Table 430.251(B), the design's maximum; no "
                                  "code letter given)"});
        return *lra;
    }
    const double lra = *kvaHp * hp * 1000.0 / (one ? v : std::sqrt(3.0) * v);
    if (trace)
        trace->push_back({"locked-rotor current",
                          fmt(lra, 0) + " A = " + fmt(*kvaHp, 2) + " kVA/hp (code letter " +
                              *letter + ", NEC Table 430.7(B), top of range) × " + fmt(hp, 2) +
                              " hp × 1000 / (" + (one ? "" : "√3 × ") + fmt(v, 0) + " V)"});
    return lra;
}

std::optional<LockedRotor> lockedRotor(const Part& m, const Tables& t,
                                       std::vector<TraceStep>* trace) {
    if (auto known = lockedRotorA(m, t, trace))
        return LockedRotor{*known, false};
    const auto flc = motorFlc(m, t, false);
    const double base = flc ? flc->amps : MotorRatings::of(m).fla.value_or(0); // 0: no basis
    if (base <= 0)
        return std::nullopt;
    const double amps = kAssumedLockedRotorMultiple * base;
    if (trace)
        trace->push_back({"locked-rotor current",
                          fmt(amps, 0) + " A assumed = " + fmt(kAssumedLockedRotorMultiple, 0) +
                              " × " + fmt(base, 1) + " A " + (flc ? "table FLC" : "nameplate FLA") +
                              " (no LRA or code letter given; common practice)"});
    return LockedRotor{amps, true};
}

std::optional<StartingCurrent> startingCurrent(const Part& m, const Part* starter,
                                               const Tables& t) {
    const auto lr = lockedRotor(m, t, nullptr);
    if (starter && starter->kind == PartKind::Vfd) {
        const double input = VfdRatings::of(*starter).inputA;
        if (input <= 0)
            return std::nullopt;
        return StartingCurrent{input, true, false,
                               "drive " + starter->tag + "'s rated input current " + fmt(input, 1) +
                                   " A (assumed: a drive starts the motor within its current "
                                   "limit; no across-the-line inrush)"};
    }
    if (starter && starter->kind == PartKind::SoftStarter) {
        const auto flc = motorFlc(m, t, false);
        const double base = flc ? flc->amps : MotorRatings::of(m).fla.value_or(0);
        const double x = SoftStarterRatings::of(*starter).startLimitX;
        if (base <= 0)
            return std::nullopt;
        double amps = x * base;
        std::string basis = "soft starter " + starter->tag + "'s current limit " + fmt(x, 1) +
                            " × " + fmt(base, 1) + " A " + (flc ? "table FLC" : "nameplate FLA") +
                            " = " + fmt(amps, 0) +
                            " A (3–4 × FLC is common practice; no asymmetrical inrush)";
        if (lr && lr->amps < amps) {
            amps = lr->amps;
            basis += ", at most the locked-rotor current " + fmt(lr->amps, 0) + " A";
        }
        return StartingCurrent{amps, true, false, basis};
    }
    if (!lr)
        return std::nullopt;
    return StartingCurrent{lr->amps, false, lr->assumed,
                           "locked-rotor current " + fmt(lr->amps, 0) + " A across the line" +
                               (lr->assumed ? " (" + fmt(kAssumedLockedRotorMultiple, 0) +
                                                  " × FLC assumed, common practice)"
                                            : "")};
}

CableConditions conditionsOf(const Part& cable, const Settings& s) {
    const auto c = CableRatings::of(cable);
    CableConditions k;
    k.material = c.material;
    k.insulationC = c.insulationC;
    k.terminationC = c.terminationC;
    k.ambientC = c.ambientC.value_or(s.ambientC); // blank: the drawing's ambient
    k.conductors = c.conductors;
    k.sets = c.sets;
    return k;
}

std::optional<Ampacity> cableAmpacity(const std::string& size, const CableConditions& c,
                                      const Tables& t, bool withTrace) {
    Ampacity a;
    const char* mat = c.material == Material::Cu ? "Cu" : "Al";
    auto ins = t.ampacityAt(size, c.material, c.insulationC);
    auto term = t.ampacityAt(size, c.material, std::min(c.insulationC, c.terminationC));
    auto amb = t.ambientFactor(c.ambientC, c.insulationC);
    if (!ins || !term || !amb)
        return std::nullopt;
    const double adj = t.adjustmentFactor(c.conductors);
    const double derated = *ins * *amb * adj;
    const double perSet = std::min(derated, *term);
    a.amps = perSet * c.sets;
    if (!withTrace)
        return a;
    a.trace.push_back(
        {"conductor", size + " " + mat + ", " + std::to_string(c.insulationC) + " °C insulation, " +
                          std::to_string(c.terminationC) + " °C terminations" +
                          (c.sets > 1 ? ", " + std::to_string(c.sets) + " sets" : "")});
    a.trace.push_back({"table ampacity", fmt(*ins, 0) + " A in the " +
                                             std::to_string(c.insulationC) +
                                             " °C column (NEC Table 310.16)"});
    a.trace.push_back({"ambient factor", fmt(*amb, 2) + " at " + fmt(c.ambientC, 0) +
                                             " °C (NEC Table 310.15(B)(1)(1))"});
    a.trace.push_back(
        {"adjustment factor", fmt(adj, 2) + " for " + std::to_string(c.conductors) +
                                  " current-carrying conductors (NEC Table 310.15(C)(1))"});
    a.trace.push_back(
        {"termination limit", fmt(*term, 0) + " A in the " +
                                  std::to_string(std::min(c.insulationC, c.terminationC)) +
                                  " °C column (NEC 110.14(C)(1))"});
    a.trace.push_back({"ampacity", "min(" + fmt(*ins, 0) + " × " + fmt(*amb, 2) + " × " +
                                       fmt(adj, 2) + ", " + fmt(*term, 0) + ")" +
                                       (c.sets > 1 ? " × " + std::to_string(c.sets) : "") + " = " +
                                       fmt(a.amps, 1) + " A"});
    return a;
}

std::optional<std::pair<std::string, Ampacity>>
smallestCable(double requiredA, const CableConditions& c, const Tables& t,
              const std::string& minSize, bool withTrace) {
    bool started = false;
    for (auto size : awgSizes()) {
        started = started || size == minSize;
        if (!started)
            continue;
        if (auto a = cableAmpacity(std::string(size), c, t, false);
            a && a->amps >= requiredA - 1e-9)
            return std::pair{std::string(size),
                             withTrace ? *cableAmpacity(std::string(size), c, t) : *a};
    }
    return std::nullopt;
}

OverloadLimit overloadLimit(const Part& motor, double fla) {
    OverloadLimit l;
    const auto m = MotorRatings::of(motor);
    const double sf = m.serviceFactor;
    const auto rise = m.tempRiseC;
    const bool high = sf >= 1.15 - 1e-9 || (rise && *rise <= 40);
    l.pctA = high ? 125 : 115;
    l.pctC = high ? 140 : 130;
    l.maxA = l.pctA / 100.0 * fla;
    l.maxC = l.pctC / 100.0 * fla;
    l.basis = high ? (sf >= 1.15 - 1e-9 ? "service factor " + fmt(sf, 2) + " ≥ 1.15"
                                        : "marked temperature rise ≤ 40 °C")
                   : "service factor " + fmt(sf, 2) + " < 1.15, no marked rise ≤ 40 °C";
    return l;
}

std::optional<std::string> smallestNemaSize(double hp, double volts, int phases, double amps,
                                            const Tables& t) {
    for (const auto& row : t.nema) {
        auto rated = t.nemaHp(row, volts, phases);
        if (rated && *rated >= hp - 1e-9 && row.continuousA >= amps - 1e-9)
            return row.size;
    }
    return std::nullopt;
}

double egcDeviceRating(const Part& device, ScpdType type, MotorType motor, double flc,
                       const Tables& t) {
    if (type == ScpdType::InstantaneousBreaker)
        return scpdLimit(ScpdType::TimeDelayFuse, motor, flc, t).maxA;
    return ampereRatingA(device);
}

std::optional<EgcSize> egcSize(double deviceA, Material m, const std::string& phaseSize,
                               const std::string& minPhaseSize, const Tables& t, bool withTrace) {
    auto base = t.egcFor(deviceA, m);
    if (!base)
        return std::nullopt;
    EgcSize e{*base, {}};
    if (withTrace)
        e.trace.push_back({"EGC from device rating",
                           *base + " for " + fmt(deviceA, 0) + " A (NEC Table 250.122)"});
    auto phase = t.areaCmil(phaseSize), minPhase = t.areaCmil(minPhaseSize),
         egc = t.areaCmil(*base);
    if (phase && minPhase && egc && *phase > *minPhase) {
        // 250.122(B): increase the EGC in proportion to the phase conductors' circular mils.
        const double ratio = *phase / *minPhase;
        const double need = *egc * ratio;
        for (auto size : awgSizes()) {
            auto a = t.areaCmil(std::string(size));
            if (a && *a >= need - 1e-6) {
                e.size = std::string(size);
                break;
            }
        }
        if (withTrace)
            e.trace.push_back({"proportional increase", fmt(*phase, 0) + " / " + fmt(*minPhase, 0) +
                                                            " cmil = " + fmt(ratio, 2) + " × " +
                                                            fmt(*egc, 0) + " cmil → " + e.size +
                                                            " (NEC 250.122(B))"});
    }
    if (auto a = t.areaCmil(e.size); a && phase && *a > *phase) {
        e.size = phaseSize;
        if (withTrace)
            e.trace.push_back(
                {"250.122(A)", "not larger than the circuit conductors: " + phaseSize});
    }
    return e;
}

} // namespace lineward
