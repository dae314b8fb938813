// BucketItem: a thin dash-dot frame in a muted green with the tag on a tab at its top edge (our
// style), kept behind the parts.
#include "bucket_item.h"

#include "sheet_scene.h"

#include <QFontMetricsF>
#include <QPainter>
#include <QStyleOptionGraphicsItem>

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

QRectF BucketItem::boundingRect() const {
    return m_frame.adjusted(-2, -14, 2, 2);
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
}

} // namespace lineward::ui
