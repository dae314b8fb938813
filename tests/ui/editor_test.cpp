// The editor driven as a user drives it, offscreen: place, connect, edit, see the badge,
// apply the fix, undo, save and reopen; every command undone gives back the same bytes.
#include "commands/bucket_command.h"
#include "commands/move_parts_command.h"
#include "findings_panel.h"
#include "inspector.h"
#include "io/drawing_file.h"
#include "main_window.h"
#include "part_item.h"
#include "plant_generator.h"
#include "sheet_scene.h"
#include "sheet_view.h"
#include "ui_support.h"
#include "wire_item.h"

#include <QApplication>
#include <QFile>
#include <QTest>
#include <QTreeWidget>
#include <chrono>
#include <gtest/gtest.h>
#include <random>

using namespace lineward;
using namespace lineward::ui;
using test::sharedTables;

namespace {

std::string bytes(MainWindow& w) {
    return io::serializeDrawing(w.document().drawing());
}

const Finding* findingOf(MainWindow& w, const std::string& rule) {
    for (const auto& f : w.document().report().findings)
        if (f.ruleId == rule)
            return &f;
    return nullptr;
}

// Draws the scenario lineup: source, transformer, bus, breaker, contactor, overload, cable and
// motor, each wired to the next. Returns their ids in that order.
std::vector<PartId> drawLineup(MainWindow& w) {
    const PartKind kinds[] = {PartKind::Source,  PartKind::Transformer, PartKind::Bus,
                              PartKind::Breaker, PartKind::Contactor,   PartKind::Overload,
                              PartKind::Cable,   PartKind::Motor};
    std::vector<PartId> ids;
    double y = 0;
    for (auto k : kinds) {
        ids.push_back(w.placePart(k, QPointF(0, y)));
        y += 70;
    }
    // terminals: source out(0) → tx pri(0); tx sec(1) → bus; bus → breaker line; ...
    w.connectTerminals({ids[0], 0}, {ids[1], 0});
    w.connectTerminals({ids[1], 1}, {ids[2], 0});
    w.connectTerminals({ids[2], 0}, {ids[3], 0});
    for (int i = 3; i < 7; ++i)
        w.connectTerminals({ids[static_cast<std::size_t>(i)], 1},
                           {ids[static_cast<std::size_t>(i + 1)], 0});
    QApplication::processEvents();
    return ids;
}

void select(MainWindow& w, PartId id) {
    w.scene()->clearSelection();
    w.scene()->itemFor(id)->setSelected(true);
}

} // namespace

TEST(Editor, DrawCheckFixUndoSaveReopen) {
    MainWindow w(sharedTables());
    w.show();
    const auto ids = drawLineup(w);
    ASSERT_EQ(w.document().drawing().parts().size(), 8u);
    ASSERT_EQ(w.document().drawing().wires().size(), 7u);
    // Source at 480 V feeding the transformer primary: make the utility 13.8 kV.
    select(w, ids[0]);
    EXPECT_TRUE(w.inspector()->commit("kv", "13.8").isEmpty());
    // A 25 hp motor on the starter 12 AWG cable: 430.22 needs 1.25 × 34 = 42.5 A.
    select(w, ids[7]);
    EXPECT_TRUE(w.inspector()->commit("hp", "25").isEmpty());
    QApplication::processEvents();
    const Finding* f = findingOf(w, "branch.conductor.ampacity");
    ASSERT_NE(f, nullptr);
    auto* cable = w.scene()->itemFor(ids[6]);
    ASSERT_TRUE(cable->badge().has_value());
    EXPECT_EQ(*cable->badge(), Severity::Violation);
    bool listed = false;
    for (int i = 0; i < w.findings()->list()->topLevelItemCount(); ++i)
        listed =
            listed || w.findings()->list()->topLevelItem(i)->text(1) == "branch.conductor.ampacity";
    EXPECT_TRUE(listed);

    // Apply fix: one undoable edit; the violation goes.
    const auto before = bytes(w);
    ASSERT_TRUE(w.applyFix(*f).isEmpty());
    QApplication::processEvents();
    EXPECT_EQ(findingOf(w, "branch.conductor.ampacity"), nullptr);
    EXPECT_NE(*w.document().drawing().part(ids[6])->word("size"), "12 AWG");
    w.document().undoStack().undo();
    QApplication::processEvents();
    EXPECT_NE(findingOf(w, "branch.conductor.ampacity"), nullptr);
    EXPECT_EQ(bytes(w), before);
    w.document().undoStack().redo();
    QApplication::processEvents();

    // Save, reopen in a second window: the same bytes.
    const QString path = test::tempDir("scenario") + "/lineup.lineward";
    ASSERT_TRUE(w.saveTo(path).isEmpty());
    EXPECT_FALSE(w.document().isModified());
    MainWindow again(sharedTables());
    ASSERT_TRUE(again.openFile(path, true).isEmpty());
    EXPECT_EQ(bytes(again), test::fileBytes(path));
    EXPECT_EQ(bytes(again), bytes(w));
}

