// Plain-text message boxes and tooltips, and a text browser that loads nothing.
#include "plain_text.h"

#include <QMessageBox>

namespace lineward::ui {

void warnPlain(QWidget* parent, const QString& title, const QString& text) {
    QMessageBox box(QMessageBox::Warning, title, text, QMessageBox::Ok, parent);
    box.setTextFormat(Qt::PlainText);
    box.exec();
}

QString plainToolTip(const QString& text) {
    if (text.isEmpty())
        return text;
    return "<p style=\"white-space:pre\">" + text.toHtmlEscaped() + "</p>";
}

InertTextBrowser::InertTextBrowser(QWidget* parent) : QTextBrowser(parent) {
    setOpenLinks(false);
    setOpenExternalLinks(false);
}

QVariant InertTextBrowser::loadResource(int, const QUrl&) {
    return {};
}

} // namespace lineward::ui
