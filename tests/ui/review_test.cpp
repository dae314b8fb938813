// A reviewer in the real window: accepts a finding with a note (an empty note refused with the
// reason; the name asked once), withdraws and re-accepts it, pins a comment to a part by
// right-clicking it on the Sheet, resolves it, saves, reopens, and finds both in the Findings
// and Review panels, on the Sheet, in the command line's check output and in the Submittal PDF.
#include "comment_mark.h"
#include "findings_panel.h"
#include "io/drawing_file.h"
#include "main_window.h"
#include "part_item.h"
#include "report/report_format.h"
#include "review_dialogs.h"
#include "review_panel.h"
#include "sheet_scene.h"
#include "ui_support.h"
#include "user.h"

#include <QDate>
#include <QLabel>
#include <QLineEdit>
#include <QPlainTextEdit>
#include <QProcess>
#include <QPushButton>
#include <QSettings>
#include <QTest>
#include <QTreeWidget>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::ui;
using lineward::ui::test::User;

namespace {

// Answers the next dialog whose object name is `name` with `act`.
void whenDialog(const char* name, std::function<void(QWidget*)> act) {
    User::whenModalWidget([name](QWidget* w) { return w->objectName() == name; }, std::move(act),
                          name);
}

// Types the name into the reviewer-name dialog and presses Enter.
void answerName(const QString& name) {
    whenDialog("reviewerNameDialog", [name](QWidget* d) {
        auto* edit = d->findChild<QLineEdit*>("reviewerName");
        ASSERT_NE(edit, nullptr);
        QTest::keyClicks(edit, name);
        QTest::keyClick(edit, Qt::Key_Return);
    });
}

// In the note dialog: clicks OK with no note first (the dialog must stay, saying why), then
// types the note and clicks OK. `refusal` receives the message shown after the empty OK.
void answerNote(const QString& note, QString* refusal) {
    whenDialog("reviewNoteDialog", [note, refusal](QWidget* d) {
        auto* edit = d->findChild<QPlainTextEdit*>("reviewNote");
        auto* ok = d->findChild<QPushButton*>("reviewOk");
        ASSERT_TRUE(edit && ok);
        if (refusal) {
            QTest::mouseClick(ok, Qt::LeftButton);
            EXPECT_TRUE(d->isVisible()) << "an empty note was taken";
            *refusal = d->findChild<QLabel*>("reviewMessage")->text();
        }
        QTest::mouseClick(edit, Qt::LeftButton);
        QTest::keyClicks(edit, note);
        QTest::mouseClick(ok, Qt::LeftButton);
    });
}

QTreeWidgetItem* findingRow(MainWindow& w, const QString& rule) {
    QTreeWidget* list = w.findings()->list();
    for (int i = 0; i < list->topLevelItemCount(); ++i)
        if (list->topLevelItem(i)->text(1) == rule)
            return list->topLevelItem(i);
    return nullptr;
}

QString pdfText(const QString& pdf) {
    QProcess p;
    p.start("pdftotext", {"-layout", pdf, "-"});
    p.waitForFinished(60000);
    return QString::fromUtf8(p.readAllStandardOutput()).simplified();
}

const char* kRule = "branch.disconnect.hp";
const QString kNote = "Spare 15 hp switch on order; 10 hp switch kept for commissioning only";
const QString kComment = "Confirm the feed pump nameplate FLA on site";

} // namespace

