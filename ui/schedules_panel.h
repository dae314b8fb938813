// Schedules: motors, cables and devices with their computed values, one tab each.
#pragma once

#include "document.h"

#include <QTabWidget>

namespace lineward::ui {

class SchedulesPanel : public QTabWidget {
    Q_OBJECT
public:
    explicit SchedulesPanel(Document& doc, QWidget* parent = nullptr);

private:
    void refresh();
    Document& m_doc;
};

} // namespace lineward::ui
