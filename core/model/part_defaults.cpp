// Starter ratings are common practice for a 480 V MCC, not design values. Voltages of a new
// part follow the node it is dropped onto; pasted tags are renumbered bucket by bucket.
#include "model/part_defaults.h"

#include <array>
#include <cmath>
#include <cstdlib>
#include <deque>
#include <map>
#include <set>
#include <tuple>
#include <unordered_map>
#include <unordered_set>

namespace lineward {

Part makeStarterPart(PartKind kind, PartId id, std::string tag) {
    Part p = Part::make(kind, id, std::move(tag));
    auto set = [&](const char* key, FieldValue v) {
        p.values[*fieldIndex(kind, key)] = std::move(v);
    };
    switch (kind) {
    case PartKind::Source:
        set("kv", 0.48);
        set("fault_ka", 30.0);
        break;
    case PartKind::Transformer:
        set("kva", 500.0);
        set("pri_v", 13800.0);
        set("sec_v", 480.0);
        set("z_pct", 5.75);
        break;
    case PartKind::Bus:
        set("volts", 480.0);
        set("amps", 600.0);
        set("bracing_ka", 42.0);
        break;
    case PartKind::Breaker:
        set("trip_a", 100.0);
        set("frame_a", 100.0);
        set("interrupting_ka", 65.0);
        set("inst_x", 10.0);
        break;
    case PartKind::InstBreaker:
        set("amps", 50.0);
        set("pickup_a", 300.0);
        set("interrupting_ka", 65.0);
        break;
    case PartKind::Fuse:
        set("amps", 30.0);
        set("interrupting_ka", 200.0);
        break;
    case PartKind::Disconnect:
        set("amps", 30.0);
        set("hp_rating", 10.0);
        break;
    case PartKind::Contactor:
        set("nema_size", std::string("1"));
        break;
    case PartKind::Overload:
        set("setting_a", 14.0);
        break;
    case PartKind::Vfd: // sized for the default 10 hp, 460 V motor (14 A, NEC Table 430.250)
        set("hp", 10.0);
        set("volts", 480.0);
        set("input_a", 15.4);
        set("output_a", 14.0);
        break;
    case PartKind::SoftStarter:
        set("hp", 10.0);
        set("volts", 480.0);
        set("amps", 17.0);
        break;
    case PartKind::Cable:
        set("size", std::string("12 AWG"));
        set("length_ft", 50.0);
        break;
    case PartKind::Motor:
        set("hp", 10.0);
        set("volts", 460.0);
        set("fla", 14.0);
        break;
    case PartKind::Load:
        set("kva", 15.0);
        set("volts", 480.0);
        break;
    }
    return p;
}

namespace {

// NEC 2023 Table 430.250 column headings, from memory: {system voltage, motor voltage}.
constexpr std::array<std::pair<double, double>, 5> kMotorColumns{
    {{120, 115}, {208, 200}, {240, 230}, {480, 460}, {600, 575}}};

// The system a motor of this nameplate voltage is meant for (460 V -> 480 V).
double systemForMotor(double motorV) {
    for (auto [sys, motor] : kMotorColumns)
        if (std::abs(motorV - motor) < 0.5)
            return sys;
    return motorV;
}

std::optional<double> positive(std::optional<double> v, double scale = 1.0) {
    if (v && *v > 0)
        return *v * scale;
    return std::nullopt;
}

// The voltage a part fixes at one of its terminals, if it fixes one.
std::optional<double> voltsSetBy(const Part& p, int terminal) {
    switch (p.kind) {
    case PartKind::Source:
        return positive(p.number("kv"), 1000.0);
    case PartKind::Transformer:
        return positive(p.number(terminal == 0 ? "pri_v" : "sec_v"));
    case PartKind::Bus:
    case PartKind::Load:
        return positive(p.number("volts"));
    case PartKind::Motor:
        if (auto v = positive(p.number("volts")))
            return systemForMotor(*v);
        return std::nullopt;
    default:
        return std::nullopt;
    }
}

std::uint64_t endKey(WireEnd e) {
    return (std::uint64_t(e.part.value) << 8) | std::uint64_t(e.terminal & 0xff);
}

} // namespace

std::optional<double> terminalVolts(const Drawing& d, WireEnd at) {
    std::unordered_map<std::uint64_t, std::vector<WireEnd>> wired;
    for (const auto& w : d.wires()) {
        wired[endKey(w.a)].push_back(w.b);
        wired[endKey(w.b)].push_back(w.a);
    }
    std::deque<WireEnd> queue{at};
    std::unordered_set<std::uint64_t> seen{endKey(at)};
    auto visit = [&](WireEnd e) {
        if (seen.insert(endKey(e)).second)
            queue.push_back(e);
    };
    while (!queue.empty()) {
        const WireEnd e = queue.front();
        queue.pop_front();
        const Part* p = d.part(e.part);
        if (!p)
            continue;
        if (auto v = voltsSetBy(*p, e.terminal))
            return v;
        if (auto it = wired.find(endKey(e)); it != wired.end())
            for (auto other : it->second)
                visit(other);
        if (isTwoTerminal(p->kind) && p->kind != PartKind::Transformer)
            visit(WireEnd{e.part, 1 - e.terminal}); // through a series device
    }
    return std::nullopt;
}

double systemVolts(const Drawing& d) {
    std::map<double, int> count;
    for (const auto& p : d.parts())
        if (p.kind == PartKind::Bus)
            if (auto v = positive(p.number("volts")))
                ++count[*v];
    double best = 480.0;
    int most = 0;
    for (auto [v, n] : count)
        if (n > most) {
            best = v;
            most = n;
        }
    return best;
}

double motorVoltsFor(double systemV) {
    for (auto [sys, motor] : kMotorColumns)
        if (std::abs(systemV - sys) <= 0.02 * sys)
            return motor;
    return systemV;
}

Part makeStarterPart(const Drawing& d, PartKind kind, std::optional<WireEnd> onto) {
    Part p = makeStarterPart(kind, d.nextPartId(), nextTag(d, kind));
    const double sys = systemVolts(d);
    // The voltage where it is dropped (0 when nothing there sets one).
    const double dropV = onto ? terminalVolts(d, *onto).value_or(0.0) : 0.0;
    auto there = [&](double otherwise) { return dropV > 0 ? dropV : otherwise; };
    auto set = [&](const char* key, double v) {
        p.values[*fieldIndex(kind, key)] = FieldValue(std::round(v * 1000.0) / 1000.0);
    };
    switch (kind) {
    case PartKind::Source: // a utility service like the starter transformer's primary
        set("kv", there(13800.0) / 1000.0);
        break;
    case PartKind::Transformer: {
        // Fed from what it is dropped below. A medium-voltage primary steps down to the
        // drawing's system; a low-voltage one to 208 V (common practice: a 480-208Y/120 V
        // lighting transformer).
        const double pri = there(13800.0);
        set("pri_v", pri);
        set("sec_v", pri > 1000.0 ? sys : (pri > 208.0 ? 208.0 : sys));
        break;
    }
    case PartKind::Bus:
    case PartKind::Load:
        set("volts", there(sys));
        break;
    case PartKind::Motor: {
        const double volts = motorVoltsFor(there(sys));
        set("volts", volts);
        // Common practice: the same motor draws current in inverse proportion to voltage
        // (the starter's 14 A is a 10 hp motor at 460 V).
        set("fla", std::round(14.0 * 460.0 / volts * 10.0) / 10.0);
        break;
    }
    default:
        break;
    }
    return p;
}

std::string nextTag(const Drawing& d, PartKind kind) {
    const std::string prefix(kindInfo(kind).tagPrefix);
    long best = 0;
    for (const auto& p : d.parts())
        if (p.tag.rfind(prefix, 0) == 0) {
            char* end = nullptr;
            const long n = std::strtol(p.tag.c_str() + prefix.size(), &end, 10);
            if (end && *end == '\0' && n > best)
                best = n;
        }
    return prefix + std::to_string(best + 1);
}

namespace {

// A tag split at its last run of digits: "CB-101A" is {"CB-", 101, "A"}.
struct SplitTag {
    std::string head;
    std::optional<long> number;
    std::string tail;
};

SplitTag splitTag(const std::string& tag) {
    const auto last = tag.find_last_of("0123456789");
    if (last == std::string::npos)
        return {tag, std::nullopt, {}};
    auto first = tag.find_last_not_of("0123456789", last);
    first = first == std::string::npos ? 0 : first + 1;
    if (last - first > 8) // too long to be a number we renumber
        return {tag, std::nullopt, {}};
    return {tag.substr(0, first), std::stol(tag.substr(first, last - first + 1)),
            tag.substr(last + 1)};
}

// The tags in use (the drawing's and those already given to pasted parts) and, per head, the
// highest number after it. Part and bucket tags share the numbers, so B-106 goes with M-106.
class TagPool {
public:
    explicit TagPool(const Drawing& d) {
        for (const auto& p : d.parts())
            take(m_parts, p.tag);
        for (const auto& b : d.buckets())
            take(m_buckets, b.tag);
    }
    bool partUsed(const std::string& t) const { return m_parts.count(t) > 0; }
    bool bucketUsed(const std::string& t) const { return m_buckets.count(t) > 0; }
    long highest(const std::string& head) const {
        auto it = m_max.find(head);
        return it == m_max.end() ? 0 : it->second;
    }
    std::string takePart(std::string t) { return take(m_parts, std::move(t)); }
    std::string takeBucket(std::string t) { return take(m_buckets, std::move(t)); }

private:
    std::string take(std::unordered_set<std::string>& set, std::string t) {
        const SplitTag s = splitTag(t);
        if (s.number)
            m_max[s.head] = std::max(highest(s.head), *s.number);
        set.insert(t);
        return t;
    }
    std::unordered_set<std::string> m_parts, m_buckets;
    std::unordered_map<std::string, long> m_max;
};

std::string retag(const SplitTag& s, long n) {
    return s.head + std::to_string(n) + s.tail;
}

// The number most of a bucket's parts carry (101 for CB-101, K-101, OL-101), if any.
std::optional<long> bucketNumber(const Drawing& clip, const Bucket& b) {
    std::map<long, int> count;
    for (auto id : b.parts)
        if (const Part* p = clip.part(id))
            if (auto n = splitTag(p->tag).number)
                ++count[*n];
    std::optional<long> best;
    for (auto [n, c] : count)
        if (!best || c > count[*best])
            best = n;
    return best;
}

// New tags for a pasted bucket and the parts that carry its number: its members and the
// loose pasted parts of that number (the cable and motor of the unit). Nothing when their tags
// are free. Keys are clip part ids; the bucket's own tag is under id 0.
std::map<std::uint32_t, std::string> renumberBucket(const Drawing& clip, const Bucket& b,
                                                    const std::set<std::uint32_t>& loose,
                                                    TagPool& pool) {
    const auto number = bucketNumber(clip, b);
    const SplitTag bt = splitTag(b.tag);
    std::map<std::uint32_t, SplitTag> members;
    bool clash = pool.bucketUsed(b.tag);
    auto consider = [&](const Part& p) {
        SplitTag s = splitTag(p.tag);
        if (number && s.number == number) {
            clash = clash || pool.partUsed(p.tag);
            members.emplace(p.id.value, std::move(s));
        }
    };
    for (auto id : b.parts)
        if (const Part* p = clip.part(id))
            consider(*p);
    for (auto id : loose)
        consider(*clip.part(PartId(id)));
    if (!clash)
        return {};
    std::map<std::uint32_t, std::string> out;
    if (bt.number && bt.number == number)
        members.emplace(0, bt);
    else if (bt.number && pool.bucketUsed(b.tag)) // its own numbering (MCC1-1A): next free
        out[0] = pool.takeBucket(retag(bt, pool.highest(bt.head) + 1));
    long n = 0;
    for (const auto& [id, s] : members)
        n = std::max(n, pool.highest(s.head) + 1);
    auto freeFor = [&](long k) {
        for (const auto& [id, s] : members)
            if (id == 0 ? pool.bucketUsed(retag(s, k)) : pool.partUsed(retag(s, k)))
                return false;
        return true;
    };
    while (!freeFor(n))
        ++n;
    for (const auto& [id, s] : members)
        out[id] = id == 0 ? pool.takeBucket(retag(s, n)) : pool.takePart(retag(s, n));
    return out;
}

// How far the copy lands: 40 units per copy of it already at that place.
double pasteOffset(const Drawing& d, const Drawing& clip) {
    std::set<std::tuple<int, long long, long long>> at;
    for (const auto& p : d.parts())
        at.emplace(int(p.kind), std::llround(p.x), std::llround(p.y));
    for (double off = 40.0;; off += 40.0) {
        bool taken = false;
        for (const auto& p : clip.parts())
            taken = taken ||
                    at.count({int(p.kind), std::llround(p.x + off), std::llround(p.y + off)}) > 0;
        if (!taken || off > 40.0 * 1000)
            return off;
    }
}

} // namespace

PasteSet preparePaste(const Drawing& d, const Drawing& clip) {
    PasteSet out;
    TagPool pool(d);
    std::set<std::uint32_t> loose; // pasted parts in no pasted bucket
    for (const auto& p : clip.parts())
        if (!clip.bucketOf(p.id))
            loose.insert(p.id.value);
    std::map<std::uint32_t, std::string> partTag;
    std::vector<std::string> bucketTag;
    for (const auto& b : clip.buckets()) {
        auto tags = renumberBucket(clip, b, loose, pool);
        for (const auto& [id, tag] : tags)
            loose.erase(id);
        bucketTag.push_back(tags.count(0) ? tags[0] : b.tag);
        tags.erase(0);
        partTag.merge(tags);
    }
    const double off = pasteOffset(d, clip);
    std::unordered_map<std::uint32_t, PartId> newId;
    std::uint32_t next = d.nextPartId().value;
    for (const auto& p : clip.parts()) {
        Part q = p;
        q.id = PartId(next++);
        q.x += off;
        q.y += off;
        if (auto it = partTag.find(p.id.value); it != partTag.end())
            q.tag = it->second;
        else if (pool.partUsed(q.tag)) {
            const std::string prefix(kindInfo(q.kind).tagPrefix);
            q.tag = prefix + std::to_string(pool.highest(prefix) + 1);
        }
        pool.takePart(q.tag);
        newId[p.id.value] = q.id;
        out.parts.push_back(std::move(q));
    }
    std::uint32_t nextWire = d.nextWireId().value;
    for (const auto& w : clip.wires())
        if (newId.count(w.a.part.value) && newId.count(w.b.part.value))
            out.wires.push_back(Wire{WireId(nextWire++),
                                     {newId[w.a.part.value], w.a.terminal},
                                     {newId[w.b.part.value], w.b.terminal}});
    std::uint32_t nextBucket = d.nextBucketId().value;
    for (std::size_t i = 0; i < clip.buckets().size(); ++i) {
        const Bucket& b = clip.buckets()[i];
        Bucket nb{BucketId(nextBucket++), bucketTag[i], b.sccrKa, {}};
        if (nb.tag == b.tag) // kept, or a tag without a number to renumber
            nb.tag = pool.takeBucket(pool.bucketUsed(b.tag) ? b.tag + "-copy" : b.tag);
        for (auto p : b.parts)
            if (newId.count(p.value))
                nb.parts.push_back(newId[p.value]);
        out.buckets.push_back(std::move(nb));
    }
    return out;
}

} // namespace lineward
