// The reviewer's work in the window: Accept… and Withdraw acceptance on a finding (Findings
// panel, the part's right-click menu on the Sheet), review comments (Review panel, the same
// menu, Edit → Add Comment…). Each action is one undoable command.
#include "commands/review_commands.h"
#include "findings_panel.h"
#include "guard.h"
#include "main_window.h"
#include "part_item.h"
#include "report/report_format.h"
#include "review_dialogs.h"
#include "review_panel.h"
#include "sheet_scene.h"
#include "sheet_view.h"

#include <QDate>
#include <QDockWidget>
#include <QMenu>
#include <QSettings>
#include <QStatusBar>
#include <algorithm>

namespace lineward::ui {

namespace {
QString today() {
    return QDate::currentDate().toString(Qt::ISODate);
}

QString tagsOf(const Drawing& d, const std::vector<PartId>& parts) {
    QStringList tags;
    for (auto id : parts)
        if (const Part* p = d.part(id))
            tags << QString::fromStdString(p->tag);
    return tags.join(", ");
}
} // namespace

void MainWindow::buildReview() {
    m_review = new ReviewPanel(m_doc);
    auto* dock = new QDockWidget(tr("Review"), this);
    dock->setObjectName("reviewDock");
    dock->setWidget(m_review);
    addDockWidget(Qt::BottomDockWidgetArea, dock);
    if (auto* curvesDock = findChild<QDockWidget*>("curvesDock"))
        tabifyDockWidget(curvesDock, dock);
    // The Findings tab stays the one shown, at its height, as before the Review tab came.
    if (auto* findingsDock = findChild<QDockWidget*>("findingsDock")) {
        findingsDock->raise();
        resizeDocks({findingsDock}, {240}, Qt::Vertical);
    }
    connect(m_findings, &FindingsPanel::acceptRequested, this,
            guarded(this, tr("Accept a finding"), [this](const Finding& f) { acceptFinding(f); }));
    connect(m_findings, &FindingsPanel::withdrawRequested, this,
            guarded(this, tr("Withdraw an acceptance"),
                    [this](const Finding& f) { withdrawAcceptance(f); }));
    connect(m_findings, &FindingsPanel::withdrawStaleRequested, this,
            guarded(this, tr("Withdraw an acceptance"), [this](std::size_t i) {
                const auto& accepted = m_doc.drawing().accepted();
                if (i < accepted.size())
                    m_doc.undoStack().push(new WithdrawAcceptanceCommand(
                        m_doc, {i}, QString::fromStdString(accepted[i].rule)));
            }));
    connect(m_view, &SheetView::partMenuRequested, this,
            guarded(this, tr("The part's menu"),
                    [this](PartId id, QPoint at) { showPartMenu(id, at); }));
    connect(m_review, &ReviewPanel::locatePart, this, &MainWindow::locate);
    connect(m_review, &ReviewPanel::addRequested, this, guarded(this, tr("Add a comment"), [this] {
                const auto parts = m_scene->selectedParts();
                if (parts.size() != 1) {
                    statusBar()->showMessage(
                        tr("Select one part on the Sheet to pin a comment to it."), 8000);
                    return;
                }
                addComment(parts.front());
            }));
    connect(m_review, &ReviewPanel::resolveRequested, this,
            guarded(this, tr("Resolve a comment"), [this](std::uint32_t id, bool resolved) {
                m_doc.undoStack().push(new ResolveCommentCommand(m_doc, id, resolved));
            }));
    connect(m_review, &ReviewPanel::deleteRequested, this,
            guarded(this, tr("Delete a comment"), [this](std::uint32_t id) {
                m_doc.undoStack().push(new DeleteCommentCommand(m_doc, id));
            }));
}

void MainWindow::acceptFinding(const Finding& f) {
    if (f.accepted || f.parts.empty())
        return;
    const QString name = reviewerName(this);
    if (name.isEmpty())
        return; // the reviewer did not give a name: nothing is recorded
    const QString subject = QString::fromStdString(findingHeadline(f)) + "\n" +
                            tr("Parts: %1").arg(tagsOf(m_doc.drawing(), f.parts));
    ReviewNoteDialog dialog(
        tr("Accept deviation"), subject,
        tr("Why is this deviation acceptable? The note is kept in the drawing with your name "
           "(%1) and today's date.")
            .arg(name),
        tr("A note is required: an acceptance without a reason cannot be reviewed. Say why the "
           "deviation is acceptable."),
        this);
    if (dialog.exec() != QDialog::Accepted)
        return;
    m_doc.undoStack().push(new AcceptFindingCommand(
        m_doc, f, name.toStdString(), today().toStdString(), dialog.note().toStdString()));
    statusBar()->showMessage(tr("Accepted %1").arg(QString::fromStdString(f.ruleId)), 8000);
}

void MainWindow::withdrawAcceptance(const Finding& f) {
    std::vector<std::size_t> covering;
    const auto& accepted = m_doc.drawing().accepted();
    for (std::size_t i = 0; i < accepted.size(); ++i)
        if (acceptanceCovers(accepted[i], f))
            covering.push_back(i);
    if (!covering.empty())
        m_doc.undoStack().push(
            new WithdrawAcceptanceCommand(m_doc, covering, QString::fromStdString(f.ruleId)));
}

void MainWindow::addComment(PartId part) {
    const Part* p = m_doc.drawing().part(part);
    if (!p)
        return;
    const QString name = reviewerName(this);
    if (name.isEmpty())
        return;
    ReviewNoteDialog dialog(tr("Review comment"),
                            tr("Comment on %1").arg(QString::fromStdString(p->tag)),
                            tr("The comment is pinned to the part, kept in the drawing with your "
                               "name (%1) and today's date, and printed in the Submittal.")
                                .arg(name),
                            tr("A comment needs some text."), this);
    if (dialog.exec() != QDialog::Accepted)
        return;
    m_doc.undoStack().push(new AddCommentCommand(
        m_doc, part, name.toStdString(), today().toStdString(), dialog.note().toStdString()));
}

QString MainWindow::checkedByForSubmittal() const {
    if (!m_doc.drawing().sheet.checkedBy.empty())
        return QString::fromStdString(m_doc.drawing().sheet.checkedBy);
    return QSettings().value(kReviewerNameKey).toString().simplified();
}

void MainWindow::showPartMenu(PartId id, QPoint at) {
    const Part* part = m_doc.drawing().part(id);
    if (!part)
        return;
    locate(id);
    auto* menu = new QMenu(this);
    menu->setObjectName("partMenu");
    menu->setAttribute(Qt::WA_DeleteOnClose);
    addBucketActions(*menu, id);
    // The findings about this part (the ones its badge shows), each copied: the menu outlives
    // the check result it was made from.
    for (const auto& f : m_doc.report().findings) {
        if (std::find(f.parts.begin(), f.parts.end(), id) == f.parts.end())
            continue;
        const QString rule = QString::fromStdString(f.ruleId);
        if (f.accepted)
            connect(menu->addAction(tr("Withdraw acceptance of %1").arg(rule)), &QAction::triggered,
                    this, guarded(this, tr("Withdraw an acceptance"), [this, f] {
                        withdrawAcceptance(f);
                    }));
        else
            connect(menu->addAction(tr("Accept %1…").arg(rule)), &QAction::triggered, this,
                    guarded(this, tr("Accept a finding"), [this, f] { acceptFinding(f); }));
    }
    if (!menu->isEmpty())
        menu->addSeparator();
    connect(menu->addAction(tr("Add Comment…")), &QAction::triggered, this,
            guarded(this, tr("Add a comment"), [this, id] { addComment(id); }));
    menu->popup(at);
}

} // namespace lineward::ui
