// Edit → Add Bucket… in the real window: a motor typed into the dialog, the proposal value by
// value with the clause behind each, a bad value refused, a value changed by double-click and
// typing with the findings it would cause, Place as one edit in the bus's next free slot; the
// dialog reached by the shortcut, the toolbar button and a right-click on the bus.
#include "add_bucket_dialog.h"
#include "main_window.h"
#include "model/ratings.h"
#include "sizing/auto_size.h"
#include "ui_support.h"
#include "user.h"

#include <QApplication>
#include <QComboBox>
#include <QLabel>
#include <QLineEdit>
#include <QMenu>
#include <QPushButton>
#include <QTableWidget>
#include <QTest>
#include <QTimer>
#include <QToolBar>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::ui;

namespace {

void typeInto(QLineEdit* edit, const QString& text) {
    QTest::mouseClick(edit, Qt::LeftButton);
    QTest::keyClick(edit, Qt::Key_A, Qt::ControlModifier);
    QTest::keyClick(edit, Qt::Key_Delete);
    QTest::keyClicks(edit, text);
}

QString tableText(QTableWidget* t) {
    QStringList rows;
    for (int r = 0; r < t->rowCount(); ++r) {
        QStringList cells;
        for (int c = 0; c < t->columnCount(); ++c)
            cells << t->item(r, c)->text();
        rows << cells.join(" | ");
    }
    return rows.join("\n");
}

// The proposal row of a part's rating ("C-P-140", "Length (ft)").
int rowOf(QTableWidget* t, const QString& tag, const QString& rating) {
    for (int r = 0; r < t->rowCount(); ++r)
        if (t->item(r, 0)->text() == tag && t->item(r, 1)->text() == rating)
            return r;
    ADD_FAILURE() << "no proposal row " << tag.toStdString() << " " << rating.toStdString();
    return -1;
}

// Double-clicks the value cell, selects its text, types and presses Return, as a person does.
void editValue(QTableWidget* t, int row, const QString& text) {
    if (row < 0)
        return;
    t->scrollToItem(t->item(row, 2));
    const QPoint at = t->visualItemRect(t->item(row, 2)).center();
    QTest::mouseClick(t->viewport(), Qt::LeftButton, {}, at);
    QTest::mouseDClick(t->viewport(), Qt::LeftButton, {}, at);
    QApplication::processEvents();
    QWidget* editor = QApplication::focusWidget();
    ASSERT_NE(editor, nullptr);
    ASSERT_TRUE(qobject_cast<QLineEdit*>(editor)) << "no cell editor opened";
    QTest::keyClick(editor, Qt::Key_A, Qt::ControlModifier);
    QTest::keyClicks(editor, text);
    QTest::keyClick(editor, Qt::Key_Return);
    QApplication::processEvents(); // the dialog writes the table back after the edit
    QApplication::processEvents();
}

QString cellText(QTableWidget* t, int row, int col) {
    return row < 0 ? QString() : t->item(row, col)->text();
}

} // namespace

