// `lineward-cli compare OLD NEW`: what changed between two revisions of a drawing and which
// findings the newer one introduced, resolved or kept.
#include "check/check.h"
#include "cli_commands.h"
#include "compare/compare_format.h"
#include "compare/drawing_compare.h"
#include "report/report_format.h"
#include "util/safe_text.h"

#include <iostream>
#include <memory>

namespace lineward::cli {

namespace {

struct CompareOptions {
    std::string oldFile, newFile;
    bool json = false;
};

int runCompare(const CompareOptions& o, const Tables& tables) {
    int exitCode = kClean;
    // Both files are read before giving up, so one run names every unreadable file.
    auto oldDrawing = loadForVerb(o.oldFile, exitCode);
    auto newDrawing = loadForVerb(o.newFile, exitCode);
    if (!oldDrawing || !newDrawing)
        return kBadInput;
    const auto oldResult = runCheck(std::move(*oldDrawing), tables);
    const auto newResult = runCheck(std::move(*newDrawing), tables);
    const DrawingComparison c = compareDrawings(*oldResult, *newResult);
    if (o.json)
        std::cout << inertJson(comparisonJson(c, o.oldFile, o.newFile).dump(2)) << "\n";
    else
        std::cout << comparisonText(c, o.oldFile, o.newFile) << "\n" << kSafetyCaution << "\n";
    return c.same() ? kClean : kFindings;
}

} // namespace

void addCompareCommand(CLI::App& app, const TablesRef& tables, int& exitCode) {
    auto opts = std::make_shared<CompareOptions>();
    auto* cmd = app.add_subcommand(
        "compare", "Compare two revisions of a drawing: parts, wires and buckets added, removed "
                   "or changed, sheet and settings changes, review comments added, removed or "
                   "changed, and findings new, resolved and still open. Exit 0: the same drawing; 1: they differ; 2: a file could not be read.");
    cmd->add_option("old", opts->oldFile, "the older revision (.lineward)")
        ->required()
        ->check(CLI::ExistingFile);
    cmd->add_option("new", opts->newFile, "the newer revision (.lineward)")
        ->required()
        ->check(CLI::ExistingFile);
    cmd->add_flag("--json", opts->json, "print one JSON object instead of text");
    cmd->callback([opts, &tables, &exitCode] { exitCode = runCompare(*opts, *tables); });
}

} // namespace lineward::cli
