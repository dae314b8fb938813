// Turns the table files into typed tables; every cell is checked as it is read.
#include "tables/tables.h"

#include <algorithm>

namespace lineward {

namespace {

using tables::CsvTable;
using tables::TableError;

FlcTable buildFlc(const CsvTable& t) {
    FlcTable f;
    f.source = t.source;
    for (std::size_t c = 1; c < t.header.size(); ++c)
        f.volts.push_back(std::stod(t.header[c]));
    for (std::size_t r = 0; r < t.rows.size(); ++r) {
        f.hp.push_back(t.required(r, 0));
        std::vector<std::optional<double>> row;
        for (std::size_t c = 1; c < t.header.size(); ++c)
            row.push_back(t.number(r, c));
        f.amps.push_back(std::move(row));
    }
    return f;
}

constexpr std::array<ElectrodeConfig, 5> kAllConfigs{ElectrodeConfig::VCB, ElectrodeConfig::VCBB,
                                                     ElectrodeConfig::HCB, ElectrodeConfig::VOA,
                                                     ElectrodeConfig::HOA};

ElectrodeConfig configFrom(const CsvTable& t, std::size_t r, std::size_t col) {
    if (auto c = electrodeConfigFromKey(t.rows[r][col]))
        return *c;
    t.fail(r, "unknown electrode configuration '" + t.rows[r][col] + "'");
}

MotorType motorTypeFrom(const CsvTable& t, std::size_t r) {
    const auto& k = t.rows[r][0];
    if (k == "single_phase")
        return MotorType::SinglePhase;
    if (k == "squirrel_cage")
        return MotorType::SquirrelCage;
    if (k == "design_b_premium")
        return MotorType::DesignBPremium;
    if (k == "synchronous")
        return MotorType::Synchronous;
    if (k == "wound_rotor")
        return MotorType::WoundRotor;
    t.fail(r, "unknown motor type '" + k + "'");
}

std::vector<ScpdRow> buildScpd(const CsvTable& t) {
    std::vector<ScpdRow> out;
    const char* cols[4] = {"non_time_delay_fuse", "time_delay_fuse", "instantaneous_trip_breaker",
                           "inverse_time_breaker"};
    const char* exc[4] = {"exc_non_time_delay_fuse", "exc_time_delay_fuse",
                          "exc_instantaneous_trip_breaker", "exc_inverse_time_breaker_le100"};
    for (std::size_t r = 0; r < t.rows.size(); ++r) {
        ScpdRow row{motorTypeFrom(t, r), {}, {}, 300};
        for (int i = 0; i < 4; ++i) {
            row.pct[i] = t.required(r, t.column(cols[i]));
            row.excPct[i] = t.required(r, t.column(exc[i]));
        }
        row.excItbAbove100 = t.required(r, t.column("exc_inverse_time_breaker_gt100"));
        out.push_back(row);
    }
    return out;
}

std::array<std::optional<double>, 3> three(const CsvTable& t, std::size_t r, std::size_t first) {
    return {t.number(r, first), t.number(r, first + 1), t.number(r, first + 2)};
}

void checkIncreasing(const CsvTable& t, const std::vector<double>& v) {
    for (std::size_t i = 1; i < v.size(); ++i)
        if (v[i] <= v[i - 1])
            t.fail(i, "values must increase from row to row");
}

Material materialFrom(const CsvTable& t, std::size_t r, const std::string& s) {
    if (s == "cu")
        return Material::Cu;
    if (s == "al")
        return Material::Al;
    t.fail(r, "material must be cu or al, found '" + s + "'");
}

void buildRest(Tables& tb, const CsvTable& t) {
    const auto& n = t.name;
    if (n == "code_letters") {
        for (std::size_t r = 0; r < t.rows.size(); ++r) {
            if (t.rows[r][0].size() != 1)
                t.fail(r, "code letter must be one letter");
            tb.codeLetters.push_back({t.rows[r][0][0], {t.required(r, 1), t.required(r, 2)}});
        }
    } else if (n == "ampacity") {
        for (std::size_t r = 0; r < t.rows.size(); ++r)
            tb.ampacity.push_back({t.rows[r][0], three(t, r, 1), three(t, r, 4)});
    } else if (n == "ambient_correction") {
        for (std::size_t r = 0; r < t.rows.size(); ++r)
            tb.ambient.push_back({t.required(r, 0), three(t, r, 1)});
    } else if (n == "conductor_adjustment") {
        std::vector<double> keys;
        for (std::size_t r = 0; r < t.rows.size(); ++r) {
            tb.adjustment.push_back({t.required(r, 0), t.required(r, 1)});
            keys.push_back(t.required(r, 0));
        }
        checkIncreasing(t, keys);
    } else if (n == "standard_ratings") {
        const std::size_t amps = t.column("amps"), kinds = t.column("devices");
        for (std::size_t r = 0; r < t.rows.size(); ++r) {
            const std::string& devices = t.rows[r][kinds];
            if (devices != "all" && devices != "fuse")
                t.fail(r, "devices must be 'all' or 'fuse', not '" + devices + "'");
            if (devices == "all")
                tb.standardRatings.push_back(t.required(r, amps));
            tb.fuseRatings.push_back(t.required(r, amps));
        }
        checkIncreasing(t, tb.fuseRatings);
    } else if (n == "small_conductor") {
        for (std::size_t r = 0; r < t.rows.size(); ++r)
            tb.smallConductor.push_back(
                {t.rows[r][0], materialFrom(t, r, t.rows[r][1]), t.required(r, 2)});
    } else if (n == "egc") {
        for (std::size_t r = 0; r < t.rows.size(); ++r)
            tb.egc.push_back({t.required(r, 0), t.rows[r][1], t.rows[r][2]});
    } else if (n == "conductor_properties") {
        for (std::size_t r = 0; r < t.rows.size(); ++r)
            tb.conductors.push_back(
                {t.rows[r][0], t.required(r, 1), t.required(r, 2), t.required(r, 3)});
    } else if (n == "conductor_impedance") {
        for (std::size_t r = 0; r < t.rows.size(); ++r)
            tb.impedance.push_back(
                {t.rows[r][0], t.required(r, 1), t.required(r, 2), three(t, r, 3), three(t, r, 6)});
    } else if (n == "transformer_protection") {
        for (std::size_t r = 0; r < t.rows.size(); ++r)
            tb.transformerProtection.push_back(
                {t.rows[r][0] == "primary_only", t.rows[r][1] == "primary", t.required(r, 2),
                 t.required(r, 3), t.required(r, 4), t.required(r, 5) != 0});
    } else if (n == "nema_sizes") {
        for (std::size_t r = 0; r < t.rows.size(); ++r) {
            NemaRow row{t.rows[r][0], t.required(r, 1), {}, {}};
            for (int v : {200, 230, 460, 575})
                if (auto hp = t.number(r, t.column("hp_3ph_" + std::to_string(v))))
                    row.hp3ph[v] = *hp;
            for (int v : {115, 230})
                if (auto hp = t.number(r, t.column("hp_1ph_" + std::to_string(v))))
                    row.hp1ph[v] = *hp;
            tb.nema.push_back(row);
        }
    } else if (n == "trip_classes") {
        for (std::size_t r = 0; r < t.rows.size(); ++r)
            tb.tripClasses.push_back(
                {t.rows[r][0], t.required(r, 1), t.required(r, 2), t.required(r, 3)});
    } else if (n == "af_arcing_current" || n == "af_incident_energy") {
        const bool current = n == "af_arcing_current";
        const std::size_t nk = current ? 10 : 13;
        std::map<ElectrodeConfig, int> seen;
        for (std::size_t r = 0; r < t.rows.size(); ++r) {
            const ElectrodeConfig c = configFrom(t, r, t.column("config"));
            const double v = t.required(r, t.column("voc_v"));
            const int col = v == 600 ? 0 : v == 2700 ? 1 : v == 14300 ? 2 : -1;
            if (col < 0)
                t.fail(r, "voc_v must be 600, 2700 or 14300");
            for (std::size_t k = 0; k < nk; ++k) {
                const double x = t.required(r, t.column("k" + std::to_string(k + 1)));
                if (current)
                    tb.arcFlash.arcingCurrent[c][col][k] = x;
                else
                    tb.arcFlash.energy[c][col][k] = x;
            }
            seen[c] |= 1 << col;
        }
        for (ElectrodeConfig c : kAllConfigs)
            if (seen[c] != 7)
                throw TableError(t.file, 0,
                                 "configuration " + std::string(electrodeConfigKey(c)) +
                                     " lacks a row for 600, 2700 or 14300 V");
    } else if (n == "af_varcf") {
        for (std::size_t r = 0; r < t.rows.size(); ++r) {
            auto& row = tb.arcFlash.varCf[configFrom(t, r, t.column("config"))];
            for (std::size_t k = 0; k < 7; ++k)
                row[k] = t.required(r, t.column("k" + std::to_string(k + 1)));
        }
        for (ElectrodeConfig c : kAllConfigs)
            if (!tb.arcFlash.varCf.count(c))
                throw TableError(t.file, 0,
                                 "configuration " + std::string(electrodeConfigKey(c)) +
                                     " is missing");
    } else if (n == "af_enclosure_cf") {
        for (std::size_t r = 0; r < t.rows.size(); ++r) {
            const auto& kind = t.rows[r][t.column("enclosure")];
            if (kind != "typical" && kind != "shallow")
                t.fail(r, "enclosure must be 'typical' or 'shallow'");
            auto& row =
                tb.arcFlash
                    .enclosure[configFrom(t, r, t.column("config"))][kind == "typical" ? 0 : 1];
            row = {t.required(r, t.column("b1")), t.required(r, t.column("b2")),
                   t.required(r, t.column("b3")), t.required(r, t.column("a")),
                   t.required(r, t.column("b"))};
        }
    } else if (n == "af_typical_equipment") {
        for (std::size_t r = 0; r < t.rows.size(); ++r) {
            ArcFlashTables::TypicalRow row;
            row.kind = t.rows[r][t.column("kind")];
            row.voltageClass = t.rows[r][t.column("voltage_class")];
            if (row.voltageClass != "lv" && row.voltageClass != "5kv" && row.voltageClass != "15kv")
                t.fail(r, "voltage_class must be 'lv', '5kv' or '15kv'");
            row.gapMm = t.required(r, t.column("gap_mm"));
            row.heightMm = t.required(r, t.column("height_mm"));
            row.widthMm = t.required(r, t.column("width_mm"));
            row.depthMm = t.required(r, t.column("depth_mm"));
            row.workingDistanceMm = t.required(r, t.column("working_distance_mm"));
            row.config = configFrom(t, r, t.column("config"));
            tb.arcFlash.typical.push_back(row);
        }
    } else if (n == "shock_approach") {
        for (std::size_t r = 0; r < t.rows.size(); ++r) {
            ApproachRow row;
            row.vMin = t.required(r, t.column("v_min"));
            row.vMax = t.required(r, t.column("v_max"));
            if (row.vMax < row.vMin ||
                (!tb.approach.empty() && row.vMin <= tb.approach.back().vMax))
                t.fail(r, "voltage ranges must rise and not overlap");
            row.limitedMovable = t.rows[r][t.column("limited_movable")];
            row.limitedFixed = t.rows[r][t.column("limited_fixed")];
            row.restricted = t.rows[r][t.column("restricted")];
            tb.approach.push_back(row);
        }
    } else {
        throw TableError(t.file, 0, "unknown table '" + n + "'");
    }
}

} // namespace

std::string_view scpdTypeKey(ScpdType t) {
    switch (t) {
    case ScpdType::NonTimeDelayFuse:
        return "non_time_delay_fuse";
    case ScpdType::TimeDelayFuse:
        return "time_delay_fuse";
    case ScpdType::InstantaneousBreaker:
        return "instantaneous_trip_breaker";
    case ScpdType::InverseTimeBreaker:
        return "inverse_time_breaker";
    }
    return "";
}

std::string_view electrodeConfigKey(ElectrodeConfig c) {
    switch (c) {
    case ElectrodeConfig::VCB:
        return "VCB";
    case ElectrodeConfig::VCBB:
        return "VCBB";
    case ElectrodeConfig::HCB:
        return "HCB";
    case ElectrodeConfig::VOA:
        return "VOA";
    case ElectrodeConfig::HOA:
        return "HOA";
    }
    return "";
}

std::optional<ElectrodeConfig> electrodeConfigFromKey(std::string_view key) {
    for (ElectrodeConfig c : kAllConfigs)
        if (electrodeConfigKey(c) == key)
            return c;
    return std::nullopt;
}

const ArcFlashTables::TypicalRow* ArcFlashTables::typicalFor(std::string_view kind,
                                                             double systemVolts) const {
    const std::string_view cls = systemVolts <= 1000 ? "lv" : systemVolts <= 5000 ? "5kv" : "15kv";
    for (const auto& row : typical)
        if (row.kind == kind && row.voltageClass == cls)
            return &row;
    return nullptr;
}

std::string_view scpdTypeName(ScpdType t) {
    switch (t) {
    case ScpdType::NonTimeDelayFuse:
        return "non-time-delay fuse";
    case ScpdType::TimeDelayFuse:
        return "time-delay fuse";
    case ScpdType::InstantaneousBreaker:
        return "instantaneous-trip breaker";
    case ScpdType::InverseTimeBreaker:
        return "inverse-time breaker";
    }
    return "";
}

std::shared_ptr<const Tables> loadTables(std::span<const tables::EmbeddedFile> files) {
    auto tb = std::make_shared<Tables>();
    for (const auto& f : files) {
        const CsvTable t = tables::parseCsvTable(f.text, std::string(f.name));
        if (tb->sources.count(t.name))
            throw TableError(t.file, 0, "table '" + t.name + "' is defined twice");
        tb->sources[t.name] = t.source;
        if (t.name == "flc_3ph")
            tb->flc3 = buildFlc(t);
        else if (t.name == "flc_1ph")
            tb->flc1 = buildFlc(t);
        else if (t.name == "flc_3ph_sync")
            tb->flcSync = buildFlc(t);
        else if (t.name == "lra_3ph")
            tb->lra3 = buildFlc(t);
        else if (t.name == "scpd_pct")
            tb->scpd = buildScpd(t);
        else
            buildRest(*tb, t);
    }
    for (const char* needed : {"flc_3ph",
                               "flc_1ph",
                               "flc_3ph_sync",
                               "lra_3ph",
                               "scpd_pct",
                               "code_letters",
                               "ampacity",
                               "ambient_correction",
                               "conductor_adjustment",
                               "standard_ratings",
                               "small_conductor",
                               "egc",
                               "conductor_properties",
                               "conductor_impedance",
                               "transformer_protection",
                               "nema_sizes",
                               "trip_classes",
                               "af_arcing_current",
                               "af_varcf",
                               "af_incident_energy",
                               "af_enclosure_cf",
                               "af_typical_equipment",
                               "shock_approach"})
        if (!tb->sources.count(needed))
            throw TableError("resources/tables", 0,
                             std::string("table '") + needed + "' is missing");
    return tb;
}

std::shared_ptr<const Tables> loadBuiltinTables() {
    return loadTables(tables::embeddedTableFiles());
}

} // namespace lineward
