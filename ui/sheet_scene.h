// The Sheet: a graphics scene with one item per part and wire, following the Document's change
// events.
#pragma once

#include "document.h"

#include <QGraphicsScene>
#include <unordered_map>

namespace lineward::ui {

class PartItem;
class WireItem;

/// Scene view of the Document's drawing; items update themselves from the Document's signals.
class SheetScene : public QGraphicsScene {
    Q_OBJECT
public:
    explicit SheetScene(Document& doc, QObject* parent = nullptr);
    PartItem* itemFor(PartId id) const;
    WireItem* wireItem(WireId id) const;
    std::vector<PartId> selectedParts() const;
    std::vector<WireId> selectedWires() const;
    /// Sheet grid pitch in scene units.
    static constexpr qreal kGrid = 10.0;
    /// Re-routes wires between the items' current positions (also during a drag).
    void routeWires();
    /// Printing: a plain white background without the grid.
    void setPrinting(bool on) { m_printing = on; }

signals:
    /// Every item is about to be deleted (a drawing opened or recovered): views drop their
    /// pointers to items, such as a wire being dragged.
    void aboutToRebuild();

protected:
    void drawBackground(QPainter* painter, const QRectF& rect) override;

private:
    void rebuild();
    void refreshBadges();
    void onPartAdded(PartId id);
    void onPartRemoved(PartId id);
    void onPartChanged(PartId id);
    void onWireAdded(WireId id);
    void onWireRemoved(WireId id);
    Document& m_doc;
    std::unordered_map<PartId, PartItem*> m_parts;
    std::unordered_map<WireId, WireItem*> m_wires;
    bool m_routePending = false;
    bool m_printing = false;
    void scheduleRoute();
};

} // namespace lineward::ui
