// File → Import Load List… in the real window: the file dialog answered, the preview's rows
// (buckets and refusals with line and column), Import as one edit that Ctrl+Z takes back.
#include "import_loads_dialog.h"
#include "main_window.h"
#include "model/ratings.h"
#include "ui_support.h"
#include "user.h"

#include <QComboBox>
#include <QFile>
#include <QPushButton>
#include <QTableWidget>
#include <QTest>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::ui;

namespace {

QString writeList(const char* name, const QByteArray& text) {
    const QString path = test::tempDir("import-loads") + "/" + name;
    QFile f(path);
    EXPECT_TRUE(f.open(QIODevice::WriteOnly));
    f.write(text);
    return path;
}

QStringList tableRows(QTableWidget* t) {
    QStringList rows;
    for (int r = 0; r < t->rowCount(); ++r) {
        QStringList cells;
        for (int c = 0; c < t->columnCount(); ++c)
            cells << (t->item(r, c) ? t->item(r, c)->text() : QString());
        rows << cells.join(" | ");
    }
    return rows;
}

} // namespace

TEST(ImportLoadList, PreviewShowsBucketsAndRefusalsAndImportIsOneUndoableEdit) {
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    const std::string before = test::drawingBytes(w);
    const std::size_t bucketsBefore = w.document().drawing().buckets().size();
    const QString list = writeList("mcc1-additions.csv", "tag,description,hp,volts,fla,protection\n"
                                                         "P-120,Sump pump,15,460,19,breaker\n"
                                                         "F-121,Dust fan,5,460,7,fuse\n"
                                                         "P-122,Bad pump,-5,460,,breaker\n"
                                                         "P-105,Again,5,460,,breaker\n");
    QStringList rows;
    QString bus, importText;
    user.answerFileDialogWith(list);
    test::User::whenModal<ImportLoadsDialog>([&](ImportLoadsDialog* d) {
        rows = tableRows(d->findChild<QTableWidget*>("importPreview"));
        bus = d->findChild<QComboBox*>("targetBus")->currentText();
        auto* import = d->findChild<QPushButton*>("importButton");
        importText = import->text();
        if (const QByteArray dir = qgetenv("LINEWARD_SHOT_DIR"); !dir.isEmpty())
            d->grab().save(QString::fromUtf8(dir) + "/import-load-list.png");
        QTest::mouseClick(import, Qt::LeftButton);
    });
    user.chooseMenu({"File", "Import Load List…"});

    EXPECT_EQ(bus, "MCC-1") << "the MCC is offered first";
    EXPECT_EQ(importText, "Import 2 Buckets");
    ASSERT_EQ(rows.size(), 4) << rows.join("\n").toStdString();
    EXPECT_TRUE(rows[0].startsWith("2 | P-120 | ")) << rows[0].toStdString();
    EXPECT_TRUE(rows[0].contains("CB-P-120")) << rows[0].toStdString();
    EXPECT_TRUE(rows[1].contains("FU-F-121")) << rows[1].toStdString();
    EXPECT_TRUE(rows[2].contains("refused at line 4, column 16") && rows[2].contains("-5 hp"))
        << rows[2].toStdString();
    EXPECT_TRUE(rows[3].contains("refused at line 5") && rows[3].contains("already used"))
        << rows[3].toStdString();

    // Two buckets, wired to MCC-1, and the drawing still checks with no violation.
    const Drawing& d = w.document().drawing();
    EXPECT_EQ(d.buckets().size(), bucketsBefore + 2);
    ASSERT_NE(d.partByTag("C-P-120"), nullptr);
    ASSERT_NE(d.partByTag("P-120"), nullptr);
    EXPECT_EQ(w.document().result().report.openCounts[2], 0);
    EXPECT_NE(test::drawingBytes(w), before);
    if (const QByteArray dir = qgetenv("LINEWARD_SHOT_DIR"); !dir.isEmpty())
        w.grab().save(QString::fromUtf8(dir) + "/import-load-list-sheet.png");

    // One edit: a single Ctrl+Z gives back the same bytes.
    user.press(Qt::Key_Z, Qt::ControlModifier);
    EXPECT_EQ(test::drawingBytes(w), before);
}

TEST(ImportLoadList, AListWithNoUsableHeaderImportsNothing) {
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    const std::string before = test::drawingBytes(w);
    const QString list = writeList("no-volts.csv", "tag,hp\nP-1,10\n");
    QStringList rows;
    bool importEnabled = true;
    user.answerFileDialogWith(list);
    test::User::whenModal<ImportLoadsDialog>([&](ImportLoadsDialog* d) {
        rows = tableRows(d->findChild<QTableWidget*>("importPreview"));
        importEnabled = d->findChild<QPushButton*>("importButton")->isEnabled();
        QTest::keyClick(d, Qt::Key_Escape);
    });
    user.chooseMenu({"File", "Import Load List…"});
    EXPECT_FALSE(importEnabled);
    ASSERT_EQ(rows.size(), 1);
    EXPECT_TRUE(rows[0].contains("the header has no volts column") &&
                rows[0].contains("refused at line 1, column 1"))
        << rows[0].toStdString();
    EXPECT_EQ(test::drawingBytes(w), before);
}
