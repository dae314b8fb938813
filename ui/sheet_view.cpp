// SheetView: press on a terminal starts a wire; press on a part records where the selection
// started, and release pushes one move for the whole drag.
#include "sheet_view.h"

#include "part_item.h"
#include "sheet_scene.h"

#include <QContextMenuEvent>
#include <QMimeData>
#include <QMouseEvent>
#include <QScrollBar>
#include <QWheelEvent>
#include <cmath>

namespace lineward::ui {

SheetView::SheetView(SheetScene* scene, QWidget* parent)
    : QGraphicsView(scene, parent), m_scene(scene) {
    setObjectName("sheetView");
    setRenderHint(QPainter::Antialiasing);
    setDragMode(QGraphicsView::RubberBandDrag);
    setAcceptDrops(true);
    setTransformationAnchor(QGraphicsView::AnchorUnderMouse);
    // A drag in progress when the drawing is replaced holds items that are about to go.
    connect(scene, &SheetScene::aboutToRebuild, this, [this] {
        m_rubberWire = nullptr;
        m_wireFrom.reset();
        m_pressPositions.clear();
    });
}

void SheetView::setPlaceKind(std::optional<PartKind> kind) {
    m_placeKind = kind;
    viewport()->setCursor(kind ? Qt::CrossCursor : Qt::ArrowCursor);
}

void SheetView::zoomBy(qreal factor) {
    scale(factor, factor);
}

std::optional<WireEnd> SheetView::terminalAt(QPointF scenePos) const {
    const qreal reach = 7.0;
    for (auto* gi :
         m_scene->items(QRectF(scenePos - QPointF(reach, reach), QSizeF(2 * reach, 2 * reach)))) {
        auto* item = qgraphicsitem_cast<PartItem*>(gi);
        if (!item)
            continue;
        for (int t = 0; t < item->terminalCount(); ++t) {
            const QPointF tp = item->terminalScenePos(t, scenePos);
            if (std::hypot(tp.x() - scenePos.x(), tp.y() - scenePos.y()) <= reach)
                return WireEnd{item->partId(), t};
        }
    }
    return std::nullopt;
}

static QPointF snapped(QPointF p) {
    return QPointF(std::round(p.x() / 10.0) * 10.0, std::round(p.y() / 10.0) * 10.0);
}

void SheetView::mousePressEvent(QMouseEvent* e) {
    const QPointF sp = mapToScene(e->pos());
    if (e->button() == Qt::MiddleButton) {
        m_panning = true;
        m_panLast = e->pos();
        return;
    }
    if (e->button() == Qt::LeftButton && m_placeKind) {
        emit placeRequested(*m_placeKind, snapped(sp));
        if (!(e->modifiers() & Qt::ShiftModifier))
            setPlaceKind(std::nullopt); // Shift keeps placing the same kind
        return;
    }
    if (e->button() == Qt::LeftButton) {
        if (auto t = terminalAt(sp)) {
            m_wireFrom = t;
            m_wirePress = e->pos();
            m_rubberWire =
                m_scene->addLine(QLineF(sp, sp), QPen(QColor(0x1d, 0x7f, 0xb8), 1.2, Qt::DashLine));
            return;
        }
    }
    QGraphicsView::mousePressEvent(e);
    m_pressPositions.clear();
    for (auto id : m_scene->selectedParts())
        m_pressPositions.push_back({id, m_scene->itemFor(id)->pos()});
}

void SheetView::mouseMoveEvent(QMouseEvent* e) {
    if (m_panning) {
        const QPoint d = e->pos() - m_panLast;
        m_panLast = e->pos();
        horizontalScrollBar()->setValue(horizontalScrollBar()->value() - d.x());
        verticalScrollBar()->setValue(verticalScrollBar()->value() - d.y());
        return;
    }
    if (m_rubberWire) {
        QLineF l = m_rubberWire->line();
        l.setP2(mapToScene(e->pos()));
        m_rubberWire->setLine(l);
        return;
    }
    QGraphicsView::mouseMoveEvent(e);
    if (e->buttons() & Qt::LeftButton && !m_pressPositions.empty())
        m_scene->routeWires(); // wires follow the dragged parts
}

void SheetView::mouseReleaseEvent(QMouseEvent* e) {
    if (m_panning) {
        m_panning = false;
        return;
    }
    if (m_rubberWire) {
        delete m_rubberWire;
        m_rubberWire = nullptr;
        if (m_wireFrom && (e->pos() - m_wirePress).manhattanLength() < 4) {
            // A click on a terminal (a bus bar is one terminal along its length) selects.
            if (auto* item = m_scene->itemFor(m_wireFrom->part)) {
                m_scene->clearSelection();
                item->setSelected(true);
            }
            m_wireFrom.reset();
            return;
        }
        auto to = terminalAt(mapToScene(e->pos()));
        if (to && m_wireFrom &&
            !(to->part == m_wireFrom->part && to->terminal == m_wireFrom->terminal))
            emit connectRequested(*m_wireFrom, *to);
        m_wireFrom.reset();
        return;
    }
    QGraphicsView::mouseReleaseEvent(e);
    std::vector<PartId> ids;
    std::vector<QPointF> from, to;
    for (auto& [id, start] : m_pressPositions) {
        auto* item = m_scene->itemFor(id);
        if (item && item->pos() != start) {
            ids.push_back(id);
            from.push_back(start);
            to.push_back(item->pos());
        }
    }
    m_pressPositions.clear();
    if (!ids.empty())
        emit moveFinished(ids, from, to);
}

void SheetView::wheelEvent(QWheelEvent* e) {
    const qreal factor = std::pow(1.0015, e->angleDelta().y());
    zoomBy(factor);
}

void SheetView::dragEnterEvent(QDragEnterEvent* e) {
    if (e->mimeData()->hasFormat(kPartKindMime) || e->mimeData()->hasUrls())
        e->acceptProposedAction();
}

void SheetView::dragMoveEvent(QDragMoveEvent* e) {
    e->acceptProposedAction();
}

void SheetView::dropEvent(QDropEvent* e) {
    if (e->mimeData()->hasFormat(kPartKindMime)) {
        if (auto kind = kindFromKey(e->mimeData()->data(kPartKindMime).toStdString()))
            emit placeRequested(*kind, snapped(mapToScene(e->position().toPoint())));
        e->acceptProposedAction();
        return;
    }
    QStringList files;
    for (const auto& url : e->mimeData()->urls())
        if (url.isLocalFile())
            files << url.toLocalFile();
    if (!files.isEmpty())
        emit filesDropped(files);
    e->acceptProposedAction();
}

void SheetView::contextMenuEvent(QContextMenuEvent* e) {
    for (auto* gi : items(e->pos()))
        if (auto* item = qgraphicsitem_cast<PartItem*>(gi)) {
            emit partMenuRequested(item->partId(), e->globalPos());
            e->accept();
            return;
        }
    QGraphicsView::contextMenuEvent(e);
}

} // namespace lineward::ui
