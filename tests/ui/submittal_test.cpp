// The Submittal as a reviewer receives it: the PDF's text (read back with poppler's pdftotext)
// holds every tag, every finding's rule and the caution; CSVs equal the study; the SVG is
// well-formed and names every part; a large one-line tiles with match lines.
#include "check/check.h"
#include "curves/arc_flash_study.h"
#include "io/drawing_file.h"
#include "plant_generator.h"
#include "report/report_format.h"
#include "report/schedules.h"
#include "studies/study.h"
#include "submittal.h"
#include "topology/flow.h"
#include "ui_support.h"

#include <QFile>
#include <QPrinter>
#include <QProcess>
#include <QXmlStreamReader>
#include <complex>
#include <gtest/gtest.h>
#include <regex>

using namespace lineward;
using namespace lineward::ui;

namespace {

Drawing sample(const char* name) {
    return *io::loadDrawing(test::samplePath(name).toStdString()).drawing;
}

// pdftotext output with runs of white space folded to one space, and the font's "fi" and "fl"
// ligatures (pdftotext gives U+FB01, U+FB02: "arcflash" comes back as "arc\uFB02ash") as
// letters.
QString pdfText(const QString& pdf) {
    QProcess p;
    p.start("pdftotext", {"-layout", pdf, "-"});
    p.waitForFinished(60000);
    return QString::fromUtf8(p.readAllStandardOutput())
        .simplified()
        .replace(QChar(0xFB01), "fi")
        .replace(QChar(0xFB02), "fl");
}

QString pdfInfo(const QString& pdf) {
    QProcess p;
    p.start("pdfinfo", {pdf});
    p.waitForFinished(60000);
    return QString::fromUtf8(p.readAllStandardOutput());
}

} // namespace

TEST(Submittal, PdfHoldsEveryTagEveryRuleAndTheCaution) {
    const Drawing d = sample("kestrel-mill-mcc1-review.lineward");
    const QString pdf = test::tempDir("submittal") + "/review.pdf";
    const auto checked = runCheck(d, *test::sharedTables());
    auto r = writeSubmittalPdf(pdf, checked, test::sharedTables(), SubmittalOptions{});
    ASSERT_TRUE(r.error.isEmpty()) << r.error.toStdString();
    EXPECT_GE(r.pages, 5);
    EXPECT_TRUE(pdfInfo(pdf).contains(QString("Pages: %1").arg(r.pages).simplified()) ||
                pdfInfo(pdf).simplified().contains(QString("Pages: %1").arg(r.pages)));
    const QString text = pdfText(pdf);
    ASSERT_FALSE(text.isEmpty()) << "pdftotext (poppler-utils) is needed";
    for (const auto& p : d.parts())
        EXPECT_TRUE(text.contains(QString::fromStdString(p.tag))) << p.tag;
    for (const auto& f : checkDrawing(d, *test::sharedTables()).findings)
        if (f.severity != Severity::Note)
            EXPECT_TRUE(text.contains(QString::fromStdString(f.ruleId))) << f.ruleId;
    EXPECT_TRUE(text.contains(QString::fromUtf8(kSafetyCaution).simplified().left(80)));
    EXPECT_TRUE(text.contains(QString("SHEET 1 OF %1").arg(r.pages)));
    // Counted before painting, the total is right on the last page too, and the PDF holds
    // exactly that many pages (each painted once).
    EXPECT_TRUE(text.contains(QString("SHEET %1 OF %1").arg(r.pages)));
    EXPECT_FALSE(text.contains(QString("SHEET %1 OF").arg(r.pages + 1)));
    EXPECT_TRUE(text.contains("Findings summary"));
    EXPECT_TRUE(text.contains("Schedule — motors"));
    EXPECT_TRUE(text.contains("Curves P-101"));
    // The arc-flash labels close it: one per bus and bucket, at their printed size.
    ASSERT_TRUE(checked->arcFlash);
    EXPECT_TRUE(text.contains("Arc-flash labels"));
    EXPECT_EQ(text.count("ARC-FLASH HAZARD"), static_cast<int>(checked->arcFlash->size()));
    EXPECT_EQ(text.count("NEC 110.16(B)"), 1); // SWBD-1, the service equipment
}

