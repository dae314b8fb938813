// The start-up offer of drawings left in the recovery folder by windows that did not close.
#include "guard.h"
#include "io/drawing_file.h"
#include "main_window.h"

#include <QAbstractButton>
#include <QDateTime>
#include <QFile>
#include <QFileInfo>
#include <spdlog/spdlog.h>

namespace lineward::ui {

namespace {

// Asks about one drawing; returns the button chosen.
QMessageBox::StandardButton askAbout(QWidget* parent, const LeftSlot& slot) {
    const QString name = slot.originalPath.isEmpty() ? QObject::tr("an untitled drawing")
                                                     : QFileInfo(slot.originalPath).fileName();
    QMessageBox box(QMessageBox::Question, QObject::tr("Recover drawing"),
                    QObject::tr("Lineward was not closed normally. It kept unsaved changes to %1 "
                                "(autosaved %2).\n\nOpen them? Discard deletes the copy; Later "
                                "asks again at the next start.")
                        .arg(name, QFileInfo(slot.drawingPath)
                                       .lastModified()
                                       .toString(QStringLiteral("yyyy-MM-dd HH:mm"))),
                    QMessageBox::Open | QMessageBox::Discard | QMessageBox::Ignore, parent);
    box.setObjectName("recoverDrawing");
    box.setTextFormat(Qt::PlainText); // the file name may be anything
    box.button(QMessageBox::Ignore)->setText(QObject::tr("Later"));
    box.setDefaultButton(QMessageBox::Open);
    return static_cast<QMessageBox::StandardButton>(box.exec());
}

} // namespace

void offerRecovery(MainWindow& first) {
    bool firstUsed = first.document().isModified() || !first.document().filePath().isEmpty();
    for (const LeftSlot& slot : leftSlots()) {
        auto loaded = io::loadDrawing(slot.drawingPath.toStdString());
        if (!loaded) {
            const QString aside = setAside(slot);
            spdlog::warn("recovery file unreadable, set aside as {}: {}", aside.toStdString(),
                         loaded.error->text());
            plainMessage(&first, QMessageBox::Warning, QObject::tr("Recovery file unreadable"),
                         QObject::tr("An autosaved drawing could not be read:\n%1\n\nIt was "
                                     "kept, unchanged, as\n%2")
                             .arg(QString::fromStdString(loaded.error->text()), aside));
            continue;
        }
        const auto answer = askAbout(&first, slot);
        if (answer == QMessageBox::Discard) {
            discard(slot);
            continue;
        }
        if (answer != QMessageBox::Open)
            continue;
        MainWindow* target = &first;
        if (firstUsed) {
            target = new MainWindow(first.document().sharedTables());
            target->setAttribute(Qt::WA_DeleteOnClose);
            target->show();
        }
        firstUsed = true;
        target->adoptRecovered(std::move(*loaded.drawing), slot.drawingPath, slot.originalPath);
    }
}

} // namespace lineward::ui
