// The Submittal read as an authority's reviewer reads it: every word at least the readable size
// on the chosen paper (and on a half-size print), the check status in words with who checked,
// a legend of our symbols, the clean drawing's message as a sentence, the findings summary and
// the accepted deviations on one page, and a curve sheet with axis titles for every path with a
// protection finding.
#include "check/check.h"
#include "io/drawing_file.h"
#include "report/curve_sheets.h"
#include "report/report_format.h"
#include "submittal.h"
#include "submittal_sheet.h"
#include "ui_support.h"

#include <QProcess>
#include <QRegularExpression>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::ui;

namespace {

Drawing sample(const char* name) {
    return *io::loadDrawing(test::samplePath(name).toStdString()).drawing;
}

QString run(const QString& program, const QStringList& args) {
    QProcess p;
    p.start(program, args);
    p.waitForFinished(60000);
    return QString::fromUtf8(p.readAllStandardOutput());
}

QString pageText(const QString& pdf, int page) {
    return run("pdftotext", {"-f", QString::number(page), "-l", QString::number(page), pdf, "-"})
        .simplified();
}

struct WordBox {
    QString word;
    QRectF box;
};

// Every word with its box (pdftotext -bbox), in points: of one page, or of all with page 0.
std::vector<WordBox> wordBoxes(const QString& pdf, int page = 0) {
    QStringList args{"-bbox"};
    if (page > 0)
        args << "-f" << QString::number(page) << "-l" << QString::number(page);
    const QString html = run("pdftotext", args << pdf << "-");
    static const QRegularExpression re(
        R"re(<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">([^<]*)</word>)re");
    std::vector<WordBox> words;
    for (auto it = re.globalMatch(html); it.hasNext();) {
        const auto m = it.next();
        words.push_back(
            {m.captured(5), QRectF(QPointF(m.captured(1).toDouble(), m.captured(2).toDouble()),
                                   QPointF(m.captured(3).toDouble(), m.captured(4).toDouble()))});
    }
    return words;
}

// The smallest word box in the PDF, in points. A box spans the font's ascent to its descent:
// more than the type size itself.
double smallestWordBox(const QString& pdf, QString* word) {
    double least = 1e9;
    for (const auto& [text, box] : wordBoxes(pdf)) {
        double h = box.height();
        // A turned word (the time axis title, a vertical match line) has its box turned: a
        // letter's size is then its width. A word of several letters taller than wide is turned
        // (or too narrow to tell): left out; a single letter counts by its larger side.
        if (text.size() == 1)
            h = std::max(box.width(), h);
        else if (h > box.width())
            continue;
        if (h < least) {
            least = h;
            *word = text;
        }
    }
    return least;
}

SubmittalResult write(const Drawing& d, const QString& pdf, SubmittalOptions o) {
    return writeSubmittalPdf(pdf, runCheck(d, *test::sharedTables()), test::sharedTables(), o);
}

// The review sample's Submittal on tabloid, on A3 and on tabloid at half scale.
struct OnPaper {
    std::string what; // "tabloid 0.5"
    double scale;
    QString pdf;
    SubmittalResult result;
};
std::vector<OnPaper> reviewOnEachPaper(const char* dirName) {
    const Drawing d = sample("kestrel-mill-mcc1-review.lineward");
    const QString dir = test::tempDir(dirName);
    std::vector<OnPaper> out;
    for (const auto& [paper, scale] : std::vector<std::pair<const char*, double>>{
             {"tabloid", 1.0}, {"a3", 1.0}, {"tabloid", 0.5}}) {
        SubmittalOptions o;
        o.paper = *paperByName(paper);
        o.printScale = scale;
        const QString pdf = dir + "/" + paper + QString::number(scale) + ".pdf";
        out.push_back(
            {std::string(paper) + " " + std::to_string(scale), scale, pdf, write(d, pdf, o)});
    }
    return out;
}

} // namespace

TEST(SubmittalReading, NoWordIsSmallerThanTheReadableSize) {
    for (const auto& [what, scale, pdf, r] : reviewOnEachPaper("reading-size")) {
        ASSERT_TRUE(r.error.isEmpty()) << r.error.toStdString();
        // 2 mm (submittal_sheet.h) on the print, after its scale.
        EXPECT_GE(r.minTextPt * scale * 25.4 / 72, kMinTextMm * 0.999) << what;
        QString word;
        const double box = smallestWordBox(pdf, &word);
        ASSERT_LT(box, 1e9) << "pdftotext (poppler-utils) is needed";
        // The smallest word's box (ascent to descent, about 1.16 em for our sans serif) holds
        // at least the minimum size: no word was set smaller than minTextPt.
        EXPECT_GE(box, r.minTextPt * 0.99)
            << what << ": \"" << word.toStdString() << "\" is set in " << box << " pt";
    }
}

