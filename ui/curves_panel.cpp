// CurvesPanel: the core builds the curve set; the shared renderer paints it.
#include "curves_panel.h"

#include "curves_plot.h"
#include "guard.h"
#include "studies/study_view.h"

#include <QPainter>

namespace lineward::ui {

CurvesPanel::CurvesPanel(Document& doc, QWidget* parent) : QWidget(parent), m_doc(doc) {
    setObjectName("curves");
    setMinimumSize(420, 260);
    connect(&doc, &Document::reportChanged, this,
            guarded(this, tr("Drawing the curves"), [this] { refresh(); }));
    connect(&doc, &Document::drawingReset, this, [this] { showPart(std::nullopt); });
}

void CurvesPanel::showPart(std::optional<PartId> id) {
    m_part = id;
    refresh();
}

void CurvesPanel::showEvent(QShowEvent* e) {
    QWidget::showEvent(e);
    if (m_stale)
        runGuarded(this, tr("Drawing the curves"), [this] { rebuild(); });
}

void CurvesPanel::refresh() {
    m_stale = true;
    if (isVisible())
        rebuild();
}

void CurvesPanel::rebuild() {
    m_stale = false;
    // Read from the newest check result (its own drawing: a part added since is not in it yet).
    const CheckResult& result = m_doc.result();
    const auto view = result.view();
    m_set = m_part && view && result.drawing->part(*m_part) ? buildCurveSet(*view, *m_part)
                                                            : CurveSet{};
    update();
}

void CurvesPanel::paintEvent(QPaintEvent*) {
    QPainter p(this);
    if (m_set.series.empty() && m_set.title.empty()) {
        p.fillRect(rect(), palette().window());
        p.drawText(rect(), Qt::AlignCenter, tr("Select a part to see the curves on its path."));
        return;
    }
    paintCurves(p, rect(), m_set);
}

} // namespace lineward::ui
