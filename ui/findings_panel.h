// The Findings panel: every finding of the last check, filtered by severity and rule, its
// trace, where it is, and Apply fix.
#pragma once

#include "document.h"

#include <QWidget>

class QComboBox;
class QLineEdit;
class QPushButton;
class QTreeWidget;
class QTextBrowser;

namespace lineward::ui {

class FindingsPanel : public QWidget {
    Q_OBJECT
public:
    explicit FindingsPanel(Document& doc, QWidget* parent = nullptr);
    QTreeWidget* list() const { return m_list; }
    /// The finding shown in the selected row, if any.
    const Finding* current() const;

signals:
    void locatePart(lineward::PartId id);
    void applyFixRequested(lineward::Finding finding);

private:
    void refresh();
    void showDetail();
    Document& m_doc;
    QComboBox* m_severity;
    QLineEdit* m_rule;
    QPushButton* m_apply;
    QTreeWidget* m_list;
    QTextBrowser* m_detail;
};

} // namespace lineward::ui
