// Bucket templates: the fragment is collected by following the wires from the bucket's devices
// down to its motor; the row keeps the motor whole and the choices a load-list row names.
#include "lineup/bucket_template.h"

#include "model/ratings.h"

#include <algorithm>
#include <set>

namespace lineward {

namespace {

// The parts wired to `id` (either end).
std::vector<PartId> neighbours(const Drawing& d, PartId id) {
    std::vector<PartId> out;
    for (const auto& w : d.wires()) {
        if (w.a.part == id)
            out.push_back(w.b.part);
        else if (w.b.part == id)
            out.push_back(w.a.part);
    }
    return out;
}

} // namespace

std::optional<Drawing> bucketFragment(const Drawing& d, BucketId bucketId, std::string& why) {
    const Bucket* bucket = d.bucket(bucketId);
    if (!bucket) {
        why = "no such bucket";
        return std::nullopt;
    }
    // The bucket's parts, then cables and motors reached from them without crossing a bus or
    // another bucket's part (the branch below the bucket).
    std::set<PartId> keep(bucket->parts.begin(), bucket->parts.end());
    std::vector<PartId> todo(bucket->parts.begin(), bucket->parts.end());
    while (!todo.empty()) {
        const PartId at = todo.back();
        todo.pop_back();
        for (PartId n : neighbours(d, at)) {
            const Part* p = d.part(n);
            if (!p || keep.count(n) || (p->kind != PartKind::Cable && p->kind != PartKind::Motor))
                continue;
            if (const Bucket* other = d.bucketOf(n); other && other->id != bucketId)
                continue;
            keep.insert(n);
            todo.push_back(n);
        }
    }
    Drawing out;
    std::vector<Part> parts;
    for (PartId id : keep)
        parts.push_back(*d.part(id));
    if (std::count_if(parts.begin(), parts.end(),
                      [](const Part& p) { return p.kind == PartKind::Motor; }) != 1) {
        why = "bucket " + bucket->tag + " does not feed exactly one motor";
        return std::nullopt;
    }
    std::vector<Wire> wires;
    for (const auto& w : d.wires())
        if (keep.count(w.a.part) && keep.count(w.b.part))
            wires.push_back(w);
    out.settings = d.settings;
    out.addParts(std::move(parts));
    out.addWires(std::move(wires));
    out.addBucket(*bucket);
    return out;
}

std::optional<LoadRow> templateRow(const Drawing& fragment, std::string& why) {
    LoadRow row;
    int motors = 0;
    bool device = false;
    row.starter = LoadStarter::Fvnr; // a drive or soft starter in the fragment says otherwise
    for (const auto& p : fragment.parts()) {
        switch (p.kind) {
        case PartKind::Vfd:
            row.starter = LoadStarter::Vfd;
            break;
        case PartKind::SoftStarter:
            row.starter = LoadStarter::Soft;
            break;
        case PartKind::Motor:
            ++motors;
            row.motor = p;
            break;
        case PartKind::Breaker:
            row.protection = LoadProtection::Breaker;
            device = true;
            break;
        case PartKind::InstBreaker:
            row.protection = LoadProtection::InstBreaker;
            device = true;
            break;
        case PartKind::Fuse:
            row.protection = LoadProtection::Fuse;
            device = true;
            break;
        case PartKind::Cable:
            row.lengthFt = CableRatings::of(p).lengthFt;
            break;
        default:
            break;
        }
    }
    if (motors != 1) {
        why = "a bucket template holds exactly one motor; this one holds " + std::to_string(motors);
        return std::nullopt;
    }
    if (!device) {
        why = "the template has no short-circuit device (breaker, motor circuit protector or "
              "fuses)";
        return std::nullopt;
    }
    if (row.lengthFt <= 0)
        row.lengthFt = kLoadListDefaultLengthFt;
    return row;
}

} // namespace lineward
