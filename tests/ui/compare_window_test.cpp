// Compare mode in the real window: File → Compare With… answered in the file dialog, the Changes
// panel's rows, a click that finds the part, the Sheet's marks, and Esc leaving compare mode.
#include "changes_panel.h"
#include "compare/drawing_compare.h"
#include "compare_mark.h"
#include "io/drawing_file.h"
#include "main_window.h"
#include "part_item.h"
#include "sheet_scene.h"
#include "sheet_view.h"
#include "ui_support.h"
#include "user.h"

#include <QDockWidget>
#include <QFile>
#include <QProcess>
#include <QTest>
#include <QTreeWidget>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::ui;

namespace {

QTreeWidgetItem* groupStarting(QTreeWidget* list, const QString& title) {
    for (int i = 0; i < list->topLevelItemCount(); ++i)
        if (list->topLevelItem(i)->text(0).startsWith(title + " ("))
            return list->topLevelItem(i);
    return nullptr;
}

QTreeWidgetItem* childNamed(QTreeWidgetItem* group, const QString& what) {
    for (int i = 0; group && i < group->childCount(); ++i)
        if (group->child(i)->text(0) == what)
            return group->child(i);
    return nullptr;
}

int marksOf(SheetScene* scene, CompareMark::Kind kind) {
    int n = 0;
    for (auto* item : scene->items())
        if (auto* m = qgraphicsitem_cast<CompareMark*>(item); m && m->kind() == kind)
            ++n;
    return n;
}

} // namespace

TEST(CompareWindow, ChangesPanelListsTheRevisionAndAClickFindsThePart) {
    MainWindow w(test::sharedTables());
    const QString issued = test::samplePath("kestrel-mill-mcc1.lineward");
    const QString review = test::samplePath("kestrel-mill-mcc1-review.lineward");
    ASSERT_TRUE(w.openFile(issued, true).isEmpty());
    test::User user(w);
    user.answerFileDialogWith(review);
    user.chooseMenu({"File", "Compare With…"});
    ASSERT_TRUE(w.comparing());
    auto* dock = w.findChild<QDockWidget*>("changesDock");
    ASSERT_NE(dock, nullptr);
    EXPECT_TRUE(dock->isVisible());

    // What the panel should list, from the core comparison of the same two files.
    auto older = io::loadDrawing(review.toStdString());
    ASSERT_TRUE(older);
    const auto expected =
        compareDrawings(*older.drawing, w.document().drawing(), *test::sharedTables());
    QTreeWidget* list = w.changes()->list();
    QTreeWidgetItem* changed = groupStarting(list, "Parts changed");
    ASSERT_NE(changed, nullptr);
    EXPECT_EQ(changed->childCount(), static_cast<int>(expected.partsChanged.size()));
    QTreeWidgetItem* ol101 = childNamed(changed, "OL-101");
    ASSERT_NE(ol101, nullptr);
    EXPECT_TRUE(ol101->text(1).contains("setting_a 45 → 32")) << ol101->text(1).toStdString();
    QTreeWidgetItem* removed = groupStarting(list, "Parts removed");
    ASSERT_NE(removed, nullptr);
    EXPECT_NE(childNamed(removed, "CB-TIE"), nullptr);
    QTreeWidgetItem* resolved = groupStarting(list, "Findings resolved");
    ASSERT_NE(resolved, nullptr);
    EXPECT_EQ(resolved->childCount(), static_cast<int>(expected.findingsResolved.size()));
    EXPECT_EQ(groupStarting(list, "Findings introduced"), nullptr); // the issued sample is clean

    // The Sheet: a mark on each changed and added part, a ghost for each removed one.
    EXPECT_EQ(marksOf(w.scene(), CompareMark::Kind::Changed),
              static_cast<int>(expected.partsChanged.size()));
    EXPECT_EQ(marksOf(w.scene(), CompareMark::Kind::Added),
              static_cast<int>(expected.partsAdded.size()));
    EXPECT_EQ(marksOf(w.scene(), CompareMark::Kind::Removed),
              static_cast<int>(expected.partsRemoved.size()));

    // A click on the row selects OL-101 on the Sheet and brings it into view.
    list->scrollToItem(ol101);
    QTest::mouseClick(list->viewport(), Qt::LeftButton, {}, list->visualItemRect(ol101).center());
    user.settle();
    const Part* part = w.document().drawing().partByTag("OL-101");
    ASSERT_NE(part, nullptr);
    EXPECT_EQ(w.scene()->selectedParts(), std::vector<PartId>{part->id});
    const QRect shown = w.view()->viewport()->rect();
    EXPECT_TRUE(shown.contains(w.view()->mapFromScene(w.scene()->itemFor(part->id)->pos())));

    // Pictures to look at (not compared): the window, then the marks up close.
    if (const QByteArray dir = qgetenv("LINEWARD_SHOT_DIR"); !dir.isEmpty()) {
        w.grab().save(QString::fromUtf8(dir) + "/compare-mode.png");
        const QTransform before = w.view()->transform();
        for (int i = 0; i < 4; ++i)
            user.chooseMenu({"View", "Zoom In"});
        w.grab().save(QString::fromUtf8(dir) + "/compare-mode-zoomed.png");
        EXPECT_NE(w.view()->transform(), before);
        user.chooseMenu({"View", "Fit Sheet"});
    }

    // Esc in the panel leaves compare mode: no marks, no panel, the Sheet as before.
    QTest::keyClick(list, Qt::Key_Escape);
    user.settle();
    EXPECT_FALSE(w.comparing());
    EXPECT_FALSE(dock->isVisible());
    EXPECT_EQ(marksOf(w.scene(), CompareMark::Kind::Changed), 0);
    EXPECT_EQ(marksOf(w.scene(), CompareMark::Kind::Removed), 0);
    EXPECT_EQ(list->topLevelItemCount(), 0);
}

