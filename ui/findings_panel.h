// The Findings panel: every finding of the last check, its trace, and where it is.
#pragma once

#include "document.h"

#include <QWidget>

class QTreeWidget;
class QTextBrowser;

namespace lineward::ui {

/// Lists findings (worst first); selecting one shows its trace and asks to locate its part.
class FindingsPanel : public QWidget {
    Q_OBJECT
public:
    explicit FindingsPanel(Document& doc, QWidget* parent = nullptr);
    QTreeWidget* list() const { return m_list; }

signals:
    void locatePart(lineward::PartId id);

private:
    void refresh();
    void showDetail();
    Document& m_doc;
    QTreeWidget* m_list;
    QTextBrowser* m_detail;
};

} // namespace lineward::ui
