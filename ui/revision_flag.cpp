// Revision flag: staff 22 units high, pennant 20 × 15 units pointing right with the revision's
// name inside; sized in scene units so it scales with the one-line like the parts' labels.
#include "revision_flag.h"

#include <QPainter>

namespace lineward::ui {

namespace {
constexpr qreal kStaff = 22.0;
constexpr qreal kFlagW = 20.0, kFlagH = 15.0;
} // namespace

RevisionFlag::RevisionFlag(const QString& revision, const QRectF& symbol)
    : m_revision(revision), m_foot(symbol.left() - 4, symbol.top() + 6) {
    setZValue(6);
    setAcceptedMouseButtons(Qt::NoButton);
}

QRectF RevisionFlag::boundingRect() const {
    return QRectF(m_foot.x() - 2, m_foot.y() - kStaff - 2, kFlagW + 4, kStaff + 4);
}

QPainterPath RevisionFlag::shape() const {
    return {};
}

void RevisionFlag::paint(QPainter* p, const QStyleOptionGraphicsItem*, QWidget*) {
    p->setRenderHint(QPainter::Antialiasing);
    const QPointF top = m_foot - QPointF(0, kStaff);
    p->setPen(QPen(Qt::black, 1.2));
    p->drawLine(m_foot, top);
    const QPolygonF pennant({top, top + QPointF(kFlagW, kFlagH / 2), top + QPointF(0, kFlagH)});
    p->setBrush(Qt::white);
    p->drawPolygon(pennant);
    QFont f;
    f.setPixelSize(10); // no smaller than the labels: the Submittal sizes print by it
    f.setBold(true);
    p->setFont(f);
    p->drawText(QRectF(top.x() + 0.5, top.y(), kFlagW * 0.65, kFlagH), Qt::AlignCenter, m_revision);
}

} // namespace lineward::ui
