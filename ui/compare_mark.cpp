// Compare marks: drawn above the parts and below nothing that takes input; a ghost is only
// an outline and its struck-through tag, so the Sheet behind it stays readable.
#include "compare_mark.h"

#include <QPainter>

namespace lineward::ui {

namespace {
const QColor kAdded(0x0b, 0x8a, 0x7c);   // teal
const QColor kChanged(0x7a, 0x3e, 0xb1); // violet
const QColor kGhost(0x8a, 0x8f, 0x96);   // grey
constexpr qreal kPad = 7.0;
constexpr qreal kTab = 11.0;
} // namespace

CompareMark::CompareMark(Kind kind, const QRectF& around, const QString& tag)
    : m_kind(kind), m_frame(around.adjusted(-kPad, -kPad, kPad, kPad)), m_tag(tag) {
    setZValue(5); // above parts (0) and their labels
    setAcceptedMouseButtons(Qt::NoButton);
    setAcceptHoverEvents(false);
}

QRectF CompareMark::boundingRect() const {
    // The tab sits on the top-left corner; a ghost's tag goes below the frame.
    return m_frame.adjusted(-kTab, -kTab, 2, m_kind == Kind::Removed ? 16 : 2);
}

QPainterPath CompareMark::shape() const {
    return {}; // never hit: clicks go to the part underneath
}

void CompareMark::paint(QPainter* p, const QStyleOptionGraphicsItem*, QWidget*) {
    p->setRenderHint(QPainter::Antialiasing);
    const QPointF tab = m_frame.topLeft();
    if (m_kind == Kind::Removed) {
        p->setPen(QPen(kGhost, 1.2, Qt::DashLine));
        p->setBrush(QColor(0x8a, 0x8f, 0x96, 30));
        p->drawRect(m_frame);
        // The symbol's place crossed out, as a ghost of what was there.
        p->drawLine(m_frame.topLeft(), m_frame.bottomRight());
        p->drawLine(m_frame.topRight(), m_frame.bottomLeft());
        QFont f;
        f.setPixelSize(10);
        f.setStrikeOut(true);
        p->setFont(f);
        p->setPen(kGhost);
        p->drawText(QRectF(m_frame.left() - 30, m_frame.bottom() + 2, m_frame.width() + 60, 14),
                    Qt::AlignHCenter | Qt::AlignTop | Qt::TextSingleLine, m_tag);
        return;
    }
    const QColor c = m_kind == Kind::Added ? kAdded : kChanged;
    if (m_kind == Kind::Added) {
        // Four corner brackets.
        p->setPen(QPen(c, 2.0, Qt::SolidLine, Qt::SquareCap));
        const qreal l = std::min<qreal>(10.0, m_frame.width() / 3);
        const QRectF r = m_frame;
        p->drawPolyline(
            QPolygonF({r.topLeft() + QPointF(0, l), r.topLeft(), r.topLeft() + QPointF(l, 0)}));
        p->drawPolyline(
            QPolygonF({r.topRight() - QPointF(l, 0), r.topRight(), r.topRight() + QPointF(0, l)}));
        p->drawPolyline(QPolygonF(
            {r.bottomLeft() - QPointF(0, l), r.bottomLeft(), r.bottomLeft() + QPointF(l, 0)}));
        p->drawPolyline(QPolygonF(
            {r.bottomRight() - QPointF(l, 0), r.bottomRight(), r.bottomRight() - QPointF(0, l)}));
    } else {
        p->setPen(QPen(c, 1.5, Qt::DotLine));
        p->setBrush(Qt::NoBrush);
        p->drawRoundedRect(m_frame, 3, 3);
    }
    // The tab: a filled circle with "+" (added) or a triangle, our delta (changed).
    p->setPen(Qt::NoPen);
    p->setBrush(c);
    if (m_kind == Kind::Added) {
        p->drawEllipse(tab, kTab * 0.75, kTab * 0.75);
        p->setPen(QPen(Qt::white, 1.8));
        p->drawLine(tab - QPointF(4, 0), tab + QPointF(4, 0));
        p->drawLine(tab - QPointF(0, 4), tab + QPointF(0, 4));
    } else {
        const qreal s = kTab * 0.85;
        p->drawPolygon(QPolygonF(
            {tab + QPointF(0, -s), tab + QPointF(s, s * 0.7), tab + QPointF(-s, s * 0.7)}));
        p->setBrush(Qt::white);
        const qreal t = s * 0.45;
        p->drawPolygon(QPolygonF({tab + QPointF(0, -t + 1.5), tab + QPointF(t, t * 0.7 + 1.5),
                                  tab + QPointF(-t, t * 0.7 + 1.5)}));
    }
}

} // namespace lineward::ui
