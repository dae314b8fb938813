// Field tables of each part kind. Ranges are physical sanity limits for low-voltage work, not
// code limits; the rules judge compliance.
#include "model/part_kind.h"

#include <array>

namespace lineward {

namespace {

using FT = FieldType;

constexpr std::array<std::string_view, 1> kOut{"out"};
constexpr std::array<std::string_view, 1> kIn{"in"};
constexpr std::array<std::string_view, 1> kBar{"bar"};
constexpr std::array<std::string_view, 2> kLineLoad{"line", "load"};
constexpr std::array<std::string_view, 2> kPriSec{"pri", "sec"};

constexpr std::array<FieldAlternative, 1> kSourceAlt{{{"fault_ka", "fault_mva"}}};
constexpr std::array<FieldAlternative, 1> kMotorAlt{{{"hp", "kw"}}};
constexpr std::array<FieldAlternative, 1> kLoadAlt{{{"kva", "kw"}}};

const FieldSpec kLetThrough{"let_through_a2s",
                            "Let-through I²t at the available fault",
                            "A²s",
                            FT::Number,
                            1,
                            1e10,
                            false,
                            false,
                            {},
                            {},
                            "from the manufacturer's data; judges cable withstand"};
const FieldSpec kClearS{
    "clear_s", "Clearing time at high fault current", "s", FT::Number, 0.001, 10, false, false, {},
    {},        "stated by the manufacturer"};

const FieldSpec kCurvePoints{"curve_points",
                             "User curve",
                             "",
                             FT::Text,
                             0,
                             0,
                             false,
                             false,
                             {},
                             {},
                             "replaces the generic curve: amps:min_s:max_s; ... (rising currents)"};

const FieldSpec kOpen{"open",
                      "Open",
                      "",
                      FT::Flag,
                      0,
                      0,
                      false,
                      false,
                      false,
                      {},
                      "true where the device is open (an open tie, a spare)"};

const std::array<FieldSpec, 4> kSourceFields{{
    {"kv", "Nominal voltage", "kV", FT::Number, 0.1, 765, false, true, {}, {}, {}, "V", 1000.0},
    {"fault_ka",
     "Available fault current",
     "kA",
     FT::Number,
     0.1,
     1000,
     false,
     false,
     {},
     {},
     "three-phase symmetrical; give this or fault_mva"},
    {"fault_mva",
     "Available short-circuit power",
     "MVA",
     FT::Number,
     0.1,
     1e5,
     false,
     false,
     {},
     {},
     "three-phase; give this or fault_ka"},
    {"x_over_r", "X/R ratio", "", FT::Number, 0.1, 200, false, false, 15.0},
}};

const std::array<FieldSpec, 5> kTransformerFields{{
    {"kva", "Rating", "kVA", FT::Number, 1, 100000, false, true},
    {"pri_v", "Primary voltage", "V", FT::Number, 100, 765000, false, true},
    {"sec_v", "Secondary voltage", "V", FT::Number, 100, 35000, false, true},
    {"z_pct", "Impedance", "%", FT::Number, 0.5, 30, false, true},
    {"x_over_r", "X/R ratio", "", FT::Number, 0.1, 200, false, false, 6.0},
}};

const std::array<FieldSpec, 5> kBusFields{{
    {"bus_type",
     "Equipment",
     "",
     FT::Choice,
     0,
     0,
     false,
     true,
     std::string("mcc"),
     {"switchboard", "mcc", "panelboard"}},
    {"volts", "System voltage", "V", FT::Number, 100, 35000, false, true},
    {"amps", "Continuous rating", "A", FT::Number, 1, 10000, false, true},
    {"bracing_ka", "Bus bracing", "kA", FT::Number, 1, 300, false, false},
    {"phases", "Phases", "", FT::Integer, 1, 3, false, false, 3.0},
}};

const std::array<FieldSpec, 15> kBreakerFields{{
    {"trip_type",
     "Trip unit",
     "",
     FT::Choice,
     0,
     0,
     false,
     true,
     std::string("thermal_magnetic"),
     {"thermal_magnetic", "electronic"}},
    {"construction",
     "Construction",
     "",
     FT::Choice,
     0,
     0,
     false,
     true,
     std::string("molded_case"),
     {"molded_case", "power", "power_fused"},
     "sets the test circuit of the interrupting rating: molded or insulated case (UL 489), "
     "low-voltage power breaker unfused or fused (IEEE C37.13)"},
    {"frame_a", "Frame", "A", FT::Number, 1, 6000, false, false},
    {"trip_a", "Trip rating", "A", FT::Number, 0.5, 6000, false, true},
    {"interrupting_ka", "Interrupting rating", "kA", FT::Number, 1, 300, false, true},
    {"inst_x",
     "Instantaneous pickup",
     "x trip",
     FT::Number,
     1,
     40,
     false,
     false,
     {},
     {},
     "multiple of the trip rating"},
    {"lt_pickup_x", "Long-time pickup", "x trip", FT::Number, 0.4, 1, false, false},
    {"lt_delay_s", "Long-time delay at 6x", "s", FT::Number, 0.1, 60, false, false},
    {"st_pickup_x", "Short-time pickup", "x trip", FT::Number, 1, 12, false, false},
    {"st_delay_s", "Short-time delay", "s", FT::Number, 0, 1, false, false},
    {"st_i2t",
     "Short-time I²t ramp",
     "",
     FT::Flag,
     0,
     0,
     false,
     false,
     false,
     {},
     "true: the short-time delay follows I²t up to 10 × Ir, then flat"},
    kLetThrough,
    kClearS,
    kCurvePoints,
    kOpen,
}};

const std::array<FieldSpec, 9> kInstBreakerFields{{
    {"amps", "Continuous rating", "A", FT::Number, 1, 1200, false, true},
    {"pickup_a", "Pickup setting", "A", FT::Number, 1, 20000, false, true},
    {"pickup_min_a", "Lowest adjustable pickup", "A", FT::Number, 1, 20000, false, false},
    {"pickup_max_a", "Highest adjustable pickup", "A", FT::Number, 1, 20000, false, false},
    {"interrupting_ka", "Interrupting rating", "kA", FT::Number, 1, 300, false, true},
    kLetThrough,
    kClearS,
    kCurvePoints,
    kOpen,
}};

const std::array<FieldSpec, 7> kFuseFields{{
    {"fuse_type",
     "Fuse type",
     "",
     FT::Choice,
     0,
     0,
     false,
     true,
     std::string("time_delay"),
     {"time_delay", "fast"}},
    {"fuse_class",
     "Fuse class",
     "",
     FT::Choice,
     0,
     0,
     false,
     false,
     {},
     {"J", "RK1", "RK5", "CC", "CD", "G", "K5", "L", "T", "gG", "aM"},
     "UL 248 class or IEC 60269 utilisation category"},
    {"amps", "Rating", "A", FT::Number, 0.1, 6000, false, true},
    {"interrupting_ka", "Interrupting rating", "kA", FT::Number, 1, 300, false, true},
    kLetThrough,
    kClearS,
    kCurvePoints,
}};

const std::array<FieldSpec, 4> kDisconnectFields{{
    {"amps", "Rating", "A", FT::Number, 0.1, 6000, false, true},
    {"hp_rating", "Horsepower rating", "hp", FT::Number, 0.1, 5000, false, false},
    {"fused", "Fused", "", FT::Flag, 0, 0, false, false, false},
    kOpen,
}};

const std::array<FieldSpec, 3> kContactorFields{{
    {"nema_size",
     "NEMA size",
     "",
     FT::Choice,
     0,
     0,
     false,
     false,
     {},
     {"00", "0", "1", "2", "3", "4", "5", "6", "7", "8", "9"}},
    {"ac3_a", "IEC AC-3 rated current", "A", FT::Number, 0.1, 3000, false, false},
    kOpen,
}};

const std::array<FieldSpec, 6> kOverloadFields{{
    {"setting_a", "Setting", "A", FT::Number, 0.1, 3000, false, true},
    {"range_min_a", "Lowest setting", "A", FT::Number, 0.1, 3000, false, false},
    {"range_max_a", "Highest setting", "A", FT::Number, 0.1, 3000, false, false},
    {"trip_class",
     "Trip class",
     "",
     FT::Choice,
     0,
     0,
     false,
     true,
     std::string("10"),
     {"10A", "10", "20", "30"}},
    {"ultimate_trip_x",
     "Ultimate trip",
     "x setting",
     FT::Number,
     1.05,
     1.3,
     false,
     false,
     1.15,
     {},
     "the multiple of the setting above which the relay surely trips (manufacturer's data; "
     "1.15 is common practice for a dial marked in motor full-load amperes)"},
    kCurvePoints,
}};

const std::array<FieldSpec, 10> kCableFields{{
    {"material", "Conductor", "", FT::Choice, 0, 0, false, true, std::string("cu"), {"cu", "al"}},
    {"size", "Size", "", FT::Text, 0, 0, false, true},
    {"sets", "Parallel sets", "", FT::Integer, 1, 20, false, false, 1.0},
    {"length_ft", "Length", "ft", FT::Number, 0.1, 20000, false, true},
    {"insulation_c",
     "Insulation rating",
     "°C",
     FT::Integer,
     60,
     90,
     false,
     false,
     90.0,
     {},
     "60, 75 or 90"},
    {"termination_c",
     "Termination rating",
     "°C",
     FT::Integer,
     60,
     90,
     false,
     false,
     75.0,
     {},
     "60, 75 or 90"},
    {"raceway",
     "Raceway",
     "",
     FT::Choice,
     0,
     0,
     false,
     false,
     std::string("steel"),
     {"steel", "pvc", "aluminum"}},
    {"conductors", "Current-carrying conductors in raceway", "", FT::Integer, 1, 200, false, false,
     3.0},
    {"ambient_c",
     "Ambient",
     "°C",
     FT::Number,
     -40,
     90,
     false,
     false,
     {},
     {},
     "blank: the drawing's ambient"},
    {"egc_size",
     "Equipment grounding conductor",
     "",
     FT::Text,
     0,
     0,
     false,
     false,
     {},
     {},
     "blank: the raceway serves as the EGC (NEC 250.118)"},
}};

const std::array<FieldSpec, 16> kMotorFields{{
    {"hp", "Rated output", "hp", FT::Number, 0.1, 5000, false, false, {}, {}, "give this or kw"},
    {"kw", "Rated output", "kW", FT::Number, 0.05, 4000, false, false, {}, {}, "give this or hp"},
    {"volts", "Rated voltage", "V", FT::Number, 100, 15000, false, true},
    {"phases", "Phases", "", FT::Integer, 1, 3, false, false, 3.0},
    {"fla", "Nameplate full-load current", "A", FT::Number, 0.1, 5000, false, false},
    {"sf", "Service factor", "", FT::Number, 1, 1.5, false, false, 1.15},
    {"design",
     "Design letter",
     "",
     FT::Choice,
     0,
     0,
     false,
     false,
     std::string("B"),
     {"A", "B", "C", "D", "E"}},
    {"rotor",
     "Motor type",
     "",
     FT::Choice,
     0,
     0,
     false,
     false,
     std::string("squirrel_cage"),
     {"squirrel_cage", "wound_rotor", "synchronous"},
     "row of NEC Table 430.52(C)(1)"},
    {"code_letter",
     "Code letter",
     "",
     FT::Choice,
     0,
     0,
     false,
     false,
     {},
     {"A", "B", "C", "D", "E", "F", "G", "H", "J", "K", "L", "M", "N", "P", "R", "S", "T", "U",
      "V"}},
    {"lra", "Locked-rotor current", "A", FT::Number, 0.1, 50000, false, false},
    {"accel_s", "Acceleration time", "s", FT::Number, 0.01, 600, false, false, 5.0},
    {"stall_hot_s", "Safe stall time, hot", "s", FT::Number, 0.1, 600, false, false},
    {"stall_cold_s", "Safe stall time, cold", "s", FT::Number, 0.1, 600, false, false},
    {"temp_rise_c", "Marked temperature rise", "°C", FT::Number, 10, 200, false, false},
    {"premium_eff",
     "Design B premium efficiency",
     "",
     FT::Flag,
     0,
     0,
     false,
     false,
     false,
     {},
     "NEMA premium efficiency; Table 430.52 allows a higher instantaneous setting"},
    {"hard_to_start",
     "Hard to start",
     "",
     FT::Flag,
     0,
     0,
     false,
     false,
     false,
     {},
     "set where the motor will not start at the Table 430.52 rating (Exception No. 2)"},
}};

const std::array<FieldSpec, 6> kLoadFields{{
    {"kva",
     "Apparent power",
     "kVA",
     FT::Number,
     0.05,
     100000,
     false,
     false,
     {},
     {},
     "give this or kw"},
    {"kw", "Real power", "kW", FT::Number, 0.05, 100000, false, false, {}, {}, "give this or kva"},
    {"pf", "Power factor", "", FT::Number, 0.1, 1, false, false, 0.9},
    {"volts", "Rated voltage", "V", FT::Number, 100, 35000, false, true},
    {"phases", "Phases", "", FT::Integer, 1, 3, false, false, 3.0},
    {"continuous", "Continuous (3 h or more)", "", FT::Flag, 0, 0, false, false, true},
}};

const std::array<KindInfo, kPartKindCount> kKinds{{
    {PartKind::Source, "source", "Utility source", "UTIL-", kOut, kSourceFields, false, false,
     kSourceAlt},
    {PartKind::Transformer, "transformer", "Transformer", "TX-", kPriSec, kTransformerFields},
    {PartKind::Bus, "bus", "Bus", "BUS-", kBar, kBusFields},
    {PartKind::Breaker, "breaker", "Breaker", "CB-", kLineLoad, kBreakerFields, true, true},
    {PartKind::InstBreaker, "inst_breaker", "Instantaneous-only breaker", "MCP-", kLineLoad,
     kInstBreakerFields, true, true},
    {PartKind::Fuse, "fuse", "Fuse", "FU-", kLineLoad, kFuseFields, false, true},
    {PartKind::Disconnect, "disconnect", "Disconnect switch", "DS-", kLineLoad, kDisconnectFields,
     true, false},
    {PartKind::Contactor, "contactor", "Contactor", "K-", kLineLoad, kContactorFields, true, false},
    {PartKind::Overload, "overload", "Overload relay", "OL-", kLineLoad, kOverloadFields},
    {PartKind::Cable, "cable", "Cable", "C-", kLineLoad, kCableFields},
    {PartKind::Motor, "motor", "Motor", "M-", kIn, kMotorFields, false, false, kMotorAlt},
    {PartKind::Load, "load", "Static load", "LD-", kIn, kLoadFields, false, false, kLoadAlt},
}};

} // namespace

const KindInfo& kindInfo(PartKind kind) {
    return kKinds[static_cast<std::size_t>(kind)];
}

std::optional<PartKind> kindFromKey(std::string_view key) {
    for (const auto& k : kKinds)
        if (k.key == key)
            return k.kind;
    return std::nullopt;
}

std::optional<std::size_t> fieldIndex(PartKind kind, std::string_view key) {
    const auto& fields = kindInfo(kind).fields;
    for (std::size_t i = 0; i < fields.size(); ++i)
        if (fields[i].key == key)
            return i;
    return std::nullopt;
}

const FieldSpec* findField(PartKind kind, std::string_view key) {
    auto i = fieldIndex(kind, key);
    return i ? &kindInfo(kind).fields[*i] : nullptr;
}

} // namespace lineward
