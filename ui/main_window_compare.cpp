// Compare mode of the main window: the open drawing against an older revision read from a file.
// One comparison (core/compare) feeds the Changes panel and the Sheet's marks; it is made again
// from each new check result, so edits made while comparing show at once.
#include "changes_panel.h"
#include "commands/sheet_info_command.h"
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
#include <QDir>
#include <QRegularExpression>
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

QString MainWindow::flagRevisions(SubmittalOptions& o) const {
    if (m_compareBase) { // the person picked the older revision: it wins over the recorded one
        o.previous = m_compareBase;
        o.previousName = m_compareFile;
        return tr("flags since %1").arg(m_compareFile);
    }
    // The newest row is the revision being issued; its own kept file (a re-issue) is not the
    // previous revision.
    const auto& revs = m_doc.drawing().sheet.revisions;
    const Revision* last = nullptr;
    for (std::size_t i = 0; i + 1 < revs.size(); ++i)
        if (!revs[i].file.empty())
            last = &revs[i];
    if (!last)
        return {};
    const QDir base = m_doc.filePath().isEmpty() ? QDir::current()
                                                 : QFileInfo(m_doc.filePath()).absoluteDir();
    const QString path = base.absoluteFilePath(QString::fromStdString(last->file));
    const QString rev = QString::fromStdString(last->rev);
    auto loaded = io::loadDrawing(path.toStdString());
    if (!loaded)
        return tr("no flags: revision %1's issued drawing cannot be read (%2)")
            .arg(rev, QString::fromStdString(loaded.error->text()));
    o.previous = runCheck(std::move(*loaded.drawing), m_doc.tables());
    o.previousName = tr("REV %1 (%2)").arg(rev, QFileInfo(path).fileName());
    return tr("flags since revision %1 (%2)").arg(rev, QFileInfo(path).fileName());
}

QString MainWindow::keepIssuedDrawing(const QString& pdfPath) {
    SheetInfo sheet = m_doc.drawing().sheet;
    if (sheet.revisions.empty())
        return {}; // no revision to keep it for
    Revision& rev = sheet.revisions.back();
    QString word = QString::fromStdString(rev.rev);
    word.replace(QRegularExpression("[^A-Za-z0-9_-]"), "_");
    const QFileInfo pdf(pdfPath);
    const QString copy =
        pdf.absoluteDir().absoluteFilePath(pdf.completeBaseName() + "-rev-" + word + ".lineward");
    if (!m_doc.filePath().isEmpty() &&
        QFileInfo(copy).absoluteFilePath() == QFileInfo(m_doc.filePath()).absoluteFilePath())
        return tr("the issued copy would overwrite the drawing itself");
    // Relative to the drawing's folder where the copy lies there or below, so the two can move
    // together; otherwise the whole path.
    QString recorded = copy;
    if (!m_doc.filePath().isEmpty()) {
        const QString rel = QFileInfo(m_doc.filePath()).absoluteDir().relativeFilePath(copy);
        if (!rel.startsWith("../"))
            recorded = rel;
    }
    rev.file = recorded.toStdString();
    Drawing issued = m_doc.drawing();
    issued.sheet = sheet;
    if (auto why = io::saveDrawing(issued, copy.toStdString()))
        return QString::fromStdString(*why);
    if (!(sheet == m_doc.drawing().sheet)) {
        auto* cmd = new SheetInfoCommand(m_doc, sheet);
        cmd->setText(tr("Record the issued drawing of revision %1")
                         .arg(QString::fromStdString(rev.rev)));
        m_doc.undoStack().push(cmd);
    }
    return {};
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
