// DeleteCommand: undo restores parts, then wires, then the buckets and the review state exactly
// as they were.
#include "commands/delete_command.h"

#include <algorithm>
#include <set>

namespace lineward::ui {

DeleteCommand::DeleteCommand(Document& doc, std::vector<PartId> parts, std::vector<WireId> wires)
    : m_doc(doc), m_acceptedBefore(doc.drawing().accepted()),
      m_commentsBefore(doc.drawing().comments()) {
    const Drawing& d = doc.drawing();
    std::set<std::uint32_t> partSet;
    for (auto id : parts)
        if (const Part* p = d.part(id)) {
            m_parts.push_back(*p);
            partSet.insert(id.value);
        }
    std::set<std::uint32_t> wireSet;
    for (auto id : wires)
        wireSet.insert(id.value);
    for (const auto& w : d.wires())
        if (wireSet.count(w.id.value) || partSet.count(w.a.part.value) ||
            partSet.count(w.b.part.value))
            m_wires.push_back(w);
    for (const auto& b : d.buckets())
        if (std::any_of(b.parts.begin(), b.parts.end(),
                        [&](PartId p) { return partSet.count(p.value) > 0; }))
            m_bucketsBefore.push_back(b);
    std::sort(m_parts.begin(), m_parts.end(),
              [](const Part& a, const Part& b) { return a.id < b.id; });
    setText(
        m_parts.size() + m_wires.size() == 1
            ? QObject::tr("Delete %1")
                  .arg(m_parts.empty() ? QObject::tr("wire")
                                       : QString::fromStdString(m_parts.front().tag))
            : QObject::tr("Delete %1 parts and %2 wires").arg(m_parts.size()).arg(m_wires.size()));
}

void DeleteCommand::redo() {
    std::vector<WireId> wires;
    for (const auto& w : m_wires)
        wires.push_back(w.id);
    std::vector<PartId> parts;
    for (const auto& p : m_parts)
        parts.push_back(p.id);
    m_doc.removeWires(wires);
    m_doc.removeParts(parts);
}

void DeleteCommand::undo() {
    m_doc.addParts(m_parts);
    m_doc.addWires(m_wires);
    m_doc.replaceBuckets(m_bucketsBefore);
    if (m_doc.drawing().accepted() != m_acceptedBefore ||
        m_doc.drawing().comments() != m_commentsBefore)
        m_doc.setReview(m_acceptedBefore, m_commentsBefore);
}

} // namespace lineward::ui
