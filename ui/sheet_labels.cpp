// SheetScene's label placement and bucket frames: each part's label goes to the side where no
// symbol, bus or wire is in its way, and each bucket is framed around its members.
#include "bucket_item.h"
#include "part_item.h"
#include "sheet_scene.h"
#include "wire_item.h"

#include <QPainterPath>
#include <algorithm>
#include <cmath>
#include <cstdint>
#include <unordered_map>

namespace lineward::ui {

namespace {

// Rectangles that a label must not cross, hashed into square cells for nearby look-ups.
class ObstacleGrid {
public:
    static constexpr qreal kCell = 50.0;
    void add(const QRectF& r, const void* owner) {
        const int i = static_cast<int>(m_rects.size());
        m_rects.push_back({r, owner});
        for (int cx = cell(r.left()); cx <= cell(r.right()); ++cx)
            for (int cy = cell(r.top()); cy <= cell(r.bottom()); ++cy)
                m_cells[key(cx, cy)].push_back(i);
    }
    // Free width from `edge` going right (dir +1) or left (dir −1) within the band, up to `most`.
    qreal room(qreal edge, int dir, qreal top, qreal bottom, qreal most, const void* self) const {
        qreal best = most;
        const qreal far = edge + dir * most;
        for (int cx = cell(std::min(edge, far)); cx <= cell(std::max(edge, far)); ++cx)
            for (int cy = cell(top); cy <= cell(bottom); ++cy) {
                auto it = m_cells.find(key(cx, cy));
                if (it == m_cells.end())
                    continue;
                for (int i : it->second) {
                    const auto& [r, owner] = m_rects[i];
                    if (owner == self || r.top() >= bottom || r.bottom() <= top)
                        continue;
                    const qreal gap = dir > 0 ? r.left() - edge : edge - r.right();
                    if (gap >= -2) // ahead of the symbol, not crossing it
                        best = std::min(best, std::max<qreal>(0, gap));
                }
            }
        return best;
    }

private:
    static int cell(qreal v) { return static_cast<int>(std::floor(v / kCell)); }
    static std::int64_t key(int cx, int cy) { return (std::int64_t(cx) << 32) ^ std::uint32_t(cy); }
    std::vector<std::pair<QRectF, const void*>> m_rects;
    std::unordered_map<std::int64_t, std::vector<int>> m_cells;
};

// The straight runs of a wire's path as thin rectangles.
void addWireRuns(ObstacleGrid& grid, const WireItem* w) {
    const QPainterPath& path = w->path();
    for (int i = 1; i < path.elementCount(); ++i) {
        const QPointF a = path.elementAt(i - 1), b = path.elementAt(i);
        grid.add(QRectF(a, b).normalized().adjusted(-1, -1, 1, 1), w);
    }
}

} // namespace

void SheetScene::layoutLabels() {
    ObstacleGrid grid;
    for (auto& [id, item] : m_parts)
        grid.add(item->symbolSceneRect(), item);
    for (auto& [id, w] : m_wires)
        addWireRuns(grid, w);
    const qreal most = PartItem::kLabelWidth + 12;
    for (auto& [id, item] : m_parts) {
        const QRectF sym = item->symbolSceneRect();
        // the label's band, with room for ratings wrapped onto a second line
        const qreal top = sym.center().y() - 16, bottom = sym.center().y() + 24;
        item->setLabelRoom(grid.room(sym.right(), +1, top, bottom, most, item),
                           grid.room(sym.left(), -1, top, bottom, most, item));
    }
}

void SheetScene::refreshBuckets() {
    const auto& buckets = m_doc.drawing().buckets();
    std::unordered_map<BucketId, BucketItem*> kept;
    for (const auto& b : buckets) {
        QRectF frame;
        const PartItem* top = nullptr;
        for (auto pid : b.parts)
            if (PartItem* pi = itemFor(pid)) {
                frame = frame.united(pi->footprintSceneRect());
                if (!top || pi->pos().y() < top->pos().y())
                    top = pi;
            }
        auto it = m_buckets.find(b.id);
        BucketItem* item = it != m_buckets.end() ? it->second : nullptr;
        if (frame.isEmpty()) // no member on the Sheet: nothing to frame
            continue;
        if (!item) {
            item = new BucketItem(b.id);
            addItem(item);
        }
        if (it != m_buckets.end())
            m_buckets.erase(it);
        // The tag sits on the top edge, right of the wire that feeds the topmost member.
        // 3 units beside: labels end 8 before the next symbol, so neighbouring frames never touch
        item->setOutline(frame.adjusted(-3, -12, 3, 2), QString::fromStdString(b.tag),
                         top->pos().x() + 6);
        kept[b.id] = item;
    }
    for (auto& [id, gone] : m_buckets)
        delete gone;
    m_buckets = std::move(kept);
    refreshBucketMarks();
}

} // namespace lineward::ui
