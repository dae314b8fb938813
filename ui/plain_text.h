// Showing text that came from a file: always as plain text, never as rich text that could load
// an image or another file (a tag such as <img src="/dev/zero">).
#pragma once

#include <QString>
#include <QTextBrowser>

class QWidget;

namespace lineward::ui {

// Message boxes with plain text: plainMessage in guard.h.

/// A tooltip that shows `text` literally (line breaks kept). Qt guesses whether a tooltip is
/// rich text; this escapes it, so any markup inside is shown, not obeyed.
QString plainToolTip(const QString& text);

/// A text browser for our own escaped HTML that never loads a resource: no image, style sheet
/// or linked file is read, and links do not navigate.
class InertTextBrowser : public QTextBrowser {
    Q_OBJECT
public:
    explicit InertTextBrowser(QWidget* parent = nullptr);
    QVariant loadResource(int type, const QUrl& name) override;
};

} // namespace lineward::ui
