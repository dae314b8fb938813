// spdlog sinks for the programs; the core itself only calls spdlog's free functions.
#include "util/log.h"

#include <cstdlib>
#include <spdlog/sinks/rotating_file_sink.h>
#include <spdlog/sinks/stdout_color_sinks.h>
#include <spdlog/spdlog.h>
#include <vector>

namespace lineward {

std::filesystem::path userDataDir() {
    if (const char* xdg = std::getenv("XDG_DATA_HOME"); xdg && *xdg)
        return std::filesystem::path(xdg) / "lineward";
    if (const char* home = std::getenv("HOME"); home && *home)
        return std::filesystem::path(home) / ".local" / "share" / "lineward";
    return std::filesystem::temp_directory_path() / "lineward";
}

std::filesystem::path setupLogging(const std::string& name) {
    std::vector<spdlog::sink_ptr> sinks;
    auto err = std::make_shared<spdlog::sinks::stderr_color_sink_mt>();
    err->set_level(spdlog::level::warn);
    err->set_pattern("%n: %l: %v");
    sinks.push_back(err);
    std::filesystem::path file = userDataDir() / (name + ".log");
    try {
        std::filesystem::create_directories(file.parent_path());
        auto rot =
            std::make_shared<spdlog::sinks::rotating_file_sink_mt>(file.string(), 1u << 20, 3);
        rot->set_level(spdlog::level::info);
        sinks.push_back(rot);
    } catch (const std::exception&) {
        file.clear();
    }
    auto logger = std::make_shared<spdlog::logger>(name, sinks.begin(), sinks.end());
    logger->set_level(spdlog::level::info);
    // Flush every record: an error logged just before a crash (or a kill) must be in the file.
    logger->flush_on(spdlog::level::info);
    spdlog::set_default_logger(logger);
    if (file.empty())
        spdlog::warn("cannot open a log file in {}; logging to stderr only",
                     userDataDir().string());
    return file;
}

} // namespace lineward
