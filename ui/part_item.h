// Scene item drawing one part's symbol, tag, key ratings and its findings badge.
#pragma once

#include "model/part.h"
#include "rules/finding.h"

#include <QGraphicsItem>
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
    /// Worst open finding on this part (drawn as a badge) and its tooltip text.
    void setBadge(std::optional<Severity> worst, const QString& tooltip);
    std::optional<Severity> badge() const { return m_badge; }

    QRectF boundingRect() const override;
    QPainterPath shape() const override;
    void paint(QPainter* p, const QStyleOptionGraphicsItem* option, QWidget* widget) override;

protected:
    QVariant itemChange(GraphicsItemChange change, const QVariant& value) override;

private:
    QString ratingText() const;
    void paintSymbol(QPainter* p) const;
    Part m_part;
    qreal m_barLeft = -60, m_barRight = 60;
    std::optional<Severity> m_badge;
};

} // namespace lineward::ui
