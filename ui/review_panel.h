// The Review panel: every review comment of the drawing (number, part, author, date, status,
// text); a click selects and centres the part; Resolve/Reopen and Delete act on the selected one.
#pragma once

#include "document.h"

#include <QWidget>
#include <optional>

class QPushButton;
class QTreeWidget;

namespace lineward::ui {

class ReviewPanel : public QWidget {
    Q_OBJECT
public:
    explicit ReviewPanel(Document& doc, QWidget* parent = nullptr);
    QTreeWidget* list() const { return m_list; }
    /// The comment of the selected row, if any.
    std::optional<Comment> current() const;

signals:
    void locatePart(lineward::PartId id);
    /// Add… : a comment on the part selected on the Sheet.
    void addRequested();
    void resolveRequested(std::uint32_t id, bool resolved);
    void deleteRequested(std::uint32_t id);

private:
    void refresh();
    void refreshButtons();
    Document& m_doc;
    QTreeWidget* m_list;
    QPushButton* m_add;
    QPushButton* m_resolve;
    QPushButton* m_delete;
};

} // namespace lineward::ui
