// The editor driven as a user drives it, offscreen, with real input events: place, connect,
// edit, refuse, undo; every command undone gives back the same bytes.
#include "add_bucket_dialog.h"
#include "commands/bucket_command.h"
#include "commands/move_parts_command.h"
#include "findings_panel.h"
#include "import_loads_dialog.h"
#include "inspector.h"
#include "io/drawing_file.h"
#include "main_window.h"
#include "part_item.h"
#include "plant_generator.h"
#include "review_dialogs.h"
#include "sheet_scene.h"
#include "sheet_view.h"
#include "ui_support.h"
#include "user.h"
#include "wire_item.h"

#include <QApplication>
#include <QComboBox>
#include <QFile>
#include <QLabel>
#include <QLineEdit>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QSettings>
#include <QTest>
#include <QTimer>
#include <QTreeWidget>
#include <chrono>
#include <gtest/gtest.h>
#include <random>

using namespace lineward;
using namespace lineward::ui;
using test::Commit;
using test::sharedTables;
using test::User;

namespace {

// Answers the input dialogs of Group as Bucket (tag, then SCCR) by pressing Enter.
void acceptInputDialogs(int count) {
    for (int i = 0; i < count; ++i)
        QTimer::singleShot(150 + 150 * i, [] {
            if (QWidget* d = QApplication::activeModalWidget())
                QTest::keyClick(d, Qt::Key_Return);
        });
}

} // namespace

TEST(Editor, InspectorRefusesBadValuesWithReasons) {
    MainWindow w(sharedTables());
    User user(w);
    const PartId m = user.clickToPlace(PartKind::Motor, QPointF(0, 0));
    user.clickPart(m);
    const auto before = test::drawingBytes(w);
    user.type("hp_or_kw", "-5", Commit::Enter);
    EXPECT_TRUE(user.inspectorMessage().startsWith("Refused:"));
    EXPECT_TRUE(user.inspectorMessage().contains(
        "Rated output (hp) -5 hp is below the smallest accepted value 0.1 hp"))
        << user.inspectorMessage().toStdString();
    user.type("hp_or_kw", "ten", Commit::Tab);
    EXPECT_TRUE(user.inspectorMessage().contains("not a number"));
    user.type("volts", "1e9", Commit::Enter);
    EXPECT_TRUE(user.inspectorMessage().contains("above the largest"));
    user.type("tag", "  ", Commit::Enter);
    EXPECT_TRUE(user.inspectorMessage().contains("empty"));
    EXPECT_EQ(test::drawingBytes(w), before); // nothing applied, nothing clamped
    user.type("hp_or_kw", "15", Commit::Enter);
    EXPECT_TRUE(user.inspectorMessage().isEmpty());
    EXPECT_EQ(*w.document().drawing().part(m)->number("hp"), 15);
}

TEST(Editor, ValidationShowsWhileTyping) {
    MainWindow w(sharedTables());
    User user(w);
    const PartId m = user.clickToPlace(PartKind::Motor, QPointF(0, 0));
    user.clickPart(m);
    QLineEdit* fla = user.field("fla");
    QTest::mouseClick(fla, Qt::LeftButton);
    QTest::keyClick(fla, Qt::Key_A, Qt::ControlModifier);
    QTest::keyClicks(fla, "-");
    EXPECT_FALSE(user.inspectorMessage().isEmpty()); // '-' alone is not a number
    QTest::keyClicks(fla, "2");
    EXPECT_TRUE(user.inspectorMessage().contains("below the smallest accepted value"));
    QTest::keyClick(fla, Qt::Key_Home);
    QTest::keyClick(fla, Qt::Key_Delete);
    EXPECT_TRUE(user.inspectorMessage().isEmpty()); // "2" would be accepted
    QTest::keyClick(fla, Qt::Key_Escape);
}

