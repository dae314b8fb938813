// The open drawing in the editor: the core Drawing, its undo stack, its file, and its latest
// check report. Commands change the drawing only through the methods here; each emits a typed
// change event that the Sheet and panels follow.
#pragma once

#include "check/check.h"
#include "model/drawing.h"

#include <QObject>
#include <QString>
#include <QUndoStack>
#include <atomic>
#include <memory>

namespace lineward::ui {

/// Owns the Drawing of one window; re-checks it through the core after every change.
class Document : public QObject {
    Q_OBJECT
public:
    explicit Document(std::shared_ptr<const Tables> tables, QObject* parent = nullptr);
    ~Document() override;

    const Drawing& drawing() const { return m_drawing; }
    /// The newest check result: what every panel, badge and the Submittal read.
    const CheckResult& result() const { return *m_result; }
    std::shared_ptr<const CheckResult> sharedResult() const { return m_result; }
    const CheckReport& report() const { return m_result->report; }
    const Tables& tables() const { return *m_tables; }
    std::shared_ptr<const Tables> sharedTables() const { return m_tables; }
    const QString& filePath() const { return m_path; }
    QUndoStack& undoStack() { return m_undo; }
    /// Unsaved changes: edits since the last save, or a drawing recovered after a crash.
    bool isModified() const { return m_recovered || !m_undo.isClean(); }
    /// True for a drawing brought back from the recovery folder and not yet saved.
    bool isRecovered() const { return m_recovered; }

    /// Loads a file; on failure returns the message (file:line:column: what) and keeps the
    /// current drawing.
    QString open(const QString& path);
    /// Saves atomically; returns the reason on failure (the old file is kept).
    QString saveAs(const QString& path);
    /// Replaces the drawing (New, recovery); clears the undo stack.
    void reset(Drawing drawing, const QString& path = {});
    /// Replaces the drawing by one recovered after a crash: it keeps the name of its own file
    /// (if it had one) and stays modified until saved.
    void resetRecovered(Drawing drawing, const QString& originalPath);
    /// Replaces the drawing by the one a check result was made from and takes that result as
    /// this document's (the Submittal paints a result it was given; nothing is checked again).
    void resetChecked(std::shared_ptr<const CheckResult> result);

    // --- edits, called by commands only ---
    void addPart(const Part& part);
    void removePart(PartId id);
    void replacePart(const Part& part); ///< same id: new values, tag, position or rotation
    void addWire(const Wire& wire);
    void removeWire(WireId id);
    void addBucket(const Bucket& bucket);
    void removeBucket(BucketId id);
    void replaceBucket(const Bucket& bucket);
    // bulk forms: one pass over the drawing for many parts (Select All, then Delete or undo)
    void addParts(const std::vector<Part>& parts);
    void removeParts(const std::vector<PartId>& ids); ///< with every wire on them
    void addWires(const std::vector<Wire>& wires);
    void removeWires(const std::vector<WireId>& ids);
    void replaceBuckets(const std::vector<Bucket>& buckets);
    void setSheet(const SheetInfo& sheet);
    /// The review state: accepted deviations and review comments (each review command swaps
    /// the whole of both, which are short lists).
    void setReview(const std::vector<Accepted>& accepted, const std::vector<Comment>& comments);

    /// Blocks until the newest check has finished (tests; large drawings check off-thread).
    void waitForCheck();
    /// True when the newest check result was made on a worker thread, not the GUI thread.
    bool lastCheckOffGuiThread() const { return m_lastOffThread; }
    /// Drawings at least this large are checked on a worker thread.
    static constexpr std::size_t kBackgroundParts = 600;

signals:
    void drawingReset();
    void partAdded(lineward::PartId id);
    void partRemoved(lineward::PartId id);
    void partChanged(lineward::PartId id);
    void wireAdded(lineward::WireId id);
    void wireRemoved(lineward::WireId id);
    void bucketsChanged();
    void sheetChanged();
    /// Accepted deviations or review comments changed.
    void reviewChanged();
    /// A new check result is available.
    void reportChanged();
    /// The modified state changed (an edit, undo to the saved state, a save).
    void modifiedChanged();

private:
    /// The drawing, its path and a cleared undo stack; the signals that say so. No check.
    void replaceDrawing(Drawing drawing, const QString& path);
    void changed();
    void startCheck();
    void finishCheck(quint64 generation, std::shared_ptr<const CheckResult> result);

    std::shared_ptr<const Tables> m_tables;
    Drawing m_drawing;
    std::shared_ptr<const CheckResult> m_result;
    QString m_path;
    bool m_recovered = false;
    QUndoStack m_undo;
    quint64 m_generation = 0;
    std::atomic<int> m_running{0};
    bool m_lastOffThread = false;
};

} // namespace lineward::ui
