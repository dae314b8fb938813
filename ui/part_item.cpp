// Symbols of our own in the IEEE 315 / IEC 60617 conventions, drawn from resources/symbols/*.svg:
// circles for sources and machines, two circles for a transformer, a heavy bar for a bus, a
// square for a breaker, a rectangle for a fuse, a heater loop for a thermal overload.
#include "part_item.h"

#include "model/ratings.h"
#include "plain_text.h"
#include "severity_style.h"
#include "sheet_scene.h"

#include <QFontMetricsF>
#include <QPainter>
#include <QPainterPath>
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
constexpr qreal kLabelGap = 8.0;    // between a symbol and its label
constexpr qreal kLabelMargin = 8.0; // kept free before the next symbol or wire

// Label fonts sized in scene units, so screen, print and measurement agree.
QFont labelFont(bool bold) {
    QFont f;
    f.setPixelSize(10);
    f.setBold(bold);
    return f;
}

QString num(std::optional<double> v, const char* unit) {
    return v ? QString::fromStdString(formatNumber(*v)) + unit : QString();
}
QString text(const std::string& s) {
    return QString::fromStdString(s);
}
} // namespace

PartItem::PartItem(const Part& part) : m_part(part) {
    setPos(part.x, part.y);
    setRotation(part.rotation);
    setFlag(ItemIsSelectable);
    setFlag(ItemIsMovable);
    setFlag(ItemSendsGeometryChanges);
    setData(0, QVariant::fromValue<quint32>(part.id.value));
    refreshText();
}

void PartItem::setPart(const Part& part) {
    prepareGeometryChange();
    m_part = part;
    setPos(part.x, part.y);
    setRotation(part.rotation);
    refreshText();
    update();
}

int PartItem::terminalCount() const {
    return static_cast<int>(kindInfo(m_part.kind).terminals.size());
}

QPainterPath PartItem::shape() const {
    QPainterPath p;
    p.addRect(symbolRect());
    return p;
}

