// The Schedules panel as a person uses it: rows marked by their open findings, and a rating
// edited in a cell (double-click, type, Return) through the Inspector's checks and undo.
#include "main_window.h"
#include "severity_style.h"
#include "ui_support.h"
#include "user.h"

#include <QApplication>
#include <QDir>
#include <QFile>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QTableView>
#include <QTest>
#include <gtest/gtest.h>

namespace lineward::ui {
namespace {

using test::sharedTables;

QString sample(const char* name) {
    return test::samplePath(name);
}

// The devices table, brought up as a person does: the Schedules tab, then its Devices tab.
QTableView* devicesTable(MainWindow& w, test::User& user) {
    user.showPanel("Schedules");
    user.showPanel("Devices");
    auto* view = w.findChild<QTableView*>("schedule_devices");
    EXPECT_NE(view, nullptr);
    EXPECT_TRUE(view && view->isVisible());
    return view;
}

int columnOf(const QTableView* view, const QString& header) {
    const auto* m = view->model();
    for (int c = 0; c < m->columnCount(); ++c)
        if (m->headerData(c, Qt::Horizontal).toString() == header)
            return c;
    ADD_FAILURE() << "no column " << header.toStdString();
    return -1;
}

int rowOf(const QTableView* view, const QString& tag) {
    const auto* m = view->model();
    for (int r = 0; r < m->rowCount(); ++r)
        if (m->index(r, 0).data().toString() == tag)
            return r;
    ADD_FAILURE() << "no row " << tag.toStdString();
    return -1;
}

QString cell(const QTableView* view, const QString& tag, const QString& header) {
    return view->model()->index(rowOf(view, tag), columnOf(view, header)).data().toString();
}

// Double-clicks the cell, selects what its editor holds, types and presses Return, as a person.
// Returns false when no editor opened (a read-only cell).
bool typeIntoCell(test::User& user, QTableView* view, const QString& tag, const QString& header,
                  const QString& text) {
    const QModelIndex at = view->model()->index(rowOf(view, tag), columnOf(view, header));
    // A menu opened before may have taken activation; a person's click activates the window.
    QApplication::setActiveWindow(view->window());
    view->scrollTo(at);
    const QPoint p = view->visualRect(at).center();
    QTest::mouseClick(view->viewport(), Qt::LeftButton, {}, p);
    QTest::mouseDClick(view->viewport(), Qt::LeftButton, {}, p);
    QLineEdit* editor = nullptr;
    for (auto* e : view->findChildren<QLineEdit*>())
        if (e->isVisible())
            editor = e;
    if (!editor)
        return false;
    EXPECT_EQ(QApplication::focusWidget(), editor); // the person types into it
    QTest::keyClick(editor, Qt::Key_A, Qt::ControlModifier);
    QTest::keyClicks(editor, text);
    QTest::keyClick(editor, Qt::Key_Return);
    user.settle();
    return true;
}

QString schedulesMessage(MainWindow& w) {
    auto* l = w.findChild<QLabel*>("schedulesMessage");
    return l ? l->text() : QString("(no message line)");
}

QString undoText(test::User& user) {
    for (const QString& t : user.menuTexts({"Edit"}))
        if (t.startsWith("&Undo") || t.startsWith("Undo"))
            return QString(t).remove('&');
    return {};
}

TEST(Schedules, DeviceScheduleListsDisconnectsContactorsAndOverloadsWithTheirRatings) {
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(sample("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    QTableView* view = devicesTable(w, user);
    ASSERT_NE(view, nullptr);
    // The values of the sample file (samples/kestrel-mill-mcc1.lineward), each in its column.
    EXPECT_EQ(cell(view, "DS-103", "Kind"), "Disconnect switch");
    EXPECT_EQ(cell(view, "DS-103", "Rating A"), "30");
    EXPECT_EQ(cell(view, "DS-103", "Type"), "fused, 10 hp");
    EXPECT_EQ(cell(view, "K-101", "Type"), "NEMA 2");
    EXPECT_EQ(cell(view, "OL-101", "Setting A"), "32");
    EXPECT_EQ(cell(view, "OL-101", "Rating A"), "24–41.6");
    EXPECT_EQ(cell(view, "OL-101", "Type"), "class 10");
    EXPECT_EQ(cell(view, "MCP-102", "Setting A"), "375");
    EXPECT_EQ(cell(view, "CB-101", "Rating A"), "90");
    // A contactor has no interrupting rating: no duty to show.
    EXPECT_EQ(cell(view, "K-101", "Interrupting kA"), "");
    EXPECT_EQ(cell(view, "K-101", "Duty %"), "");
}

TEST(Schedules, ACellEditGoesThroughTheInspectorsChecksAndUndo) {
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(sample("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    user.clickPart(w.document().drawing().partByTag("OL-101")->id);
    ASSERT_EQ(user.field("setting_a")->text(), "32");
    QTableView* view = devicesTable(w, user);
    ASSERT_NE(view, nullptr);
    const std::string original = test::drawingBytes(w);

    ASSERT_TRUE(typeIntoCell(user, view, "OL-101", "Setting A", "34"));
    EXPECT_EQ(cell(view, "OL-101", "Setting A"), "34");
    EXPECT_EQ(user.field("setting_a")->text(), "34"); // the Inspector shows the same part's edit
    EXPECT_EQ(undoText(user), "Undo Set Setting (A) of OL-101");
    EXPECT_EQ(schedulesMessage(w), "");
    const std::string edited = test::drawingBytes(w);
    EXPECT_NE(edited, original);

    // A refused value: the Inspector's reason, and nothing changes.
    ASSERT_TRUE(typeIntoCell(user, view, "OL-101", "Setting A", "-5"));
    const QString refused = schedulesMessage(w);
    EXPECT_TRUE(refused.startsWith("Refused: ")) << refused.toStdString();
    if (const QByteArray dir = qgetenv("LINEWARD_SHOT_DIR"); !dir.isEmpty())
        w.grab().save(QString::fromUtf8(dir) + "/schedules-refused.png");
    EXPECT_EQ(test::drawingBytes(w), edited);
    EXPECT_EQ(cell(view, "OL-101", "Setting A"), "34");
    EXPECT_EQ(undoText(user), "Undo Set Setting (A) of OL-101");
    user.type("setting_a", "-5", test::Commit::Enter);
    EXPECT_EQ(user.inspectorMessage(), refused); // word for word the Inspector's refusal
    EXPECT_EQ(test::drawingBytes(w), edited);

    // A computed value is not a rating: no editor opens.
    EXPECT_FALSE(typeIntoCell(user, view, "OL-101", "Line-side fault kA", "1"));
    EXPECT_EQ(test::drawingBytes(w), edited);

    // Ctrl+Z takes the cell's edit back, in the table, the Inspector and the file.
    user.clickPart(w.document().drawing().partByTag("OL-101")->id);
    user.press(Qt::Key_Z, Qt::ControlModifier);
    EXPECT_EQ(test::drawingBytes(w), original);
    EXPECT_EQ(user.field("setting_a")->text(), "32");
    user.showPanel("Schedules");
    EXPECT_EQ(cell(view, "OL-101", "Setting A"), "32");
}

TEST(Schedules, AMotorRowEditsTheRatingOfItsBranchPartThatTheCellShows) {
    // The motor schedule's Overload A cell is the overload relay's setting, not the motor's.
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(sample("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    user.showPanel("Schedules");
    user.showPanel("Motors");
    auto* view = w.findChild<QTableView*>("schedule_motors");
    ASSERT_NE(view, nullptr);
    ASSERT_TRUE(typeIntoCell(user, view, "P-101", "Overload A", "33.5"));
    const Part* ol = w.document().drawing().partByTag("OL-101");
    ASSERT_NE(ol, nullptr);
    EXPECT_EQ(std::get<double>(ol->value("setting_a")), 33.5);
    EXPECT_EQ(cell(view, "P-101", "Overload A"), "33.5");
    EXPECT_EQ(undoText(user), "Undo Set Setting (A) of OL-101");
}

// The review sample with the OL-101 setting finding accepted, written where the test can open it.
QString reviewSampleWithAcceptance() {
    QFile in(sample("kestrel-mill-mcc1-review.lineward"));
    EXPECT_TRUE(in.open(QIODevice::ReadOnly));
    QString text = QString::fromUtf8(in.readAll());
    const QString marker = "\"accepted\": [\n";
    const int at = text.indexOf(marker);
    EXPECT_GE(at, 0);
    text.insert(at + marker.size(),
                "    {\"rule\":\"branch.overload.setting\",\"parts\":[13,15],\"by\":\"R. Vance\","
                "\"date\":\"2026-12-03\",\"note\":\"relay to be replaced at the outage\"},\n");
    const QString path = test::tempDir("schedules_accepted") + "/accepted.lineward";
    QFile out(path);
    EXPECT_TRUE(out.open(QIODevice::WriteOnly));
    out.write(text.toUtf8());
    return path;
}

TEST(Schedules, ARowWithAnOpenFindingShowsItsSeverityAndAnAcceptedOneDoesNot) {
    // The review sample's OL-101 is set at 45 A for a 32 A motor (samples/README.md): an open
    // violation of branch.overload.setting, the only finding about OL-101.
    MainWindow w(sharedTables());
    ASSERT_TRUE(w.openFile(sample("kestrel-mill-mcc1-review.lineward"), true).isEmpty());
    test::User user(w);
    QTableView* view = devicesTable(w, user);
    ASSERT_NE(view, nullptr);
    const QModelIndex findings =
        view->model()->index(rowOf(view, "OL-101"), columnOf(view, "Findings"));
    EXPECT_EQ(findings.data().toString(), "1 violation");
    EXPECT_EQ(findings.data(Qt::ToolTipRole).toString(),
              "Worst open finding: violation (1 of 1 open)");
    EXPECT_FALSE(findings.data(Qt::DecorationRole).isNull()); // the violation badge
    // The whole row carries the violation colour; what the screen shows there is tinted.
    const QColor violation = severityColor(Severity::Violation);
    const QModelIndex tag = view->model()->index(findings.row(), 0);
    EXPECT_EQ(tag.data(Qt::BackgroundRole).value<QColor>().rgb(), violation.rgb());
    view->clearSelection();
    view->setCurrentIndex({});
    const QImage shot = view->viewport()->grab().toImage();
    const QRect r = view->visualRect(tag);
    const QColor seen = shot.pixelColor(r.left() + 2, r.center().y());
    EXPECT_GT(seen.red() - seen.blue(), 20) << seen.name().toStdString();
    if (const QByteArray dir = qgetenv("LINEWARD_SHOT_DIR"); !dir.isEmpty())
        w.grab().save(QString::fromUtf8(dir) + "/schedules-marked.png");

    // The same file with that finding accepted: the row is no longer marked, and says so.
    MainWindow accepted(sharedTables());
    ASSERT_TRUE(accepted.openFile(reviewSampleWithAcceptance(), true).isEmpty());
    test::User reviewer(accepted);
    QTableView* view2 = devicesTable(accepted, reviewer);
    ASSERT_NE(view2, nullptr);
    const int row = rowOf(view2, "OL-101");
    const QModelIndex f2 = view2->model()->index(row, columnOf(view2, "Findings"));
    EXPECT_EQ(f2.data().toString(), "1 accepted");
    EXPECT_TRUE(f2.data(Qt::DecorationRole).isNull());
    EXPECT_TRUE(view2->model()->index(row, 0).data(Qt::BackgroundRole).isNull());
}

} // namespace
} // namespace lineward::ui
