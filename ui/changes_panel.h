// The Changes panel: every difference between the open drawing and an older revision, from the
// one comparison (core/compare), grouped by kind; a click finds the part on the Sheet.
#pragma once

#include "compare/drawing_compare.h"

#include <QPointF>
#include <QWidget>

class QLabel;
class QPushButton;
class QTreeWidget;

namespace lineward::ui {

class ChangesPanel : public QWidget {
    Q_OBJECT
public:
    explicit ChangesPanel(QWidget* parent = nullptr);
    QTreeWidget* list() const { return m_list; }
    /// Lists a comparison of the open drawing with `otherFile` (the older revision).
    void showComparison(const DrawingComparison& c, const QString& otherFile);
    void clear();

    /// Item data roles of a row: the part of the open drawing it is about, or the place of a
    /// removed part's ghost.
    static constexpr int kPartRole = Qt::UserRole + 1;
    static constexpr int kPlaceRole = Qt::UserRole + 2;

signals:
    void locatePart(lineward::PartId id);
    void locatePlace(QPointF scenePos);
    void leaveRequested();

protected:
    bool eventFilter(QObject* watched, QEvent* event) override;
    void keyPressEvent(QKeyEvent* event) override;

private:
    void rowActivated();
    QLabel* m_header;
    QPushButton* m_leave;
    QTreeWidget* m_list;
};

} // namespace lineward::ui
