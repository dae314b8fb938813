// Schedules: motors, cables and devices with their computed values, one tab each.
#pragma once

#include "document.h"

#include <QTabWidget>

namespace lineward::ui {

class SchedulesPanel : public QTabWidget {
    Q_OBJECT
public:
    explicit SchedulesPanel(Document& doc, QWidget* parent = nullptr);

protected:
    void showEvent(QShowEvent* e) override;

private:
    /// Rebuilds the tables when the panel is shown; while hidden, only notes they are stale
    /// (a hidden tab costs nothing per edit).
    void refresh();
    void rebuild();
    Document& m_doc;
    bool m_stale = true;
};

} // namespace lineward::ui
