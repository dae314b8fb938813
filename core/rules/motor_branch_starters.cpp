// branch.drive.* and branch.soft_starter.* rules: a variable-frequency drive's input conductors
// (NEC 2023 430.122(A)), its short-circuit device against its listing (110.3(B)) and its output
// current; a soft starter's current rating and its bypass contactor.
#include "rules/branch_check.h"

#include <cmath>

namespace lineward {

namespace {

// The current the starter carries: the larger of the table FLC and the nameplate FLA (the
// motor draws its nameplate current; the code sizes from the table), as for the contactor.
double motorCurrent(const BranchCheck& c) {
    return std::max(c.flc.amps, MotorRatings::of(*c.b.motor).fla.value_or(c.flc.amps));
}

void driveInputConductors(BranchCheck& c, const Part& vfd, const VfdRatings& r) {
    const double need = 1.25 * r.inputA;
    for (const Part* cable : c.b.driveInputCables) {
        const std::string size = CableRatings::of(*cable).size;
        const auto cond = conditionsOf(*cable, c.ctx.settings());
        auto amp = cableAmpacity(size, cond, c.ctx.tables, false);
        if (!amp || amp->amps >= need - 1e-9)
            continue; // sizes outside Table 310.16 are not judged here
        amp = cableAmpacity(size, cond, c.ctx.tables);
        auto& f = c.add("branch.drive.input_conductor", *cable,
                        "cable " + cable->tag + " feeding drive " + vfd.tag + " needs 1.25 × " +
                            fmt(r.inputA) + " A = " + fmt(need) + " A; " + size + " carries " +
                            fmt(amp->amps) + " A");
        f.computed = amp->amps;
        f.limit = need;
        f.unit = "A";
        f.trace.push_back({"drive rated input current", fmt(r.inputA) + " A (" + vfd.tag + ")"});
        f.trace.push_back(
            {"required", "1.25 × " + fmt(r.inputA) + " = " + fmt(need) + " A (NEC 430.122(A))"});
        f.trace.insert(f.trace.end(), amp->trace.begin(), amp->trace.end());
        if (auto next = smallestCable(need, cond, c.ctx.tables, size))
            f.fix = Fix{"use " + next->first + " (" + fmt(next->second.amps) + " A)",
                        {{cable->id, CableRatings::kSize, next->first}}};
    }
}

void driveScpd(BranchCheck& c, const Part& vfd, const VfdRatings& r) {
    if (!c.b.scpd)
        return; // branch.scpd.missing reports it
    const Part& d = *c.b.scpd;
    const double rating = branchSettingA(d);
    const double maxA = r.maxScpdA.value_or(kAssumedDriveScpdX * r.inputA);
    if (rating <= maxA + 1e-9)
        return;
    auto& f = c.add("branch.drive.scpd", d,
                    d.tag + " rated " + fmt(rating, 0) + " A exceeds the " + fmt(maxA, 0) +
                        " A that drive " + vfd.tag + "'s listing allows ahead of it");
    f.parts.push_back(vfd.id);
    f.computed = rating;
    f.limit = maxA;
    f.unit = "A";
    f.trace.push_back(
        {"listed maximum",
         r.maxScpdA ? fmt(*r.maxScpdA, 0) + " A (the drive's max_scpd_a, from its listing)"
                    : fmt(kAssumedDriveScpdX, 2) + " × rated input " + fmt(r.inputA) +
                          " A = " + fmt(maxA, 0) +
                          " A assumed (no listed maximum given; common practice, from memory)"});
    f.trace.push_back({"basis", "NEC 110.3(B): listed equipment is installed per its listing and "
                                "instructions (430.130, from memory)"});
    const bool fuse = d.kind == PartKind::Fuse;
    if (d.kind != PartKind::InstBreaker)
        if (auto rated = c.ctx.tables.standardAtOrBelow(maxA, fuse))
            f.fix = Fix{"set " + d.tag + " to " + fmt(*rated, 0) + " A",
                        {{d.id, branchSettingKey(d.kind), *rated}}};
    if (!f.fix)
        f.fix = Fix{"choose a device the drive's instructions list, or enter its listed "
                    "maximum in max_scpd_a",
                    {}};
}

void driveOutput(BranchCheck& c, const Part& vfd, const VfdRatings& r) {
    const double amps = motorCurrent(c);
    if (r.outputA >= amps - 1e-9)
        return;
    auto& f = c.add("branch.drive.output", vfd,
                    "drive " + vfd.tag + " rated output " + fmt(r.outputA) +
                        " A is below the motor current " + fmt(amps) + " A of " + c.motorName());
    f.computed = r.outputA;
    f.limit = amps;
    f.unit = "A";
    f.trace.push_back({"motor current", fmt(amps) + " A (the larger of table FLC " +
                                            fmt(c.flc.amps) + " A and nameplate FLA)"});
    f.trace.push_back(
        {"basis", "the drive carries the motor's full-load current continuously and provides its "
                  "overload protection (430.124(A)); common practice, 430.122 context"});
    f.fix = Fix{"use a drive rated at least " + fmt(amps) + " A output",
                {{vfd.id, VfdRatings::kOutputA, std::ceil(amps * 10) / 10}}};
}

void softStarter(BranchCheck& c, const Part& ss) {
    const auto r = SoftStarterRatings::of(ss);
    const double amps = motorCurrent(c);
    if (r.amps < amps - 1e-9) {
        auto& f =
            c.add("branch.soft_starter.rating", ss,
                  "soft starter " + ss.tag + " rated " + fmt(r.amps) +
                      " A is below the motor current " + fmt(amps) + " A of " + c.motorName());
        f.computed = r.amps;
        f.limit = amps;
        f.unit = "A";
        f.trace.push_back({"motor current", fmt(amps) + " A (the larger of table FLC " +
                                                fmt(c.flc.amps) + " A and nameplate FLA)"});
        f.fix = Fix{"use a soft starter rated at least " + fmt(amps) + " A",
                    {{ss.id, SoftStarterRatings::kAmps, std::ceil(amps)}}};
    }
    if (!r.bypass || !r.bypassA || *r.bypassA >= amps - 1e-9)
        return;
    auto& f = c.add("branch.soft_starter.bypass", ss,
                    "bypass contactor of " + ss.tag + " rated " + fmt(*r.bypassA) +
                        " A AC-3 is below the motor current " + fmt(amps) + " A");
    f.computed = *r.bypassA;
    f.limit = amps;
    f.unit = "A";
    f.trace.push_back({"motor current", fmt(amps) + " A (the larger of table FLC " +
                                            fmt(c.flc.amps) + " A and nameplate FLA)"});
    f.trace.push_back({"basis", "the bypass carries the running motor (IEC 60947-4-1 AC-3 "
                                "rating; common practice)"});
    f.fix = Fix{"use a bypass contactor rated at least " + fmt(amps) + " A AC-3",
                {{ss.id, SoftStarterRatings::kBypassA, std::ceil(amps)}}};
}

} // namespace

void checkBranchStarters(BranchCheck& c) {
    if (const Part* vfd = c.b.drive) {
        const auto r = VfdRatings::of(*vfd);
        driveInputConductors(c, *vfd, r);
        driveScpd(c, *vfd, r);
        driveOutput(c, *vfd, r);
    }
    if (const Part* ss = c.b.softStarter)
        softStarter(c, *ss);
}

} // namespace lineward
