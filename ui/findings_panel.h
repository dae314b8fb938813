// The Findings panel: every finding of the last check, filtered by severity and rule, its
// trace, where it is, and Apply fix.
#pragma once

#include "document.h"

#include <QWidget>
#include <optional>

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
    /// The stale acceptance shown in the selected row (index into Drawing::accepted()), if any.
    std::optional<std::size_t> currentStale() const;

signals:
    void locatePart(lineward::PartId id);
    void applyFixRequested(lineward::Finding finding);
    /// Accept… on an open finding (button or the row's menu).
    void acceptRequested(lineward::Finding finding);
    /// Withdraw acceptance on an accepted finding.
    void withdrawRequested(lineward::Finding finding);
    /// Withdraw a stale acceptance (index into Drawing::accepted()).
    void withdrawStaleRequested(std::size_t index);

private:
    void refresh();
    void showDetail();
    void addStaleRows();
    void refreshButtons();
    void showRowMenu(const QPoint& at);
    void acceptOrWithdraw(bool accept);
    Document& m_doc;
    QComboBox* m_severity;
    QLineEdit* m_rule;
    QPushButton* m_apply;
    QPushButton* m_accept;
    QPushButton* m_withdraw;
    QTreeWidget* m_list;
    QTextBrowser* m_detail;
};

} // namespace lineward::ui
