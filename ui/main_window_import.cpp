// File → Import Load List…: a load list read by the core, previewed for a chosen bus, and its
// buckets added as one undoable edit.
#include "commands/add_parts_command.h"
#include "file_dialogs.h"
#include "guard.h"
#include "import_loads_dialog.h"
#include "main_window.h"
#include "model/ratings.h"
#include "sheet_scene.h"

#include <QFile>
#include <QFileInfo>
#include <QMenu>
#include <QStatusBar>

namespace lineward::ui {

void MainWindow::importLoadList() {
    const QString path =
        askOpenPath(this, tr("Import load list"), tr("Load lists (*.csv);;All files (*)"));
    if (path.isEmpty())
        return;
    rememberFolder(path);
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly)) {
        plainMessage(this, QMessageBox::Warning, tr("Import Load List"),
                     tr("%1 cannot be read: %2").arg(path, file.errorString()));
        return;
    }
    const QByteArray bytes = file.readAll();
    LoadList list = readLoadList(std::string_view(bytes.constData(), bytes.size()));
    // Buckets go on a motor control center or switchboard bus; the selected one is offered first.
    std::vector<PartId> buses;
    for (const auto& p : m_doc.drawing().parts())
        if (p.kind == PartKind::Bus && BusRatings::of(p).type != BusType::Panelboard)
            buses.push_back(p.id);
    if (buses.empty()) {
        plainMessage(this, QMessageBox::Information, tr("Import Load List"),
                     tr("The drawing has no MCC or switchboard bus to add buckets to. Place one "
                        "first, or build a whole lineup with lineward-cli new."));
        return;
    }
    PartId preferred = buses.front();
    for (PartId id : m_scene->selectedParts())
        if (std::find(buses.begin(), buses.end(), id) != buses.end())
            preferred = id;
    for (PartId id : buses)
        if (preferred == buses.front() &&
            BusRatings::of(*m_doc.drawing().part(id)).type == BusType::Mcc)
            preferred = id;
    ImportLoadsDialog dialog(m_doc, QFileInfo(path).fileName(), std::move(list), buses, preferred,
                             this);
    if (dialog.exec() != QDialog::Accepted || dialog.plan().buckets.empty())
        return;
    const BucketPlan& plan = dialog.plan();
    const int n = static_cast<int>(plan.buckets.size());
    m_doc.undoStack().push(
        new AddPartsCommand(m_doc, plan.allParts(), plan.allWires(), plan.allBuckets(),
                            n == 1 ? tr("Import 1 Bucket") : tr("Import %1 Buckets").arg(n)));
    statusBar()->showMessage(
        tr("Imported %1 bucket(s) from %2").arg(n).arg(QFileInfo(path).fileName()), 8000);
}

} // namespace lineward::ui