TEST(Submittal, PaperSizesAndOrientation) {
    const Drawing d = sample("kestrel-mill-mcc1.lineward");
    const struct {
        const char* name;
        const char* size;
    } papers[] = {{"letter", "792 x 612"},
                  {"legal", "1008 x 612"},
                  {"tabloid", "1224 x 792"},
                  {"a4", "842 x 595"},
                  {"a3", "1191 x 842"}};
    for (const auto& paper : papers) {
        SubmittalOptions o;
        o.paper = *paperByName(paper.name);
        o.curveParts = std::vector<PartId>{}; // keep it short
        const QString pdf = test::tempDir("papers") + "/" + paper.name + ".pdf";
        ASSERT_TRUE(
            writeSubmittalPdf(pdf, runCheck(d, *test::sharedTables()), test::sharedTables(), o)
                .error.isEmpty());
        EXPECT_TRUE(pdfInfo(pdf).contains(paper.size)) << paper.name << "\n"
                                                       << pdfInfo(pdf).toStdString();
    }
    EXPECT_FALSE(paperByName("b5").has_value());
}

TEST(Submittal, SchedulesCsvGivesTheHandCalculatedFault) {
    // A 1000 kVA, 5.75 % transformer on a 100,000 MVA source: the fault at the cable's line end
    // (the switchboard) by hand, in per unit on 100 MVA, compared with the exported CSV.
    const std::string text = R"({
  "format": "lineward",
  "version": 1,
  "parts": [
    {"id":1,"kind":"source","tag":"U","kv":13.8,"fault_mva":100000,"x_over_r":15},
    {"id":2,"kind":"transformer","tag":"T","kva":1000,"pri_v":13800,"sec_v":480,"z_pct":5.75,"x_over_r":6},
    {"id":3,"kind":"bus","tag":"SB","bus_type":"switchboard","volts":480,"amps":1600,"bracing_ka":65,"phases":3},
    {"id":4,"kind":"breaker","tag":"CB","trip_type":"thermal_magnetic","frame_a":100,"trip_a":60,"interrupting_ka":65},
    {"id":5,"kind":"cable","tag":"C-1","material":"cu","size":"6 AWG","length_ft":100},
    {"id":6,"kind":"load","tag":"L","kw":30,"pf":0.9,"volts":480,"phases":3}
  ],
  "wires": [
    {"id":1,"from":"1.out","to":"2.pri"}, {"id":2,"from":"2.sec","to":"3.bar"},
    {"id":3,"from":"3.bar","to":"4.line"}, {"id":4,"from":"4.load","to":"5.line"},
    {"id":5,"from":"5.load","to":"6.in"}
  ]
}
)";
    auto loaded = io::parseDrawing(text, "hand.lineward");
    ASSERT_TRUE(loaded) << loaded.error->text();
    const QString dir = test::tempDir("csv");
    ASSERT_TRUE(
        writeScheduleCsvs(dir, *runCheck(*loaded.drawing, *test::sharedTables())).isEmpty());
    QFile f(dir + "/cables.csv");
    ASSERT_TRUE(f.open(QIODevice::ReadOnly));
    const QString csv = QString::fromUtf8(f.readAll());
    EXPECT_TRUE(csv.startsWith("Tag,Material,Size,Sets,Length ft"));
    EXPECT_TRUE(csv.contains("\r\n")); // RFC 4180 line ends
    // By hand (the per-unit method of any short-circuit handbook): Z = |Z|∠atan(X/R) on 100 MVA.
    auto z = [](double pu, double xr) { return std::polar(pu, std::atan(xr)); };
    const std::complex<double> zSource = z(100.0 / 100000.0, 15);
    const std::complex<double> zTx = z(0.0575 * 100.0 / 1.0, 6);
    const double baseA = 100e6 / (std::sqrt(3.0) * 480.0);
    // 20.92 kA on an infinite bus (1000 kVA / (√3 · 0.48 kV · 0.0575)); 20.91 with the source.
    const double handKa = baseA / std::abs(zSource + zTx) / 1000.0;
    ASSERT_NEAR(handKa, 20.915, 0.001);
    QString row;
    for (const auto& line : csv.split("\r\n"))
        if (line.startsWith("C-1,"))
            row = line;
    ASSERT_FALSE(row.isEmpty());
    const int col = csv.section("\r\n", 0, 0).split(',').indexOf("Fault kA at line end");
    ASSERT_GE(col, 0);
    EXPECT_NEAR(row.split(',').value(col).toDouble(), handKa, 0.006); // printed to 0.01 kA
    // Quoting: a field with a comma is quoted and its quotes doubled.
    Schedule s{"t", {"a", "b"}, {{"x,y", "say \"hi\""}}};
    EXPECT_EQ(toCsv(s), "a,b\r\n\"x,y\",\"say \"\"hi\"\"\"\r\n");
}

