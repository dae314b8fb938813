// CommentMark: a tab with a pointed right edge toward the part, the comment's number inside.
#include "comment_mark.h"

#include "plain_text.h"
#include "sheet_scene.h"

#include <QFontMetricsF>
#include <QPainter>
#include <QPainterPath>

namespace lineward::ui {

namespace {
QFont markFont() {
    QFont f;
    f.setPixelSize(10);
    f.setBold(true);
    return f;
}
const QColor kViolet(0x4b, 0x2e, 0x83);
} // namespace

CommentMark::CommentMark(std::uint32_t id, bool resolved, const QString& text, QPointF at)
    : m_id(id), m_resolved(resolved), m_label("C" + QString::number(id)) {
    const qreal w = std::ceil(QFontMetricsF(markFont()).horizontalAdvance(m_label)) + 10;
    m_rect = QRectF(-w, 0, w, kHeight);
    setPos(at);
    setZValue(3);
    setAcceptedMouseButtons(Qt::NoButton);
    setToolTip(plainToolTip(m_label + (resolved ? " (resolved)" : "") + ": " + text));
}

QRectF CommentMark::boundingRect() const {
    return m_rect.adjusted(-2, -2, 2, 2);
}

void CommentMark::paint(QPainter* p, const QStyleOptionGraphicsItem*, QWidget*) {
    p->setRenderHint(QPainter::Antialiasing);
    const QRectF r = m_rect;
    QPainterPath tab; // square on the left, a point on the right toward the part
    tab.moveTo(r.left(), r.top());
    tab.lineTo(r.right() - 4, r.top());
    tab.lineTo(r.right(), r.center().y());
    tab.lineTo(r.right() - 4, r.bottom());
    tab.lineTo(r.left(), r.bottom());
    tab.closeSubpath();
    QPen pen(kViolet, 1.0, m_resolved ? Qt::DashLine : Qt::SolidLine);
    p->setPen(pen);
    p->setBrush(m_resolved ? QColor(Qt::white) : QColor(0xec, 0xe6, 0xf7));
    p->drawPath(tab);
    p->setFont(markFont());
    // Outside a scene it is the Submittal's legend: printed, so black like every printed text.
    p->setPen(!scene() || SheetScene::printing(this) ? QColor(Qt::black) : kViolet);
    p->drawText(r.adjusted(2, 0, -4, 0), Qt::AlignCenter, m_label);
}

} // namespace lineward::ui