QRectF PartItem::symbolRect() const {
    if (m_part.kind == PartKind::Bus)
        return QRectF(m_barLeft, -6, m_barRight - m_barLeft, 12);
    return QRectF(-16, -22, 32, 44);
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

void PartItem::setArcFlashMark(const QString& text) {
    if (text == m_arcFlashMark)
        return;
    prepareGeometryChange(); // the mark widens the painted area
    m_arcFlashMark = text;
    update();
}

QRectF PartItem::arcFlashRect() const {
    // Under the tag and ratings beside the bar's end, clear of the wires that drop from it.
    const QRectF label = labelRect();
    return QRectF(label.left(), label.bottom() + 2, 92, 14);
}

void PartItem::setBadge(std::optional<Severity> worst, const QString& tooltip, bool accepted) {
    // Most parts keep their badge across an edit: only the ones that change are redrawn (a
    // refresh of every label was most of an edit's cost on a large drawing).
    if (worst == m_badge && tooltip == m_badgeTip && accepted == m_accepted)
        return;
    m_badge = worst;
    m_accepted = accepted;
    m_badgeTip = tooltip;
    refreshText();
    update();
}

void PartItem::refreshText() {
    const QString tag = QString::fromStdString(m_part.tag), ratings = ratingText();
    const QFontMetricsF bold(labelFont(true)), plain(labelFont(false));
    const qreal tagW = bold.horizontalAdvance(tag);
    m_tagWidth = std::ceil(tagW) + 2;
    m_labelWidth =
        std::min(kLabelWidth, std::ceil(std::max(tagW, plain.horizontalAdvance(ratings))) + 2);
    // Where two ratings are shown, they may go on two lines in a narrow place.
    m_ratingHalves.clear();
    m_wrappedWidth = m_labelWidth;
    if (const int gap = ratings.indexOf("  "); gap > 0) {
        m_ratingHalves = {ratings.left(gap), ratings.mid(gap + 2)};
        m_wrappedWidth = std::min(
            kLabelWidth, std::ceil(std::max({tagW, plain.horizontalAdvance(m_ratingHalves[0]),
                                             plain.horizontalAdvance(m_ratingHalves[1])})) +
                             2);
    }
    // The whole label, for when it is shortened to fit, then the findings.
    QString tip = tag + "  " + ratings;
    if (!m_badgeTip.isEmpty())
        tip += "\n" + m_badgeTip;
    setToolTip(plainToolTip(tip));
}

void PartItem::setLabelRoom(qreal right, qreal left) {
    if (right == m_roomRight && left == m_roomLeft)
        return;
    prepareGeometryChange();
    m_roomRight = right;
    m_roomLeft = left;
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

QRectF PartItem::uprightSymbolRect() const {
    return QTransform().rotate(m_part.rotation).mapRect(symbolRect());
}

bool PartItem::labelOnLeft() const {
    // Right unless it does not fit there and the left has more room.
    return m_part.kind != PartKind::Bus &&
           m_roomRight < std::min(m_labelWidth, m_wrappedWidth) + kLabelGap + kLabelMargin &&
           m_roomLeft > m_roomRight;
}

qreal PartItem::gap() const {
    return m_part.kind == PartKind::Bus ? 12.0 : kLabelGap; // a bus's badge sits at its end
}

bool PartItem::ratingsWrapped() const {
    if (m_ratingHalves.isEmpty())
        return false;
    const qreal room = (labelOnLeft() ? m_roomLeft : m_roomRight) - gap() - kLabelMargin;
    return m_labelWidth > room;
}

QRectF PartItem::labelRect() const {
    const QRectF sym = uprightSymbolRect();
    const bool left = labelOnLeft();
    const qreal room = (left ? m_roomLeft : m_roomRight) - gap() - kLabelMargin;
    const bool wrapped = ratingsWrapped();
    // The ratings are shortened to the room; the tag, which names the part, never is.
    const qreal w = std::max(m_tagWidth, std::min(wrapped ? m_wrappedWidth : m_labelWidth, room));
    const qreal x = left ? sym.left() - gap() - w : sym.right() + gap();
    return QRectF(x, sym.center().y() - 16, w, wrapped ? 40 : 27);
}

QRectF PartItem::boundingRect() const {
    // Painted in the upright frame: map that back into the item's rotated one.
    QRectF upright = uprightSymbolRect().united(labelRect());
    if (!m_arcFlashMark.isEmpty())
        upright = upright.united(arcFlashRect());
    upright.adjust(-8, -8, 8, 8);
    return QTransform().rotate(-m_part.rotation).mapRect(upright);
}

QRectF PartItem::symbolSceneRect() const {
    return uprightSymbolRect().translated(pos());
}

QRectF PartItem::labelSceneRect() const {
    return labelRect().translated(pos());
}

QRectF PartItem::footprintSceneRect() const {
    return uprightSymbolRect().united(labelRect()).translated(pos());
}

QString PartItem::ratingText() const {
    try {
        return ratingTextOf(m_part);
    } catch (const std::logic_error&) {
        return QStringLiteral("?"); // a value no file or edit can make; never throw from paint
    }
}

QString PartItem::ratingTextOf(const Part& p) {
    switch (p.kind) {
    case PartKind::Source: {
        const auto r = SourceRatings::of(p);
        return num(r.kv, " kV") + "  " +
               (r.faultKa ? num(r.faultKa, " kA") : num(r.faultMva, " MVA"));
    }
    case PartKind::Transformer: {
        const auto r = TransformerRatings::of(p);
        return num(r.kva, " kVA") + "  " + num(r.zPct, " %Z");
    }
    case PartKind::Bus: {
        const auto r = BusRatings::of(p);
        return num(r.volts, " V") + "  " + num(r.amps, " A") + "  " + num(r.bracingKa, " kA");
    }
    case PartKind::Breaker: {
        const auto r = BreakerRatings::of(p);
        return num(r.tripA, " AT") + "  " + num(r.interruptingKa, " kA");
    }
    case PartKind::InstBreaker: {
        const auto r = InstBreakerRatings::of(p);
        return num(r.amps, " A") + "  " + num(r.pickupA, " A inst");
    }
    case PartKind::Fuse: {
        const auto r = FuseRatings::of(p);
        return num(r.amps, " A") + "  " + (r.type == FuseType::Fast ? "fast" : "time-delay");
    }
    case PartKind::Disconnect:
        return num(DisconnectRatings::of(p).amps, " A");
    case PartKind::Contactor: {
        const auto r = ContactorRatings::of(p);
        return r.nemaSize ? "NEMA " + text(*r.nemaSize) : num(r.ac3A, " A AC-3");
    }
    case PartKind::Overload: {
        const auto r = OverloadRatings::of(p);
        return num(r.settingA, " A") + "  cl " + text(r.tripClass);
    }
    case PartKind::Vfd: {
        const auto r = VfdRatings::of(p);
        return num(r.hp, " hp") + "  " + num(r.outputA, " A out");
    }
    case PartKind::SoftStarter: {
        const auto r = SoftStarterRatings::of(p);
        return num(r.amps, " A") + (r.bypass ? "  bypass" : ""); // short: a bucket is narrow
    }
    case PartKind::Cable: {
        const auto r = CableRatings::of(p);
        return text(r.size) + "  " + num(r.lengthFt, " ft");
    }
    case PartKind::Motor: {
        const auto r = MotorRatings::of(p);
        return (r.hp ? num(r.hp, " hp") : num(r.kw, " kW")) + "  " + num(r.volts, " V");
    }
    case PartKind::Load: {
        const auto r = LoadRatings::of(p);
        return (r.kva ? num(r.kva, " kVA") : num(r.kw, " kW")) + "  " + num(r.volts, " V");
    }
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
    if (QSvgRenderer* r = symbolRenderer(k)) {
        if (!r->elementExists("upright")) {
            r->render(p, QRectF(-20, -20, 40, 40));
        } else {
            // A letter in a symbol (the motor's M) reads upright like the labels: the body
            // turns with the part, the letter turns back about its own centre.
            r->render(p, "body", r->boundsOnElement("body"));
            const QRectF letter = r->boundsOnElement("upright");
            p->save();
            p->translate(letter.center());
            p->rotate(-m_part.rotation);
            p->translate(-letter.center());
            r->render(p, "upright", letter);
            p->restore();
        }
    }
    if (m_part.isOpen()) {
        // An open switching device: a bold gap mark across the symbol (ours).
        QPen pen = p->pen();
        pen.setWidthF(2.2);
        p->setPen(pen);
        p->drawLine(QPointF(-12, 12), QPointF(12, -12));
    }
}

void PartItem::paintLabel(QPainter* p) const {
    const QRectF r = labelRect();
    const Qt::Alignment side = (labelOnLeft() ? Qt::AlignRight : Qt::AlignLeft) | Qt::AlignVCenter;
    const QFont bold = labelFont(true), plain = labelFont(false);
    p->setPen(SheetScene::printing(this) ? QColor(Qt::black) : isSelected() ? kSelect : kInk);
    p->setFont(bold);
    p->drawText(QRectF(r.left(), r.top(), r.width(), 14), side, QString::fromStdString(m_part.tag));
    p->setFont(plain);
    p->setPen(SheetScene::printing(this) ? QColor(Qt::black) : QColor(0x55, 0x5f, 0x6a));
    const QStringList lines = ratingsWrapped() ? m_ratingHalves : QStringList{ratingText()};
    for (int i = 0; i < lines.size(); ++i)
        p->drawText(QRectF(r.left(), r.top() + 13 + 13 * i, r.width(), 14), side,
                    QFontMetricsF(plain).elidedText(lines[i], Qt::ElideRight, r.width()));
}

QPointF PartItem::badgeAt() const {
    // upper right of the symbol, between it and the tag
    const QRectF sym = uprightSymbolRect();
    return m_part.kind == PartKind::Bus ? QPointF(sym.right() + 2, sym.center().y() - 12)
                                        : QPointF(sym.right() - 2, sym.top() + 8);
}

QPointF PartItem::badgeScenePos() const {
    return badgeAt() + pos(); // the upright frame is the scene's orientation about pos()
}

void PartItem::paintAcceptedBadge(QPainter* p) const {
    ui::paintAcceptedBadge(*p, badgeAt());
}

void PartItem::paintBadge(QPainter* p) const {
    paintSeverityBadge(*p, *m_badge, badgeAt());
}

QIcon PartItem::symbolIcon(PartKind kind, int px) {
    PartItem item(Part::make(kind, PartId(1), std::string()));
    item.setBarSpan(-20, 20); // a bus: a short bar across the icon
    const QRectF sym = item.symbolRect().adjusted(-2, -2, 2, 2);
    QIcon icon;
    for (int ratio : {1, 2}) {
        QPixmap pm(px * ratio, px * ratio);
        pm.setDevicePixelRatio(ratio);
        pm.fill(Qt::transparent);
        QPainter p(&pm);
        p.setRenderHint(QPainter::Antialiasing);
        const qreal scale = px / std::max(sym.width(), sym.height());
        p.translate(px / 2.0, px / 2.0);
        p.scale(scale, scale);
        p.translate(-sym.center());
        p.setPen(QPen(kInk, 1.6));
        item.paintSymbol(&p);
        p.end();
        icon.addPixmap(pm);
    }
    return icon;
}

void PartItem::paint(QPainter* p, const QStyleOptionGraphicsItem* option, QWidget*) {
    // Below this scale a label would be a few pixels of grey: draw symbols and badges only.
    const qreal lod = option->levelOfDetailFromTransform(p->worldTransform());
    p->setRenderHint(QPainter::Antialiasing);
    p->setFont(labelFont(false));
    p->setPen(QPen(isSelected() ? kSelect : kInk, 1.6));
    if (lod < 0.15 && m_part.kind != PartKind::Bus)
        p->drawLine(QPointF(0, -20), QPointF(0, 20)); // a stroke where the symbol is
    else
        paintSymbol(p);
    // The text is painted in the scene's orientation, whatever the part's rotation.
    p->save();
    p->rotate(-m_part.rotation);
    if (isSelected()) {
        // Our selection mark: a tinted, dashed frame around symbol and label.
        QPen frame(kSelect, 1.2, Qt::DashLine);
        frame.setCosmetic(true);
        p->setPen(frame);
        p->setBrush(QColor(0x1d, 0x7f, 0xb8, 30));
        const QRectF around =
            lod < 0.45 ? uprightSymbolRect() : uprightSymbolRect().united(labelRect());
        p->drawRoundedRect(around.adjusted(-5, -5, 5, 5), 4, 4);
        p->setBrush(Qt::NoBrush);
    }
    if (lod >= 0.45)
        paintLabel(p);
    if (lod >= 0.45 && m_part.isOpen()) {
        const QRectF sym = uprightSymbolRect();
        p->setPen(kInk);
        p->drawText(QRectF(sym.left() - 14, sym.bottom() - 10, 26, 10), Qt::AlignRight, "open");
    }
    if (m_badge)
        paintBadge(p);
    else if (m_accepted)
        paintAcceptedBadge(p);
    if (!m_arcFlashMark.isEmpty() && lod >= 0.45) {
        // Our arc-flash mark: a dark amber frame with a notched corner and the energy inside.
        const QRectF r = arcFlashRect();
        QPainterPath frame;
        frame.moveTo(r.left() + 4, r.top());
        frame.lineTo(r.right(), r.top());
        frame.lineTo(r.right(), r.bottom());
        frame.lineTo(r.left(), r.bottom());
        frame.lineTo(r.left(), r.top() + 4);
        frame.closeSubpath();
        p->setPen(QPen(QColor(0x9a, 0x5b, 0x00), 1.0));
        p->setBrush(QColor(0xff, 0xf3, 0xd6));
        p->drawPath(frame);
        const QFont f = labelFont(false); // 10 units, as the labels (the Submittal's minimum)
        p->setFont(f);
        p->setPen(SheetScene::printing(this) ? QColor(Qt::black) : QColor(0x5a, 0x35, 0x00));
        p->drawText(r.adjusted(3, 0, -2, 0), Qt::AlignVCenter | Qt::AlignLeft,
                    QFontMetricsF(f).elidedText(m_arcFlashMark, Qt::ElideRight, r.width() - 5));
    }
    p->restore();
}

} // namespace lineward::ui
