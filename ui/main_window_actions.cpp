// Menus and the edit actions of the main window (clipboard, buckets), with the platform's
// standard shortcuts.
#include "commands/add_parts_command.h"
#include "commands/bucket_command.h"
#include "export/one_line_dxf.h"
#include "file_dialogs.h"
#include "findings_panel.h"
#include "guard.h"
#include "io/drawing_file.h"
#include "main_window.h"
#include "model/part_defaults.h"
#include "part_item.h"
#include "plain_text.h"
#include "review_dialogs.h"
#include "sheet_scene.h"
#include "sheet_view.h"
#include "shortcuts_dialog.h"
#include "submittal.h"

#include <QAction>
#include <QApplication>
#include <QClipboard>
#include <QDockWidget>
#include <QFileDialog>
#include <QFileInfo>
#include <QInputDialog>
#include <QMenuBar>
#include <QMimeData>
#include <QPrintDialog>
#include <QPrintPreviewDialog>
#include <QPrinter>
#include <QSettings>
#include <QStatusBar>
#include <QToolBar>
#include <functional>
#include <set>

namespace lineward::ui {

namespace {
// Every menu action runs guarded: an exception in it is reported and the program goes on.
QAction* menuAction(QMenu* menu, const QString& text, QKeySequence key, QWidget* ctx,
                    std::function<void()> fn) {
    auto* a = menu->addAction(text);
    a->setShortcut(key);
    QString what = text;
    what.remove('&');
    what.remove(QChar(0x2026));
    QObject::connect(a, &QAction::triggered, ctx, guarded(ctx, what, [fn] { fn(); }));
    return a;
}
} // namespace

void MainWindow::buildActions() {
    buildFileMenu();
    buildEditMenu();
    buildViewMenu();
    auto* help = menuBar()->addMenu(tr("&Help"));
    menuAction(help, tr("&Keyboard Shortcuts…"), QKeySequence(tr("Ctrl+/")), this, [this] {
        ShortcutsDialog dialog(*menuBar(), this);
        dialog.exec();
    });
    menuAction(help, tr("&About Lineward"), QKeySequence(), this, [this] { showAbout(); });
}

void MainWindow::buildFileMenu() {
    auto* file = menuBar()->addMenu(tr("&File"));
    menuAction(file, tr("&New"), QKeySequence::New, this, [this] {
        if (maybeSave())
            m_doc.reset(Drawing{});
        refreshTitle();
    });
    menuAction(file, tr("New &Window"), QKeySequence(tr("Ctrl+Shift+N")), this, [this] {
        // A second window on its own drawing; copy and paste between windows go through the
        // clipboard. The window deletes itself when closed.
        auto* w = new MainWindow(m_doc.sharedTables());
        w->setAttribute(Qt::WA_DeleteOnClose);
        w->show();
    });
    menuAction(file, tr("&Open…"), QKeySequence::Open, this, [this] {
        if (!maybeSave())
            return;
        const auto path =
            askOpenPath(this, tr("Open drawing"), tr("Lineward drawings (*.lineward)"));
        if (!path.isEmpty())
            openFile(path);
    });
    m_recentMenu = file->addMenu(tr("Open &Recent"));
    rebuildRecentMenu();
    // Files move and vanish while the program runs: list what exists when the menu opens.
    connect(m_recentMenu, &QMenu::aboutToShow, this,
            guarded(this, tr("Open Recent"), [this] { rebuildRecentMenu(); }));
    auto saveAs = [this] {
        const auto path = askSavePath(this, tr("Save drawing"), baseName() + ".lineward",
                                      tr("Lineward drawings (*.lineward)"), ".lineward");
        if (!path.isEmpty())
            if (auto why = saveTo(path.endsWith(".lineward") ? path : path + ".lineward");
                !why.isEmpty())
                plainMessage(this, QMessageBox::Warning, tr("Save failed"), why);
    };
    menuAction(file, tr("&Save"), QKeySequence::Save, this, [this, saveAs] {
        if (m_doc.filePath().isEmpty())
            return saveAs();
        if (auto why = saveTo(m_doc.filePath()); !why.isEmpty())
            plainMessage(this, QMessageBox::Warning, tr("Save failed"), why);
    });
    menuAction(file, tr("Save &As…"), QKeySequence::SaveAs, this, saveAs);
    file->addSeparator();
    menuAction(file, tr("&Title Block…"), QKeySequence(), this, [this] { editTitleBlock(); });
    file->addSeparator();
    menuAction(file, tr("Import &Load List…"), QKeySequence(tr("Ctrl+Shift+L")), this,
               [this] { importLoadList(); });
    addCompareActions(file);
    file->addSeparator();
    menuAction(file, tr("Print Pre&view…"), QKeySequence(), this, [this] { printPreview(); });
    menuAction(file, tr("&Print…"), QKeySequence::Print, this, [this] { printSubmittal(); });
    menuAction(file, tr("Arc-&Flash Labels…"), QKeySequence(), this,
               [this] { exportArcFlashLabels(); });
    buildExportMenu(file->addMenu(tr("&Export")));
    file->addSeparator();
    menuAction(file, tr("&Close"), QKeySequence(tr("Ctrl+W")), this, [this] { close(); });
    // Quit asks each window about its unsaved drawing; one Cancel keeps the program running.
    menuAction(file, tr("&Quit"), QKeySequence(tr("Ctrl+Q")), this, [] {
        QApplication::closeAllWindows();
        for (QWidget* w : QApplication::topLevelWidgets())
            if (qobject_cast<MainWindow*>(w) && w->isVisible())
                return;
        QApplication::quit();
    });
}

void MainWindow::buildExportMenu(QMenu* exportMenu) {
    // Each export reads the result of the newest edit (waitForCheck) and starts in the folder
    // used last, named after the drawing.
    auto done = [this](const QString& path, const QString& why, const QString& more = {}) {
        if (!why.isEmpty())
            plainMessage(this, QMessageBox::Warning, tr("Export failed"), why);
        else
            statusBar()->showMessage(tr("Wrote %1%2").arg(path, more), 8000);
    };
    menuAction(exportMenu, tr("Submittal &PDF…"), QKeySequence(), this, [this, done] {
        const auto path = askSavePath(this, tr("Export Submittal PDF"), baseName() + ".pdf",
                                      tr("PDF (*.pdf)"), ".pdf");
        if (path.isEmpty())
            return;
        m_doc.waitForCheck();
        SubmittalOptions o;
        const QString flags = flagRevisions(o);
        o.checkedBy = checkedByForSubmittal();
        auto r = writeSubmittalPdf(path, m_doc.sharedResult(), m_doc.sharedTables(), o);
        QString more = tr(" (%1 pages").arg(r.pages);
        if (o.previous)
            more += tr("; %1 parts flagged, %2").arg(r.revisionFlags).arg(flags);
        else if (!flags.isEmpty())
            more += "; " + flags;
        if (r.error.isEmpty())
            if (const QString kept = keepIssuedDrawing(path); !kept.isEmpty())
                more += tr("; the issued drawing was not kept: %1").arg(kept);
        done(path, r.error, more + ")");
    });
    menuAction(exportMenu, tr("One-line &SVG…"), QKeySequence(), this, [this, done] {
        const auto path = askSavePath(this, tr("Export one-line SVG"), baseName() + ".svg",
                                      tr("SVG (*.svg)"), ".svg");
        if (path.isEmpty())
            return;
        m_doc.waitForCheck();
        done(path, writeOneLineSvg(path, m_doc.sharedResult(), m_doc.sharedTables()));
    });
    menuAction(exportMenu, tr("One-line &DXF…"), QKeySequence(), this, [this, done] {
        const auto path = askSavePath(this, tr("Export one-line DXF"), baseName() + ".dxf",
                                      tr("DXF (*.dxf)"), ".dxf");
        if (path.isEmpty())
            return;
        m_doc.waitForCheck();
        const auto why = dxf::writeOneLineDxf(m_doc.result(), path.toStdString());
        done(path, why ? QString::fromStdString(*why) : QString());
    });
    menuAction(exportMenu, tr("Schedules &CSV…"), QKeySequence(), this, [this, done] {
        const auto dir =
            QFileDialog::getExistingDirectory(this, tr("Folder for the schedules"), lastFolder());
        if (dir.isEmpty())
            return;
        rememberFolder(dir + "/motors.csv");
        m_doc.waitForCheck();
        done(dir, writeScheduleCsvs(dir, m_doc.result()));
    });
}

QString MainWindow::baseName() const {
    return m_doc.filePath().isEmpty() ? tr("untitled")
                                      : QFileInfo(m_doc.filePath()).completeBaseName();
}

void MainWindow::buildEditMenu() {
    auto* edit = menuBar()->addMenu(tr("&Edit"));
    // Undo and Redo run guarded like every other action (a command that throws while undoing
    // is reported, not fatal); their text and enabled state follow the undo stack.
    QUndoStack& stack = m_doc.undoStack();
    auto* undo = menuAction(edit, tr("&Undo"), QKeySequence::Undo, this,
                            [this] { m_doc.undoStack().undo(); });
    auto* redo =
        menuAction(edit, tr("&Redo"), QKeySequence(), this, [this] { m_doc.undoStack().redo(); });
    // Every binding the platform has for Redo (Ctrl+Shift+Z and Ctrl+Y on Linux).
    auto redoKeys = QKeySequence::keyBindings(QKeySequence::Redo);
    if (!redoKeys.contains(QKeySequence(tr("Ctrl+Y"))))
        redoKeys << QKeySequence(tr("Ctrl+Y"));
    redo->setShortcuts(redoKeys);
    auto follow = [](QAction* a, const QString& verb, bool can, const QString& what) {
        a->setEnabled(can);
        a->setText(what.isEmpty() ? verb : verb + " " + what);
    };
    follow(undo, tr("&Undo"), stack.canUndo(), stack.undoText());
    follow(redo, tr("&Redo"), stack.canRedo(), stack.redoText());
    connect(&stack, &QUndoStack::indexChanged, undo, [=, &stack] {
        follow(undo, tr("&Undo"), stack.canUndo(), stack.undoText());
        follow(redo, tr("&Redo"), stack.canRedo(), stack.redoText());
    });
    connect(&stack, &QUndoStack::cleanChanged, undo, [=, &stack] {
        follow(undo, tr("&Undo"), stack.canUndo(), stack.undoText());
        follow(redo, tr("&Redo"), stack.canRedo(), stack.redoText());
    });
    edit->addSeparator();
    menuAction(edit, tr("Cu&t"), QKeySequence::Cut, this, [this] {
        copySelection();
        deleteSelection();
    });
    menuAction(edit, tr("&Copy"), QKeySequence::Copy, this, [this] { copySelection(); });
    menuAction(edit, tr("&Paste"), QKeySequence::Paste, this, [this] { paste(); });
    menuAction(edit, tr("&Delete"), QKeySequence::Delete, this, [this] { deleteSelection(); });
    menuAction(edit, tr("Select &All"), QKeySequence::SelectAll, this,
               [this] { m_scene->selectEverything(); });
    edit->addSeparator();
    menuAction(edit, tr("&Rotate"), QKeySequence(tr("Ctrl+R")), this,
               [this] { rotateSelection(); });
    menuAction(edit, tr("&Group as Bucket"), QKeySequence(tr("Ctrl+G")), this,
               [this] { groupSelectionAsBucket(); });
    auto* addBucketAction = menuAction(edit, tr("Add &Bucket…"), QKeySequence(tr("Ctrl+B")), this,
                                       [this] { addBucket(); });
    addBucketAction->setObjectName("addBucketAction");
    addBucketAction->setToolTip(tr("Add a sized motor bucket to the selected MCC or switchboard "
                                   "bus (Ctrl+B)"));
    auto* bar = addToolBar(tr("Edit"));
    bar->setObjectName("editToolBar");
    bar->setToolButtonStyle(Qt::ToolButtonTextOnly);
    bar->addAction(addBucketAction);
    menuAction(edit, tr("Save Bucket as &Template…"), QKeySequence(), this, [this] {
        saveBucketAsTemplate();
    })->setObjectName("saveTemplateAction");
    auto* insert =
        menuAction(edit, tr("&Insert Bucket from Library…"), QKeySequence(tr("Ctrl+Shift+B")), this,
                   [this] { insertBucketFromLibrary(); });
    insert->setObjectName("insertTemplateAction");
    bar->addAction(insert);
    menuAction(edit, tr("Cancel Placing"), QKeySequence::Cancel, this,
               [this] { m_view->setPlaceKind(std::nullopt); });
    edit->addSeparator();
    menuAction(edit, tr("Add Co&mment…"), QKeySequence(tr("Ctrl+M")), this, [this] {
        const auto parts = m_scene->selectedParts();
        if (parts.size() == 1)
            addComment(parts.front());
        else
            statusBar()->showMessage(tr("Select one part on the Sheet to pin a comment to it."),
                                     8000);
    });
    menuAction(edit, tr("Reviewer &Name…"), QKeySequence(), this,
               [this] { askReviewerName(this); });
}

void MainWindow::buildViewMenu() {
    auto* view = menuBar()->addMenu(tr("&View"));
    menuAction(view, tr("Zoom &In"), QKeySequence::ZoomIn, this, [this] { m_view->zoomBy(1.25); });
    menuAction(view, tr("Zoom &Out"), QKeySequence::ZoomOut, this, [this] { m_view->zoomBy(0.8); });
    menuAction(view, tr("&Fit Sheet"), QKeySequence(tr("Ctrl+0")), this, [this] {
        m_view->fitInView(m_scene->itemsBoundingRect().adjusted(-20, -20, 20, 20),
                          Qt::KeepAspectRatio);
    });
    view->addSeparator();
    for (auto* dock : findChildren<QDockWidget*>())
        view->addAction(dock->toggleViewAction());
}

void MainWindow::printPreview() {
    QPrinter printer(QPrinter::HighResolution);
    printer.setPageSize(QPageSize(QPageSize::Tabloid));
    printer.setPageOrientation(QPageLayout::Landscape);
    QPrintPreviewDialog preview(&printer, this);
    connect(&preview, &QPrintPreviewDialog::paintRequested, this,
            guarded(this, tr("Print preview"), [this](QPrinter* p) {
                SubmittalOptions o;
                o.paper = p->pageLayout().pageSize();
                o.orientation = p->pageLayout().orientation();
                flagRevisions(o);
                o.checkedBy = checkedByForSubmittal();
                paintSubmittal(*p, m_doc.sharedResult(), m_doc.sharedTables(), o);
            }));
    preview.exec();
}

void MainWindow::printSubmittal() {
    QPrinter printer(QPrinter::HighResolution);
    printer.setPageSize(QPageSize(QPageSize::Tabloid));
    printer.setPageOrientation(QPageLayout::Landscape);
    QPrintDialog dialog(&printer, this);
    if (dialog.exec() != QDialog::Accepted)
        return;
    SubmittalOptions o;
    o.paper = printer.pageLayout().pageSize();
    o.orientation = printer.pageLayout().orientation();
    flagRevisions(o);
    o.checkedBy = checkedByForSubmittal();
    auto r = paintSubmittal(printer, m_doc.sharedResult(), m_doc.sharedTables(), o);
    if (!r.error.isEmpty())
        plainMessage(this, QMessageBox::Warning, tr("Print failed"), r.error);
}

void MainWindow::copySelection() {
    const auto ids = m_scene->selectedParts();
    if (ids.empty())
        return;
    // The clipboard holds a small drawing in our file format: the parts, the wires among them
    // and the buckets wholly inside the selection.
    Drawing clip;
    std::set<std::uint32_t> in;
    for (auto id : ids) {
        clip.addPart(*m_doc.drawing().part(id));
        in.insert(id.value);
    }
    for (const auto& w : m_doc.drawing().wires())
        if (in.count(w.a.part.value) && in.count(w.b.part.value))
            clip.addWire(w);
    for (const auto& b : m_doc.drawing().buckets()) {
        bool all = !b.parts.empty();
        for (auto p : b.parts)
            all = all && in.count(p.value);
        if (all)
            clip.addBucket(b);
    }
    const QByteArray text = QByteArray::fromStdString(io::serializeDrawing(clip));
    auto* data = new QMimeData;
    data->setData(kClipboardMime, text);
    data->setText(QString::fromUtf8(text));
    QApplication::clipboard()->setMimeData(data);
}

void MainWindow::paste() {
    const QMimeData* data = QApplication::clipboard()->mimeData();
    if (!data)
        return;
    const QByteArray text =
        data->hasFormat(kClipboardMime) ? data->data(kClipboardMime) : data->text().toUtf8();
    auto loaded = io::parseDrawing(text.toStdString(), "clipboard");
    if (!loaded) {
        statusBar()->showMessage(tr("Clipboard holds no Lineward parts: %1")
                                     .arg(QString::fromStdString(loaded.error->message)),
                                 8000);
        return;
    }
    // New ids; tags renumbered with their bucket; each copy lands 40 units further (core).
    PasteSet set = preparePaste(m_doc.drawing(), *loaded.drawing);
    std::vector<PartId> ids;
    for (const auto& p : set.parts)
        ids.push_back(p.id);
    m_doc.undoStack().push(new AddPartsCommand(m_doc, std::move(set.parts), std::move(set.wires),
                                               std::move(set.buckets),
                                               tr("Paste %1 parts").arg(ids.size())));
    m_scene->selectParts(ids);
}

void MainWindow::groupSelectionAsBucket() {
    const auto ids = m_scene->selectedParts();
    if (ids.empty())
        return;
    bool ok = false;
    const QString tag =
        QInputDialog::getText(this, tr("Group as bucket"), tr("Bucket tag"), QLineEdit::Normal,
                              QString("B-%1").arg(m_doc.drawing().nextBucketId().value), &ok);
    if (!ok || tag.trimmed().isEmpty())
        return;
    const double sccr = QInputDialog::getDouble(
        this, tr("Group as bucket"), tr("Short-circuit current rating (kA)"), 65, 1, 300, 1, &ok);
    if (ok)
        m_doc.undoStack().push(
            new GroupBucketCommand(m_doc, ids, tag.trimmed().toStdString(), sccr));
}

} // namespace lineward::ui
