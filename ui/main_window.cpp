// Main window wiring: the Document feeds the Sheet and panels through change events; every
// user action becomes one command on the undo stack.
#include "main_window.h"

#include "commands/add_parts_command.h"
#include "commands/connect_command.h"
#include "commands/delete_command.h"
#include "commands/move_parts_command.h"
#include "commands/set_fields_command.h"
#include "curves_panel.h"
#include "file_dialogs.h"
#include "findings_panel.h"
#include "guard.h"
#include "inspector.h"
#include "io/drawing_file.h"
#include "model/part_defaults.h"
#include "part_item.h"
#include "parts_palette.h"
#include "plain_text.h"
#include "report/report_format.h"
#include "schedules_panel.h"
#include "sheet_scene.h"
#include "sheet_view.h"
#include "title_block_dialog.h"
#include "util/log.h"

#include <QAction>
#include <QApplication>
#include <QCloseEvent>
#include <QDir>
#include <QDockWidget>
#include <QFileDialog>
#include <QFileInfo>
#include <QLabel>
#include <QMenuBar>
#include <QMessageBox>
#include <QMimeData>
#include <QScrollBar>
#include <QSettings>
#include <QStatusBar>
#include <QTimer>

namespace lineward::ui {

MainWindow::MainWindow(std::shared_ptr<const Tables> tables, QWidget* parent)
    : QMainWindow(parent), m_doc(std::move(tables)), m_scene(new SheetScene(m_doc, this)),
      m_view(new SheetView(m_scene)), m_findings(new FindingsPanel(m_doc)),
      m_inspector(new Inspector(m_doc)), m_palette(new PartsPalette),
      m_schedules(new SchedulesPanel(m_doc)), m_curves(new CurvesPanel(m_doc)),
      m_counts(new QLabel), m_autosave(new QTimer(this)) {
    setObjectName("mainWindow");
    setAcceptDrops(true);
    setCentralWidget(m_view);
    auto dock = [this](QWidget* w, const QString& title, const char* name,
                       Qt::DockWidgetArea area) {
        auto* d = new QDockWidget(title, this);
        d->setObjectName(name);
        d->setWidget(w);
        addDockWidget(area, d);
        return d;
    };
    dock(m_palette, tr("Parts"), "partsDock", Qt::LeftDockWidgetArea);
    auto* inspectorDock =
        dock(m_inspector, tr("Inspector"), "inspectorDock", Qt::RightDockWidgetArea);
    auto* f = dock(m_findings, tr("Findings"), "findingsDock", Qt::BottomDockWidgetArea);
    auto* s = dock(m_schedules, tr("Schedules"), "schedulesDock", Qt::BottomDockWidgetArea);
    auto* c = dock(m_curves, tr("Curves"), "curvesDock", Qt::BottomDockWidgetArea);
    // A tabbed dock behind another tab is still visible to Qt: the Schedules refill only when
    // their tab is up (their text for a large plant costs milliseconds per edit).
    connect(s, &QDockWidget::visibilityChanged, m_schedules, &SchedulesPanel::setOnTop);
    tabifyDockWidget(f, s);
    tabifyDockWidget(s, c);
    f->raise();
    resizeDocks({f}, {240}, Qt::Vertical);
    // Wide enough to read every label and value of every kind's form.
    resizeDocks({inspectorDock}, {m_inspector->neededWidth()}, Qt::Horizontal);
    m_counts->setObjectName("severityCounts");
    statusBar()->addPermanentWidget(m_counts);

    connect(&m_doc, &Document::reportChanged, this, &MainWindow::refreshStatus);
    connect(m_findings, &FindingsPanel::locatePart, this, &MainWindow::locate);
    connect(m_findings, &FindingsPanel::applyFixRequested, this,
            guarded(this, tr("Apply fix"), [this](const Finding& fnd) {
                if (auto why = applyFix(fnd); !why.isEmpty())
                    plainMessage(this, QMessageBox::Warning, tr("Cannot apply fix"), why);
            }));
    connect(m_palette, &PartsPalette::kindChosen, m_view,
            [this](PartKind k) { m_view->setPlaceKind(k); });
    connect(
        m_view, &SheetView::placeRequested, this,
        guarded(this, tr("Placing a part"), [this](PartKind k, QPointF at) { placePart(k, at); }));
    connect(
        m_view, &SheetView::connectRequested, this,
        guarded(this, tr("Connecting"), [this](WireEnd a, WireEnd b) { connectTerminals(a, b); }));
    connect(m_view, &SheetView::moveFinished, this,
            guarded(this, tr("Moving parts"),
                    [this](std::vector<PartId> ids, std::vector<QPointF> from,
                           std::vector<QPointF> to) {
                        m_doc.undoStack().push(new MovePartsCommand(m_doc, ids, from, to));
                    }));
    connect(m_view, &SheetView::filesDropped, this,
            guarded(this, tr("Opening a dropped file"), [this](QStringList files) {
                if (maybeSave())
                    openFile(files.first());
            }));
    // A rating typed in the Inspector or in a Schedules cell: one command, one undo step.
    auto setFields = [this](std::vector<Part> after, QString text) {
        m_doc.undoStack().push(new SetFieldsCommand(m_doc, std::move(after), text));
    };
    connect(m_inspector, &Inspector::editRequested, this,
            guarded(this, tr("Changing a rating"), setFields));
    connect(m_schedules, &SchedulesPanel::editRequested, this,
            guarded(this, tr("Changing a rating"), setFields));
    connect(&m_doc, &Document::modifiedChanged, this, &MainWindow::refreshTitle);
    connect(m_scene, &QGraphicsScene::selectionChanged, this,
            guarded(this, tr("Showing the selection"), [this] { selectionChanged(); }));

    buildCompare();
    buildReview();
    buildActions();
    m_recovery = std::make_unique<RecoverySlot>();
    connect(m_autosave, &QTimer::timeout, this,
            guarded(this, tr("Autosave"), [this] { autosave(); }));
    bool ok = false;
    const int seconds = qEnvironmentVariableIntValue("LINEWARD_AUTOSAVE_SECONDS", &ok);
    m_autosave->start((ok && seconds > 0 ? seconds : 60) * 1000);
    QSettings settings;
    restoreGeometry(settings.value("window/geometry").toByteArray());
    restoreState(settings.value("window/state").toByteArray());
    if (!settings.contains("window/geometry"))
        resize(1400, 900);
    m_changesDock->hide(); // compare mode starts from the menu, never from a saved layout
    refreshStatus();
    refreshTitle();
}

MainWindow::~MainWindow() {
    // QWidget deletes the docks, view and scene after this class's part of the object is gone;
    // cut every connection into this window first so no late signal (a scene clearing its
    // selection, a list losing its current row) reaches a half-destroyed MainWindow.
    // The Document is a member and goes before the child widgets: drop the Inspector's form
    // now, or a focused editor's editingFinished (sent as the window tears down) would reach
    // a Document that no longer exists.
    m_inspector->showPart(std::nullopt);
    for (QObject* child : findChildren<QObject*>())
        child->disconnect(this);
    m_doc.disconnect(this);
    m_doc.undoStack().disconnect(this);
    // A window that ends normally leaves nothing to recover (its drawing was saved or the user
    // discarded it in closeEvent); a crash skips this and leaves the slot for the next start.
    m_recovery->remove();
}

QString MainWindow::recoveryPath() const {
    return m_recovery->drawingPath();
}

void MainWindow::autosave() {
    if (!m_doc.isModified())
        return;
    // The recovery copy does not change the document's own path or modified state.
    if (auto why = m_recovery->write(m_doc.drawing(), m_doc.filePath()); !why.isEmpty())
        statusBar()->showMessage(tr("Autosave failed: %1").arg(why), 10000);
}

void MainWindow::adoptRecovered(Drawing drawing, const QString& slotPath,
                                const QString& originalPath) {
    m_doc.resetRecovered(std::move(drawing), originalPath);
    m_recovery->adopt(slotPath);
    refreshTitle();
    m_view->fitInView(m_scene->itemsBoundingRect().adjusted(-20, -20, 20, 20), Qt::KeepAspectRatio);
}

QString MainWindow::saveTo(const QString& path) {
    const QString why = m_doc.saveAs(path);
    if (why.isEmpty()) {
        m_recovery->remove(); // saved: no stale offer at the next start
        addRecent(path);
        refreshTitle();
    }
    return why;
}

QString MainWindow::openFile(const QString& path, bool quiet) {
    const QString why = m_doc.open(path);
    if (!why.isEmpty()) {
        if (!quiet)
            plainMessage(this, QMessageBox::Warning, tr("Cannot open drawing"), why);
        return why;
    }
    m_recovery->remove();
    addRecent(path);
    refreshTitle();
    m_view->fitInView(m_scene->itemsBoundingRect().adjusted(-20, -20, 20, 20), Qt::KeepAspectRatio);
    return {};
}

PartId MainWindow::placePart(PartKind kind, QPointF at) {
    // Its voltage follows the terminal it is dropped by (within 60 units), or the system's.
    Part p = makeStarterPart(m_doc.drawing(), kind, m_scene->nearestTerminal(at, 60));
    p.x = at.x();
    p.y = at.y();
    const PartId id = p.id;
    m_doc.undoStack().push(
        new AddPartsCommand(m_doc, {p}, {}, {}, tr("Place %1").arg(QString::fromStdString(p.tag))));
    m_scene->clearSelection();
    if (auto* item = m_scene->itemFor(id))
        item->setSelected(true);
    return id;
}

void MainWindow::connectTerminals(WireEnd a, WireEnd b) {
    for (const auto& w : m_doc.drawing().wires())
        if ((w.a == a && w.b == b) || (w.a == b && w.b == a))
            return; // already wired
    m_doc.undoStack().push(new ConnectCommand(m_doc, a, b));
}

void MainWindow::deleteSelection() {
    auto parts = m_scene->selectedParts();
    auto wires = m_scene->selectedWires();
    if (!parts.empty() || !wires.empty())
        m_doc.undoStack().push(new DeleteCommand(m_doc, parts, wires));
}

void MainWindow::rotateSelection() {
    std::vector<Part> after;
    for (auto id : m_scene->selectedParts()) {
        Part p = *m_doc.drawing().part(id);
        p.rotation = (p.rotation + 90) % 360;
        after.push_back(p);
    }
    if (!after.empty())
        m_doc.undoStack().push(
            new SetFieldsCommand(m_doc, after, tr("Rotate %1 parts").arg(after.size())));
}

QString MainWindow::applyFix(const Finding& f) {
    if (!f.fix || f.fix->changes.empty())
        return tr("This finding's fix is advice only: %1")
            .arg(QString::fromStdString(f.fix ? f.fix->description : ""));
    std::map<std::uint32_t, Part> edited;
    for (const auto& c : f.fix->changes) {
        const Part* p = m_doc.drawing().part(c.part);
        if (!p)
            return tr("part %1 no longer exists").arg(c.part.value);
        auto it = edited.try_emplace(c.part.value, *p).first;
        if (auto why = it->second.set(c.field, c.value))
            return QString::fromStdString(*why);
    }
    std::vector<Part> after;
    for (auto& [id, p] : edited)
        after.push_back(p);
    // The reviewer stays where they were: same selection, same part of the Sheet.
    const auto selected = m_scene->selectedParts();
    const QPoint scroll(m_view->horizontalScrollBar()->value(),
                        m_view->verticalScrollBar()->value());
    m_doc.undoStack().push(new SetFieldsCommand(
        m_doc, after, tr("Apply fix: %1").arg(QString::fromStdString(f.fix->description))));
    // After the re-check and the panels' refresh (queued), put the selection and view back.
    const auto keep = selected.empty() ? std::vector<PartId>{after.front().id} : selected;
    QTimer::singleShot(0, this, [this, keep, scroll] {
        m_scene->clearSelection();
        for (auto id : keep)
            if (auto* item = m_scene->itemFor(id))
                item->setSelected(true);
        m_view->horizontalScrollBar()->setValue(scroll.x());
        m_view->verticalScrollBar()->setValue(scroll.y());
    });
    return {};
}

void MainWindow::selectionChanged() {
    const auto parts = m_scene->selectedParts();
    m_inspector->showParts(parts);
    if (parts.size() == 1)
        m_curves->showPart(parts.front());
}

void MainWindow::refreshStatus() {
    const auto& c = m_doc.report().openCounts;
    auto count = [](int n, const QString& one, const QString& many) {
        return QString::number(n) + " " + (n == 1 ? one : many);
    };
    const auto& r = m_doc.report();
    QString text = count(c[2], tr("violation"), tr("violations")) + " · " +
                   count(c[1], tr("caution"), tr("cautions")) + " · " +
                   count(c[0], tr("note"), tr("notes"));
    if (r.acceptedCount)
        text += " · " + tr("%1 accepted").arg(r.acceptedCount);
    if (!r.staleAccepted.empty())
        text += " · " + count(static_cast<int>(r.staleAccepted.size()), tr("stale acceptance"),
                              tr("stale acceptances"));
    m_counts->setText(text);
}

void MainWindow::refreshTitle() {
    QString name =
        m_doc.filePath().isEmpty() ? tr("Untitled") : QFileInfo(m_doc.filePath()).fileName();
    if (m_doc.isRecovered())
        name += " " + tr("(recovered)");
    setWindowTitle(name + (m_doc.isModified() ? " *" : "") + " — " + tr("Lineward"));
}

void MainWindow::locate(PartId id) {
    if (PartItem* item = m_scene->itemFor(id)) {
        m_scene->clearSelection();
        item->setSelected(true);
        m_view->centerOn(item);
    }
}

void MainWindow::showAbout() {
    QMessageBox::about(this, tr("About Lineward"),
                       tr("<b>Lineward</b> — one-line diagrams with live protection checks.<p>") +
                           QString::fromUtf8(kSafetyCaution));
}

void MainWindow::editTitleBlock() {
    TitleBlockDialog dialog(m_doc.drawing().sheet, this);
    if (dialog.exec() == QDialog::Accepted)
        dialog.apply(m_doc);
}

bool MainWindow::maybeSave() {
    if (!m_doc.isModified())
        return true;
    const QString name =
        m_doc.filePath().isEmpty() ? tr("Untitled") : QFileInfo(m_doc.filePath()).fileName();
    QMessageBox box(QMessageBox::Question, tr("Unsaved changes"),
                    tr("%1 has unsaved changes. Save them?").arg(name),
                    QMessageBox::Save | QMessageBox::Discard | QMessageBox::Cancel, this);
    box.setObjectName("unsavedChanges");
    box.setTextFormat(Qt::PlainText);
    const auto answer = static_cast<QMessageBox::StandardButton>(box.exec());
    if (answer == QMessageBox::Cancel)
        return false;
    if (answer == QMessageBox::Discard)
        return true;
    QString path = m_doc.filePath();
    if (path.isEmpty())
        path = askSavePath(this, tr("Save drawing"), tr("untitled.lineward"),
                           tr("Lineward drawings (*.lineward)"), ".lineward");
    if (path.isEmpty())
        return false;
    const QString why = saveTo(path);
    if (!why.isEmpty())
        plainMessage(this, QMessageBox::Warning, tr("Save failed"), why);
    return why.isEmpty();
}

void MainWindow::closeEvent(QCloseEvent* e) {
    if (!maybeSave()) {
        e->ignore();
        return;
    }
    QSettings settings;
    settings.setValue("window/geometry", saveGeometry());
    settings.setValue("window/state", saveState());
    m_recovery->remove(); // saved, discarded or clean: nothing to recover
    e->accept();
}

void MainWindow::dragEnterEvent(QDragEnterEvent* e) {
    if (e->mimeData()->hasUrls())
        e->acceptProposedAction();
}

void MainWindow::dropEvent(QDropEvent* e) {
    for (const auto& url : e->mimeData()->urls())
        if (url.isLocalFile() && maybeSave()) {
            openFile(url.toLocalFile());
            break;
        }
}

void MainWindow::addRecent(const QString& path) {
    addRecentFile(path);
    rememberFolder(path);
    rebuildRecentMenu();
}

void MainWindow::rebuildRecentMenu() {
    if (!m_recentMenu)
        return;
    // Opening a recent file rebuilds this menu from inside that action's own triggered signal:
    // the old actions are taken out and deleted later, never while one of them is running.
    for (QAction* old : m_recentMenu->actions()) {
        m_recentMenu->removeAction(old);
        old->deleteLater();
    }
    for (const QString& path : recentFiles()) {
        auto* a = m_recentMenu->addAction(QString(path).replace("&", "&&")); // no mnemonic
        connect(a, &QAction::triggered, this, guarded(this, tr("Open"), [this, path] {
                    if (maybeSave())
                        openFile(path);
                }));
    }
    m_recentMenu->setEnabled(!m_recentMenu->isEmpty());
}

} // namespace lineward::ui
