// Schedules: motors, cables and devices with their computed values, one tab each. Rows whose
// parts have open findings are tinted with their worst severity; a cell that shows one rating
// of one part can be edited in place through the Inspector's validation and undo command.
#pragma once

#include "document.h"
#include "report/schedules.h"

#include <QAbstractTableModel>
#include <QWidget>
#include <functional>
#include <vector>

class QLabel;
class QTabWidget;
class QTableView;

namespace lineward::ui {

/// One schedule as a table model: a new check replaces its rows in one reset, so the view keeps
/// its widgets, column widths and scroll position. Cells with a ScheduleField are editable; what
/// is typed goes to the edit handler, which checks it and asks for the edit (nothing here
/// changes the drawing).
class ScheduleModel : public QAbstractTableModel {
    Q_OBJECT
public:
    using EditHandler = std::function<void(ScheduleField, QString)>;
    ScheduleModel(const Document& doc, EditHandler onEdit, QObject* parent = nullptr);
    void setSchedule(Schedule s);
    int rowCount(const QModelIndex& parent = {}) const override;
    int columnCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
    QVariant headerData(int section, Qt::Orientation o, int role = Qt::DisplayRole) const override;
    Qt::ItemFlags flags(const QModelIndex& index) const override;
    bool setData(const QModelIndex& index, const QVariant& value, int role = Qt::EditRole) override;

private:
    /// The rating a cell shows, if it shows one rating of a part still in the drawing.
    const ScheduleField* fieldAt(const QModelIndex& index) const;
    const RowFindings* findingsAt(int row) const;

    const Document& m_doc;
    EditHandler m_onEdit;
    Schedule m_schedule;
};

class SchedulesPanel : public QWidget {
    Q_OBJECT
public:
    explicit SchedulesPanel(Document& doc, QWidget* parent = nullptr);

    /// Whether the panel's dock is up (a tabbed dock behind another tab stays "visible" to
    /// Qt); behind another tab the tables are only marked stale, and refilled when it comes up.
    void setOnTop(bool onTop);

signals:
    /// An accepted cell edit: the part as it should become (one command), as the Inspector's.
    void editRequested(std::vector<lineward::Part> after, QString description);

protected:
    void showEvent(QShowEvent* e) override;

private:
    /// Refills the tables when the panel is shown; while hidden, only notes they are stale
    /// (a hidden tab costs nothing per edit).
    void refresh();
    void rebuild();
    /// A typed cell value: checked as the Inspector checks it, then asked for or refused.
    void editCell(ScheduleField field, const QString& text);
    /// The refusal line under the tables; hidden when empty.
    void showMessage(const QString& text);
    Document& m_doc;
    QTabWidget* m_tabs;
    QLabel* m_message;
    bool m_stale = true;
    bool m_onTop = true;
    std::vector<ScheduleModel*> m_models;
    std::vector<QTableView*> m_views;
    std::vector<bool> m_sized; ///< columns sized to their contents once the table had rows
};

} // namespace lineward::ui
