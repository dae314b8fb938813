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

QString severityLabel(Severity s) {
    return QString::fromUtf8(severityName(s).data());
}

} // namespace lineward::ui
