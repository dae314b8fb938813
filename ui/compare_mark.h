// A compare-mode mark on the Sheet (our style): a teal corner frame with a plus tab for an added
// part, a violet dotted frame with a delta tab for a changed one, and a grey dashed ghost with its
// tag struck through where a removed part stood. Marks take no clicks.
#pragma once

#include <QGraphicsItem>
#include <QString>

namespace lineward::ui {

class CompareMark : public QGraphicsItem {
public:
    enum { Type = UserType + 4 };
    enum class Kind { Added, Changed, Removed };
    /// `around` is the part's symbol in scene coordinates; `tag` is drawn for a ghost only.
    CompareMark(Kind kind, const QRectF& around, const QString& tag = {});
    int type() const override { return Type; }
    Kind kind() const { return m_kind; }
    QString tag() const { return m_tag; }

    QRectF boundingRect() const override;
    QPainterPath shape() const override;
    void paint(QPainter* p, const QStyleOptionGraphicsItem* option, QWidget* widget) override;

private:
    Kind m_kind;
    QRectF m_frame; ///< scene coordinates (the item sits at the origin)
    QString m_tag;
};

} // namespace lineward::ui
