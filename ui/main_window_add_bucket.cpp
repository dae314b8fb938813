// Edit → Add Bucket… (Ctrl+B): one sized bucket on the selected MCC or switchboard bus, placed
// in its next free slot as one undoable edit.
#include "add_bucket_dialog.h"
#include "commands/add_parts_command.h"
#include "guard.h"
#include "main_window.h"
#include "model/ratings.h"
#include "sheet_scene.h"

#include <QStatusBar>

namespace lineward::ui {

void MainWindow::addBucket() {
    const Drawing& d = m_doc.drawing();
    auto takesBuckets = [&](PartId id) {
        const Part* p = d.part(id);
        return p && p->kind == PartKind::Bus && BusRatings::of(*p).type != BusType::Panelboard;
    };
    PartId bus;
    for (PartId id : m_scene->selectedParts())
        if (takesBuckets(id))
            bus = id;
    for (const auto& p : d.parts())
        if (!bus.valid() && takesBuckets(p.id) && BusRatings::of(p).type == BusType::Mcc)
            bus = p.id;
    if (!bus.valid()) {
        plainMessage(this, QMessageBox::Information, tr("Add Bucket"),
                     tr("Select an MCC or switchboard bus to add the bucket to."));
        return;
    }
    AddBucketDialog dialog(m_doc, bus, this);
    if (dialog.exec() != QDialog::Accepted || dialog.plan().buckets.empty())
        return;
    const BucketPlan& plan = dialog.plan();
    const QString tag = QString::fromStdString(plan.buckets.front().bucket.tag);
    m_doc.undoStack().push(new AddPartsCommand(m_doc, plan.allParts(), plan.allWires(),
                                               plan.allBuckets(), tr("Add Bucket %1").arg(tag)));
    statusBar()->showMessage(tr("Added bucket %1").arg(tag), 8000);
}

} // namespace lineward::ui
