// The view of the Sheet: zoom, pan, placing parts, dragging wires between terminals, and
// ending a move. It reports what the user did; the main window turns it into commands.
#pragma once

#include "model/drawing.h"

#include <QGraphicsLineItem>
#include <QGraphicsView>
#include <optional>

namespace lineward::ui {

class SheetScene;

class SheetView : public QGraphicsView {
    Q_OBJECT
public:
    explicit SheetView(SheetScene* scene, QWidget* parent = nullptr);
    /// The next click on the Sheet places this kind (Parts palette click).
    void setPlaceKind(std::optional<PartKind> kind);
    std::optional<PartKind> placeKind() const { return m_placeKind; }
    void zoomBy(qreal factor);
    /// The terminal under a scene point, if any (within a few units).
    std::optional<WireEnd> terminalAt(QPointF scenePos) const;
    /// The part whose symbol or badge is under a scene point, if any.
    std::optional<PartId> partAt(QPointF scenePos) const;

signals:
    void placeRequested(lineward::PartKind kind, QPointF scenePos);
    void connectRequested(lineward::WireEnd a, lineward::WireEnd b);
    void moveFinished(std::vector<lineward::PartId> parts, std::vector<QPointF> from,
                      std::vector<QPointF> to);
    void filesDropped(QStringList paths);
    /// A right-click on a part or its badge: the part's menu (review, and buckets on a bus) at
    /// a global point.
    void partMenuRequested(lineward::PartId part, QPoint globalPos);

protected:
    void mousePressEvent(QMouseEvent* e) override;
    void mouseMoveEvent(QMouseEvent* e) override;
    void mouseReleaseEvent(QMouseEvent* e) override;
    void wheelEvent(QWheelEvent* e) override;
    void contextMenuEvent(QContextMenuEvent* e) override;
    void dragEnterEvent(QDragEnterEvent* e) override;
    void dragMoveEvent(QDragMoveEvent* e) override;
    void dropEvent(QDropEvent* e) override;

private:
    SheetScene* m_scene;
    std::optional<PartKind> m_placeKind;
    std::optional<WireEnd> m_wireFrom;
    QPoint m_wirePress; ///< where a wire drag began, in view pixels
    QGraphicsLineItem* m_rubberWire = nullptr;
    std::vector<std::pair<PartId, QPointF>> m_pressPositions;
    bool m_panning = false;
    QPoint m_panLast;
};

/// Mime type of a Parts palette drag: the kind's file key.
inline constexpr const char* kPartKindMime = "application/x-lineward-part-kind";

} // namespace lineward::ui
