// A review comment's mark on the Sheet (ours): a small violet note tab with the comment's number
// ("C3") beside the part's symbol; a resolved one is drawn hollow and dashed. Printed with the
// one-line, where the Submittal's review list gives the text. Marks take no clicks.
#pragma once

#include <QGraphicsItem>
#include <QString>

namespace lineward::ui {

class CommentMark : public QGraphicsItem {
public:
    enum { Type = UserType + 6 };
    /// `at` is the mark's top-right corner in scene coordinates (left of the part's symbol).
    CommentMark(std::uint32_t id, bool resolved, const QString& text, QPointF at);
    int type() const override { return Type; }
    std::uint32_t commentId() const { return m_id; }
    bool resolved() const { return m_resolved; }

    QRectF boundingRect() const override;
    void paint(QPainter* p, const QStyleOptionGraphicsItem* option, QWidget* widget) override;

    /// Height of one mark; marks of one part stack downward by this much plus a gap.
    static constexpr qreal kHeight = 13;

private:
    std::uint32_t m_id;
    bool m_resolved;
    QString m_label;
    QRectF m_rect; ///< item coordinates
};

} // namespace lineward::ui
