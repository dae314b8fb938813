// Orthogonal routing: leave each terminal vertically and cross over at mid-height.
#include "wire_item.h"

#include <QPainterPath>
#include <QPen>

namespace lineward::ui {

WireItem::WireItem(const Wire& wire) : m_wire(wire) {
    setPen(QPen(QColor(0x22, 0x2a, 0x33), 1.4));
    setZValue(-1);
    setFlag(ItemIsSelectable);
}

void WireItem::route(QPointF a, QPointF b) {
    QPainterPath path(a);
    if (qFuzzyCompare(a.x(), b.x()) || qFuzzyCompare(a.y(), b.y())) {
        path.lineTo(b);
    } else {
        const qreal midY = (a.y() + b.y()) / 2;
        path.lineTo(a.x(), midY);
        path.lineTo(b.x(), midY);
        path.lineTo(b);
    }
    setPath(path);
}

} // namespace lineward::ui
