// Desktop habits, used as a person uses them: File → Export → One-line DXF, dialogs that start
// in the last folder, File → Open Recent with real paths, Help → Keyboard Shortcuts, and the
// window's layout kept from one run to the next.
#include "export/dxf_writer.h"
#include "ui_support.h"
#include "user.h"

#include <QDockWidget>
#include <QFile>
#include <QFileDialog>
#include <QFileInfo>
#include <QSettings>
#include <QStatusBar>
#include <QTableWidget>
#include <QTest>
#include <QTimer>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::ui;
using lineward::ui::test::User;

namespace {

// Each test keeps its settings (recent files, last folder, window layout) in its own folder,
// so tests running side by side never see each other's.
void isolateSettings(const char* name) {
    QSettings::setPath(QSettings::NativeFormat, QSettings::UserScope,
                       test::tempDir((std::string("settings-") + name).c_str()));
}

// Reads the folder the next file dialog starts in, then cancels it with Escape.
void readDialogFolderThenCancel(QString* folder) {
    User::whenModal<QFileDialog>([folder](QFileDialog* dialog) {
        *folder = dialog->directory().absolutePath();
        QTest::keyClick(dialog, Qt::Key_Escape);
    });
}

} // namespace

TEST(Desktop, ExportsTheOneLineAsDxfFromTheFileMenu) {
    isolateSettings("dxf");
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1-review.lineward"), true).isEmpty());
    User user(w);
    const QString dir = test::tempDir("dxf-export");
    user.answerFileDialogWith(dir + "/mill"); // no suffix typed: .dxf is added
    user.chooseMenu({"File", "Export", "One-line DXF…"});
    const QString out = dir + "/mill.dxf";
    ASSERT_TRUE(QFile::exists(out));
    const std::string dxf = test::fileBytes(out);
    EXPECT_EQ(dxf.rfind("0\nSECTION\n2\nHEADER\n", 0), 0u);
    EXPECT_TRUE(dxf.ends_with("0\nEOF\n"));
    for (const auto& p : w.document().drawing().parts())
        EXPECT_NE(dxf.find("\n1\n" + dxf::encodeText(p.tag) + "\n"), std::string::npos) << p.tag;
    EXPECT_NE(dxf.find("LW-BADGES"), std::string::npos);
    EXPECT_TRUE(w.statusBar()->currentMessage().contains(out));
}

TEST(Desktop, DialogsStartInTheLastFolderUsedEvenAfterARestart) {
    isolateSettings("folder");
    const QString dir = test::tempDir("last-folder");
    const QString file = dir + "/copy.lineward";
    ASSERT_TRUE(QFile::copy(test::samplePath("kestrel-mill-mcc1.lineward"), file));
    {
        MainWindow w(test::sharedTables());
        User user(w);
        user.answerFileDialogWith(file);
        user.press(Qt::Key_O, Qt::ControlModifier);
        ASSERT_EQ(w.document().filePath(), file);
        QString folder;
        readDialogFolderThenCancel(&folder);
        user.press(Qt::Key_O, Qt::ControlModifier);
        EXPECT_EQ(folder, QFileInfo(dir).canonicalFilePath());
    }
    MainWindow again(test::sharedTables()); // the next run of the program
    User user(again);
    QString folder;
    readDialogFolderThenCancel(&folder);
    user.chooseMenu({"File", "Export", "One-line SVG…"});
    EXPECT_EQ(folder, QFileInfo(dir).canonicalFilePath());
}

