// The Submittal: one-line sheet(s) with our title block, findings summary, schedules and curve
// sheets, painted onto any paged device (PDF writer or printer); plus SVG and CSV exports.
#pragma once

#include "check/check.h"

#include <QPageLayout>
#include <QPageSize>
#include <QString>
#include <memory>
#include <optional>
#include <vector>

class QPagedPaintDevice;

namespace lineward::ui {

struct SubmittalOptions {
    QPageSize paper = QPageSize(QPageSize::Tabloid);
    QPageLayout::Orientation orientation = QPageLayout::Landscape;
    /// Curve sheets for these parts; nothing: every motor branch and every path with a
    /// coordination or protection finding (report/curve_sheets.h).
    std::optional<std::vector<PartId>> curveParts;
    /// The one-line is tiled when fitting it on one page would shrink it below this scale.
    double minScale = 0.45;
    QString date; ///< printed in the title block; empty: today
    /// The previous revision's check: each part added or changed since it (core/compare) gets
    /// our revision flag on the one-line, and the revision table a line saying so. Nothing: no
    /// flags.
    std::shared_ptr<const CheckResult> previous;
    QString previousName; ///< the previous revision's file, named in that line
    QString revision;     ///< the flags' revision; empty: the newest row of the revision table
    /// The size the sheets will be printed at: 1 full size, 0.5 half size. Every text is sized
    /// at least 2 mm (its font size) on that print (submittal_sheet.h).
    double printScale = 1.0;
    /// Named in the title block as CHECKED; empty: the drawing's checked_by.
    QString checkedBy;
};

/// Paper by name ("letter", "legal", "tabloid", "a4", "a3"); nothing for other names.
std::optional<QPageSize> paperByName(const QString& name);

/// Paints the whole Submittal; returns the number of pages, or the reason it failed.
struct SubmittalResult {
    int pages = 0;
    int oneLineSheets = 0;
    int revisionFlags = 0; ///< parts flagged as added or changed since the previous revision
    double minTextPt = 0;  ///< the smallest text size used, in points on the page
    QString error;
};
/// Everything below reads one check result (the editor's newest, or the command line's one
/// runCheck); nothing here builds a network or runs a study. `tables` are the result's.
SubmittalResult paintSubmittal(QPagedPaintDevice& device, std::shared_ptr<const CheckResult> result,
                               std::shared_ptr<const Tables> tables, const SubmittalOptions& o);
/// paintSubmittal into a PDF file (vector, selectable text).
SubmittalResult writeSubmittalPdf(const QString& path, std::shared_ptr<const CheckResult> result,
                                  std::shared_ptr<const Tables> tables, const SubmittalOptions& o);
/// The one-line drawing as SVG; the reason on failure.
QString writeOneLineSvg(const QString& path, std::shared_ptr<const CheckResult> result,
                        std::shared_ptr<const Tables> tables);
/// motors.csv, cables.csv, devices.csv (RFC 4180) into a folder; the reason on failure.
QString writeScheduleCsvs(const QString& dir, const CheckResult& result);

} // namespace lineward::ui
