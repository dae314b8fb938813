// SheetInfoCommand: the whole title block before and after.
#include "commands/sheet_info_command.h"

namespace lineward::ui {

SheetInfoCommand::SheetInfoCommand(Document& doc, SheetInfo after)
    : m_doc(doc), m_before(doc.drawing().sheet), m_after(std::move(after)) {
    setText(QObject::tr("Edit title block"));
}

} // namespace lineward::ui
