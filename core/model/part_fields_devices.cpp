// Field tables of the devices in series in a branch (protective devices,
// disconnects, motor controllers). Ranges are physical sanity limits for low-voltage
// work, not code limits; the rules judge compliance.
#include "model/part_fields.h"

#include <array>

namespace lineward::part_fields {

namespace {

using FT = FieldType;

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

// A drive's and a soft starter's hp and voltage are their nameplate ratings; the rules judge
// the currents (the drive's output current and the soft starter's rated current) against the
// motor's full-load current.
const std::array<FieldSpec, 5> kVfdFields{{
    {"hp", "Rated output", "hp", FT::Number, 0.1, 5000, false, true},
    {"volts", "Rated input voltage", "V", FT::Number, 100, 1000, false, true},
    {"input_a",
     "Rated input current",
     "A",
     FT::Number,
     0.1,
     5000,
     false,
     true,
     {},
     {},
     "line-side current at rated load (nameplate); NEC 430.122(A) sizes the input conductors "
     "from it"},
    {"output_a",
     "Rated output current",
     "A",
     FT::Number,
     0.1,
     5000,
     false,
     true,
     {},
     {},
     "continuous output current (nameplate); at least the motor's full-load current"},
    {"max_scpd_a",
     "Largest listed SCPD",
     "A",
     FT::Number,
     1,
     6000,
     false,
     false,
     {},
     {},
     "from the drive's listing or instructions; blank: 175 % of the rated input current "
     "(common practice)"},
}};

const std::array<FieldSpec, 6> kSoftStarterFields{{
    {"hp", "Rated output", "hp", FT::Number, 0.1, 5000, false, true},
    {"volts", "Rated voltage", "V", FT::Number, 100, 1000, false, true},
    {"amps",
     "Rated current",
     "A",
     FT::Number,
     0.1,
     5000,
     false,
     true,
     {},
     {},
     "continuous rated current (nameplate); at least the motor's full-load current"},
    {"start_limit_x",
     "Starting current limit",
     "x FLC",
     FT::Number,
     1,
     8,
     false,
     false,
     3.5,
     {},
     "current limit while starting, as a multiple of the motor's full-load current (3–4 × is "
     "common practice)"},
    {"bypass",
     "Bypass contactor",
     "",
     FT::Flag,
     0,
     0,
     false,
     false,
     true,
     {},
     "true: a contactor carries the motor once it is up to speed"},
    {"bypass_a",
     "Bypass AC-3 rated current",
     "A",
     FT::Number,
     0.1,
     5000,
     false,
     false,
     {},
     {},
     "blank: an integral bypass rated with the starter"},
}};

} // namespace

std::span<const FieldSpec> breakerFields() {
    return kBreakerFields;
}
std::span<const FieldSpec> instBreakerFields() {
    return kInstBreakerFields;
}
std::span<const FieldSpec> fuseFields() {
    return kFuseFields;
}
std::span<const FieldSpec> disconnectFields() {
    return kDisconnectFields;
}
std::span<const FieldSpec> contactorFields() {
    return kContactorFields;
}
std::span<const FieldSpec> overloadFields() {
    return kOverloadFields;
}
std::span<const FieldSpec> vfdFields() {
    return kVfdFields;
}
std::span<const FieldSpec> softStarterFields() {
    return kSoftStarterFields;
}

} // namespace lineward::part_fields
