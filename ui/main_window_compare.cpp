// Compare mode of the main window: the open drawing against an older revision read from a file.
// One comparison (core/compare) feeds the Changes panel and the Sheet's marks; it is made again
// from each new check result, so edits made while comparing show at once.
#include "changes_panel.h"
#include "compare_mark.h"
#include "file_dialogs.h"
#include "guard.h"
#include "io/drawing_file.h"
#include "main_window.h"
#include "part_item.h"
#include "sheet_scene.h"
#include "sheet_view.h"
#include "submittal.h"

#include <QAction>
#include <QDockWidget>
#include <QFileInfo>
#include <QMenu>
#include <QStatusBar>

namespace lineward::ui {

namespace {
// A removed part's symbol where it stood (the Sheet's symbol size; a bus as a bar).
QRectF ghostRect(const Part& p) {
    QRectF r = p.kind == PartKind::Bus ? QRectF(-60, -6, 120, 12) : QRectF(-16, -22, 32, 44);
    return QTransform().rotate(p.rotation).mapRect(r).translated(p.x, p.y);
}
} // namespace

QString MainWindow::compareWith(const QString& path) {
    auto loaded = io::loadDrawing(path.toStdString());
    if (!loaded)
        return QString::fromStdString(loaded.error->text());
    m_compareBase = runCheck(std::move(*loaded.drawing), m_doc.tables());
    m_compareFile = QFileInfo(path).fileName();
    m_changesDock->show();
    m_changesDock->raise();
    if (m_leaveCompareAction)
        m_leaveCompareAction->setEnabled(true);
    refreshCompare();
    return {};
}

void MainWindow::leaveCompare() {
    if (!m_compareBase)
        return;
    m_compareBase.reset();
    m_compareFile.clear();
    clearCompareMarks();
    m_changes->clear();
    m_changesDock->hide();
    if (m_leaveCompareAction)
        m_leaveCompareAction->setEnabled(false);
    statusBar()->clearMessage();
}

void MainWindow::clearCompareMarks() {
    for (CompareMark* mark : m_compareMarks) {
        m_scene->removeItem(mark);
        delete mark;
    }
    m_compareMarks.clear();
}

void MainWindow::refreshCompare() {
    if (!m_compareBase)
        return;
    const DrawingComparison c = compareDrawings(*m_compareBase, m_doc.result());
    m_changes->showComparison(c, m_compareFile);
    clearCompareMarks();
    auto mark = [this](CompareMark::Kind kind, const QRectF& at, const QString& tag = {}) {
        auto* m = new CompareMark(kind, at, tag);
        m_scene->addItem(m);
        m_compareMarks.push_back(m);
    };
    // The comparison was made from the document's newest result; its parts are the Sheet's.
    for (const auto& p : c.partsAdded)
        if (PartItem* item = m_scene->itemFor(p.part.id))
            mark(CompareMark::Kind::Added, item->symbolSceneRect());
    for (const auto& p : c.partsChanged)
        if (PartItem* item = m_scene->itemFor(p.newId))
            mark(CompareMark::Kind::Changed, item->symbolSceneRect());
    for (const auto& p : c.partsRemoved)
        mark(CompareMark::Kind::Removed, ghostRect(p.part), QString::fromStdString(p.part.tag));
    statusBar()->showMessage(
        tr("Comparing with %1: %2 added, %3 removed, %4 changed; %5 findings introduced, %6 "
           "resolved")
            .arg(m_compareFile)
            .arg(c.partsAdded.size())
            .arg(c.partsRemoved.size())
            .arg(c.partsChanged.size())
            .arg(c.findingsNew.size())
            .arg(c.findingsResolved.size()));
}

void MainWindow::flagRevisions(SubmittalOptions& o) const {
    if (!m_compareBase)
        return;
    o.previous = m_compareBase;
    o.previousName = m_compareFile;
}

void MainWindow::buildCompare() {
    m_changes = new ChangesPanel;
    m_changesDock = new QDockWidget(tr("Changes"), this);
    m_changesDock->setObjectName("changesDock");
    m_changesDock->setWidget(m_changes);
    // Beside the Findings, where a row is wide enough for old → new values.
    addDockWidget(Qt::BottomDockWidgetArea, m_changesDock);
    if (auto* findingsDock = findChild<QDockWidget*>("findingsDock"))
        tabifyDockWidget(findingsDock, m_changesDock);
    m_changesDock->hide();
    connect(m_changes, &ChangesPanel::locatePart, this, &MainWindow::locate);
    connect(m_changes, &ChangesPanel::locatePlace, this, [this](QPointF at) {
        m_scene->clearSelection();
        m_view->centerOn(at);
    });
    connect(m_changes, &ChangesPanel::leaveRequested, this, &MainWindow::leaveCompare);
    // The scene deletes every item when it rebuilds (a drawing opened): forget the marks first;
    // a new drawing leaves compare mode.
    connect(m_scene, &SheetScene::aboutToRebuild, this, [this] { m_compareMarks.clear(); });
    connect(&m_doc, &Document::drawingReset, this, &MainWindow::leaveCompare);
    connect(&m_doc, &Document::reportChanged, this, &MainWindow::refreshCompare);
}

void MainWindow::addCompareActions(QMenu* file) {
    auto* compare = file->addAction(tr("Compare &With…"));
    connect(compare, &QAction::triggered, this, guarded(this, tr("Compare"), [this] {
                const auto path = askOpenPath(this, tr("Compare with an older revision"),
                                              tr("Lineward drawings (*.lineward)"));
                if (path.isEmpty())
                    return;
                if (auto why = compareWith(path); !why.isEmpty())
                    plainMessage(this, QMessageBox::Warning, tr("Cannot compare"), why);
            }));
    m_leaveCompareAction = file->addAction(tr("&Leave Compare"));
    m_leaveCompareAction->setEnabled(false);
    connect(m_leaveCompareAction, &QAction::triggered, this, &MainWindow::leaveCompare);
}

} // namespace lineward::ui
