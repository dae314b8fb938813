// Field tables of the supply side (utility source, transformer, bus). Ranges are physical sanity
// limits for low-voltage work, not code limits; the rules judge compliance.
#include "model/part_fields.h"

#include <array>

namespace lineward::part_fields {

namespace {

using FT = FieldType;

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

const std::array<FieldSpec, 6> kTransformerFields{{
    {"kva", "Rating", "kVA", FT::Number, 1, 100000, false, true},
    {"pri_v", "Primary voltage", "V", FT::Number, 100, 765000, false, true},
    {"sec_v", "Secondary voltage", "V", FT::Number, 100, 35000, false, true},
    {"z_pct", "Impedance", "%", FT::Number, 0.5, 30, false, true},
    {"x_over_r", "X/R ratio", "", FT::Number, 0.1, 200, false, false, 6.0},
    // Off-load primary taps: distribution transformers commonly have 2 × 2.5 % above and below
    // rated primary voltage (common practice); +2.5 % connects 1.025 × rated primary turns, so
    // the secondary sits 2.4 % lower for the same applied voltage.
    {"tap_pct",
     "Primary tap",
     "%",
     FT::Number,
     -10,
     10,
     false,
     false,
     0.0,
     {},
     "Primary winding tap in % of rated primary voltage: +2.5 lowers the secondary voltage by "
     "about 2.4 %, −5 raises it by about 5.3 %"},
}};

const std::array<FieldSpec, 12> kBusFields{{
    {"bus_type",
     "Equipment",
     "",
     FT::Choice,
     0,
     0,
     false,
     true,
     std::string("mcc"),
     {"switchboard", "mcc", "panelboard", "cable_junction"}},
    {"volts", "System voltage", "V", FT::Number, 100, 35000, false, true},
    {"amps", "Continuous rating", "A", FT::Number, 1, 10000, false, true},
    {"bracing_ka", "Bus bracing", "kA", FT::Number, 1, 300, false, false},
    {"phases", "Phases", "", FT::Integer, 1, 3, false, false, 3.0},
    // Arc flash (IEEE 1584-2018): blank takes the typical value of its Tables 8 and 10 for the
    // equipment type and voltage.
    {"af_electrodes",
     "Arc-flash electrodes",
     "",
     FT::Choice,
     0,
     0,
     false,
     false,
     {},
     {"VCB", "VCBB", "HCB", "VOA", "HOA"},
     "IEEE 1584-2018 electrode configuration; blank: VCB (typical)"},
    {"af_gap_mm",
     "Arc-flash bus gap",
     "mm",
     FT::Number,
     1,
     300,
     true,
     false,
     {},
     {},
     "blank: IEEE 1584-2018 Table 8 typical gap"},
    {"af_working_distance_mm",
     "Arc-flash working distance",
     "mm",
     FT::Number,
     100,
     5000,
     false,
     false,
     {},
     {},
     "blank: IEEE 1584-2018 Table 10 typical distance"},
    {"af_enclosure_height_mm",
     "Arc-flash enclosure height",
     "mm",
     FT::Number,
     1,
     5000,
     true,
     false,
     {},
     {},
     "blank: IEEE 1584-2018 Table 8 typical size"},
    {"af_enclosure_width_mm",
     "Arc-flash enclosure width",
     "mm",
     FT::Number,
     1,
     5000,
     true,
     false,
     {},
     {},
     "blank: IEEE 1584-2018 Table 8 typical size"},
    {"af_enclosure_depth_mm",
     "Arc-flash enclosure depth",
     "mm",
     FT::Number,
     1,
     5000,
     true,
     false,
     {},
     {},
     "blank: IEEE 1584-2018 Table 8 typical size"},
    {"service_equipment",
     "Service equipment",
     "",
     FT::Flag,
     0,
     0,
     false,
     false,
     false,
     {},
     "true: its arc-flash label also carries the NEC 110.16(B) service data"},
}};

} // namespace

std::span<const FieldSpec> sourceFields() {
    return kSourceFields;
}
std::span<const FieldSpec> transformerFields() {
    return kTransformerFields;
}
std::span<const FieldSpec> busFields() {
    return kBusFields;
}

} // namespace lineward::part_fields
