// SetFieldsCommand: copies of the parts before and after.
#include "commands/set_fields_command.h"

namespace lineward::ui {

SetFieldsCommand::SetFieldsCommand(Document& doc, std::vector<Part> after, const QString& text)
    : m_doc(doc), m_after(std::move(after)) {
    for (const auto& p : m_after)
        m_before.push_back(*doc.drawing().part(p.id));
    setText(text);
}

void SetFieldsCommand::redo() {
    for (const auto& p : m_after)
        m_doc.replacePart(p);
}

void SetFieldsCommand::undo() {
    for (const auto& p : m_before)
        m_doc.replacePart(p);
}

} // namespace lineward::ui
