// Reviewer name and note dialogs. Text from the drawing is shown as plain text.
#include "review_dialogs.h"

#include <QDialogButtonBox>
#include <QKeyEvent>
#include <QLabel>
#include <QLineEdit>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QSettings>
#include <QVBoxLayout>

namespace lineward::ui {

namespace {

// A name dialog: one line; Enter takes it; an empty name is refused with the reason.
class NameDialog : public QDialog {
public:
    NameDialog(const QString& current, QWidget* parent)
        : QDialog(parent), m_name(new QLineEdit(current)), m_message(new QLabel) {
        setObjectName("reviewerNameDialog");
        setWindowTitle(tr("Reviewer"));
        m_name->setObjectName("reviewerName");
        m_name->setMaxLength(100);
        m_message->setObjectName("reviewerNameMessage");
        m_message->setTextFormat(Qt::PlainText);
        auto* prompt = new QLabel(tr("Your name, as it is recorded with your acceptances and "
                                     "review comments (asked once; Edit → Reviewer Name… "
                                     "changes it):"));
        prompt->setWordWrap(true);
        auto* buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel);
        connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
        connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
        auto* lay = new QVBoxLayout(this);
        lay->addWidget(prompt);
        lay->addWidget(m_name);
        lay->addWidget(m_message);
        lay->addWidget(buttons);
    }
    QString name() const { return m_name->text().simplified(); }
    void accept() override {
        if (name().isEmpty()) {
            m_message->setText(tr("A name is needed: the file records who accepted or commented."));
            return;
        }
        QDialog::accept();
    }

private:
    QLineEdit* m_name;
    QLabel* m_message;
};

QString askName(QWidget* parent, const QString& current) {
    NameDialog dialog(current, parent);
    if (dialog.exec() != QDialog::Accepted)
        return {};
    QSettings().setValue(kReviewerNameKey, dialog.name());
    return dialog.name();
}

} // namespace

QString reviewerName(QWidget* parent) {
    const QString stored = QSettings().value(kReviewerNameKey).toString().simplified();
    return stored.isEmpty() ? askName(parent, {}) : stored;
}

QString askReviewerName(QWidget* parent) {
    return askName(parent, QSettings().value(kReviewerNameKey).toString());
}

ReviewNoteDialog::ReviewNoteDialog(const QString& title, const QString& subject,
                                   const QString& prompt, const QString& emptyReason,
                                   QWidget* parent)
    : QDialog(parent), m_note(new QPlainTextEdit), m_message(new QLabel),
      m_emptyReason(emptyReason) {
    setObjectName("reviewNoteDialog");
    setWindowTitle(title);
    auto* what = new QLabel(subject);
    what->setTextFormat(Qt::PlainText); // the subject quotes the drawing
    what->setWordWrap(true);
    what->setObjectName("reviewSubject");
    auto* ask = new QLabel(prompt);
    ask->setWordWrap(true);
    m_note->setObjectName("reviewNote");
    m_note->setTabChangesFocus(true);
    m_note->setMinimumWidth(420);
    m_note->setFixedHeight(90);
    m_message->setObjectName("reviewMessage");
    m_message->setTextFormat(Qt::PlainText);
    m_message->setWordWrap(true);
    m_message->setStyleSheet("color: #a3321a");
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel);
    buttons->button(QDialogButtonBox::Ok)->setObjectName("reviewOk");
    connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    auto* lay = new QVBoxLayout(this);
    lay->addWidget(what);
    lay->addWidget(ask);
    lay->addWidget(m_note);
    lay->addWidget(m_message);
    lay->addWidget(buttons);
}

QString ReviewNoteDialog::note() const {
    return m_note->toPlainText().trimmed();
}

void ReviewNoteDialog::accept() {
    if (note().isEmpty()) {
        m_message->setText(m_emptyReason);
        m_note->setFocus();
        return;
    }
    if (note().size() > kMaxNoteChars) {
        m_message->setText(tr("The note is %1 characters long; %2 are kept in the file. Shorten "
                              "it.")
                               .arg(note().size())
                               .arg(kMaxNoteChars));
        return;
    }
    QDialog::accept();
}

} // namespace lineward::ui
