// The Add Bucket preview: what set each value of a proposed bucket (the clause or table for the
// sized values, the builder's stated practice for the rest), a designer's change checked by the
// part's own field validation, and the findings of the drawing with the bucket added.
#include "lineup/bucket_preview.h"

#include "check/check.h"

#include <algorithm>

namespace lineward {

namespace {

constexpr const char* kDutyBasis = "the bus's available fault from the check, next standard "
                                   "duty rating (110.9, 110.10; ratings from memory)";

// Why the builder gave `key` of a part of kind `k` its value, where describeBucket's one line
// per part does not already say it (that line covers the part's sized value).
std::string builderBasis(PartKind k, std::string_view key) {
    switch (k) {
    case PartKind::Breaker:
        if (key == "frame_a")
            return "smallest frame at or above the trip rating (common practice)";
        if (key == "inst_x")
            return "instantaneous at 10 × the trip rating, a usual thermal-magnetic setting "
                   "(common practice, from memory)";
        if (key == "trip_type")
            return "the row's short-circuit device: inverse-time breaker";
        break;
    case PartKind::InstBreaker:
        if (key == "amps")
            return "smallest continuous rating of at least 115 % of the FLC whose 13 × "
                   "reaches the setting (common practice)";
        if (key == "pickup_min_a" || key == "pickup_max_a")
            return "adjustment range 3–13 × the continuous rating (common practice, from memory)";
        break;
    case PartKind::Fuse:
        if (key == "fuse_type" || key == "fuse_class")
            return "time-delay class RK5 motor fuses (common practice)";
        if (key == "interrupting_ka")
            return "class RK5 fuses interrupt 200 kA (UL 248-12)";
        break;
    case PartKind::Disconnect:
        if (key == "hp_rating")
            return "at least the motor's hp (430.109)";
        if (key == "fused")
            return "the row's short-circuit device: fused switch";
        break;
    case PartKind::Vfd:
    case PartKind::SoftStarter:
        if (key == "hp")
            return "the motor's hp";
        if (key == "volts")
            return "the bus's system voltage";
        if (key == "bypass")
            return "a bypass contactor, integral (common practice)";
        break;
    case PartKind::Overload:
        if (key == "range_min_a" || key == "range_max_a")
            return "adjustment range 0.75–1.3 × the setting (common practice)";
        break;
    case PartKind::Cable:
        if (key == "material")
            return "copper (common practice)";
        if (key == "length_ft")
            return "the row's cable length";
        if (key == "insulation_c")
            return "90 °C insulation, THHN/XHHW (common practice)";
        if (key == "termination_c")
            return "terminations per 110.14(C)";
        if (key == "raceway")
            return "steel conduit (common practice)";
        break;
    case PartKind::Motor:
        return "typed in";
    default:
        break;
    }
    if (key == "interrupting_ka")
        return kDutyBasis;
    return "field default";
}

// The key whose value describeBucket's line for this kind explains.
bool isSizedKey(PartKind k, std::string_view key) {
    switch (k) {
    case PartKind::Breaker:
        return key == "trip_a";
    case PartKind::InstBreaker:
        return key == "pickup_a";
    case PartKind::Disconnect:
    case PartKind::Fuse:
        return key == "amps";
    case PartKind::Contactor:
        return key == "nema_size";
    case PartKind::Overload:
        return key == "setting_a" || key == "trip_class";
    case PartKind::Vfd:
        return key == "input_a" || key == "output_a";
    case PartKind::SoftStarter:
        return key == "amps";
    case PartKind::Cable:
        return key == "size" || key == "egc_size";
    default:
        return false;
    }
}

} // namespace

std::vector<BucketField> bucketFields(const PlannedBucket& b) {
    const auto lines = describeBucket(b);
    std::vector<BucketField> out;
    for (std::size_t i = 0; i < b.parts.size(); ++i) {
        const Part& p = b.parts[i];
        const auto fields = kindInfo(p.kind).fields;
        for (std::size_t f = 0; f < fields.size(); ++f) {
            if (std::holds_alternative<std::monostate>(p.values[f]))
                continue;
            const std::string key(fields[f].key);
            std::string basis;
            if (std::find(b.changed.begin(), b.changed.end(), std::pair{i, key}) != b.changed.end())
                basis = "changed by the designer";
            else if (isSizedKey(p.kind, key) && i < lines.size())
                basis = lines[i].basis;
            else
                basis = builderBasis(p.kind, key);
            out.push_back({i, key, std::move(basis)});
        }
    }
    return out;
}

std::optional<std::string> changeBucketValue(PlannedBucket& b, std::size_t partIndex,
                                             std::string_view key, FieldValue v) {
    if (partIndex >= b.parts.size())
        return "no such part in the bucket";
    Part trial = b.parts[partIndex];
    if (!findField(trial.kind, key))
        return trial.tag + " has no rating '" + std::string(key) + "'";
    if (auto why = trial.set(key, std::move(v), FieldNaming::People))
        return why;
    if (trial == b.parts[partIndex])
        return std::nullopt;
    b.parts[partIndex] = std::move(trial);
    const std::pair<std::size_t, std::string> mark{partIndex, std::string(key)};
    if (std::find(b.changed.begin(), b.changed.end(), mark) == b.changed.end())
        b.changed.push_back(mark);
    return std::nullopt;
}

std::vector<Finding> findingsWithPlan(const Drawing& d, const BucketPlan& plan, PartId bus,
                                      const CheckReport& before, const Tables& t) {
    Drawing copy = d;
    copy.addParts(plan.allParts());
    copy.addWires(plan.allWires());
    copy.addBuckets(plan.allBuckets());
    const auto result = runCheck(copy, t);
    std::vector<PartId> ours;
    for (const auto& p : plan.allParts())
        ours.push_back(p.id);
    auto names = [](const Finding& f, auto pred) {
        return std::any_of(f.parts.begin(), f.parts.end(), pred);
    };
    auto already = [&](const Finding& f) {
        return std::any_of(before.findings.begin(), before.findings.end(), [&](const Finding& o) {
            return o.ruleId == f.ruleId && o.parts == f.parts;
        });
    };
    std::vector<Finding> out;
    for (const auto& f : result->report.findings) {
        if (f.accepted)
            continue;
        const bool onPlan = names(
            f, [&](PartId id) { return std::find(ours.begin(), ours.end(), id) != ours.end(); });
        if (onPlan || (names(f, [&](PartId id) { return id == bus; }) && !already(f)))
            out.push_back(f);
    }
    return out;
}

} // namespace lineward
