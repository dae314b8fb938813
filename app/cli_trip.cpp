// `lineward-cli trip FILE --part TAG --amps A [--json]`: a protective part's band at one current.
#include "cli_commands.h"
#include "curves/trip_curve.h"
#include "io/drawing_file.h"
#include "util/safe_text.h"

#include <cmath>
#include <iostream>
#include <memory>
#include <nlohmann/json.hpp>

namespace lineward::cli {

namespace {
struct TripArgs {
    std::string file, tag;
    double amps = 0;
    bool json = false;
};
} // namespace

void addTripCommand(CLI::App& app, int& exitCode) {
    auto a = std::make_shared<TripArgs>();
    auto* cmd = app.add_subcommand(
        "trip", "Minimum and maximum trip time of a protective part at a current. "
                "Exit 0, or 2 on a bad file, tag or current.");
    cmd->add_option("file", a->file, "drawing (.lineward)")->required()->check(CLI::ExistingFile);
    cmd->add_option("--part", a->tag, "tag of a breaker, fuse or overload relay")->required();
    // A finite current a curve is drawn for (NaN passes a "positive number" check).
    cmd->add_option("--amps", a->amps, "current in amperes, 0.01 to 1000000")
        ->required()
        ->check(CLI::Validator(
            [](std::string& v) -> std::string {
                double x = 0;
                try {
                    x = std::stod(v);
                } catch (const std::exception&) {
                    return "--amps must be a number of amperes";
                }
                return std::isfinite(x) && x >= 0.01 && x <= 1e6
                           ? std::string()
                           : "--amps must be a current from 0.01 to 1000000 A";
            },
            "AMPS"));
    cmd->add_flag("--json", a->json, "print one JSON object");
    cmd->callback([a, &exitCode] {
        auto loaded = loadForVerb(a->file, exitCode);
        if (!loaded)
            return;
        const Part* p = loaded->partByTag(a->tag);
        auto curve = p ? TripCurve::of(*p, loaded->settings.curveBands) : std::nullopt;
        if (!curve) {
            std::cerr << "lineward-cli trip: "
                      << (p ? a->tag + " has no trip curve (not a breaker, fuse or overload relay)"
                            : "no part tagged " + escapeControls(a->tag))
                      << "\n";
            exitCode = kBadInput;
            return;
        }
        const double tmin = curve->minTime(a->amps), tmax = curve->maxTime(a->amps);
        auto j = [](double t) {
            return std::isinf(t) ? nlohmann::ordered_json(nullptr) : nlohmann::ordered_json(t);
        };
        if (a->json) {
            nlohmann::ordered_json out{
                {"tag", a->tag}, {"amps", a->amps}, {"t_min_s", j(tmin)}, {"t_max_s", j(tmax)}};
            std::cout << inertJson(out.dump(2)) << "\n";
        } else {
            auto txt = [](double t) {
                return std::isinf(t) ? std::string("does not trip") : std::to_string(t) + " s";
            };
            std::cout << escapeControls(curve->label()) << " at " << a->amps << " A: minimum "
                      << txt(tmin) << ", maximum " << txt(tmax) << "\n";
        }
        exitCode = kClean;
    });
}

} // namespace lineward::cli
