// File dialogs that start in the folder the user last used (remembered across runs in the
// settings), and the recent-files list kept as real paths.
#pragma once

#include <QString>
#include <QStringList>

class QWidget;

namespace lineward::ui {

/// The folder of the last file opened, saved or exported; the home folder at first.
QString lastFolder();
/// Remembers the folder of `path` (a file) as the last folder.
void rememberFolder(const QString& path);

/// Asks for a file to open, starting in the last folder; empty when cancelled.
QString askOpenPath(QWidget* parent, const QString& title, const QString& filter);
/// Asks where to save, starting in the last folder with `suggestedName`; adds `suffix` (".dxf")
/// when the name typed has none. Empty when cancelled.
QString askSavePath(QWidget* parent, const QString& title, const QString& suggestedName,
                    const QString& filter, const QString& suffix);

/// The canonical path of a file (symbolic links and "..", "." resolved); `path` made absolute
/// when the file does not exist.
QString realPath(const QString& path);
/// Puts `path` (as its real path) first in the recent files, at most `keep` entries.
void addRecentFile(const QString& path, int keep = 8);
/// The recent files that still exist, newest first.
QStringList recentFiles();

} // namespace lineward::ui
