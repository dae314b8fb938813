// File → Arc-Flash Labels…: one arc-flash label per bus and bucket of the newest check, on the
// label stock the user picks, written as PDF.
#include "file_dialogs.h"
#include "guard.h"
#include "label_sheet.h"
#include "main_window.h"

#include <QDate>
#include <QInputDialog>
#include <QStatusBar>

namespace lineward::ui {

void MainWindow::exportArcFlashLabels() {
    QStringList stocks;
    for (const auto& name : labelStockNames())
        stocks << labelStockDescription(*labelStockByName(name));
    bool ok = false;
    const QString chosen = QInputDialog::getItem(this, tr("Arc-Flash Labels"), tr("Label stock:"),
                                                 stocks, 0, false, &ok);
    if (!ok)
        return;
    const LabelStock stock = *labelStockByName(labelStockNames().at(stocks.indexOf(chosen)));
    const auto path = askSavePath(this, tr("Export arc-flash labels"), baseName() + "-labels.pdf",
                                  tr("PDF (*.pdf)"), ".pdf");
    if (path.isEmpty())
        return;
    m_doc.waitForCheck();
    const auto r =
        writeLabelsPdf(path, m_doc.result(), stock, QDate::currentDate().toString(Qt::ISODate));
    if (!r.error.isEmpty())
        plainMessage(this, QMessageBox::Warning, tr("Export failed"), r.error);
    else
        statusBar()->showMessage(
            tr("Wrote %1 (%2 labels on %3 pages)").arg(path).arg(r.labels).arg(r.pages), 8000);
}

} // namespace lineward::ui
