// Remembered folders and recent files, in QSettings ("files/lastFolder", "recentFiles").
#include "file_dialogs.h"

#include <QDir>
#include <QFileDialog>
#include <QFileInfo>
#include <QSettings>

namespace lineward::ui {

QString lastFolder() {
    const QString dir = QSettings().value("files/lastFolder").toString();
    return !dir.isEmpty() && QFileInfo(dir).isDir() ? dir : QDir::homePath();
}

void rememberFolder(const QString& path) {
    QSettings().setValue("files/lastFolder", QFileInfo(realPath(path)).absolutePath());
}

QString askOpenPath(QWidget* parent, const QString& title, const QString& filter) {
    const QString path = QFileDialog::getOpenFileName(parent, title, lastFolder(), filter);
    if (!path.isEmpty())
        rememberFolder(path);
    return path;
}

QString askSavePath(QWidget* parent, const QString& title, const QString& suggestedName,
                    const QString& filter, const QString& suffix) {
    QString path = QFileDialog::getSaveFileName(parent, title,
                                                QDir(lastFolder()).filePath(suggestedName), filter);
    if (path.isEmpty())
        return {};
    if (!suffix.isEmpty() && QFileInfo(path).suffix().isEmpty())
        path += suffix;
    rememberFolder(path);
    return path;
}

QString realPath(const QString& path) {
    const QFileInfo info(path);
    const QString canonical = info.canonicalFilePath(); // empty when the file does not exist
    return canonical.isEmpty() ? QDir::cleanPath(info.absoluteFilePath()) : canonical;
}

void addRecentFile(const QString& path, int keep) {
    QSettings settings;
    QStringList recent = settings.value("recentFiles").toStringList();
    const QString real = realPath(path);
    recent.removeAll(real);
    recent.prepend(real);
    while (recent.size() > keep)
        recent.removeLast();
    settings.setValue("recentFiles", recent);
}

QStringList recentFiles() {
    QStringList shown;
    for (const QString& path : QSettings().value("recentFiles").toStringList()) {
        // Entries written by older versions may name a link or a moved file: show each real,
        // existing file once.
        const QString real = realPath(path);
        if (QFileInfo(real).isFile() && !shown.contains(real))
            shown << real;
    }
    return shown;
}

} // namespace lineward::ui
