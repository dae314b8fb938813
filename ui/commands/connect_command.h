// Connect two terminals with a wire as one undoable edit.
#pragma once

#include "document.h"

#include <QUndoCommand>

namespace lineward::ui {

class ConnectCommand : public QUndoCommand {
public:
    ConnectCommand(Document& doc, WireEnd a, WireEnd b);
    void redo() override;
    void undo() override;
    WireId wireId() const { return m_wire.id; }

private:
    Document& m_doc;
    Wire m_wire;
};

} // namespace lineward::ui