TEST(Editor, InspectorRefusesBadValuesWithReasons) {
    MainWindow w(sharedTables());
    const PartId m = w.placePart(PartKind::Motor, QPointF(0, 0));
    select(w, m);
    const auto before = bytes(w);
    EXPECT_TRUE(w.inspector()->commit("hp", "-5").contains("below the smallest accepted value"));
    EXPECT_TRUE(w.inspector()->message().startsWith("Refused:"));
    EXPECT_TRUE(w.inspector()->commit("hp", "ten").contains("not a number"));
    EXPECT_TRUE(w.inspector()->commit("volts", "1e9").contains("above the largest"));
    EXPECT_TRUE(w.inspector()->commit("tag", "  ").contains("empty"));
    EXPECT_EQ(bytes(w), before); // nothing applied, nothing clamped
    EXPECT_TRUE(w.inspector()->commit("hp", "15").isEmpty());
    EXPECT_TRUE(w.inspector()->message().isEmpty());
    EXPECT_EQ(*w.document().drawing().part(m)->number("hp"), 15);
}

TEST(Editor, EveryCommandUndoesToTheSameBytes) {
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    auto& stack = w.document().undoStack();
    const Drawing& d = w.document().drawing();
    auto check = [&](const char* what, const std::function<void()>& act) {
        const auto before = bytes(w);
        const int index = stack.index();
        act();
        QApplication::processEvents();
        ASSERT_EQ(stack.index(), index + 1) << what; // exactly one command per action
        const auto after = bytes(w);
        EXPECT_NE(after, before) << what;
        stack.undo();
        EXPECT_EQ(bytes(w), before) << what;
        stack.redo();
        EXPECT_EQ(bytes(w), after) << what;
        stack.undo();
    };
    check("place", [&] { w.placePart(PartKind::Fuse, QPointF(2000, 0)); });
    check("delete", [&] {
        select(w, d.partByTag("K-105")->id);
        w.deleteSelection();
    });
    check("delete wire", [&] {
        w.scene()->clearSelection();
        w.scene()->wireItem(d.wires().front().id)->setSelected(true);
        w.deleteSelection();
    });
    check("move", [&] {
        const PartId id = d.partByTag("P-101")->id;
        stack.push(new MovePartsCommand(w.document(), {id}, {QPointF(d.part(id)->x, d.part(id)->y)},
                                        {QPointF(d.part(id)->x + 30, d.part(id)->y)}));
    });
    check("rotate", [&] {
        select(w, d.partByTag("M-107")->id);
        w.rotateSelection();
    });
    check("inspector edit", [&] {
        select(w, d.partByTag("OL-101")->id);
        w.inspector()->commit("setting_a", "30");
    });
    check("connect", [&] {
        w.connectTerminals({d.partByTag("CB-H1")->id, 1}, {d.partByTag("LP-1")->id, 0});
    });
    check("group bucket", [&] {
        stack.push(new GroupBucketCommand(w.document(), {d.partByTag("CB-H1")->id}, "B-H1", 65));
    });
    check("paste", [&] {
        select(w, d.partByTag("CB-101")->id);
        w.copySelection();
        w.paste();
    });
}

TEST(Editor, MoveDragPushesOneMergedCommand) {
    MainWindow w(sharedTables());
    const PartId id = w.placePart(PartKind::Motor, QPointF(0, 0));
    auto& stack = w.document().undoStack();
    const int count = stack.count();
    for (int i = 1; i <= 3; ++i)
        stack.push(new MovePartsCommand(w.document(), {id}, {QPointF(0, (i - 1) * 10.0)},
                                        {QPointF(0, i * 10.0)}));
    EXPECT_EQ(stack.count(), count + 1); // repeated moves of the same part merge
    EXPECT_EQ(w.document().drawing().part(id)->y, 30);
    stack.undo();
    EXPECT_EQ(w.document().drawing().part(id)->y, 0);
}

