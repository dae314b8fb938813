// Our arc-flash label: a dark amber frame with one notched corner (the Sheet's arc-flash mark
// grown up), the hazard band, the equipment, the incident energy panel, the data rows, the
// shock approach boundaries, the service block where it applies, and the caution. Every font is
// at least 8.5 pt, so capitals stand over 2 mm tall.
#include "label_sheet.h"

#include "util/trace.h"

#include <QFile>
#include <QFontMetricsF>
#include <QPageLayout>
#include <QPainter>
#include <QPainterPath>
#include <QPdfWriter>
#include <QStringList>
#include <algorithm>
#include <cmath>

namespace lineward::ui {

namespace {

const QColor kFrame(0x9a, 0x5b, 0x00);
const QColor kPanel(0xff, 0xf3, 0xd6);
const QColor kInk(0x1e, 0x1a, 0x14);
constexpr double kPad = 10;
constexpr double kSmallPt = 8.5; // the smallest text on a label (cap height ≈ 2.2 mm)

QString qs(const std::string& s) {
    return QString::fromStdString(s);
}

QFont labelFont(double pt, bool bold = false) {
    QFont f(QStringLiteral("DejaVu Sans"));
    f.setStyleHint(QFont::SansSerif);
    f.setPointSizeF(pt);
    f.setBold(bold);
    return f;
}

// A frame with its top-left corner cut off: our arc-flash motif.
QPainterPath notched(const QRectF& r, double notch) {
    QPainterPath path;
    path.moveTo(r.left() + notch, r.top());
    path.lineTo(r.right(), r.top());
    path.lineTo(r.right(), r.bottom());
    path.lineTo(r.left(), r.bottom());
    path.lineTo(r.left(), r.top() + notch);
    path.closeSubpath();
    return path;
}

// Lays text out downwards from `y` inside [left, right]; false once past `bottom`.
struct Flow {
    QPainter& p;
    double left, right, y, bottom;
    bool dry = false; ///< measure only: nothing is painted
    bool fits = true;