TEST(Editor, ChoicesShowWordsAndLabelsShowUnits) {
    MainWindow w(sharedTables());
    User user(w);
    const PartId m = user.clickToPlace(PartKind::Motor, QPointF(0, 0));
    user.clickPart(m);
    QComboBox* rotor = user.combo("field_rotor");
    ASSERT_NE(rotor, nullptr);
    EXPECT_GE(rotor->findText("squirrel cage"), 0);
    EXPECT_LT(rotor->findText("squirrel_cage"), 0);
    QStringList labels;
    for (auto* l : w.inspector()->findChildren<QLabel*>())
        labels << l->text();
    EXPECT_TRUE(labels.contains("Nameplate full-load current (A)"))
        << labels.join(" | ").toStdString();
    EXPECT_FALSE(labels.contains("fla"));
    user.choose("field_rotor", "wound rotor");
    EXPECT_EQ(*w.document().drawing().part(m)->word("rotor"), "wound_rotor");
}

TEST(Editor, EveryCommandUndoesToTheSameBytes) {
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    User user(w);
    auto& stack = w.document().undoStack();
    const Drawing& d = w.document().drawing();
    auto check = [&](const char* what, const std::function<void()>& act) {
        const auto before = test::drawingBytes(w);
        const int index = stack.index();
        act();
        user.settle();
        ASSERT_EQ(stack.index(), index + 1) << what; // exactly one command per action
        const auto after = test::drawingBytes(w);
        EXPECT_NE(after, before) << what;
        // Edit → Undo by its shortcut, with the Sheet holding the keyboard (in a text box
        // Ctrl+Z undoes the typing, as it should).
        user.clickEmptySheet();
        user.press(Qt::Key_Z, Qt::ControlModifier);
        EXPECT_EQ(test::drawingBytes(w), before) << what;
        user.press(Qt::Key_Y, Qt::ControlModifier); // Edit → Redo
        EXPECT_EQ(test::drawingBytes(w), after) << what;
        user.press(Qt::Key_Z, Qt::ControlModifier);
        user.settle();
    };
    check("place", [&] { user.clickToPlace(PartKind::Fuse, QPointF(2000, 0)); });
    check("delete", [&] {
        user.clickPart(d.partByTag("K-105")->id);
        user.press(Qt::Key_Delete);
    });
    check("move", [&] { user.dragPart(d.partByTag("P-101")->id, QPointF(30, 0)); });
    check("rotate", [&] {
        user.clickPart(d.partByTag("M-107")->id);
        user.press(Qt::Key_R, Qt::ControlModifier);
    });
    check("inspector edit", [&] {
        user.clickPart(d.partByTag("OL-101")->id);
        user.type("setting_a", "30", Commit::Enter);
    });
    check("connect", [&] {
        user.dragWire({d.partByTag("CB-H1")->id, 1}, {d.partByTag("LP-1")->id, 0});
    });
    check("group bucket", [&] {
        user.clickPart(d.partByTag("CB-H1")->id);
        acceptInputDialogs(2);
        user.press(Qt::Key_G, Qt::ControlModifier);
    });
    check("paste", [&] {
        user.clickPart(d.partByTag("CB-101")->id);
        user.press(Qt::Key_C, Qt::ControlModifier);
        user.press(Qt::Key_V, Qt::ControlModifier);
    });
    check("import load list", [&] {
        const QString list = test::tempDir("editor-import") + "/loads.csv";
        QFile f(list);
        ASSERT_TRUE(f.open(QIODevice::WriteOnly));
        f.write("tag,hp,volts,fla\nP-130,10,460,13\nP-131,20,460,25\n");
        f.close();
        user.answerFileDialogWith(list);
        User::whenModal<ImportLoadsDialog>([](ImportLoadsDialog* dialog) {
            QTest::mouseClick(dialog->findChild<QPushButton*>("importButton"), Qt::LeftButton);
        });
        user.press(Qt::Key_L, Qt::ControlModifier | Qt::ShiftModifier);
        EXPECT_NE(d.partByTag("P-131"), nullptr);
    });
    // The reviewer's name is already in the settings (asked once, earlier).
    QSettings().setValue(kReviewerNameKey, "R. Quill");
    auto commentOn = [&](const char* tag) {
        user.clickPart(d.partByTag(tag)->id);
        User::whenModalWidget(
            [](QWidget* w) { return w->objectName() == "reviewNoteDialog"; },
            [](QWidget* dialog) {
                QTest::keyClicks(dialog->findChild<QPlainTextEdit*>("reviewNote"), "check this");
                QTest::mouseClick(dialog->findChild<QPushButton*>("reviewOk"), Qt::LeftButton);
            },
            "review note dialog");
        user.press(Qt::Key_M, Qt::ControlModifier); // Edit → Add Comment…
    };
    check("add comment", [&] { commentOn("P-101"); });
    // Deleting a part takes its comment with it; undo must bring both back.
    commentOn("F-103");
    ASSERT_EQ(d.comments().size(), 1u);
    check("delete a part with a comment", [&] {
        user.clickPart(d.partByTag("F-103")->id);
        user.press(Qt::Key_Delete);
        EXPECT_TRUE(d.comments().empty());
    });
    check("multi-edit", [&] {
        user.clickPart(d.partByTag("C-101")->id);
        user.clickPart(d.partByTag("C-104")->id, Qt::ControlModifier);
        user.type("length_ft", "80", Commit::Enter);
    });
    check("add bucket", [&] {
        User::whenModal<AddBucketDialog>([](AddBucketDialog* dialog) {
            auto* hp = dialog->findChild<QLineEdit*>("bucket_hp");
            QTest::mouseClick(hp, Qt::LeftButton);
            QTest::keyClicks(hp, "15");
            QTest::mouseClick(dialog->findChild<QPushButton*>("placeBucket"), Qt::LeftButton);
        });
        user.clickPart(d.partByTag("MCC-1")->id);
        user.press(Qt::Key_B, Qt::ControlModifier);
    });
}

