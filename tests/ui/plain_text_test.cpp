// Text from a file is plain text in the window: the "cannot open" box, badge tooltips, the
// Findings list and detail, the Inspector's message. Markup in a file is shown, never obeyed:
// an inotify watch proves the file an <img> names is never opened.
#include "findings_panel.h"
#include "main_window.h"
#include "part_item.h"
#include "sheet_scene.h"
#include "ui_support.h"
#include "user.h"

#include <QApplication>
#include <QFile>
#include <QLabel>
#include <QMessageBox>
#include <QTest>
#include <QTextBrowser>
#include <QTimer>
#include <QTreeWidget>
#include <gtest/gtest.h>
#include <sys/inotify.h>
#include <unistd.h>

using namespace lineward;
using namespace lineward::ui;

namespace {

// Watches one file for being opened or read.
class OpenWatch {
public:
    explicit OpenWatch(const QString& path) {
        m_fd = inotify_init1(IN_NONBLOCK);
        m_wd = inotify_add_watch(m_fd, QFile::encodeName(path).constData(), IN_OPEN | IN_ACCESS);
    }
    ~OpenWatch() { ::close(m_fd); }
    bool armed() const { return m_fd >= 0 && m_wd >= 0; }
    bool touched() const {
        alignas(inotify_event) char buf[4096];
        return ::read(m_fd, buf, sizeof buf) > 0;
    }

private:
    int m_fd = -1, m_wd = -1;
};

QString writeFile(const QString& dir, const char* name, const QByteArray& bytes) {
    const QString path = dir + "/" + name;
    QFile f(path);
    f.open(QIODevice::WriteOnly);
    f.write(bytes);
    return path;
}

// A real PNG-sized probe: if anything renders the <img>, it opens this file.
QString probeFile(const QString& dir) {
    return writeFile(dir, "probe.png", QByteArray("\x89PNG\r\n\x1a\n", 8) + QByteArray(64, '\0'));
}

} // namespace

TEST(PlainText, CannotOpenBoxShowsMarkupAndLoadsNothing) {
    const QString dir = test::tempDir("plain-open");
    const QString probe = probeFile(dir);
    const QByteArray key = "<img src=\"" + probe.toUtf8() + "\"><b>bold</b>";
    const QString bad = writeFile(dir, "bad.lineward",
                                  "{\"format\":\"lineward\",\"version\":1,\"" +
                                      QByteArray(key).replace("\"", "\\\"") + "\":1}\n");
    OpenWatch watch(probe);
    ASSERT_TRUE(watch.armed());
    MainWindow w(test::sharedTables());
    test::User user(w);
    Qt::TextFormat format = Qt::RichText;
    QString shown;
    bool sawBox = false;
    QTimer poll;
    poll.setInterval(10);
    QObject::connect(&poll, &QTimer::timeout, [&] {
        auto* box = qobject_cast<QMessageBox*>(QApplication::activeModalWidget());
        if (!box)
            return;
        poll.stop();
        sawBox = true;
        format = box->textFormat();
        shown = box->text();
        box->adjustSize(); // lays the text out, as showing it does
        QTest::qWait(20);
        QTest::keyClick(box, Qt::Key_Escape);
    });
    poll.start();
    user.answerFileDialogWith(bad);
    user.press(Qt::Key_O, Qt::ControlModifier); // File → Open, the file typed in the dialog
    ASSERT_TRUE(sawBox);
    EXPECT_EQ(format, Qt::PlainText);
    EXPECT_TRUE(shown.contains("<img src=")) << shown.toStdString();
    EXPECT_TRUE(shown.contains("bad.lineward:1:")) << shown.toStdString();
    EXPECT_FALSE(watch.touched()) << "the <img> in the message was loaded";
}

TEST(PlainText, TooltipsAndFindingsShowATagLiterally) {
    const QString dir = test::tempDir("plain-tags");
    const QString probe = probeFile(dir);
    QByteArray text = QByteArray::fromStdString(
        test::fileBytes(test::samplePath("kestrel-mill-mcc1-review.lineward")));
    const QByteArray tag = "<img src='" + probe.toUtf8() + "'>P-105";
    ASSERT_TRUE(text.contains("\"tag\":\"P-105\""));
    text.replace("\"tag\":\"P-105\"", "\"tag\":\"" + tag + "\"");
    const QString path = writeFile(dir, "tags.lineward", text);
    OpenWatch watch(probe);
    MainWindow w(test::sharedTables());
    w.show();
    ASSERT_TRUE(w.openFile(path, true).isEmpty());
    const Part* p = w.document().drawing().partByTag(tag.toStdString());
    ASSERT_NE(p, nullptr);
    PartItem* item = w.scene()->itemFor(p->id);
    ASSERT_TRUE(item->badge().has_value());
    EXPECT_FALSE(item->toolTip().contains("<img")) << item->toolTip().toStdString();
    EXPECT_TRUE(item->toolTip().contains("&lt;img")) << item->toolTip().toStdString();
    auto* list = w.findings()->list();
    for (int i = 0; i < list->topLevelItemCount(); ++i)
        EXPECT_FALSE(list->topLevelItem(i)->toolTip(3).contains("<img"));
    // Select its finding with the keyboard; the detail pane shows it and loads nothing.
    // A click on the list's first row gives it the keyboard, as a person does.
    QTest::mouseClick(list->viewport(), Qt::LeftButton, {},
                      list->visualItemRect(list->topLevelItem(0)).center());
    for (int i = 0; i < list->topLevelItemCount(); ++i) {
        QTest::keyClick(list, i == 0 ? Qt::Key_Home : Qt::Key_Down);
        if (list->currentItem() && list->currentItem()->text(2).contains("P-105"))
            break;
    }
    auto* detail = w.findChild<QTextBrowser*>("findingDetail");
    ASSERT_NE(detail, nullptr);
    EXPECT_TRUE(detail->toPlainText().contains("<img")) << detail->toPlainText().toStdString();
    EXPECT_FALSE(
        detail->loadResource(QTextDocument::ImageResource, QUrl::fromLocalFile(probe)).isValid());
    EXPECT_FALSE(watch.touched());
    auto* message = w.findChild<QLabel*>("inspectorMessage");
    ASSERT_NE(message, nullptr);
    EXPECT_EQ(message->textFormat(), Qt::PlainText);
}
