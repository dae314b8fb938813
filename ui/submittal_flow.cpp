// Flowed text pages of the Submittal and the rows they hold, all read from the check result.
#include "submittal_flow.h"

#include "report/report_format.h"
#include "report/schedules.h"

#include <QFontMetricsF>
#include <cmath>

namespace lineward::ui {

namespace {

QString qs(const std::string& s) {
    return QString::fromStdString(s);
}

double titleHeight(const QPaintDevice& dev, const SubmittalStyle& st) {
    return QFontMetricsF(st.font(st.head, true), &dev).lineSpacing() + 4;
}

double leadHeight(const QPaintDevice& dev, const SubmittalStyle& st, const QRectF& body,
                  const QString& lead) {
    if (lead.isEmpty())
        return 0;
    const QFontMetricsF fm(st.font(st.body), &dev);
    return fm.boundingRect(QRectF(0, 0, body.width(), 1e6), Qt::TextWordWrap, lead).height() + 6;
}

double rowHeight(const QPaintDevice& dev, const SubmittalStyle& st, const QRectF& body,
                 const QStringList& row, const std::vector<double>& widths, bool header) {
    const QFontMetricsF fm(st.font(st.body, header), &dev);
    double h = fm.lineSpacing();
    for (int k = 0; k < row.size() && k < static_cast<int>(widths.size()); ++k) {
        const double w = widths[static_cast<std::size_t>(k)] * body.width();
        h = std::max(h,
                     fm.boundingRect(QRectF(0, 0, w - 6, 1e6), Qt::TextWordWrap, row[k]).height());
    }
    return h + 2;
}

void paintRow(QPainter& p, const SubmittalStyle& st, const QRectF& body, double y, double h,
              const QStringList& row, const std::vector<double>& widths, bool header) {
    p.setFont(st.font(st.body, header));
    double x = body.left();
    for (int k = 0; k < row.size() && k < static_cast<int>(widths.size()); ++k) {
        const double w = widths[static_cast<std::size_t>(k)] * body.width();
        p.drawText(QRectF(x, y, w - 6, h), Qt::TextWordWrap, row[k]);
        x += w;
    }
    if (header) {
        p.setPen(QPen(Qt::black, 0.6));
        p.drawLine(QPointF(body.left(), y + h - 1), QPointF(body.right(), y + h - 1));
    }
}

} // namespace

FlowLayout layoutFlow(const QPaintDevice& dev, const SubmittalStyle& st, const QRectF& body,
                      const std::vector<FlowTable>& tables) {
    FlowLayout l;
    l.pages.emplace_back();
    double y = body.top();
    const double titleH = titleHeight(dev, st);
    auto newPage = [&] {
        l.pages.emplace_back();
        y = body.top();
    };
    for (std::size_t t = 0; t < tables.size(); ++t) {
        const FlowTable& tab = tables[t];
        std::vector<double> heights;
        for (const auto& r : tab.rows)
            heights.push_back(rowHeight(dev, st, body, r, tab.widths, false));
        const double headerH =
            tab.header.isEmpty() ? 0 : rowHeight(dev, st, body, tab.header, tab.widths, true);
        const double leadH = leadHeight(dev, st, body, tab.lead);
        l.rowH.push_back(heights);
        l.headerH.push_back(headerH);
        if (tab.newPage && !l.pages.back().empty())
            newPage();
        // A table starts where its title, sentence, header and first two rows fit.
        double need = titleH + leadH + headerH;
        for (std::size_t i = 0; i < std::min<std::size_t>(2, heights.size()); ++i)
            need += heights[i];
        if (y > body.top() && y + need > body.bottom())
            newPage();
        FlowPiece piece{t, 0, 0, false, y};
        y += titleH + leadH + headerH;
        for (std::size_t i = 0; i < heights.size(); ++i) {
            if (y + heights[i] > body.bottom() && i > piece.first) {
                piece.end = i;
                l.pages.back().push_back(piece);
                newPage();
                piece = FlowPiece{t, i, 0, true, y};
                y += titleH + headerH;
            }
            y += heights[i];
        }
        piece.end = heights.size();
        l.pages.back().push_back(piece);
        y += st.body; // a gap before the next table
    }
    return l;
}

void paintFlowPage(QPainter& p, const QPaintDevice& dev, const SubmittalStyle& st,
                   const QRectF& body, const std::vector<FlowTable>& tables,
                   const FlowLayout& layout, std::size_t page) {
    const double titleH = titleHeight(dev, st);
    for (const FlowPiece& piece : layout.pages[page]) {
        const FlowTable& tab = tables[piece.table];
        double y = piece.top;
        p.setPen(Qt::black);
        p.setFont(st.font(st.head, true));
        p.drawText(QRectF(body.left(), y, body.width(), titleH), Qt::AlignLeft | Qt::AlignTop,
                   tab.title + (piece.continued ? " (continued)" : ""));
        y += titleH;
        if (!piece.continued && !tab.lead.isEmpty()) {
            p.setFont(st.font(st.body));
            const double h = leadHeight(dev, st, body, tab.lead);
            p.drawText(QRectF(body.left(), y, body.width(), h), Qt::TextWordWrap, tab.lead);
            y += h;
        }
        if (!tab.header.isEmpty()) {
            const double h = layout.headerH[piece.table];
            paintRow(p, st, body, y, h, tab.header, tab.widths, true);
            p.setPen(Qt::black);
            y += h;
        }
        for (std::size_t i = piece.first; i < piece.end; ++i) {
            const double h = layout.rowH[piece.table][i];
            paintRow(p, st, body, y, h, tab.rows[i], tab.widths, false);
            y += h;
        }
    }
}

QString flowPageTitle(const std::vector<FlowTable>& tables, const FlowLayout& layout,
                      std::size_t page) {
    const auto& pieces = layout.pages[page];
    return pieces.empty() ? QString() : tables[pieces.front().table].title;
}

std::vector<FlowTable> submittalFlowTables(const CheckResult& result) {
    const Drawing& d = *result.drawing;
    const CheckReport& r = result.report;
    auto tags = [&](const std::vector<PartId>& parts) {
        QStringList t;
        for (auto id : parts)
            if (const Part* p = d.part(id))
                t << qs(p->tag);
        return t.join(", ");
    };
    auto n = [](double v) {
        return QString::number(v, 'f', std::abs(v) < 10 ? 2 : std::abs(v) < 1000 ? 1 : 0);
    };
    FlowTable open{"Findings summary",
                   {},
                   {"Severity", "Rule", "Clause", "Parts", "Computed / limit", "Finding"},
                   {},
                   {0.08, 0.16, 0.14, 0.12, 0.12, 0.38}};
    FlowTable accepted{"Accepted deviations",
                       {},
                       {"Rule", "Parts", "By", "Date", "Note"},
                       {},
                       {0.18, 0.16, 0.12, 0.10, 0.44}};
    for (const auto& f : r.findings) {
        if (f.accepted) {
            for (const auto& a : d.accepted())
                if (acceptanceCovers(a, f))
                    accepted.rows.push_back(
                        {qs(f.ruleId), tags(f.parts), qs(a.by), qs(a.date), qs(a.note)});
        } else if (f.severity != Severity::Note) {
            const QString vs = f.computed && f.limit
                                   ? n(*f.computed) + " / " + n(*f.limit) + " " + qs(f.unit)
                                   : QString();
            open.rows.push_back({qs(std::string(severityName(f.severity))), qs(f.ruleId),
                                 qs(f.clause), tags(f.parts), vs, qs(f.message)});
        }
    }
    for (auto i : r.staleAccepted) {
        const Accepted& a = d.accepted()[i];
        accepted.rows.push_back({qs(a.rule), tags(a.parts), qs(a.by), qs(a.date),
                                 qs(a.note) + " — STALE: no finding matches it any longer"});
    }
    if (open.rows.empty()) {
        // A clean drawing: a sentence, not a lone row in a table column.
        const int notes = r.openCounts[0];
        open.header.clear();
        open.lead =
            QString("The check found no open violations or cautions in this drawing") +
            (notes > 0
                 ? QString(" (%1 note%2 in the check report)").arg(notes).arg(notes == 1 ? "" : "s")
                 : QString()) +
            (r.acceptedCount > 0 ? QString("; the accepted deviations are listed below.")
                                 : QString("."));
    }
    std::vector<FlowTable> out{open};
    if (!accepted.rows.empty())
        out.push_back(accepted);
    if (!d.comments().empty()) {
        FlowTable comments{"Review comments",
                           {},
                           {"Comment", "Part", "By", "Date", "Status", "Text"},
                           {},
                           {0.07, 0.12, 0.12, 0.09, 0.08, 0.52}};
        for (const auto& c : d.comments()) {
            const Part* p = d.part(c.part);
            comments.rows.push_back({"C" + QString::number(c.id), p ? qs(p->tag) : QString(),
                                     qs(c.by), qs(c.date), c.resolved ? "resolved" : "open",
                                     qs(c.text)});
        }
        out.push_back(comments);
    }
    // The schedules follow on the same page where their first rows fit (a clean drawing's
    // one-sentence summary leaves most of a page).
    for (const auto& sch : buildSchedules(result)) {
        FlowTable t{"Schedule — " + qs(sch.name), {}, {}, {}, {}, false};
        for (const auto& h : sch.headers)
            t.header << qs(h);
        for (const auto& row : sch.rows) {
            QStringList cells;
            for (const auto& cell : row)
                cells << qs(cell);
            t.rows.push_back(cells);
        }
        t.widths.assign(sch.headers.size(), 1.0 / static_cast<double>(sch.headers.size()));
        out.push_back(std::move(t));
    }
    return out;
}

} // namespace lineward::ui