TEST(Editor, MoveDragPushesOneMergedCommand) {
    MainWindow w(sharedTables());
    User user(w);
    const PartId id = user.clickToPlace(PartKind::Motor, QPointF(0, 0));
    auto& stack = w.document().undoStack();
    const int count = stack.count();
    for (int i = 1; i <= 3; ++i)
        user.dragPart(id, QPointF(0, 10)); // press, move, release: one move per drag
    EXPECT_EQ(stack.count(), count + 1);   // repeated moves of the same part merge
    EXPECT_EQ(w.document().drawing().part(id)->y, 30);
    user.press(Qt::Key_Z, Qt::ControlModifier);
    EXPECT_EQ(w.document().drawing().part(id)->y, 0);
}

TEST(Editor, WireDraggedBetweenTerminalsWithTheMouse) {
    MainWindow w(sharedTables());
    User user(w);
    const PartId a = user.clickToPlace(PartKind::Breaker, QPointF(0, 0));
    const PartId b = user.dragFromPalette(PartKind::Cable, QPointF(0, 100));
    user.dragWire({a, 1}, {b, 0});
    ASSERT_EQ(w.document().drawing().wires().size(), 1u);
    const Wire& wire = w.document().drawing().wires().front();
    EXPECT_EQ(wire.a, (WireEnd{a, 1}));
    EXPECT_EQ(wire.b, (WireEnd{b, 0}));
}

