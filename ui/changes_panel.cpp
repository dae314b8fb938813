// Changes panel rows: one group per kind of difference, one row per part, wire, bucket, value
// or finding; every text is plain (tree items never interpret markup) and comes from the
// comparison.
#include "changes_panel.h"

#include "compare/compare_format.h"

#include <QHeaderView>
#include <QKeyEvent>
#include <QLabel>
#include <QPushButton>
#include <QTreeWidget>
#include <QVBoxLayout>

namespace lineward::ui {

namespace {

QString q(const std::string& s) {
    return QString::fromStdString(s);
}

QString changesText(const std::vector<ValueChange>& fields) {
    QStringList parts;
    for (const auto& v : fields)
        parts << q(v.key) + " " + q(valueText(v.oldValue)) + " → " + q(valueText(v.newValue));
    return parts.join("; ");
}

QString tagsText(const std::vector<std::string>& tags) {
    QStringList out;
    for (const auto& t : tags)
        out << q(t);
    return out.join(", ");
}

QString findingText(const FindingRef& f) {
    return q(std::string(severityName(f.severity))) + " · " + q(f.rule) + " · " + q(f.message);
}

QTreeWidgetItem* group(QTreeWidget* list, const QString& title, std::size_t count) {
    auto* g = new QTreeWidgetItem(list, {QString("%1 (%2)").arg(title).arg(count)});
    g->setFirstColumnSpanned(true);
    g->setExpanded(true);
    return g;
}

QTreeWidgetItem* row(QTreeWidgetItem* parent, const QString& what, const QString& detail) {
    auto* r = new QTreeWidgetItem(parent, {what, detail});
    r->setToolTip(1, detail);
    return r;
}

void partRows(QTreeWidget* list, const QString& title, const std::vector<PartOnOneSide>& parts,
              bool onSheet) {
    if (parts.empty())
        return;
    auto* g = group(list, title, parts.size());
    for (const auto& p : parts) {
        auto* r = row(g, q(partTagOrId(p.part)), q(std::string(kindInfo(p.part.kind).name)));
        if (onSheet)
            r->setData(0, ChangesPanel::kPartRole, p.part.id.value);
        else // a removed part: where its ghost stands
            r->setData(0, ChangesPanel::kPlaceRole, QPointF(p.part.x, p.part.y));
    }
}

void wireRows(QTreeWidget* list, const QString& title, const std::vector<WireOnOneSide>& wires,
              bool onSheet) {
    if (wires.empty())
        return;
    auto* g = group(list, title, wires.size());
    for (const auto& w : wires) {
        auto* r =
            row(g, QObject::tr("wire %1").arg(w.id.value),
                q(w.a.tag) + "." + q(w.a.terminal) + " – " + q(w.b.tag) + "." + q(w.b.terminal));
        if (onSheet)
            r->setData(0, ChangesPanel::kPartRole, w.a.part.value);
    }
}

void bucketRows(QTreeWidget* list, const QString& title,
                const std::vector<BucketOnOneSide>& buckets) {
    if (buckets.empty())
        return;
    auto* g = group(list, title, buckets.size());
    for (const auto& b : buckets)
        row(g, q(b.tag), tagsText(b.partTags));
}

void valueRows(QTreeWidget* list, const QString& title, const std::vector<ValueChange>& values) {
    if (values.empty())
        return;
    auto* g = group(list, title, values.size());
    for (const auto& v : values)
        row(g, q(v.key), q(valueText(v.oldValue)) + " → " + q(valueText(v.newValue)));
}

// A new finding's part is on the Sheet; a resolved one's is found through the pairing, or is
// a removed part's ghost.
void findingRows(QTreeWidget* list, const QString& title, const std::vector<FindingRef>& findings,
                 const DrawingComparison& c, bool onSheet) {
    if (findings.empty())
        return;
    auto* g = group(list, title, findings.size());
    for (const auto& f : findings) {
        auto* r = row(g, tagsText(f.tags), findingText(f));
        if (f.parts.empty())
            continue;
        if (onSheet) {
            r->setData(0, ChangesPanel::kPartRole, f.parts.front().value);
        } else if (auto it = c.pairedParts.find(f.parts.front()); it != c.pairedParts.end()) {
            r->setData(0, ChangesPanel::kPartRole, it->second.value);
        } else {
            for (const auto& p : c.partsRemoved)
                if (p.part.id == f.parts.front())
                    r->setData(0, ChangesPanel::kPlaceRole, QPointF(p.part.x, p.part.y));
        }
    }
}

QString commentText(const CommentRef& x) {
    return (x.resolved ? QObject::tr("resolved") : QObject::tr("open")) + " · " + q(x.by) + " " +
           q(x.date) + ": " + q(x.text);
}

// Review comments: an added or changed one's part is on the Sheet; a removed one's is found
// through the pairing when its part is still there.
void commentRows(QTreeWidget* list, const DrawingComparison& c) {
    auto oneSide = [&](const QString& title, const std::vector<CommentRef>& items, bool onSheet) {
        if (items.empty())
            return;
        auto* g = group(list, title, items.size());
        for (const auto& x : items) {
            auto* r = row(g, "C" + QString::number(x.id) + " · " + q(x.tag), commentText(x));
            if (onSheet)
                r->setData(0, ChangesPanel::kPartRole, x.part.value);
            else if (auto it = c.pairedParts.find(x.part); it != c.pairedParts.end())
                r->setData(0, ChangesPanel::kPartRole, it->second.value);
        }
    };
    oneSide(QObject::tr("Comments added"), c.commentsAdded, true);
    oneSide(QObject::tr("Comments removed"), c.commentsRemoved, false);
    if (c.commentsChanged.empty())
        return;
    auto* g = group(list, QObject::tr("Comments changed"), c.commentsChanged.size());
    for (const auto& x : c.commentsChanged)
        row(g, "C" + QString::number(x.newId) + " · " + q(x.tag), changesText(x.fields))
            ->setData(0, ChangesPanel::kPartRole, x.part.value);
}

} // namespace

ChangesPanel::ChangesPanel(QWidget* parent)
    : QWidget(parent), m_header(new QLabel), m_leave(new QPushButton(tr("Leave Compare"))),
      m_list(new QTreeWidget) {
    setObjectName("changesPanel");
    m_header->setObjectName("changesHeader");
    m_header->setTextFormat(Qt::PlainText);
    m_header->setWordWrap(true);
    m_leave->setObjectName("leaveCompare");
    m_list->setObjectName("changesList");
    m_list->setColumnCount(2);
    m_list->setHeaderLabels({tr("Part or item"), tr("Change")});
    m_list->header()->setSectionResizeMode(0, QHeaderView::ResizeToContents);
    m_list->setRootIsDecorated(true);
    auto* layout = new QVBoxLayout(this);
    auto* top = new QHBoxLayout;
    top->addWidget(m_header, 1);
    top->addWidget(m_leave);
    layout->addLayout(top);
    layout->addWidget(m_list);
    connect(m_leave, &QPushButton::clicked, this, &ChangesPanel::leaveRequested);
    connect(m_list, &QTreeWidget::itemClicked, this, &ChangesPanel::rowActivated);
    connect(m_list, &QTreeWidget::itemActivated, this, &ChangesPanel::rowActivated);
    // Esc in the list (which would otherwise take it as a key to search for) leaves compare
    // mode, as it does anywhere else in the panel (keyPressEvent).
    m_list->installEventFilter(this);
}

bool ChangesPanel::eventFilter(QObject* watched, QEvent* event) {
    const bool key = event->type() == QEvent::KeyPress || event->type() == QEvent::ShortcutOverride;
    if (watched == m_list && key && static_cast<QKeyEvent*>(event)->key() == Qt::Key_Escape) {
        // Claim Esc before the window's own Esc command (Cancel Placing) takes it as a shortcut.
        event->accept();
        if (event->type() == QEvent::KeyPress)
            emit leaveRequested();
        return true;
    }
    return QWidget::eventFilter(watched, event);
}

void ChangesPanel::keyPressEvent(QKeyEvent* event) {
    if (event->key() == Qt::Key_Escape) {
        emit leaveRequested();
        return;
    }
    QWidget::keyPressEvent(event);
}

void ChangesPanel::clear() {
    m_list->clear();
    m_header->clear();
}

void ChangesPanel::rowActivated() {
    const QTreeWidgetItem* r = m_list->currentItem();
    if (!r)
        return;
    if (const QVariant id = r->data(0, kPartRole); id.isValid())
        emit locatePart(PartId(id.toUInt()));
    else if (const QVariant at = r->data(0, kPlaceRole); at.isValid())
        emit locatePlace(at.toPointF());
}

void ChangesPanel::showComparison(const DrawingComparison& c, const QString& otherFile) {
    m_list->clear();
    m_header->setText(
        (c.same() ? tr("The same drawing as %1 (older revision).")
                  : tr("Changes since %1 (older revision); the Sheet marks added and changed "
                       "parts and shows removed ones as ghosts."))
            .arg(otherFile));
    partRows(m_list, tr("Parts added"), c.partsAdded, true);
    partRows(m_list, tr("Parts removed"), c.partsRemoved, false);
    if (!c.partsChanged.empty()) {
        auto* g = group(m_list, tr("Parts changed"), c.partsChanged.size());
        for (const auto& p : c.partsChanged)
            row(g, q(p.tag), changesText(p.fields))->setData(0, kPartRole, p.newId.value);
    }
    wireRows(m_list, tr("Wires added"), c.wiresAdded, true);
    wireRows(m_list, tr("Wires removed"), c.wiresRemoved, false);
    bucketRows(m_list, tr("Buckets added"), c.bucketsAdded);
    bucketRows(m_list, tr("Buckets removed"), c.bucketsRemoved);
    if (!c.bucketsChanged.empty()) {
        auto* g = group(m_list, tr("Buckets changed"), c.bucketsChanged.size());
        for (const auto& b : c.bucketsChanged)
            row(g, q(b.tag), changesText(b.fields));
    }
    valueRows(m_list, tr("Sheet"), c.sheet);
    valueRows(m_list, tr("Settings"), c.settings);
    commentRows(m_list, c);
    findingRows(m_list, tr("Findings introduced"), c.findingsNew, c, true);
    findingRows(m_list, tr("Findings resolved"), c.findingsResolved, c, false);
}

} // namespace lineward::ui
