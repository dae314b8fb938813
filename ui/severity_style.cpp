// Badge shapes: octagon (violation), diamond (caution), circle (note) — ours, chosen so they
// differ by outline as well as colour for readers who cannot tell the colours apart.
#include "severity_style.h"

#include <QPolygonF>
#include <QtMath>

namespace lineward::ui {

QColor severityColor(Severity s) {
    switch (s) {
    case Severity::Violation:
        return QColor(0xd1, 0x3c, 0x1f);
    case Severity::Caution:
        return QColor(0xe0, 0x9a, 0x12);
    case Severity::Note:
        return QColor(0x4a, 0x6a, 0x9c);
    }
    return Qt::gray;
}

QPainterPath severityShape(Severity s, qreal size) {
    QPainterPath path;
    const qreal r = size / 2;
    if (s == Severity::Violation) {
        QPolygonF oct;
        for (int i = 0; i < 8; ++i) {
            const qreal a = qDegreesToRadians(22.5 + 45.0 * i);
            oct << QPointF(r * qCos(a), r * qSin(a));
        }
        path.addPolygon(oct);
        path.closeSubpath();
    } else if (s == Severity::Caution) {
        path.addPolygon(QPolygonF({QPointF(0, -r), QPointF(r, 0), QPointF(0, r), QPointF(-r, 0)}));
        path.closeSubpath();
    } else {
        path.addEllipse(QPointF(0, 0), r * 0.85, r * 0.85);
    }
    return path;
}

void paintSeverityBadge(QPainter& p, Severity s, QPointF at, qreal size) {
    p.save();
    p.translate(at);
    p.setPen(QPen(Qt::white, 1.2 * size / 13));
    p.setBrush(severityColor(s));
    p.drawPath(severityShape(s, size));
    p.setPen(Qt::white);
    QFont bf;
    bf.setPixelSize(qMax(1, qRound(10 * size / 13))); // 10 units: the Sheet's smallest text
    bf.setBold(true);
    p.setFont(bf);
    const qreal h = size * 6 / 13;
    p.drawText(QRectF(-h, -h, 2 * h, 2 * h), Qt::AlignCenter, s == Severity::Note ? "i" : "!");
    p.restore();
}

void paintAcceptedBadge(QPainter& p, QPointF at, qreal size) {
    p.save();
    p.translate(at);
    p.scale(size / 13, size / 13);
    const QColor ink(0x3d, 0x6b, 0x4f);
    p.setPen(QPen(ink, 1.6));
    p.setBrush(Qt::white);
    p.drawEllipse(QPointF(0, 0), 6, 6);
    QPainterPath tick;
    tick.moveTo(-3, 0);
    tick.lineTo(-1, 2.5);
    tick.lineTo(3.2, -2.5);
    p.setBrush(Qt::NoBrush);
    p.drawPath(tick);
    p.restore();
}

QString severityLabel(Severity s) {
    return QString::fromUtf8(severityName(s).data());
}

} // namespace lineward::ui
