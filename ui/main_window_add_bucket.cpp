// Edit → Add Bucket… (Ctrl+B, the toolbar, right-click on a bus): one sized bucket on an MCC or
// switchboard bus, placed in its next free slot as one undoable edit; and the bucket library:
// Save Bucket as Template… and Insert Bucket from Library…, which opens the same dialog.
#include "add_bucket_dialog.h"
#include "bucket_library.h"
#include "commands/add_parts_command.h"
#include "guard.h"
#include "lineup/bucket_template.h"
#include "main_window.h"
#include "model/ratings.h"
#include "sheet_scene.h"

#include <QInputDialog>
#include <QMenu>
#include <QStatusBar>

namespace lineward::ui {

PartId MainWindow::bucketBus(PartId preferred) {
    const Drawing& d = m_doc.drawing();
    auto takesBuckets = [&](PartId id) {
        const Part* p = d.part(id);
        return p && p->kind == PartKind::Bus && BusRatings::of(*p).type != BusType::Panelboard;
    };
    if (takesBuckets(preferred))
        return preferred;
    for (PartId id : m_scene->selectedParts())
        if (takesBuckets(id))
            return id;
    for (const auto& p : d.parts())
        if (takesBuckets(p.id) && BusRatings::of(p).type == BusType::Mcc)
            return p.id;
    plainMessage(this, QMessageBox::Information, tr("Add Bucket"),
                 tr("Select an MCC or switchboard bus to add the bucket to."));
    return {};
}

void MainWindow::placeBucketFrom(AddBucketDialog& dialog) {
    if (dialog.exec() != QDialog::Accepted || dialog.plan().buckets.empty())
        return;
    const BucketPlan& plan = dialog.plan();
    const QString tag = QString::fromStdString(plan.buckets.front().bucket.tag);
    m_doc.undoStack().push(new AddPartsCommand(m_doc, plan.allParts(), plan.allWires(),
                                               plan.allBuckets(), tr("Add Bucket %1").arg(tag)));
    statusBar()->showMessage(tr("Added bucket %1").arg(tag), 8000);
}

void MainWindow::addBucket(PartId preferred) {
    const PartId bus = bucketBus(preferred);
    if (!bus.valid())
        return;
    AddBucketDialog dialog(m_doc, bus, this);
    placeBucketFrom(dialog);
}

void MainWindow::saveBucketAsTemplate() {
    const Drawing& d = m_doc.drawing();
    const Bucket* bucket = nullptr;
    for (PartId id : m_scene->selectedParts())
        if (!bucket)
            bucket = d.bucketOf(id);
    if (!bucket) {
        plainMessage(this, QMessageBox::Information, tr("Save Bucket as Template"),
                     tr("Select a part of a bucket to save the bucket as a template."));
        return;
    }
    std::string why;
    const auto fragment = bucketFragment(d, bucket->id, why);
    if (!fragment) {
        plainMessage(this, QMessageBox::Warning, tr("Save Bucket as Template"),
                     tr("Cannot save %1 as a template: %2")
                         .arg(QString::fromStdString(bucket->tag), QString::fromStdString(why)));
        return;
    }
    bool ok = false;
    const QString name =
        QInputDialog::getText(this, tr("Save Bucket as Template"),
                              tr("Template name (kept in %1):").arg(bucketLibraryDir()),
                              QLineEdit::Normal, QString::fromStdString(bucket->tag), &ok);
    if (!ok)
        return;
    if (const QString refused = saveBucketTemplate(*fragment, name); !refused.isEmpty()) {
        plainMessage(this, QMessageBox::Warning, tr("Save Bucket as Template"), refused);
        return;
    }
    statusBar()->showMessage(tr("Saved template %1").arg(name.trimmed()), 8000);
}

void MainWindow::insertBucketFromLibrary(PartId preferred) {
    const QStringList names = bucketTemplateNames();
    if (names.isEmpty()) {
        plainMessage(this, QMessageBox::Information, tr("Insert Bucket from Library"),
                     tr("The bucket library (%1) is empty: select a bucket and choose Edit → "
                        "Save Bucket as Template… first.")
                         .arg(bucketLibraryDir()));
        return;
    }
    const PartId bus = bucketBus(preferred);
    if (!bus.valid())
        return;
    bool ok = false;
    const QString name = QInputDialog::getItem(this, tr("Insert Bucket from Library"),
                                               tr("Template:"), names, 0, false, &ok);
    if (!ok)
        return;
    const auto loaded = loadBucketTemplate(name);
    std::string why;
    std::optional<LoadRow> row;
    if (loaded)
        row = templateRow(*loaded.drawing, why);
    else
        why = loaded.error->text();
    if (!row) {
        plainMessage(this, QMessageBox::Warning, tr("Insert Bucket from Library"),
                     tr("Cannot use template %1: %2").arg(name, QString::fromStdString(why)));
        return;
    }
    AddBucketDialog dialog(m_doc, bus, this, &*row, name);
    placeBucketFrom(dialog);
}

void MainWindow::addBucketActions(QMenu& menu, PartId id) {
    const Part* p = m_doc.drawing().part(id);
    if (!p || p->kind != PartKind::Bus || BusRatings::of(*p).type == BusType::Panelboard)
        return; // only MCC and switchboard buses take buckets
    QAction* add = menu.addAction(tr("Add &Bucket…"));
    add->setObjectName("addBucketHere");
    connect(add, &QAction::triggered, this,
            guarded(this, tr("Add a bucket"), [this, id] { addBucket(id); }));
    QAction* insert = menu.addAction(tr("Insert Bucket from &Library…"));
    insert->setObjectName("insertTemplateHere");
    connect(insert, &QAction::triggered, this,
            guarded(this, tr("Insert a bucket"), [this, id] { insertBucketFromLibrary(id); }));
    menu.addSeparator();
}

} // namespace lineward::ui
