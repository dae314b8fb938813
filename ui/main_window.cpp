// Main window wiring: the Document feeds the Sheet and the Findings panel through signals.
#include "main_window.h"

#include "findings_panel.h"
#include "part_item.h"
#include "rules/report_format.h"
#include "sheet_scene.h"

#include <QAction>
#include <QApplication>
#include <QDockWidget>
#include <QFileDialog>
#include <QFileInfo>
#include <QGraphicsView>
#include <QLabel>
#include <QMenuBar>
#include <QMessageBox>
#include <QStatusBar>

namespace lineward::ui {

MainWindow::MainWindow(std::shared_ptr<const Tables> tables, QWidget* parent)
    : QMainWindow(parent), m_doc(std::move(tables)), m_scene(new SheetScene(m_doc, this)), m_view(new QGraphicsView),
      m_findings(new FindingsPanel(m_doc)), m_counts(new QLabel) {
    setObjectName("mainWindow");
    m_view->setObjectName("sheetView");
    m_view->setScene(m_scene);
    m_view->setRenderHint(QPainter::Antialiasing);
    m_view->setDragMode(QGraphicsView::RubberBandDrag);
    setCentralWidget(m_view);

    auto* dock = new QDockWidget(tr("Findings"), this);
    dock->setObjectName("findingsDock");
    dock->setWidget(m_findings);
    addDockWidget(Qt::BottomDockWidgetArea, dock);

    m_counts->setObjectName("severityCounts");
    statusBar()->addPermanentWidget(m_counts);
    connect(&m_doc, &Document::reportChanged, this, &MainWindow::refreshStatus);
    connect(m_findings, &FindingsPanel::locatePart, this, &MainWindow::locate);
    buildMenus();
    refreshStatus();
    resize(1280, 860);
    setWindowTitle(tr("Lineward"));
}

void MainWindow::buildMenus() {
    auto* file = menuBar()->addMenu(tr("&File"));
    auto* open = file->addAction(tr("&Open…"));
    open->setShortcut(QKeySequence::Open);
    connect(open, &QAction::triggered, this, [this] {
        const auto path = QFileDialog::getOpenFileName(this, tr("Open drawing"), {},
                                                       tr("Lineward drawings (*.lineward)"));
        if (!path.isEmpty())
            openFile(path);
    });
    auto* saveAs = file->addAction(tr("Save &As…"));
    saveAs->setShortcut(QKeySequence::SaveAs);
    connect(saveAs, &QAction::triggered, this, [this] {
        const auto path = QFileDialog::getSaveFileName(this, tr("Save drawing"), m_doc.filePath(),
                                                       tr("Lineward drawings (*.lineward)"));
        if (path.isEmpty())
            return;
        if (auto why = m_doc.saveAs(path); !why.isEmpty())
            QMessageBox::warning(this, tr("Save failed"), why);
    });
    file->addSeparator();
    auto* quit = file->addAction(tr("&Quit"));
    quit->setShortcut(QKeySequence::Quit);
    connect(quit, &QAction::triggered, this, &QWidget::close);

    auto* view = menuBar()->addMenu(tr("&View"));
    auto* zin = view->addAction(tr("Zoom &In"));
    zin->setShortcut(QKeySequence::ZoomIn);
    connect(zin, &QAction::triggered, this, [this] { zoomBy(1.25); });
    auto* zout = view->addAction(tr("Zoom &Out"));
    zout->setShortcut(QKeySequence::ZoomOut);
    connect(zout, &QAction::triggered, this, [this] { zoomBy(0.8); });
    auto* fit = view->addAction(tr("&Fit Sheet"));
    fit->setShortcut(QKeySequence(tr("Ctrl+0")));
    connect(fit, &QAction::triggered, this, [this] {
        m_view->fitInView(m_scene->itemsBoundingRect().adjusted(-20, -20, 20, 20),
                          Qt::KeepAspectRatio);
    });

    auto* help = menuBar()->addMenu(tr("&Help"));
    auto* about = help->addAction(tr("&About Lineward"));
    connect(about, &QAction::triggered, this, &MainWindow::showAbout);
}

QString MainWindow::openFile(const QString& path, bool quiet) {
    const QString why = m_doc.open(path);
    if (!why.isEmpty()) {
        if (!quiet)
            QMessageBox::warning(this, tr("Cannot open drawing"), why);
        return why;
    }
    setWindowTitle(QFileInfo(path).fileName() + " — " + tr("Lineward"));
    m_view->fitInView(m_scene->itemsBoundingRect().adjusted(-20, -20, 20, 20), Qt::KeepAspectRatio);
    return {};
}

void MainWindow::refreshStatus() {
    const auto& c = m_doc.report().openCounts;
    m_counts->setText(tr("%1 violations · %2 cautions · %3 notes").arg(c[2]).arg(c[1]).arg(c[0]));
}

void MainWindow::locate(PartId id) {
    if (PartItem* item = m_scene->itemFor(id)) {
        m_scene->clearSelection();
        item->setSelected(true);
        m_view->centerOn(item);
    }
}

void MainWindow::zoomBy(qreal factor) { m_view->scale(factor, factor); }

void MainWindow::showAbout() {
    QMessageBox::about(this, tr("About Lineward"),
                       tr("<b>Lineward</b> — one-line diagrams with live protection checks.<p>") +
                           QString::fromUtf8(kSafetyCaution));
}

} // namespace lineward::ui
