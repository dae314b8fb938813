// lineward: the desktop editor. `lineward [FILE]` opens FILE; `--screenshot PNG` saves a
// picture of the window and quits (used to make the user guide's images).
#include "io/drawing_file.h"
#include "main_window.h"
#include "util/log.h"

#include <QApplication>
#include <QCommandLineParser>
#include <QDateTime>
#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QMessageBox>
#include <QPixmap>
#include <QTimer>
#include <spdlog/spdlog.h>

namespace {

// A recovery copy left by a window that did not close normally is offered once.
void offerRecovery(lineward::ui::MainWindow& window) {
    const QDir dir(QString::fromStdString((lineward::userDataDir() / "recovery").string()));
    const auto files = dir.entryInfoList({"*.lineward"}, QDir::Files, QDir::Time);
    for (const QFileInfo& f : files) {
        if (f.absoluteFilePath() == QFileInfo(window.recoveryPath()).absoluteFilePath())
            continue;
        const auto answer = QMessageBox::question(
            &window, QObject::tr("Recover drawing"),
            QObject::tr("Lineward found an autosaved drawing from %1 that was not saved. Open it?")
                .arg(f.lastModified().toString(Qt::ISODate)),
            QMessageBox::Open | QMessageBox::Discard | QMessageBox::Ignore);
        if (answer == QMessageBox::Open) {
            auto loaded = lineward::io::loadDrawing(f.absoluteFilePath().toStdString());
            if (loaded)
                window.document().reset(std::move(*loaded.drawing));
        }
        if (answer != QMessageBox::Ignore)
            QFile::remove(f.absoluteFilePath());
        break;
    }
}

} // namespace

int main(int argc, char** argv) {
    QApplication app(argc, argv);
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
        QMessageBox::critical(nullptr, "Lineward",
                              QString("A reference table is unusable:\n") + e.what());
        return 2;
    }
    lineward::ui::MainWindow window(tables);
    window.show();
    if (!parser.isSet(shot))
        offerRecovery(window);
    if (!parser.positionalArguments().isEmpty())
        window.openFile(parser.positionalArguments().first(), parser.isSet(shot));
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
