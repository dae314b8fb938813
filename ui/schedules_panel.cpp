// SchedulesPanel: the check result's schedules in model/view tables, refilled after each
// check while shown.
#include "schedules_panel.h"

#include "guard.h"

#include <QHeaderView>
#include <QTableView>

namespace lineward::ui {

void ScheduleModel::setSchedule(Schedule s) {
    beginResetModel();
    m_schedule = std::move(s);
    endResetModel();
}

int ScheduleModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : static_cast<int>(m_schedule.rows.size());
}

int ScheduleModel::columnCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : static_cast<int>(m_schedule.headers.size());
}

QVariant ScheduleModel::data(const QModelIndex& index, int role) const {
    if (role != Qt::DisplayRole || !index.isValid())
        return {};
    const auto& row = m_schedule.rows[static_cast<std::size_t>(index.row())];
    const auto c = static_cast<std::size_t>(index.column());
    return c < row.size() ? QString::fromStdString(row[c]) : QString();
}

QVariant ScheduleModel::headerData(int section, Qt::Orientation o, int role) const {
    if (role != Qt::DisplayRole)
        return {};
    if (o == Qt::Vertical)
        return section + 1;
    return section >= 0 && static_cast<std::size_t>(section) < m_schedule.headers.size()
               ? QString::fromStdString(m_schedule.headers[static_cast<std::size_t>(section)])
               : QVariant();
}

SchedulesPanel::SchedulesPanel(Document& doc, QWidget* parent) : QTabWidget(parent), m_doc(doc) {
    setObjectName("schedules");
    connect(&doc, &Document::reportChanged, this,
            guarded(this, tr("Building the schedules"), [this] { refresh(); }));
    refresh();
}

void SchedulesPanel::showEvent(QShowEvent* e) {
    QTabWidget::showEvent(e);
    if (m_stale && m_onTop)
        runGuarded(this, tr("Building the schedules"), [this] { rebuild(); });
}

void SchedulesPanel::setOnTop(bool onTop) {
    m_onTop = onTop;
    if (m_onTop && m_stale && isVisible())
        runGuarded(this, tr("Building the schedules"), [this] { rebuild(); });
}

void SchedulesPanel::refresh() {
    m_stale = true;
    if (isVisible() && m_onTop)
        rebuild();
}

void SchedulesPanel::rebuild() {
    m_stale = false;
    auto schedules = buildSchedules(m_doc.result());
    for (std::size_t i = 0; i < schedules.size(); ++i) {
        if (i == m_models.size()) { // the first fill makes the tabs; later ones reuse them
            auto* model = new ScheduleModel(this);
            auto* view = new QTableView;
            view->setModel(model);
            view->setObjectName(QString::fromStdString("schedule_" + schedules[i].name));
            view->setEditTriggers(QAbstractItemView::NoEditTriggers);
            view->verticalHeader()->hide();
            // Widths from the first rows, not every row (a large plant has thousands).
            view->horizontalHeader()->setResizeContentsPrecision(50);
            QString name = QString::fromStdString(schedules[i].name);
            name[0] = name[0].toUpper();
            addTab(view, name);
            m_models.push_back(model);
            m_views.push_back(view);
            m_sized.push_back(false);
        }
        const bool hasRows = !schedules[i].rows.empty();
        m_models[i]->setSchedule(std::move(schedules[i]));
        // Columns fit their contents once; after that the user's widths stay as they are.
        if (hasRows && !m_sized[i]) {
            m_views[i]->resizeColumnsToContents();
            m_sized[i] = true;
        }
    }
}

} // namespace lineward::ui
