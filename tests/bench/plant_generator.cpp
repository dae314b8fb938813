// The generated plant checks clean by construction: every bucket is sized as lineward-cli size
// would size it for its motor, so benchmarks measure a realistic check, not a flood of findings.
#include "plant_generator.h"

#include <array>
#include <string>
#include <vector>

namespace lineward::bench {

namespace {

struct MotorRow {
    double hp, flc, breaker;
    const char* nema;
    const char* cable;
};
// NEC 2023 Table 430.250 at 460 V; breakers at 250 % to the next standard size; 75 °C cable.
constexpr std::array<MotorRow, 6> kMotors{{{5, 7.6, 20, "0", "12 AWG"},
                                           {10, 14, 35, "1", "12 AWG"},
                                           {15, 21, 60, "2", "10 AWG"},
                                           {25, 34, 90, "2", "8 AWG"},
                                           {40, 52, 150, "3", "6 AWG"},
                                           {60, 77, 200, "4", "3 AWG"}}};

class Builder {
public:
    explicit Builder(Drawing& d) : m_d(d) {}
    using Ratings = std::vector<std::pair<const char*, FieldValue>>;
    PartId add(PartKind k, std::string tag, double x, double y, const Ratings& v) {
        Part p = Part::make(k, m_d.nextPartId(), std::move(tag));
        p.x = x;
        p.y = y;
        for (auto& [key, value] : v)
            p.values[*fieldIndex(k, key)] = value;
        m_d.addPart(p);
        return p.id;
    }
    void wire(PartId a, int ta, PartId b, int tb) {
        m_d.addWire(Wire{m_d.nextWireId(), {a, ta}, {b, tb}});
    }

private:
    Drawing& m_d;
};

// A 500 A electronic-trip feeder breaker (the tie breaker is rated the same).
Builder::Ratings feederBreaker() {
    return {{"trip_type", std::string("electronic")},
            {"trip_a", 500.0},
            {"frame_a", 600.0},
            {"interrupting_ka", 65.0},
            {"let_through_a2s", 5e6},
            {"lt_delay_s", 10.0},
            {"st_pickup_x", 8.0},
            {"st_delay_s", 0.2}};
}

// Tie breaker and tie cable between two switchboards, rated like a feeder. Through a cable
// rather than bolted bus to bus: a zero-impedance tie would merge the two switchboards into one
// solve bus, and the loop would reduce to two transformers in parallel.
void addTie(Builder& b, const std::string& n, double x0, PartId left, PartId right, bool open) {
    Builder::Ratings tie = feederBreaker();
    tie.push_back({"open", open});
    auto cb = b.add(PartKind::Breaker, "CB-T" + n, x0 - 55, 150, tie);
    auto c = b.add(PartKind::Cable, "C-T" + n, x0 - 30, 150,
                   {{"size", std::string("250 kcmil")}, {"sets", 2.0}, {"length_ft", 60.0}});
    b.wire(left, 0, cb, 0);
    b.wire(cb, 1, c, 0);
    b.wire(c, 1, right, 0);
}

} // namespace

Drawing makePlant(int parts, int bucketsPerLineup, Ties ties) {
    Drawing d;
    d.sheet.title = "Generated plant";
    Builder b(d);
    PartId src, prevSwbd;
    for (int l = 0; static_cast<int>(d.parts().size()) < parts; ++l) {
        const std::string n = std::to_string(l + 1);
        const double x0 = l * (bucketsPerLineup + 2) * 110.0;
        if (l % 10 == 0) // a 13.8 kV service for every ten lineups, as a large plant would have
            src = b.add(PartKind::Source, "UTIL-" + std::to_string(l / 10 + 1), x0, -100,
                        {{"kv", 13.8}, {"fault_mva", 500.0}});
        auto tx = b.add(PartKind::Transformer, "TX-" + n, x0, 0,
                        {{"kva", 500.0}, {"pri_v", 13800.0}, {"sec_v", 480.0}, {"z_pct", 5.75}});
        auto main = b.add(PartKind::Breaker, "CB-M" + n, x0, 80,
                          {{"trip_type", std::string("electronic")},
                           {"frame_a", 600.0},
                           {"trip_a", 500.0},
                           {"interrupting_ka", 65.0},
                           {"let_through_a2s", 5e6},
                           {"lt_delay_s", 24.0},
                           {"st_pickup_x", 10.0},
                           {"st_delay_s", 0.4}});
        auto swbd = b.add(PartKind::Bus, "SWBD-" + n, x0, 150,
                          {{"bus_type", std::string("switchboard")},
                           {"volts", 480.0},
                           {"amps", 800.0},
                           {"bracing_ka", 65.0}});
        auto feeder = b.add(PartKind::Breaker, "CB-F" + n, x0, 210, feederBreaker());
        auto fc = b.add(PartKind::Cable, "C-F" + n, x0, 260,
                        {{"size", std::string("250 kcmil")}, {"sets", 2.0}, {"length_ft", 100.0}});
        auto mcc = b.add(PartKind::Bus, "MCC-" + n, x0, 320,
                         {{"volts", 480.0}, {"amps", 600.0}, {"bracing_ka", 65.0}});
        b.wire(src, 0, tx, 0);
        b.wire(tx, 1, main, 0);
        b.wire(main, 1, swbd, 0);
        b.wire(swbd, 0, feeder, 0);
        b.wire(feeder, 1, fc, 0);
        b.wire(fc, 1, mcc, 0);
        if (ties != Ties::None && l % 2 == 1) // a double-ended pair under the same service
            addTie(b, n, x0, prevSwbd, swbd, ties == Ties::Open);
        prevSwbd = swbd;
        for (int k = 0; k < bucketsPerLineup; ++k) {
            const auto& m = kMotors[static_cast<std::size_t>(k) % kMotors.size()];
            const std::string t = n + "-" + std::to_string(k + 1);
            const double x = x0 + (k + 1) * 110.0;
            auto cb =
                b.add(PartKind::Breaker, "CB-" + t, x, 390,
                      {{"trip_a", m.breaker}, {"interrupting_ka", 65.0}, {"let_through_a2s", 1e5}});
            auto kk =
                b.add(PartKind::Contactor, "K-" + t, x, 480, {{"nema_size", std::string(m.nema)}});
            auto ol = b.add(PartKind::Overload, "OL-" + t, x, 530, {{"setting_a", m.flc}});
            auto c = b.add(PartKind::Cable, "C-" + t, x, 580,
                           {{"size", std::string(m.cable)},
                            {"length_ft", 80.0},
                            {"egc_size", std::string(m.cable)}});
            auto mo = b.add(PartKind::Motor, "M-" + t, x, 640,
                            {{"hp", m.hp},
                             {"volts", 460.0},
                             {"fla", m.flc},
                             {"code_letter", std::string("F")}});
            b.wire(mcc, 0, cb, 0);
            b.wire(cb, 1, kk, 0);
            b.wire(kk, 1, ol, 0);
            b.wire(ol, 1, c, 0);
            b.wire(c, 1, mo, 0);
            d.addBucket(Bucket{d.nextBucketId(), "B-" + t, 65.0, {cb, kk, ol}});
        }
    }
    return d;
}

} // namespace lineward::bench
