// AddPartsCommand: redo adds parts, wires, then buckets; undo takes them away again.
#include "commands/add_parts_command.h"

namespace lineward::ui {

AddPartsCommand::AddPartsCommand(Document& doc, std::vector<Part> parts, std::vector<Wire> wires,
                                 std::vector<Bucket> buckets, const QString& text)
    : m_doc(doc), m_parts(std::move(parts)), m_wires(std::move(wires)),
      m_buckets(std::move(buckets)) {
    setText(text);
}

void AddPartsCommand::redo() {
    m_doc.addParts(m_parts);
    m_doc.addWires(m_wires);
    for (const auto& b : m_buckets)
        m_doc.addBucket(b);
}

void AddPartsCommand::undo() {
    for (auto it = m_buckets.rbegin(); it != m_buckets.rend(); ++it)
        m_doc.removeBucket(it->id);
    std::vector<WireId> wires;
    for (const auto& w : m_wires)
        wires.push_back(w.id);
    m_doc.removeWires(wires);
    std::vector<PartId> ids;
    for (const auto& p : m_parts)
        ids.push_back(p.id);
    m_doc.removeParts(ids);
}

} // namespace lineward::ui
