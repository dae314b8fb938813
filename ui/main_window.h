// The main window: Sheet in the centre; Parts, Inspector, Findings and Schedules docks; file,
// edit, view and help menus; autosave and recent files.
#pragma once

#include "document.h"
#include "recovery.h"

#include <QMainWindow>

class QDockWidget;
class QLabel;
class QMenu;
class QTimer;

namespace lineward::ui {

class SheetScene;
class SheetView;
class FindingsPanel;
class Inspector;
class PartsPalette;
class SchedulesPanel;
class CurvesPanel;
class ChangesPanel;
class ReviewPanel;
class CompareMark;
class AddBucketDialog;
struct SubmittalOptions;

/// One window per open drawing.
class MainWindow : public QMainWindow {
    Q_OBJECT
public:
    explicit MainWindow(std::shared_ptr<const Tables> tables, QWidget* parent = nullptr);
    ~MainWindow() override;
    Document& document() { return m_doc; }
    SheetScene* scene() const { return m_scene; }
    SheetView* view() const { return m_view; }
    FindingsPanel* findings() const { return m_findings; }
    Inspector* inspector() const { return m_inspector; }
    CurvesPanel* curves() const { return m_curves; }

    /// Takes a drawing left in the recovery folder by a window that did not close: it opens
    /// modified, under its own file's name, and autosaves on into the same slot.
    void adoptRecovered(Drawing drawing, const QString& slotPath, const QString& originalPath);
    /// Opens a file; shows a message box on failure unless `quiet`. Returns the error text.
    QString openFile(const QString& path, bool quiet = false);
    /// Saves to `path` (atomic); returns the error text.
    QString saveTo(const QString& path);

    // User actions, also driven by the tests.
    PartId placePart(PartKind kind, QPointF at);
    void connectTerminals(WireEnd a, WireEnd b);
    void deleteSelection();
    void rotateSelection();
    void copySelection();
    void paste();
    void groupSelectionAsBucket();
    /// File → Import Load List…: asks for the list, previews it for a bus, adds its buckets.
    void importLoadList();
    /// Edit → Add Bucket…: one sized bucket on `bus`, or on the selected (or first) MCC or
    /// switchboard bus when none is given.
    void addBucket(PartId bus = {});
    /// Edit → Save Bucket as Template…: the selected part's bucket into the bucket library.
    void saveBucketAsTemplate();
    /// Edit → Insert Bucket from Library…: a template, sized again for `bus` (or the selected
    /// or first MCC bus) in the Add Bucket dialog.
    void insertBucketFromLibrary(PartId bus = {});
    void printPreview();
    void printSubmittal();
    /// File → Arc-Flash Labels…: asks for the label stock and a PDF path, writes the labels.
    void exportArcFlashLabels();
    /// Applies a finding's proposed fix as one edit, keeping the selection and the view;
    /// returns the refusal text, if any.
    QString applyFix(const Finding& f);
    /// Compare mode (File → Compare With…): the open drawing against the older revision in
    /// `path`; returns the reason when that file cannot be read.
    QString compareWith(const QString& path);
    /// Leaves compare mode: the Changes panel and the Sheet's marks go.
    void leaveCompare();
    bool comparing() const { return m_compareBase != nullptr; }
    ChangesPanel* changes() const { return m_changes; }
    ReviewPanel* review() const { return m_review; }
    /// Where autosave writes this window's recovery copy.
    QString recoveryPath() const;
    /// Writes the recovery copy now (the autosave timer calls this every minute).
    void autosave();

protected:
    void closeEvent(QCloseEvent* e) override;
    void dragEnterEvent(QDragEnterEvent* e) override;
    void dropEvent(QDropEvent* e) override;

private:
    void buildActions();
    void buildFileMenu();
    void buildExportMenu(QMenu* exportMenu);
    /// The drawing's file name without its suffix ("untitled" before the first save).
    QString baseName() const;
    void buildEditMenu();
    void buildViewMenu();
    void refreshStatus();
    void refreshTitle();
    void locate(PartId id);
    void showAbout();
    void editTitleBlock();
    bool maybeSave();
    void addRecent(const QString& path);
    void rebuildRecentMenu();
    void selectionChanged();
    /// The bucket entries of a part's menu (an MCC or switchboard bus only).
    void addBucketActions(QMenu& menu, PartId id);
    /// The bus a new bucket goes on: `preferred` if it takes buckets, else the selected one,
    /// else the first MCC bus; nothing (and the user told) when there is none.
    PartId bucketBus(PartId preferred);
    void placeBucketFrom(AddBucketDialog& dialog);
    void buildCompare();
    void buildReview();
    /// Accept… : asks for the reviewer's name (once) and the note, then records the acceptance.
    void acceptFinding(const Finding& f);
    /// Withdraws every acceptance that covers the finding.
    void withdrawAcceptance(const Finding& f);
    /// Asks for the comment's text and pins it to the part.
    void addComment(PartId part);
    /// The part's right-click menu: Accept… or Withdraw for each of its findings, Add Comment….
    void showPartMenu(PartId id, QPoint globalPos);
    void addCompareActions(QMenu* file);
    void refreshCompare();
    void clearCompareMarks();
    /// The Submittal flags the parts changed since the compared revision (compare mode: the
    /// file the person picked), else since the drawing as issued at the last revision before
    /// the newest that kept one (Revision::file). Returns what was flagged against, or why a
    /// recorded revision could not be used, for the status line.
    QString flagRevisions(SubmittalOptions& o) const;
    /// After a Submittal PDF: saves the drawing as issued beside it and records that file in the
    /// newest revision row (one undoable edit), so the next revision's Submittal can flag what
    /// changed since. Returns the reason it could not, or "" (also where there is no revision).
    QString keepIssuedDrawing(const QString& pdfPath);
    /// The Submittal's CHECKED name: the drawing's checked_by, else the reviewer's name from the
    /// settings (whoever prints the checked drawing), else none.
    QString checkedByForSubmittal() const;

    Document m_doc;
    SheetScene* m_scene;
    SheetView* m_view;
    FindingsPanel* m_findings;
    Inspector* m_inspector;
    PartsPalette* m_palette;
    SchedulesPanel* m_schedules;
    CurvesPanel* m_curves;
    QLabel* m_counts;
    QMenu* m_recentMenu = nullptr;
    QTimer* m_autosave;
    std::unique_ptr<RecoverySlot> m_recovery;
    // compare mode
    std::shared_ptr<const CheckResult> m_compareBase; ///< the older revision's check
    QString m_compareFile;
    ChangesPanel* m_changes = nullptr;
    QDockWidget* m_changesDock = nullptr;
    std::vector<CompareMark*> m_compareMarks; ///< owned by the scene
    QAction* m_leaveCompareAction = nullptr;
    ReviewPanel* m_review = nullptr;
};

/// At start-up: offers each drawing that windows which did not close left in the recovery
/// folder (the first in `first`, others in new windows); an unreadable one is reported with
/// its located reason and set aside, never deleted.
void offerRecovery(MainWindow& first);

/// Mime type of Lineward parts on the clipboard (our JSON file format).
inline constexpr const char* kClipboardMime = "application/x-lineward";

} // namespace lineward::ui
