// The Submittal's revision flags without compare mode: each export keeps the drawing as issued
// and records it in the newest revision row; the next revision's Submittal flags since it.
#include "compare/drawing_compare.h"
#include "io/drawing_file.h"
#include "main_window.h"
#include "ui_support.h"
#include "user.h"

#include <QDir>
#include <QFile>
#include <QProcess>
#include <QStatusBar>
#include <gtest/gtest.h>

namespace lineward::ui {
namespace {

QString readText(const QString& path) {
    QFile f(path);
    EXPECT_TRUE(f.open(QIODevice::ReadOnly)) << path.toStdString();
    return QString::fromUtf8(f.readAll());
}

void writeText(const QString& path, const QString& text) {
    QFile f(path);
    ASSERT_TRUE(f.open(QIODevice::WriteOnly)) << path.toStdString();
    f.write(text.toUtf8());
}

QString firstPage(const QString& pdf) {
    QProcess p;
    p.start("pdftotext", {"-f", "1", "-l", "1", pdf, "-"});
    p.waitForFinished(60000);
    return QString::fromUtf8(p.readAllStandardOutput()).simplified();
}

QString undoText(test::User& user) {
    for (QString t : user.menuTexts({"Edit"}))
        if (t.remove('&').startsWith("Undo"))
            return t;
    return {};
}

TEST(RevisionFlags, TheNextSubmittalFlagsSinceTheIssuedDrawingItsRevisionRowRecorded) {
    // plant.lineward is the issued sample (revisions A and B); its row A records the drawing as
    // issued at A, kept in issued/ — here the colleague's earlier layout, the review sample.
    const QString dir = test::tempDir("revision-flags");
    ASSERT_TRUE(QDir(dir).mkpath("issued"));
    writeText(dir + "/issued/plant-A.lineward",
              readText(test::samplePath("kestrel-mill-mcc1-review.lineward")));
    QString plant = readText(test::samplePath("kestrel-mill-mcc1.lineward"));
    const QString rowA = "\"note\":\"issued for review\"}";
    ASSERT_TRUE(plant.contains(rowA));
    plant.replace(plant.indexOf(rowA), rowA.size(),
                  "\"note\":\"issued for review\",\"file\":\"issued/plant-A.lineward\"}");
    writeText(dir + "/plant.lineward", plant);

    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(dir + "/plant.lineward", true).isEmpty());
    ASSERT_FALSE(w.comparing()); // no file picked: the recorded revision is the default
    test::User user(w);
    auto older = io::loadDrawing((dir + "/issued/plant-A.lineward").toStdString());
    ASSERT_TRUE(older);
    const auto c = compareDrawings(*older.drawing, w.document().drawing(), *test::sharedTables());
    const std::size_t revised = c.partsAdded.size() + c.partsChanged.size();
    ASSERT_GT(revised, 0u);

    const QString pdf = dir + "/plant-B.pdf";
    user.answerFileDialogWith(pdf);
    user.chooseMenu({"File", "Export", "Submittal PDF…"});
    ASSERT_TRUE(QFile::exists(pdf));
    const QString status = w.statusBar()->currentMessage();
    EXPECT_TRUE(status.contains(
        QString("%1 parts flagged, flags since revision A (plant-A.lineward)").arg(revised)))
        << status.toStdString();
    const QString page1 = firstPage(pdf);
    EXPECT_TRUE(page1.contains(QString("FLAG B: %1 PARTS").arg(revised))) << page1.toStdString();

    // The drawing as issued at B is kept beside the PDF and recorded in row B, as one edit.
    const QString kept = dir + "/plant-B-rev-B.lineward";
    ASSERT_TRUE(QFile::exists(kept));
    const auto& revs = w.document().drawing().sheet.revisions;
    ASSERT_EQ(revs.size(), 2u);
    EXPECT_EQ(revs[1].file, "plant-B-rev-B.lineward");
    EXPECT_EQ(revs[0].file, "issued/plant-A.lineward");
    EXPECT_EQ(undoText(user), "Undo Record the issued drawing of revision B");
    auto keptDrawing = io::loadDrawing(kept.toStdString());
    ASSERT_TRUE(keptDrawing);
    EXPECT_EQ(keptDrawing.drawing->parts(), w.document().drawing().parts());

    // Re-issuing B still flags since A (row B is the revision being issued, not the previous).
    const QString again = dir + "/plant-B2.pdf";
    user.answerFileDialogWith(again);
    user.chooseMenu({"File", "Export", "Submittal PDF…"});
    EXPECT_TRUE(firstPage(again).contains(QString("FLAG B: %1 PARTS").arg(revised)));

    // Ctrl+Z takes the record back; the file on disk is unchanged until saved.
    user.press(Qt::Key_Z, Qt::ControlModifier);
    user.press(Qt::Key_Z, Qt::ControlModifier);
    EXPECT_EQ(w.document().drawing().sheet.revisions[1].file, "");
    EXPECT_EQ(readText(dir + "/plant.lineward"), plant);
}

TEST(RevisionFlags, ARecordedFileThatIsGoneFlagsNothingAndSaysWhy) {
    const QString dir = test::tempDir("revision-flags-gone");
    QString plant = readText(test::samplePath("kestrel-mill-mcc1.lineward"));
    const QString rowA = "\"note\":\"issued for review\"}";
    plant.replace(plant.indexOf(rowA), rowA.size(),
                  "\"note\":\"issued for review\",\"file\":\"issued/missing.lineward\"}");
    writeText(dir + "/plant.lineward", plant);
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(dir + "/plant.lineward", true).isEmpty());
    test::User user(w);
    const QString pdf = dir + "/plant.pdf";
    user.answerFileDialogWith(pdf);
    user.chooseMenu({"File", "Export", "Submittal PDF…"});
    ASSERT_TRUE(QFile::exists(pdf)); // the Submittal is still written
    const QString status = w.statusBar()->currentMessage();
    EXPECT_TRUE(status.contains("no flags: revision A's issued drawing cannot be read"))
        << status.toStdString();
    EXPECT_TRUE(status.contains("missing.lineward")) << status.toStdString();
    EXPECT_FALSE(firstPage(pdf).contains("FLAG B:"));
}

} // namespace
} // namespace lineward::ui
