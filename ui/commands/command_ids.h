// Merge ids of the undo commands that merge (QUndoCommand::id).
#pragma once

namespace lineward::ui {

enum CommandId { kMovePartsId = 1 };

} // namespace lineward::ui
