// The Submittal's text pages: tables (findings summary, accepted deviations, review comments,
// schedules) flowed onto pages one after another, so a short table shares a page with the next
// instead of leaving a near-empty one. Laid out once; counting and painting read the layout.
#pragma once

#include "submittal_sheet.h"

#include <QStringList>
#include <vector>

namespace lineward::ui {

/// One table: its title, an optional sentence set above it (the clean drawing's message is a
/// sentence, not a table cell), a header row and data rows, and column widths as fractions of
/// the page body. `newPage`: it starts on a page of its own.
struct FlowTable {
    QString title;
    QString lead;
    QStringList header;
    std::vector<QStringList> rows;
    std::vector<double> widths;
    bool newPage = false;
};

/// Where each piece of each table goes: per page, the pieces in order.
struct FlowPiece {
    std::size_t table = 0;
    std::size_t first = 0, end = 0; ///< data rows [first, end)
    bool continued = false;         ///< the table began on an earlier page
    double top = 0;                 ///< where its title goes
};
struct FlowLayout {
    std::vector<std::vector<FlowPiece>> pages;
    std::vector<std::vector<double>> rowH; ///< per table, per data row
    std::vector<double> headerH;           ///< per table
};

FlowLayout layoutFlow(const QPaintDevice& dev, const SubmittalStyle& st, const QRectF& body,
                      const std::vector<FlowTable>& tables);
/// Paints one page of the layout (its body only; the caller draws the title block).
void paintFlowPage(QPainter& p, const QPaintDevice& dev, const SubmittalStyle& st,
                   const QRectF& body, const std::vector<FlowTable>& tables,
                   const FlowLayout& layout, std::size_t page);
/// The sheet title of a flowed page: its first table's title.
QString flowPageTitle(const std::vector<FlowTable>& tables, const FlowLayout& layout,
                      std::size_t page);

/// The review section: findings summary (or the clean drawing's sentence), accepted deviations
/// and review comments, then the schedules, all flowed.
std::vector<FlowTable> submittalFlowTables(const CheckResult& result);

} // namespace lineward::ui
