// Sheet scene: the scene owns every item; an item is deleted when its part or wire goes.
#include "sheet_scene.h"

#include "bucket_item.h"
#include "comment_mark.h"
#include "curves/arc_flash_study.h"
#include "part_item.h"
#include "report/report_format.h"
#include "wire_item.h"

#include <QPainter>
#include <QSignalBlocker>
#include <QTimer>
#include <algorithm>
#include <cmath>

namespace lineward::ui {

SheetScene::SheetScene(Document& doc, QObject* parent) : QGraphicsScene(parent), m_doc(doc) {
    connect(&doc, &Document::drawingReset, this, &SheetScene::rebuild);
    connect(&doc, &Document::reportChanged, this, &SheetScene::refreshBadges);
    connect(&doc, &Document::partAdded, this, &SheetScene::onPartAdded);
    connect(&doc, &Document::partRemoved, this, &SheetScene::onPartRemoved);
    connect(&doc, &Document::partChanged, this, &SheetScene::onPartChanged);
    connect(&doc, &Document::wireAdded, this, &SheetScene::onWireAdded);
    connect(&doc, &Document::wireRemoved, this, &SheetScene::onWireRemoved);
    connect(&doc, &Document::bucketsChanged, this, &SheetScene::scheduleRoute);
    connect(&doc, &Document::reviewChanged, this, &SheetScene::refreshCommentMarks);
    rebuild();
}

bool SheetScene::printing(const QGraphicsItem* item) {
    auto* scene = item ? qobject_cast<SheetScene*>(item->scene()) : nullptr;
    return scene && scene->m_printing;
}

PartItem* SheetScene::itemFor(PartId id) const {
    auto it = m_parts.find(id);
    return it == m_parts.end() ? nullptr : it->second;
}

WireItem* SheetScene::wireItem(WireId id) const {
    auto it = m_wires.find(id);
    return it == m_wires.end() ? nullptr : it->second;
}

BucketItem* SheetScene::bucketItem(BucketId id) const {
    auto it = m_buckets.find(id);
    return it == m_buckets.end() ? nullptr : it->second;
}

void SheetScene::selectParts(const std::vector<PartId>& ids) {
    // One item at a time would emit selectionChanged per item, and each listener reads the
    // whole selection: quadratic on a large drawing. Select quietly, then tell once.
    {
        const QSignalBlocker quiet(this);
        clearSelection();
        for (auto id : ids)
            if (auto* item = itemFor(id))
                item->setSelected(true);
    }
    emit selectionChanged();
}

void SheetScene::selectEverything() {
    {
        const QSignalBlocker quiet(this);
        for (auto& [id, item] : m_parts)
            item->setSelected(true);
        for (auto& [id, item] : m_wires)
            item->setSelected(true);
    }
    emit selectionChanged();
}

void SheetScene::selectionLost() {
    // Deleting selected items changes the selection once per item: tell once, after the edit.
    if (m_selectionPending)
        return;
    m_selectionPending = true;
    QTimer::singleShot(0, this, [this] {
        m_selectionPending = false;
        emit selectionChanged();
    });
}

void SheetScene::deleteItem(QGraphicsItem* item) {
    const bool selected = item->isSelected();
    {
        const QSignalBlocker quiet(this);
        delete item;
    }
    if (selected)
        selectionLost();
}

std::vector<PartId> SheetScene::selectedParts() const {
    std::vector<PartId> out;
    for (auto* gi : selectedItems())
        if (auto* p = qgraphicsitem_cast<PartItem*>(gi))
            out.push_back(p->partId());
    std::sort(out.begin(), out.end());
    return out;
}

std::vector<WireId> SheetScene::selectedWires() const {
    std::vector<WireId> out;
    for (auto* gi : selectedItems())
        if (auto* w = qgraphicsitem_cast<WireItem*>(gi))
            out.push_back(w->wireId());
    return out;
}

std::optional<WireEnd> SheetScene::nearestTerminal(QPointF at, qreal reach) const {
    std::optional<WireEnd> best;
    qreal bestD = reach;
    for (auto* gi : items(QRectF(at - QPointF(reach, reach), QSizeF(2 * reach, 2 * reach))))
        if (auto* item = qgraphicsitem_cast<PartItem*>(gi))
            for (int t = 0; t < item->terminalCount(); ++t) {
                const QPointF tp = item->terminalScenePos(t, at);
                const qreal d = std::hypot(tp.x() - at.x(), tp.y() - at.y());
                if (d <= bestD) {
                    bestD = d;
                    best = WireEnd{item->partId(), t};
                }
            }
    return best;
}

void SheetScene::rebuild() {
    emit aboutToRebuild();
    clear();
    m_commentMarks.clear(); // deleted by clear()
    m_parts.clear();
    m_wires.clear();
    m_buckets.clear();
    for (const auto& p : m_doc.drawing().parts()) {
        auto* item = new PartItem(p);
        addItem(item);
        m_parts[p.id] = item;
    }
    for (const auto& w : m_doc.drawing().wires()) {
        auto* item = new WireItem(w);
        addItem(item);
        m_wires[w.id] = item;
    }
    routeWires();
    refreshBadges();
    setSceneRect(itemsBoundingRect().adjusted(-400, -400, 400, 400));
}

void SheetScene::onPartAdded(PartId id) {
    auto* item = new PartItem(*m_doc.drawing().part(id));
    addItem(item);
    m_parts[id] = item;
    scheduleRoute();
}

void SheetScene::onPartRemoved(PartId id) {
    if (auto* item = itemFor(id)) {
        m_parts.erase(id);
        deleteItem(item);
    }
    scheduleRoute();
}

void SheetScene::onPartChanged(PartId id) {
    PartItem* item = itemFor(id);
    const Part& now = *m_doc.drawing().part(id);
    // Wires, bus bars and label room follow positions; a rating edit moves nothing, so only
    // the bucket frames (which enclose the labels) are refreshed, not the whole Sheet.
    const bool moved = !item || item->part().x != now.x || item->part().y != now.y ||
                       item->part().rotation != now.rotation;
    if (item)
        item->setPart(now);
    if (moved)
        scheduleRoute();
    else
        scheduleFrames();
}

void SheetScene::scheduleFrames() {
    if (m_framesPending || m_routePending)
        return;
    m_framesPending = true;
    QTimer::singleShot(0, this, [this] {
        m_framesPending = false;
        refreshBuckets();
    });
}

void SheetScene::onWireAdded(WireId id) {
    auto* item = new WireItem(*m_doc.drawing().wire(id));
    addItem(item);
    m_wires[id] = item;
    scheduleRoute();
}

void SheetScene::onWireRemoved(WireId id) {
    if (auto* item = wireItem(id)) {
        m_wires.erase(id);
        deleteItem(item);
    }
    scheduleRoute();
}

void SheetScene::scheduleRoute() {
    // One command may change many parts: route once, after it.
    if (m_routePending)
        return;
    m_routePending = true;
    QTimer::singleShot(0, this, [this] {
        m_routePending = false;
        routeWires();
        setSceneRect(sceneRect().united(itemsBoundingRect().adjusted(-400, -400, 400, 400)));
    });
}

void SheetScene::routeWires() {
    // A bus bar spans every part wired to it.
    std::unordered_map<PartId, std::pair<qreal, qreal>> span;
    for (auto& [id, w] : m_wires) {
        for (auto [bus, other] :
             {std::pair{w->wire().a, w->wire().b}, std::pair{w->wire().b, w->wire().a}}) {
            PartItem* bi = itemFor(bus.part);
            PartItem* oi = itemFor(other.part);
            if (!bi || !oi || bi->part().kind != PartKind::Bus || oi->part().kind == PartKind::Bus)
                continue;
            const qreal x = bi->mapFromScene(oi->terminalScenePos(other.terminal)).x();
            auto [it, fresh] = span.try_emplace(bus.part, x, x);
            it->second.first = std::min(it->second.first, x);
            it->second.second = std::max(it->second.second, x);
        }
    }
    for (auto& [id, item] : m_parts)
        if (item->part().kind == PartKind::Bus) {
            auto it = span.find(id);
            item->setBarSpan(it == span.end() ? -60 : it->second.first - 30,
                             it == span.end() ? 60 : it->second.second + 30);
        }
    for (auto& [id, w] : m_wires) {
        PartItem* a = itemFor(w->wire().a.part);
        PartItem* b = itemFor(w->wire().b.part);
        if (!a || !b)
            continue;
        const QPointF pa =
            a->terminalScenePos(w->wire().a.terminal, b->terminalScenePos(w->wire().b.terminal));
        const QPointF pb = b->terminalScenePos(w->wire().b.terminal, pa);
        w->route(pa, pb);
    }
    layoutLabels();
    refreshBuckets();
    refreshCommentMarks();
}

void SheetScene::refreshCommentMarks() {
    for (auto* m : m_commentMarks)
        deleteItem(m);
    m_commentMarks.clear();
    std::unordered_map<PartId, int> stacked; // marks already beside each part
    for (const auto& c : m_doc.drawing().comments()) {
        PartItem* item = itemFor(c.part);
        if (!item)
            continue;
        const QRectF sym = item->symbolSceneRect();
        const int n = stacked[c.part]++;
        auto* mark =
            new CommentMark(c.id, c.resolved, QString::fromStdString(c.text),
                            QPointF(sym.left() - 3, sym.top() + n * (CommentMark::kHeight + 2)));
        addItem(mark);
        m_commentMarks.push_back(mark);
    }
}

void SheetScene::refreshBadges() {
    struct Badge {
        std::optional<Severity> worst; ///< of the open findings
        bool accepted = false;
        QString tip;
    };
    std::unordered_map<PartId, Badge> badges;
    for (const auto& f : m_doc.report().findings) {
        const QString line = (f.accepted ? QStringLiteral("[accepted] ") : QString()) +
                             QString::fromStdString(findingHeadline(f));
        for (auto id : f.parts) {
            auto& b = badges[id];
            if (f.accepted)
                b.accepted = true;
            else if (!b.worst || f.severity > *b.worst)
                b.worst = f.severity;
            b.tip += (b.tip.isEmpty() ? "" : "\n") + line;
        }
    }
    for (auto& [id, item] : m_parts) {
        auto it = badges.find(id);
        if (it == badges.end())
            item->setBadge(std::nullopt, {});
        else
            item->setBadge(it->second.worst, it->second.tip, it->second.accepted);
    }
    // Each bus's and bucket's arc-flash energy from the check result (curves/arc_flash_study.h).
    std::unordered_map<PartId, QString> marks;
    if (const auto& af = m_doc.result().arcFlash)
        for (const auto& e : *af)
            if (!e.bucket)
                marks[e.part] = arcFlashMarkText(e);
    for (auto& [id, item] : m_parts) {
        auto it = marks.find(id);
        item->setArcFlashMark(it == marks.end() ? QString() : it->second);
    }
    refreshBucketMarks();
}

QString SheetScene::arcFlashMarkText(const ArcFlashEquipment& e) {
    return e.energyCal() ? QString::fromStdString("AF " + fmt(*e.energyCal(), 1) + " cal/cm²")
                         : QStringLiteral("AF not computed");
}

void SheetScene::refreshBucketMarks() {
    std::unordered_map<BucketId, QString> marks;
    if (const auto& af = m_doc.result().arcFlash)
        for (const auto& e : *af)
            if (e.bucket)
                marks[*e.bucket] = arcFlashMarkText(e);
    for (auto& [id, item] : m_buckets) {
        auto it = marks.find(id);
        item->setArcFlashMark(it == marks.end() ? QString() : it->second);
    }
}

void SheetScene::drawBackground(QPainter* painter, const QRectF& rect) {
    if (m_printing) {
        painter->fillRect(rect, Qt::white);
        return;
    }
    painter->fillRect(rect, QColor(0xfb, 0xfa, 0xf6));
    const qreal step = kGrid * 5;
    painter->setPen(QPen(QColor(0xe6, 0xe3, 0xda), 0));
    for (qreal x = std::floor(rect.left() / step) * step; x < rect.right(); x += step)
        painter->drawLine(QPointF(x, rect.top()), QPointF(x, rect.bottom()));
    for (qreal y = std::floor(rect.top() / step) * step; y < rect.bottom(); y += step)
        painter->drawLine(QPointF(rect.left(), y), QPointF(rect.right(), y));
}

} // namespace lineward::ui
