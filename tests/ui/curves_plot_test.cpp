// The Curves renderer, offscreen: the plot is drawn, its legend names every part on the path,
// and the Curves panel follows the selection.
#include "curves_panel.h"
#include "curves_plot.h"
#include "main_window.h"
#include "part_item.h"
#include "sheet_scene.h"
#include "studies/study_view.h"
#include "ui_support.h"
#include "user.h"

#include <QApplication>
#include <QImage>
#include <QPainter>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::ui;

TEST(CurvesPlot, RendersBandsAndLegendForAMotorPath) {
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    const Part* motor = w.document().drawing().partByTag("P-102");
    const CurveSet set = buildCurveSet(*w.document().result().view(), motor->id);
    std::vector<std::string> labels;
    for (const auto& s : set.series)
        labels.push_back(s.label);
    auto has = [&](const char* tag) {
        return std::any_of(labels.begin(), labels.end(),
                           [&](const std::string& l) { return l.find(tag) != std::string::npos; });
    };
    for (const char* tag : {"OL-102", "MCP-102", "CB-F1", "CB-MAIN", "P-102 start", "C-102 damage"})
        EXPECT_TRUE(has(tag)) << tag;
    EXPECT_GT(set.faultA, 1000);

    QImage img(1100, 700, QImage::Format_ARGB32);
    img.fill(Qt::white);
    QPainter p(&img);
    paintCurves(p, QRectF(0, 0, 1100, 700), set);
    p.end();
    // Coloured pixels from the bands: the image is not blank, and not just grey grid.
    int coloured = 0;
    for (int y = 0; y < img.height(); y += 3)
        for (int x = 0; x < img.width(); x += 3) {
            const QColor c = img.pixelColor(x, y);
            coloured += std::abs(c.red() - c.blue()) > 40 || std::abs(c.green() - c.blue()) > 40;
        }
    EXPECT_GT(coloured, 500);
    const QString out = test::tempDir("curves") + "/p102.png";
    EXPECT_TRUE(saveCurves(set, out).isEmpty());
    EXPECT_TRUE(QImage(out).width() == 1100);
    EXPECT_FALSE(
        saveCurves(set, test::tempDir("curves") + "/x.bmp").isEmpty()); // unknown type refused
}

TEST(CurvesPlot, PanelFollowsTheSelection) {
    MainWindow w(test::sharedTables());
    ASSERT_TRUE(w.openFile(test::samplePath("kestrel-mill-mcc1.lineward"), true).isEmpty());
    test::User user(w);
    const Part* cb = w.document().drawing().partByTag("CB-107");
    user.clickPart(cb->id); // a click on the Sheet, as a person selects it
    user.showPanel("Curves");
    ASSERT_FALSE(w.curves()->curveSet().series.empty());
    EXPECT_NE(w.curves()->curveSet().title.find("CB-107"), std::string::npos);
}
