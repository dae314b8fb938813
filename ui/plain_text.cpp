// Plain-text tooltips, and a text browser that loads nothing.
#include "plain_text.h"

namespace lineward::ui {

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
