// AddPartsCommand: redo adds in id order; undo removes in reverse.
#include "commands/add_parts_command.h"

namespace lineward::ui {

AddPartsCommand::AddPartsCommand(Document& doc, std::vector<Part> parts, std::vector<Wire> wires,
                                 std::vector<Bucket> buckets, const QString& text)
    : m_doc(doc), m_parts(std::move(parts)), m_wires(std::move(wires)),
      m_buckets(std::move(buckets)) {
    setText(text);
}

void AddPartsCommand::redo() {
    for (const auto& p : m_parts)
        m_doc.addPart(p);
    for (const auto& w : m_wires)
        m_doc.addWire(w);
    for (const auto& b : m_buckets)
        m_doc.addBucket(b);
}

void AddPartsCommand::undo() {
    for (auto it = m_buckets.rbegin(); it != m_buckets.rend(); ++it)
        m_doc.removeBucket(it->id);
    for (auto it = m_wires.rbegin(); it != m_wires.rend(); ++it)
        m_doc.removeWire(it->id);
    for (auto it = m_parts.rbegin(); it != m_parts.rend(); ++it)
        m_doc.removePart(it->id);
}

} // namespace lineward::ui
