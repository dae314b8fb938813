// Recovery that keeps work: a drawing left by a window that did not close is offered, opens
// modified under its own name, autosaves on into the same slot and is removed only when
// saved; an unreadable one is reported and set aside; Quit and Close ask before losing work;
// an exception in an action is reported and the program goes on.
#include "guard.h"
#include "io/drawing_file.h"
#include "main_window.h"
#include "recovery.h"
#include "ui_support.h"
#include "user.h"

#include <QApplication>
#include <QDir>
#include <QFile>
#include <QTest>
#include <QUuid>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::ui;
using test::Commit;
using test::sharedTables;
using test::User;

namespace {

void emptyRecoveryFolder() {
    QDir(RecoverySlot::folder()).removeRecursively();
    QDir().mkpath(RecoverySlot::folder());
}

// What a window that crashed leaves: its autosaved drawing and the name of its file, no lock.
QString leaveSlot(const std::string& drawingBytes, const QString& originalPath) {
    const QString base =
        RecoverySlot::folder() + "/" + QUuid::createUuid().toString(QUuid::WithoutBraces);
    EXPECT_FALSE(io::writeFileAtomic((base + ".lineward").toStdString(), drawingBytes));
    const std::string origin = originalPath.toStdString() + "\n";
    EXPECT_FALSE(io::writeFileAtomic((base + ".origin").toStdString(), origin));
    return base + ".lineward";
}

} // namespace

TEST(Recovery, RecoveredDrawingOpensModifiedUnderItsNameUntilSaved) {
    emptyRecoveryFolder();
    const QString dir = test::tempDir("recovery");
    const QString original = dir + "/mcc1.lineward";
    ASSERT_TRUE(QFile::copy(test::samplePath("kestrel-mill-mcc1.lineward"), original));
    // The edit that was autosaved before the crash: one more load.
    auto loaded = io::loadDrawing(original.toStdString());
    ASSERT_TRUE(loaded);
    Part extra = Part::make(PartKind::Load, loaded.drawing->nextPartId(), "LD-RECOVERED");
    extra.set("kva", 10.0);
    extra.set("volts", 480.0);
    loaded.drawing->addPart(extra);
    const std::string edited = io::serializeDrawing(*loaded.drawing);
    const QString slot = leaveSlot(edited, original);

    MainWindow w(sharedTables());
    User user(w);
    QString question;
    User::answerMessageBox(QMessageBox::Open, &question);
    offerRecovery(w);
    EXPECT_TRUE(question.contains("mcc1.lineward")) << question.toStdString();
    EXPECT_EQ(io::serializeDrawing(w.document().drawing()), edited);
    EXPECT_TRUE(w.document().isModified());
    EXPECT_EQ(w.document().filePath(), original);
    EXPECT_TRUE(w.windowTitle().contains("mcc1.lineward"));
    EXPECT_TRUE(w.windowTitle().contains("recovered"));
    EXPECT_EQ(w.recoveryPath(), slot); // autosave goes on into the same slot
    EXPECT_TRUE(QFile::exists(slot));  // kept until saved or discarded
    EXPECT_TRUE(leftSlots().empty());  // held by this window: not offered to another

    user.press(Qt::Key_S, Qt::ControlModifier); // saves to its own file, no dialog
    EXPECT_EQ(test::fileBytes(original), edited);
    EXPECT_FALSE(w.document().isModified());
    EXPECT_FALSE(w.windowTitle().contains("recovered"));
    EXPECT_FALSE(QFile::exists(slot)); // no stale offer at the next start
}

TEST(Recovery, LaterKeepsTheSlotAndDiscardRemovesIt) {
    emptyRecoveryFolder();
    const QString slot =
        leaveSlot(test::fileBytes(test::samplePath("kestrel-mill-mcc1.lineward")), QString());
    {
        MainWindow w(sharedTables());
        User user(w);
        User::answerMessageBox(QMessageBox::Ignore);
        offerRecovery(w);
        EXPECT_TRUE(QFile::exists(slot));
        EXPECT_FALSE(w.document().isModified());
    }
    MainWindow w(sharedTables());
    User user(w);
    User::answerMessageBox(QMessageBox::Discard);
    offerRecovery(w);
    EXPECT_FALSE(QFile::exists(slot));
    EXPECT_TRUE(leftSlots().empty());
}

TEST(Recovery, UnreadableRecoveryFileIsReportedAndKeptAside) {
    emptyRecoveryFolder();
    const std::string full = test::fileBytes(test::samplePath("kestrel-mill-mcc1.lineward"));
    const QString slot = leaveSlot(full.substr(0, full.size() / 2), QString()); // truncated
    MainWindow w(sharedTables());
    User user(w);
    QString message;
    User::answerMessageBox(QMessageBox::Ok, &message);
    offerRecovery(w);
    EXPECT_TRUE(message.contains("could not be read")) << message.toStdString();
    EXPECT_TRUE(message.contains(".lineward:")) << message.toStdString(); // file:line:column
    EXPECT_FALSE(QFile::exists(slot));
    const QString aside = RecoverySlot::folder() + "/unreadable/" + QFileInfo(slot).fileName();
    ASSERT_TRUE(QFile::exists(aside));
    EXPECT_EQ(test::fileBytes(aside), full.substr(0, full.size() / 2)); // never deleted
    EXPECT_TRUE(message.contains(aside));
}

TEST(Recovery, CloseAsksAboutUnsavedWorkAndCancelKeepsTheWindow) {
    auto* w = new MainWindow(sharedTables());
    w->setAttribute(Qt::WA_DeleteOnClose);
    QPointer<MainWindow> alive(w);
    User user(*w);
    user.clickToPlace(PartKind::Motor, QPointF(0, 0));
    QString question;
    User::answerMessageBox(QMessageBox::Cancel, &question);
    user.press(Qt::Key_W, Qt::ControlModifier); // File → Close
    EXPECT_TRUE(question.contains("unsaved changes"));
    ASSERT_TRUE(alive);
    EXPECT_TRUE(w->isVisible());
    User::answerMessageBox(QMessageBox::Discard);
    // File → Quit asks each window; the window deletes itself, so no settling on it after.
    QApplication::setActiveWindow(w);
    QTest::keyClick(w, Qt::Key_Q, Qt::ControlModifier);
    QApplication::sendPostedEvents(nullptr, QEvent::DeferredDelete);
    QApplication::processEvents();
    EXPECT_TRUE(!alive || !alive->isVisible());
    if (alive)
        delete alive.data();
}

TEST(Guard, AnExceptionInAnActionIsReportedAndTheProgramGoesOn) {
    MainWindow w(sharedTables());
    User user(w);
    QString message;
    User::answerMessageBox(QMessageBox::Ok, &message);
    const bool ok = runGuarded(&w, "Testing the boundary",
                               [] { throw std::out_of_range("no rating 'nonexistent'"); });
    EXPECT_FALSE(ok);
    QTest::qWait(300); // the report is queued, then answered
    EXPECT_TRUE(message.contains("Testing the boundary could not be completed"));
    EXPECT_TRUE(message.contains("no rating 'nonexistent'"));
    EXPECT_TRUE(w.isVisible());
}
