// lineward-render-icon: a build-time tool (not installed) that renders an SVG icon of ours to a
// square PNG, so the hicolor PNG sizes come from the one SVG, drawn by the same Qt SVG renderer
// the editor uses. usage: lineward-render-icon IN.svg SIZE OUT.png
#include <QGuiApplication>
#include <QImage>
#include <QPainter>
#include <QSvgRenderer>
#include <cstdio>
#include <cstdlib>

int main(int argc, char** argv) {
    if (argc != 4) {
        std::fprintf(stderr, "usage: lineward-render-icon IN.svg SIZE OUT.png\n");
        return 2;
    }
    qputenv("QT_QPA_PLATFORM", "offscreen"); // a build machine has no display
    QGuiApplication app(argc, argv);
    QSvgRenderer svg(QString::fromLocal8Bit(argv[1]));
    const int size = std::atoi(argv[2]);
    if (!svg.isValid() || size < 8 || size > 1024) {
        std::fprintf(stderr, "lineward-render-icon: %s: not a valid SVG or size %s\n", argv[1],
                     argv[2]);
        return 2;
    }
    QImage image(size, size, QImage::Format_ARGB32_Premultiplied);
    image.fill(Qt::transparent);
    QPainter painter(&image);
    painter.setRenderHint(QPainter::Antialiasing);
    svg.render(&painter, QRectF(0, 0, size, size));
    painter.end();
    if (!image.save(QString::fromLocal8Bit(argv[3]), "PNG")) {
        std::fprintf(stderr, "lineward-render-icon: cannot write %s\n", argv[3]);
        return 2;
    }
    return 0;
}
