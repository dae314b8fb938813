// Review commands: each builds the review state after its action from the one before it.
#include "commands/review_commands.h"

#include <algorithm>

namespace lineward::ui {

ReviewStateCommand::ReviewStateCommand(Document& doc)
    : m_doc(doc), m_beforeAccepted(doc.drawing().accepted()),
      m_afterAccepted(doc.drawing().accepted()), m_beforeComments(doc.drawing().comments()),
      m_afterComments(doc.drawing().comments()) {}

AcceptFindingCommand::AcceptFindingCommand(Document& doc, const Finding& finding, std::string by,
                                           std::string date, std::string note)
    : ReviewStateCommand(doc) {
    m_afterAccepted.push_back(
        {finding.ruleId, finding.parts, std::move(by), std::move(date), std::move(note)});
    setText(QObject::tr("Accept %1").arg(QString::fromStdString(finding.ruleId)));
}

WithdrawAcceptanceCommand::WithdrawAcceptanceCommand(Document& doc,
                                                     std::vector<std::size_t> indexes,
                                                     const QString& rule)
    : ReviewStateCommand(doc) {
    std::sort(indexes.begin(), indexes.end());
    indexes.erase(std::unique(indexes.begin(), indexes.end()), indexes.end());
    for (auto it = indexes.rbegin(); it != indexes.rend(); ++it)
        if (*it < m_afterAccepted.size())
            m_afterAccepted.erase(m_afterAccepted.begin() + static_cast<std::ptrdiff_t>(*it));
    setText(QObject::tr("Withdraw acceptance of %1").arg(rule));
}

AddCommentCommand::AddCommentCommand(Document& doc, PartId part, std::string by, std::string date,
                                     std::string text)
    : ReviewStateCommand(doc), m_id(doc.drawing().nextCommentId()) {
    m_afterComments.push_back({m_id, part, std::move(by), std::move(date), std::move(text), false});
    const Part* p = doc.drawing().part(part);
    setText(QObject::tr("Comment on %1").arg(p ? QString::fromStdString(p->tag) : QString()));
}

ResolveCommentCommand::ResolveCommentCommand(Document& doc, std::uint32_t id, bool resolved)
    : ReviewStateCommand(doc) {
    for (auto& c : m_afterComments)
        if (c.id == id)
            c.resolved = resolved;
    setText(resolved ? QObject::tr("Resolve comment C%1").arg(id)
                     : QObject::tr("Reopen comment C%1").arg(id));
}

DeleteCommentCommand::DeleteCommentCommand(Document& doc, std::uint32_t id)
    : ReviewStateCommand(doc) {
    std::erase_if(m_afterComments, [id](const Comment& c) { return c.id == id; });
    setText(QObject::tr("Delete comment C%1").arg(id));
}

} // namespace lineward::ui
