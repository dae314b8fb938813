// Change ratings, tags or rotation of parts as one undoable edit (Inspector, Apply fix, Rotate).
#pragma once

#include "document.h"

#include <QUndoCommand>

namespace lineward::ui {

/// Replaces whole parts by edited copies; undo puts the originals back.
class SetFieldsCommand : public QUndoCommand {
public:
    SetFieldsCommand(Document& doc, std::vector<Part> after, const QString& text);
    void redo() override;
    void undo() override;

private:
    Document& m_doc;
    std::vector<Part> m_before, m_after;
};

} // namespace lineward::ui
