// The real main window, offscreen: open the mistake sample, see badges and the Findings list,
// locate a finding's part.
#include "bucket_item.h"
#include "check/check.h"
#include "curves/arc_flash_study.h"
#include "findings_panel.h"
#include "inspector.h"
#include "main_window.h"
#include "part_item.h"
#include "sheet_scene.h"
#include "ui_support.h"
#include "user.h"
#include "util/trace.h"

#include <QApplication>
#include <QGraphicsView>
#include <QLabel>
#include <QTableView>
#include <QTreeWidget>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::ui;

using test::Commit;
using test::sharedTables;
namespace {
QString sample(const char* name) {
    return test::samplePath(name);
}
} // namespace

TEST(MainWindow, OpensSampleShowsBadgesAndFindings) {
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(sample("kestrel-mill-mcc1-review.lineward"), true).isEmpty());
    test::User user(w);
    const auto& report = w.document().report();
    ASSERT_FALSE(report.findings.empty());
    EXPECT_EQ(w.findings()->list()->topLevelItemCount(), static_cast<int>(report.findings.size()));
    const Part* p105 = w.document().drawing().partByTag("P-105");
    ASSERT_NE(p105, nullptr);
    PartItem* item = w.scene()->itemFor(p105->id);
    ASSERT_NE(item, nullptr);
    ASSERT_TRUE(item->badge().has_value());
    EXPECT_EQ(*item->badge(), Severity::Violation);
    EXPECT_TRUE(item->toolTip().contains("topology.voltage.mismatch"));
    auto* counts = w.findChild<QLabel*>("severityCounts");
    ASSERT_NE(counts, nullptr);
    EXPECT_TRUE(counts->text().startsWith(QString::number(report.openCounts[2]) + " violations"));

    // Clicking the finding selects its part on the Sheet.
    ASSERT_TRUE(user.clickFinding("topology.voltage.mismatch"));
    EXPECT_TRUE(item->isSelected());
}

TEST(MainWindow, CleanSampleHasNoBadges) {
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(sample("kestrel-mill-mcc1.lineward"), true).isEmpty());
    std::size_t parts = 0;
    for (const auto* gi : w.scene()->items()) {
        if (auto* pi = qgraphicsitem_cast<const PartItem*>(gi)) {
            ++parts;
            EXPECT_FALSE(pi->badge().has_value()) << pi->part().tag;
        }
    }
    EXPECT_EQ(parts, w.document().drawing().parts().size()); // every part is on the Sheet
    EXPECT_GT(parts, 50u);
}

TEST(MainWindow, BrokenFileGivesLocatedMessageAndKeepsDrawing) {
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(sample("kestrel-mill-mcc1.lineward"), true).isEmpty());
    const auto parts = w.document().drawing().parts().size();
    test::User user(w);
    QString why;
    user.answerFileDialogWith(QString(LINEWARD_SOURCE_DIR) + "/README.md");
    test::User::answerMessageBox(QMessageBox::Ok, &why);
    user.press(Qt::Key_O, Qt::ControlModifier); // File → Open, README.md typed in the dialog
    EXPECT_TRUE(why.contains("README.md:1:")) << why.toStdString();
    EXPECT_EQ(w.document().drawing().parts().size(), parts);
}

