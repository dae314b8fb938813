// lineward-cli: the headless command line (check; later size, study, trip, curves, export).
#include "cli_commands.h"
#include "util/log.h"

#include <iostream>

int main(int argc, char** argv) {
    lineward::setupLogging("lineward-cli");
    CLI::App app{"lineward-cli: check one-line drawings (.lineward) without a display.\n"
                 "Results support, and do not replace, a licensed engineer and the code in "
                 "force."};
    app.require_subcommand(1);
    int exitCode = lineward::cli::kClean;
    lineward::cli::TablesRef tables;
    try {
        tables = lineward::loadBuiltinTables();
    } catch (const std::exception& e) {
        std::cerr << "lineward-cli: reference table unusable: " << e.what() << "\n";
        return lineward::cli::kBadInput;
    }
    lineward::cli::addCheckCommand(app, tables, exitCode);
    lineward::cli::addCompareCommand(app, tables, exitCode);
    lineward::cli::addNewCommand(app, tables, exitCode);
    lineward::cli::addSizeCommand(app, tables, exitCode);
    lineward::cli::addStudyCommand(app, tables, exitCode);
    lineward::cli::addArcFlashCommand(app, tables, exitCode);
    lineward::cli::addTripCommand(app, exitCode);
#ifdef LINEWARD_WITH_QT
    lineward::cli::addCurvesCommand(app, tables, exitCode);
    lineward::cli::addExportCommand(app, tables, exitCode);
    lineward::cli::addLabelsCommand(app, tables, exitCode);
#endif
    try {
        app.parse(argc, argv);
    } catch (const CLI::CallForHelp& e) {
        return app.exit(e);
    } catch (const CLI::CallForAllHelp& e) {
        return app.exit(e);
    } catch (const CLI::ParseError& e) {
        app.exit(e);
        return lineward::cli::kBadInput;
    }
    return exitCode;
}
