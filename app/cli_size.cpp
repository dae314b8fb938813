// `lineward-cli size`: a compliant motor bucket from hp (or kW) and voltage.
#include "cli_commands.h"
#include "report/report_format.h"
#include "sizing/auto_size.h"
#include "util/safe_text.h"

#include <iostream>
#include <memory>
#include <nlohmann/json.hpp>

namespace lineward::cli {

namespace {

struct SizeArgs {
    std::optional<double> hp, kw, fla, ambientC, accelS, sf; // sf: the motor's field default
    double volts = 0;
    int phases = 3, conductors = 3, insulationC = 90;
    std::optional<int> terminationC;
    std::string design = "B", codeLetter, material = "cu", device = "itb", rotor = "squirrel_cage";
    bool premium = false, json = false;
};

ScpdType deviceFrom(const std::string& s) {
    if (s == "inst")
        return ScpdType::InstantaneousBreaker;
    if (s == "td-fuse")
        return ScpdType::TimeDelayFuse;
    if (s == "ntd-fuse")
        return ScpdType::NonTimeDelayFuse;
    return ScpdType::InverseTimeBreaker;
}

// Builds the motor through the same validation as the file and the Inspector.
std::optional<Part> motorFrom(const SizeArgs& a, std::string& why) {
    Part m = Part::make(PartKind::Motor, PartId(1), "M");
    using R = MotorRatings;
    std::vector<std::pair<std::string_view, FieldValue>> sets{
        {R::kVolts, a.volts},
        {R::kPhases, static_cast<double>(a.phases)},
        {R::kDesign, a.design},
        {R::kRotor, a.rotor},
        {R::kPremiumEff, a.premium}};
    for (const auto& [key, value] :
         {std::pair{R::kSf, a.sf}, std::pair{R::kAccelS, a.accelS}, std::pair{R::kHp, a.hp},
          std::pair{R::kKw, a.kw}, std::pair{R::kFla, a.fla}})
        if (value)
            sets.push_back({key, *value});
    if (!a.codeLetter.empty())
        sets.push_back({R::kCodeLetter, a.codeLetter});
    for (auto& [k, v] : sets)
        if (auto err = m.set(k, v)) {
            why = *err;
            return std::nullopt;
        }
    if (auto problems = validatePart(m); !problems.empty()) {
        why = problems.front();
        return std::nullopt;
    }
    return m;
}

nlohmann::ordered_json asJson(const BucketProposal& p, const SizeOptions& o) {
    nlohmann::ordered_json j;
    j["flc_a"] = p.flc.amps;
    j["flc_source"] = p.flc.fromTable ? "table" : "nameplate";
    j["conductor_min_ampacity_a"] = p.conductorMinA;
    j["conductor_size"] = p.conductorSize;
    j["conductor_ampacity_a"] = p.conductorAmpacityA;
    j["termination_c"] = p.terminationC;
    nlohmann::ordered_json scpd;
    for (auto d : {ScpdType::InverseTimeBreaker, ScpdType::InstantaneousBreaker,
                   ScpdType::TimeDelayFuse, ScpdType::NonTimeDelayFuse})
        scpd[std::string(scpdTypeKey(d))] = p.scpdMaxA.at(d);
    j["scpd_max_a"] = scpd;
    j["device"] = scpdTypeKey(o.device);
    j["device_rating_a"] = p.deviceRatingA;
    j["overload_max_a"] =
        p.overloadMaxA ? nlohmann::ordered_json(*p.overloadMaxA) : nlohmann::ordered_json(nullptr);
    j["overload_setting_a"] = p.overloadSettingA;
    j["trip_class"] = p.tripClass;
    j["disconnect_min_a"] = p.disconnectMinA;
    j["contactor_nema_size"] = p.nemaSize;
    j["egc_size"] = p.egcSize;
    nlohmann::ordered_json trace = nlohmann::ordered_json::array();
    for (const auto& t : p.trace)
        trace.push_back({{"name", t.name}, {"value", t.value}});
    j["trace"] = trace;
    return j;
}

void printText(const BucketProposal& p, const SizeOptions& o) {
    std::cout << "full-load current      " << fmt(p.flc.amps) << " A ("
              << (p.flc.fromTable ? "NEC table" : "nameplate") << ")\n"
              << "conductor              " << p.conductorSize << " "
              << (o.material == Material::Cu ? "Cu" : "Al") << " (" << fmt(p.conductorAmpacityA)
              << " A, needs " << fmt(p.conductorMinA) << " A, " << p.terminationC
              << " °C terminations)\n"
              << "EGC                    " << p.egcSize << "\n"
              << "largest permitted      inverse-time breaker "
              << fmt(p.scpdMaxA.at(ScpdType::InverseTimeBreaker), 0) << " A, time-delay fuse "
              << fmt(p.scpdMaxA.at(ScpdType::TimeDelayFuse), 0) << " A, non-time-delay fuse "
              << fmt(p.scpdMaxA.at(ScpdType::NonTimeDelayFuse), 0) << " A, instantaneous setting "
              << fmt(p.scpdMaxA.at(ScpdType::InstantaneousBreaker), 0) << " A\n"
              << "proposed device        " << scpdTypeKey(o.device) << " "
              << fmt(p.deviceRatingA, 0) << " A\n"
              << "overload relay         setting " << fmt(p.overloadSettingA) << " A"
              << (p.overloadMaxA ? ", trip current at most " + fmt(*p.overloadMaxA) +
                                       " A (430.32(A)(1))"
                                 : std::string(", give --fla to judge"))
              << ", class " << p.tripClass << "\n"
              << "disconnect             at least " << fmt(p.disconnectMinA)
              << " A and the motor's hp\n"
              << "contactor              NEMA size "
              << (p.nemaSize.empty() ? "(none fits)" : p.nemaSize) << "\n\n";
    for (const auto& t : p.trace)
        std::cout << "  " << t.name << ": " << t.value << "\n";
    std::cout << "\n" << kSafetyCaution << "\n";
}

} // namespace

void addSizeCommand(CLI::App& app, const TablesRef& tables, int& exitCode) {
    auto a = std::make_shared<SizeArgs>();
    auto* cmd =
        app.add_subcommand("size", "Size a motor branch circuit and bucket (NEC 2023 Article 430). "
                                   "Exit 0 when sized, 2 on invalid arguments.");
    auto* hp = cmd->add_option("--hp", a->hp, "motor rating in horsepower");
    auto* kw = cmd->add_option("--kw", a->kw,
                               "motor rating in kW (uses the next hp row at or above kW/0.746)");
    hp->excludes(kw);
    kw->excludes(hp);
    cmd->add_option("--volts", a->volts, "rated motor voltage, e.g. 460")->required();
    cmd->add_option("--phases", a->phases, "1 or 3 (default 3)")->check(CLI::IsMember({1, 3}));
    cmd->add_option("--fla", a->fla,
                    "nameplate full-load current (A); sizes the overload relay (430.6(A)(2))");
    const double sfDefault =
        std::get<double>(findField(PartKind::Motor, MotorRatings::kSf)->defaultValue);
    cmd->add_option("--sf", a->sf,
                    "service factor (default " + formatNumber(sfDefault) +
                        ", as for a motor drawn on the Sheet; below 1.15 the overload limit of "
                        "430.32(A)(1) is 115 %, else 125 %)");
    cmd->add_option("--design", a->design, "NEMA design letter A-E (default B)");
    cmd->add_option("--rotor", a->rotor, "squirrel_cage (default), wound_rotor or synchronous")
        ->check(CLI::IsMember({"squirrel_cage", "wound_rotor", "synchronous"}));
    cmd->add_option("--accel-s", a->accelS,
                    "acceleration time in s (default 5); picks the overload trip class");
    cmd->add_flag("--premium", a->premium, "Design B premium efficiency (Table 430.52 row)");
    cmd->add_option("--code-letter", a->codeLetter,
                    "locked-rotor code letter (Table 430.7(B)); "
                    "sets the instantaneous setting above inrush");
    cmd->add_option("--material", a->material, "cu (default) or al")
        ->check(CLI::IsMember({"cu", "al"}));
    cmd->add_option("--insulation-c", a->insulationC, "conductor insulation rating (default 90)")
        ->check(CLI::IsMember({60, 75, 90}));
    cmd->add_option("--termination-c", a->terminationC,
                    "termination rating (default by NEC 110.14(C)(1): 60 °C to 100 A, 75 °C above)")
        ->check(CLI::IsMember({60, 75, 90}));
    cmd->add_option("--ambient-c", a->ambientC,
                    "ambient temperature (default 30, the Table 310.16 basis)")
        ->check(CLI::Range(-40.0, 90.0));
    cmd->add_option(
           "--conductors", a->conductors,
           "current-carrying conductors in the raceway (default 3, the Table 310.16 basis)")
        ->check(CLI::Range(1, 200));
    cmd->add_option("--device", a->device,
                    "proposed device: itb (default), inst, td-fuse, ntd-fuse")
        ->check(CLI::IsMember({"itb", "inst", "td-fuse", "ntd-fuse"}));
    cmd->add_flag("--json", a->json, "print one JSON object");
    cmd->callback([a, &tables, &exitCode] {
        if (!a->hp && !a->kw)
            throw CLI::ValidationError("--hp or --kw", "give the motor rating with --hp or --kw");
        std::string why;
        auto motor = motorFrom(*a, why);
        if (!motor) {
            std::cerr << "lineward-cli size: " << why << "\n";
            exitCode = kBadInput;
            return;
        }
        SizeOptions o;
        o.device = deviceFrom(a->device);
        o.material = a->material == "al" ? Material::Al : Material::Cu;
        o.insulationC = a->insulationC;
        o.terminationC = a->terminationC;
        o.ambientC = a->ambientC.value_or(30);
        o.conductors = a->conductors;
        auto p = proposeBucket(*motor, o, *tables, why);
        if (!p) {
            std::cerr << "lineward-cli size: cannot size: " << why << "\n";
            exitCode = kBadInput;
            return;
        }
        if (a->json)
            std::cout << inertJson(asJson(*p, o).dump(2)) << "\n";
        else
            printText(*p, o);
        exitCode = kClean;
    });
}

} // namespace lineward::cli
