// Google Benchmark for the Submittal PDF of a 400-bucket plant (target: 3 s), offscreen.
#include "plant_generator.h"
#include "submittal.h"

#include <QApplication>
#include <QDir>
#include <benchmark/benchmark.h>

using namespace lineward;

namespace {

void BM_SubmittalPdf(benchmark::State& state) {
    const int buckets = static_cast<int>(state.range(0));
    // 12 buckets and 18 parts more per lineup: parts for the wanted number of buckets.
    const Drawing d = bench::makePlant(buckets / 12 * 66 + 1);
    const auto tables = loadBuiltinTables();
    const QString path = QDir::tempPath() + "/lineward-bench-submittal.pdf";
    int pages = 0;
    for (auto _ : state) {
        auto r = ui::writeSubmittalPdf(path, runCheck(d, *tables), tables, ui::SubmittalOptions{});
        pages = r.pages;
        benchmark::DoNotOptimize(pages);
    }
    state.counters["buckets"] = static_cast<double>(d.buckets().size());
    state.counters["parts"] = static_cast<double>(d.parts().size());
    state.counters["pages"] = pages;
}
BENCHMARK(BM_SubmittalPdf)->Arg(48)->Arg(400)->Unit(benchmark::kMillisecond)->Iterations(1);

} // namespace

int main(int argc, char** argv) {
    qputenv("QT_QPA_PLATFORM", "offscreen");
    QApplication app(argc, argv);
    benchmark::Initialize(&argc, argv);
    benchmark::RunSpecifiedBenchmarks();
    benchmark::Shutdown();
    return 0;
}
