// Arc-flash labels of our own design, painted with QPainter: one label per bus and bucket
// (content from core/report/arc_flash_labels.h), on label stock as PDF, and into the Submittal.
#pragma once

#include "report/arc_flash_labels.h"

#include <QRectF>
#include <QSizeF>
#include <QString>
#include <QStringList>
#include <optional>
#include <vector>

class QPainter;

namespace lineward::ui {

/// Label stock: the label size and how many go on one printed page.
enum class LabelStock {
    Roll4x6,     ///< 4 × 6 in labels, one per page (label printers)
    Letter2x4x6, ///< two 4 × 6 in labels side by side on a letter sheet
    Letter4x4x5, ///< four 4 × 5 in labels, two by two, on a letter sheet
};

/// "4x6", "letter-2" or "letter-4"; nothing for other names.
std::optional<LabelStock> labelStockByName(const QString& name);
/// The names labelStockByName takes, and what each is, for menus and help.
QStringList labelStockNames();
QString labelStockDescription(LabelStock s);
/// Labels on one page of the stock.
int labelsPerPage(LabelStock s);
/// One label's size in points (72 per inch).
QSizeF labelSizePt(LabelStock s);

/// Paints one label into `r` (points, 72 per inch, at least 4 × 5 in). Returns false where the
/// content did not fit (nothing is drawn outside `r`).
bool paintLabel(QPainter& p, const QRectF& r, const ArcFlashLabel& label, const Drawing& d);

/// The grid of 4 × 6 in labels an area holds (the Submittal's label sheets): at full size where
/// at least one fits, otherwise one label scaled down to the area.
struct LabelGrid {
    int cols = 1, rows = 1;
    double scale = 1;
    int perPage() const { return cols * rows; }
};
LabelGrid labelGridFor(const QRectF& area);
/// Paints labels[first ...] (up to the grid's count) into the area; false where one did not fit.
bool paintLabelGrid(QPainter& p, const QRectF& area, const std::vector<ArcFlashLabel>& labels,
                    std::size_t first, const Drawing& d);

struct LabelSheetResult {
    int pages = 0;
    int labels = 0;
    QString error; ///< empty: written
};

/// Every label of the result on the stock, as a PDF file. `date` is the assessment date.
LabelSheetResult writeLabelsPdf(const QString& path, const CheckResult& result, LabelStock stock,
                                const QString& date);

} // namespace lineward::ui
