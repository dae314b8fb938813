// `lineward-cli curves FILE --part TAG (--svg|--png|--pdf OUT)`: the Curves plot, headless.
#include "check/check.h"
#include "cli_commands.h"
#include "curves/curve_set.h"
#include "curves_plot.h"
#include "io/drawing_file.h"
#include "studies/study_view.h"
#include "util/safe_text.h"

#include <QApplication>
#include <cstdlib>
#include <iostream>
#include <memory>

namespace lineward::cli {

namespace {
struct CurvesArgs {
    std::string file, tag, svg, png, pdf;
};
} // namespace

void ensureGuiApplication() {
    // Painting text needs a Qt application; without a display the offscreen platform serves.
    if (QApplication::instance())
        return;
    if (!std::getenv("DISPLAY") && !std::getenv("WAYLAND_DISPLAY") &&
        !std::getenv("QT_QPA_PLATFORM"))
        setenv("QT_QPA_PLATFORM", "offscreen", 1);
    static int argc = 1;
    static char name[] = "lineward-cli";
    static char* argv[] = {name, nullptr};
    static QApplication app(argc, argv); // QGraphicsScene needs the widgets application
}

void addCurvesCommand(CLI::App& app, const TablesRef& tables, int& exitCode) {
    auto a = std::make_shared<CurvesArgs>();
    auto* cmd = app.add_subcommand(
        "curves", "Plot the time-current curves on the path from the source to a part. "
                  "Exit 0, or 2 on a bad file, tag or output.");
    cmd->add_option("file", a->file, "drawing (.lineward)")->required()->check(CLI::ExistingFile);
    cmd->add_option("--part", a->tag, "tag of the part whose path to plot")->required();
    auto* svg = cmd->add_option("--svg", a->svg, "write an SVG picture");
    auto* png = cmd->add_option("--png", a->png, "write a PNG picture");
    auto* pdf = cmd->add_option("--pdf", a->pdf, "write a one-page PDF");
    svg->excludes(png)->excludes(pdf);
    png->excludes(pdf);
    cmd->callback([a, &tables, &exitCode] {
        const std::string out = !a->svg.empty() ? a->svg : !a->png.empty() ? a->png : a->pdf;
        if (out.empty())
            throw CLI::ValidationError("output", "give --svg, --png or --pdf");
        auto loaded = loadForVerb(a->file, exitCode);
        if (!loaded)
            return;
        const Part* p = loaded->partByTag(a->tag);
        if (!p) {
            std::cerr << "lineward-cli curves: no part tagged " << escapeControls(a->tag) << "\n";
            exitCode = kBadInput;
            return;
        }
        const PartId id = p->id;
        const auto result = runCheck(std::move(*loaded), *tables);
        const auto view = result->view();
        ensureGuiApplication();
        const auto set = view ? buildCurveSet(*view, id) : CurveSet{};
        if (auto why = ui::saveCurves(set, QString::fromStdString(out)); !why.isEmpty()) {
            std::cerr << "lineward-cli curves: " << escapeControls(why.toStdString()) << "\n";
            exitCode = kBadInput;
            return;
        }
        std::cout << "wrote " << out << " (" << set.series.size() << " curves)\n";
        exitCode = kClean;
    });
}

} // namespace lineward::cli
