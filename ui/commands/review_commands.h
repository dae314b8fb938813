// The reviewer's actions as undoable edits: accept a finding, withdraw an acceptance, add a
// review comment, resolve or reopen it, delete it. Each swaps the drawing's review state.
#pragma once

#include "document.h"

#include <QUndoCommand>

namespace lineward::ui {

/// The accepted deviations and comments before and after one review action. The lists are
/// short (a reviewer writes them by hand), so each command keeps both whole.
class ReviewStateCommand : public QUndoCommand {
public:
    void redo() override { m_doc.setReview(m_afterAccepted, m_afterComments); }
    void undo() override { m_doc.setReview(m_beforeAccepted, m_beforeComments); }

protected:
    explicit ReviewStateCommand(Document& doc);
    Document& m_doc;
    std::vector<Accepted> m_beforeAccepted, m_afterAccepted;
    std::vector<Comment> m_beforeComments, m_afterComments;
};

/// Accepts a finding: its rule and parts, the reviewer's name, the date and the note.
class AcceptFindingCommand : public ReviewStateCommand {
public:
    AcceptFindingCommand(Document& doc, const Finding& finding, std::string by, std::string date,
                         std::string note);
};

/// Withdraws acceptances (indexes into Drawing::accepted()): those covering a finding, or a
/// stale one.
class WithdrawAcceptanceCommand : public ReviewStateCommand {
public:
    WithdrawAcceptanceCommand(Document& doc, std::vector<std::size_t> indexes, const QString& rule);
};

/// Pins a new review comment to a part.
class AddCommentCommand : public ReviewStateCommand {
public:
    AddCommentCommand(Document& doc, PartId part, std::string by, std::string date,
                      std::string text);
    std::uint32_t commentId() const { return m_id; }

private:
    std::uint32_t m_id = 0;
};

/// Marks a comment resolved, or open again.
class ResolveCommentCommand : public ReviewStateCommand {
public:
    ResolveCommentCommand(Document& doc, std::uint32_t id, bool resolved);
};

/// Deletes a comment.
class DeleteCommentCommand : public ReviewStateCommand {
public:
    DeleteCommentCommand(Document& doc, std::uint32_t id);
};

} // namespace lineward::ui
