// `lineward-cli study FILE [--json]`: fault currents, voltages and motor starting per node and
// part.
#include "check/check.h"
#include "cli_commands.h"
#include "io/drawing_file.h"
#include "report/report_format.h"
#include "sizing/motor_sizing.h"
#include "studies/study_view.h"
#include "util/safe_text.h"

#include <cmath>
#include <cstdio>
#include <iostream>
#include <memory>
#include <nlohmann/json.hpp>

namespace lineward::cli {

namespace {

using ojson = nlohmann::ordered_json;

double round3(double v) {
    return std::round(v * 1000.0) / 1000.0;
}

// A node is named after the bus or the first part on it.
std::string nodeTag(const Network& net, NodeIndex n) {
    const auto& g = net.graph();
    for (auto id : g[n].attached)
        if (net.drawing().part(id)->kind == PartKind::Bus)
            return net.drawing().part(id)->tag;
    for (auto id : g[n].attached)
        return net.drawing().part(id)->tag;
    for (auto [e, end] = boost::out_edges(n, g); e != end; ++e)
        return net.drawing().part(g[*e].part)->tag + "." +
               std::string(kindInfo(net.drawing().part(g[*e].part)->kind)
                               .terminals[net.nodeOf(g[*e].part, 0) == n ? 0 : 1]);
    return "node " + std::to_string(n);
}

ojson studyJson(const Network& net, const Flow& flow, const StudyResults& r) {
    const Drawing& d = net.drawing();
    ojson nodes = ojson::array();
    std::unordered_map<int, double> dipAtBus;
    for (const auto& [id, ms] : r.starts)
        if (ms.bus >= 0)
            dipAtBus[ms.bus] = std::max(dipAtBus[ms.bus], ms.busDipPct);
    for (std::size_t n = 0; n < net.nodeCount(); ++n) {
        const int b = r.busOf(n);
        if (b < 0)
            continue;
        const auto& f = r.fault[static_cast<std::size_t>(b)];
        ojson j;
        j["id"] = n;
        j["tag"] = nodeTag(net, n);
        j["kv"] = round3(r.model.nominalV[static_cast<std::size_t>(b)] / 1000.0);
        j["fault_ka"] = round3(f.ikKa);
        j["x_over_r"] = round3(f.xOverR);
        j["peak_ka"] = round3(f.peakKa);
        j["v_pct"] = r.voltage.empty()
                         ? ojson(nullptr)
                         : ojson(round3(std::abs(r.voltage[static_cast<std::size_t>(b)]) * 100));
        j["vdrop_pct"] = r.voltage.empty()
                             ? ojson(nullptr)
                             : ojson(round3((r.originVoltagePu[static_cast<std::size_t>(b)] -
                                             std::abs(r.voltage[static_cast<std::size_t>(b)])) *
                                            100));
        auto dip = dipAtBus.find(b);
        j["start_dip_pct"] = dip == dipAtBus.end() ? ojson(nullptr) : ojson(round3(dip->second));
        nodes.push_back(j);
    }
    ojson parts = ojson::array();
    for (const auto& p : d.parts()) {
        ojson j;
        j["id"] = p.id.value;
        j["tag"] = p.tag;
        j["kind"] = kindInfo(p.kind).key;
        auto la = r.loadAmps.find(p.id);
        j["load_a"] = la == r.loadAmps.end() ? ojson(nullptr) : ojson(round3(la->second));
        const NodeIndex line = isTwoTerminal(p.kind) ? flow.lineNode(p.id) : net.nodeOf(p.id, 0);
        const auto* f = r.faultAtNode(line);
        j["line_side_fault_ka"] = f ? ojson(round3(f->ikKa)) : ojson(nullptr);
        if (p.kind == PartKind::Motor) {
            auto s = r.starts.find(p.id);
            j["terminal_v_start_pct"] =
                s == r.starts.end() ? ojson(nullptr) : ojson(round3(s->second.terminalPctOfRated));
        }
        parts.push_back(j);
    }
    ojson out;
    out["base_mva"] = kBaseMva;
    out["load_flow_converged"] = r.loadFlowConverged;
    out["nodes"] = nodes;
    out["parts"] = parts;
    return out;
}

void printTable(const ojson& j) {
    std::printf("%-22s %8s %10s %8s %9s %8s %10s %10s\n", "node", "kV", "fault kA", "X/R",
                "peak kA", "V %", "drop %", "start dip%");
    auto num = [](const ojson& v) {
        return v.is_null() ? std::string("-") : fmt(v.get<double>(), 2);
    };
    for (const auto& n : j["nodes"])
        std::printf("%-22s %8s %10s %8s %9s %8s %10s %10s\n",
                    escapeControls(n["tag"].get<std::string>()).c_str(), num(n["kv"]).c_str(),
                    num(n["fault_ka"]).c_str(), num(n["x_over_r"]).c_str(),
                    num(n["peak_ka"]).c_str(), num(n["v_pct"]).c_str(), num(n["vdrop_pct"]).c_str(),
                    num(n["start_dip_pct"]).c_str());
    std::printf("\n%-14s %-14s %10s %14s %16s\n", "part", "kind", "load A", "line-side kA",
                "start V % rated");
    for (const auto& p : j["parts"])
        std::printf(
            "%-14s %-14s %10s %14s %16s\n", escapeControls(p["tag"].get<std::string>()).c_str(),
            p["kind"].get<std::string>().c_str(), num(p["load_a"]).c_str(),
            num(p["line_side_fault_ka"]).c_str(),
            p.contains("terminal_v_start_pct") ? num(p["terminal_v_start_pct"]).c_str() : "");
    std::printf("\nThree-phase bolted faults, prefault voltage 1.0 per unit; running motors "
                "contribute.\n%s\n",
                kSafetyCaution);
}

} // namespace

void addStudyCommand(CLI::App& app, const TablesRef& tables, int& exitCode) {
    auto file = std::make_shared<std::string>();
    auto json = std::make_shared<bool>(false);
    auto* cmd = app.add_subcommand(
        "study", "Fault currents, X/R, peak, voltage drop and motor starting at "
                 "every node and part. Exit 0, or 2 when the file cannot be read.");
    cmd->add_option("file", *file, "drawing (.lineward)")->required()->check(CLI::ExistingFile);
    cmd->add_flag("--json", *json, "print one JSON object with nodes and parts");
    cmd->callback([file, json, &tables, &exitCode] {
        auto loaded = loadForVerb(*file, exitCode);
        if (!loaded)
            return;
        const auto result = runCheck(std::move(*loaded), *tables);
        if (!result->study) {
            for (const auto& f : result->report.findings)
                if (f.ruleId == "check.incomplete")
                    std::cerr << "lineward-cli study: " << escapeControls(f.message) << "\n";
            exitCode = kBadInput;
            return;
        }
        const auto j = studyJson(*result->net, *result->flow, *result->study);
        if (*json)
            std::cout << inertJson(j.dump(2)) << "\n";
        else
            printTable(j);
        exitCode = kClean;
    });
}

} // namespace lineward::cli