TEST(AddBucket, ProposalShowsItsClausesAndPlaceIsOneUndoableEdit) {
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    const std::string before = test::drawingBytes(w);
    const Drawing& d = w.document().drawing();
    double rightmost = 0;
    for (const auto& p : d.parts())
        rightmost = std::max(rightmost, p.x);
    QString refusedMessage, proposal;
    bool placeEnabledWhenBad = true;
    test::User::whenModal<AddBucketDialog>([&](AddBucketDialog* dialog) {
        auto field = [dialog](const char* key) {
            return dialog->findChild<QLineEdit*>(QString("bucket_") + key);
        };
        typeInto(field("tag"), "P-140");
        typeInto(field("hp"), "-20");
        placeEnabledWhenBad = dialog->findChild<QPushButton*>("placeBucket")->isEnabled();
        refusedMessage = dialog->findChild<QLabel*>("bucketMessage")->text();
        typeInto(field("hp"), "20");
        typeInto(field("fla"), "25");
        auto* protection = dialog->findChild<QComboBox*>("bucket_protection");
        QTest::mouseClick(protection, Qt::LeftButton);
        QApplication::processEvents();
        if (QWidget* popup = QApplication::activePopupWidget())
            QTest::keyClick(popup, Qt::Key_Escape);
        QTest::keyClicks(protection, "fuse");
        proposal = tableText(dialog->findChild<QTableWidget*>("bucketProposal"));
        QTest::mouseClick(dialog->findChild<QPushButton*>("placeBucket"), Qt::LeftButton);
    });
    user.clickPart(d.partByTag("MCC-1")->id);
    user.press(Qt::Key_B, Qt::ControlModifier);

    EXPECT_FALSE(placeEnabledWhenBad);
    EXPECT_TRUE(refusedMessage.contains("hp")) << refusedMessage.toStdString();
    // The proposal names its basis, and its conductor is the size proposal for the motor.
    Part motor = Part::make(PartKind::Motor, PartId(1), "P-140");
    ASSERT_FALSE(motor.set({{MotorRatings::kHp, 20.0}, {MotorRatings::kVolts, 460.0}}));
    SizeOptions o;
    o.device = ScpdType::TimeDelayFuse;
    std::string why;
    const auto expected = proposeBucket(motor, o, *test::sharedTables(), why);
    ASSERT_TRUE(expected) << why;
    EXPECT_TRUE(proposal.contains("FU-P-140 | Rating (A) | " +
                                  QString::fromStdString(formatNumber(expected->deviceRatingA)) +
                                  " | largest rating NEC 2023 Table 430.52(C)(1)"))
        << proposal.toStdString();
    EXPECT_TRUE(proposal.contains(
        QString::fromStdString("C-P-140 | Size | " + expected->conductorSize + " | 125 % of FLC")))
        << proposal.toStdString();
    EXPECT_TRUE(proposal.contains("430.22")) << proposal.toStdString();
    EXPECT_TRUE(proposal.contains("FU-P-140 | Interrupting rating (kA) | 200 | class RK5 fuses "
                                  "interrupt 200 kA (UL 248-12)"))
        << proposal.toStdString();

    // Placed right of the bus's buckets, wired and grouped; the check stays without violation.
    const Part* placed = d.partByTag("DS-P-140");
    ASSERT_NE(placed, nullptr);
    EXPECT_GT(placed->x, rightmost);
    ASSERT_NE(d.bucketOf(placed->id), nullptr);
    EXPECT_EQ(w.document().result().report.openCounts[2], 0);
    user.press(Qt::Key_Z, Qt::ControlModifier);
    EXPECT_EQ(test::drawingBytes(w), before);
}

