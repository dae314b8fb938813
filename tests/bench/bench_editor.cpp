// Google Benchmark for whole-drawing edits in the real (offscreen) main window on a generated
// plant: Select All, Delete, Rotate and Undo of the delete, each through its menu action.
#include "main_window.h"
#include "plant_generator.h"
#include "sheet_scene.h"
#include "sheet_view.h"

#include <QAction>
#include <QApplication>
#include <QDockWidget>
#include <QElapsedTimer>
#include <QLineEdit>
#include <QScrollBar>
#include <QTest>
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
        // The layout a first start shows (Findings, Schedules and Curves tabbed, Curves up: the
        // window raises Findings before it is shown, which leaves the last tab up), whatever an
        // earlier session saved in the user's settings: a saved layout with Schedules up made
        // the figures depend on the machine's history.
        auto* f = w.findChild<QDockWidget*>("findingsDock");
        auto* s = w.findChild<QDockWidget*>("schedulesDock");
        auto* c = w.findChild<QDockWidget*>("curvesDock");
        for (auto* d : {f, s, c}) {
            d->setFloating(false);
            d->show();
        }
        w.tabifyDockWidget(f, s);
        w.tabifyDockWidget(s, c);
        w.show();
        c->raise();
        QApplication::processEvents();
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

// Notes when the Sheet's viewport is painted after the new check result arrived.
struct PaintWatch : QObject {
    bool armed = false, painted = false;
    bool eventFilter(QObject*, QEvent* e) override {
        if (e->type() == QEvent::Paint && armed)
            painted = true;
        return false;
    }
};

// One rating edit typed into the Inspector (a branch cable's length, 80 ft and 900 ft in
// turn: the voltage-drop finding comes and goes), timed from the first key press to the end of
// the Sheet's first paint after the new check result: what a person sees as the delay.
void BM_EditToPaint(benchmark::State& state) {
    Editor e(static_cast<int>(state.range(0)));
    const Part* cable = nullptr;
    for (const auto& p : e.plant.parts())
        if (p.kind == PartKind::Cable && p.tag.rfind("C-", 0) == 0 &&
            p.tag.find('T') == std::string::npos && p.tag.find('F') == std::string::npos)
            cable = &p;
    if (!cable) {
        state.SkipWithError("no branch cable in the plant");
        return;
    }
    e.w.scene()->selectParts({cable->id});
    e.w.view()->centerOn(cable->x, cable->y);
    QApplication::processEvents();
    auto* field = e.w.findChild<QLineEdit*>("field_length_ft");
    if (!field) {
        state.SkipWithError("no length field in the Inspector");
        return;
    }
    PaintWatch watch;
    e.w.view()->viewport()->installEventFilter(&watch);
    QObject::connect(&e.w.document(), &ui::Document::reportChanged, &watch,
                     [&watch] { watch.armed = true; });
    bool longRun = false;
    for (auto _ : state) {
        longRun = !longRun;
        watch.armed = watch.painted = false;
        QElapsedTimer t;
        t.start();
        QTest::mouseClick(field, Qt::LeftButton);
        QTest::keyClick(field, Qt::Key_A, Qt::ControlModifier);
        QTest::keyClicks(field, longRun ? "900" : "80");
        QTest::keyClick(field, Qt::Key_Return);
        while (!watch.painted && t.elapsed() < 10000)
            QApplication::processEvents(QEventLoop::AllEvents);
        state.SetIterationTime(static_cast<double>(t.nsecsElapsed()) * 1e-9);
        if (!watch.painted) {
            state.SkipWithError("no repaint within 10 s");
            return;
        }
    }
    counters(state, e);
}

BENCHMARK(BM_EditToPaint)
    ->Arg(2000)
    ->Arg(8000)
    ->Unit(benchmark::kMillisecond)
    ->UseManualTime()
    ->Iterations(20)
    ->Repetitions(3)
    ->ReportAggregatesOnly(true);
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
