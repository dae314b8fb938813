// `lineward-cli check`: load each file, run every rule, report, exit by the worst finding.
#include "check/check.h"
#include "cli_commands.h"
#include "io/drawing_file.h"
#include "report/report_format.h"
#include "util/safe_text.h"

#include <iostream>
#include <memory>
#include <spdlog/spdlog.h>

namespace lineward::cli {

namespace {

struct CheckOptions {
    std::vector<std::string> files;
    bool json = false;
    std::string failOn = "violation";
};

int runCheck(const CheckOptions& o, const Tables& tables) {
    const Severity threshold = *severityFromName(o.failOn);
    bool anyFindings = false, anyBad = false;
    nlohmann::ordered_json all = nlohmann::ordered_json::array();
    for (const auto& file : o.files) {
        auto loaded = io::loadDrawing(file);
        if (!loaded) {
            std::cerr << "lineward-cli: " << escapeControls(loaded.error->text()) << "\n";
            spdlog::info("check: refused {}: {}", file, loaded.error->message);
            anyBad = true;
            continue;
        }
        const auto result = runCheck(std::move(*loaded.drawing), tables);
        const CheckReport& report = result->report;
        anyFindings = anyFindings || report.hasOpenAtLeast(threshold);
        if (o.json)
            all.push_back(reportJson(*result->drawing, report, file));
        else
            std::cout << reportText(*result->drawing, report, file) << "\n";
    }
    if (o.json) {
        nlohmann::ordered_json out;
        out["fail_on"] = o.failOn;
        out["reports"] = all;
        std::cout << inertJson(out.dump(2)) << "\n";
    } else {
        std::cout << kSafetyCaution << "\n";
    }
    if (anyBad)
        return kBadInput;
    return anyFindings ? kFindings : kClean;
}

} // namespace

std::optional<Drawing> loadForVerb(const std::string& file, int& exitCode) {
    auto loaded = io::loadDrawing(file);
    if (loaded)
        return std::move(*loaded.drawing);
    std::cerr << "lineward-cli: " << escapeControls(loaded.error->text()) << "\n";
    exitCode = kBadInput;
    return std::nullopt;
}

void addCheckCommand(CLI::App& app, const TablesRef& tables, int& exitCode) {
    auto opts = std::make_shared<CheckOptions>();
    auto* cmd = app.add_subcommand(
        "check", "Check drawings against every rule. Exit 0: nothing at or above --fail-on; "
                 "1: findings at or above it; 2: a file could not be read.");
    cmd->add_option("files", opts->files, "drawing files (.lineward)")
        ->required()
        ->check(CLI::ExistingFile);
    cmd->add_flag("--json", opts->json, "print machine-readable JSON instead of text");
    cmd->add_option("--fail-on", opts->failOn,
                    "lowest severity that makes the exit code 1 (default: violation)")
        ->check(CLI::IsMember({"violation", "caution", "note"}));
    cmd->callback([opts, &tables, &exitCode] { exitCode = runCheck(*opts, *tables); });
}

} // namespace lineward::cli
