// Symbols of our own in the IEEE 315 / IEC 60617 conventions, drawn from resources/symbols/*.svg:
// circles for sources and machines, two circles for a transformer, a heavy bar for a bus, a
// square for a breaker, a rectangle for a fuse, a heater loop for a thermal overload.
#include "part_item.h"

#include "plain_text.h"
#include "severity_style.h"

#include <QPainter>
#include <QStyleOptionGraphicsItem>
#include <QSvgRenderer>
#include <cmath>
#include <map>
#include <memory>

// Qt resources in a static library must be registered by hand, outside any namespace.
static void registerSymbols() {
    Q_INIT_RESOURCE(symbols);
}

namespace lineward::ui {

namespace {

// One parsed renderer per symbol file (resources/symbols), made on first use.
QSvgRenderer* symbolRenderer(PartKind kind) {
    static std::map<PartKind, std::unique_ptr<QSvgRenderer>> cache;
    auto it = cache.find(kind);
    if (it == cache.end()) {
        static const bool registered = (registerSymbols(), true);
        (void)registered;
        const auto key = kindInfo(kind).key;
        auto r = std::make_unique<QSvgRenderer>(
            ":/symbols/" + QString::fromUtf8(key.data(), static_cast<int>(key.size())) + ".svg");
        it = cache.emplace(kind, r->isValid() ? std::move(r) : nullptr).first;
    }
    return it->second.get();
}

constexpr qreal kHalf = 20.0; // terminals sit 20 units above and below the centre
const QColor kInk(0x22, 0x2a, 0x33);
const QColor kSelect(0x1d, 0x7f, 0xb8);

QString num(const Part& p, const char* key, const char* unit) {
    auto v = p.number(key);
    return v ? QString::fromStdString(formatNumber(*v)) + unit : QString();
}
} // namespace

PartItem::PartItem(const Part& part) : m_part(part) {
    setPos(part.x, part.y);
    setRotation(part.rotation);
    setFlag(ItemIsSelectable);
    setFlag(ItemIsMovable);
    setFlag(ItemSendsGeometryChanges);
    setData(0, QVariant::fromValue<quint32>(part.id.value));
}

void PartItem::setPart(const Part& part) {
    prepareGeometryChange();
    m_part = part;
    setPos(part.x, part.y);
    setRotation(part.rotation);
    update();
}

int PartItem::terminalCount() const {
    return static_cast<int>(kindInfo(m_part.kind).terminals.size());
}

QPainterPath PartItem::shape() const {
    QPainterPath p;
    if (m_part.kind == PartKind::Bus)
        p.addRect(QRectF(m_barLeft, -6, m_barRight - m_barLeft, 12));
    else
        p.addRect(QRectF(-16, -22, 32, 44));
    return p;
}

QVariant PartItem::itemChange(GraphicsItemChange change, const QVariant& value) {
    // Snap to the 10-unit grid while dragging; the model changes only when the drag ends.
    if (change == ItemPositionChange) {
        const QPointF p = value.toPointF();
        return QPointF(std::round(p.x() / 10.0) * 10.0, std::round(p.y() / 10.0) * 10.0);
    }
    return QGraphicsItem::itemChange(change, value);
}

void PartItem::setBarSpan(qreal left, qreal right) {
    prepareGeometryChange();
    m_barLeft = left;
    m_barRight = right;
}

void PartItem::setBadge(std::optional<Severity> worst, const QString& tooltip) {
    m_badge = worst;
    setToolTip(plainToolTip(tooltip));
    update();
}

QPointF PartItem::terminalScenePos(int terminal, QPointF toward) const {
    if (m_part.kind == PartKind::Bus) {
        const qreal x = std::clamp(mapFromScene(toward).x(), m_barLeft, m_barRight);
        return mapToScene(QPointF(x, 0));
    }
    const auto& terms = kindInfo(m_part.kind).terminals;
    if (terms.size() == 2)
        return mapToScene(QPointF(0, terminal == 0 ? -kHalf : kHalf));
    // one-terminal parts: sources feed downward, loads are fed from above
    return mapToScene(QPointF(0, m_part.kind == PartKind::Source ? kHalf : -kHalf));
}

QRectF PartItem::boundingRect() const {
    if (m_part.kind == PartKind::Bus)
        return QRectF(m_barLeft - 10, -30, m_barRight - m_barLeft + 140, 50);
    return QRectF(-30, -30, 190, 60);
}

QString PartItem::ratingText() const {
    const Part& p = m_part;
    switch (p.kind) {
    case PartKind::Source:
        return num(p, "kv", " kV") + "  " +
               (p.number("fault_ka") ? num(p, "fault_ka", " kA") : num(p, "fault_mva", " MVA"));
    case PartKind::Transformer:
        return num(p, "kva", " kVA") + "  " + num(p, "z_pct", " %Z");
    case PartKind::Bus:
        return num(p, "volts", " V") + "  " + num(p, "amps", " A") + "  " +
               num(p, "bracing_ka", " kA");
    case PartKind::Breaker:
        return num(p, "trip_a", " AT") + "  " + num(p, "interrupting_ka", " kA");
    case PartKind::InstBreaker:
        return num(p, "amps", " A") + "  " + num(p, "pickup_a", " A inst");
    case PartKind::Fuse:
        return num(p, "amps", " A") + " " +
               QString::fromStdString(p.word("fuse_type").value_or("")).replace('_', '-');
    case PartKind::Disconnect:
        return num(p, "amps", " A");
    case PartKind::Contactor:
        return p.word("nema_size") ? "NEMA " + QString::fromStdString(*p.word("nema_size"))
                                   : num(p, "ac3_a", " A AC-3");
    case PartKind::Overload:
        return num(p, "setting_a", " A") + "  cl " +
               QString::fromStdString(p.word("trip_class").value_or(""));
    case PartKind::Cable:
        return QString::fromStdString(p.word("size").value_or("")) + "  " +
               num(p, "length_ft", " ft");
    case PartKind::Motor:
        return (p.number("hp") ? num(p, "hp", " hp") : num(p, "kw", " kW")) + "  " +
               num(p, "volts", " V");
    case PartKind::Load:
        return (p.number("kva") ? num(p, "kva", " kVA") : num(p, "kw", " kW")) + "  " +
               num(p, "volts", " V");
    }
    return {};
}

void PartItem::paintSymbol(QPainter* p) const {
    const PartKind k = m_part.kind;
    if (k == PartKind::Bus) {
        QPen bar = p->pen();
        bar.setWidthF(6);
        p->setPen(bar);
        p->drawLine(QPointF(m_barLeft, 0), QPointF(m_barRight, 0));
        return;
    }
    if (QSvgRenderer* r = symbolRenderer(k))
        r->render(p, QRectF(-20, -20, 40, 40));
    if (m_part.isOpen()) {
        // An open switching device: a bold gap mark across the symbol (ours).
        QPen pen = p->pen();
        pen.setWidthF(2.2);
        p->setPen(pen);
        p->drawLine(QPointF(-12, 12), QPointF(12, -12));
        p->drawText(QRectF(-30, 12, 26, 10), Qt::AlignRight, "open");
    }
}

void PartItem::paint(QPainter* p, const QStyleOptionGraphicsItem* option, QWidget*) {
    p->setRenderHint(QPainter::Antialiasing);
    QPen pen(isSelected() ? kSelect : kInk, 1.6);
    p->setPen(pen);
    QFont f = p->font();
    f.setPointSizeF(7.5);
    p->setFont(f);
    paintSymbol(p);
    p->setPen(isSelected() ? kSelect : kInk);
    const qreal textX = m_part.kind == PartKind::Bus ? m_barRight + 16 : 24;
    const qreal textY = m_part.kind == PartKind::Bus ? -18 : -16;
    QFont bold = f;
    bold.setBold(true);
    p->setFont(bold);
    p->drawText(QRectF(textX, textY, 130, 14), Qt::AlignLeft | Qt::AlignVCenter,
                QString::fromStdString(m_part.tag));
    p->setFont(f);
    p->setPen(QColor(0x55, 0x5f, 0x6a));
    p->drawText(QRectF(textX, textY + 13, 130, 14), Qt::AlignLeft | Qt::AlignVCenter, ratingText());
    if (m_badge) {
        // upper right of the symbol, between it and the tag
        const QPointF at =
            m_part.kind == PartKind::Bus ? QPointF(m_barRight + 2, -12) : QPointF(14, -14);
        p->save();
        p->translate(at);
        p->setPen(QPen(Qt::white, 1.2));
        p->setBrush(severityColor(*m_badge));
        p->drawPath(severityShape(*m_badge, 13));
        p->setPen(Qt::white);
        QFont bf = f;
        bf.setBold(true);
        bf.setPointSizeF(6.5);
        p->setFont(bf);
        p->drawText(QRectF(-6, -6, 12, 12), Qt::AlignCenter,
                    *m_badge == Severity::Note ? "i" : "!");
        p->restore();
    }
    (void)option;
}

} // namespace lineward::ui
