// branch.* rules for the devices of a motor branch: overload relay (430.32), contactor
// (NEMA ICS 2), disconnect (430.109, 430.110) and equipment grounding conductor (250.122).
#include "rules/branch_check.h"

#include <cmath>

namespace lineward {

namespace {

void overload(BranchCheck& c) {
    const Part* ol = c.b.overload;
    if (!ol)
        return; // topology.motor.no_overload reports it
    const auto fla = MotorRatings::of(*c.b.motor).fla;
    if (!fla) {
        auto& f = c.add("branch.overload.no_fla", *ol,
                        c.motorName() + " has no nameplate FLA; the setting of " + ol->tag +
                            " cannot be judged (NEC 430.6(A)(2))");
        f.fix = Fix{"enter the nameplate full-load current (fla)", {}};
        return;
    }
    const auto lim = overloadLimit(*c.b.motor, *fla);
    const auto relay = OverloadRatings::of(*ol);
    const double setting = relay.settingA;
    if (setting < *fla - 1e-9) {
        // The relay would trip the motor at full load (common practice: set at the nameplate
        // current, up to the 430.32 limit).
        auto& f = c.add("branch.overload.low", *ol,
                        ol->tag + " set at " + fmt(setting) + " A is below the nameplate FLA " +
                            fmt(*fla) + " A of " + c.motorName() + "; it trips the motor at load");
        f.computed = setting;
        f.limit = *fla;
        f.unit = "A";
        f.trace = {{"nameplate FLA", fmt(*fla) + " A (NEC 430.6(A)(2))"},
                   {"430.32(A)(1) upper limit",
                    fmt(lim.pctA, 0) + " % × " + fmt(*fla) + " = " + fmt(lim.maxA) + " A"}};
        const double fixTo = std::ceil(*fla * 10.0) / 10.0;
        if ((!relay.rangeMaxA || fixTo <= *relay.rangeMaxA) &&
            fixTo * relay.ultimateTripX <= lim.maxA + 1e-9)
            f.fix = Fix{"set " + ol->tag + " to " + fmt(fixTo) + " A",
                        {{ol->id, OverloadRatings::kSettingA, fixTo}}};
        else
            f.fix = Fix{"choose a relay whose range reaches " + fmt(fixTo) + " A", {}};
        return;
    }
    // 430.32 limits the current at which the relay trips, not its dial: the relay surely
    // trips only above its ultimate trip multiple of the setting.
    const double trips = relay.tripCurrentA();
    if (trips <= lim.maxA + 1e-9)
        return;
    const bool withinC = trips <= lim.maxC + 1e-9;
    auto& f = c.add(
        withinC ? RuleId("branch.overload.exception") : RuleId("branch.overload.setting"), *ol,
        ol->tag + " set at " + fmt(setting) + " A trips at " + fmt(trips, 2) + " A, above " +
            fmt(lim.pctA, 0) + " % of FLA " + fmt(*fla) + " A = " + fmt(lim.maxA) + " A" +
            (withinC ? "; 430.32(C) allows up to " + fmt(lim.maxC) +
                           " A only where the lower setting will not let the motor start"
                     : ""));
    f.trace = {
        {"nameplate FLA", fmt(*fla) + " A (NEC 430.6(A)(2))"},
        {"basis", lim.basis},
        {"trip current", fmt(relay.ultimateTripX, 2) + " × " + fmt(setting) +
                             " A = " + fmt(trips, 2) + " A (the relay's ultimate trip multiple)"},
        {"430.32(A)(1)", fmt(lim.pctA, 0) + " % × " + fmt(*fla) + " = " + fmt(lim.maxA) + " A"},
        {"430.32(C)", fmt(lim.pctC, 0) + " % × " + fmt(*fla) + " = " + fmt(lim.maxC) + " A"}};
    f.computed = trips;
    f.limit = withinC ? lim.maxC : lim.maxA;
    f.unit = "A";
    const double fixTo = std::floor(lim.maxA / relay.ultimateTripX * 10.0) / 10.0;
    if (!relay.rangeMinA || fixTo >= *relay.rangeMinA)
        f.fix = Fix{"set " + ol->tag + " to " + fmt(fixTo) + " A",
                    {{ol->id, OverloadRatings::kSettingA, fixTo}}};
    else
        f.fix = Fix{"choose a relay whose range reaches " + fmt(fixTo) + " A", {}};
}

void contactor(BranchCheck& c) {
    const Part* k = c.b.contactor;
    if (!k)
        return;
    const auto motor = MotorRatings::of(*c.b.motor);
    const auto kr = ContactorRatings::of(*k);
    const double hp = motorHp(*c.b.motor), v = motor.volts;
    const int ph = motor.phases;
    // The contactor carries the larger of the table FLC and the nameplate current.
    const double amps = std::max(c.flc.amps, motor.fla.value_or(c.flc.amps));
    if (auto ac3 = kr.ac3A) {
        if (*ac3 >= amps - 1e-9)
            return;
        auto& f = c.add("branch.contactor.size", *k,
                        k->tag + " AC-3 rating " + fmt(*ac3) + " A is below the motor current " +
                            fmt(amps) + " A");
        f.computed = *ac3;
        f.limit = amps;
        f.unit = "A";
        f.fix = Fix{"use a contactor rated at least " + fmt(amps) + " A AC-3",
                    {{k->id, ContactorRatings::kAc3A, std::ceil(amps)}}};
        return;
    }
    const std::string size = kr.nemaSize.value_or(""); // none: no NEMA row matches
    const NemaRow* row = c.ctx.tables.nemaRow(size);
    auto rated = row ? c.ctx.tables.nemaHp(*row, v, ph) : std::nullopt;
    if (row && rated && *rated >= hp - 1e-9 && row->continuousA >= amps - 1e-9)
        return;
    auto& f =
        c.add("branch.contactor.size", *k,
              k->tag + " NEMA size " + size + " is rated " +
                  (rated ? fmt(*rated, 2) + " hp" : std::string("no hp")) + " at " + fmt(v, 0) +
                  " V and " + (row ? fmt(row->continuousA, 0) : std::string("?")) + " A; " +
                  c.motorName() + " needs " + fmt(hp, 2) + " hp and " + fmt(amps) + " A");
    if (rated)
        f.computed = *rated;
    f.limit = hp;
    f.unit = "hp";
    f.trace.push_back(
        {"NEMA ICS 2 size " + size, row ? fmt(row->continuousA, 0) + " A continuous" : "unknown"});
    if (auto next = smallestNemaSize(hp, v, ph, amps, c.ctx.tables))
        f.fix = Fix{"use NEMA size " + *next, {{k->id, ContactorRatings::kNemaSize, *next}}};
}

// Disconnect ratings sold as standard (common practice).
constexpr double kDisconnectSizes[] = {30, 60, 100, 200, 400, 600, 800, 1200, 1600, 2000};

void disconnect(BranchCheck& c) {
    const Part* ds = c.b.disconnect;
    if (!ds)
        return;
    const auto sw = DisconnectRatings::of(*ds);
    const double need = 1.15 * c.flc.amps, amps = sw.amps;
    if (amps < need - 1e-9) {
        auto& f = c.add("branch.disconnect.rating", *ds,
                        ds->tag + " rated " + fmt(amps, 0) +
                            " A is below 115 % of FLC = " + fmt(need) + " A");
        f.computed = amps;
        f.limit = need;
        f.unit = "A";
        f.trace.push_back({"430.110(A)", "1.15 × " + fmt(c.flc.amps) + " A = " + fmt(need) + " A"});
        for (double s : kDisconnectSizes)
            if (s >= need) {
                f.fix = Fix{"use a " + fmt(s, 0) + " A switch",
                            {{ds->id, DisconnectRatings::kAmps, s}}};
                break;
            }
    }
    const double hp = motorHp(*c.b.motor);
    const auto hpRating = sw.hpRating;
    if (hpRating && *hpRating >= hp - 1e-9)
        return;
    auto& f =
        c.add("branch.disconnect.hp", *ds,
              ds->tag +
                  (hpRating ? " is rated " + fmt(*hpRating, 2) + " hp"
                            : std::string(" has no hp rating")) +
                  "; " + c.motorName() + " needs a switch rated at least " + fmt(hp, 2) + " hp");
    if (hpRating)
        f.computed = *hpRating;
    f.limit = hp;
    f.unit = "hp";
    f.fix = Fix{"use a switch rated " + fmt(hp, 2) + " hp or more",
                {{ds->id, DisconnectRatings::kHpRating, hp}}};
}

void groundingConductor(BranchCheck& c) {
    if (!c.b.scpd)
        return;
    const auto type = *scpdTypeOf(*c.b.scpd);
    const double deviceA =
        egcDeviceRating(*c.b.scpd, type, motorTypeOf(*c.b.motor), c.flc.amps, c.ctx.tables);
    for (const Part* cable : c.b.cables) {
        const auto cr = CableRatings::of(*cable);
        const std::string& given = cr.egcSize;
        const std::string& phase = cr.size;
        if (given.empty())
            continue; // the raceway is the EGC (250.118)
        const auto cond = conditionsOf(*cable, c.ctx.settings());
        CableConditions one = cond;
        one.sets = 1;
        // Without the trace text first: most cables pass, and only a finding shows it.
        auto minPhase =
            smallestCable(1.25 * c.flc.amps / cond.sets, one, c.ctx.tables, "14 AWG", false);
        const std::string& minSize = minPhase ? minPhase->first : phase;
        auto need = egcSize(deviceA, cond.material, phase, minSize, c.ctx.tables, false);
        auto needArea = need ? c.ctx.tables.areaCmil(need->size) : std::nullopt;
        auto givenArea = c.ctx.tables.areaCmil(given);
        if (!need || !needArea || !givenArea || *givenArea >= *needArea - 1e-6)
            continue;
        need = egcSize(deviceA, cond.material, phase, minSize, c.ctx.tables); // with its trace
        auto& f = c.add("branch.egc.size", *cable,
                        cable->tag + " equipment grounding conductor " + given +
                            " is smaller than " + need->size);
        f.computed = *givenArea;
        f.limit = *needArea;
        f.unit = "cmil";
        f.trace.push_back(
            {"device rating for the EGC", fmt(deviceA, 0) + " A" +
                                              (type == ScpdType::InstantaneousBreaker
                                                   ? " (time-delay fuse maximum, 250.122(D)(1))"
                                                   : "")});
        f.trace.insert(f.trace.end(), need->trace.begin(), need->trace.end());
        f.fix = Fix{"use " + need->size, {{cable->id, CableRatings::kEgcSize, need->size}}};
    }
}

} // namespace

void checkBranchDevices(BranchCheck& c) {
    overload(c);
    contactor(c);
    disconnect(c);
    groundingConductor(c);
}

} // namespace lineward