TEST(MainWindow, SchedulesShownAfterEditsHoldTheNewValues) {
    // While its tab is hidden the Schedules panel does no work per edit; brought up, it shows
    // the newest check's values.
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(sample("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    user.clickPart(w.document().drawing().partByTag("OL-101")->id);
    user.type("setting_a", "33.5", test::Commit::Enter);
    user.showPanel("Schedules");
    auto* motors = w.findChild<QTableView*>("schedule_motors");
    ASSERT_NE(motors, nullptr);
    ASSERT_TRUE(motors->isVisible());
    const auto* rows = motors->model();
    auto cell = [&](int r, int c) { return rows->index(r, c).data().toString(); };
    bool shown = false;
    for (int r = 0; r < rows->rowCount(); ++r)
        if (cell(r, 0) == "P-101")
            shown = cell(r, 7) == "33.5"; // the Overload A column
    EXPECT_TRUE(shown);
    // Another edit while the tab is up refills the same table in place.
    user.clickPart(w.document().drawing().partByTag("OL-101")->id);
    user.type("setting_a", "34", test::Commit::Enter);
    EXPECT_EQ(w.findChild<QTableView*>("schedule_motors"), motors);
    bool again = false;
    for (int r = 0; r < rows->rowCount(); ++r)
        if (cell(r, 0) == "P-101")
            again = cell(r, 7) == "34";
    EXPECT_TRUE(again);
}

TEST(MainWindow, SchedulesBehindAnotherTabWaitUntilTheirTabIsUp) {
    // A dock tabbed behind another counts as visible to Qt: the Schedules must still not refill
    // per edit while the Findings tab is up, and must show the newest values when clicked up.
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(sample("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    user.showPanel("Schedules");
    auto* motors = w.findChild<QTableView*>("schedule_motors");
    ASSERT_NE(motors, nullptr);
    const auto* rows = motors->model();
    auto overloadA = [&] {
        for (int r = 0; r < rows->rowCount(); ++r)
            if (rows->index(r, 0).data().toString() == "P-101")
                return rows->index(r, 7).data().toString(); // the Overload A column
        return QString();
    };
    const QString before = overloadA();
    ASSERT_FALSE(before.isEmpty());
    ASSERT_NE(before, "33.5");
    user.showPanel("Findings");
    user.clickPart(w.document().drawing().partByTag("OL-101")->id);
    user.type("setting_a", "33.5", test::Commit::Enter);
    EXPECT_EQ(overloadA(), before); // behind the Findings tab: not refilled
    user.showPanel("Schedules");
    EXPECT_EQ(overloadA(), "33.5");
}

TEST(MainWindow, InspectorShowsTheBusArcFlashResultAndFollowsAnEdit) {
    // Clicking a bus shows its arc-flash result, the check result's numbers as plain text; a
    // working distance typed into the Inspector changes it after the re-check.
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(sample("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    const Part* mcc = w.document().drawing().partByTag("MCC-1");
    ASSERT_NE(mcc, nullptr);
    const PartId id = mcc->id;
    user.clickPart(id);
    user.settle();
    auto* label = w.inspector()->findChild<QLabel*>("inspectorArcFlash");
    ASSERT_NE(label, nullptr);
    EXPECT_EQ(label->textFormat(), Qt::PlainText);
    EXPECT_FALSE(label->isHidden());
    auto energyOf = [&] {
        for (const auto& e : *w.document().result().arcFlash)
            if (e.part == id && !e.bucket)
                return *e.energyCal();
        return -1.0;
    };
    const double before = energyOf();
    ASSERT_GT(before, 0.0);
    EXPECT_TRUE(label->text().contains(QString::fromStdString(fmt(before, 2) + " cal/cm²")))
        << label->text().toStdString();
    EXPECT_TRUE(label->text().contains("CB-F1"));
    EXPECT_TRUE(label->text().contains("does not replace"));
    user.type("af_working_distance_mm", "914.4", Commit::Enter);
    user.settle();
    const double after = energyOf();
    EXPECT_LT(after, before); // farther away, less energy
    EXPECT_TRUE(label->text().contains(QString::fromStdString(fmt(after, 2) + " cal/cm²")))
        << label->text().toStdString();
    EXPECT_TRUE(label->text().contains("at 914 mm"));
    // A motor has no arc-flash result: the line is hidden.
    user.clickPart(w.document().drawing().partByTag("P-101")->id);
    user.settle();
    EXPECT_TRUE(label->isHidden());
}

TEST(MainWindow, EachBusCarriesItsArcFlashMark) {
    // The mark on the sheet shows the check result's energy, and follows an edit.
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(sample("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    const auto& af = *w.document().result().arcFlash;
    int buses = 0;
    for (const auto& e : af) {
        if (e.bucket)
            continue;
        ++buses;
        PartItem* item = w.scene()->itemFor(e.part);
        ASSERT_NE(item, nullptr);
        EXPECT_EQ(item->arcFlashMark().toStdString(), "AF " + fmt(*e.energyCal(), 1) + " cal/cm²");
    }
    EXPECT_EQ(buses, 3); // SWBD-1, MCC-1, LP-1
    // Motors carry no mark.
    EXPECT_TRUE(w.scene()
                    ->itemFor(w.document().drawing().partByTag("P-101")->id)
                    ->arcFlashMark()
                    .isEmpty());
    const PartId mcc = w.document().drawing().partByTag("MCC-1")->id;
    const QString before = w.scene()->itemFor(mcc)->arcFlashMark();
    user.clickPart(mcc);
    user.type("af_working_distance_mm", "914.4", Commit::Enter);
    user.settle();
    EXPECT_NE(w.scene()->itemFor(mcc)->arcFlashMark(), before);
}

TEST(MainWindow, EachBucketCarriesItsArcFlashMark) {
    // Every bucket's frame carries its own mark with the check result's energy, and the marks
    // follow an edit of the bus the buckets hang from.
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(sample("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    auto marksMatch = [&w] {
        int buckets = 0;
        for (const auto& e : *w.document().result().arcFlash) {
            if (!e.bucket)
                continue;
            ++buckets;
            BucketItem* item = w.scene()->bucketItem(*e.bucket);
            EXPECT_NE(item, nullptr) << e.tag;
            if (item)
                EXPECT_EQ(item->arcFlashMark().toStdString(),
                          "AF " + fmt(*e.energyCal(), 1) + " cal/cm²")
                    << e.tag;
        }
        return buckets;
    };
    EXPECT_EQ(marksMatch(), static_cast<int>(w.document().drawing().buckets().size()));
    const BucketId first = w.document().drawing().buckets().front().id;
    const QString before = w.scene()->bucketItem(first)->arcFlashMark();
    user.clickPart(w.document().drawing().partByTag("MCC-1")->id);
    user.type("af_working_distance_mm", "914.4", Commit::Enter);
    user.settle();
    EXPECT_NE(w.scene()->bucketItem(first)->arcFlashMark(), before);
    EXPECT_EQ(marksMatch(), 13);
}
