// Google Benchmark for whole-drawing edits in the real (offscreen) main window on a generated
// plant: Select All, Delete, Rotate and Undo of the delete, each through its menu action.
#include "main_window.h"
#include "plant_generator.h"
#include "sheet_scene.h"

#include <QAction>
#include <QApplication>
#include <benchmark/benchmark.h>

using namespace lineward;

namespace {

// The Edit menu action with this shortcut (what the key press triggers).
QAction* action(ui::MainWindow& w, const QKeySequence& key) {
    for (QAction* a : w.findChildren<QAction*>())
        if (a->shortcut() == key)
            return a;
    return nullptr;
}

// A shown window holding the plant, every part selected or not.
struct Editor {
    explicit Editor(int parts) : plant(bench::makePlant(parts)), w(loadBuiltinTables()) {
        w.resize(1400, 900);
        w.show();
        w.document().reset(plant);
        QApplication::processEvents();
    }
    void run(QAction* a) {
        a->trigger();
        QApplication::processEvents(); // the deferred work (selection, routing) included
    }
    void selectAll() { run(action(w, QKeySequence::SelectAll)); }
    Drawing plant;
    ui::MainWindow w;
};

void counters(benchmark::State& state, const Editor& e) {
    state.counters["parts"] = static_cast<double>(e.plant.parts().size());
}

void BM_SelectAll(benchmark::State& state) {
    Editor e(static_cast<int>(state.range(0)));
    for (auto _ : state) {
        state.PauseTiming();
        e.w.scene()->clearSelection();
        QApplication::processEvents();
        state.ResumeTiming();
        e.selectAll();
    }
    counters(state, e);
}

void BM_Rotate(benchmark::State& state) {
    Editor e(static_cast<int>(state.range(0)));
    e.selectAll();
    QAction* rotate = action(e.w, QKeySequence(QObject::tr("Ctrl+R")));
    for (auto _ : state)
        e.run(rotate);
    counters(state, e);
}

void BM_Delete(benchmark::State& state) {
    Editor e(static_cast<int>(state.range(0)));
    QAction* del = action(e.w, QKeySequence::Delete);
    QAction* undo = action(e.w, QKeySequence::Undo);
    for (auto _ : state) {
        state.PauseTiming();
        e.selectAll();
        state.ResumeTiming();
        e.run(del);
        state.PauseTiming();
        e.run(undo);
        state.ResumeTiming();
    }
    counters(state, e);
}

void BM_UndoDelete(benchmark::State& state) {
    Editor e(static_cast<int>(state.range(0)));
    QAction* del = action(e.w, QKeySequence::Delete);
    QAction* undo = action(e.w, QKeySequence::Undo);
    for (auto _ : state) {
        state.PauseTiming();
        e.selectAll();
        e.run(del);
        state.ResumeTiming();
        e.run(undo);
    }
    counters(state, e);
}

BENCHMARK(BM_SelectAll)
    ->Arg(2000)
    ->Arg(5000)
    ->Arg(20000)
    ->Unit(benchmark::kMillisecond)
    ->Iterations(1);
BENCHMARK(BM_Rotate)
    ->Arg(2000)
    ->Arg(5000)
    ->Arg(20000)
    ->Unit(benchmark::kMillisecond)
    ->Iterations(1);
BENCHMARK(BM_Delete)
    ->Arg(2000)
    ->Arg(5000)
    ->Arg(20000)
    ->Unit(benchmark::kMillisecond)
    ->Iterations(1);
BENCHMARK(BM_UndoDelete)
    ->Arg(2000)
    ->Arg(5000)
    ->Arg(20000)
    ->Unit(benchmark::kMillisecond)
    ->Iterations(1);

} // namespace
