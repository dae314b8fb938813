// Google Benchmark: full check, one edit then re-check, file load, and a bare breadth-first
// walk of the same Boost graph, on generated plants of 500 to 32,000 parts.
#include "io/drawing_file.h"
#include "plant_generator.h"
#include "rules/check.h"
#include "topology/network.h"

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

} // namespace

BENCHMARK_MAIN();
