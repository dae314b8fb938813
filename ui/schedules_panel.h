// Schedules: motors, cables and devices with their computed values, one tab each.
#pragma once

#include "document.h"
#include "report/schedules.h"

#include <QAbstractTableModel>
#include <QTabWidget>
#include <vector>

class QTableView;

namespace lineward::ui {

/// One schedule as a read-only table model: a new check replaces its rows in one reset, so
/// the view keeps its widgets, column widths and scroll position.
class ScheduleModel : public QAbstractTableModel {
    Q_OBJECT
public:
    using QAbstractTableModel::QAbstractTableModel;
    void setSchedule(Schedule s);
    int rowCount(const QModelIndex& parent = {}) const override;
    int columnCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
    QVariant headerData(int section, Qt::Orientation o, int role = Qt::DisplayRole) const override;

private:
    Schedule m_schedule;
};

class SchedulesPanel : public QTabWidget {
    Q_OBJECT
public:
    explicit SchedulesPanel(Document& doc, QWidget* parent = nullptr);

    /// Whether the panel's dock is up (a tabbed dock behind another tab stays "visible" to
    /// Qt); behind another tab the tables are only marked stale, and refilled when it comes up.
    void setOnTop(bool onTop);

protected:
    void showEvent(QShowEvent* e) override;

private:
    /// Refills the tables when the panel is shown; while hidden, only notes they are stale
    /// (a hidden tab costs nothing per edit).
    void refresh();
    void rebuild();
    Document& m_doc;
    bool m_stale = true;
    bool m_onTop = true;
    std::vector<ScheduleModel*> m_models;
    std::vector<QTableView*> m_views;
    std::vector<bool> m_sized; ///< columns sized to their contents once the table had rows
};

} // namespace lineward::ui
