// Recovery folder bookkeeping. A slot whose lock is held belongs to a running window (of this
// or another Lineward process) and is never offered; QLockFile treats a lock whose process is
// gone as stale, which is exactly a window that crashed.
#include "recovery.h"

#include "io/drawing_file.h"
#include "util/log.h"

#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QUuid>

namespace lineward::ui {

namespace {

QString sibling(const QString& drawingPath, const char* suffix) {
    QString base = drawingPath;
    base.chop(static_cast<int>(QStringLiteral(".lineward").size()));
    return base + suffix;
}

QString readOrigin(const QString& drawingPath) {
    QFile f(sibling(drawingPath, ".origin"));
    if (!f.open(QIODevice::ReadOnly))
        return {};
    return QString::fromUtf8(f.readLine(4096)).trimmed();
}

} // namespace

QString RecoverySlot::folder() {
    return QString::fromStdString((userDataDir() / "recovery").string());
}

RecoverySlot::RecoverySlot() {
    m_path = folder() + "/" + QUuid::createUuid().toString(QUuid::WithoutBraces) + ".lineward";
}

RecoverySlot::~RecoverySlot() = default;

void RecoverySlot::lock() {
    QDir().mkpath(folder());
    if (!m_lock) {
        m_lock = std::make_unique<QLockFile>(sibling(m_path, ".lock"));
        m_lock->setStaleLockTime(0); // only a dead process makes a lock stale
        m_lock->tryLock(0);
    }
}

bool RecoverySlot::adopt(const QString& drawingPath) {
    auto lock = std::make_unique<QLockFile>(sibling(drawingPath, ".lock"));
    lock->setStaleLockTime(0);
    if (!lock->tryLock(0))
        return false;
    remove();
    m_path = drawingPath;
    m_lock = std::move(lock);
    return true;
}

QString RecoverySlot::write(const Drawing& d, const QString& originalPath) {
    lock();
    if (auto why = io::saveDrawing(d, m_path.toStdString()))
        return QString::fromStdString(*why);
    const QByteArray origin = originalPath.toUtf8() + "\n";
    if (auto why = io::writeFileAtomic(sibling(m_path, ".origin").toStdString(),
                                       std::string_view(origin.constData(), origin.size())))
        return QString::fromStdString(*why);
    return {};
}

void RecoverySlot::remove() {
    QFile::remove(m_path);
    QFile::remove(sibling(m_path, ".origin"));
    if (m_lock) {
        m_lock->unlock(); // removes the .lock file
        m_lock.reset();
    }
}

std::vector<LeftSlot> leftSlots() {
    std::vector<LeftSlot> out;
    const QDir dir(RecoverySlot::folder());
    for (const QFileInfo& f : dir.entryInfoList({"*.lineward"}, QDir::Files, QDir::Time)) {
        QLockFile probe(sibling(f.absoluteFilePath(), ".lock"));
        probe.setStaleLockTime(0);
        if (!probe.tryLock(0))
            continue; // a running window's slot
        probe.unlock();
        out.push_back({f.absoluteFilePath(), readOrigin(f.absoluteFilePath())});
    }
    return out;
}

void discard(const LeftSlot& slot) {
    for (const char* suffix : {".lineward", ".origin", ".lock"})
        QFile::remove(sibling(slot.drawingPath, suffix));
}

QString setAside(const LeftSlot& slot) {
    const QString aside = RecoverySlot::folder() + "/unreadable";
    QDir().mkpath(aside);
    const QString to = aside + "/" + QFileInfo(slot.drawingPath).fileName();
    QFile::remove(to);
    QFile::rename(slot.drawingPath, to);
    const QString origin = sibling(slot.drawingPath, ".origin");
    QFile::remove(sibling(to, ".origin"));
    QFile::rename(origin, sibling(to, ".origin"));
    return to;
}

} // namespace lineward::ui
