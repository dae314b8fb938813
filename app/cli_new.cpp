// `lineward-cli new`: a whole lineup from a load list (docs/load-list.md), written only when
// every row is good.
#include "check/check.h"
#include "cli_commands.h"
#include "io/drawing_file.h"
#include "lineup/lineup_builder.h"
#include "report/report_format.h"
#include "util/safe_text.h"

#include <filesystem>
#include <fstream>
#include <iostream>
#include <sstream>

namespace lineward::cli {

namespace {

struct NewArgs {
    std::string loads, out;
    LineupOptions o;
    bool force = false;
};

std::optional<std::string> readText(const std::string& path, std::string& why) {
    std::ifstream in(path, std::ios::binary);
    if (!in) {
        why = "cannot open the file";
        return std::nullopt;
    }
    std::stringstream ss;
    ss << in.rdbuf();
    return ss.str();
}

// Prints each refusal as "lineward-cli: file:line:column: reason"; true when there were any.
bool reportRefused(const std::string& file, const std::vector<LoadListIssue>& refused) {
    for (const auto& i : refused)
        std::cerr << "lineward-cli: " << escapeControls(locatedIssue(file, i)) << "\n";
    return !refused.empty();
}

int runNew(const NewArgs& a, const Tables& tables) {
    std::string why;
    auto text = readText(a.loads, why);
    if (!text) {
        std::cerr << "lineward-cli: " << escapeControls(a.loads) << ": " << why << "\n";
        return kBadInput;
    }
    if (!a.force && std::filesystem::exists(a.out)) {
        std::cerr << "lineward-cli: " << escapeControls(a.out)
                  << ": already exists; give --force to replace it\n";
        return kBadInput;
    }
    const LoadList list = readLoadList(*text);
    for (const auto& n : list.notes)
        std::cerr << "lineward-cli: " << escapeControls(a.loads) << ": " << escapeControls(n)
                  << "\n";
    if (reportRefused(a.loads, list.refused))
        return kBadInput;
    Lineup lineup;
    try {
        lineup = buildLineup(list.rows, a.o, tables);
    } catch (const std::exception& e) {
        std::cerr << "lineward-cli: " << escapeControls(a.loads)
                  << ": cannot build the lineup: " << escapeControls(e.what()) << "\n";
        return kBadInput;
    }
    if (reportRefused(a.loads, lineup.refused))
        return kBadInput;
    lineup.drawing.sheet.project = std::filesystem::path(a.loads).stem().string();
    if (auto err = io::saveDrawing(lineup.drawing, a.out)) {
        std::cerr << "lineward-cli: " << escapeControls(a.out) << ": " << escapeControls(*err)
                  << "\n";
        return kBadInput;
    }
    std::cout << "wrote " << escapeControls(a.out) << ": " << lineup.drawing.buckets().size()
              << " buckets\n";
    for (const auto& s : lineup.basis)
        std::cout << "  " << s.name << ": " << s.value << "\n";
    for (const auto& n : lineup.notes)
        std::cout << "  note: " << escapeControls(n) << "\n";
    const auto report = checkDrawing(lineup.drawing, tables);
    std::cout << "\n"
              << reportText(lineup.drawing, report, a.out) << "\n"
              << kSafetyCaution << "\n";
    return report.hasOpenAtLeast(Severity::Violation) ? kFindings : kClean;
}

} // namespace

void addNewCommand(CLI::App& app, const TablesRef& tables, int& exitCode) {
    auto a = std::make_shared<NewArgs>();
    auto* cmd = app.add_subcommand(
        "new", "Build a whole lineup (service, transformer, main breaker, MCC bus, one sized "
               "bucket per row) from a load list (CSV, docs/load-list.md) and write it only when "
               "every row is good. Exit 0 written and clean, 1 written with violations, 2 on a "
               "refused row or invalid arguments (nothing written).");
    cmd->add_option("--loads", a->loads, "the load list (CSV)")->required();
    cmd->add_option("--out", a->out, "the drawing to write (.lineward)")->required();
    cmd->add_option("--system-volts", a->o.systemVolts,
                    "low-voltage system of the MCC bus, V "
                    "(default 480)")
        ->check(CLI::Range(100.0, 1000.0));
    cmd->add_option("--service-kv", a->o.serviceKv, "utility service voltage, kV (default 13.8)")
        ->check(CLI::Range(1.0, 100.0));
    cmd->add_option("--service-mva", a->o.serviceMva,
                    "available three-phase fault at the service, MVA (default 250)")
        ->check(CLI::Range(1.0, 100000.0));
    cmd->add_option("--xr", a->o.serviceXr, "X/R of the service (default 15)")
        ->check(CLI::Range(0.1, 100.0));
    cmd->add_flag("--force", a->force, "replace --out when it exists");
    cmd->callback([a, &tables, &exitCode] { exitCode = runNew(*a, *tables); });
}

} // namespace lineward::cli
