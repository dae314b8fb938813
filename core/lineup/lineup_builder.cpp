// Lineup builder: each row sized by proposeBucket into the parts of a bucket; a whole lineup
// sized around them (NEC 2023 430.24, 430.62(A), 450.3) and its fault duty read from the check.
#include "lineup/lineup_builder.h"

#include "lineup/lineup_detail.h"
#include "model/ratings.h"

#include <algorithm>
#include <cmath>
#include <set>
#include <stdexcept>

namespace lineward {

namespace {

// Ratings a real bucket is bought in (common practice, from memory): breaker frames, motor
// circuit protector continuous ratings, fusible switch ratings.
constexpr double kFrames[] = {100,  150,  225,  250,  400,  600, 800,
                              1200, 1600, 2000, 2500, 3000, 4000};
constexpr double kMcpAmps[] = {3, 7, 15, 30, 50, 100, 150, 250, 400, 600, 800, 1200};
constexpr double kSwitchAmps[] = {30, 60, 100, 200, 400, 600, 800, 1200};
// Bucket layout on the Sheet, as the samples draw it (grid units below the bus).
constexpr double kPitchX = 110, kDeviceDy = 70, kFuseDy = 115, kContactorDy = 160,
                 kOverloadDy = 210, kCableDy = 260, kMotorDy = 320;
// Overload relay adjustment range around its setting (common practice: 0.75–1.3 ×).
constexpr double kRelayLow = 0.75, kRelayHigh = 1.3;

using lineup_detail::firstAtOrAbove;
using lineup_detail::put;

ScpdType deviceFor(const LoadRow& row) {
    // An instantaneous-only breaker is permitted only in a combination controller with its
    // overload relay (430.52(C)(3)); a drive's bucket has no relay, so it takes an inverse-time
    // breaker (rowNotes says so).
    if (row.starter == LoadStarter::Vfd && row.protection == LoadProtection::InstBreaker)
        return ScpdType::InverseTimeBreaker;
    switch (row.protection) {
    case LoadProtection::InstBreaker:
        return ScpdType::InstantaneousBreaker;
    case LoadProtection::Fuse:
        return ScpdType::TimeDelayFuse;
    case LoadProtection::Breaker:
        break;
    }
    return ScpdType::InverseTimeBreaker;
}

// Ids handed out in order, after the drawing's.
struct IdSource {
    std::uint32_t part, wire;
    PartId nextPart() { return PartId(part++); }
    WireId nextWire() { return WireId(wire++); }
};

// The short-circuit device(s) of a bucket, top first.
std::vector<Part> scpdParts(const LoadRow& row, const BucketProposal& p, double kA, IdSource& ids,
                            double x, double y) {
    const std::string& tag = row.motor.tag;
    std::vector<Part> out;
    if (p.device == ScpdType::InverseTimeBreaker) {
        Part b = Part::make(PartKind::Breaker, ids.nextPart(), "CB-" + tag);
        put(b, {{BreakerRatings::kTripType, std::string("thermal_magnetic")},
                {BreakerRatings::kFrameA, firstAtOrAbove(kFrames, p.deviceRatingA).value_or(4000)},
                {BreakerRatings::kTripA, p.deviceRatingA},
                {BreakerRatings::kInterruptingKa, kA},
                {"inst_x", 10.0}});
        out.push_back(std::move(b));
    } else if (p.device == ScpdType::InstantaneousBreaker) {
        Part m = Part::make(PartKind::InstBreaker, ids.nextPart(), "MCP-" + tag);
        double amps = 1200;
        for (double a : kMcpAmps)
            if (a >= 1.15 * p.flc.amps && 13 * a >= p.deviceRatingA) {
                amps = a;
                break;
            }
        put(m, {{InstBreakerRatings::kAmps, amps},
                {InstBreakerRatings::kPickupA, p.deviceRatingA},
                {"pickup_min_a", std::min(3 * amps, p.deviceRatingA)},
                {"pickup_max_a", std::max(13 * amps, p.deviceRatingA)},
                {"interrupting_ka", kA}});
        out.push_back(std::move(m));
    } else {
        Part ds = Part::make(PartKind::Disconnect, ids.nextPart(), "DS-" + tag);
        const double need = std::max(p.disconnectMinA, p.deviceRatingA);
        put(ds, {{DisconnectRatings::kAmps, firstAtOrAbove(kSwitchAmps, need).value_or(need)},
                 {DisconnectRatings::kHpRating,
                  std::ceil(std::max(p.flc.hpUsed, motorHp(row.motor)) * 10) / 10},
                 {DisconnectRatings::kFused, true}});
        Part fu = Part::make(PartKind::Fuse, ids.nextPart(), "FU-" + tag);
        put(fu, {{FuseRatings::kType, std::string("time_delay")},
                 {FuseRatings::kClass, std::string("RK5")},
                 {FuseRatings::kAmps, p.deviceRatingA},
                 {"interrupting_ka", 200.0}}); // class RK5 fuses interrupt 200 kA (UL 248-12)
        fu.x = x;
        fu.y = y + kFuseDy;
        out.push_back(std::move(ds));
        out.push_back(std::move(fu));
    }
    out.front().x = x;
    out.front().y = y + kDeviceDy;
    return out;
}

// The part that starts the motor: a contactor (full voltage), a soft starter (its bypass
// contactor a field of it: integral, rated with the starter) or a drive.
Part startingPart(const LoadRow& row, const BucketProposal& p, IdSource& ids, double volts) {
    const std::string& tag = row.motor.tag;
    const double hp = std::ceil(std::max(p.flc.hpUsed, motorHp(row.motor)) * 10) / 10;
    if (row.starter == LoadStarter::Vfd) {
        Part v = Part::make(PartKind::Vfd, ids.nextPart(), "VFD-" + tag);
        put(v, {{VfdRatings::kHp, hp},
                {VfdRatings::kVolts, volts},
                {VfdRatings::kInputA, p.driveInputA.value_or(0)},
                {VfdRatings::kOutputA, p.driveOutputA.value_or(0)}});
        return v;
    }
    if (row.starter == LoadStarter::Soft) {
        Part ss = Part::make(PartKind::SoftStarter, ids.nextPart(), "SS-" + tag);
        put(ss, {{SoftStarterRatings::kHp, hp},
                 {SoftStarterRatings::kVolts, volts},
                 {SoftStarterRatings::kAmps, p.softStarterA.value_or(0)},
                 {SoftStarterRatings::kBypass, true}});
        return ss;
    }
    Part k = Part::make(PartKind::Contactor, ids.nextPart(), "K-" + tag);
    if (!p.nemaSize.empty())
        put(k, {{ContactorRatings::kNemaSize, p.nemaSize}});
    return k;
}

// The starter, overload relay (none for a drive), cable and motor; `volts` is the bus's
// system voltage, the rated voltage of a drive or soft starter.
std::vector<Part> starterParts(const LoadRow& row, const BucketProposal& p, IdSource& ids, double x,
                               double y, double volts) {
    const std::string& tag = row.motor.tag;
    Part k = startingPart(row, p, ids, volts);
    Part ol = Part::make(PartKind::Overload, ids.nextPart(), "OL-" + tag);
    put(ol, {{OverloadRatings::kSettingA, p.overloadSettingA},
             {OverloadRatings::kRangeMinA, std::round(kRelayLow * p.overloadSettingA * 10) / 10},
             {OverloadRatings::kRangeMaxA, std::round(kRelayHigh * p.overloadSettingA * 10) / 10},
             {"trip_class", p.tripClass}});
    Part c = Part::make(PartKind::Cable, ids.nextPart(), "C-" + tag);
    put(c, {{CableRatings::kMaterial, std::string("cu")},
            {CableRatings::kSize, p.conductorSize},
            {CableRatings::kLengthFt, row.lengthFt},
            {"insulation_c", 90.0},
            {"termination_c", static_cast<double>(p.terminationC)},
            {"raceway", std::string("steel")}});
    if (!p.egcSize.empty())
        put(c, {{"egc_size", p.egcSize}});
    Part m = row.motor;
    m.id = ids.nextPart();
    k.x = ol.x = c.x = m.x = x;
    k.y = y + kContactorDy;
    ol.y = y + kOverloadDy;
    c.y = y + kCableDy;
    m.y = y + kMotorDy;
    if (row.starter == LoadStarter::Vfd) // the drive protects the motor against overload
        return {std::move(k), std::move(c), std::move(m)};
    return {std::move(k), std::move(ol), std::move(c), std::move(m)};
}

// The soft starter's current limit where none is entered: its field's default.
double defaultStartLimitX() {
    return SoftStarterRatings::of(Part::make(PartKind::SoftStarter, PartId(1), "SS")).startLimitX;
}

std::vector<std::string> rowNotes(const LoadRow& row) {
    const std::string tag = row.motor.tag;
    switch (row.starter) {
    case LoadStarter::Soft:
        return {tag + ": soft starter SS-" + tag +
                " rated at the motor current with an integral bypass and a " +
                fmt(defaultStartLimitX(), 1) +
                " × FLC start limit (common practice); enter its nameplate, bypass rating and "
                "current limit"};
    case LoadStarter::Vfd: {
        std::vector<std::string> notes{
            tag + ": drive VFD-" + tag + " sized from the motor: input current " +
            fmt(kAssumedDriveInputX, 2) + " × output assumed, short-circuit device within " +
            fmt(kAssumedDriveScpdX, 2) +
            " × input assumed as its listing's maximum (common practice); enter the drive's "
            "nameplate input current and its listed maximum (max_scpd_a)"};
        if (row.protection == LoadProtection::InstBreaker)
            notes.push_back(tag + ": an inverse-time breaker instead of the instantaneous-only "
                                  "breaker asked for: the drive's bucket has no overload relay, "
                                  "which 430.52(C)(3) requires beside one");
        return notes;
    }
    case LoadStarter::Fvr:
        return {tag + ": reversing starter drawn with one contactor, as a one-line shows it"};
    case LoadStarter::Fvnr:
        break;
    }
    return {};
}

// Where the next bucket goes: right of the rightmost part wired to the bus, or centred under it.
double firstBucketX(const Drawing& d, const Part& bus, std::size_t count) {
    std::optional<double> right;
    for (const auto& w : d.wires())
        for (const auto& [here, there] : {std::pair{w.a, w.b}, std::pair{w.b, w.a}})
            if (here.part == bus.id)
                if (const Part* p = d.part(there.part); p && p->y > bus.y)
                    right = std::max(right.value_or(p->x), p->x);
    if (right)
        return *right + kPitchX;
    return bus.x - kPitchX * (static_cast<double>(count) - 1) / 2;
}

std::string bucketTag(const Drawing& d, const Part& bus, int& n) {
    auto used = [&](const std::string& t) {
        return std::any_of(d.buckets().begin(), d.buckets().end(),
                           [&](const Bucket& b) { return b.tag == t; });
    };
    std::string t;
    do
        t = bus.tag + "-" + std::to_string(++n);
    while (used(t));
    return t;
}

// Why a bucket's tags cannot be used: one is in the drawing or in an earlier row's bucket.
std::optional<std::string> tagClash(const Drawing& d, const std::set<std::string>& planned,
                                    const std::vector<Part>& parts) {
    for (const auto& p : parts) {
        if (d.partByTag(p.tag))
            return "tag '" + p.tag + "' is already used in the drawing";
        if (planned.count(p.tag))
            return "tag '" + p.tag + "' is already used by an earlier row's bucket";
    }
    return std::nullopt;
}

} // namespace

std::vector<Part> BucketPlan::allParts() const {
    std::vector<Part> out;
    for (const auto& b : buckets)
        out.insert(out.end(), b.parts.begin(), b.parts.end());
    return out;
}

std::vector<Wire> BucketPlan::allWires() const {
    std::vector<Wire> out;
    for (const auto& b : buckets)
        out.insert(out.end(), b.wires.begin(), b.wires.end());
    return out;
}

std::vector<Bucket> BucketPlan::allBuckets() const {
    std::vector<Bucket> out;
    for (const auto& b : buckets)
        out.push_back(b.bucket);
    return out;
}

BucketPlan planBuckets(const Drawing& d, PartId busId, const std::vector<LoadRow>& rows,
                       double interruptingKa, const Tables& t) {
    BucketPlan plan;
    const Part* bus = d.part(busId);
    if (!bus || bus->kind != PartKind::Bus)
        throw std::invalid_argument("planBuckets: not a bus");
    IdSource ids{d.nextPartId().value, d.nextWireId().value};
    std::uint32_t bucketId = d.nextBucketId().value;
    double x = firstBucketX(d, *bus, rows.size());
    int bucketNo = static_cast<int>(d.buckets().size());
    std::set<std::string> planned; // tags of the buckets planned so far
    for (const auto& row : rows) {
        SizeOptions o;
        o.device = deviceFor(row);
        o.ambientC = d.settings.ambientC;
        o.asymmetryFactor = d.settings.asymmetryFactor;
        std::string why;
        auto p = proposeBucket(row.motor, o, t, why);
        if (p && row.starter == LoadStarter::Vfd)
            if (auto fail = sizeForDrive(*p, row.motor, o, t)) {
                why = *fail;
                p.reset();
            }
        if (p && row.starter == LoadStarter::Soft)
            sizeForSoftStarter(*p, row.motor, t);
        if (!p) {
            plan.refused.push_back({row.line, 1, "cannot size " + row.motor.tag + ": " + why});
            continue;
        }
        PlannedBucket b;
        b.line = row.line;
        IdSource trial = ids; // ids are taken only when the row is kept
        b.parts = scpdParts(row, *p, interruptingKa, trial, x, bus->y);
        auto rest = starterParts(row, *p, trial, x, bus->y, BusRatings::of(*bus).volts);
        b.parts.insert(b.parts.end(), rest.begin(), rest.end());
        if (auto why = tagClash(d, planned, b.parts)) {
            plan.refused.push_back({row.line, row.tagColumn, *why});
            continue;
        }
        ids = trial;
        for (const auto& part : b.parts)
            planned.insert(part.tag);
        b.wires.push_back({ids.nextWire(), {bus->id, 0}, {b.parts.front().id, 0}});
        for (std::size_t i = 0; i + 1 < b.parts.size(); ++i)
            b.wires.push_back({ids.nextWire(), {b.parts[i].id, 1}, {b.parts[i + 1].id, 0}});
        b.bucket.id = BucketId(bucketId++);
        b.bucket.tag = bucketTag(d, *bus, bucketNo);
        b.bucket.sccrKa = interruptingKa;
        for (const auto& part : b.parts)
            if (part.kind != PartKind::Cable && part.kind != PartKind::Motor)
                b.bucket.parts.push_back(part.id);
        b.notes = rowNotes(row);
        b.proposal = std::move(*p);
        plan.buckets.push_back(std::move(b));
        x += kPitchX;
    }
    return plan;
}

} // namespace lineward

