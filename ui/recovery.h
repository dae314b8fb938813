// Crash recovery: each window autosaves into its own slot of the recovery folder, held by a
// lock while the window lives; slots left by a program that ended without closing are offered
// at the next start. A slot is removed only when its drawing is saved or the user discards it.
#pragma once

#include <QLockFile>
#include <QString>
#include <QStringList>
#include <memory>

namespace lineward {
class Drawing;
}

namespace lineward::ui {

/// One window's place in the recovery folder: `<id>.lineward` (the drawing), `<id>.origin`
/// (the file it was opened from, one line) and `<id>.lock` (held while the window lives).
class RecoverySlot {
public:
    /// A new slot with a fresh id.
    RecoverySlot();
    /// Takes over an existing slot (a drawing recovered at start); false where it is in use.
    bool adopt(const QString& drawingPath);
    ~RecoverySlot();

    QString drawingPath() const { return m_path; }
    /// Writes the drawing and the name of its own file; returns the reason on failure.
    QString write(const Drawing& d, const QString& originalPath);
    /// Removes the slot's files (after a save, or when the user discards the drawing).
    void remove();

    /// The recovery folder ($XDG_DATA_HOME/lineward/recovery).
    static QString folder();

private:
    void lock();
    QString m_path;
    std::unique_ptr<QLockFile> m_lock;
};

/// A slot left behind by a window that did not close: its drawing file and the file it came
/// from (empty for a drawing never saved).
struct LeftSlot {
    QString drawingPath;
    QString originalPath;
};

/// The slots no running window holds, newest first.
std::vector<LeftSlot> leftSlots();
/// Deletes a left slot's files (the user chose Discard).
void discard(const LeftSlot& slot);
/// Moves an unreadable slot's files to recovery/unreadable/ (kept for the user, never deleted);
/// returns where the drawing file went.
QString setAside(const LeftSlot& slot);

} // namespace lineward::ui
