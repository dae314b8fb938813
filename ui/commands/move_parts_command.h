// Move (and snap) parts as one undoable edit; repeated moves of the same parts merge.
#pragma once

#include "document.h"

#include <QPointF>
#include <QUndoCommand>

namespace lineward::ui {

class MovePartsCommand : public QUndoCommand {
public:
    /// `from` and `to` are the positions before and after, one per part.
    MovePartsCommand(Document& doc, std::vector<PartId> parts, std::vector<QPointF> from,
                     std::vector<QPointF> to);
    void redo() override;
    void undo() override;
    int id() const override;
    bool mergeWith(const QUndoCommand* other) override;

private:
    void apply(const std::vector<QPointF>& pos);
    Document& m_doc;
    std::vector<PartId> m_parts;
    std::vector<QPointF> m_from, m_to;
};

} // namespace lineward::ui
