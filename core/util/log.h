// Logging set-up: a rotating log file in the user's data folder, warnings also on stderr.
#pragma once

#include <filesystem>
#include <string>

namespace lineward {

/// The user's data folder for Lineward ($XDG_DATA_HOME/lineward or ~/.local/share/lineward).
std::filesystem::path userDataDir();

/// Installs the default logger `name`: rotating file (1 MiB × 3) at info level and stderr at
/// warning level. Returns the log file path; a folder that cannot be made leaves stderr only.
std::filesystem::path setupLogging(const std::string& name);

} // namespace lineward
