// lineward: the desktop editor. `lineward [FILE]` opens FILE; `--screenshot PNG` saves a
// picture of the window and quits (used to make the user guide's images).
#include "guard.h"
#include "main_window.h"
#include "util/log.h"

#include <QApplication>
#include <QCommandLineParser>
#include <QMessageBox>
#include <QPixmap>
#include <QTimer>
#include <spdlog/spdlog.h>

int main(int argc, char** argv) {
    lineward::ui::Application app(argc, argv);
    QApplication::setApplicationName("Lineward");
    QApplication::setOrganizationName("Lineward");
    lineward::setupLogging("lineward");
    QCommandLineParser parser;
    parser.setApplicationDescription("Lineward one-line diagram editor");
    parser.addHelpOption();
    parser.addPositionalArgument("file", "drawing to open (.lineward)");
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
