// The verbs of lineward-cli; each registers its options and its action on the CLI11 app.
#pragma once

#include <CLI/CLI.hpp>

namespace lineward::cli {

/// Exit codes shared by every verb.
enum Exit : int { kClean = 0, kFindings = 1, kBadInput = 2 };

/// `check FILE... [--json] [--fail-on violation|caution|note]`
void addCheckCommand(CLI::App& app, int& exitCode);

} // namespace lineward::cli
