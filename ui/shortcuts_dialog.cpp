// The shortcuts table: one row per command with keys, in menu order; keys in the platform's
// own notation (QKeySequence::NativeText), several bindings joined by commas.
#include "shortcuts_dialog.h"

#include <QAction>
#include <QDialogButtonBox>
#include <QHeaderView>
#include <QMenu>
#include <QMenuBar>
#include <QTableWidget>
#include <QVBoxLayout>

namespace lineward::ui {

namespace {
QString plainText(QString menuText) {
    menuText.remove('&');
    menuText.remove(QChar(0x2026)); // the "…" of a command that asks first
    return menuText.trimmed();
}

void collect(const QMenu& menu, const QString& path, QList<QStringList>& rows) {
    for (QAction* a : menu.actions()) {
        if (a->menu()) {
            collect(*a->menu(), path + " → " + plainText(a->text()), rows);
            continue;
        }
        QStringList keys;
        for (const QKeySequence& k : a->shortcuts())
            keys << k.toString(QKeySequence::NativeText);
        if (!keys.isEmpty())
            rows.append({path, plainText(a->text()), keys.join(", ")});
    }
}
} // namespace

ShortcutsDialog::ShortcutsDialog(const QMenuBar& menus, QWidget* parent) : QDialog(parent) {
    setObjectName("shortcutsDialog");
    setWindowTitle(tr("Keyboard Shortcuts"));
    QList<QStringList> rows;
    for (QAction* a : menus.actions())
        if (a->menu())
            collect(*a->menu(), plainText(a->text()), rows);
    auto* table = new QTableWidget(static_cast<int>(rows.size()), 3, this);
    table->setObjectName("shortcutsTable");
    table->setHorizontalHeaderLabels({tr("Menu"), tr("Command"), tr("Keys")});
    table->setEditTriggers(QAbstractItemView::NoEditTriggers);
    table->verticalHeader()->hide();
    for (int r = 0; r < rows.size(); ++r)
        for (int c = 0; c < 3; ++c)
            table->setItem(r, c, new QTableWidgetItem(rows[r][c]));
    table->resizeColumnsToContents();
    table->horizontalHeader()->setStretchLastSection(true);
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Close, this);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    auto* layout = new QVBoxLayout(this);
    layout->addWidget(table);
    layout->addWidget(buttons);
    resize(560, 520);
}

} // namespace lineward::ui