TEST(AddBucket, AChangedValueIsCheckedShowsItsFindingsAndIsPlaced) {
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    const std::string before = test::drawingBytes(w);
    const Drawing& d = w.document().drawing();
    QString refused, findingsSmallCable, summarySmallCable, findingsClean, lengthBasis;
    test::User::whenModal<AddBucketDialog>([&](AddBucketDialog* dialog) {
        typeInto(dialog->findChild<QLineEdit*>("bucket_tag"), "P-141");
        typeInto(dialog->findChild<QLineEdit*>("bucket_hp"), "20");
        auto* table = dialog->findChild<QTableWidget*>("bucketProposal");
        auto* findings = dialog->findChild<QTableWidget*>("bucketFindings");
        auto* summary = dialog->findChild<QLabel*>("bucketFindingsSummary");
        findingsClean = tableText(findings); // as sized: nothing worse than a caution
        // A value the Inspector refuses is refused here with its reason, and not taken.
        const int setting = rowOf(table, "OL-P-141", "Setting (A)");
        const QString settingBefore = cellText(table, setting, 2);
        editValue(table, setting, "-4");
        refused = dialog->findChild<QLabel*>("bucketMessage")->text();
        EXPECT_EQ(cellText(table, setting, 2), settingBefore);
        // Too small a cable: the check on the drawing with this bucket finds the conductor.
        const int size = rowOf(table, "C-P-141", "Size");
        const QString proposedSize = cellText(table, size, 2);
        editValue(table, size, "14 AWG");
        summarySmallCable = summary->text();
        findingsSmallCable = tableText(findings);
        EXPECT_EQ(cellText(table, size, 3), "changed by the designer");
        if (const QByteArray dir = qgetenv("LINEWARD_SHOT_DIR"); !dir.isEmpty())
            dialog->grab().save(QString::fromUtf8(dir) + "/add-bucket.png");
        editValue(table, size, proposedSize);
        const int length = rowOf(table, "C-P-141", "Length (ft)");
        editValue(table, length, "140");
        lengthBasis = cellText(table, length, 3);
        QTest::mouseClick(dialog->findChild<QPushButton*>("placeBucket"), Qt::LeftButton);
    });
    // The toolbar's button opens it on the selected bus.
    user.clickPart(d.partByTag("MCC-1")->id);
    auto* bar = w.findChild<QToolBar*>("editToolBar");
    ASSERT_NE(bar, nullptr);
    QWidget* button = bar->widgetForAction(w.findChild<QAction*>("addBucketAction"));
    ASSERT_NE(button, nullptr);
    QTest::mouseClick(button, Qt::LeftButton);
    user.settle();

    EXPECT_FALSE(findingsClean.contains("violation")) << findingsClean.toStdString();
    EXPECT_TRUE(refused.startsWith("Refused: OL-P-141")) << refused.toStdString();
    EXPECT_TRUE(findingsSmallCable.contains("branch.conductor.ampacity"))
        << findingsSmallCable.toStdString();
    EXPECT_TRUE(summarySmallCable.contains("finding")) << summarySmallCable.toStdString();
    EXPECT_EQ(lengthBasis, "changed by the designer");
    const Part* cable = d.partByTag("C-P-141");
    ASSERT_NE(cable, nullptr);
    EXPECT_EQ(CableRatings::of(*cable).lengthFt, 140); // the typed value, placed
    EXPECT_EQ(w.document().result().report.openCounts[2], 0);
    user.press(Qt::Key_Z, Qt::ControlModifier);
    EXPECT_EQ(test::drawingBytes(w), before); // the whole bucket was one edit
}

TEST(AddBucket, RightClickOnTheMccBusOffersIt) {
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    QString title;
    // The part menu is a popup: click its Add Bucket entry where it is drawn.
    auto* timer = new QTimer;
    timer->setInterval(50);
    auto tries = std::make_shared<int>(0);
    QObject::connect(timer, &QTimer::timeout, [timer, tries] {
        auto* menu = qobject_cast<QMenu*>(QApplication::activePopupWidget());
        if (!menu) {
            if (++*tries > 100) {
                timer->stop();
                timer->deleteLater();
                ADD_FAILURE() << "no part menu opened";
            }
            return;
        }
        timer->stop();
        timer->deleteLater();
        for (QAction* a : menu->actions())
            if (a->objectName() == "addBucketHere")
                QTest::mouseClick(menu, Qt::LeftButton, {}, menu->actionGeometry(a).center());
    });
    timer->start();
    test::User::whenModal<AddBucketDialog>([&](AddBucketDialog* dialog) {
        title = dialog->windowTitle();
        QTest::keyClick(dialog, Qt::Key_Escape);
    });
    user.rightClickPart(w.document().drawing().partByTag("MCC-1")->id);
    // The part menu is a popup: the person reads it and picks the entry a moment later.
    QTest::qWaitFor([&] { return !title.isEmpty(); }, 5000);
    user.settle();
    EXPECT_EQ(title, "Add Bucket to MCC-1");
}