    double width() const { return right - left; }
    void space(double h) { y += h; }
    // Wrapped text in one font; returns its height.
    void text(const QString& s, const QFont& f, int align = Qt::AlignLeft) {
        const QRectF box(left, y, width(), 10000);
        const QRectF need =
            QFontMetricsF(f, p.device()).boundingRect(box, Qt::TextWordWrap | align, s);
        if (y + need.height() > bottom) {
            fits = false;
            return;
        }
        if (!dry) {
            p.setFont(f);
            p.drawText(QRectF(left, y, width(), need.height()), Qt::TextWordWrap | align, s);
        }
        y += need.height();
    }
    // A label and its value in two columns (the value bold), each wrapped.
    void row(const QString& label, const QString& value, double split = 0.52) {
        const QFont lf = labelFont(kSmallPt), vf = labelFont(kSmallPt + 0.5, true);
        const double lw = width() * split - 4, vw = width() - width() * split;
        const double h =
            std::max(QFontMetricsF(lf, p.device())
                         .boundingRect(QRectF(0, 0, lw, 10000), Qt::TextWordWrap, label)
                         .height(),
                     QFontMetricsF(vf, p.device())
                         .boundingRect(QRectF(0, 0, vw, 10000), Qt::TextWordWrap, value)
                         .height());
        if (y + h > bottom) {
            fits = false;
            return;
        }
        if (!dry) {
            p.setFont(lf);
            p.drawText(QRectF(left, y, lw, h), Qt::TextWordWrap, label);
            p.setFont(vf);
            p.drawText(QRectF(left + width() * split, y, vw, h), Qt::TextWordWrap, value);
        }
        y += h + 1;
    }
    // A value in a large font with a note after it in a smaller one, on one line, bottoms
    // aligned; the note goes below where the line is too narrow for both.
    void valueWithNote(const QString& value, const QFont& vf, const QString& note,
                       const QFont& nf) {
        const QFontMetricsF vm(vf, p.device()), nm(nf, p.device());
        const double vw = vm.horizontalAdvance(value), nw = nm.horizontalAdvance(note);
        if (vw + 8 + nw > width()) {
            text(value, vf);
            text(note, nf);
            return;
        }
        if (y + vm.height() > bottom) {
            fits = false;
            return;
        }
        if (!dry) {
            p.setFont(vf);
            p.drawText(QPointF(left, y + vm.ascent()), value);
            p.setFont(nf);
            p.drawText(QPointF(left + vw + 8, y + vm.ascent()), note);
        }
        y += vm.height();
    }
    void rule() {
        if (y + 4 > bottom) {
            fits = false;
            return;
        }
        if (dry) {
            y += 5;
            return;
        }
        p.setPen(QPen(kFrame, 0.8));
        p.drawLine(QPointF(left, y + 2), QPointF(right, y + 2));
        p.setPen(kInk);
        y += 5;
    }
};

QString volts(double v) {
    return QString::fromStdString(fmt(v, 0)) + " V";
}

void energyText(Flow& in, const ArcFlashLabel& l) {
    if (l.computed) {
        in.text(QObject::tr("Incident energy at the working distance"), labelFont(kSmallPt));
        in.valueWithNote(QString::fromUtf8("%1 cal/cm²").arg(QString::number(l.energyCal, 'f', 1)),
                         labelFont(17, true),
                         QString::fromUtf8("(%1 J/cm²)").arg(QString::number(l.energyJ, 'f', 1)),
                         labelFont(11, true));
        if (l.aboveLimit)
            in.text(QString::fromUtf8("Above 40 cal/cm²: work on it de-energized only"),
                    labelFont(kSmallPt + 0.5, true));
    } else {
        in.text(QObject::tr("Incident energy not computed"), labelFont(11, true));
        in.text(qs(l.notComputedWhy), labelFont(kSmallPt));
    }
}

// The energy on a tinted panel: measured first, the panel painted, then the text on it.
void energyPanel(Flow& f, const ArcFlashLabel& l) {
    const double top = f.y;
    Flow probe{f.p, f.left + 6, f.right - 6, top + 4, f.bottom - 4, true};
    energyText(probe, l);
    const QRectF panel(f.left, top, f.width(), probe.y + 4 - top);
    if (!probe.fits || panel.bottom() > f.bottom) {
        f.fits = false;
        return;
    }
    f.p.save();
    f.p.setPen(QPen(kFrame, 1.0));
    f.p.setBrush(kPanel);
    f.p.drawPath(notched(panel, 5));
    f.p.restore();
    Flow in{f.p, f.left + 6, f.right - 6, top + 4, f.bottom - 4};
    energyText(in, l);
    f.y = panel.bottom() + 5;
}

void dataRows(Flow& f, const ArcFlashLabel& l) {
    f.row(QObject::tr("Working distance"),
          l.workingDistanceMm > 0 ? qs(labelLength(l.workingDistanceMm)) : QObject::tr("—"));
    f.row(QObject::tr("Arc-flash boundary"),
          l.computed ? qs(labelLength(l.boundaryMm)) : QObject::tr("not computed"));
    f.row(QObject::tr("Nominal voltage"),
          volts(l.nominalV) + (l.phases == 3 ? QObject::tr(" ac, 3-phase") : QObject::tr(" ac")));
    if (l.computed)
        f.row(QObject::tr("Arc cleared by"),
              (l.clearingTag.empty() ? QObject::tr("no device found") : qs(l.clearingTag)) +
                  QObject::tr(" in %1 s%2")
                      .arg(QString::number(l.arcingTimeS, 'f', 2),
                           l.timeCapped ? QObject::tr(" (time cap)") : QString()));
}

void approachRows(Flow& f, const ArcFlashLabel& l) {
    f.text(QObject::tr("Shock approach, NFPA 70E Table 130.4(E)(a)"), labelFont(kSmallPt, true));
    f.space(1);
    if (!l.approachKnown) {
        f.text(QObject::tr("no row of the table covers %1").arg(volts(l.nominalV)),
               labelFont(kSmallPt));
        return;
    }
    // The table's two limited boundaries: to an exposed movable conductor and to an exposed
    // fixed circuit part.
    f.row(QObject::tr("Limited, movable conductor"), qs(l.limitedMovable));
    f.row(QObject::tr("Limited, fixed circuit part"), qs(l.limitedFixed));
    f.row(QObject::tr("Restricted"), qs(l.restricted));
}

void serviceBlock(Flow& f, const ServiceLabelData& s) {
    const double top = f.y;
    auto draw = [&](Flow& in) {
        in.text(QObject::tr("Service equipment, NEC 110.16(B)"), labelFont(kSmallPt, true));
        in.row(QObject::tr("Nominal voltage"), volts(s.nominalV));
        in.row(QObject::tr("Available fault current"),
               s.availableFaultKa ? QString::number(*s.availableFaultKa, 'f', 1) + " kA"
                                  : QObject::tr("not computed"));
        in.row(QObject::tr("Clearing time of %1")
                   .arg(s.deviceTag.empty() ? QObject::tr("the service device") : qs(s.deviceTag)),
               s.clearingS ? QString::number(*s.clearingS, 'f', 2) + " s"
                           : QObject::tr("not found"));
        in.row(QObject::tr("Date"), qs(s.date));
    };
    Flow probe{f.p, f.left + 6, f.right - 6, top + 4, f.bottom - 4, true};
    draw(probe);
    const QRectF box(f.left, top, f.width(), probe.y + 3 - top);
    if (!probe.fits || box.bottom() > f.bottom) {
        f.fits = false;
        return;
    }
    f.p.save();
    f.p.setPen(QPen(kFrame, 1.2));
    f.p.setBrush(Qt::NoBrush);
    f.p.drawRect(box);
    f.p.restore();
    Flow in{f.p, f.left + 6, f.right - 6, top + 4, f.bottom - 4};
    draw(in);
    f.y = box.bottom() + 5;
}

} // namespace

std::optional<LabelStock> labelStockByName(const QString& name) {
    if (name == "4x6")
        return LabelStock::Roll4x6;
    if (name == "letter-2")
        return LabelStock::Letter2x4x6;
    if (name == "letter-4")
        return LabelStock::Letter4x4x5;
    return std::nullopt;
}

QStringList labelStockNames() {
    return {"4x6", "letter-2", "letter-4"};
}

QString labelStockDescription(LabelStock s) {
    switch (s) {
    case LabelStock::Roll4x6:
        return QObject::tr("4 × 6 in labels, one per page");
    case LabelStock::Letter2x4x6:
        return QObject::tr("Letter sheets of two 4 × 6 in labels");
    case LabelStock::Letter4x4x5:
        return QObject::tr("Letter sheets of four 4 × 5 in labels");
    }
    return {};
}

int labelsPerPage(LabelStock s) {
    return s == LabelStock::Roll4x6 ? 1 : s == LabelStock::Letter2x4x6 ? 2 : 4;
}

QSizeF labelSizePt(LabelStock s) {
    return s == LabelStock::Letter4x4x5 ? QSizeF(288, 360) : QSizeF(288, 432);
}

bool paintLabel(QPainter& p, const QRectF& r, const ArcFlashLabel& l, const Drawing& d) {
    p.save();
    p.setClipRect(r);
    p.setRenderHint(QPainter::Antialiasing);
    p.fillRect(r, Qt::white);
    const QRectF frame = r.adjusted(3, 3, -3, -3);
    p.setPen(QPen(kFrame, 2.4));
    p.setBrush(Qt::NoBrush);
    p.drawPath(notched(frame, 14));
    // The hazard band across the top, under the notch.
    const QRectF band(frame.left(), frame.top(), frame.width(), 27);
    p.setPen(Qt::NoPen);
    p.setBrush(kFrame);
    p.drawPath(notched(band, 14).intersected([&] {
        QPainterPath b;
        b.addRect(band);
        return b;
    }()));
    p.setPen(Qt::white);
    p.setFont(labelFont(14, true));
    p.drawText(band.adjusted(kPad + 6, 0, -kPad, 0), Qt::AlignVCenter | Qt::AlignLeft,
               QObject::tr("ARC-FLASH HAZARD"));
    p.setPen(kInk);
    Flow f{p, frame.left() + kPad, frame.right() - kPad, band.bottom() + 6,
           frame.bottom() - kPad + 4};
    f.text(qs(l.tag), labelFont(15, true));
    f.text(qs(l.equipment), labelFont(kSmallPt));
    f.space(3);
    energyPanel(f, l);
    dataRows(f, l);
    f.rule();
    approachRows(f, l);
    f.space(4);
    if (l.service)
        serviceBlock(f, *l.service);
    else
        f.rule();
    QString footer = QObject::tr("Assessed %1").arg(qs(l.date));
    if (!d.sheet.drawingNo.empty())
        footer += QObject::tr(" · drawing %1").arg(qs(d.sheet.drawingNo));
    if (!d.sheet.revisions.empty())
        footer += QObject::tr(" rev %1").arg(qs(d.sheet.revisions.back().rev));
    f.text(footer, labelFont(kSmallPt, true));
    f.text(QString::fromUtf8(kArcFlashLabelCaution), labelFont(kSmallPt));
    p.restore();
    return f.fits;
}

LabelGrid labelGridFor(const QRectF& area) {
    constexpr double kGap = 6;
    const QSizeF size = labelSizePt(LabelStock::Roll4x6);
    LabelGrid g;
    g.cols = std::max(1, static_cast<int>((area.width() + kGap) / (size.width() + kGap)));
    g.rows = std::max(1, static_cast<int>((area.height() + kGap) / (size.height() + kGap)));
    g.scale = std::min({1.0, area.width() / size.width(), area.height() / size.height()});
    return g;
}

bool paintLabelGrid(QPainter& p, const QRectF& area, const std::vector<ArcFlashLabel>& labels,
                    std::size_t first, const Drawing& d) {
    constexpr double kGap = 6;
    const LabelGrid g = labelGridFor(area);
    const QSizeF size = labelSizePt(LabelStock::Roll4x6);
    bool fits = true;
    for (int k = 0; k < g.perPage() && first + k < labels.size(); ++k) {
        p.save();
        p.translate(area.left() + (k % g.cols) * (size.width() + kGap) * g.scale,
                    area.top() + (k / g.cols) * (size.height() + kGap) * g.scale);
        p.scale(g.scale, g.scale);
        fits = paintLabel(p, QRectF(QPointF(0, 0), size), labels[first + k], d) && fits;
        p.restore();
    }
    return fits;
}

namespace {

// Paints every label on the stock into `pdf`; the first label that does not fit is the error.
void paintSheets(QPdfWriter& pdf, const std::vector<ArcFlashLabel>& labels, const Drawing& d,
                 LabelStock stock, LabelSheetResult& res) {
    QPainter p;
    if (!p.begin(&pdf)) {
        res.error = QObject::tr("cannot start the PDF");
        return;
    }
    const QSizeF size = labelSizePt(stock);
    const int per = labelsPerPage(stock);
    const int cols = per == 1 ? 1 : 2, rows = per / cols;
    const double x0 = (pdf.width() - cols * size.width()) / 2;
    const double y0 = (pdf.height() - rows * size.height()) / 2;
    for (std::size_t i = 0; i < labels.size(); ++i) {
        const int slot = static_cast<int>(i) % per;
        if (i > 0 && slot == 0)
            pdf.newPage();
        const QRectF r(x0 + (slot % cols) * size.width(), y0 + (slot / cols) * size.height(),
                       size.width(), size.height());
        if (per > 1) { // sheet stock: a thin grey outline of each label to cut or peel along
            p.setPen(QPen(QColor(0xb0, 0xb0, 0xb0), 0.5, Qt::DashLine));
            p.drawRect(r);
        }
        if (!paintLabel(p, r, labels[i], d) && res.error.isEmpty())
            res.error = QObject::tr("the label of %1 does not fit on the %2")
                            .arg(qs(labels[i].tag), labelStockDescription(stock));
        ++res.labels;
    }
    p.end();
    res.pages = static_cast<int>((labels.size() + per - 1) / per);
}

} // namespace

LabelSheetResult writeLabelsPdf(const QString& path, const CheckResult& result, LabelStock stock,
                                const QString& date) {
    LabelSheetResult res;
    const auto labels = arcFlashLabels(result, date.toStdString());
    if (labels.empty()) {
        res.error = QObject::tr("the drawing has no bus the arc-flash study reached: no labels");
        return res;
    }
    // Written beside the target and renamed when whole, so a failure leaves an existing file
    // as it was and no half-made one.
    const QString part = path + ".part";
    {
        QPdfWriter pdf(part);
        const QPageSize page = stock == LabelStock::Roll4x6
                                   ? QPageSize(QSizeF(4, 6), QPageSize::Inch, "4 x 6 in label")
                                   : QPageSize(QPageSize::Letter);
        pdf.setPageLayout(QPageLayout(page, QPageLayout::Portrait, QMarginsF(0, 0, 0, 0)));
        pdf.setResolution(72);
        pdf.setTitle(QObject::tr("Arc-flash labels"));
        pdf.setCreator("Lineward");
        paintSheets(pdf, labels, *result.drawing, stock, res);
    }
    if (res.error.isEmpty() && !QFile::exists(part))
        res.error = QObject::tr("cannot write %1").arg(path);
    if (res.error.isEmpty() && QFile::exists(path) && !QFile::remove(path))
        res.error = QObject::tr("cannot replace %1").arg(path);
    if (res.error.isEmpty() && !QFile::rename(part, path))
        res.error = QObject::tr("cannot write %1").arg(path);
    if (!res.error.isEmpty())
        QFile::remove(part);
    return res;
}

} // namespace lineward::ui
