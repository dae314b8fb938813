// Submittal layout of our own: a thin frame, a title block strip along the bottom of every
// page (project, title, drawing number, sheet n of m, revisions, drawn/checked, date, caution),
// the one-line scaled or tiled with match lines, then text pages, curve sheets and the
// arc-flash labels.
#include "submittal.h"

#include "compare/drawing_compare.h"
#include "curves/curve_set.h"
#include "curves/path_curves.h"
#include "curves_plot.h"
#include "document.h"
#include "label_sheet.h"
#include "part_item.h"
#include "report/report_format.h"
#include "report/schedules.h"
#include "revision_flag.h"
#include "sheet_scene.h"
#include "studies/study_view.h"

#include <QDate>
#include <QDir>
#include <QFile>
#include <QPainter>
#include <QPdfWriter>
#include <QPrinter>
#include <QSvgGenerator>
#include <cmath>

namespace lineward::ui {

namespace {

constexpr double kTitleH = 92; // title block height in device units at 72 dpi equivalents

QRectF pageRect(const QPaintDevice& dev) {
    return QRectF(18, 18, dev.width() - 36, dev.height() - 36);
}

// The drawing area of a page: inside the border, above the title block.
QRectF bodyRect(const QPaintDevice& dev) {
    QRectF r = pageRect(dev);
    r.setBottom(r.bottom() - kTitleH - 6);
    return r.adjusted(8, 8, -8, -8);
}

struct PageCtx {
    QPainter& p;
    QPagedPaintDevice& dev;
    const Drawing& d;
    int pageNo = 0;
    int pageCount = 0;
    QString date;
    QString revisionNote; ///< the revision flags' line of the revision table, if any
    QRectF page() const { return pageRect(dev); }
    QRectF body() const { return bodyRect(dev); }
};

QString qs(const std::string& s) {
    return QString::fromStdString(s);
}

void titleBlock(PageCtx& c, const QString& sheetTitle) {
    QPainter& p = c.p;
    const QRectF pg = c.page();
    p.setPen(QPen(Qt::black, 1.2));
    p.setBrush(Qt::NoBrush);
    p.drawRect(pg);
    const QRectF tb(pg.left(), pg.bottom() - kTitleH, pg.width(), kTitleH);
    p.drawLine(tb.topLeft(), tb.topRight());
    // Columns: caution | project & title | revisions | number, sheet, people, date
    const double w = tb.width();
    const double x1 = tb.left() + w * 0.30, x2 = tb.left() + w * 0.58, x3 = tb.left() + w * 0.78;
    for (double x : {x1, x2, x3})
        p.drawLine(QPointF(x, tb.top()), QPointF(x, tb.bottom()));
    QFont small = p.font();
    small.setPointSizeF(6.5);
    QFont big = small;
    big.setPointSizeF(10);
    big.setBold(true);
    p.setFont(small);
    p.drawText(QRectF(tb.left() + 4, tb.top() + 3, x1 - tb.left() - 8, kTitleH - 6),
               Qt::TextWordWrap, QString("CAUTION — ") + QString::fromUtf8(kSafetyCaution));
    p.drawText(QRectF(x1 + 4, tb.top() + 3, x2 - x1 - 8, 12), "PROJECT");
    p.setFont(big);
    p.drawText(QRectF(x1 + 4, tb.top() + 14, x2 - x1 - 8, 20), Qt::TextWordWrap,
               qs(c.d.sheet.project));
    p.setFont(small);
    p.drawText(QRectF(x1 + 4, tb.top() + 40, x2 - x1 - 8, 12), "TITLE");
    p.setFont(big);
    p.drawText(QRectF(x1 + 4, tb.top() + 51, x2 - x1 - 8, 36), Qt::TextWordWrap,
               qs(c.d.sheet.title) + (sheetTitle.isEmpty() ? "" : " — " + sheetTitle));
    p.setFont(small);
    QString revs = "REV   DATE         BY            NOTE\n";
    for (const auto& r : c.d.sheet.revisions)
        revs += qs(r.rev).leftJustified(6) + qs(r.date).leftJustified(13) +
                qs(r.by).leftJustified(14) + qs(r.note) + "\n";
    revs += c.revisionNote;
    p.drawText(QRectF(x2 + 4, tb.top() + 3, x3 - x2 - 8, kTitleH - 6), Qt::TextWordWrap, revs);
    p.drawText(
        QRectF(x3 + 4, tb.top() + 3, tb.right() - x3 - 8, kTitleH - 6), Qt::TextWordWrap,
        QString("DRAWING %1\nSHEET %2 OF %3\nDRAWN %4\nCHECKED %5\nDATE %6\nRULE SET %7\nLineward")
            .arg(qs(c.d.sheet.drawingNo), QString::number(c.pageNo), QString::number(c.pageCount),
                 qs(c.d.sheet.drawnBy), qs(c.d.sheet.checkedBy), c.date, qs(c.d.sheet.ruleSet)));
}

bool nextPage(PageCtx& c) {
    if (c.pageNo > 0 && !c.dev.newPage())
        return false;
    ++c.pageNo;
    return true;
}

// A table's layout, measured on the output device exactly as painting measures it: the height
// of each row (cells word-wrapped in their columns) and the first row of each page. Counting
// pages and painting them share it, so the Submittal is painted once, with "sheet n of m".
struct TableLayout {
    std::vector<double> rowH;
    std::vector<std::size_t> pageStarts; ///< at least one page, even for no rows
};

QFont tableFont(const QFont& base, bool header) {
    QFont f = base;
    f.setPointSizeF(8);
    f.setBold(header);
    return f;
}

QString cellText(const QStringList& row, int k, bool header) {
    QString cell = row[k];
    if (k == 0 && header)
        cell.remove(0, 1); // the header mark
    return cell;
}

TableLayout layoutTable(const QPaintDevice& dev, const QFont& base, const QRectF& body,
                        const std::vector<QStringList>& rows, const std::vector<double>& widths) {
    TableLayout t;
    t.pageStarts.push_back(0);
    double y = body.top() + 20; // below the table's title
    for (std::size_t i = 0; i < rows.size(); ++i) {
        if (!(y + 24 < body.bottom())) {
            t.pageStarts.push_back(i);
            y = body.top() + 20;
        }
        const bool header = rows[i].value(0).startsWith(QChar(1));
        const QFontMetricsF fm(tableFont(base, header), &dev);
        double h = 12, x = body.left();
        for (int k = 0; k < rows[i].size() && k < static_cast<int>(widths.size()); ++k) {
            const double w = widths[static_cast<std::size_t>(k)] * body.width();
            const QRectF cellR(x, y, w - 4, 60);
            h = std::max(
                h, fm.boundingRect(cellR, Qt::TextWordWrap, cellText(rows[i], k, header)).height() +
                       1);
            x += w;
        }
        t.rowH.push_back(h);
        y += h;
    }
    return t;
}

// Rows of text over the pages their layout gives.
void textPages(PageCtx& c, const QString& title, const std::vector<QStringList>& rows,
               const std::vector<double>& widths) {
    const TableLayout t = layoutTable(c.dev, QFont(), c.body(), rows, widths);
    for (std::size_t page = 0; page < t.pageStarts.size(); ++page) {
        nextPage(c);
        titleBlock(c, title);
        const QRectF b = c.body();
        QFont head = tableFont(QFont(), true);
        head.setPointSizeF(10);
        c.p.setFont(head);
        c.p.drawText(QRectF(b.left(), b.top(), b.width(), 16), title);
        double y = b.top() + 20;
        const std::size_t end =
            page + 1 < t.pageStarts.size() ? t.pageStarts[page + 1] : rows.size();
        for (std::size_t i = t.pageStarts[page]; i < end; ++i) {
            const bool header = rows[i].value(0).startsWith(QChar(1));
            c.p.setFont(tableFont(QFont(), header));
            double x = b.left();
            for (int k = 0; k < rows[i].size() && k < static_cast<int>(widths.size()); ++k) {
                const double w = widths[static_cast<std::size_t>(k)] * b.width();
                c.p.drawText(QRectF(x, y, w - 4, 60), Qt::TextWordWrap,
                             cellText(rows[i], k, header));
                x += w;
            }
            y += t.rowH[i];
        }
    }
}

// How many sheets the one-line takes: one when it fits at the readable scale, else its tiles.
int oneLineSheetCount(const QRectF& src, const QRectF& body, const SubmittalOptions& o) {
    const double fit = std::min(body.width() / src.width(), body.height() / src.height());
    if (fit >= o.minScale)
        return 1;
    const QSizeF tile = body.size() / o.minScale;
    return static_cast<int>(std::ceil(src.width() / tile.width())) *
           static_cast<int>(std::ceil(src.height() / tile.height()));
}

// The one-line scaled to the page, or tiled over several pages with match lines where fitting
// it would shrink it below the readable scale.
void paintOneLine(PageCtx& c, SheetScene& scene, int& sheets, const SubmittalOptions& o) {
    const QRectF src = scene.itemsBoundingRect().adjusted(-30, -30, 30, 30);
    nextPage(c);
    const QRectF body = c.body();
    const double fit = std::min(body.width() / src.width(), body.height() / src.height());
    if (fit >= o.minScale) {
        const QSizeF size = src.size() * std::min(fit, 1.6);
        const QRectF target(body.center() - QPointF(size.width() / 2, size.height() / 2), size);
        titleBlock(c, "One-line");
        scene.render(&c.p, target, src);
        sheets = 1;
        return;
    }
    const QSizeF tile = body.size() / o.minScale;
    const int cols = static_cast<int>(std::ceil(src.width() / tile.width()));
    const int rows = static_cast<int>(std::ceil(src.height() / tile.height()));
    const int first = c.pageNo;
    for (int r = 0; r < rows; ++r)
        for (int k = 0; k < cols; ++k) {
            if (r || k)
                nextPage(c);
            titleBlock(c,
                       QString("One-line, part %1 of %2").arg(r * cols + k + 1).arg(rows * cols));
            const QRectF part(src.left() + k * tile.width(), src.top() + r * tile.height(),
                              tile.width(), tile.height());
            c.p.save();
            c.p.setClipRect(body);
            scene.render(&c.p, body, part, Qt::KeepAspectRatio);
            c.p.restore();
            QPen match(Qt::black, 2.2, Qt::DashLine);
            QFont f = c.p.font();
            f.setPointSizeF(7.5);
            f.setBold(true);
            c.p.setFont(f);
            auto edge = [&](QLineF line, int toSheet, bool vertical) {
                c.p.setPen(match);
                c.p.drawLine(line);
                c.p.setPen(Qt::black);
                const QString text = QString("MATCH LINE — SEE SHEET %1").arg(toSheet);
                const QPointF m = line.center();
                c.p.save();
                c.p.translate(m);
                if (vertical)
                    c.p.rotate(-90);
                c.p.drawText(QRectF(-110, -14, 220, 12), Qt::AlignCenter, text);
                c.p.restore();
            };
            if (k + 1 < cols)
                edge(QLineF(body.topRight(), body.bottomRight()), first + r * cols + k + 1, true);
            if (k > 0)
                edge(QLineF(body.topLeft() + QPointF(16, 0), body.bottomLeft() + QPointF(16, 0)),
                     first + r * cols + k - 1, true);
            if (r + 1 < rows)
                edge(QLineF(body.bottomLeft(), body.bottomRight()), first + (r + 1) * cols + k,
                     false);
            if (r > 0)
                edge(QLineF(body.topLeft() + QPointF(0, 16), body.topRight() + QPointF(0, 16)),
                     first + (r - 1) * cols + k, false);
        }
    sheets = rows * cols;
}

// Rows of the findings summary (open violations and cautions) and of the accepted deviations.
std::vector<std::vector<QStringList>> findingRows(const Drawing& d, const CheckReport& r) {
    auto tags = [&](const Finding& f) {
        QStringList t;
        for (auto id : f.parts)
            if (const Part* p = d.part(id))
                t << qs(p->tag);
        return t.join(", ");
    };
    std::vector<QStringList> open{
        {"\x01Severity", "Rule", "Clause", "Parts", "Computed / limit", "Finding"}};
    std::vector<QStringList> accepted{{"\x01Rule", "Parts", "By", "Date", "Note"}};
    for (const auto& f : r.findings) {
        auto n = [](double v) {
            return QString::number(v, 'f', std::abs(v) < 10 ? 2 : std::abs(v) < 1000 ? 1 : 0);
        };
        const QString vs = f.computed && f.limit
                               ? n(*f.computed) + " / " + n(*f.limit) + " " + qs(f.unit)
                               : QString();
        if (f.accepted) {
            for (const auto& a : d.accepted())
                if (a.rule == f.ruleId && !f.parts.empty() &&
                    std::find(a.parts.begin(), a.parts.end(), f.parts.front()) != a.parts.end())
                    accepted.push_back({qs(f.ruleId), tags(f), qs(a.by), qs(a.date), qs(a.note)});
        } else if (f.severity != Severity::Note) {
            open.push_back({qs(std::string(severityName(f.severity))), qs(f.ruleId), qs(f.clause),
                            tags(f), vs, qs(f.message)});
        }
    }
    if (open.size() == 1)
        open.push_back({"", "", "", "", "", "No open violations or cautions."});
    if (accepted.size() == 1)
        accepted.clear();
    return {open, accepted};
}

} // namespace

std::optional<QPageSize> paperByName(const QString& name) {
    const QString n = name.toLower();
    if (n == "letter")
        return QPageSize(QPageSize::Letter);
    if (n == "legal")
        return QPageSize(QPageSize::Legal);
    if (n == "tabloid")
        return QPageSize(QPageSize::Tabloid);
    if (n == "a4")
        return QPageSize(QPageSize::A4);
    if (n == "a3")
        return QPageSize(QPageSize::A3);
    return std::nullopt;
}

namespace {

// One table of the Submittal: its title, rows (a header row marked with \x01) and column widths
// as fractions of the page body.
struct TextTable {
    QString title;
    std::vector<QStringList> rows;
    std::vector<double> widths;
};

struct SubmittalData {
    const Drawing& d;
    const StudyView* view; ///< nothing where no study could run (no curve sheets then)
    SheetScene& scene;
    std::vector<PartId> curveParts;
    std::vector<TextTable> tables; ///< findings, accepted deviations, schedules
    QString revisionNote;
    std::vector<ArcFlashLabel> labels; ///< one per bus and bucket, after the curve sheets
};

// Flags each part added or changed since the previous revision; returns the revision table's
// line about them (empty without a previous revision).
QString flagRevisedParts(SheetScene& scene, const CheckResult& result, const SubmittalOptions& o,
                         int& flags) {
    flags = 0;
    if (!o.previous)
        return {};
    const Drawing& d = *result.drawing;
    const QString rev = !o.revision.isEmpty()       ? o.revision
                        : d.sheet.revisions.empty() ? QString("1")
                                                    : qs(d.sheet.revisions.back().rev);
    const DrawingComparison c = compareDrawings(*o.previous, result);
    std::vector<PartId> revised;
    for (const auto& p : c.partsAdded)
        revised.push_back(p.part.id);
    for (const auto& p : c.partsChanged)
        revised.push_back(p.newId);
    for (auto id : revised)
        if (PartItem* item = scene.itemFor(id)) {
            scene.addItem(new RevisionFlag(rev, item->symbolSceneRect()));
            ++flags;
        }
    return QString("FLAG %1: %2 PARTS ADDED OR CHANGED SINCE %3\n")
        .arg(rev)
        .arg(flags)
        .arg(o.previousName.isEmpty() ? QString("THE PREVIOUS REVISION") : o.previousName);
}

std::vector<TextTable> submittalTables(const std::vector<std::vector<QStringList>>& findings,
                                       const std::vector<Schedule>& schedules) {
    std::vector<TextTable> out;
    out.push_back({"Findings summary", findings[0], {0.09, 0.17, 0.15, 0.11, 0.12, 0.36}});
    if (!findings[1].empty())
        out.push_back({"Accepted deviations", findings[1], {0.16, 0.16, 0.12, 0.10, 0.46}});
    for (const auto& sch : schedules) {
        TextTable t{"Schedule — " + qs(sch.name), {}, {}};
        QStringList head;
        for (const auto& h : sch.headers)
            head << qs(h);
        head[0].prepend("\x01");
        t.rows.push_back(head);
        for (const auto& r : sch.rows) {
            QStringList row;
            for (const auto& cell : r)
                row << qs(cell);
            t.rows.push_back(row);
        }
        t.widths.assign(sch.headers.size(), 1.0 / static_cast<double>(sch.headers.size()));
        out.push_back(std::move(t));
    }
    return out;
}

// The number of pages paintPages will paint, from the same layout functions it uses.
int countPages(const QPaintDevice& dev, const SubmittalData& s, const SubmittalOptions& o) {
    const QRectF src = s.scene.itemsBoundingRect().adjusted(-30, -30, 30, 30);
    int pages = oneLineSheetCount(src, bodyRect(dev), o);
    for (const auto& t : s.tables)
        pages += static_cast<int>(
            layoutTable(dev, QFont(), bodyRect(dev), t.rows, t.widths).pageStarts.size());
    const auto perPage = static_cast<std::size_t>(labelGridFor(bodyRect(dev)).perPage());
    const auto labelPages = (s.labels.size() + perPage - 1) / perPage;
    return pages + static_cast<int>(s.curveParts.size() + labelPages);
}

// Lays out and paints every page; returns the page count (and one-line sheet count).
int paintPages(QPagedPaintDevice& dev, const SubmittalData& s, const SubmittalOptions& o,
               const QString& date, int pageCount, int& oneLineSheets, QString& error) {
    QPainter painter;
    if (!painter.begin(&dev)) {
        error = "cannot start painting on the output";
        return 0;
    }
    PageCtx c{painter, dev, s.d, 0, pageCount, date, s.revisionNote};
    paintOneLine(c, s.scene, oneLineSheets, o);
    for (const auto& t : s.tables)
        textPages(c, t.title, t.rows, t.widths);
    for (auto id : s.curveParts) {
        nextPage(c);
        titleBlock(c, "Curves " + qs(s.d.part(id)->tag));
        paintCurves(painter, c.body(), s.view ? buildCurveSet(*s.view, id) : CurveSet{});
    }
    // The arc-flash labels at their printed size, as the label stock carries them.
    const auto perPage = static_cast<std::size_t>(labelGridFor(c.body()).perPage());
    for (std::size_t first = 0; first < s.labels.size(); first += perPage) {
        nextPage(c);
        titleBlock(c, "Arc-flash labels");
        if (!paintLabelGrid(painter, c.body(), s.labels, first, s.d) && error.isEmpty())
            error = "an arc-flash label does not fit its place on the Submittal";
    }
    painter.end();
    return c.pageNo;
}

} // namespace

SubmittalResult paintSubmittal(QPagedPaintDevice& dev, std::shared_ptr<const CheckResult> result,
                               std::shared_ptr<const Tables> tables, const SubmittalOptions& o) {
    SubmittalResult res;
    // The layout is in points (72 per inch); a printer is asked for that resolution and the
    // driver scales, so print, preview and PDF are the same vector pages.
    if (auto* printer = dynamic_cast<QPrinter*>(&dev))
        printer->setResolution(72);
    if (std::abs(dev.logicalDpiX() - 72) > 1) {
        res.error =
            QString("the output must be set to 72 dots per inch (it is %1)").arg(dev.logicalDpiX());
        return res;
    }
    Document doc(tables);
    doc.resetChecked(result);
    SheetScene scene(doc);
    scene.setPrinting(true);
    scene.routeWires();
    const QString revisionNote = flagRevisedParts(scene, *result, o, res.revisionFlags);
    const Drawing& d = *result->drawing;
    const auto view = result->view();
    SubmittalData data{d,
                       view ? &*view : nullptr,
                       scene,
                       {},
                       submittalTables(findingRows(d, result->report), buildSchedules(*result)),
                       revisionNote};
    if (o.curveParts)
        data.curveParts = *o.curveParts;
    else
        for (const auto& m : result->motors)
            data.curveParts.push_back(m.branch.motor->id);
    const QString date = o.date.isEmpty() ? QDate::currentDate().toString(Qt::ISODate) : o.date;
    data.labels = arcFlashLabels(*result, date.toStdString());
    // "Sheet n of m" needs m first: the layout counts the pages without painting them, then
    // each page is painted once.
    const int pages = countPages(dev, data, o);
    res.pages = paintPages(dev, data, o, date, pages, res.oneLineSheets, res.error);
    if (res.error.isEmpty() && res.pages != pages)
        res.error =
            QString("the Submittal laid out %1 pages but painted %2").arg(pages).arg(res.pages);
    return res;
}

SubmittalResult writeSubmittalPdf(const QString& path, std::shared_ptr<const CheckResult> result,
                                  std::shared_ptr<const Tables> tables, const SubmittalOptions& o) {
    const Drawing& d = *result->drawing;
    QPdfWriter pdf(path);
    pdf.setPageLayout(QPageLayout(o.paper, o.orientation, QMarginsF(0, 0, 0, 0)));
    pdf.setResolution(72);
    pdf.setTitle(qs(d.sheet.title));
    pdf.setCreator("Lineward");
    auto r = paintSubmittal(pdf, std::move(result), std::move(tables), o);
    if (r.error.isEmpty() && !QFile::exists(path))
        r.error = "cannot write " + path;
    return r;
}

QString writeOneLineSvg(const QString& path, std::shared_ptr<const CheckResult> result,
                        std::shared_ptr<const Tables> tables) {
    const Drawing& d = *result->drawing;
    Document doc(std::move(tables));
    doc.resetChecked(std::move(result));
    SheetScene scene(doc);
    scene.setPrinting(true);
    scene.routeWires();
    const QRectF src = scene.itemsBoundingRect().adjusted(-20, -20, 20, 20);
    QSvgGenerator gen;
    gen.setFileName(path);
    gen.setSize(src.size().toSize());
    gen.setViewBox(QRectF(QPointF(0, 0), src.size()));
    gen.setTitle(qs(d.sheet.title));
    gen.setDescription(QString::fromUtf8(kSafetyCaution));
    QPainter p;
    if (!p.begin(&gen))
        return "cannot write " + path;
    scene.render(&p, QRectF(QPointF(0, 0), src.size()), src);
    return p.end() ? QString() : "cannot write " + path;
}

QString writeScheduleCsvs(const QString& dir, const CheckResult& result) {
    if (!QDir().mkpath(dir))
        return "cannot make folder " + dir;
    for (const auto& s : buildSchedules(result)) {
        QFile f(dir + "/" + qs(s.name) + ".csv");
        if (!f.open(QIODevice::WriteOnly | QIODevice::Truncate))
            return "cannot write " + f.fileName();
        const std::string text = toCsv(s);
        f.write(text.data(), static_cast<qint64>(text.size()));
    }
    return {};
}

} // namespace lineward::ui
