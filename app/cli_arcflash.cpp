// `lineward-cli arcflash FILE [--json]`: the check's arc-flash study (IEEE 1584-2018) at every
// bus and bucket, with its clearing device and time.
#include "check/check.h"
#include "cli_commands.h"
#include "curves/arc_flash_study.h"
#include "report/report_format.h"
#include "util/safe_text.h"
#include "util/trace.h"

#include <cmath>
#include <cstdio>
#include <iostream>
#include <memory>
#include <nlohmann/json.hpp>

namespace lineward::cli {

namespace {

using ojson = nlohmann::ordered_json;

ojson rounded(double v, double scale = 1000.0) {
    if (!std::isfinite(v))
        return nullptr;
    return std::round(v * scale) / scale;
}

ojson arcFlashJson(const std::vector<ArcFlashEquipment>& eq) {
    ojson list = ojson::array();
    for (const auto& e : eq) {
        const auto& in = e.input;
        const auto& r = e.result;
        const bool ok = r.range.ok() && r.full.timeMs > 0;
        ojson j;
        j["id"] = e.bucket ? e.bucket->value : e.part.value; // a bucket's own id
        j["tag"] = e.tag;
        j["kind"] = e.kind;
        j["voc_kv"] = rounded(in.vocKv);
        j["ibf_ka"] = in.ibfKa > 0 ? rounded(in.ibfKa) : ojson(nullptr);
        j["config"] = std::string(electrodeConfigKey(in.config));
        j["gap_mm"] = rounded(in.gapMm, 10);
        j["working_distance_mm"] = rounded(in.workingDistanceMm, 10);
        j["enclosure_mm"] =
            ojson::array({rounded(in.enclosure.heightMm, 10), rounded(in.enclosure.widthMm, 10),
                          rounded(in.enclosure.depthMm, 10)});
        j["iarc_ka"] = ok ? rounded(r.currents.iarc) : ojson(nullptr);
        j["iarc_min_ka"] = ok ? rounded(r.currents.iarcMin) : ojson(nullptr);
        j["clearing_tag"] = e.clearing ? ojson(e.clearing->tag) : ojson(nullptr);
        j["t_arc_s"] = ok ? rounded(e.tFullS, 10000) : ojson(nullptr);
        j["t_arc_min_s"] = ok ? rounded(e.tReducedS, 10000) : ojson(nullptr);
        j["e_cal_cm2"] = ok ? rounded(r.governing().eCalCm2(), 100) : ojson(nullptr);
        j["afb_mm"] = ok ? rounded(r.governing().afbMm, 1) : ojson(nullptr);
        j["governing"] = ok ? ojson(r.reducedGoverns ? "reduced" : "full") : ojson(nullptr);
        list.push_back(j);
    }
    ojson out;
    out["equipment"] = list;
    return out;
}

void printTable(const std::vector<ArcFlashEquipment>& eq, const Settings& s) {
    std::printf("%-14s %-14s %6s %7s %-4s %6s %6s %7s %7s %-12s %7s %7s %8s %7s %-7s\n",
                "equipment", "kind", "kV", "Ibf kA", "cfg", "gap", "WD mm", "Iarc", "Iarcmin",
                "clearing", "t s", "tmin s", "cal/cm2", "AFB mm", "case");
    auto dash = [](bool ok, double v, int d) { return ok ? fmt(v, d) : std::string("-"); };
    for (const auto& e : eq) {
        const auto& r = e.result;
        const bool ok = r.range.ok() && r.full.timeMs > 0;
        std::printf("%-14s %-14s %6s %7s %-4s %6s %6s %7s %7s %-12s %7s %7s %8s %7s %-7s\n",
                    escapeControls(e.tag).c_str(), e.kind.c_str(), fmt(e.input.vocKv, 3).c_str(),
                    dash(e.input.ibfKa > 0, e.input.ibfKa, 2).c_str(),
                    std::string(electrodeConfigKey(e.input.config)).c_str(),
                    fmt(e.input.gapMm, 1).c_str(), fmt(e.input.workingDistanceMm, 0).c_str(),
                    dash(ok, r.currents.iarc, 2).c_str(), dash(ok, r.currents.iarcMin, 2).c_str(),
                    e.clearing ? escapeControls(e.clearing->tag).c_str() : "-",
                    dash(ok, e.tFullS, 3).c_str(), dash(ok, e.tReducedS, 3).c_str(),
                    dash(ok, ok ? r.governing().eCalCm2() : 0, 2).c_str(),
                    dash(ok, ok ? r.governing().afbMm : 0, 0).c_str(),
                    ok ? (r.reducedGoverns ? "reduced" : "full") : "-");
        if (!r.range.ok())
            for (const auto& o : r.range.outside)
                std::printf("    outside the model: %s\n", escapeControls(o).c_str());
        for (const auto& n : e.notes)
            std::printf("    note: %s\n", escapeControls(n).c_str());
        for (const auto& n : r.range.notes)
            std::printf("    note: %s\n", escapeControls(n).c_str());
    }
    std::printf("\nIEEE 1584-2018 three-phase model; energy and boundary are the worse of the full "
                "and the reduced arcing current, each with the clearing device's maximum time "
                "at the current it sees, capped at %s s (setting arc_flash_max_time_s, common "
                "practice). Caution above %s cal/cm² (setting), violation above 40 cal/cm² "
                "(common practice).\n%s\n",
                fmt(s.arcFlashMaxTimeS, 2).c_str(), fmt(s.arcFlashCautionCal, 1).c_str(),
                kSafetyCaution);
}

} // namespace

void addArcFlashCommand(CLI::App& app, const TablesRef& tables, int& exitCode) {
    auto file = std::make_shared<std::string>();
    auto json = std::make_shared<bool>(false);
    auto* cmd = app.add_subcommand(
        "arcflash", "Arc-flash incident energy (IEEE 1584-2018) at every bus and bucket, with "
                    "the clearing device and time. Exit 0, or 2 when the file cannot be read.");
    cmd->add_option("file", *file, "drawing (.lineward)")->required()->check(CLI::ExistingFile);
    cmd->add_flag("--json", *json, "print one JSON object with the equipment list");
    cmd->callback([file, json, &tables, &exitCode] {
        auto loaded = loadForVerb(*file, exitCode);
        if (!loaded)
            return;
        const Settings settings = loaded->settings;
        const auto result = runCheck(std::move(*loaded), *tables);
        if (!result->arcFlash) {
            for (const auto& f : result->report.findings)
                if (f.ruleId == "check.incomplete")
                    std::cerr << "lineward-cli arcflash: " << escapeControls(f.message) << "\n";
            std::cerr << "lineward-cli arcflash: no study could run on " << *file << "\n";
            exitCode = kBadInput;
            return;
        }
        if (*json)
            std::cout << inertJson(arcFlashJson(*result->arcFlash).dump(2)) << "\n";
        else
            printTable(*result->arcFlash, settings);
        exitCode = kClean;
    });
}

} // namespace lineward::cli
