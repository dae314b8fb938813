// `lineward-cli export FILE [--pdf OUT] [--svg OUT] [--dxf OUT] [--csv DIR] [--paper NAME]
// [--portrait] [--half-scale] [--checked-by NAME] [--since OLD [--revision REV]]`
#include "check/check.h"
#include "cli_commands.h"
#include "export/one_line_dxf.h"
#include "io/drawing_file.h"
#include "submittal.h"
#include "util/safe_text.h"

#include <QDir>
#include <QFileInfo>
#include <iostream>
#include <memory>

namespace lineward::cli {

namespace {
struct ExportArgs {
    std::string file, pdf, svg, dxf, csv, paper = "tabloid", since, revision, checkedBy;
    bool portrait = false, halfScale = false;
};
} // namespace

void addExportCommand(CLI::App& app, const TablesRef& tables, int& exitCode) {
    auto a = std::make_shared<ExportArgs>();
    auto* cmd = app.add_subcommand(
        "export", "Write the Submittal PDF, the one-line as SVG or DXF, and the schedules "
                  "as CSV, with no display. Exit 0, or 2 on a bad file or output.");
    cmd->add_option("file", a->file, "drawing (.lineward)")->required()->check(CLI::ExistingFile);
    cmd->add_option("--pdf", a->pdf, "Submittal PDF: one-line, findings, schedules, curve sheets");
    cmd->add_option("--svg", a->svg, "the one-line drawing as SVG");
    cmd->add_option("--dxf", a->dxf,
                    "the one-line as DXF (R12, inches): a layer per part kind, wires, tags, "
                    "ratings, badges, buckets, title block");
    cmd->add_option("--csv", a->csv,
                    "folder for motors.csv, cables.csv, devices.csv and arcflash.csv");
    cmd->add_option("--paper", a->paper, "letter, legal, tabloid (default), a4 or a3")
        ->check(CLI::IsMember({"letter", "legal", "tabloid", "a4", "a3"}));
    cmd->add_flag("--portrait", a->portrait, "portrait pages (default landscape)");
    cmd->add_flag("--half-scale", a->halfScale,
                  "size the text for sheets printed at half size (at least 2 mm on the "
                  "half-size print)");
    cmd->add_option("--checked-by", a->checkedBy,
                    "name printed as CHECKED in the title block (default: the drawing's "
                    "checked_by)");
    cmd->add_option("--since", a->since,
                    "previous revision (.lineward): the Submittal flags each part added or "
                    "changed since it")
        ->check(CLI::ExistingFile);
    cmd->add_option("--revision", a->revision,
                    "the flags' revision (default: the newest row of the revision table)");
    cmd->callback([a, &tables, &exitCode] {
        if (a->pdf.empty() && a->svg.empty() && a->dxf.empty() && a->csv.empty())
            throw CLI::ValidationError("output", "give --pdf, --svg, --dxf or --csv");
        auto loaded = loadForVerb(a->file, exitCode);
        if (!loaded)
            return;
        std::optional<Drawing> previous;
        if (!a->since.empty() && !(previous = loadForVerb(a->since, exitCode)))
            return;
        // Painting needs Qt; the DXF alone does not.
        if (!a->pdf.empty() || !a->svg.empty() || !a->csv.empty())
            ensureGuiApplication();
        // Output folders are made as needed, as a user giving a new path expects.
        for (const auto& out : {a->pdf, a->svg, a->dxf})
            if (!out.empty())
                QDir().mkpath(QFileInfo(QString::fromStdString(out)).absolutePath());
        // One analysis for every output: the PDF, the SVG and the CSVs read the same result.
        const auto result = runCheck(std::move(*loaded), *tables);
        exitCode = kClean;
        auto fail = [&](const QString& why) {
            std::cerr << "lineward-cli export: " << escapeControls(why.toStdString()) << "\n";
            exitCode = kBadInput;
        };
        if (!a->pdf.empty()) {
            ui::SubmittalOptions o;
            o.paper = *ui::paperByName(QString::fromStdString(a->paper));
            o.orientation = a->portrait ? QPageLayout::Portrait : QPageLayout::Landscape;
            o.printScale = a->halfScale ? 0.5 : 1.0;
            o.checkedBy = QString::fromStdString(a->checkedBy);
            if (previous) {
                o.previous = runCheck(*previous, *tables);
                o.previousName = QFileInfo(QString::fromStdString(a->since)).fileName();
                o.revision = QString::fromStdString(a->revision);
            }
            auto r = ui::writeSubmittalPdf(QString::fromStdString(a->pdf), result, tables, o);
            if (!r.error.isEmpty())
                return fail(r.error);
            std::cout << "wrote " << a->pdf << " (" << r.pages << " pages, " << r.oneLineSheets
                      << " one-line sheet(s)";
            if (previous)
                std::cout << ", " << r.revisionFlags << " part(s) flagged as revised";
            std::cout << ")\n";
        }
        if (!a->svg.empty()) {
            if (auto why = ui::writeOneLineSvg(QString::fromStdString(a->svg), result, tables);
                !why.isEmpty())
                return fail(why);
            std::cout << "wrote " << a->svg << "\n";
        }
        if (!a->dxf.empty()) {
            if (auto why = dxf::writeOneLineDxf(*result, a->dxf))
                return fail(QString::fromStdString(a->dxf + ": " + *why));
            std::cout << "wrote " << a->dxf << "\n";
        }
        if (!a->csv.empty()) {
            if (auto why = ui::writeScheduleCsvs(QString::fromStdString(a->csv), *result);
                !why.isEmpty())
                return fail(why);
            std::cout << "wrote motors.csv, cables.csv, devices.csv, arcflash.csv in " << a->csv
                      << "\n";
        }
    });
}

} // namespace lineward::cli
