// Our badge code for findings: a shape and a colour per severity.
#pragma once

#include "rules/finding.h"

#include <QColor>
#include <QPainterPath>
#include <QString>

namespace lineward::ui {

/// Violation: red-orange octagon; caution: amber diamond; note: slate-blue circle.
QColor severityColor(Severity s);
/// Badge outline centred on (0,0) with the given size.
QPainterPath severityShape(Severity s, qreal size);
QString severityLabel(Severity s);

} // namespace lineward::ui
