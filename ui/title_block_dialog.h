// Title block / sheet properties: title, project, drawing number, people, units, revisions.
#pragma once

#include "document.h"

#include <QDialog>

class QLineEdit;
class QComboBox;
class QTableWidget;

namespace lineward::ui {

class TitleBlockDialog : public QDialog {
    Q_OBJECT
public:
    TitleBlockDialog(const SheetInfo& sheet, QWidget* parent = nullptr);
    SheetInfo result() const;
    /// Pushes the edit as one command when anything changed.
    void apply(Document& doc) const;

private:
    SheetInfo m_original;
    QLineEdit *m_title, *m_project, *m_number, *m_drawn, *m_checked;
    QComboBox* m_units;
    QTableWidget* m_revisions;
};

} // namespace lineward::ui
