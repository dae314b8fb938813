// Scene item drawing one part's symbol, tag, key ratings and its findings badge. The text stays
// upright when the part is rotated and goes to the side with free room.
#pragma once

#include "model/part.h"
#include "rules/finding.h"

#include <QGraphicsItem>
#include <QIcon>
#include <optional>

namespace lineward::ui {

/// Draws a Part. The item is a view: it holds a copy of the part's values for painting and is
/// refreshed from the Document, never edited directly.
class PartItem : public QGraphicsItem {
public:
    enum { Type = UserType + 1 };
    explicit PartItem(const Part& part);
    int type() const override { return Type; }
    /// Refreshes from the model (after an edit); position and rotation included.
    void setPart(const Part& part);
    /// All terminals' scene positions, for hit-testing a wire drag.
    int terminalCount() const;

    PartId partId() const { return m_part.id; }
    const Part& part() const { return m_part; }
    /// Scene position of a terminal; for a bus, the point on the bar nearest `toward`.
    QPointF terminalScenePos(int terminal, QPointF toward = {}) const;
    /// For a bus: horizontal extent of the bar in item coordinates.
    void setBarSpan(qreal left, qreal right);
    /// Worst open finding on this part (drawn as a badge) and its tooltip text. `accepted`: the
    /// part has accepted findings; where none is open it gets our accepted badge (a hollow
    /// ring with a tick) instead.
    void setBadge(std::optional<Severity> worst, const QString& tooltip, bool accepted = false);
    std::optional<Severity> badge() const { return m_badge; }
    /// True where the part shows the accepted badge (accepted findings, none open).
    bool acceptedBadge() const { return !m_badge && m_accepted; }
    /// The badge's place in scene coordinates (its centre), where a right-click opens its menu.
    QPointF badgeScenePos() const;
    /// A bus's arc-flash mark: its incident energy from the check result ("6.0 cal/cm²"),
    /// drawn in a small frame of our own under the bar; empty: none.
    void setArcFlashMark(const QString& text);
    const QString& arcFlashMark() const { return m_arcFlashMark; }
    /// Free width (scene units) beside the symbol, right and left, up to the next part; the
    /// label goes to the side with room and is shortened to fit.
    void setLabelRoom(qreal right, qreal left);
    /// Whether the label is drawn left of the symbol (no room on the right).
    bool labelOnLeft() const;
    /// The symbol's extent in scene coordinates (what a neighbour's label must not cross).
    QRectF symbolSceneRect() const;
    /// The label (tag and ratings) as drawn, in scene coordinates.
    QRectF labelSceneRect() const;
    /// Symbol and label as drawn, in scene coordinates (the bucket outline goes around it).
    QRectF footprintSceneRect() const;

    QRectF boundingRect() const override;
    QPainterPath shape() const override;
    void paint(QPainter* p, const QStyleOptionGraphicsItem* option, QWidget* widget) override;

    /// The kind's symbol as the Sheet draws it (same strokes and ink), for the Parts palette:
    /// sharp at 1× and 2× device pixel ratio.
    static QIcon symbolIcon(PartKind kind, int px = 28);

    /// Widest label text (scene units) drawn beside a symbol.
    static constexpr qreal kLabelWidth = 130;

protected:
    QVariant itemChange(GraphicsItemChange change, const QVariant& value) override;

private:
    QString ratingText() const;
    static QString ratingTextOf(const Part& p);
    void paintSymbol(QPainter* p) const;
    void paintLabel(QPainter* p) const;
    void paintBadge(QPainter* p) const;
    void paintAcceptedBadge(QPainter* p) const;
    QPointF badgeAt() const;     ///< upright frame
    QRectF arcFlashRect() const; ///< upright frame: where the arc-flash mark goes
    void refreshText();          ///< tooltip and the label's measured width, after the part changes
    QRectF symbolRect() const;   ///< item coordinates
    QRectF uprightSymbolRect() const; ///< the symbol in the text's upright frame
    QRectF labelRect() const;         ///< upright frame: where the tag and ratings go
    qreal labelWidth() const { return m_labelWidth; }
    /// Whether the ratings go on two lines (they do not fit the room on one).
    bool ratingsWrapped() const;
    qreal gap() const; ///< between the symbol and its label
    Part m_part;
    qreal m_barLeft = -60, m_barRight = 60;
    qreal m_roomRight = kLabelWidth, m_roomLeft = 0;
    qreal m_tagWidth = 0;               ///< the tag is never shortened
    qreal m_labelWidth = kLabelWidth;   ///< tag and ratings on one line each
    qreal m_wrappedWidth = kLabelWidth; ///< ratings split in two at their middle gap
    QStringList m_ratingHalves;         ///< the two halves, or empty when there is no gap
    std::optional<Severity> m_badge;
    bool m_accepted = false;
    QString m_badgeTip;
    QString m_arcFlashMark;
};

} // namespace lineward::ui