TEST(Submittal, SvgIsWellFormedAndNamesEveryPart) {
    const Drawing d = sample("kestrel-mill-mcc1.lineward");
    const QString svg = test::tempDir("svg") + "/one-line.svg";
    ASSERT_TRUE(
        writeOneLineSvg(svg, runCheck(d, *test::sharedTables()), test::sharedTables()).isEmpty());
    QFile f(svg);
    ASSERT_TRUE(f.open(QIODevice::ReadOnly));
    const QByteArray bytes = f.readAll();
    QXmlStreamReader xml(bytes);
    QString text;
    while (!xml.atEnd()) {
        xml.readNext();
        if (xml.isCharacters())
            text += xml.text().toString() + " ";
    }
    EXPECT_FALSE(xml.hasError()) << xml.errorString().toStdString();
    for (const auto& p : d.parts())
        EXPECT_TRUE(text.contains(QString::fromStdString(p.tag))) << p.tag;
}

TEST(Submittal, LargeOneLineTilesWithMatchLines) {
    const Drawing d = bench::makePlant(600);
    SubmittalOptions o;
    o.paper = QPageSize(QPageSize::Letter);
    o.curveParts = std::vector<PartId>{};
    const QString pdf = test::tempDir("tiles") + "/plant.pdf";
    auto r = writeSubmittalPdf(pdf, runCheck(d, *test::sharedTables()), test::sharedTables(), o);
    ASSERT_TRUE(r.error.isEmpty());
    EXPECT_GT(r.oneLineSheets, 1);
    EXPECT_TRUE(pdfText(pdf).contains("MATCH LINE — SEE SHEET 2"));
    // The sample fits one tabloid sheet: no match lines.
    const QString one = test::tempDir("tiles") + "/sample.pdf";
    auto s = writeSubmittalPdf(
        one, runCheck(sample("kestrel-mill-mcc1.lineward"), *test::sharedTables()),
        test::sharedTables(), SubmittalOptions{});
    EXPECT_EQ(s.oneLineSheets, 1);
    EXPECT_FALSE(pdfText(one).contains("MATCH LINE"));
}

TEST(Submittal, PrintsThroughQPrinterAndListsAcceptedDeviations) {
    // The editor's Print path: a real QPrinter (PDF output, so the test can read it back).
    const Drawing d = sample("kestrel-mill-mcc1-review.lineward");
    ASSERT_FALSE(d.accepted().empty());
    QPrinter printer(QPrinter::HighResolution);
    const QString pdf = test::tempDir("printer") + "/printed.pdf";
    printer.setOutputFormat(QPrinter::PdfFormat);
    printer.setOutputFileName(pdf);
    printer.setPageSize(QPageSize(QPageSize::A3));
    printer.setPageOrientation(QPageLayout::Portrait);
    SubmittalOptions o;
    o.curveParts = std::vector<PartId>{d.partByTag("P-101")->id};
    auto r = paintSubmittal(printer, runCheck(d, *test::sharedTables()), test::sharedTables(), o);
    ASSERT_TRUE(r.error.isEmpty());
    const QString text = pdfText(pdf);
    EXPECT_TRUE(text.contains("Accepted deviations"));
    EXPECT_TRUE(text.contains("T. Okafor"));
    EXPECT_TRUE(text.contains("0.8 diversity"));
    EXPECT_TRUE(pdfInfo(pdf).contains("842 x 1191")); // A3 portrait
}

TEST(Submittal, MarkupInAFileIsPrintedAsText) {
    // A tag and a title that look like rich text reach every page as the characters typed:
    // the one-line, the findings summary, the schedules, the curve sheet and the title block.
    Drawing d = sample("kestrel-mill-mcc1-review.lineward");
    Part* motor = d.part(d.partByTag("P-105")->id);
    motor->tag = "<b>P-105</b>";
    d.sheet.title = "<i>MCC-1</i> one-line";
    const QString pdf = test::tempDir("submittal-markup") + "/markup.pdf";
    SubmittalOptions o;
    o.curveParts = std::vector<PartId>{motor->id};
    auto r = writeSubmittalPdf(pdf, runCheck(d, *test::sharedTables()), test::sharedTables(), o);
    ASSERT_TRUE(r.error.isEmpty()) << r.error.toStdString();
    const QString text = pdfText(pdf);
    ASSERT_FALSE(text.isEmpty()) << "pdftotext (poppler-utils) is needed";
    // On the one-line, in the schedules, the findings and the curve sheet's title: many times.
    EXPECT_GE(text.count("<b>P-105</b>"), 3) << text.left(2000).toStdString();
    EXPECT_TRUE(text.contains("<i>MCC-1</i> one-line"));
}
