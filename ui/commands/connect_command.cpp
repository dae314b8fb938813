// ConnectCommand: the wire id is taken when the command is made, so redo reuses it.
#include "commands/connect_command.h"

namespace lineward::ui {

ConnectCommand::ConnectCommand(Document& doc, WireEnd a, WireEnd b)
    : m_doc(doc), m_wire{doc.drawing().nextWireId(), a, b} {
    const auto tagOf = [&](PartId id) {
        return QString::fromStdString(doc.drawing().part(id)->tag);
    };
    setText(QObject::tr("Connect %1 to %2").arg(tagOf(a.part), tagOf(b.part)));
}

void ConnectCommand::redo() {
    m_doc.addWire(m_wire);
}
void ConnectCommand::undo() {
    m_doc.removeWire(m_wire.id);
}

} // namespace lineward::ui
