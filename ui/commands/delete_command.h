// Delete parts and wires (the selection) as one undoable edit.
#pragma once

#include "document.h"

#include <QUndoCommand>

namespace lineward::ui {

/// Removes parts (with every wire on them) and single wires. It keeps the removed parts, wires
/// and the buckets as they were, and owns them while the deletion stands.
class DeleteCommand : public QUndoCommand {
public:
    DeleteCommand(Document& doc, std::vector<PartId> parts, std::vector<WireId> wires);
    void redo() override;
    void undo() override;

private:
    Document& m_doc;
    std::vector<Part> m_parts;
    std::vector<Wire> m_wires;
    std::vector<Bucket> m_bucketsBefore;
    // The parts leave the accepted deviations and take their comments with them (core); undo
    // puts the review state back as it was.
    std::vector<Accepted> m_acceptedBefore;
    std::vector<Comment> m_commentsBefore;
};

} // namespace lineward::ui
