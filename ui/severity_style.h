// Our badge code for findings: a shape and a colour per severity.
#pragma once

#include "rules/finding.h"

#include <QColor>
#include <QPainter>
#include <QPainterPath>
#include <QString>

namespace lineward::ui {

/// Violation: red-orange octagon; caution: amber diamond; note: slate-blue circle.
QColor severityColor(Severity s);
/// Badge outline centred on (0,0) with the given size.
QPainterPath severityShape(Severity s, qreal size);
QString severityLabel(Severity s);

/// Our badge of a severity, centred at `at` (the Sheet, the Findings list and the Submittal's
/// legend draw the same one).
void paintSeverityBadge(QPainter& p, Severity s, QPointF at, qreal size = 13);
/// Our accepted badge (accepted findings, none open): a hollow green-grey ring with a tick.
void paintAcceptedBadge(QPainter& p, QPointF at, qreal size = 13);

} // namespace lineward::ui
