// Place or paste parts (with the wires and buckets among them) as one undoable edit.
#pragma once

#include "document.h"

#include <QUndoCommand>

namespace lineward::ui {

/// Adds parts, wires and buckets. Undo removes them; the command keeps the copies, so nothing
/// is owned by anyone else while undone.
class AddPartsCommand : public QUndoCommand {
public:
    AddPartsCommand(Document& doc, std::vector<Part> parts, std::vector<Wire> wires,
                    std::vector<Bucket> buckets, const QString& text);
    void redo() override;
    void undo() override;

private:
    Document& m_doc;
    std::vector<Part> m_parts;
    std::vector<Wire> m_wires;
    std::vector<Bucket> m_buckets;
};

} // namespace lineward::ui
