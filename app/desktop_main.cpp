// lineward: the desktop editor. `lineward [FILE]` opens FILE; `--screenshot PNG` saves a
// picture of the window and quits (used to make the user guide's images).
#include "guard.h"
#include "main_window.h"
#include "util/log.h"

#include <QApplication>
#include <QCommandLineParser>
#include <QIcon>
#include <QMessageBox>
#include <QPixmap>
#include <QTimer>
#include <spdlog/spdlog.h>

int main(int argc, char** argv) {
    // Qt 6 scales to the screen's device pixel ratio by itself; fractional ratios (150 %) are
    // passed through, so the Sheet's vector symbols and text are drawn at full resolution.
    QGuiApplication::setHighDpiScaleFactorRoundingPolicy(
        Qt::HighDpiScaleFactorRoundingPolicy::PassThrough);
    lineward::ui::Application app(argc, argv);
    Q_INIT_RESOURCE(icons);
    QApplication::setApplicationName("Lineward");
    QApplication::setOrganizationName("Lineward");
    // The window belongs to the menu entry (lineward.desktop) and shows its icon.
    QGuiApplication::setDesktopFileName("lineward");
    QApplication::setWindowIcon(QIcon::fromTheme("lineward", QIcon(":/icons/lineward.svg")));
    lineward::setupLogging("lineward");
    QCommandLineParser parser;
    parser.setApplicationDescription("Lineward one-line diagram editor");
    parser.addHelpOption();
    parser.addPositionalArgument("file", "drawing to open (.lineward)", "[file]");
    QCommandLineOption shot("screenshot", "save a picture of the window to PNG and quit", "PNG");
    parser.addOption(shot);
    parser.process(app);
    std::shared_ptr<const lineward::Tables> tables;
    try {
        tables = lineward::loadBuiltinTables();
    } catch (const std::exception& e) {
        spdlog::critical("reference table unusable: {}", e.what());
        lineward::ui::plainMessage(nullptr, QMessageBox::Critical, "Lineward",
                                   QString("A reference table is unusable:\n") + e.what());
        return 2;
    }
    lineward::ui::MainWindow window(tables);
    window.show();
    if (!parser.positionalArguments().isEmpty())
        window.openFile(parser.positionalArguments().first(), parser.isSet(shot));
    if (!parser.isSet(shot))
        lineward::ui::offerRecovery(window); // after the file: recovered drawings get windows

    if (parser.isSet(shot)) {
        const QString out = parser.value(shot);
        QTimer::singleShot(300, &app, [&window, &app, out] {
            const bool ok = window.grab().save(out);
            if (!ok)
                spdlog::error("cannot write screenshot {}", out.toStdString());
            app.exit(ok ? 0 : 1);
        });
    }
    return app.exec();
}