TEST(SubmittalReading, TitleBlockLegendStatusAndPages) {
    const Drawing d = sample("kestrel-mill-mcc1-review.lineward");
    const auto result = runCheck(d, *test::sharedTables());
    const QString pdf = test::tempDir("reading") + "/review.pdf";
    SubmittalOptions o;
    o.checkedBy = "R. Quill";
    o.date = "2026-12-03";
    const auto r = writeSubmittalPdf(pdf, result, test::sharedTables(), o);
    ASSERT_TRUE(r.error.isEmpty()) << r.error.toStdString();
    const QString first = pageText(pdf, 1);
    ASSERT_FALSE(first.isEmpty()) << "pdftotext (poppler-utils) is needed";
    // The status in words, from the same check result; who checked and when.
    const QString status = QString::fromStdString(checkStatusWords(result->report));
    EXPECT_TRUE(
        status.startsWith(QString::number(result->report.openCounts[2]) + " open violations"))
        << status.toStdString();
    EXPECT_TRUE(first.contains("CHECK STATUS: " + status.left(20))) << first.toStdString();
    EXPECT_TRUE(first.contains("CHECKED R. Quill")) << first.toStdString();
    EXPECT_TRUE(first.contains("DATE 2026-12-03"));
    EXPECT_TRUE(first.contains("LEGEND"));
    EXPECT_TRUE(first.contains("open violation"));
    EXPECT_TRUE(first.contains("accepted (none open)"));
    // The findings summary and the accepted deviations share the page after the one-line.
    const QString findingsPage = pageText(pdf, r.oneLineSheets + 1);
    EXPECT_TRUE(findingsPage.contains("Findings summary"));
    EXPECT_TRUE(findingsPage.contains("Accepted deviations")) << "a page of its own";
    // A curve sheet for the lighting feeder's cable (conductor.protection, no motor), with
    // axis titles and the available fault.
    const QString all = run("pdftotext", {pdf, "-"}).simplified();
    EXPECT_TRUE(all.contains("Curves C-LP1"));
    EXPECT_TRUE(all.contains("Time in s"));
    EXPECT_TRUE(all.contains("Current in A at 480 V"));
    EXPECT_TRUE(all.contains("available fault"));
    // One curve sheet per path curveSheetParts names: each sheet's title block says so.
    EXPECT_EQ(all.count("— Curves "), static_cast<int>(curveSheetParts(*result).size()));
}

TEST(SubmittalReading, TheCleanDrawingSaysSoInASentence) {
    const Drawing d = sample("kestrel-mill-mcc1.lineward");
    const QString pdf = test::tempDir("reading-clean") + "/clean.pdf";
    SubmittalOptions o;
    o.curveParts = std::vector<PartId>{};
    const auto r = write(d, pdf, o);
    ASSERT_TRUE(r.error.isEmpty());
    const QString page = pageText(pdf, r.oneLineSheets + 1);
    EXPECT_TRUE(page.contains("The check found no open violations or cautions in this drawing"))
        << page.left(600).toStdString();
    // No open violation or caution; the status says what there is, in words.
    const auto report = runCheck(d, *test::sharedTables())->report;
    ASSERT_EQ(report.openCounts[2] + report.openCounts[1], 0);
    EXPECT_TRUE(pageText(pdf, 1).contains("CHECK STATUS: " +
                                          QString::fromStdString(checkStatusWords(report))))
        << pageText(pdf, 1).toStdString();
}

// The title block's words never overlap: the review sample's project name takes two lines,
// and its second line once ran under the TITLE label.
TEST(SubmittalReading, TitleBlockWordsDoNotOverlap) {
    for (const auto& [what, scale, pdf, r] : reviewOnEachPaper("reading-title")) {
        ASSERT_TRUE(r.error.isEmpty()) << r.error.toStdString();
        const auto words = wordBoxes(pdf, 1);
        ASSERT_FALSE(words.empty()) << "pdftotext (poppler-utils) is needed";
        // The title block starts at its first line, the caution's heading.
        double top = -1;
        for (const auto& w : words)
            if (w.word == "CAUTION")
                top = std::max(top, w.box.top());
        ASSERT_GT(top, 0);
        std::vector<WordBox> block;
        for (const auto& w : words)
            if (w.box.top() >= top - 0.5)
                block.push_back(w);
        ASSERT_GT(block.size(), 40u);
        for (size_t i = 0; i < block.size(); ++i)
            for (size_t j = i + 1; j < block.size(); ++j) {
                const QRectF both = block[i].box.intersected(block[j].box);
                EXPECT_LT(both.width() * both.height(), 0.5)
                    << what << ": \"" << block[i].word.toStdString() << "\" and \""
                    << block[j].word.toStdString() << "\" overlap";
            }
    }
}
