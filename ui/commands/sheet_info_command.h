// Change the title block (sheet data) as one undoable edit.
#pragma once

#include "document.h"

#include <QUndoCommand>

namespace lineward::ui {

class SheetInfoCommand : public QUndoCommand {
public:
    SheetInfoCommand(Document& doc, SheetInfo after);
    void redo() override { m_doc.setSheet(m_after); }
    void undo() override { m_doc.setSheet(m_before); }

private:
    Document& m_doc;
    SheetInfo m_before, m_after;
};

} // namespace lineward::ui
