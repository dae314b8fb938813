// Edit → Add Bucket… in the real window: a motor typed into the dialog, the proposal with the
// clause behind each value, a bad value refused, Place as one edit in the bus's next free slot.
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
#include <QPushButton>
#include <QTableWidget>
#include <QTest>
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
    for (int r = 0; r < t->rowCount(); ++r)
        rows << t->item(r, 0)->text() + " | " + t->item(r, 1)->text() + " | " +
                    t->item(r, 2)->text();
    return rows.join("\n");
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
        if (const QByteArray dir = qgetenv("LINEWARD_SHOT_DIR"); !dir.isEmpty())
            dialog->grab().save(QString::fromUtf8(dir) + "/add-bucket.png");
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
    EXPECT_TRUE(proposal.contains("FU-P-140 | time-delay fuses")) << proposal.toStdString();
    EXPECT_TRUE(proposal.contains("Table 430.52(C)(1)")) << proposal.toStdString();
    EXPECT_TRUE(proposal.contains(QString::fromStdString("C-P-140 | " + expected->conductorSize)))
        << proposal.toStdString();
    EXPECT_TRUE(proposal.contains("430.22")) << proposal.toStdString();

    // Placed right of the bus's buckets, wired and grouped; the check stays without violation.
    const Part* placed = d.partByTag("DS-P-140");
    ASSERT_NE(placed, nullptr);
    EXPECT_GT(placed->x, rightmost);
    ASSERT_NE(d.bucketOf(placed->id), nullptr);
    EXPECT_EQ(w.document().result().report.openCounts[2], 0);
    user.press(Qt::Key_Z, Qt::ControlModifier);
    EXPECT_EQ(test::drawingBytes(w), before);
}