TEST(Review, AReviewerAcceptsAndCommentsAndTheSubmittalShowsBoth) {
    // The reviewer's name lives in the program's settings: an isolated folder, empty at first.
    QSettings::setPath(QSettings::NativeFormat, QSettings::UserScope,
                       test::tempDir("settings-review"));
    QSettings().remove(kReviewerNameKey);
    const QString dir = test::tempDir("review");
    const QString saved = dir + "/reviewed.lineward";
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1-review.lineward"), true).isEmpty());
    User user(w);
    const Drawing& d = w.document().drawing();
    const PartId ds106 = d.partByTag("DS-106")->id;
    const int openBefore = w.document().report().openCounts[2];
    ASSERT_TRUE(user.clickFinding(kRule));
    ASSERT_FALSE(test::findingOf(w, kRule)->accepted);

    // Accept… : the name is asked (first time), an empty note is refused with the reason.
    QString refusal;
    answerName("R. Quill");
    answerNote(kNote, &refusal);
    QTest::mouseClick(w.findings()->findChild<QPushButton*>("acceptFinding"), Qt::LeftButton);
    user.settle();
    EXPECT_TRUE(refusal.contains("note is required")) << refusal.toStdString();
    const Finding* f = test::findingOf(w, kRule);
    ASSERT_NE(f, nullptr);
    EXPECT_TRUE(f->accepted);
    EXPECT_EQ(w.document().report().openCounts[2], openBefore - 1);
    ASSERT_EQ(d.accepted().size(), 2u); // the sample's own and the new one
    EXPECT_EQ(d.accepted().back().by, "R. Quill");
    EXPECT_EQ(d.accepted().back().date, QDate::currentDate().toString(Qt::ISODate).toStdString());
    EXPECT_EQ(d.accepted().back().note, kNote.toStdString());
    ASSERT_NE(findingRow(w, kRule), nullptr);
    EXPECT_TRUE(findingRow(w, kRule)->text(0).endsWith("(accepted)"));
    EXPECT_TRUE(w.scene()->itemFor(ds106)->acceptedBadge()); // its only finding is accepted

    // One undo takes the acceptance back; redo records it again.
    user.clickEmptySheet();
    user.press(Qt::Key_Z, Qt::ControlModifier);
    EXPECT_FALSE(test::findingOf(w, kRule)->accepted);
    EXPECT_EQ(d.accepted().size(), 1u);
    user.press(Qt::Key_Y, Qt::ControlModifier);
    EXPECT_TRUE(test::findingOf(w, kRule)->accepted);

    // Withdraw acceptance from the badge's right-click menu, then accept there again: the
    // name is not asked a second time.
    user.rightClickPart(ds106);
    ASSERT_TRUE(user.choosePopupEntry(QString("Withdraw acceptance of ") + kRule));
    EXPECT_FALSE(test::findingOf(w, kRule)->accepted);
    EXPECT_EQ(*w.scene()->itemFor(ds106)->badge(), Severity::Violation);
    answerNote(kNote, nullptr);
    user.rightClickPart(ds106);
    ASSERT_TRUE(user.choosePopupEntry(QString("Accept ") + kRule + "…"));
    EXPECT_TRUE(test::findingOf(w, kRule)->accepted);

    // A comment pinned to the feed pump by its right-click menu.
    const PartId p101 = d.partByTag("P-101")->id;
    answerNote(kComment, nullptr);
    user.rightClickPart(p101);
    ASSERT_TRUE(user.choosePopupEntry("Add Comment…"));
    ASSERT_EQ(d.comments().size(), 1u);
    EXPECT_EQ(d.comments()[0].part, p101);
    EXPECT_EQ(d.comments()[0].by, "R. Quill");
    EXPECT_FALSE(d.comments()[0].resolved);
    ASSERT_EQ(w.scene()->commentMarks().size(), 1u);

    // The Review panel lists it; Resolve marks it resolved (one undoable edit), and again
    // reopens it.
    user.showPanel("Review");
    QTreeWidget* comments = w.review()->list();
    ASSERT_EQ(comments->topLevelItemCount(), 1);
    QTreeWidgetItem* row = comments->topLevelItem(0);
    EXPECT_EQ(row->text(1), "P-101");
    EXPECT_EQ(row->text(5), kComment);
    user.clickEmptySheet();
    QTest::mouseClick(comments->viewport(), Qt::LeftButton, {},
                      comments->visualItemRect(comments->topLevelItem(0)).center());
    user.settle();
    EXPECT_EQ(w.scene()->selectedParts(), std::vector<PartId>{p101}); // the click finds the part
    QTest::mouseClick(w.review()->findChild<QPushButton*>("resolveComment"), Qt::LeftButton);
    user.settle();
    EXPECT_TRUE(d.comments()[0].resolved);
    EXPECT_EQ(comments->topLevelItem(0)->text(4), "resolved");

    // Save, reopen: both are there.
    user.answerFileDialogWith(saved);
    user.chooseMenu({"File", "Save As…"});
    ASSERT_TRUE(QFile::exists(saved));
    user.answerFileDialogWith(test::samplePath("kestrel-mill-mcc1.lineward"));
    user.chooseMenu({"File", "Open…"});
    ASSERT_TRUE(w.document().drawing().comments().empty());
    user.answerFileDialogWith(saved);
    user.chooseMenu({"File", "Open…"});
    const Drawing& reopened = w.document().drawing();
    ASSERT_EQ(reopened.comments().size(), 1u);
    EXPECT_EQ(reopened.comments()[0].text, kComment.toStdString());
    EXPECT_TRUE(reopened.comments()[0].resolved);
    ASSERT_NE(test::findingOf(w, kRule), nullptr);
    EXPECT_TRUE(test::findingOf(w, kRule)->accepted);
    EXPECT_EQ(w.scene()->commentMarks().size(), 1u);
    EXPECT_EQ(w.review()->list()->topLevelItemCount(), 1);

    // The command line's check of the saved file reports the finding as accepted, with the
    // note (the same text renderer lineward-cli check prints).
    auto loaded = io::loadDrawing(saved.toStdString());
    ASSERT_TRUE(loaded);
    const auto result = runCheck(*loaded.drawing, *test::sharedTables());
    const std::string text = reportText(*loaded.drawing, result->report, "reviewed.lineward");
    EXPECT_NE(text.find("[accepted] violation · branch.disconnect.hp"), std::string::npos) << text;
    EXPECT_NE(text.find(kNote.toStdString() + " (R. Quill, "), std::string::npos);

    // The Submittal exported from the File menu holds the acceptance and the comment.
    const QString pdf = dir + "/reviewed.pdf";
    user.answerFileDialogWith(pdf);
    user.chooseMenu({"File", "Export", "Submittal PDF…"});
    ASSERT_TRUE(QFile::exists(pdf));
    const QString printed = pdfText(pdf);
    ASSERT_FALSE(printed.isEmpty()) << "pdftotext (poppler-utils) is needed";
    EXPECT_TRUE(printed.contains(kNote)) << "the acceptance's note is not printed";
    EXPECT_TRUE(printed.contains(kComment)) << "the comment is not printed";
    EXPECT_TRUE(printed.contains("Review comments"));
}

