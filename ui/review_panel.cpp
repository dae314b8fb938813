// Review panel: rows follow the Document's review state; all text is plain (it is the file's).
#include "review_panel.h"

#include "guard.h"
#include "plain_text.h"

#include <QHBoxLayout>
#include <QHeaderView>
#include <QKeyEvent>
#include <QPushButton>
#include <QSignalBlocker>
#include <QTreeWidget>
#include <QVBoxLayout>

namespace lineward::ui {

ReviewPanel::ReviewPanel(Document& doc, QWidget* parent)
    : QWidget(parent), m_doc(doc), m_list(new QTreeWidget), m_add(new QPushButton(tr("Add…"))),
      m_resolve(new QPushButton(tr("Resolve"))), m_delete(new QPushButton(tr("Delete"))) {
    setObjectName("reviewPanel");
    m_list->setObjectName("commentsList");
    m_add->setObjectName("addComment");
    m_resolve->setObjectName("resolveComment");
    m_delete->setObjectName("deleteComment");
    m_add->setToolTip(tr("Pin a comment to the part selected on the Sheet"));
    m_list->setColumnCount(6);
    m_list->setHeaderLabels(
        {tr("#"), tr("Part"), tr("By"), tr("Date"), tr("Status"), tr("Comment")});
    m_list->setRootIsDecorated(false);
    m_list->header()->setStretchLastSection(true);
    auto* buttons = new QHBoxLayout;
    buttons->addWidget(m_add);
    buttons->addWidget(m_resolve);
    buttons->addWidget(m_delete);
    buttons->addStretch(1);
    auto* lay = new QVBoxLayout(this);
    lay->setContentsMargins(0, 0, 0, 0);
    lay->addLayout(buttons);
    lay->addWidget(m_list);
    const QString listing = tr("Listing the review comments");
    connect(&doc, &Document::reviewChanged, this, guarded(this, listing, [this] { refresh(); }));
    connect(&doc, &Document::drawingReset, this, guarded(this, listing, [this] { refresh(); }));
    // A part's tag may change: the Part column follows.
    connect(&doc, &Document::partChanged, this, guarded(this, listing, [this] { refresh(); }));
    connect(m_list, &QTreeWidget::currentItemChanged, this,
            guarded(this, tr("Showing a comment"), [this] {
                refreshButtons();
                if (auto c = current())
                    emit locatePart(c->part);
            }));
    connect(m_add, &QPushButton::clicked, this,
            guarded(this, tr("Add a comment"), [this] { emit addRequested(); }));
    connect(m_resolve, &QPushButton::clicked, this, guarded(this, tr("Resolve a comment"), [this] {
                if (auto c = current())
                    emit resolveRequested(c->id, !c->resolved);
            }));
    connect(m_delete, &QPushButton::clicked, this, guarded(this, tr("Delete a comment"), [this] {
                if (auto c = current())
                    emit deleteRequested(c->id);
            }));
    refresh();
}

std::optional<Comment> ReviewPanel::current() const {
    auto* item = m_list->currentItem();
    if (!item)
        return std::nullopt;
    const auto id = item->data(0, Qt::UserRole).toUInt();
    for (const auto& c : m_doc.drawing().comments())
        if (c.id == id)
            return c;
    return std::nullopt;
}

void ReviewPanel::refresh() {
    // Keep the selected comment selected across the refresh (Resolve stays where it was).
    const auto keep = current();
    const QSignalBlocker quiet(m_list); // no locate for rows being rebuilt
    m_list->clear();
    const Drawing& d = m_doc.drawing();
    for (const auto& c : d.comments()) {
        const Part* p = d.part(c.part);
        auto* item = new QTreeWidgetItem(m_list);
        const QString text = QString::fromStdString(c.text);
        item->setText(0, "C" + QString::number(c.id));
        item->setText(1, p ? QString::fromStdString(p->tag) : QString());
        item->setText(2, QString::fromStdString(c.by));
        item->setText(3, QString::fromStdString(c.date));
        item->setText(4, c.resolved ? tr("resolved") : tr("open"));
        item->setText(5, text.simplified());
        item->setToolTip(5, plainToolTip(text));
        item->setData(0, Qt::UserRole, c.id);
        if (keep && keep->id == c.id)
            m_list->setCurrentItem(item);
    }
    for (int c = 0; c < 5; ++c)
        m_list->resizeColumnToContents(c);
    refreshButtons();
}

void ReviewPanel::refreshButtons() {
    const auto c = current();
    m_resolve->setEnabled(c.has_value());
    m_delete->setEnabled(c.has_value());
    m_resolve->setText(c && c->resolved ? tr("Reopen") : tr("Resolve"));
}

} // namespace lineward::ui
