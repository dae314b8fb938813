// Findings panel: a tree of findings above a detail pane with the calculation trace.
#include "findings_panel.h"

#include "severity_style.h"

#include <QHeaderView>
#include <QPixmap>
#include <QPainter>
#include <QSplitter>
#include <QTextBrowser>
#include <QTreeWidget>
#include <QVBoxLayout>

namespace lineward::ui {

namespace {
QIcon badgeIcon(Severity s) {
    QPixmap pm(16, 16);
    pm.fill(Qt::transparent);
    QPainter p(&pm);
    p.setRenderHint(QPainter::Antialiasing);
    p.translate(8, 8);
    p.setPen(Qt::NoPen);
    p.setBrush(severityColor(s));
    p.drawPath(severityShape(s, 14));
    return QIcon(pm);
}

QString partTags(const Drawing& d, const Finding& f) {
    QStringList tags;
    for (auto id : f.parts)
        if (const Part* p = d.part(id))
            tags << QString::fromStdString(p->tag);
    return tags.join(", ");
}
} // namespace

FindingsPanel::FindingsPanel(Document& doc, QWidget* parent)
    : QWidget(parent), m_doc(doc), m_list(new QTreeWidget), m_detail(new QTextBrowser) {
    m_list->setObjectName("findingsList");
    m_list->setColumnCount(4);
    m_list->setHeaderLabels({tr("Severity"), tr("Rule"), tr("Parts"), tr("Finding")});
    m_list->setRootIsDecorated(false);
    m_list->header()->setStretchLastSection(true);
    m_detail->setObjectName("findingDetail");
    auto* split = new QSplitter(Qt::Vertical);
    split->addWidget(m_list);
    split->addWidget(m_detail);
    split->setStretchFactor(0, 3);
    split->setStretchFactor(1, 2);
    auto* lay = new QVBoxLayout(this);
    lay->setContentsMargins(0, 0, 0, 0);
    lay->addWidget(split);
    connect(&doc, &Document::reportChanged, this, &FindingsPanel::refresh);
    connect(m_list, &QTreeWidget::currentItemChanged, this, &FindingsPanel::showDetail);
    refresh();
}

void FindingsPanel::refresh() {
    m_list->clear();
    const auto& findings = m_doc.report().findings;
    for (std::size_t i = 0; i < findings.size(); ++i) {
        const auto& f = findings[i];
        auto* item = new QTreeWidgetItem(m_list);
        item->setIcon(0, badgeIcon(f.severity));
        item->setText(0, severityLabel(f.severity) + (f.accepted ? tr(" (accepted)") : ""));
        item->setText(1, QString::fromStdString(f.ruleId));
        item->setText(2, partTags(m_doc.drawing(), f));
        item->setText(3, QString::fromStdString(f.message));
        item->setData(0, Qt::UserRole, static_cast<qulonglong>(i));
    }
    for (int c = 0; c < 3; ++c)
        m_list->resizeColumnToContents(c);
    m_detail->clear();
}

void FindingsPanel::showDetail() {
    auto* item = m_list->currentItem();
    if (!item)
        return;
    const auto i = item->data(0, Qt::UserRole).toULongLong();
    const auto& findings = m_doc.report().findings;
    if (i >= findings.size())
        return;
    const Finding& f = findings[i];
    QString html = "<b>" + QString::fromStdString(f.ruleId).toHtmlEscaped() + "</b> · " +
                   QString::fromStdString(f.clause).toHtmlEscaped() + "<br>" +
                   QString::fromStdString(f.message).toHtmlEscaped();
    if (f.computed && f.limit)
        html += "<br>computed " + QString::fromStdString(formatNumber(*f.computed) + " " + f.unit) +
                ", limit " + QString::fromStdString(formatNumber(*f.limit) + " " + f.unit);
    if (!f.trace.empty()) {
        html += "<table>";
        for (const auto& t : f.trace)
            html += "<tr><td>" + QString::fromStdString(t.name).toHtmlEscaped() +
                    "</td><td>&nbsp;" + QString::fromStdString(t.value).toHtmlEscaped() +
                    "</td></tr>";
        html += "</table>";
    }
    if (f.fix)
        html += "<p><i>Proposed fix:</i> " + QString::fromStdString(f.fix->description).toHtmlEscaped();
    if (f.accepted)
        html += "<p><i>Accepted:</i> " + QString::fromStdString(f.acceptedNote).toHtmlEscaped();
    m_detail->setHtml(html);
    if (!f.parts.empty())
        emit locatePart(f.parts.front());
}

} // namespace lineward::ui
