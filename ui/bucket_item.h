// Scene item outlining one bucket (an MCC unit) around its parts, with the bucket's tag and
// its arc-flash mark.
#pragma once

#include "model/ids.h"

#include <QGraphicsItem>

namespace lineward::ui {

/// Draws a Bucket's frame behind its member parts. Not selectable and takes no mouse buttons:
/// clicks go to the parts inside and to the Sheet.
class BucketItem : public QGraphicsItem {
public:
    enum { Type = UserType + 3 };
    explicit BucketItem(BucketId id);
    int type() const override { return Type; }
    BucketId bucketId() const { return m_id; }
    /// The frame (scene coordinates, around the members' symbols and labels), the tag, and
    /// where along the top the tag starts (right of the wire that feeds the bucket).
    void setOutline(const QRectF& frame, const QString& tag, qreal tagLeft);
    const QRectF& frame() const { return m_frame; }
    const QString& tag() const { return m_tag; }
    /// The bucket's arc-flash mark: its incident energy from the check result ("AF 6.0
    /// cal/cm²"), on a notched amber tab on the frame's bottom edge; empty: none.
    void setArcFlashMark(const QString& text);
    const QString& arcFlashMark() const { return m_arcFlashMark; }

    QRectF boundingRect() const override;
    QPainterPath shape() const override;
    void paint(QPainter* p, const QStyleOptionGraphicsItem* option, QWidget* widget) override;

private:
    void paintArcFlashMark(QPainter* p) const;
    BucketId m_id;
    QRectF m_frame;
    QString m_tag;
    QString m_arcFlashMark;
    qreal m_tagLeft = 0;
};

} // namespace lineward::ui