TEST(Editor, WireDraggedBetweenTerminalsWithTheMouse) {
    MainWindow w(sharedTables());
    w.resize(1200, 800);
    w.show();
    const PartId a = w.placePart(PartKind::Breaker, QPointF(0, 0));
    const PartId b = w.placePart(PartKind::Cable, QPointF(0, 100));
    QApplication::processEvents();
    auto* view = w.view();
    view->resetTransform();
    view->centerOn(0, 50);
    const QPoint from = view->mapFromScene(w.scene()->itemFor(a)->terminalScenePos(1));
    const QPoint to = view->mapFromScene(w.scene()->itemFor(b)->terminalScenePos(0));
    QTest::mousePress(view->viewport(), Qt::LeftButton, {}, from);
    QTest::mouseMove(view->viewport(), (from + to) / 2);
    QTest::mouseMove(view->viewport(), to);
    QTest::mouseRelease(view->viewport(), Qt::LeftButton, {}, to);
    ASSERT_EQ(w.document().drawing().wires().size(), 1u);
    const Wire& wire = w.document().drawing().wires().front();
    EXPECT_EQ(wire.a, (WireEnd{a, 1}));
    EXPECT_EQ(wire.b, (WireEnd{b, 0}));
}

TEST(Editor, RandomEditsUndoneGiveBackTheOriginalBytes) {
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1-review.lineward"), true).isEmpty());
    const auto original = bytes(w);
    std::mt19937 rng(20261202);
    const Drawing& d = w.document().drawing();
    auto randomPart = [&] { return d.parts()[rng() % d.parts().size()].id; };
    int edits = 0;
    while (edits < 200) {
        const int before = w.document().undoStack().index();
        switch (rng() % 7) {
        case 0:
            w.placePart(static_cast<PartKind>(rng() % kPartKindCount),
                        QPointF(rng() % 2000, rng() % 800));
            break;
        case 1:
            select(w, randomPart());
            w.deleteSelection();
            break;
        case 2: {
            const PartId id = randomPart();
            w.document().undoStack().push(new MovePartsCommand(
                w.document(), {id}, {QPointF(d.part(id)->x, d.part(id)->y)},
                {QPointF(d.part(id)->x + 10.0 * (rng() % 5), d.part(id)->y + 10)}));
            break;
        }
        case 3:
            select(w, randomPart());
            w.rotateSelection();
            break;
        case 4: {
            const PartId id = randomPart();
            select(w, id);
            w.inspector()->commit("tag", QString("T-%1").arg(rng() % 10000));
            break;
        }
        case 5: {
            const PartId a = randomPart(), b = randomPart();
            if (!(a == b))
                w.connectTerminals({a, 0}, {b, 0});
            break;
        }
        default:
            select(w, randomPart());
            w.copySelection();
            w.paste();
        }
        edits += w.document().undoStack().index() > before ? 1 : 0;
    }
    while (w.document().undoStack().canUndo())
        w.document().undoStack().undo();
    EXPECT_EQ(bytes(w), original);
}

TEST(Editor, LargePlantIsCheckedOffTheGuiThread) {
    MainWindow w(sharedTables());
    Drawing plant = bench::makePlant(2000);
    w.document().reset(std::move(plant));
    w.document().waitForCheck();
    ASSERT_GE(w.document().drawing().parts().size(), Document::kBackgroundParts);
    select(w, w.document().drawing().partByTag("C-1-4")->id);
    const auto t0 = std::chrono::steady_clock::now();
    ASSERT_TRUE(w.inspector()->commit("size", "14 AWG").isEmpty());
    QApplication::processEvents(); // the check starts on a worker; the window keeps going
    const double ms =
        std::chrono::duration<double, std::milli>(std::chrono::steady_clock::now() - t0).count();
    std::printf("edit on a 2,000-part plant returned to the event loop in %.1f ms\n", ms);
    w.document().waitForCheck();
    EXPECT_NE(findingOf(w, "branch.conductor.ampacity"), nullptr);
}

TEST(Editor, AutosaveWritesARecoveryCopyWithoutTouchingTheDocument) {
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    w.autosave(); // nothing changed: nothing written
    EXPECT_FALSE(QFile::exists(w.recoveryPath()));
    w.placePart(PartKind::Load, QPointF(3000, 0));
    w.autosave();
    ASSERT_TRUE(QFile::exists(w.recoveryPath()));
    EXPECT_EQ(test::fileBytes(w.recoveryPath()), bytes(w));
    EXPECT_TRUE(w.document().isModified()); // still unsaved; the file path is unchanged
    EXPECT_TRUE(w.document().filePath().endsWith("kestrel-mill-mcc1.lineward"));
}
