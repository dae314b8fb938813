// Starter ratings are common practice for a 480 V MCC, not design values.
#include "model/part_defaults.h"

#include <cstdlib>

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

} // namespace lineward
