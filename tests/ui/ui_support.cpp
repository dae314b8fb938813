// ui test helpers; main() runs the tests under an offscreen QApplication.
#include "ui_support.h"

#include "guard.h"
#include "io/drawing_file.h"
#include "main_window.h"

#include <QApplication>
#include <QCoreApplication>
#include <QDir>
#include <QSettings>
#include <QStandardPaths>
#include <fstream>
#include <gtest/gtest.h>
#include <sstream>
#include <unistd.h>

namespace lineward::ui::test {

std::shared_ptr<const Tables> sharedTables() {
    static auto t = loadBuiltinTables();
    return t;
}

QString samplePath(const char* name) {
    return QString(LINEWARD_SOURCE_DIR) + "/samples/" + name;
}

std::string fileBytes(const QString& path) {
    std::ifstream in(path.toStdString(), std::ios::binary);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

std::string drawingBytes(MainWindow& w) {
    return io::serializeDrawing(w.document().drawing());
}

const Finding* findingOf(MainWindow& w, const std::string& rule) {
    for (const auto& f : w.document().report().findings)
        if (f.ruleId == rule)
            return &f;
    return nullptr;
}

QString tempDir(const char* name) {
    // One folder per process: ctest runs the ui tests two at a time, and another checkout's
    // tests may run on the same machine.
    const QString dir = QDir::tempPath() + "/lineward-ui-" +
                        QString::number(QCoreApplication::applicationPid()) + "-" + name;
    QDir(dir).removeRecursively();
    QDir().mkpath(dir);
    return dir;
}

} // namespace lineward::ui::test

int main(int argc, char** argv) {
    // Offscreen unless a platform is asked for (QT_QPA_PLATFORM=xcb under Xvfb shows the
    // same tests in a real X window).
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM"))
        qputenv("QT_QPA_PLATFORM", "offscreen");
    // Recovery slots live under XDG_DATA_HOME: one folder per process, so that tests running at
    // the same time never share a recovery slot.
    const QString data = QDir::tempPath() + "/lineward-ui-data-" + QString::number(::getpid());
    qputenv("XDG_DATA_HOME", data.toUtf8());
    lineward::ui::Application app(argc, argv); // the program's own exception boundary
    QApplication::setOrganizationName("LinewardTests");
    QApplication::setApplicationName("LinewardTests");
    QStandardPaths::setTestModeEnabled(true);
    // Settings too (window geometry and dock state, recent files, reviewer name): a test starts
    // from none, whatever tests ran before it, so dock widths and the fitted zoom do not depend
    // on the order the tests happen to run in.
    for (const auto format : {QSettings::NativeFormat, QSettings::IniFormat})
        QSettings::setPath(format, QSettings::UserScope, data + "/config");
    ::testing::InitGoogleTest(&argc, argv);
    const int failed = RUN_ALL_TESTS();
    QDir(data).removeRecursively();
    const QString mine = "lineward-ui-" + QString::number(::getpid()) + "-*";
    for (const QString& dir : QDir(QDir::tempPath()).entryList({mine}, QDir::Dirs))
        QDir(QDir::tempPath() + "/" + dir).removeRecursively();
    return failed;
}
