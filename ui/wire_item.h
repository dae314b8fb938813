// Scene item drawing one wire as an orthogonal path between two terminals.
#pragma once

#include "model/drawing.h"

#include <QGraphicsPathItem>

namespace lineward::ui {

/// Draws a Wire: vertical, horizontal, vertical.
class WireItem : public QGraphicsPathItem {
public:
    enum { Type = UserType + 2 };
    explicit WireItem(const Wire& wire);
    int type() const override { return Type; }
    WireId wireId() const { return m_wire.id; }
    const Wire& wire() const { return m_wire; }
    /// Re-routes the path between two scene points.
    void route(QPointF a, QPointF b);

private:
    Wire m_wire;
};

} // namespace lineward::ui
