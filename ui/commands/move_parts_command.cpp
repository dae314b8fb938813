// MovePartsCommand: the drag recorded start positions on press; this applies the end positions.
#include "commands/move_parts_command.h"

#include "commands/command_ids.h"

namespace lineward::ui {

MovePartsCommand::MovePartsCommand(Document& doc, std::vector<PartId> parts,
                                   std::vector<QPointF> from, std::vector<QPointF> to)
    : m_doc(doc), m_parts(std::move(parts)), m_from(std::move(from)), m_to(std::move(to)) {
    setText(m_parts.size() == 1 ? QObject::tr("Move %1").arg(
                                      QString::fromStdString(doc.drawing().part(m_parts[0])->tag))
                                : QObject::tr("Move %1 parts").arg(m_parts.size()));
}

void MovePartsCommand::apply(const std::vector<QPointF>& pos) {
    for (std::size_t i = 0; i < m_parts.size(); ++i) {
        Part p = *m_doc.drawing().part(m_parts[i]);
        p.x = pos[i].x();
        p.y = pos[i].y();
        m_doc.replacePart(p);
    }
}

void MovePartsCommand::redo() {
    apply(m_to);
}
void MovePartsCommand::undo() {
    apply(m_from);
}
int MovePartsCommand::id() const {
    return kMovePartsId;
}

bool MovePartsCommand::mergeWith(const QUndoCommand* other) {
    const auto* o = static_cast<const MovePartsCommand*>(other);
    if (o->m_parts != m_parts)
        return false;
    m_to = o->m_to;
    return true;
}

} // namespace lineward::ui
