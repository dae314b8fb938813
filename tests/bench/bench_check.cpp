// Google Benchmark: full check, one edit then re-check, file load, and a bare breadth-first
// walk of the same Boost graph, on generated plants of 500 to 32,000 parts; the same plant with
// its ties open and closed (meshed), and a long chain closed into one loop.
#include "check/check.h"
#include "io/drawing_file.h"
#include "plant_generator.h"
#include "topology/network.h"

#include <algorithm>
#include <benchmark/benchmark.h>
#include <boost/graph/breadth_first_search.hpp>

using namespace lineward;

namespace {

const Tables& tables() {
    static const auto t = loadBuiltinTables();
    return *t;
}

void args(benchmark::internal::Benchmark* b) {
    for (int n : {500, 2000, 8000, 32000})
        b->Arg(n);
    b->Unit(benchmark::kMillisecond);
}

void BM_FullCheck(benchmark::State& state) {
    const Drawing d = bench::makePlant(static_cast<int>(state.range(0)));
    for (auto _ : state)
        benchmark::DoNotOptimize(checkDrawing(d, tables()));
    state.counters["parts"] = static_cast<double>(d.parts().size());
}
BENCHMARK(BM_FullCheck)->Apply(args);

// Arg 1: 0 = ties drawn but open (radial), 1 = ties closed (one loop per lineup pair). The two
// side by side show what the loops cost.
void BM_TiesCheck(benchmark::State& state) {
    const auto ties = state.range(1) ? bench::Ties::Closed : bench::Ties::Open;
    const Drawing d = bench::makePlant(static_cast<int>(state.range(0)), 12, ties);
    for (auto _ : state)
        benchmark::DoNotOptimize(checkDrawing(d, tables()));
    state.counters["parts"] = static_cast<double>(d.parts().size());
}
BENCHMARK(BM_TiesCheck)->ArgsProduct({{2000, 32000}, {0, 1}})->Unit(benchmark::kMillisecond);

void BM_EditThenCheck(benchmark::State& state) {
    Drawing d = bench::makePlant(static_cast<int>(state.range(0)));
    const Part* m = d.partByTag("M-1-4");
    const PartId id = m->id;
    double hp = 25;
    for (auto _ : state) {
        hp = hp == 25 ? 20 : 25;
        d.part(id)->set("hp", hp);
        benchmark::DoNotOptimize(checkDrawing(d, tables()));
    }
}
BENCHMARK(BM_EditThenCheck)->Apply(args);

void BM_LoadFile(benchmark::State& state) {
    const std::string text =
        io::serializeDrawing(bench::makePlant(static_cast<int>(state.range(0))));
    for (auto _ : state)
        benchmark::DoNotOptimize(io::parseDrawing(text, "bench.lineward"));
    state.counters["bytes"] = static_cast<double>(text.size());
}
BENCHMARK(BM_LoadFile)->Apply(args);

void BM_TopologyOnly(benchmark::State& state) {
    const Drawing d = bench::makePlant(static_cast<int>(state.range(0)));
    for (auto _ : state)
        benchmark::DoNotOptimize(Network(d).nodeCount());
}
BENCHMARK(BM_TopologyOnly)->Apply(args);

void BM_BareBfs(benchmark::State& state) {
    const Drawing d = bench::makePlant(static_cast<int>(state.range(0)));
    const Network net(d);
    struct Counter : boost::default_bfs_visitor {
        std::size_t* n;
        void discover_vertex(NodeIndex, const NetGraph&) const { ++*n; }
    };
    for (auto _ : state) {
        // Every node reached from every source, as the check's own walks do.
        std::size_t seen = 0;
        Counter vis;
        vis.n = &seen;
        std::vector<boost::default_color_type> color(net.nodeCount(), boost::white_color);
        auto colors = boost::make_iterator_property_map(
            color.begin(), boost::get(boost::vertex_index, net.graph()));
        boost::queue<NodeIndex> queue;
        for (auto s : net.sources())
            if (color[net.nodeOf(s, 0)] == boost::white_color)
                boost::breadth_first_visit(net.graph(), net.nodeOf(s, 0), queue, vis, colors);
        benchmark::DoNotOptimize(seen);
    }
}
BENCHMARK(BM_BareBfs)->Apply(args);

// Source, bus, `n` cables in series (every other one a breaker when `mixed`), then a motor;
// parts (and wires) written in ascending, descending or shuffled id order. `loop` wires the
// chain's far end back to the bus: one loop through every cable.
std::string chainText(int n, bool mixed, int order, bool loop = false) {
    std::vector<std::string> parts{
        R"({"id":1,"kind":"source","tag":"U","kv":0.48,"fault_ka":30})",
        R"({"id":2,"kind":"bus","tag":"B","bus_type":"switchboard","volts":480,"amps":1200})"};
    std::vector<std::string> wires{R"({"id":1,"from":"1.out","to":"2.bar"})"};
    std::string prev = "2.bar";
    for (int i = 0; i < n; ++i) {
        const std::string id = std::to_string(3 + i);
        parts.push_back(
            mixed && i % 2 == 0
                ? R"({"id":)" + id + R"(,"kind":"breaker","trip_a":100,"interrupting_ka":65})"
                : R"({"id":)" + id + R"(,"kind":"cable","size":"4/0 AWG","length_ft":0.1})");
        wires.push_back(R"({"id":)" + std::to_string(wires.size() + 1) + R"(,"from":")" + prev +
                        R"(","to":")" + id + R"(.line"})");
        prev = id + ".load";
    }
    const std::string m = std::to_string(3 + n);
    parts.push_back(R"({"id":)" + m + R"(,"kind":"motor","hp":10,"volts":460})");
    wires.push_back(R"({"id":)" + std::to_string(wires.size() + 1) + R"(,"from":")" + prev +
                    R"(","to":")" + m + R"(.in"})");
    if (loop)
        wires.push_back(R"({"id":)" + std::to_string(wires.size() + 1) + R"(,"from":")" + prev +
                        R"(","to":"2.bar"})");
    for (auto* list : {&parts, &wires}) {
        if (order == 1)
            std::reverse(list->begin(), list->end());
        if (order == 2)
            for (std::size_t i = 0; i < list->size(); ++i) // a fixed shuffle
                std::swap((*list)[i], (*list)[(i * 7919) % list->size()]);
    }
    auto join = [](const std::vector<std::string>& v) {
        std::string out;
        for (const auto& x : v)
            out += (out.empty() ? "" : ",\n") + x;
        return out;
    };
    return R"({"format":"lineward","version":1,"parts":[)" + join(parts) + R"(],"wires":[)" +
           join(wires) + "]}";
}

