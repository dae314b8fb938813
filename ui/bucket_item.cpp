// BucketItem: a thin dash-dot frame in a muted green with the tag on a tab at its top edge (our
// style), kept behind the parts.
#include "bucket_item.h"

#include "sheet_scene.h"

#include <QFontMetricsF>
#include <QPainter>
#include <QPainterPath>
#include <QStyleOptionGraphicsItem>
#include <algorithm>

namespace lineward::ui {

namespace {
const QColor kFrame(0x4f, 0x7a, 0x5a);

QFont tagFont() {
    QFont f;
    f.setPixelSize(10); // as the labels: the Submittal sizes print by the smallest text
    f.setBold(true);
    return f;
}
} // namespace

BucketItem::BucketItem(BucketId id) : m_id(id) {
    setZValue(-2); // behind wires (-1) and parts (0)
    setAcceptedMouseButtons(Qt::NoButton);
    setAcceptHoverEvents(false);
}

void BucketItem::setOutline(const QRectF& frame, const QString& tag, qreal tagLeft) {
    if (frame == m_frame && tag == m_tag && tagLeft == m_tagLeft)
        return;
    prepareGeometryChange();
    m_frame = frame;
    m_tag = tag;
    m_tagLeft = tagLeft;
    update();
}

void BucketItem::setArcFlashMark(const QString& text) {
    if (text == m_arcFlashMark)
        return;
    prepareGeometryChange();
    m_arcFlashMark = text;
    update();
}

QRectF BucketItem::boundingRect() const {
    return m_frame.adjusted(-2, -14, 2, m_arcFlashMark.isEmpty() ? 2 : 9);
}

QPainterPath BucketItem::shape() const {
    return {}; // nothing to hit: the frame never takes a click from a part or the Sheet
}

void BucketItem::paint(QPainter* p, const QStyleOptionGraphicsItem* option, QWidget*) {
    if (m_frame.isEmpty())
        return;
    p->setRenderHint(QPainter::Antialiasing);
    QPen pen(kFrame, 1.0, Qt::DashDotLine);
    p->setPen(pen);
    p->setBrush(QColor(0x4f, 0x7a, 0x5a, 14));
    p->drawRoundedRect(m_frame, 5, 5);
    if (option->levelOfDetailFromTransform(p->worldTransform()) < 0.45)
        return;
    // The tag on a tab inside the frame's top edge, clipped to the frame's width.
    const QFont f = tagFont();
    const qreal room = m_frame.right() - m_tagLeft - 4;
    const QString text = QFontMetricsF(f).elidedText(m_tag, Qt::ElideRight, room);
    const qreal w = QFontMetricsF(f).horizontalAdvance(text) + 6;
    const QRectF tab(m_tagLeft, m_frame.top() - 7, w, 14);
    p->setPen(Qt::NoPen);
    p->setBrush(QColor(0xfb, 0xfa, 0xf6));
    p->drawRect(tab);
    p->setFont(f);
    p->setPen(SheetScene::printing(this) ? QColor(Qt::black) : kFrame);
    p->drawText(tab, Qt::AlignCenter, text);
    if (!m_arcFlashMark.isEmpty())
        paintArcFlashMark(p);
}

void BucketItem::paintArcFlashMark(QPainter* p) const {
    // The bus's arc-flash mark in small: a notched amber tab astride the frame's bottom edge.
    QFont f;
    f.setPixelSize(10); // no smaller than the labels: the Submittal sizes print by the smallest
    const QFontMetricsF fm(f);
    const qreal room = m_frame.width() - 8;
    const QString text = fm.elidedText(m_arcFlashMark, Qt::ElideRight, room - 6);
    const qreal w = std::min(room, fm.horizontalAdvance(text) + 8);
    const QRectF r(m_frame.right() - 4 - w, m_frame.bottom() - 6, w, 13);
    QPainterPath tab;
    tab.moveTo(r.left() + 3, r.top());
    tab.lineTo(r.right(), r.top());
    tab.lineTo(r.right(), r.bottom());
    tab.lineTo(r.left(), r.bottom());
    tab.lineTo(r.left(), r.top() + 3);
    tab.closeSubpath();
    p->setPen(QPen(QColor(0x9a, 0x5b, 0x00), 0.8));
    p->setBrush(QColor(0xff, 0xf3, 0xd6));
    p->drawPath(tab);
    p->setFont(f);
    p->setPen(QColor(0x5a, 0x35, 0x00));
    p->drawText(r.adjusted(3, 0, -2, 0), Qt::AlignVCenter | Qt::AlignLeft, text);
}

} // namespace lineward::ui
