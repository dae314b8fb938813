// The Curves panel: the plot of the selected part's path, redrawn after every check.
#pragma once

#include "curves/curve_set.h"
#include "document.h"

#include <QWidget>
#include <optional>

namespace lineward::ui {

class CurvesPanel : public QWidget {
    Q_OBJECT
public:
    explicit CurvesPanel(Document& doc, QWidget* parent = nullptr);
    void showPart(std::optional<PartId> id);
    const CurveSet& curveSet() const { return m_set; }

protected:
    void paintEvent(QPaintEvent* e) override;
    void showEvent(QShowEvent* e) override;

private:
    /// Builds the curve set when the panel is shown; while hidden, only notes it is stale.
    void refresh();
    void rebuild();
    bool m_stale = true;
    Document& m_doc;
    std::optional<PartId> m_part;
    CurveSet m_set;
};

} // namespace lineward::ui
