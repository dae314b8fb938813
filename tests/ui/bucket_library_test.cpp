// The bucket library in the real window: a bucket saved as a template by the Edit menu and a
// typed name, then inserted from the library onto the MCC bus — the Add Bucket dialog opens
// with the template's motor, every device sized again for the bus, placed as one edit.
#include "add_bucket_dialog.h"
#include "bucket_library.h"
#include "main_window.h"
#include "model/ratings.h"
#include "sizing/auto_size.h"
#include "ui_support.h"
#include "user.h"

#include <QComboBox>
#include <QFile>
#include <QInputDialog>
#include <QLabel>
#include <QLineEdit>
#include <QPushButton>
#include <QTest>
#include <gtest/gtest.h>
#include <unistd.h>

using namespace lineward;
using namespace lineward::ui;

TEST(BucketLibrary, SaveABucketThenInsertItSizedAgainAsOneEdit) {
    // Qt's test locations are shared by test processes: this test's own name, removed after.
    const QString name = "conveyor-" + QString::number(::getpid());
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    const Drawing& d = w.document().drawing();
    const Part source = *d.partByTag("CV-104");

    test::User::whenModal<QInputDialog>([&](QInputDialog* dialog) {
        auto* edit = dialog->findChild<QLineEdit*>();
        ASSERT_NE(edit, nullptr);
        QTest::keyClick(edit, Qt::Key_A, Qt::ControlModifier);
        QTest::keyClicks(edit, name);
        QTest::keyClick(edit, Qt::Key_Return);
    });
    user.clickPart(d.partByTag("CB-104")->id);
    user.chooseMenu({"Edit", "Save Bucket as Template…"});
    const QString file = bucketLibraryDir() + "/" + name + ".lineward";
    ASSERT_TRUE(QFile::exists(file)) << file.toStdString();
    const auto saved = loadBucketTemplate(name);
    ASSERT_TRUE(saved) << saved.error->text();
    EXPECT_NE(saved.drawing->partByTag("CV-104"), nullptr);
    EXPECT_NE(saved.drawing->partByTag("C-104"), nullptr);
    EXPECT_EQ(saved.drawing->buckets().size(), 1u);

    const std::string before = test::drawingBytes(w);
    QString hp, message;
    test::User::whenModal<QInputDialog>([&](QInputDialog* dialog) {
        auto* box = dialog->findChild<QComboBox*>();
        ASSERT_NE(box, nullptr);
        QTest::mouseClick(box, Qt::LeftButton);
        QApplication::processEvents();
        if (QWidget* popup = QApplication::activePopupWidget())
            QTest::keyClick(popup, Qt::Key_Escape);
        QTest::keyClicks(box, name);
        QTest::keyClick(box, Qt::Key_Return);
    });
    test::User::whenModal<AddBucketDialog>([&](AddBucketDialog* dialog) {
        hp = dialog->findChild<QLineEdit*>("bucket_hp")->text();
        message = dialog->findChild<QLabel*>("bucketMessage")->text();
        QTest::mouseClick(dialog->findChild<QPushButton*>("placeBucket"), Qt::LeftButton);
    });
    user.clickPart(d.partByTag("MCC-1")->id);
    user.chooseMenu({"Edit", "Insert Bucket from Library…"});
    QFile::remove(file);

    EXPECT_EQ(hp, QString::fromStdString(formatNumber(*source.number(MotorRatings::kHp))));
    EXPECT_TRUE(message.startsWith("From template \"" + name + "\": sized again for MCC-1"))
        << message.toStdString();
    // The new motor keeps the template's ratings; its branch is sized again for it.
    const Part* motor = nullptr;
    for (const auto& p : d.parts())
        if (p.kind == PartKind::Motor && !motor &&
            before.find("\"" + p.tag + "\"") == std::string::npos)
            motor = &p;
    ASSERT_NE(motor, nullptr);
    EXPECT_EQ(motor->number(MotorRatings::kHp), source.number(MotorRatings::kHp));
    EXPECT_EQ(motor->value(MotorRatings::kSf), source.value(MotorRatings::kSf));
    EXPECT_EQ(motor->value(MotorRatings::kDesign), source.value(MotorRatings::kDesign));
    SizeOptions o; // inverse-time breaker, as the template's CB-104
    std::string why;
    const auto expected = proposeBucket(*motor, o, *test::sharedTables(), why);
    ASSERT_TRUE(expected) << why;
    const Part* cable = d.partByTag("C-" + motor->tag);
    ASSERT_NE(cable, nullptr);
    EXPECT_EQ(CableRatings::of(*cable).size, expected->conductorSize);
    EXPECT_EQ(w.document().result().report.openCounts[2], 0);
    user.press(Qt::Key_Z, Qt::ControlModifier);
    EXPECT_EQ(test::drawingBytes(w), before);
}
