// Group the selected parts into a new bucket, as one undoable edit.
#pragma once

#include "document.h"

#include <QUndoCommand>

namespace lineward::ui {

/// Makes a bucket of parts; parts already in another bucket move into the new one.
class GroupBucketCommand : public QUndoCommand {
public:
    GroupBucketCommand(Document& doc, std::vector<PartId> parts, std::string tag, double sccrKa);
    void redo() override;
    void undo() override;

private:
    Document& m_doc;
    Bucket m_bucket;
    std::vector<Bucket> m_before; ///< buckets the parts left
};

} // namespace lineward::ui