TEST(Editor, RandomEditsUndoneGiveBackTheOriginalBytes) {
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1-review.lineward"), true).isEmpty());
    User user(w);
    const auto original = test::drawingBytes(w);
    std::mt19937 rng(20261202);
    const Drawing& d = w.document().drawing();
    auto randomPart = [&] { return d.parts()[rng() % d.parts().size()].id; };
    // Clicks a part; false where another item lies on top of it (dense lineups).
    auto select = [&](PartId id) {
        user.clickPart(id);
        const auto sel = w.scene()->selectedParts();
        return sel.size() == 1 && sel.front() == id;
    };
    int edits = 0;
    for (int tries = 0; edits < 120 && tries < 1000; ++tries) {
        const int before = w.document().undoStack().index();
        switch (rng() % 7) {
        case 0:
            user.clickToPlace(static_cast<PartKind>(rng() % kPartKindCount),
                              QPointF(2500 + 60.0 * (rng() % 20), 60.0 * (rng() % 12)));
            break;
        case 1:
            if (select(randomPart()))
                user.press(Qt::Key_Delete);
            break;
        case 2: {
            const PartId id = randomPart();
            if (select(id))
                user.dragPart(id, QPointF(10.0 * (1 + rng() % 5), 10));
            break;
        }
        case 3:
            if (select(randomPart()))
                user.press(Qt::Key_R, Qt::ControlModifier);
            break;
        case 4:
            if (select(randomPart()))
                user.type("tag", QString("T-%1").arg(rng() % 10000), Commit::Enter);
            break;
        case 5: {
            const PartId a = randomPart(), b = randomPart();
            if (!(a == b))
                user.dragWire({a, 0}, {b, 0});
            break;
        }
        default:
            if (select(randomPart())) {
                user.press(Qt::Key_C, Qt::ControlModifier);
                user.press(Qt::Key_V, Qt::ControlModifier);
            }
        }
        edits += w.document().undoStack().index() > before ? 1 : 0;
    }
    EXPECT_GE(edits, 120);
    user.clickEmptySheet(); // the Sheet takes the keyboard; Ctrl+Z is the window's Undo
    for (int i = 0; i < 2000 && w.document().undoStack().canUndo(); ++i)
        user.press(Qt::Key_Z, Qt::ControlModifier);
    EXPECT_FALSE(w.document().undoStack().canUndo());
    EXPECT_EQ(test::drawingBytes(w), original);
}

TEST(Editor, LargePlantIsCheckedOffTheGuiThread) {
    MainWindow w(sharedTables());
    Drawing plant = bench::makePlant(2000);
    w.document().reset(std::move(plant));
    w.document().waitForCheck();
    ASSERT_GE(w.document().drawing().parts().size(), Document::kBackgroundParts);
    User user(w);
    user.clickPart(w.document().drawing().partByTag("C-1-4")->id);
    user.type("size", "14 AWG", Commit::Enter);
    w.document().waitForCheck();
    EXPECT_TRUE(w.document().lastCheckOffGuiThread()); // the window stayed free meanwhile
    EXPECT_NE(test::findingOf(w, "branch.conductor.ampacity"), nullptr);
    // A small drawing is checked at once on the GUI thread (no hand-over worth its cost).
    MainWindow small(sharedTables());
    ASSERT_TRUE(small.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    EXPECT_FALSE(small.document().lastCheckOffGuiThread());
}

TEST(Editor, AutosaveWritesARecoveryCopyWithoutTouchingTheDocument) {
    qputenv("LINEWARD_AUTOSAVE_SECONDS", "1");
    MainWindow w(sharedTables());
    qunsetenv("LINEWARD_AUTOSAVE_SECONDS");
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    User user(w);
    QTest::qWait(1300); // nothing changed: nothing written
    EXPECT_FALSE(QFile::exists(w.recoveryPath()));
    user.clickToPlace(PartKind::Load, QPointF(3000, 0));
    QTest::qWait(1300);
    ASSERT_TRUE(QFile::exists(w.recoveryPath()));
    EXPECT_EQ(test::fileBytes(w.recoveryPath()), test::drawingBytes(w));
    EXPECT_TRUE(w.document().isModified()); // still unsaved; the file path is unchanged
    EXPECT_TRUE(w.document().filePath().endsWith("kestrel-mill-mcc1.lineward"));
}
