// A test user: drives the real MainWindow with real input events only — mouse clicks, drags
// and key presses on the real widgets, as a person would. No slot or panel method is called.
#pragma once

#include "main_window.h"

#include <QMessageBox>
#include <QPoint>
#include <QString>
#include <QStringList>
#include <functional>

class QLineEdit;
class QComboBox;

namespace lineward::ui::test {

/// How a typed value is committed in the Inspector.
enum class Commit { Enter, Tab, ClickAway };

class User {
public:
    /// Shows the window, makes it active and waits until it is.
    explicit User(MainWindow& w);

    /// Drags a kind from the Parts palette and drops it on the Sheet at a scene point.
    PartId dragFromPalette(PartKind kind, QPointF scenePos);
    /// Clicks the kind in the Parts palette, then clicks the Sheet at a scene point.
    PartId clickToPlace(PartKind kind, QPointF scenePos);
    /// Presses on one terminal, moves, releases on the other.
    void dragWire(WireEnd from, WireEnd to);
    /// Clicks the part's symbol on the Sheet (it becomes the only selection; with Ctrl held it
    /// is added to or taken from the selection).
    void clickPart(PartId id, Qt::KeyboardModifiers mods = Qt::NoModifier);
    /// Press on the Sheet at one scene point, move and release at the other: a rubber band
    /// that selects what it covers.
    void dragRubberBand(QPointF fromScene, QPointF toScene);
    /// Clicks an empty place of the Sheet.
    void clickEmptySheet();
    /// A right-click on the part's badge (or its symbol where it has none), through the window
    /// as the platform delivers it, so the Sheet gets its context-menu event.
    void rightClickPart(PartId id);
    /// Clicks the entry shown as `text` in the menu that is up (a context menu); false if none.
    bool choosePopupEntry(const QString& text);
    /// Press-move-release of a part's symbol by a scene offset.
    void dragPart(PartId id, QPointF by);

    /// The Inspector's editor of a rating (objectName "field_<key>"); fails the test if absent.
    QLineEdit* field(const QString& key) const;
    QComboBox* combo(const QString& name) const;
    /// Clicks into the rating, selects its text, types `text` and commits it `how`.
    void type(const QString& key, const QString& text, Commit how);
    /// Chooses the entry shown as `label` in a combo box with the keyboard (focus, then
    /// the first letters, as a person types into a closed combo box).
    void choose(const QString& name, const QString& label);
    /// What the Inspector's message line shows.
    QString inspectorMessage() const;

    /// Clicks the tab of a docked panel ("Findings", "Schedules", "Curves") to bring it up.
    void showPanel(const QString& title);
    /// Clicks the first row of the Findings list whose rule column is `rule`; false if none.
    bool clickFinding(const QString& rule);
    /// Clicks the Findings panel's Apply fix button.
    void clickApplyFix();
    /// A key press on the window's focused widget (shortcuts: Ctrl+Z, Delete, ...).
    void press(Qt::Key key, Qt::KeyboardModifiers mods = Qt::NoModifier);
    /// Runs the event loop until the newest check has been shown.
    void settle();

    /// Clicks through the menu bar: the top menu, any submenus, then the command, each by a
    /// mouse click on its place in the menu ({"File", "Export", "One-line DXF…"}).
    void chooseMenu(const QStringList& path);
    /// Opens the menus of `path` by clicking them and returns the texts the last one shows (its
    /// separators left out), then closes the menus with Escape.
    QStringList menuTexts(const QStringList& path);

    /// Answers the next file dialog with `path` (typed into its file name box, then Enter).
    void answerFileDialogWith(const QString& path);
    /// Runs `act` on the next modal dialog of type T once it is up (polled for up to 10 s).
    template <typename T> static void whenModal(std::function<void(T*)> act) {
        whenModalWidget([](QWidget* w) { return qobject_cast<T*>(w) != nullptr; },
                        [act](QWidget* w) { act(qobject_cast<T*>(w)); },
                        T::staticMetaObject.className());
    }
    static void whenModalWidget(std::function<bool(QWidget*)> accepts,
                                std::function<void(QWidget*)> act, const char* what);
    /// Clicks `button` in the next message box once it is up; its text goes to `text`.
    static void answerMessageBox(QMessageBox::StandardButton button, QString* text = nullptr);

    MainWindow& window() { return m_w; }

private:
    QPoint viewPoint(QPointF scenePos) const;
    /// A view point on the part that nothing else lies on.
    QPoint partPoint(PartId id) const;
    PartId newestPart() const;
    MainWindow& m_w;
};

} // namespace lineward::ui::test
