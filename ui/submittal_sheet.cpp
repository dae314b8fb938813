// Title block and legend of our own: caution | legend | project and title | revisions | drawing
// number, sheet, drawn, checked and date, and the check status in words. Black text, one family.
#include "submittal_sheet.h"

#include "comment_mark.h"
#include "report/report_format.h"
#include "revision_flag.h"
#include "severity_style.h"

#include <QFontMetricsF>
#include <cmath>
#include <functional>

namespace lineward::ui {

namespace {
QString qs(const std::string& s) {
    return QString::fromStdString(s);
}

// Paints a Sheet item (comment mark, revision flag) centred in a legend cell at scale `k`, as
// the Sheet draws it (its 10-unit text then prints at 10 k points).
void paintItemIn(QPainter& p, QGraphicsItem& item, const QRectF& cell, double k) {
    const QRectF br = item.boundingRect();
    p.save();
    p.translate(cell.center());
    p.scale(k, k);
    p.translate(-br.center());
    item.paint(&p, nullptr, nullptr);
    p.restore();
}

void legend(QPainter& p, const SubmittalStyle& st, const QRectF& r, const TitleBlockData& data) {
    p.setFont(st.font(st.small, true));
    p.setPen(Qt::black);
    p.drawText(QRectF(r.left(), r.top(), r.width(), st.line), Qt::AlignLeft | Qt::AlignVCenter,
               "LEGEND");
    double y = r.top() + st.line;
    const double cellW = st.line * 1.8;
    auto row = [&](const QString& text, const std::function<void(const QRectF&)>& symbol,
                   double lines = 1.0) {
        const double h = st.line * lines;
        if (y + h > r.bottom() + 0.5)
            return; // never over the frame: the legend keeps to its column
        const QRectF cell(r.left(), y, cellW, h);
        symbol(cell);
        p.setFont(st.font(st.small));
        p.setPen(Qt::black);
        p.drawText(QRectF(cell.right() + 4, y, r.width() - cellW - 4, h),
                   Qt::AlignLeft | Qt::AlignVCenter,
                   QFontMetricsF(p.font(), p.device())
                       .elidedText(text, Qt::ElideRight, r.width() - cellW - 4));
        y += h;
    };
    // Badges at the size whose mark ("!", "i") prints at `small`, like every other text.
    const double badge = st.small * 1.3;
    const double badgeRow = std::max(1.0, badge * 1.1 / st.line);
    row(
        "open violation",
        [&](const QRectF& c) { paintSeverityBadge(p, Severity::Violation, c.center(), badge); },
        badgeRow);
    row(
        "open caution",
        [&](const QRectF& c) { paintSeverityBadge(p, Severity::Caution, c.center(), badge); },
        badgeRow);
    row(
        "note", [&](const QRectF& c) { paintSeverityBadge(p, Severity::Note, c.center(), badge); },
        badgeRow);
    row(
        "accepted (none open)", [&](const QRectF& c) { paintAcceptedBadge(p, c.center(), badge); },
        badgeRow);
    // The Sheet's marks carry 10-unit text: drawn at the scale that prints it at `small`.
    const double k = st.small / 10.0;
    row(
        "review comment (review list)",
        [&](const QRectF& c) {
            CommentMark mark(1, false, {}, QPointF());
            paintItemIn(p, mark, c, k);
        },
        1.5);
    if (!data.flagRevision.isEmpty())
        row(
            "added or changed in revision " + data.flagRevision,
            [&](const QRectF& c) {
                RevisionFlag flag(data.flagRevision, QRectF(0, 0, 32, 44));
                paintItemIn(p, flag, c, k);
            },
            2.0);
    row("arc-flash energy (IEEE 1584)", [&](const QRectF& c) {
        p.setPen(QPen(QColor(0x9a, 0x5b, 0x00), 1.0));
        p.setBrush(QColor(0xff, 0xf3, 0xd6));
        p.drawRect(c.adjusted(1, 2, -1, -2));
        p.setBrush(Qt::NoBrush);
    });
    row("bucket (MCC unit) and its tag", [&](const QRectF& c) {
        p.setPen(QPen(QColor(0x4f, 0x7a, 0x5a), 1.0, Qt::DashDotLine));
        p.drawRoundedRect(c.adjusted(1, 2, -1, -2), 2, 2);
    });
    row("open switching device", [&](const QRectF& c) {
        p.setPen(QPen(Qt::black, 1.4));
        p.drawLine(QPointF(c.center().x() - c.height() * 0.4, c.bottom() - 1),
                   QPointF(c.center().x() + c.height() * 0.4, c.top() + 1));
    });
}
} // namespace

QFont SubmittalStyle::font(double pt, bool bold) const {
    QFont f(family);
    f.setPointSizeF(pt);
    f.setBold(bold);
    // No ligatures: a reviewer searching the PDF for "findings" must find it ("fi" set as one
    // glyph is not found). Without shaping, Qt sets each letter on its own.
    f.setStyleStrategy(QFont::PreferNoShaping);
    return f;
}

SubmittalStyle SubmittalStyle::forDevice(const QPaintDevice& dev, double printScale) {
    SubmittalStyle s;
    s.family = QFont().family();
    const double scale = printScale > 0 ? printScale : 1.0;
    s.minPt = kMinTextMm / 25.4 * 72.0 / scale;
    // The title block and legend a little above the minimum at full size (6.5 pt reads well
    // on tabloid and A3; common practice), the tables at 8 pt or more.
    s.small = std::max(std::ceil(s.minPt * 4) / 4, 6.5);
    s.body = std::max(s.small, 8.0);
    s.head = s.body * 1.25;
    s.big = s.body * 1.45;
    s.line = QFontMetricsF(s.font(s.small), &dev).lineSpacing();
    s.titleH = std::ceil(14.5 * s.line + 8); // the legend's rows, the tallest column
    return s;
}

QRectF submittalPageRect(const QPaintDevice& dev) {
    return QRectF(18, 18, dev.width() - 36, dev.height() - 36);
}

QRectF submittalBodyRect(const QPaintDevice& dev, const SubmittalStyle& style) {
    QRectF r = submittalPageRect(dev);
    r.setBottom(r.bottom() - style.titleH - 6);
    return r.adjusted(8, 8, -8, -8);
}

void paintTitleBlock(QPainter& p, const QPaintDevice& dev, const SubmittalStyle& st,
                     const TitleBlockData& data, int pageNo, int pageCount,
                     const QString& sheetTitle) {
    const Drawing& d = *data.drawing;
    const QRectF pg = submittalPageRect(dev);
    p.save();
    p.setPen(QPen(Qt::black, 1.2));
    p.setBrush(Qt::NoBrush);
    p.drawRect(pg);
    const QRectF tb(pg.left(), pg.bottom() - st.titleH, pg.width(), st.titleH);
    p.drawLine(tb.topLeft(), tb.topRight());
    // Columns: caution | legend | project and title | revisions | number, sheet, people, status
    const double w = tb.width();
    const double x[6] = {tb.left(),
                         tb.left() + w * 0.26,
                         tb.left() + w * 0.47,
                         tb.left() + w * 0.64,
                         tb.left() + w * 0.82,
                         tb.right()};
    for (int i = 1; i < 5; ++i)
        p.drawLine(QPointF(x[i], tb.top()), QPointF(x[i], tb.bottom()));
    auto cell = [&](int i) {
        return QRectF(x[i] + 4, tb.top() + 3, x[i + 1] - x[i] - 8, st.titleH - 6);
    };
    p.setPen(Qt::black);
    p.setFont(st.font(st.small));
    p.drawText(cell(0), Qt::TextWordWrap, "CAUTION\n" + QString::fromUtf8(kSafetyCaution));
    legend(p, st, cell(1), data);
    // Project and title.
    const QRectF c2 = cell(2);
    double y = c2.top();
    auto label = [&](const QRectF& c, const QString& text) {
        p.setFont(st.font(st.small));
        p.drawText(QRectF(c.left(), y, c.width(), st.line), Qt::AlignLeft | Qt::AlignVCenter, text);
        y += st.line;
    };
    // Text in the big size where it fits the room, else in the body size; clipped to the
    // room, so it never runs under what follows.
    auto bigText = [&](const QRectF& c, const QString& text, double maxH) {
        const QRectF box(c.left(), y, c.width(), maxH);
        p.setFont(st.font(st.big, true));
        QRectF used = p.boundingRect(box, Qt::TextWordWrap, text);
        if (used.height() > maxH) {
            p.setFont(st.font(st.body, true));
            used = p.boundingRect(box, Qt::TextWordWrap, text);
        }
        p.save();
        p.setClipRect(box);
        p.drawText(box, Qt::TextWordWrap, text);
        p.restore();
        y += std::min(used.height(), maxH) + 2;
    };
    label(c2, "PROJECT");
    // At most two lines of the project name at the big size (a longer one drops to the body
    // size): its second line ran under the TITLE label when the room was counted in lines of
    // the small size.
    const double bigLine = QFontMetricsF(st.font(st.big, true), &dev).lineSpacing();
    bigText(c2, qs(d.sheet.project), bigLine * 2 + 1);
    label(c2, "TITLE");
    bigText(c2, qs(d.sheet.title) + (sheetTitle.isEmpty() ? "" : " — " + sheetTitle),
            c2.bottom() - y);
    // Revisions as a small table.
    const QRectF c3 = cell(3);
    y = c3.top();
    const double cw[4] = {0.10, 0.27, 0.22, 0.41};
    auto revRow = [&](const QStringList& cells, bool bold) {
        if (y + st.line > c3.bottom() + 0.5)
            return;
        p.setFont(st.font(st.small, bold));
        double cx = c3.left();
        for (int k = 0; k < 4; ++k) {
            const double cwk = cw[k] * c3.width();
            p.drawText(QRectF(cx, y, cwk - 3, st.line), Qt::AlignLeft | Qt::AlignVCenter,
                       QFontMetricsF(p.font(), p.device())
                           .elidedText(cells.value(k), Qt::ElideRight, cwk - 3));
            cx += cwk;
        }
        y += st.line;
    };
    revRow({"REV", "DATE", "BY", "NOTE"}, true);
    for (const auto& r : d.sheet.revisions)
        revRow({qs(r.rev), qs(r.date), qs(r.by), qs(r.note)}, false);
    if (!data.revisionNote.isEmpty()) {
        p.setFont(st.font(st.small));
        p.drawText(QRectF(c3.left(), y, c3.width(), c3.bottom() - y), Qt::TextWordWrap,
                   data.revisionNote);
    }
    // Drawing number, sheet, people, date, rule set; then the check status.
    const QRectF c4 = cell(4);
    y = c4.top();
    auto field = [&](const QString& name, const QString& value) {
        p.setFont(st.font(st.small));
        const QString text = name + "  " + value;
        p.drawText(
            QRectF(c4.left(), y, c4.width(), st.line), Qt::AlignLeft | Qt::AlignVCenter,
            QFontMetricsF(p.font(), p.device()).elidedText(text, Qt::ElideRight, c4.width()));
        y += st.line;
    };
    field("DRAWING", qs(d.sheet.drawingNo));
    field("SHEET", QString("%1 OF %2").arg(pageNo).arg(pageCount));
    field("DRAWN", qs(d.sheet.drawnBy));
    field("CHECKED", data.checkedBy.isEmpty() ? QString("(not named)") : data.checkedBy);
    field("DATE", data.date);
    field("RULE SET", qs(d.sheet.ruleSet));
    p.setFont(st.font(st.small, true));
    p.drawText(QRectF(c4.left(), y + 2, c4.width(), c4.bottom() - y - 2), Qt::TextWordWrap,
               "CHECK STATUS: " + data.status);
    p.restore();
}

} // namespace lineward::ui
