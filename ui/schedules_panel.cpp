// SchedulesPanel: rebuilt from the check result's schedules after each check, when shown.
#include "schedules_panel.h"

#include "guard.h"
#include "report/schedules.h"

#include <QHeaderView>
#include <QTableWidget>

namespace lineward::ui {

SchedulesPanel::SchedulesPanel(Document& doc, QWidget* parent) : QTabWidget(parent), m_doc(doc) {
    setObjectName("schedules");
    connect(&doc, &Document::reportChanged, this,
            guarded(this, tr("Building the schedules"), [this] { refresh(); }));
    refresh();
}

void SchedulesPanel::showEvent(QShowEvent* e) {
    QTabWidget::showEvent(e);
    if (m_stale)
        runGuarded(this, tr("Building the schedules"), [this] { rebuild(); });
}

void SchedulesPanel::refresh() {
    m_stale = true;
    if (isVisible())
        rebuild();
}

void SchedulesPanel::rebuild() {
    m_stale = false;
    const int current = currentIndex();
    while (count() > 0) {
        QWidget* w = widget(0);
        removeTab(0);
        delete w;
    }
    for (const auto& s : buildSchedules(m_doc.result())) {
        auto* table =
            new QTableWidget(static_cast<int>(s.rows.size()), static_cast<int>(s.headers.size()));
        table->setObjectName(QString::fromStdString("schedule_" + s.name));
        QStringList headers;
        for (const auto& h : s.headers)
            headers << QString::fromStdString(h);
        table->setHorizontalHeaderLabels(headers);
        for (std::size_t r = 0; r < s.rows.size(); ++r)
            for (std::size_t c = 0; c < s.rows[r].size(); ++c)
                table->setItem(static_cast<int>(r), static_cast<int>(c),
                               new QTableWidgetItem(QString::fromStdString(s.rows[r][c])));
        table->setEditTriggers(QAbstractItemView::NoEditTriggers);
        table->resizeColumnsToContents();
        table->verticalHeader()->hide();
        QString name = QString::fromStdString(s.name);
        name[0] = name[0].toUpper();
        addTab(table, name);
    }
    if (current >= 0 && current < count())
        setCurrentIndex(current);
}

} // namespace lineward::ui