namespace lineward {

namespace {

ProposalLine deviceLine(const Part& p, const BucketProposal& b) {
    switch (p.kind) {
    case PartKind::Breaker:
        return {p.tag, "inverse-time breaker " + fmt(b.deviceRatingA, 0) + " A",
                b.driveMaxScpdA
                    ? "largest standard rating within Table 430.52(C)(1) and the drive's listing "
                      "maximum, assumed " +
                          fmt(kAssumedDriveScpdX, 2) + " × input = " + fmt(*b.driveMaxScpdA, 1) +
                          " A (common practice)"
                    : "largest rating NEC 2023 Table 430.52(C)(1) permits, next standard rating "
                      "of 240.6(A) (430.52(C)(1) Exception No. 1)"};
    case PartKind::InstBreaker:
        return {p.tag, "instantaneous setting " + fmt(b.deviceRatingA, 0) + " A",
                b.softStarterA
                    ? "lowest setting above the soft starter's " + fmt(defaultStartLimitX(), 1) +
                          " × FLC start limit (common practice), within the "
                          "430.52(C)(3) limit"
                    : "lowest setting above the asymmetrical inrush (common practice), "
                      "within the 430.52(C)(3) limit"};
    case PartKind::Disconnect:
        return {p.tag, "fused switch " + fmt(DisconnectRatings::of(p).amps, 0) + " A",
                "at least 115 % of the FLC (" + fmt(b.disconnectMinA) +
                    " A, 430.110(A)) and the fuses; hp rating at least the motor's (430.109)"};
    case PartKind::Fuse:
        return {p.tag, "time-delay fuses " + fmt(b.deviceRatingA, 0) + " A",
                b.driveMaxScpdA
                    ? "largest standard fuse rating within Table 430.52(C)(1) and the drive's "
                      "listing maximum, assumed " +
                          fmt(kAssumedDriveScpdX, 2) + " × input = " + fmt(*b.driveMaxScpdA, 1) +
                          " A (common practice)"
                    : "largest rating NEC 2023 Table 430.52(C)(1) permits, next standard fuse "
                      "rating"};
    default:
        return {p.tag, "", ""};
    }
}

} // namespace

std::vector<ProposalLine> describeBucket(const PlannedBucket& b) {
    const BucketProposal& p = b.proposal;
    std::vector<ProposalLine> out;
    for (const auto& part : b.parts) {
        switch (part.kind) {
        case PartKind::Contactor:
            out.push_back({part.tag,
                           "NEMA size " + (p.nemaSize.empty() ? "(none fits)" : p.nemaSize),
                           "smallest size rated for the hp and current (NEMA ICS 2 Table 2-4-1)"});
            break;
        case PartKind::Overload:
            out.push_back(
                {part.tag, "set " + fmt(p.overloadSettingA) + " A, class " + p.tripClass,
                 (p.overloadMaxA
                      ? "nameplate FLA, at most " + fmt(*p.overloadMaxA) + " A (430.32(A)(1)); "
                      : std::string("no nameplate FLA: set at the FLC; "
                                    "enter the FLA (430.6(A)(2)); ")) +
                     "class that outlasts the acceleration time (IEC 60947-4-1 Table 3)"});
            break;
        case PartKind::Vfd:
            out.push_back(
                {part.tag,
                 "drive " + fmt(p.driveOutputA.value_or(0)) + " A out, " +
                     fmt(p.driveInputA.value_or(0)) + " A in",
                 "output at the motor current (the larger of FLC and nameplate FLA); input " +
                     fmt(kAssumedDriveInputX, 2) +
                     " × output assumed (common practice, from memory); the drive provides the "
                     "overload protection (430.124(A))"});
            break;
        case PartKind::SoftStarter:
            out.push_back({part.tag, "soft starter " + fmt(p.softStarterA.value_or(0), 0) + " A",
                           "at least the motor current (the larger of FLC and nameplate FLA); "
                           "integral bypass; start limit " +
                               fmt(defaultStartLimitX(), 1) + " × FLC (common practice)"});
            break;
        case PartKind::Cable:
            out.push_back(
                {part.tag,
                 p.conductorSize + " Cu" + (p.egcSize.empty() ? "" : ", EGC " + p.egcSize),
                 (p.driveInputA ? "125 % of the drive's input current = " + fmt(p.conductorMinA) +
                                      " A (430.122(A); covers 125 % FLC on the output side)"
                                : "125 % of FLC = " + fmt(p.conductorMinA) + " A (430.22)") +
                     ", Table 310.16 at " + std::to_string(p.terminationC) +
                     " °C terminations (110.14(C)); EGC Table 250.122"});
            break;
        case PartKind::Motor:
            out.push_back({part.tag, "FLC " + fmt(p.flc.amps) + " A",
                           p.flc.fromTable ? "NEC 2023 Table 430.250 (430.6(A)(1))"
                                           : "nameplate: the table has no row (430.6(A)(1))"});
            break;
        default:
            out.push_back(deviceLine(part, p));
        }
    }
    return out;
}

} // namespace lineward
