// File → Arc-Flash Labels… in the real window: the stock chosen in its dialog by keys, the PDF
// named in the file dialog, and the labels read back from the PDF (poppler's pdfinfo and
// pdftotext): one per bus and bucket, four to a letter sheet, the service block once.
#include "check/check.h"
#include "curves/arc_flash_study.h"
#include "io/drawing_file.h"
#include "label_sheet.h"
#include "main_window.h"
#include "model/ratings.h"
#include "ui_support.h"
#include "user.h"

#include <QComboBox>
#include <QFile>
#include <QInputDialog>
#include <QProcess>
#include <QRegularExpression>
#include <QStatusBar>
#include <QTest>
#include <algorithm>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::ui;

namespace {

QString run(const QString& program, const QStringList& args) {
    QProcess p;
    p.start(program, args);
    p.waitForFinished(60000);
    return QString::fromUtf8(p.readAllStandardOutput());
}

} // namespace

TEST(LabelsWindow, FileMenuWritesOneLabelPerBusAndBucketOnTheChosenStock) {
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    const QString pdf = test::tempDir("labels-window") + "/mill-labels.pdf";
    QFile::remove(pdf);
    QString offered;
    // The stock dialog comes first: the third stock (four 4 x 5 in labels per letter sheet),
    // picked as a person does, with the arrow keys and Return.
    test::User::whenModal<QInputDialog>([&offered](QInputDialog* dialog) {
        auto* combo = dialog->findChild<QComboBox*>();
        if (!combo) {
            ADD_FAILURE() << "the stock dialog has no list";
            dialog->reject();
            return;
        }
        for (int i = 0; i < combo->count(); ++i)
            offered += combo->itemText(i) + "\n";
        QTest::keyClick(combo, Qt::Key_Down);
        QTest::keyClick(combo, Qt::Key_Down);
        QTest::keyClick(combo, Qt::Key_Return);
    });
    user.answerFileDialogWith(pdf);
    user.chooseMenu({"File", "Arc-Flash Labels…"});
    EXPECT_TRUE(offered.contains("Letter sheets of four 4 × 5 in labels")) << offered.toStdString();
    ASSERT_TRUE(QFile::exists(pdf)) << w.statusBar()->currentMessage().toStdString();

    const auto& af = w.document().result().arcFlash;
    ASSERT_TRUE(af);
    const int labels = static_cast<int>(af->size());
    ASSERT_GE(labels, 16); // 3 buses and 13 buckets in the sample
    const QString info = run("pdfinfo", {pdf});
    EXPECT_TRUE(info.contains(QRegularExpression(QString("Pages:\\s+%1\\n").arg((labels + 3) / 4))))
        << info.toStdString();
    EXPECT_TRUE(info.contains("612 x 792 pts")) << info.toStdString(); // letter
    // Runs of white space as one space (pdftotext breaks lines as the label wraps them).
    const QString text = run("pdftotext", {pdf, "-"}).simplified();
    EXPECT_EQ(text.count("ARC-FLASH HAZARD"), labels);
    EXPECT_EQ(text.count("NEC 110.16(B)"), 1); // SWBD-1 is the only service equipment
    EXPECT_EQ(text.count("NFPA 70E Table 130.4(E)(a)"), labels);
    EXPECT_TRUE(text.contains("does not replace"));
    for (const auto& e : *af)
        EXPECT_TRUE(text.contains(QString::fromStdString(e.tag))) << e.tag;
    EXPECT_TRUE(w.statusBar()->currentMessage().contains(QString("%1 labels").arg(labels)));
}

TEST(LabelSheet, TheLongestLabelsFitTheSmallestStock) {
    // The fullest label there is — above 40 cal/cm² (its extra line) on service equipment (the
    // NEC 110.16(B) block) — and one outside the model (its reason instead of the energy) must
    // fit a 4 x 5 in label; a label that does not fit is refused, never clipped.
    auto loaded = io::loadDrawing(test::samplePath("kestrel-mill-mcc1.lineward").toStdString());
    ASSERT_TRUE(loaded);
    Drawing d = *loaded.drawing;
    ASSERT_FALSE(d.part(d.partByTag("CB-MAIN")->id)->set("st_pickup_x", 10.0));
    d.settings.arcFlashMaxTimeS = 5; // the arc on the long-time band lasts up to 5 s
    ASSERT_FALSE(d.part(d.partByTag("MCC-1")->id)->set(BusRatings::kAfGapMm, 150.0));
    const auto result = runCheck(d, *test::sharedTables());
    const auto labels = arcFlashLabels(*result, "2026-12-03");
    const auto swbd = std::find_if(labels.begin(), labels.end(),
                                   [](const ArcFlashLabel& l) { return l.tag == "SWBD-1"; });
    ASSERT_NE(swbd, labels.end());
    ASSERT_TRUE(swbd->aboveLimit && swbd->service) << swbd->energyCal;
    const QString pdf = test::tempDir("labels-fit") + "/edge.pdf";
    const auto r = writeLabelsPdf(pdf, *result, LabelStock::Letter4x4x5, "2026-12-03");
    EXPECT_TRUE(r.error.isEmpty()) << r.error.toStdString();
    EXPECT_EQ(r.pages, (static_cast<int>(labels.size()) + 3) / 4);
    const QString text = run("pdftotext", {pdf, "-"}).simplified();
    EXPECT_TRUE(text.contains("work on it de-energized only"));
    EXPECT_TRUE(text.contains("Incident energy not computed"));
}
