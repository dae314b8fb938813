// The Submittal's page furniture, shared by its pages: the text style (one font family, no text
// smaller than the readable minimum on the chosen paper and print scale), the frame, the title
// block with the check status in words, and the legend of our Sheet symbols.
#pragma once

#include "check/check.h"

#include <QFont>
#include <QPagedPaintDevice>
#include <QPainter>
#include <QString>

namespace lineward::ui {

/// Smallest printed text: its size (the font's em, as type is measured) at least this on the
/// paper, after the print scale (a half-size print of a full-size sheet halves every letter).
inline constexpr double kMinTextMm = 2.0;
/// The smallest text the Sheet draws, in scene units: tags, ratings, bucket tags, the arc-flash,
/// comment and revision marks are all 10 (part_item.cpp, bucket_item.cpp, comment_mark.cpp,
/// revision_flag.cpp).
inline constexpr double kSmallestSceneTextPx = 10.0;

/// Text sizes of one Submittal, in points on the page (the layout is in points).
struct SubmittalStyle {
    QString family;
    double minPt = 8;   ///< the smallest size that meets kMinTextMm
    double small = 8;   ///< title block, legend, curve labels
    double body = 8;    ///< tables
    double head = 10;   ///< table titles
    double big = 12;    ///< project and title
    double line = 10;   ///< line spacing of `small`
    double titleH = 96; ///< title block height
    QFont font(double pt, bool bold = false) const;
    /// Sizes for a device (72 dpi) and a print scale (1 full size, 0.5 half size).
    static SubmittalStyle forDevice(const QPaintDevice& dev, double printScale);
};

/// What every page's title block states.
struct TitleBlockData {
    const Drawing* drawing = nullptr;
    QString date;         ///< the Submittal's date (the check's)
    QString checkedBy;    ///< who checked: the options' name, else the drawing's checked_by
    QString status;       ///< the check status in words (checkStatusWords)
    QString revisionNote; ///< the revision flags' line, if any
    QString flagRevision; ///< the revision the flags carry; empty: no flags, none in the legend
};

QRectF submittalPageRect(const QPaintDevice& dev);
/// Inside the frame, above the title block.
QRectF submittalBodyRect(const QPaintDevice& dev, const SubmittalStyle& style);
/// Frame and title block of one page; `sheetTitle` follows the drawing's title.
void paintTitleBlock(QPainter& p, const QPaintDevice& dev, const SubmittalStyle& style,
                     const TitleBlockData& data, int pageNo, int pageCount,
                     const QString& sheetTitle);

} // namespace lineward::ui
