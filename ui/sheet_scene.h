// The Sheet: a graphics scene with one item per part and wire, rebuilt from the Document.
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
    /// Sheet grid pitch in scene units.
    static constexpr qreal kGrid = 10.0;

protected:
    void drawBackground(QPainter* painter, const QRectF& rect) override;

private:
    void rebuild();
    void refreshBadges();
    void routeWires();
    Document& m_doc;
    std::unordered_map<PartId, PartItem*> m_parts;
    std::vector<WireItem*> m_wires;
};

} // namespace lineward::ui
