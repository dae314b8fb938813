// The main window: Sheet in the centre, Findings dock, status counts, file and help menus.
#pragma once

#include "document.h"

#include <QMainWindow>

class QGraphicsView;
class QLabel;

namespace lineward::ui {

class SheetScene;
class FindingsPanel;

/// One window per open drawing.
class MainWindow : public QMainWindow {
    Q_OBJECT
public:
    explicit MainWindow(std::shared_ptr<const Tables> tables, QWidget* parent = nullptr);
    Document& document() { return m_doc; }
    SheetScene* scene() const { return m_scene; }
    QGraphicsView* view() const { return m_view; }
    FindingsPanel* findings() const { return m_findings; }

    /// Opens a file; shows a message box on failure unless `quiet`. Returns the error text.
    QString openFile(const QString& path, bool quiet = false);

private:
    void buildMenus();
    void refreshStatus();
    void locate(PartId id);
    void showAbout();
    void zoomBy(qreal factor);

    Document m_doc;
    SheetScene* m_scene;
    QGraphicsView* m_view;
    FindingsPanel* m_findings;
    QLabel* m_counts;
};

} // namespace lineward::ui
