// Test helpers: drawings assembled in code so each test states its own network.
#include "test_support.h"

#include <cmath>
#include <fstream>
#include <sstream>
#include <stdexcept>

namespace lineward::test {

Studied::Studied(Drawing dr) : d(std::move(dr)) {
    net = std::make_unique<Network>(d);
    flow = std::make_unique<Flow>(*net);
    r = runStudies(*net, *flow, testTables(), d.settings);
}

const FaultAtBus& Studied::faultAt(PartId part, int terminal) const {
    return *r.faultAtNode(net->nodeOf(part, terminal));
}

double Studied::vAt(PartId part, int terminal) const {
    return std::abs(r.voltage[static_cast<std::size_t>(r.busOf(net->nodeOf(part, terminal)))]);
}

const Finding* findRule(const CheckReport& r, std::string_view rule) {
    for (const auto& f : r.findings)
        if (f.ruleId == rule)
            return &f;
    return nullptr;
}

PartId DrawingBuilder::add(PartKind kind, const std::string& tag,
                           std::initializer_list<std::pair<const char*, FieldValue>> values) {
    Part p = Part::make(kind, m_d.nextPartId(), tag);
    // Clear one-of fields first so a test can pick either (hp or kw, fault_ka or fault_mva).
    for (auto& [key, v] : values) {
        auto i = fieldIndex(kind, key);
        if (!i)
            throw std::invalid_argument(std::string("no field ") + key);
        p.values[*i] = v;
    }
    if (auto problems = validatePart(p); !problems.empty())
        throw std::invalid_argument(tag + ": " + problems.front());
    m_d.addPart(p);
    return p.id;
}

void DrawingBuilder::wire(PartId a, int ta, PartId b, int tb) {
    m_d.addWire(Wire{m_d.nextWireId(), {a, ta}, {b, tb}});
}

BucketId DrawingBuilder::bucket(const std::string& tag, std::vector<PartId> parts, double sccrKa) {
    Bucket b{m_d.nextBucketId(), tag, sccrKa, std::move(parts)};
    const auto id = b.id;
    m_d.addBucket(std::move(b));
    return id;
}

const Tables& testTables() {
    static const auto tables = loadBuiltinTables();
    return *tables;
}

std::string readFile(const std::string& path) {
    std::ifstream in(path, std::ios::binary);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

std::string sourcePath(const std::string& relative) {
    return std::string(LINEWARD_SOURCE_DIR) + "/" + relative;
}

Drawing smallLineup() {
    DrawingBuilder b;
    auto src = b.add(PartKind::Source, "UTIL", {{"kv", 13.8}, {"fault_ka", 20.0}});
    auto tx = b.add(PartKind::Transformer, "TX",
                    {{"kva", 75.0}, {"pri_v", 13800.0}, {"sec_v", 480.0}, {"z_pct", 5.75}});
    // 430.62(A): one 25 hp motor (FLC 34 A) behind an 80 A branch breaker allows an 80 A main.
    // The main is electronic (long-time 20 s, short-time 9 × after 0.3 s) and the branch
    // breaker's instantaneous is 6 ×, so the two are selective.
    auto main = b.add(PartKind::Breaker, "CB-M",
                      {{"trip_type", std::string("electronic")},
                       {"trip_a", 80.0},
                       {"interrupting_ka", 65.0},
                       {"lt_delay_s", 20.0},
                       {"st_pickup_x", 9.0},
                       {"st_delay_s", 0.3}});
    auto bus = b.add(PartKind::Bus, "MCC", {{"volts", 480.0}, {"amps", 1200.0}});
    auto cb = b.add(PartKind::Breaker, "CB-1",
                    {{"trip_a", 80.0}, {"interrupting_ka", 65.0}, {"inst_x", 6.0}});
    auto k = b.add(PartKind::Contactor, "K-1", {{"nema_size", std::string("2")}});
    auto ol = b.add(PartKind::Overload, "OL-1", {{"setting_a", 32.0}});
    auto c = b.add(PartKind::Cable, "C-1", {{"size", std::string("8 AWG")}, {"length_ft", 100.0}});
    auto m = b.add(PartKind::Motor, "M-1", {{"hp", 25.0}, {"volts", 460.0}, {"fla", 32.0}});
    b.wire(src, 0, tx, 0);
    b.wire(tx, 1, main, 0);
    b.wire(main, 1, bus, 0);
    b.wire(bus, 0, cb, 0);
    b.wire(cb, 1, k, 0);
    b.wire(k, 1, ol, 0);
    b.wire(ol, 1, c, 0);
    b.wire(c, 1, m, 0);
    b.bucket("MCC-1A", {cb, k, ol});
    return b.drawing();
}

} // namespace lineward::test