TEST(CompareWindow, UnreadableFileIsRefusedWithItsPlace) {
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    const QString broken = test::tempDir("compare-broken") + "/broken.lineward";
    QFile f(broken);
    ASSERT_TRUE(f.open(QIODevice::WriteOnly));
    f.write("{\n  \"format\": \"lineward\",\n  \"version\": 1,\n  \"parts\": [ {\"id\": 1,\n");
    f.close();
    test::User user(w);
    QString why;
    user.answerFileDialogWith(broken);
    test::User::answerMessageBox(QMessageBox::Ok, &why);
    user.chooseMenu({"File", "Compare With…"});
    EXPECT_TRUE(why.contains("broken.lineward:5:1:")) << why.toStdString();
    EXPECT_FALSE(w.comparing());
}

TEST(CompareWindow, EditWhileComparingUpdatesTheChangesAndLeaveCompareRestores) {
    MainWindow w(test::sharedTables());
    const QString issued = test::samplePath("kestrel-mill-mcc1.lineward");
    ASSERT_TRUE(w.openFile(issued, true).isEmpty());
    test::User user(w);
    user.answerFileDialogWith(issued);
    user.chooseMenu({"File", "Compare With…"});
    ASSERT_TRUE(w.comparing());
    QTreeWidget* list = w.changes()->list();
    EXPECT_EQ(list->topLevelItemCount(), 0); // the same drawing: nothing listed
    // An edit by the user: OL-101's setting typed in the Inspector.
    const Part* part = w.document().drawing().partByTag("OL-101");
    ASSERT_NE(part, nullptr);
    user.clickPart(part->id);
    user.type("setting_a", "35", test::Commit::Enter);
    QTreeWidgetItem* changed = groupStarting(list, "Parts changed");
    ASSERT_NE(changed, nullptr);
    QTreeWidgetItem* row = childNamed(changed, "OL-101");
    ASSERT_NE(row, nullptr);
    EXPECT_TRUE(row->text(1).contains("setting_a 32 → 35")) << row->text(1).toStdString();
    EXPECT_EQ(marksOf(w.scene(), CompareMark::Kind::Changed), 1);
    user.chooseMenu({"File", "Leave Compare"});
    EXPECT_FALSE(w.comparing());
    EXPECT_EQ(marksOf(w.scene(), CompareMark::Kind::Changed), 0);
}

TEST(CompareWindow, OpeningAnotherDrawingLeavesCompareMode) {
    MainWindow w(test::sharedTables());
    const QString issued = test::samplePath("kestrel-mill-mcc1.lineward");
    const QString review = test::samplePath("kestrel-mill-mcc1-review.lineward");
    ASSERT_TRUE(w.openFile(issued, true).isEmpty());
    test::User user(w);
    user.answerFileDialogWith(review);
    user.chooseMenu({"File", "Compare With…"});
    ASSERT_TRUE(w.comparing());
    ASSERT_GT(marksOf(w.scene(), CompareMark::Kind::Removed), 0);
    // File → Open: the Sheet is rebuilt for the other drawing, and its marks go with the old one.
    user.answerFileDialogWith(review);
    user.chooseMenu({"File", "Open…"});
    EXPECT_EQ(w.document().drawing().parts().size(),
              io::loadDrawing(review.toStdString()).drawing->parts().size());
    EXPECT_FALSE(w.comparing());
    EXPECT_EQ(marksOf(w.scene(), CompareMark::Kind::Removed), 0);
    EXPECT_EQ(marksOf(w.scene(), CompareMark::Kind::Changed), 0);
    EXPECT_EQ(w.changes()->list()->topLevelItemCount(), 0);
}

// The Submittal exported while comparing flags each part added or changed since the compared
// revision, and its revision table says how many and since which file.
TEST(CompareWindow, SubmittalExportedWhileComparingFlagsTheRevisedParts) {
    MainWindow w(test::sharedTables());
    const QString issued = test::samplePath("kestrel-mill-mcc1.lineward");
    const QString review = test::samplePath("kestrel-mill-mcc1-review.lineward");
    ASSERT_TRUE(w.openFile(issued, true).isEmpty());
    test::User user(w);
    user.answerFileDialogWith(review);
    user.chooseMenu({"File", "Compare With…"});
    ASSERT_TRUE(w.comparing());
    auto older = io::loadDrawing(review.toStdString());
    ASSERT_TRUE(older);
    const auto c = compareDrawings(*older.drawing, w.document().drawing(), *test::sharedTables());
    const std::size_t revised = c.partsAdded.size() + c.partsChanged.size();
    ASSERT_GT(revised, 0u);
    const QString pdf = test::tempDir("compare-submittal") + "/revised.pdf";
    user.answerFileDialogWith(pdf);
    user.chooseMenu({"File", "Export", "Submittal PDF…"});
    ASSERT_TRUE(QFile::exists(pdf));
    QProcess p;
    p.start("pdftotext", {"-f", "1", "-l", "1", pdf, "-"});
    p.waitForFinished(60000);
    const QString page1 = QString::fromUtf8(p.readAllStandardOutput()).simplified();
    // Revision B is the newest row of the issued sample's revision table.
    EXPECT_TRUE(page1.contains(QString("FLAG B: %1 PARTS").arg(revised))) << page1.toStdString();
}