TEST(Review, AStaleAcceptanceIsListedAndCanBeWithdrawn) {
    QSettings::setPath(QSettings::NativeFormat, QSettings::UserScope,
                       test::tempDir("settings-stale"));
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1-review.lineward"), true).isEmpty());
    User user(w);
    const Drawing& d = w.document().drawing();
    ASSERT_EQ(d.accepted().size(), 1u);
    ASSERT_TRUE(test::findingOf(w, "transformer.load")->accepted);
    // The lighting load is set to 20 kVA: the accepted overload is gone, the acceptance stale.
    user.clickPart(d.partByTag("LTG-1")->id);
    user.type("kva_or_kw", "20", test::Commit::Enter);
    ASSERT_EQ(test::findingOf(w, "transformer.load"), nullptr);
    ASSERT_EQ(w.document().report().staleAccepted.size(), 1u);
    QTreeWidget* list = w.findings()->list();
    QTreeWidgetItem* stale = nullptr;
    for (int i = 0; i < list->topLevelItemCount(); ++i)
        if (list->topLevelItem(i)->text(0) == "stale acceptance")
            stale = list->topLevelItem(i);
    ASSERT_NE(stale, nullptr);
    EXPECT_EQ(stale->text(1), "transformer.load");
    EXPECT_TRUE(stale->text(3).contains("T. Okafor"));
    EXPECT_TRUE(w.findChild<QLabel*>("severityCounts")->text().contains("1 stale acceptance"));
    // Withdraw it: the acceptance leaves the drawing (undoably).
    list->scrollToItem(stale);
    QTest::mouseClick(list->viewport(), Qt::LeftButton, {}, list->visualItemRect(stale).center());
    user.settle();
    auto* withdraw = w.findings()->findChild<QPushButton*>("withdrawAcceptance");
    ASSERT_TRUE(withdraw->isEnabled());
    QTest::mouseClick(withdraw, Qt::LeftButton);
    user.settle();
    EXPECT_TRUE(d.accepted().empty());
    EXPECT_TRUE(w.document().report().staleAccepted.empty());
    user.clickEmptySheet();
    user.press(Qt::Key_Z, Qt::ControlModifier);
    EXPECT_EQ(d.accepted().size(), 1u);
}
