// Findings panel: filters above, the list, the detail pane with the calculation trace.
#include "findings_panel.h"

#include "guard.h"
#include "plain_text.h"
#include "severity_style.h"

#include <QComboBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLineEdit>
#include <QMenu>
#include <QPainter>
#include <QPixmap>
#include <QPushButton>
#include <QSplitter>
#include <QTextBrowser>
#include <QTreeWidget>
#include <QVBoxLayout>

namespace lineward::ui {

namespace {
QIcon badgeIcon(Severity s) {
    // Painted at 1x, 2x and 3x so a high-DPI screen picks a sharp one, not a scaled-up blur.
    QIcon icon;
    for (int scale : {1, 2, 3}) {
        QPixmap pm(16 * scale, 16 * scale);
        pm.fill(Qt::transparent);
        QPainter p(&pm);
        p.setRenderHint(QPainter::Antialiasing);
        p.scale(scale, scale);
        p.translate(8, 8);
        p.setPen(Qt::NoPen);
        p.setBrush(severityColor(s));
        p.drawPath(severityShape(s, 14));
        p.end();
        icon.addPixmap(pm);
    }
    return icon;
}

QString partTags(const Drawing& d, const std::vector<PartId>& parts) {
    QStringList tags;
    for (auto id : parts)
        if (const Part* p = d.part(id))
            tags << QString::fromStdString(p->tag);
    return tags.join(", ");
}

// Rows carry what they show: a finding's index in the report, or a stale acceptance's index in
// the drawing.
constexpr int kStaleRole = Qt::UserRole + 1;
} // namespace

FindingsPanel::FindingsPanel(Document& doc, QWidget* parent)
    : QWidget(parent), m_doc(doc), m_severity(new QComboBox), m_rule(new QLineEdit),
      m_apply(new QPushButton(tr("Apply fix"))), m_accept(new QPushButton(tr("Accept…"))),
      m_withdraw(new QPushButton(tr("Withdraw acceptance"))), m_list(new QTreeWidget),
      m_detail(new InertTextBrowser) {
    m_list->setObjectName("findingsList");
    m_detail->setObjectName("findingDetail");
    m_apply->setObjectName("applyFix");
    m_accept->setObjectName("acceptFinding");
    m_withdraw->setObjectName("withdrawAcceptance");
    m_accept->setToolTip(tr("Accept this finding as a deviation, with a note saying why"));
    m_withdraw->setToolTip(tr("Withdraw the acceptance: the finding counts as open again"));
    m_list->setContextMenuPolicy(Qt::CustomContextMenu);
    m_rule->setObjectName("findingsFilter");
    m_severity->setObjectName("findingsSeverity");
    m_severity->addItems({tr("All severities"), tr("Violations"), tr("Violations and cautions")});
    m_rule->setPlaceholderText(tr("Filter by rule or text"));
    m_rule->setClearButtonEnabled(true);
    m_list->setColumnCount(4);
    m_list->setHeaderLabels({tr("Severity"), tr("Rule"), tr("Parts"), tr("Finding")});
    m_list->setRootIsDecorated(false);
    m_list->header()->setStretchLastSection(true);
    auto* filters = new QHBoxLayout;
    filters->addWidget(m_severity);
    filters->addWidget(m_rule, 1);
    filters->addWidget(m_apply);
    filters->addWidget(m_accept);
    filters->addWidget(m_withdraw);
    auto* split = new QSplitter(Qt::Vertical);
    split->addWidget(m_list);
    split->addWidget(m_detail);
    split->setStretchFactor(0, 3);
    split->setStretchFactor(1, 1);
    auto* lay = new QVBoxLayout(this);
    lay->setContentsMargins(0, 0, 0, 0);
    lay->addLayout(filters);
    lay->addWidget(split);
    // Every slot runs guarded (ui/guard.h): an exception is shown and logged, never fatal.
    const QString listing = tr("Listing the findings");
    connect(&doc, &Document::reportChanged, this, guarded(this, listing, [this] { refresh(); }));
    connect(m_list, &QTreeWidget::currentItemChanged, this,
            guarded(this, tr("Showing a finding"), [this] { showDetail(); }));
    connect(m_severity, &QComboBox::currentIndexChanged, this,
            guarded(this, listing, [this] { refresh(); }));
    connect(m_rule, &QLineEdit::textChanged, this, guarded(this, listing, [this] { refresh(); }));
    connect(m_apply, &QPushButton::clicked, this, guarded(this, tr("Apply fix"), [this] {
                if (const Finding* f = current())
                    emit applyFixRequested(*f);
            }));
    connect(m_accept, &QPushButton::clicked, this,
            guarded(this, tr("Accept a finding"), [this] { acceptOrWithdraw(true); }));
    connect(m_withdraw, &QPushButton::clicked, this,
            guarded(this, tr("Withdraw an acceptance"), [this] { acceptOrWithdraw(false); }));
    connect(m_list, &QTreeWidget::customContextMenuRequested, this,
            guarded(this, tr("The finding's menu"), [this](const QPoint& at) { showRowMenu(at); }));
    refresh();
}

void FindingsPanel::acceptOrWithdraw(bool accept) {
    if (auto stale = currentStale()) {
        if (!accept)
            emit withdrawStaleRequested(*stale);
        return;
    }
    const Finding* f = current();
    if (!f)
        return;
    const Finding copy = *f; // the signal's handler re-checks, which replaces the report
    if (accept && !copy.accepted)
        emit acceptRequested(copy);
    else if (!accept && copy.accepted)
        emit withdrawRequested(copy);
}

void FindingsPanel::showRowMenu(const QPoint& at) {
    QTreeWidgetItem* item = m_list->itemAt(at);
    if (!item)
        return;
    m_list->setCurrentItem(item);
    auto* menu = new QMenu(this);
    menu->setObjectName("findingMenu");
    menu->setAttribute(Qt::WA_DeleteOnClose);
    if (m_accept->isEnabled())
        connect(menu->addAction(tr("Accept…")), &QAction::triggered, this,
                guarded(this, tr("Accept a finding"), [this] { acceptOrWithdraw(true); }));
    if (m_withdraw->isEnabled())
        connect(menu->addAction(tr("Withdraw acceptance")), &QAction::triggered, this,
                guarded(this, tr("Withdraw an acceptance"), [this] { acceptOrWithdraw(false); }));
    if (m_apply->isEnabled())
        connect(menu->addAction(tr("Apply fix")), &QAction::triggered, m_apply,
                &QPushButton::click);
    if (menu->isEmpty()) {
        delete menu;
        return;
    }
    menu->popup(m_list->viewport()->mapToGlobal(at));
}

std::optional<std::size_t> FindingsPanel::currentStale() const {
    auto* item = m_list->currentItem();
    if (!item || !item->data(0, kStaleRole).toBool())
        return std::nullopt;
    const auto i = static_cast<std::size_t>(item->data(0, Qt::UserRole).toULongLong());
    return i < m_doc.drawing().accepted().size() ? std::optional(i) : std::nullopt;
}

const Finding* FindingsPanel::current() const {
    auto* item = m_list->currentItem();
    if (!item || item->data(0, kStaleRole).toBool())
        return nullptr;
    const auto i = item->data(0, Qt::UserRole).toULongLong();
    const auto& findings = m_doc.report().findings;
    return i < findings.size() ? &findings[i] : nullptr;
}

void FindingsPanel::refresh() {
    m_list->clear();
    const auto& findings = m_doc.report().findings;
    const int sev = m_severity->currentIndex();
    const QString text = m_rule->text().trimmed();
    for (std::size_t i = 0; i < findings.size(); ++i) {
        const auto& f = findings[i];
        if ((sev == 1 && f.severity != Severity::Violation) ||
            (sev == 2 && f.severity == Severity::Note))
            continue;
        const QString rule = QString::fromStdString(f.ruleId),
                      msg = QString::fromStdString(f.message);
        if (!text.isEmpty() && !rule.contains(text, Qt::CaseInsensitive) &&
            !msg.contains(text, Qt::CaseInsensitive))
            continue;
        auto* item = new QTreeWidgetItem(m_list);
        item->setIcon(0, badgeIcon(f.severity));
        item->setText(0, severityLabel(f.severity) + (f.accepted ? tr(" (accepted)") : ""));
        item->setText(1, rule);
        item->setText(2, partTags(m_doc.drawing(), f.parts));
        item->setText(3, msg);
        item->setToolTip(3, plainToolTip(msg));
        item->setData(0, Qt::UserRole, static_cast<qulonglong>(i));
    }
    addStaleRows();
    for (int c = 0; c < 3; ++c)
        m_list->resizeColumnToContents(c);
    m_detail->clear();
    refreshButtons();
}

void FindingsPanel::addStaleRows() {
    // Acceptances that no finding matches any longer: listed after the findings, so the
    // reviewer sees them and withdraws (or renews) them.
    const Drawing& d = m_doc.drawing();
    const QString text = m_rule->text().trimmed();
    for (auto i : m_doc.report().staleAccepted) {
        if (i >= d.accepted().size())
            continue;
        const Accepted& a = d.accepted()[i];
        const QString rule = QString::fromStdString(a.rule);
        const QString msg =
            tr("Stale acceptance: no finding of this rule on these parts any longer (accepted by "
               "%1, %2: %3)")
                .arg(QString::fromStdString(a.by), QString::fromStdString(a.date),
                     QString::fromStdString(a.note));
        if (!text.isEmpty() && !rule.contains(text, Qt::CaseInsensitive) &&
            !msg.contains(text, Qt::CaseInsensitive))
            continue;
        auto* item = new QTreeWidgetItem(m_list);
        item->setText(0, tr("stale acceptance"));
        item->setText(1, rule);
        item->setText(2, partTags(d, a.parts));
        item->setText(3, msg);
        item->setToolTip(3, plainToolTip(msg));
        item->setData(0, Qt::UserRole, static_cast<qulonglong>(i));
        item->setData(0, kStaleRole, true);
    }
}

void FindingsPanel::refreshButtons() {
    const Finding* f = current();
    m_apply->setEnabled(f && f->fix && !f->fix->changes.empty());
    m_accept->setEnabled(f && !f->accepted && !f->parts.empty());
    m_withdraw->setEnabled((f && f->accepted) || currentStale().has_value());
}

void FindingsPanel::showDetail() {
    refreshButtons();
    const Finding* fp = current();
    if (!fp) {
        if (auto stale = currentStale()) {
            m_detail->setPlainText(m_list->currentItem()->text(3));
            const auto& parts = m_doc.drawing().accepted()[*stale].parts;
            if (!parts.empty())
                emit locatePart(parts.front());
        }
        return;
    }
    const Finding& f = *fp;
    QString html = "<b>" + QString::fromStdString(f.ruleId).toHtmlEscaped() + "</b> · " +
                   QString::fromStdString(f.clause).toHtmlEscaped() + "<br>" +
                   QString::fromStdString(f.message).toHtmlEscaped();
    if (f.computed && f.limit)
        html +=
            "<br>computed " +
            QString::fromStdString(formatNumber(std::round(*f.computed * 100) / 100) + " " +
                                   f.unit) +
            ", limit " +
            QString::fromStdString(formatNumber(std::round(*f.limit * 100) / 100) + " " + f.unit);
    if (!f.trace.empty()) {
        html += "<table>";
        for (const auto& t : f.trace)
            html += "<tr><td>" + QString::fromStdString(t.name).toHtmlEscaped() +
                    "</td><td>&nbsp;" + QString::fromStdString(t.value).toHtmlEscaped() +
                    "</td></tr>";
        html += "</table>";
    }
    if (f.fix)
        html +=
            "<p><i>Proposed fix:</i> " + QString::fromStdString(f.fix->description).toHtmlEscaped();
    if (f.accepted)
        html += "<p><i>Accepted:</i> " + QString::fromStdString(f.acceptedNote).toHtmlEscaped();
    m_detail->setHtml(html);
    if (!f.parts.empty())
        emit locatePart(f.parts.front());
}

} // namespace lineward::ui
