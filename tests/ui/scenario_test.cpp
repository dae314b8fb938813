// A person's session in the real window, with real input only: draw a source-to-motor chain
// by dragging, type every rating (committed by Enter, Tab and clicking away), see refusals,
// make a violation, Apply fix, undo, redo, save, reopen. Runs under AddressSanitizer in CI.
#include "findings_panel.h"
#include "io/drawing_file.h"
#include "main_window.h"
#include "part_item.h"
#include "sheet_scene.h"
#include "ui_support.h"
#include "user.h"

#include <QApplication>
#include <QComboBox>
#include <QFile>
#include <QLineEdit>
#include <QTreeWidget>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::ui;
using test::Commit;
using test::sharedTables;
using test::User;

namespace {

bool hasFinding(MainWindow& w, const std::string& rule) {
    return test::findingOf(w, rule) != nullptr;
}

double number(MainWindow& w, PartId id, const char* key) {
    return w.document().drawing().part(id)->number(key).value_or(-1);
}

} // namespace

TEST(Scenario, DrawTypeFixUndoSaveReopenWithRealInput) {
    MainWindow w(sharedTables());
    User user(w);
    // 1–8: the chain, alternately dragged from the Parts palette and click-placed.
    const PartKind kinds[] = {PartKind::Source,  PartKind::Transformer, PartKind::Bus,
                              PartKind::Breaker, PartKind::Contactor,   PartKind::Overload,
                              PartKind::Cable,   PartKind::Motor};
    std::vector<PartId> ids;
    for (int i = 0; i < 8; ++i) {
        const QPointF at(0, 90.0 * i);
        ids.push_back(i % 2 == 0 ? user.dragFromPalette(kinds[i], at)
                                 : user.clickToPlace(kinds[i], at));
    }
    ASSERT_EQ(w.document().drawing().parts().size(), 8u);
    const PartId src = ids[0], tx = ids[1], bus = ids[2], cb = ids[3], ol = ids[5], cable = ids[6],
                 motor = ids[7];
    // 9–15: wires dragged from terminal to terminal.
    user.dragWire({src, 0}, {tx, 0});
    user.dragWire({tx, 1}, {bus, 0});
    user.dragWire({bus, 0}, {cb, 0});
    for (int i = 3; i < 7; ++i)
        user.dragWire({ids[static_cast<std::size_t>(i)], 1},
                      {ids[static_cast<std::size_t>(i + 1)], 0});
    ASSERT_EQ(w.document().drawing().wires().size(), 7u);

    // 16–19: the source, voltage typed in V (one unit for every voltage), fault level in kA,
    // then switched to MVA in one edit.
    user.clickPart(src);
    ASSERT_EQ(w.scene()->selectedParts(), std::vector<PartId>{src});
    user.type("kv", "13800", Commit::Enter);
    EXPECT_DOUBLE_EQ(number(w, src, "kv"), 13.8);
    user.type("fault_ka_or_fault_mva", "25", Commit::Tab);
    EXPECT_DOUBLE_EQ(number(w, src, "fault_ka"), 25);
    const int before = w.document().undoStack().index();
    user.choose("pair_fault_ka_or_fault_mva", "Available short-circuit power (MVA)");
    user.type("fault_ka_or_fault_mva", "500", Commit::Enter);
    EXPECT_DOUBLE_EQ(number(w, src, "fault_mva"), 500);
    EXPECT_FALSE(w.document().drawing().part(src)->number("fault_ka").has_value());
    EXPECT_EQ(w.document().undoStack().index(), before + 1); // one edit
    user.type("x_over_r", "12", Commit::ClickAway);
    EXPECT_DOUBLE_EQ(number(w, src, "x_over_r"), 12);

    // 20–25: transformer and bus, each commit style.
    user.clickPart(tx);
    user.type("kva", "750", Commit::Enter);
    user.type("z_pct", "5.5", Commit::Tab);
    user.type("sec_v", "480", Commit::ClickAway);
    EXPECT_DOUBLE_EQ(number(w, tx, "kva"), 750);
    EXPECT_DOUBLE_EQ(number(w, tx, "z_pct"), 5.5);
    user.clickPart(bus);
    user.type("amps", "800", Commit::Enter);
    user.type("bracing_ka", "65", Commit::Tab);
    user.choose("field_bus_type", "MCC");
    EXPECT_DOUBLE_EQ(number(w, bus, "amps"), 800);
    EXPECT_EQ(*w.document().drawing().part(bus)->word("bus_type"), "mcc");

    // 26–30: breaker, overload, motor.
    user.clickPart(cb);
    user.type("trip_a", "70", Commit::ClickAway);
    EXPECT_DOUBLE_EQ(number(w, cb, "trip_a"), 70);
    user.clickPart(ol);
    user.type("setting_a", "34", Commit::Tab);
    EXPECT_DOUBLE_EQ(number(w, ol, "setting_a"), 34);
    user.clickPart(motor);
    user.type("hp_or_kw", "25", Commit::Enter);
    user.type("fla", "32", Commit::Tab);
    user.choose("field_rotor", "squirrel cage");
    EXPECT_DOUBLE_EQ(number(w, motor, "hp"), 25);
    EXPECT_DOUBLE_EQ(number(w, motor, "fla"), 32);

    // 31–33: refused values show the reason, by label and unit, and change nothing.
    const std::string good = test::drawingBytes(w);
    user.type("fla", "-3", Commit::Enter);
    EXPECT_TRUE(user.inspectorMessage().startsWith("Refused: Nameplate full-load current (A)"))
        << user.inspectorMessage().toStdString();
    user.type("fla", "ten", Commit::Tab);
    EXPECT_TRUE(user.inspectorMessage().contains("is not a number"));
    user.type("volts", "1e9", Commit::ClickAway);
    EXPECT_TRUE(user.inspectorMessage().contains("above the largest accepted value"));
    EXPECT_FALSE(user.inspectorMessage().contains("volts")); // the label, never the file key
    EXPECT_EQ(test::drawingBytes(w), good);

    // 34–36: 25 hp on the starter's 12 AWG cable: NEC 2023 430.22 needs 1.25 × 34 A (Table
    // 430.250, 460 V) = 42.5 A, more than 12 AWG carries. The badge appears on the cable.
    ASSERT_TRUE(hasFinding(w, "branch.conductor.ampacity"));
    PartItem* cableItem = w.scene()->itemFor(cable);
    ASSERT_TRUE(cableItem->badge().has_value());
    EXPECT_EQ(*cableItem->badge(), Severity::Violation);
    ASSERT_TRUE(user.clickFinding("branch.conductor.ampacity"));
    EXPECT_TRUE(cableItem->isSelected()); // the list locates the part
    user.clickApplyFix();
    EXPECT_FALSE(hasFinding(w, "branch.conductor.ampacity"));
    EXPECT_NE(*w.document().drawing().part(cable)->word("size"), "12 AWG");
    EXPECT_TRUE(cableItem->isSelected()); // Apply fix keeps the part selected
    const std::string fixed = test::drawingBytes(w);

    // 37–38: undo and redo from the keyboard.
    user.clickEmptySheet();
    user.press(Qt::Key_Z, Qt::ControlModifier);
    EXPECT_TRUE(hasFinding(w, "branch.conductor.ampacity"));
    EXPECT_EQ(test::drawingBytes(w), good);
    user.press(Qt::Key_Y, Qt::ControlModifier); // Redo
    EXPECT_FALSE(hasFinding(w, "branch.conductor.ampacity"));
    EXPECT_EQ(test::drawingBytes(w), fixed);

    // 39–41: save with Ctrl+S into the file dialog, reopen with Ctrl+O: the same bytes.
    const QString path = test::tempDir("scenario") + "/lineup.lineward";
    user.answerFileDialogWith(path);
    user.press(Qt::Key_S, Qt::ControlModifier);
    ASSERT_TRUE(QFile::exists(path));
    EXPECT_FALSE(w.windowTitle().contains('*'));
    EXPECT_EQ(test::fileBytes(path), fixed);
    user.answerFileDialogWith(path);
    user.press(Qt::Key_O, Qt::ControlModifier);
    EXPECT_EQ(test::drawingBytes(w), test::fileBytes(path));
    EXPECT_EQ(w.document().drawing().parts().size(), 8u);
}

TEST(Scenario, FiftyInspectorCommitsInARow) {
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    User user(w);
    const PartId ol = w.document().drawing().partByTag("OL-101")->id;
    const PartId m = w.document().drawing().partByTag("P-101")->id;
    const Commit how[] = {Commit::Enter, Commit::Tab, Commit::ClickAway};
    for (int i = 0; i < 50; ++i) {
        // Alternate parts so the form is rebuilt as well as updated in place.
        const bool relay = i % 2 == 0;
        user.clickPart(relay ? ol : m);
        const double v = relay ? 28.0 + i * 0.1 : 5.5 + (i % 10) * 0.1;
        user.type(relay ? "setting_a" : "accel_s", QString::number(v), how[i % 3]);
        ASSERT_NEAR(number(w, relay ? ol : m, relay ? "setting_a" : "accel_s"), v, 1e-9)
            << "commit " << i;
    }
    EXPECT_EQ(w.document().undoStack().count(), 50);
}
