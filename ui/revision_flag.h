// The Submittal's revision flag (our symbol): a small pennant on a staff beside a part added or
// changed since the previous revision, carrying the revision's name; printed black on white.
#pragma once

#include <QGraphicsItem>
#include <QString>

namespace lineward::ui {

class RevisionFlag : public QGraphicsItem {
public:
    enum { Type = UserType + 5 };
    /// Stands at the top-left corner of `symbol` (the part's symbol in scene coordinates).
    RevisionFlag(const QString& revision, const QRectF& symbol);
    int type() const override { return Type; }
    QString revision() const { return m_revision; }

    QRectF boundingRect() const override;
    QPainterPath shape() const override;
    void paint(QPainter* p, const QStyleOptionGraphicsItem* option, QWidget* widget) override;

private:
    QString m_revision;
    QPointF m_foot; ///< where the staff stands (scene coordinates; the item sits at the origin)
};

} // namespace lineward::ui
