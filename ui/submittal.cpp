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
#include "report/curve_sheets.h"
#include "report/report_format.h"
#include "report/schedules.h"
#include "revision_flag.h"
#include "sheet_scene.h"
#include "studies/study_view.h"
#include "submittal_flow.h"
#include "submittal_sheet.h"

#include <QDate>
#include <QDir>
#include <QFile>
#include <QFontMetricsF>
#include <QPainter>
#include <QPdfWriter>
#include <QPrinter>
#include <QSvgGenerator>
#include <cmath>

namespace lineward::ui {

namespace {

struct PageCtx {
    QPainter& p;
    QPagedPaintDevice& dev;
    const SubmittalStyle& style;
    const TitleBlockData& title;
    int pageNo = 0;
    int pageCount = 0;
    QRectF body() const { return submittalBodyRect(dev, style); }
};

QString qs(const std::string& s) {
    return QString::fromStdString(s);
}

void titleBlock(PageCtx& c, const QString& sheetTitle) {
    paintTitleBlock(c.p, c.dev, c.style, c.title, c.pageNo, c.pageCount, sheetTitle);
}

bool nextPage(PageCtx& c) {
    if (c.pageNo > 0 && !c.dev.newPage())
        return false;
    ++c.pageNo;
    return true;
}

// The one-line's smallest scale: the options' readable scale, and no smaller than the scale at
// which the Sheet's smallest text prints at the style's minimum size.
double oneLineMinScale(const SubmittalStyle& st, const SubmittalOptions& o) {
    return std::max(o.minScale, st.minPt / kSmallestSceneTextPx);
}

// How many sheets the one-line takes: one when it fits at the readable scale, else its tiles.
int oneLineSheetCount(const QRectF& src, const QRectF& body, double minScale) {
    const double fit = std::min(body.width() / src.width(), body.height() / src.height());
    if (fit >= minScale)
        return 1;
    const QSizeF tile = body.size() / minScale;
    return static_cast<int>(std::ceil(src.width() / tile.width())) *
           static_cast<int>(std::ceil(src.height() / tile.height()));
}

// The one-line scaled to the page, or tiled over several pages with match lines where fitting
// it would shrink its text below the readable size.
void paintOneLine(PageCtx& c, SheetScene& scene, int& sheets, double minScale) {
    const QRectF src = scene.itemsBoundingRect().adjusted(-30, -30, 30, 30);
    nextPage(c);
    const QRectF body = c.body();
    const double fit = std::min(body.width() / src.width(), body.height() / src.height());
    if (fit >= minScale) {
        const QSizeF size = src.size() * std::min(fit, std::max(1.6, minScale));
        const QRectF target(body.center() - QPointF(size.width() / 2, size.height() / 2), size);
        titleBlock(c, "One-line");
        scene.render(&c.p, target, src);
        sheets = 1;
        return;
    }
    const QSizeF most = body.size() / minScale; // the most one sheet holds at the readable scale
    const int cols = static_cast<int>(std::ceil(src.width() / most.width()));
    const int rows = static_cast<int>(std::ceil(src.height() / most.height()));
    // Equal parts, so no sheet holds a sliver: each is drawn a little larger than the minimum.
    const QSizeF tile(src.width() / cols, src.height() / rows);
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
            c.p.setFont(c.style.font(c.style.small, true));
            const QFontMetricsF fm(c.p.font(), &c.dev);
            auto edge = [&](QLineF line, int toSheet, bool vertical) {
                c.p.setPen(match);
                c.p.drawLine(line);
                c.p.setPen(Qt::black);
                const QString text = QString("MATCH LINE — SEE SHEET %1").arg(toSheet);
                const double w = fm.horizontalAdvance(text) + 8, h = fm.height();
                const QPointF m = line.center();
                c.p.save();
                c.p.translate(m);
                if (vertical)
                    c.p.rotate(-90);
                c.p.fillRect(QRectF(-w / 2, -h - 2, w, h), Qt::white);
                c.p.drawText(QRectF(-w / 2, -h - 2, w, h), Qt::AlignCenter, text);
                c.p.restore();
            };
            if (k + 1 < cols)
                edge(QLineF(body.topRight(), body.bottomRight()), first + r * cols + k + 1, true);
            if (k > 0)
                edge(QLineF(body.topLeft() + QPointF(fm.height() + 4, 0),
                            body.bottomLeft() + QPointF(fm.height() + 4, 0)),
                     first + r * cols + k - 1, true);
            if (r + 1 < rows)
                edge(QLineF(body.bottomLeft(), body.bottomRight()), first + (r + 1) * cols + k,
                     false);
            if (r > 0)
                edge(QLineF(body.topLeft() + QPointF(0, fm.height() + 4),
                            body.topRight() + QPointF(0, fm.height() + 4)),
                     first + (r - 1) * cols + k, false);
        }
    sheets = rows * cols;
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

struct SubmittalData {
    const Drawing& d;
    const StudyView* view; ///< nothing where no study could run (no curve sheets then)
    SheetScene& scene;
    std::vector<PartId> curveParts;
    std::vector<FlowTable> tables;     ///< findings, accepted deviations, comments, schedules
    std::vector<ArcFlashLabel> labels; ///< one per bus and bucket, after the curve sheets
    /// Labels are drawn this much larger than their stock size, so that a Submittal printed at
    /// half scale still carries them at their own size (and its text at 2 mm or more).
    double labelScale = 1.0;
};

// The area the label grid is laid out in: the page body at the labels' own scale.
QRectF labelArea(const QRectF& body, double labelScale) {
    return QRectF(body.topLeft(), body.size() / labelScale);
}

// Flags each part added or changed since the previous revision; returns the revision table's
// line about them (empty without a previous revision) and the flags' revision.
QString flagRevisedParts(SheetScene& scene, const CheckResult& result, const SubmittalOptions& o,
                         int& flags, QString& rev) {
    flags = 0;
    if (!o.previous)
        return {};
    const Drawing& d = *result.drawing;
    rev = !o.revision.isEmpty()       ? o.revision
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
    return QString("FLAG %1: %2 PARTS ADDED OR CHANGED SINCE %3")
        .arg(rev)
        .arg(flags)
        .arg(o.previousName.isEmpty() ? QString("THE PREVIOUS REVISION") : o.previousName);
}

// Lays out and paints every page; returns the page count (and one-line sheet count).
int paintPages(QPagedPaintDevice& dev, const SubmittalData& s, const SubmittalStyle& st,
               const TitleBlockData& tb, double minScale, const FlowLayout& flow, int pageCount,
               int& oneLineSheets, QString& error) {
    QPainter painter;
    if (!painter.begin(&dev)) {
        error = "cannot start painting on the output";
        return 0;
    }
    painter.setFont(st.font(st.small));
    PageCtx c{painter, dev, st, tb, 0, pageCount};
    paintOneLine(c, s.scene, oneLineSheets, minScale);
    for (std::size_t page = 0; page < flow.pages.size(); ++page) {
        nextPage(c);
        titleBlock(c, flowPageTitle(s.tables, flow, page));
        paintFlowPage(painter, dev, st, c.body(), s.tables, flow, page);
    }
    for (auto id : s.curveParts) {
        nextPage(c);
        titleBlock(c, "Curves " + qs(s.d.part(id)->tag));
        painter.setFont(st.font(st.small));
        paintCurves(painter, c.body(), s.view ? buildCurveSet(*s.view, id) : CurveSet{}, st.small);
    }
    // The arc-flash labels at their printed size, as the label stock carries them.
    const QRectF area = labelArea(c.body(), s.labelScale);
    const auto perPage = static_cast<std::size_t>(labelGridFor(area).perPage());
    for (std::size_t first = 0; first < s.labels.size(); first += perPage) {
        nextPage(c);
        titleBlock(c, "Arc-flash labels");
        painter.save();
        painter.translate(area.topLeft());
        painter.scale(s.labelScale, s.labelScale);
        painter.translate(-area.topLeft());
        const bool fits = paintLabelGrid(painter, area, s.labels, first, s.d);
        painter.restore();
        if (!fits && error.isEmpty())
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
    TitleBlockData tb;
    tb.revisionNote = flagRevisedParts(scene, *result, o, res.revisionFlags, tb.flagRevision);
    const Drawing& d = *result->drawing;
    const auto view = result->view();
    SubmittalData data{d, view ? &*view : nullptr, scene, {}, submittalFlowTables(*result)};
    data.curveParts = o.curveParts ? *o.curveParts : curveSheetParts(*result);
    tb.drawing = &d;
    tb.date = o.date.isEmpty() ? QDate::currentDate().toString(Qt::ISODate) : o.date;
    tb.checkedBy = !o.checkedBy.isEmpty() ? o.checkedBy : qs(d.sheet.checkedBy);
    data.labels = arcFlashLabels(*result, tb.date.toStdString());
    data.labelScale = o.printScale > 0 && o.printScale < 1 ? 1.0 / o.printScale : 1.0;
    tb.status = qs(checkStatusWords(result->report));
    const SubmittalStyle st = SubmittalStyle::forDevice(dev, o.printScale);
    const double minScale = oneLineMinScale(st, o);
    // "Sheet n of m" needs m first: the layout counts the pages without painting them, then
    // each page is painted once.
    const QRectF body = submittalBodyRect(dev, st);
    const FlowLayout flow = layoutFlow(dev, st, body, data.tables);
    const QRectF src = scene.itemsBoundingRect().adjusted(-30, -30, 30, 30);
    const auto perPage =
        static_cast<std::size_t>(labelGridFor(labelArea(body, data.labelScale)).perPage());
    const auto labelPages = (data.labels.size() + perPage - 1) / perPage;
    const int pages = oneLineSheetCount(src, body, minScale) + static_cast<int>(flow.pages.size()) +
                      static_cast<int>(data.curveParts.size() + labelPages);
    res.pages = paintPages(dev, data, st, tb, minScale, flow, pages, res.oneLineSheets, res.error);
    res.minTextPt = st.minPt;
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
