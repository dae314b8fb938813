// Curves plot: current on x (A, log), time on y (s, log, 0.01–1000). Colours of our own; each
// band is a translucent fill between its minimum and maximum with the edges drawn.
#include "curves_plot.h"

#include <QFileInfo>
#include <QFontMetricsF>
#include <QImage>
#include <QPageSize>
#include <QPainter>
#include <QPainterPath>
#include <QPdfWriter>
#include <QSvgGenerator>
#include <cmath>

namespace lineward::ui {

namespace {

constexpr double kTmin = 0.01, kTmax = 1000;
const QColor kPalette[] = {QColor(0x1d, 0x6f, 0xa3), QColor(0xc0, 0x5a, 0x1b),
                           QColor(0x3d, 0x8b, 0x4f), QColor(0x7b, 0x4f, 0x9d),
                           QColor(0x9a, 0x7b, 0x1c), QColor(0x2a, 0x8a, 0x8a)};

struct Axes {
    QRectF r;
    double a0, a1;
    double x(double amps) const {
        return r.left() + r.width() * std::log10(amps / a0) / std::log10(a1 / a0);
    }
    double y(double s) const {
        s = std::clamp(s, kTmin, kTmax);
        return r.bottom() - r.height() * std::log10(s / kTmin) / std::log10(kTmax / kTmin);
    }
};

QString ampsText(double a) {
    return a >= 1000 ? QString::number(a / 1000, 'g', 3) + " kA"
                     : QString::number(a, 'g', 3) + " A";
}

void grid(QPainter& p, const Axes& ax, double pt) {
    QFont f = p.font();
    f.setPointSizeF(pt);
    p.setFont(f);
    for (double d = ax.a0; d <= ax.a1 * 1.0001; d *= 10) {
        for (int m = 1; m < 10 && d * m <= ax.a1 * 1.0001; ++m) {
            p.setPen(QPen(m == 1 ? QColor(0xb8, 0xb4, 0xaa) : QColor(0xe4, 0xe1, 0xd8),
                          m == 1 ? 0.8 : 0.4));
            p.drawLine(QPointF(ax.x(d * m), ax.r.top()), QPointF(ax.x(d * m), ax.r.bottom()));
        }
        p.setPen(Qt::black);
        p.drawText(QRectF(ax.x(d) - 40, ax.r.bottom() + 3, 80, pt * 1.6), Qt::AlignHCenter,
                   ampsText(d));
    }
    for (double t = kTmin; t <= kTmax * 1.0001; t *= 10) {
        for (int m = 1; m < 10 && t * m <= kTmax * 1.0001; ++m) {
            p.setPen(QPen(m == 1 ? QColor(0xb8, 0xb4, 0xaa) : QColor(0xe4, 0xe1, 0xd8),
                          m == 1 ? 0.8 : 0.4));
            p.drawLine(QPointF(ax.r.left(), ax.y(t * m)), QPointF(ax.r.right(), ax.y(t * m)));
        }
        p.setPen(Qt::black);
        p.drawText(QRectF(ax.r.left() - 6 * pt - 4, ax.y(t) - pt, 6 * pt, 2 * pt),
                   Qt::AlignRight | Qt::AlignVCenter,
                   QString::number(t, 'f', t < 1 ? 2 : 0) + " s");
    }
    p.setPen(QPen(Qt::black, 1));
    p.setBrush(Qt::NoBrush);
    p.drawRect(ax.r);
}

// "Current in A at 480 V" under the current axis, "Time in s" over the time labels.
void axisTitles(QPainter& p, const Axes& ax, const CurveSet& set, double pt) {
    QFont f = p.font();
    f.setPointSizeF(pt);
    f.setBold(false);
    p.setFont(f);
    p.setPen(Qt::black);
    const QString amps = set.voltsBase > 0
                             ? QString("Current in A at %1 V").arg(set.voltsBase, 0, 'f', 0)
                             : QString("Current in A");
    p.drawText(QRectF(ax.r.left(), ax.r.bottom() + 3 + pt * 1.7, ax.r.width(), pt * 1.6),
               Qt::AlignHCenter, amps);
    // Level with the plot's title, over the time labels: set upright, as all text is.
    p.drawText(QRectF(ax.r.left() - 7 * pt - 8, ax.r.top() - 2 * pt - 4, 7 * pt, 1.6 * pt),
               Qt::AlignRight | Qt::AlignVCenter, "Time in s");
}

void band(QPainter& p, const Axes& ax, const PlotSeries& s, const QColor& c) {
    // Fill where both edges are finite; draw each finite edge as a line.
    QPainterPath fill;
    std::vector<QPointF> upper, lower;
    for (std::size_t i = 0; i < s.amps.size(); ++i)
        if (std::isfinite(s.maxS[i]) && std::isfinite(s.minS[i])) {
            upper.push_back({ax.x(s.amps[i]), ax.y(s.maxS[i])});
            lower.push_back({ax.x(s.amps[i]), ax.y(s.minS[i])});
        }
    if (upper.size() > 1) {
        fill.moveTo(upper.front());
        for (const auto& q : upper)
            fill.lineTo(q);
        for (auto it = lower.rbegin(); it != lower.rend(); ++it)
            fill.lineTo(*it);
        fill.closeSubpath();
        QColor f = c;
        f.setAlpha(60);
        p.fillPath(fill, f);
    }
    for (const auto* edge : {&s.minS, &s.maxS}) {
        QPainterPath line;
        bool on = false;
        for (std::size_t i = 0; i < s.amps.size(); ++i) {
            if (!std::isfinite((*edge)[i])) {
                on = false;
                continue;
            }
            const QPointF q(ax.x(s.amps[i]), ax.y((*edge)[i]));
            if (on)
                line.lineTo(q);
            else
                line.moveTo(q);
            on = true;
        }
        p.strokePath(line, QPen(c, 1.3));
    }
}

void polyline(QPainter& p, const Axes& ax, const PlotSeries& s, const QPen& pen) {
    QPainterPath line;
    bool on = false;
    for (std::size_t i = 0; i < s.amps.size(); ++i) {
        if (!std::isfinite(s.maxS[i])) {
            on = false;
            continue;
        }
        const QPointF q(ax.x(s.amps[i]), ax.y(s.maxS[i]));
        if (on)
            line.lineTo(q);
        else
            line.moveTo(q);
        on = true;
    }
    p.strokePath(line, pen);
}

} // namespace

void paintCurves(QPainter& p, const QRectF& area, const CurveSet& set, double textPt) {
    // The panel's sizes, or the Submittal's minimum and up.
    const double pt = textPt > 0 ? textPt : 7.0;
    p.save();
    p.setRenderHint(QPainter::Antialiasing);
    p.fillRect(area, Qt::white);
    const double legendW = std::min(260.0 * pt / 7, area.width() * 0.32);
    // Room left of the plot for the time labels and the axis title, below it for the current
    // labels and the axis title.
    const double left = 7 * pt + 12, top = 2.2 * pt * 1.36 + 8, bottom = 3.6 * pt + 10;
    Axes ax{QRectF(area.left() + left, area.top() + top, area.width() - legendW - left - 20,
                   area.height() - top - bottom),
            set.minA, set.maxA};
    QFont title = p.font();
    title.setPointSizeF(pt * 1.36);
    title.setBold(true);
    p.setFont(title);
    p.setPen(Qt::black);
    p.drawText(QRectF(ax.r.left(), area.top() + 4, ax.r.width(), top - 6),
               Qt::AlignLeft | Qt::AlignVCenter,
               QString::fromStdString(set.title) +
                   (set.voltsBase > 0 ? QString("  (current at %1 V)").arg(set.voltsBase, 0, 'f', 0)
                                      : QString()));
    grid(p, ax, pt);
    axisTitles(p, ax, set, pt);
    p.save();
    p.setClipRect(ax.r);
    int colour = 0;
    for (const auto& s : set.series) {
        if (s.kind == PlotSeries::Kind::Band)
            band(p, ax, s, kPalette[colour++ % 6]);
        else if (s.kind == PlotSeries::Kind::StartProfile)
            polyline(p, ax, s, QPen(QColor(0x22, 0x22, 0x22), 1.8, Qt::DashLine));
        else if (s.kind == PlotSeries::Kind::StallPoints)
            for (std::size_t i = 0; i < s.amps.size(); ++i) {
                // A cross for each stall point (ours).
                const QPointF c(ax.x(s.amps[i]), ax.y(s.maxS[i]));
                p.setPen(QPen(QColor(0x22, 0x22, 0x22), 1.8));
                p.drawLine(c + QPointF(-5, -5), c + QPointF(5, 5));
                p.drawLine(c + QPointF(-5, 5), c + QPointF(5, -5));
            }
        else
            polyline(p, ax, s, QPen(QColor(0xb2, 0x2d, 0x2d), 1.6, Qt::DotLine));
    }
    if (set.faultA > 0 && set.faultA < set.maxA) {
        p.setPen(QPen(QColor(0xb2, 0x2d, 0x2d), 1.2, Qt::DashDotLine));
        p.drawLine(QPointF(ax.x(set.faultA), ax.r.top()), QPointF(ax.x(set.faultA), ax.r.bottom()));
    }
    p.restore();
    if (set.faultA > 0 && set.faultA < set.maxA) {
        // Named on the plot too, at the line's top, on the side with room.
        QFont lf = p.font();
        lf.setPointSizeF(pt);
        lf.setBold(true);
        p.setFont(lf);
        p.setPen(Qt::black);
        const QString text = "available fault " + ampsText(set.faultA);
        const double w = QFontMetricsF(lf, p.device()).horizontalAdvance(text) + 6;
        const double x = ax.x(set.faultA);
        const bool left = x + w > ax.r.right();
        const QRectF box(left ? x - w - 2 : x + 2, ax.r.top() + 2, w, pt * 1.6);
        p.fillRect(box, Qt::white);
        p.drawText(box, Qt::AlignCenter, text);
    }
    // Legend beside the plot: one line per series, so labels never overlap the curves.
    QFont f = p.font();
    f.setPointSizeF(pt * 1.07);
    f.setBold(false);
    p.setFont(f);
    double y = ax.r.top();
    const double lx = ax.r.right() + 14;
    colour = 0;
    auto entry = [&](const QPen& pen, const QString& text) {
        p.setPen(pen);
        p.drawLine(QPointF(lx, y + pt), QPointF(lx + 18, y + pt));
        p.setPen(Qt::black);
        const QRectF box(lx + 24, y, legendW - 30, pt * 8);
        QRectF used = p.boundingRect(box, Qt::TextWordWrap, text);
        p.drawText(box, Qt::TextWordWrap, text);
        y += std::max(pt * 2.2, used.height() + 4);
    };
    for (const auto& s : set.series) {
        QPen pen = s.kind == PlotSeries::Kind::Band ? QPen(kPalette[colour++ % 6], 3)
                   : s.kind == PlotSeries::Kind::StartProfile
                       ? QPen(QColor(0x22, 0x22, 0x22), 1.8, Qt::DashLine)
                   : s.kind == PlotSeries::Kind::StallPoints
                       ? QPen(QColor(0x22, 0x22, 0x22), 1.8, Qt::DotLine)
                       : QPen(QColor(0xb2, 0x2d, 0x2d), 1.6, Qt::DotLine);
        entry(pen, QString::fromStdString(s.label));
    }
    if (set.faultA > 0)
        entry(QPen(QColor(0xb2, 0x2d, 0x2d), 1.2, Qt::DashDotLine),
              "available fault " + ampsText(set.faultA));
    p.restore();
}

QString saveCurves(const CurveSet& set, const QString& path) {
    const QString ext = QFileInfo(path).suffix().toLower();
    const QSize size(1100, 700);
    if (ext == "png") {
        QImage img(size, QImage::Format_ARGB32);
        img.fill(Qt::white);
        QPainter p(&img);
        paintCurves(p, QRectF(QPointF(0, 0), size), set);
        p.end();
        return img.save(path) ? QString() : QString("cannot write %1").arg(path);
    }
    if (ext == "svg") {
        QSvgGenerator gen;
        gen.setFileName(path);
        gen.setSize(size);
        gen.setViewBox(QRect(QPoint(0, 0), size));
        gen.setTitle(QString::fromStdString(set.title));
        QPainter p;
        if (!p.begin(&gen))
            return QString("cannot write %1").arg(path);
        paintCurves(p, QRectF(QPointF(0, 0), size), set);
        return p.end() ? QString() : QString("cannot write %1").arg(path);
    }
    if (ext == "pdf") {
        QPdfWriter pdf(path);
        pdf.setPageSize(QPageSize(QPageSize::Letter));
        pdf.setPageOrientation(QPageLayout::Landscape);
        pdf.setResolution(96);
        pdf.setTitle(QString::fromStdString(set.title));
        QPainter p;
        if (!p.begin(&pdf))
            return QString("cannot write %1").arg(path);
        const QRectF page(0, 0, pdf.width(), pdf.height());
        paintCurves(p, page, set);
        return p.end() ? QString() : QString("cannot write %1").arg(path);
    }
    return QString("unknown picture type '%1' (use .svg, .png or .pdf)").arg(ext);
}

} // namespace lineward::ui
