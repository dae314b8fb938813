// Editing several parts at once in the real window: parts of one kind selected by a rubber band
// or by Ctrl-click show their common fields (a value they do not share is blank), a value typed
// and committed with Return is set on all of them as one edit, and one undo restores them all.
#include "inspector.h"
#include "main_window.h"
#include "model/ratings.h"
#include "sheet_scene.h"
#include "ui_support.h"
#include "user.h"

#include <QLabel>
#include <QLineEdit>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::ui;

namespace {
QString title(MainWindow& w) {
    return w.inspector()->findChild<QLabel*>("inspectorTitle")->text();
}
} // namespace

TEST(MultiEdit, RubberBandOverCablesThenOneLengthForAllIsOneUndoableEdit) {
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    const std::string before = test::drawingBytes(w);
    const Drawing& d = w.document().drawing();
    const Part* c101 = d.partByTag("C-101");
    const Part* c102 = d.partByTag("C-102");
    ASSERT_TRUE(c101 && c102);
    // A thin band along the row of cables, from left of C-101 to between C-102 and C-103: it
    // covers the two cables and the wires that run through them, no other part.
    user.dragRubberBand({c101->x - 40, c101->y - 6}, {c102->x + 40, c102->y + 6});
    std::vector<PartId> selected = w.scene()->selectedParts();
    ASSERT_EQ(selected, (std::vector<PartId>{c101->id, c102->id}));
    EXPECT_TRUE(title(w).startsWith("2 parts")) << title(w).toStdString();
    // Both are 8 AWG (shown); their lengths differ (60 and 75 ft in the sample: blank).
    EXPECT_EQ(user.field("size")->text(), "8 AWG");
    EXPECT_EQ(user.field("length_ft")->text(), "");
    EXPECT_FALSE(user.field("tag")->isEnabled()); // tags are each part's own
    if (const QByteArray dir = qgetenv("LINEWARD_SHOT_DIR"); !dir.isEmpty())
        w.grab().save(QString::fromUtf8(dir) + "/multi-edit.png");

    user.type("length_ft", "95", test::Commit::Enter);
    EXPECT_EQ(CableRatings::of(*d.partByTag("C-101")).lengthFt, 95);
    EXPECT_EQ(CableRatings::of(*d.partByTag("C-102")).lengthFt, 95);
    EXPECT_EQ(CableRatings::of(*d.partByTag("C-103")).lengthFt, 90); // not selected: unchanged
    EXPECT_EQ(user.field("length_ft")->text(), "95");                // now shared, so shown
    user.clickEmptySheet(); // Ctrl+Z in a text box undoes its typing; on the Sheet, the edit
    user.press(Qt::Key_Z, Qt::ControlModifier);
    EXPECT_EQ(test::drawingBytes(w), before); // one undo restores both
}

TEST(MultiEdit, CtrlClickedOverloadsRefuseABadValueForAllAndTakeAGoodOne) {
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    const std::string before = test::drawingBytes(w);
    const Drawing& d = w.document().drawing();
    user.clickPart(d.partByTag("K-101")->id);
    user.clickPart(d.partByTag("K-104")->id, Qt::ControlModifier);
    user.clickPart(d.partByTag("K-107")->id, Qt::ControlModifier);
    ASSERT_EQ(w.scene()->selectedParts().size(), 3u);
    EXPECT_TRUE(title(w).startsWith("3 parts")) << title(w).toStdString();

    // Parts of different kinds share no fields: the Inspector says so and offers none.
    user.clickPart(d.partByTag("OL-101")->id, Qt::ControlModifier);
    EXPECT_TRUE(title(w).contains("different kinds")) << title(w).toStdString();
    EXPECT_EQ(w.inspector()->findChild<QLineEdit*>("field_tag"), nullptr);
    user.clickPart(d.partByTag("OL-101")->id, Qt::ControlModifier); // taken out again

    user.clickPart(d.partByTag("OL-101")->id);
    user.clickPart(d.partByTag("OL-103")->id, Qt::ControlModifier);
    EXPECT_EQ(user.field("setting_a")->text(), ""); // 32 and 13.2 A: differ
    user.type("setting_a", "-3", test::Commit::Enter);
    EXPECT_TRUE(user.inspectorMessage().startsWith("Refused"))
        << user.inspectorMessage().toStdString();
    EXPECT_EQ(test::drawingBytes(w), before); // refused for one is refused for all

    // 14 A is within OL-103's adjustment range but not OL-101's (24–41.6 A): all or none.
    user.type("setting_a", "14", test::Commit::Enter);
    EXPECT_TRUE(user.inspectorMessage().contains("OL-101"))
        << user.inspectorMessage().toStdString();
    EXPECT_EQ(test::drawingBytes(w), before);

    // A choice set on both: class 20 for the two relays, one edit.
    user.choose("field_trip_class", "20");
    user.settle();
    EXPECT_EQ(OverloadRatings::of(*d.partByTag("OL-101")).tripClass, "20");
    EXPECT_EQ(OverloadRatings::of(*d.partByTag("OL-103")).tripClass, "20");
    EXPECT_EQ(OverloadRatings::of(*d.partByTag("OL-102")).tripClass, "10"); // not selected
    user.press(Qt::Key_Z, Qt::ControlModifier);
    EXPECT_EQ(test::drawingBytes(w), before);
}
