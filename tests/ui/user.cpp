// The test user's hands: every action is a QTest mouse or key event (or, for a drag from the
// Parts palette, the drag-and-drop events a drop delivers) sent to the real widget.
#include "user.h"

#include "findings_panel.h"
#include "inspector.h"
#include "part_item.h"
#include "parts_palette.h"
#include "sheet_scene.h"
#include "sheet_view.h"

#include <QAbstractButton>
#include <QAbstractItemView>
#include <QApplication>
#include <QComboBox>
#include <QCompleter>
#include <QFileDialog>
#include <QLabel>
#include <QLineEdit>
#include <QMenu>
#include <QMenuBar>
#include <QMimeData>
#include <QPointer>
#include <QPushButton>
#include <QTabBar>
#include <QTest>
#include <QTimer>
#include <QTreeWidget>
#include <QWindow>
#include <gtest/gtest.h>
#include <memory>

namespace lineward::ui::test {

namespace {
QString menuWords(QString text);
} // namespace

User::User(MainWindow& w) : m_w(w) {
    m_w.resize(1400, 900);
    m_w.show();
    // On a real X server with no window manager nothing activates a new window: wait until it
    // is mapped, then ask for the focus ourselves (the xcb platform sets the input focus).
    EXPECT_TRUE(QTest::qWaitForWindowExposed(&m_w));
    m_w.raise();
    m_w.activateWindow();
    QApplication::setActiveWindow(&m_w);
    EXPECT_TRUE(QTest::qWaitForWindowActive(&m_w));
    settle();
}

void User::settle() {
    QApplication::processEvents();
    m_w.document().waitForCheck();
    QApplication::processEvents();
}

QPoint User::viewPoint(QPointF scenePos) const {
    SheetView* view = m_w.view();
    const QPoint p = view->mapFromScene(scenePos);
    if (!view->viewport()->rect().contains(p)) {
        view->centerOn(scenePos); // scroll as a user would, then point
        return view->mapFromScene(scenePos);
    }
    return p;
}

PartId User::newestPart() const {
    const auto& parts = m_w.document().drawing().parts();
    PartId best;
    for (const auto& p : parts)
        if (best < p.id)
            best = p.id;
    return best;
}

PartId User::dragFromPalette(PartKind kind, QPointF scenePos) {
    auto* palette = m_w.findChild<PartsPalette*>("partsPalette");
    EXPECT_NE(palette, nullptr);
    QListWidgetItem* item = palette->item(static_cast<int>(kind));
    // The palette's own drag data, delivered as a drop delivers it: enter, move, drop.
    std::unique_ptr<QMimeData> data(palette->model()->mimeData({palette->indexFromItem(item)}));
    QWidget* target = m_w.view()->viewport();
    const QPoint at = viewPoint(scenePos);
    QDragEnterEvent enter(at, Qt::CopyAction, data.get(), Qt::LeftButton, Qt::NoModifier);
    QApplication::sendEvent(target, &enter);
    QDragMoveEvent move(at, Qt::CopyAction, data.get(), Qt::LeftButton, Qt::NoModifier);
    QApplication::sendEvent(target, &move);
    QDropEvent drop(at, Qt::CopyAction, data.get(), Qt::LeftButton, Qt::NoModifier);
    QApplication::sendEvent(target, &drop);
    settle();
    return newestPart();
}

PartId User::clickToPlace(PartKind kind, QPointF scenePos) {
    auto* palette = m_w.findChild<PartsPalette*>("partsPalette");
    QListWidgetItem* item = palette->item(static_cast<int>(kind));
    palette->scrollToItem(item);
    QTest::mouseClick(palette->viewport(), Qt::LeftButton, {},
                      palette->visualItemRect(item).center());
    QTest::mouseClick(m_w.view()->viewport(), Qt::LeftButton, {}, viewPoint(scenePos));
    settle();
    return newestPart();
}

void User::dragWire(WireEnd from, WireEnd to) {
    PartItem* a = m_w.scene()->itemFor(from.part);
    PartItem* b = m_w.scene()->itemFor(to.part);
    ASSERT_TRUE(a && b);
    const QPointF sa = a->terminalScenePos(from.terminal, b->scenePos());
    const QPointF sb = b->terminalScenePos(to.terminal, sa);
    m_w.view()->centerOn((sa + sb) / 2);
    const QPoint pa = m_w.view()->mapFromScene(sa), pb = m_w.view()->mapFromScene(sb);
    QWidget* vp = m_w.view()->viewport();
    QTest::mousePress(vp, Qt::LeftButton, {}, pa);
    QTest::mouseMove(vp, (pa + pb) / 2);
    QTest::mouseMove(vp, pb);
    QTest::mouseRelease(vp, Qt::LeftButton, {}, pb);
    settle();
}

QPoint User::partPoint(PartId id) const {
    PartItem* item = m_w.scene()->itemFor(id);
    EXPECT_NE(item, nullptr);
    if (!item)
        return {};
    // A point of the part that nothing lies on (a bus bar carries its wires' ends).
    const QRectF r = item->shape().boundingRect();
    QPointF at = item->mapToScene(r.center());
    for (qreal f : {0.5, 0.3, 0.7, 0.15, 0.85}) {
        const QPointF p = item->mapToScene(QPointF(r.left() + f * r.width(), r.center().y()));
        if (m_w.scene()->itemAt(p, m_w.view()->transform()) == item) {
            at = p;
            break;
        }
    }
    return viewPoint(at);
}

void User::clickPart(PartId id, Qt::KeyboardModifiers mods) {
    QTest::mouseClick(m_w.view()->viewport(), Qt::LeftButton, mods, partPoint(id));
    settle();
}

void User::dragRubberBand(QPointF fromScene, QPointF toScene) {
    QWidget* vp = m_w.view()->viewport();
    const QPoint from = viewPoint(fromScene);
    const QPoint to = m_w.view()->mapFromScene(toScene);
    QTest::mousePress(vp, Qt::LeftButton, {}, from);
    QTest::mouseMove(vp, from + QPoint(4, 4));
    QTest::mouseMove(vp, (from + to) / 2);
    QTest::mouseMove(vp, to);
    QTest::mouseRelease(vp, Qt::LeftButton, {}, to);
    settle();
}

void User::clickEmptySheet() {
    const QRectF used = m_w.scene()->itemsBoundingRect();
    QTest::mouseClick(m_w.view()->viewport(), Qt::LeftButton, {},
                      viewPoint(used.bottomRight() + QPointF(150, 150)));
    settle();
}

void User::rightClickPart(PartId id) {
    PartItem* item = m_w.scene()->itemFor(id);
    ASSERT_NE(item, nullptr);
    const QPointF at = item->badge() || item->acceptedBadge()
                           ? item->badgeScenePos()
                           : item->mapToScene(item->shape().boundingRect().center());
    QWidget* vp = m_w.view()->viewport();
    const QPoint inWindow = vp->mapTo(&m_w, viewPoint(at));
    // The window-level event: Qt turns a right press into the context-menu event, as it does
    // for a person's mouse (a widget-level QTest event would skip that step).
    QTest::mouseClick(m_w.windowHandle(), Qt::RightButton, {}, inWindow);
    QApplication::processEvents();
}

bool User::choosePopupEntry(const QString& text) {
    QTest::qWaitFor([] { return QApplication::activePopupWidget() != nullptr; }, 2000);
    auto* menu = qobject_cast<QMenu*>(QApplication::activePopupWidget());
    if (!menu)
        return false;
    for (QAction* a : menu->actions())
        if (menuWords(a->text()) == text) {
            const QPoint at = menu->actionGeometry(a).center();
            QTest::mouseMove(menu, at);
            QTest::mouseClick(menu, Qt::LeftButton, {}, at);
            settle();
            return true;
        }
    QTest::keyClick(menu, Qt::Key_Escape);
    return false;
}

void User::dragPart(PartId id, QPointF by) {
    PartItem* item = m_w.scene()->itemFor(id);
    ASSERT_NE(item, nullptr);
    const QPointF at = item->mapToScene(item->shape().boundingRect().center());
    const QPoint from = viewPoint(at);
    const QPoint to = m_w.view()->mapFromScene(at + by);
    QWidget* vp = m_w.view()->viewport();
    QTest::mousePress(vp, Qt::LeftButton, {}, from);
    QTest::mouseMove(vp, (from + to) / 2);
    QTest::mouseMove(vp, to);
    QTest::mouseRelease(vp, Qt::LeftButton, {}, to);
    settle();
}

QLineEdit* User::field(const QString& key) const {
    auto* edit = m_w.inspector()->findChild<QLineEdit*>("field_" + key);
    EXPECT_NE(edit, nullptr) << "no Inspector field " << key.toStdString();
    return edit;
}

QComboBox* User::combo(const QString& name) const {
    auto* box = m_w.inspector()->findChild<QComboBox*>(name);
    EXPECT_NE(box, nullptr) << "no Inspector choice " << name.toStdString();
    return box;
}

void User::type(const QString& key, const QString& text, Commit how) {
    QLineEdit* edit = field(key);
    if (!edit)
        return;
    QTest::mouseClick(edit, Qt::LeftButton, {}, edit->rect().center());
    QTest::keyClick(edit, Qt::Key_A, Qt::ControlModifier); // select what is there
    if (text.isEmpty())
        QTest::keyClick(edit, Qt::Key_Delete);
    else
        QTest::keyClicks(edit, text);
    switch (how) {
    case Commit::Enter:
        QTest::keyClick(edit, Qt::Key_Return);
        break;
    case Commit::Tab:
        QTest::keyClick(edit, Qt::Key_Tab);
        break;
    case Commit::ClickAway: {
        auto* filter = m_w.findings()->findChild<QLineEdit*>("findingsFilter");
        QTest::mouseClick(filter, Qt::LeftButton, {}, filter->rect().center());
        break;
    }
    }
    settle();
}

void User::choose(const QString& name, const QString& label) {
    QComboBox* box = combo(name);
    if (!box)
        return;
    const int index = box->findText(label);
    ASSERT_GE(index, 0) << label.toStdString() << " is not offered in " << name.toStdString();
    // Click the box (it takes the focus and opens its list), close the list with Escape and
    // type the entry's words into the closed box, as a person does with the keyboard.
    QTest::mouseClick(box, Qt::LeftButton, {}, box->rect().center());
    QApplication::processEvents(); // the list opens from the event loop
    if (QWidget* popup = QApplication::activePopupWidget())
        QTest::keyClick(popup, Qt::Key_Escape);
    EXPECT_EQ(QApplication::activePopupWidget(), nullptr)
        << "the list of " << name.toStdString() << " stayed open";
    QTest::keyClicks(box, label);
    EXPECT_EQ(box->currentIndex(), index) << label.toStdString();
    settle();
}

QString User::inspectorMessage() const {
    auto* label = m_w.inspector()->findChild<QLabel*>("inspectorMessage");
    return label ? label->text() : QString();
}

bool User::clickFinding(const QString& rule) {
    QTreeWidget* list = m_w.findings()->list();
    for (int i = 0; i < list->topLevelItemCount(); ++i) {
        QTreeWidgetItem* row = list->topLevelItem(i);
        if (row->text(1) != rule)
            continue;
        list->scrollToItem(row);
        QTest::mouseClick(list->viewport(), Qt::LeftButton, {}, list->visualItemRect(row).center());
        settle();
        return true;
    }
    return false;
}

void User::clickApplyFix() {
    auto* button = m_w.findings()->findChild<QPushButton*>("applyFix");
    ASSERT_NE(button, nullptr);
    ASSERT_TRUE(button->isEnabled());
    QTest::mouseClick(button, Qt::LeftButton);
    settle();
}

void User::showPanel(const QString& title) {
    for (auto* bar : m_w.findChildren<QTabBar*>())
        for (int i = 0; i < bar->count(); ++i)
            if (bar->tabText(i).remove('&') == title) {
                QTest::mouseClick(bar, Qt::LeftButton, {}, bar->tabRect(i).center());
                settle();
                return;
            }
    ADD_FAILURE() << "no panel tab " << title.toStdString();
}

void User::press(Qt::Key key, Qt::KeyboardModifiers mods) {
    QApplication::setActiveWindow(&m_w); // a closed dialog may have taken activation
    QWidget* target = QApplication::focusWidget() ? QApplication::focusWidget() : &m_w;
    QTest::keyClick(target, key, mods);
    settle();
}

namespace {
QString menuWords(QString text) {
    return text.remove('&');
}
} // namespace

namespace {

// Opens the menus of `path` (all of it, or all but its last entry) by clicking; returns the
// menu shown last, or nothing after reporting a failure.
QMenu* openMenus(MainWindow& w, const QStringList& path, int depth) {
    QApplication::setActiveWindow(&w);
    QMenuBar* bar = w.menuBar();
    QMenu* menu = nullptr;
    for (QAction* a : bar->actions())
        if (menuWords(a->text()) == path.front() && a->menu()) {
            QTest::mouseClick(bar, Qt::LeftButton, {}, bar->actionGeometry(a).center());
            menu = a->menu();
        }
    if (!menu || !QTest::qWaitFor([menu] { return menu->isVisible(); }, 2000)) {
        ADD_FAILURE() << "no menu " << path.front().toStdString() << " opened";
        return nullptr;
    }
    for (int i = 1; i < depth; ++i) {
        QAction* sub = nullptr;
        for (QAction* a : menu->actions())
            if (menuWords(a->text()) == path[i] && a->menu())
                sub = a;
        if (!sub) {
            ADD_FAILURE() << "no submenu " << path[i].toStdString();
            return nullptr;
        }
        const QPoint at = menu->actionGeometry(sub).center();
        QTest::mouseMove(menu, at);
        QTest::mouseClick(menu, Qt::LeftButton, {}, at);
        menu = sub->menu();
        if (!QTest::qWaitFor([menu] { return menu->isVisible(); }, 2000)) {
            ADD_FAILURE() << "submenu " << path[i].toStdString() << " did not open";
            return nullptr;
        }
    }
    return menu;
}
} // namespace

void User::chooseMenu(const QStringList& path) {
    QMenu* menu = openMenus(m_w, path, static_cast<int>(path.size()) - 1);
    if (!menu)
        return;
    for (QAction* a : menu->actions())
        if (menuWords(a->text()) == path.back()) {
            const QPoint at = menu->actionGeometry(a).center();
            QTest::mouseMove(menu, at);
            QTest::mouseClick(menu, Qt::LeftButton, {}, at);
            settle();
            return;
        }
    ADD_FAILURE() << "no command " << path.back().toStdString() << " in the menu";
}

QStringList User::menuTexts(const QStringList& path) {
    QStringList texts;
    QMenu* menu = openMenus(m_w, path, static_cast<int>(path.size()));
    if (!menu)
        return texts;
    for (QAction* a : menu->actions())
        if (!a->isSeparator() && a->isVisible())
            texts << menuWords(a->text());
    for (int i = 0; i < 5 && QApplication::activePopupWidget(); ++i)
        QTest::keyClick(QApplication::activePopupWidget(), Qt::Key_Escape);
    settle();
    return texts;
}

void User::answerFileDialogWith(const QString& path) {
    // The dialog is modal: answer it from the event loop once it is up. Poll, as a person waits
    // for it: the first dialog of a process can take a while to list its folder.
    whenModal<QFileDialog>([path](QFileDialog* dialog) {
        auto* name = dialog->findChild<QLineEdit*>("fileNameEdit");
        if (!name) {
            ADD_FAILURE() << "the file dialog has no file name box";
            dialog->reject();
            return;
        }
        QTest::keyClicks(name, path);
        // The name box completes from the folder it lists in the background; when its list of
        // completions is up, Return would pick one instead of accepting. Close it first, as a
        // person does, then press Return (again, if the list came up once more meanwhile, or
        // the name was changed by it: type it again). On a loaded machine this can take a
        // while; a dialog still open after 10 s fails the test instead of hanging it.
        QPointer<QFileDialog> open(dialog);
        for (int i = 0; i < 200 && open && open->isVisible(); ++i) {
            if (name->completer() && name->completer()->popup()->isVisible())
                QTest::keyClick(name->completer()->popup(), Qt::Key_Escape);
            if (name->text() != path) {
                QTest::keyClick(name, Qt::Key_A, Qt::ControlModifier);
                QTest::keyClicks(name, path);
                continue;
            }
            QTest::keyClick(name, Qt::Key_Return);
            QTest::qWait(50);
        }
        if (open && open->isVisible()) {
            ADD_FAILURE() << "the file dialog did not take " << path.toStdString();
            open->reject();
        }
    });
}

void User::whenModalWidget(std::function<bool(QWidget*)> accepts, std::function<void(QWidget*)> act,
                           const char* what) {
    auto* timer = new QTimer;
    timer->setInterval(50);
    auto tries = std::make_shared<int>(0);
    QObject::connect(timer, &QTimer::timeout, [timer, accepts, act, what, tries] {
        QWidget* w = QApplication::activeModalWidget();
        if (!w || !accepts(w)) {
            if (++*tries > 200) { // 10 s: it never came; do not answer a later test's dialog
                timer->stop();
                timer->deleteLater();
                ADD_FAILURE() << "no " << what << " opened";
            }
            return;
        }
        timer->stop();
        timer->deleteLater();
        act(w);
    });
    timer->start();
}

void User::answerMessageBox(QMessageBox::StandardButton button, QString* text) {
    // Poll: the box may open after other queued work.
    auto* timer = new QTimer;
    timer->setInterval(50);
    auto tries = std::make_shared<int>(0);
    QObject::connect(timer, &QTimer::timeout, [timer, button, text, tries] {
        auto* box = qobject_cast<QMessageBox*>(QApplication::activeModalWidget());
        if (!box) {
            if (++*tries > 100) { // 5 s: no box came; do not answer a later test's box
                timer->stop();
                timer->deleteLater();
                ADD_FAILURE() << "no message box opened";
            }
            return;
        }
        timer->stop();
        timer->deleteLater();
        if (text)
            *text = box->text();
        if (QAbstractButton* b = box->button(button))
            QTest::mouseClick(b, Qt::LeftButton);
        else
            ADD_FAILURE() << "the message box has no such button: " << box->text().toStdString();
    });
    timer->start();
}

} // namespace lineward::ui::test
