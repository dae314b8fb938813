// The reviewer's dialogs: their name (asked once, kept in the program's settings) and the note
// of an acceptance or a review comment (an empty note is refused with the reason).
#pragma once

#include <QDialog>
#include <QString>

class QLabel;
class QLineEdit;
class QPlainTextEdit;

namespace lineward::ui {

/// The settings key of the reviewer's name (QSettings, the user's scope).
inline constexpr const char* kReviewerNameKey = "review/name";

/// The reviewer's name from the settings; asked once (and stored) when there is none. Empty
/// where the reviewer cancelled.
QString reviewerName(QWidget* parent);
/// Asks for the reviewer's name again (Edit → Reviewer Name…), the current one filled in.
QString askReviewerName(QWidget* parent);

/// Asks for a note: the text of a review comment or why a deviation is acceptable. The subject
/// (a finding or a part, from the drawing) is shown as plain text.
class ReviewNoteDialog : public QDialog {
    Q_OBJECT
public:
    ReviewNoteDialog(const QString& title, const QString& subject, const QString& prompt,
                     const QString& emptyReason, QWidget* parent = nullptr);
    /// The note, trimmed.
    QString note() const;
    void accept() override;

private:
    QPlainTextEdit* m_note;
    QLabel* m_message;
    QString m_emptyReason;
};

/// The longest note taken (characters): the file keeps texts under 4,096 bytes.
inline constexpr int kMaxNoteChars = 1000;

} // namespace lineward::ui
