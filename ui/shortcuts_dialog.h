// Help → Keyboard Shortcuts: every menu command that has keys, read from the window's own
// actions, so the list cannot drift from what the keys do.
#pragma once

#include <QDialog>

class QMenuBar;

namespace lineward::ui {

class ShortcutsDialog : public QDialog {
    Q_OBJECT
public:
    /// Lists the actions of `menus` that have a shortcut: menu, command, keys.
    ShortcutsDialog(const QMenuBar& menus, QWidget* parent = nullptr);
};

} // namespace lineward::ui
