// The Sheet: a graphics scene with one item per part and wire, following the Document's change
// events.
#pragma once

#include "document.h"

#include <QGraphicsScene>
#include <unordered_map>

namespace lineward::ui {

class BucketItem;
class CommentMark;
class PartItem;
class WireItem;

/// Scene view of the Document's drawing; items update themselves from the Document's signals.
class SheetScene : public QGraphicsScene {
    Q_OBJECT
public:
    explicit SheetScene(Document& doc, QObject* parent = nullptr);
    PartItem* itemFor(PartId id) const;
    WireItem* wireItem(WireId id) const;
    BucketItem* bucketItem(BucketId id) const;
    /// Selects exactly these parts (or every part and wire) with one selectionChanged.
    void selectParts(const std::vector<PartId>& ids);
    void selectEverything();
    std::vector<PartId> selectedParts() const;
    std::vector<WireId> selectedWires() const;
    /// The part terminal nearest a scene point within `reach`, if any (what a new part is
    /// dropped onto).
    std::optional<WireEnd> nearestTerminal(QPointF at, qreal reach) const;
    /// Sheet grid pitch in scene units.
    static constexpr qreal kGrid = 10.0;
    /// Re-routes wires between the items' current positions (also during a drag).
    void routeWires();
    /// The review comments' marks, one per comment, beside their parts.
    const std::vector<CommentMark*>& commentMarks() const { return m_commentMarks; }
    /// Printing: a plain white background without the grid.
    void setPrinting(bool on) { m_printing = on; }
    bool printing() const { return m_printing; }
    /// True where `item` is drawn for print: its text is then black (the Submittal's rule).
    static bool printing(const QGraphicsItem* item);

signals:
    /// Every item is about to be deleted (a drawing opened or recovered): views drop their
    /// pointers to items, such as a wire being dragged.
    void aboutToRebuild();

protected:
    void drawBackground(QPainter* painter, const QRectF& rect) override;

private:
    void rebuild();
    void layoutLabels();
    void refreshBuckets();
    void selectionLost();
    void deleteItem(QGraphicsItem* item); ///< a selected one tells selectionChanged once, later
    void refreshBadges();
    void refreshCommentMarks();
    void refreshBucketMarks(); ///< each bucket's arc-flash mark from the check result
    static QString arcFlashMarkText(const ArcFlashEquipment& e);
    void onPartAdded(PartId id);
    void onPartRemoved(PartId id);
    void onPartChanged(PartId id);
    void onWireAdded(WireId id);
    void onWireRemoved(WireId id);
    Document& m_doc;
    std::unordered_map<PartId, PartItem*> m_parts;
    std::unordered_map<WireId, WireItem*> m_wires;
    std::unordered_map<BucketId, BucketItem*> m_buckets;
    std::vector<CommentMark*> m_commentMarks; ///< owned by the scene
    bool m_selectionPending = false;
    bool m_routePending = false, m_framesPending = false;
    bool m_printing = false;
    void scheduleRoute();
    /// Bucket frames only (a rating edit changes a label's width, not where anything is).
    void scheduleFrames();
};

} // namespace lineward::ui
