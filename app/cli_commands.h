// The verbs of lineward-cli; each registers its options and its action on the CLI11 app.
#pragma once

#include "model/drawing.h"
#include "tables/tables.h"

#include <CLI/CLI.hpp>
#include <memory>
#include <optional>
#include <string>

namespace lineward::cli {

/// Exit codes shared by every verb.
enum Exit : int { kClean = 0, kFindings = 1, kBadInput = 2 };

/// Loads a drawing for a verb; on failure prints "lineward-cli: file:line:column: why",
/// sets the exit code to kBadInput and returns nothing.
std::optional<Drawing> loadForVerb(const std::string& file, int& exitCode);

/// The reference tables, loaded once before any verb runs.
using TablesRef = std::shared_ptr<const Tables>;

/// `check FILE... [--json] [--fail-on violation|caution|note]`
void addCheckCommand(CLI::App& app, const TablesRef& tables, int& exitCode);
/// `compare OLD NEW [--json]`
void addCompareCommand(CLI::App& app, const TablesRef& tables, int& exitCode);
/// `new --loads LIST.csv --out FILE [--system-volts V] [--service-kv KV] [--service-mva MVA]
/// [--xr XR] [--force]`
void addNewCommand(CLI::App& app, const TablesRef& tables, int& exitCode);
/// `size --hp HP | --kw KW --volts V [...]`
void addSizeCommand(CLI::App& app, const TablesRef& tables, int& exitCode);
/// `trip FILE --part TAG --amps A [--json]`
void addTripCommand(CLI::App& app, int& exitCode);
/// `curves FILE --part TAG (--svg|--png|--pdf OUT)` (needs the Qt renderer)
void addCurvesCommand(CLI::App& app, const TablesRef& tables, int& exitCode);
/// `export FILE [--pdf OUT] [--svg OUT] [--csv DIR] [--paper NAME] [--portrait]`
void addExportCommand(CLI::App& app, const TablesRef& tables, int& exitCode);
/// `labels FILE --out FILE.pdf [--stock NAME] [--date DATE]` (needs the Qt renderer)
void addLabelsCommand(CLI::App& app, const TablesRef& tables, int& exitCode);
/// Creates the Qt application that painting needs, offscreen when there is no display.
void ensureGuiApplication();
/// `study FILE [--json]`
void addStudyCommand(CLI::App& app, const TablesRef& tables, int& exitCode);
/// `arcflash FILE [--json]`
void addArcFlashCommand(CLI::App& app, const TablesRef& tables, int& exitCode);

} // namespace lineward::cli
