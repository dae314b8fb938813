// Sheet scene: items are owned by the scene (deleted with it or on rebuild by clear()).
#include "sheet_scene.h"

#include "part_item.h"
#include "rules/report_format.h"
#include "wire_item.h"

#include <QPainter>
#include <algorithm>
#include <cmath>

namespace lineward::ui {

SheetScene::SheetScene(Document& doc, QObject* parent) : QGraphicsScene(parent), m_doc(doc) {
    connect(&doc, &Document::drawingReset, this, &SheetScene::rebuild);
    connect(&doc, &Document::reportChanged, this, &SheetScene::refreshBadges);
    rebuild();
}

PartItem* SheetScene::itemFor(PartId id) const {
    auto it = m_parts.find(id);
    return it == m_parts.end() ? nullptr : it->second;
}

void SheetScene::rebuild() {
    clear();
    m_parts.clear();
    m_wires.clear();
    const Drawing& d = m_doc.drawing();
    for (const auto& p : d.parts()) {
        auto* item = new PartItem(p);
        addItem(item);
        m_parts[p.id] = item;
    }
    for (const auto& w : d.wires()) {
        auto* item = new WireItem(w);
        addItem(item);
        m_wires.push_back(item);
    }
    routeWires();
    refreshBadges();
    setSceneRect(itemsBoundingRect().adjusted(-200, -200, 200, 200));
}

void SheetScene::routeWires() {
    // A bus bar spans every part wired to it.
    std::unordered_map<PartId, std::pair<qreal, qreal>> span;
    for (auto* w : m_wires) {
        for (auto [bus, other] : {std::pair{w->wire().a, w->wire().b}, std::pair{w->wire().b, w->wire().a}}) {
            PartItem* bi = itemFor(bus.part);
            PartItem* oi = itemFor(other.part);
            if (!bi || !oi || bi->part().kind != PartKind::Bus)
                continue;
            const qreal x = bi->mapFromScene(oi->terminalScenePos(other.terminal)).x();
            auto [it, fresh] = span.try_emplace(bus.part, x, x);
            it->second.first = std::min(it->second.first, x);
            it->second.second = std::max(it->second.second, x);
        }
    }
    for (auto& [id, s] : span)
        itemFor(id)->setBarSpan(s.first - 30, s.second + 30);
    for (auto* w : m_wires) {
        PartItem* a = itemFor(w->wire().a.part);
        PartItem* b = itemFor(w->wire().b.part);
        const QPointF pa = a->terminalScenePos(w->wire().a.terminal,
                                               b->terminalScenePos(w->wire().b.terminal));
        const QPointF pb = b->terminalScenePos(w->wire().b.terminal, pa);
        w->route(pa, pb);
    }
}

void SheetScene::refreshBadges() {
    std::unordered_map<PartId, std::pair<Severity, QString>> worst;
    for (const auto& f : m_doc.report().findings) {
        if (f.accepted)
            continue;
        for (auto id : f.parts) {
            auto& slot = worst[id];
            const QString line = QString::fromStdString(findingHeadline(f));
            if (slot.second.isEmpty() || f.severity > slot.first)
                slot.first = f.severity;
            slot.second += (slot.second.isEmpty() ? "" : "\n") + line;
        }
    }
    for (auto& [id, item] : m_parts) {
        auto it = worst.find(id);
        if (it == worst.end())
            item->setBadge(std::nullopt, {});
        else
            item->setBadge(it->second.first, it->second.second);
    }
}

void SheetScene::drawBackground(QPainter* painter, const QRectF& rect) {
    painter->fillRect(rect, QColor(0xfb, 0xfa, 0xf6));
    const qreal step = kGrid * 5;
    painter->setPen(QPen(QColor(0xe6, 0xe3, 0xda), 0));
    for (qreal x = std::floor(rect.left() / step) * step; x < rect.right(); x += step)
        painter->drawLine(QPointF(x, rect.top()), QPointF(x, rect.bottom()));
    for (qreal y = std::floor(rect.top() / step) * step; y < rect.bottom(); y += step)
        painter->drawLine(QPointF(rect.left(), y), QPointF(rect.right(), y));
}

} // namespace lineward::ui