void BM_ChainCheck(benchmark::State& state) {
    const auto r = io::parseDrawing(chainText(static_cast<int>(state.range(0)), state.range(1), 0));
    for (auto _ : state)
        benchmark::DoNotOptimize(checkDrawing(*r.drawing, tables()));
}
BENCHMARK(BM_ChainCheck)
    ->ArgsProduct({{10000, 50000}, {0}})
    ->Args({2000, 1})
    ->Args({10000, 1})
    ->Args({50000, 1})
    ->Unit(benchmark::kMillisecond);

void BM_LoopChainCheck(benchmark::State& state) {
    const auto r =
        io::parseDrawing(chainText(static_cast<int>(state.range(0)), false, 0, state.range(1)));
    for (auto _ : state)
        benchmark::DoNotOptimize(checkDrawing(*r.drawing, tables()));
}
// Arg 1: 0 = the open chain, 1 = closed into one loop.
BENCHMARK(BM_LoopChainCheck)
    ->ArgsProduct({{2000, 10000, 50000}, {0, 1}})
    ->Unit(benchmark::kMillisecond);

void BM_LoadIdOrder(benchmark::State& state) {
    const std::string text =
        chainText(static_cast<int>(state.range(0)), false, static_cast<int>(state.range(1)));
    for (auto _ : state)
        benchmark::DoNotOptimize(io::parseDrawing(text));
}
BENCHMARK(BM_LoadIdOrder)->ArgsProduct({{100000}, {0, 1, 2}})->Unit(benchmark::kMillisecond);

} // namespace

BENCHMARK_MAIN();
