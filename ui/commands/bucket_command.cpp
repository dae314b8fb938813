// GroupBucketCommand: shrink the buckets the parts came from, then add the new one.
#include "commands/bucket_command.h"

#include <algorithm>

namespace lineward::ui {

GroupBucketCommand::GroupBucketCommand(Document& doc, std::vector<PartId> parts, std::string tag,
                                       double sccrKa)
    : m_doc(doc) {
    std::sort(parts.begin(), parts.end());
    m_bucket = Bucket{doc.drawing().nextBucketId(), std::move(tag), sccrKa, parts};
    for (const auto& b : doc.drawing().buckets())
        if (std::any_of(b.parts.begin(), b.parts.end(), [&](PartId p) {
                return std::find(parts.begin(), parts.end(), p) != parts.end();
            }))
            m_before.push_back(b);
    setText(QObject::tr("Group bucket %1").arg(QString::fromStdString(m_bucket.tag)));
}

void GroupBucketCommand::redo() {
    for (Bucket b : m_before) {
        std::erase_if(b.parts, [&](PartId p) {
            return std::find(m_bucket.parts.begin(), m_bucket.parts.end(), p) !=
                   m_bucket.parts.end();
        });
        m_doc.replaceBucket(b);
    }
    m_doc.addBucket(m_bucket);
}

void GroupBucketCommand::undo() {
    m_doc.removeBucket(m_bucket.id);
    for (const auto& b : m_before)
        m_doc.replaceBucket(b);
}

} // namespace lineward::ui