TEST(Desktop, OpenRecentListsRealPathsOfFilesThatExist) {
    isolateSettings("recent");
    const QString dir = test::tempDir("recent");
    const QString real = dir + "/plant.lineward";
    const QString gone = dir + "/gone.lineward";
    ASSERT_TRUE(QFile::copy(test::samplePath("kestrel-mill-mcc1.lineward"), real));
    ASSERT_TRUE(QFile::copy(test::samplePath("kestrel-mill-mcc1.lineward"), gone));
    ASSERT_TRUE(QFile::link(real, dir + "/link.lineward"));
    MainWindow w(test::sharedTables());
    User user(w);
    user.answerFileDialogWith(gone);
    user.press(Qt::Key_O, Qt::ControlModifier);
    // Opened through a symbolic link: the menu names the file itself. (A typed ".." makes the
    // file dialog change folder first, so the test goes through the link alone.)
    user.answerFileDialogWith(dir + "/link.lineward");
    user.press(Qt::Key_O, Qt::ControlModifier);
    ASSERT_FALSE(w.document().filePath().isEmpty());
    ASSERT_TRUE(QFile::remove(gone));
    const QString realPath = QFileInfo(real).canonicalFilePath();
    EXPECT_EQ(user.menuTexts({"File", "Open Recent"}).join(" | ").toStdString(),
              realPath.toStdString());

    user.press(Qt::Key_N, Qt::ControlModifier); // a new drawing, then back through the menu
    EXPECT_TRUE(w.document().filePath().isEmpty());
    user.chooseMenu({"File", "Open Recent", realPath});
    EXPECT_EQ(w.document().filePath(), realPath);
    EXPECT_GT(w.document().drawing().parts().size(), 50u);
}

TEST(Desktop, HelpListsTheKeyboardShortcutsTheMenusHave) {
    isolateSettings("shortcuts");
    MainWindow w(test::sharedTables());
    User user(w);
    QList<QStringList> rows;
    auto readAndClose = [&rows] {
        User::whenModal<QDialog>([&rows](QDialog* dialog) {
            auto* table = dialog->findChild<QTableWidget*>("shortcutsTable");
            if (!table) {
                ADD_FAILURE() << "no shortcuts table shown";
                QTest::keyClick(dialog, Qt::Key_Escape);
                return;
            }
            rows.clear();
            for (int r = 0; r < table->rowCount(); ++r)
                rows.append({table->item(r, 0)->text(), table->item(r, 1)->text(),
                             table->item(r, 2)->text()});
            QTest::keyClick(dialog, Qt::Key_Escape);
        });
    };
    readAndClose();
    user.chooseMenu({"Help", "Keyboard Shortcuts…"});
    auto has = [&rows](const QString& menu, const QString& command, const QString& keys) {
        for (const auto& r : rows)
            if (r[0] == menu && r[1] == command && r[2].contains(keys))
                return true;
        return false;
    };
    EXPECT_TRUE(
        has("File", "Open", QKeySequence(QKeySequence::Open).toString(QKeySequence::NativeText)));
    EXPECT_TRUE(has("File", "Save", "Ctrl+S"));
    EXPECT_TRUE(has("Edit", "Undo", "Ctrl+Z"));
    EXPECT_TRUE(has("Edit", "Redo", "Ctrl+Y"));
    EXPECT_TRUE(has("Edit", "Rotate", "Ctrl+R"));
    EXPECT_TRUE(has("Help", "Keyboard Shortcuts", "Ctrl+/"));
    EXPECT_GE(rows.size(), 15);
    for (const auto& r : rows)
        EXPECT_FALSE(r[2].isEmpty()) << r.join(" | ").toStdString();

    rows.clear(); // the same list from its own keys
    readAndClose();
    user.press(Qt::Key_Slash, Qt::ControlModifier);
    EXPECT_TRUE(has("Edit", "Rotate", "Ctrl+R"));
}

TEST(Desktop, TheWindowLayoutIsKeptForTheNextRun) {
    isolateSettings("layout");
    {
        MainWindow w(test::sharedTables());
        User user(w);
        auto* curves = w.findChild<QDockWidget*>("curvesDock");
        ASSERT_TRUE(curves && !curves->isHidden());
        user.chooseMenu({"View", "Curves"}); // hide the Curves panel
        ASSERT_TRUE(curves->isHidden());
        user.press(Qt::Key_W, Qt::ControlModifier); // File → Close
        EXPECT_FALSE(w.isVisible());
    }
    MainWindow next(test::sharedTables());
    User user(next);
    EXPECT_TRUE(next.findChild<QDockWidget*>("curvesDock")->isHidden());
    EXPECT_FALSE(next.findChild<QDockWidget*>("findingsDock")->isHidden());
}
