// Document: file I/O and re-checking go through the core only. Small drawings are checked at
// once; large ones on a worker thread, and a result older than the newest edit is dropped.
#include "document.h"

#include "io/drawing_file.h"
#include "rules/rule_catalog.h"

#include <QCoreApplication>
#include <QEventLoop>
#include <QFileInfo>
#include <QThread>
#include <QTimer>
#include <spdlog/spdlog.h>
#include <thread>
#include <unordered_set>
#include <utility>

namespace lineward::ui {

namespace {
// The check never ends the program, on the GUI thread or a worker: an exception that escapes
// the core (which already turns a failing rule family into a finding) becomes a finding too.
// A result holding only the finding that says the check stopped, and why.
std::shared_ptr<const CheckResult> stoppedCheck(std::shared_ptr<const Drawing> d,
                                                const Tables& tables, quint64 generation,
                                                const std::string& why) {
    spdlog::error("check failed: {}", why);
    auto r = std::make_shared<CheckResult>();
    r->drawing = std::move(d);
    r->tables = &tables;
    r->generation = generation;
    r->report.findings.push_back(makeFinding("check.incomplete", {}, "the check stopped: " + why));
    r->report.openCounts[static_cast<std::size_t>(Severity::Violation)] = 1;
    return r;
}

std::shared_ptr<const CheckResult> checkSafely(std::shared_ptr<const Drawing> d,
                                               const Tables& tables, quint64 generation) {
    try {
        return runCheck(d, tables, generation);
    } catch (const std::exception& e) {
        return stoppedCheck(std::move(d), tables, generation, e.what());
    } catch (...) {
        // Not a std::exception: still never let it end a worker thread (std::terminate).
        return stoppedCheck(std::move(d), tables, generation, "an unknown error");
    }
}

// A drawing's own path is kept absolute: the recovery slot records it, and a recovered drawing
// opened from another folder must save to the file it came from, not to a namesake there.
QString absolute(const QString& path) {
    return path.isEmpty() ? path : QFileInfo(path).absoluteFilePath();
}

} // namespace

Document::Document(std::shared_ptr<const Tables> tables, QObject* parent)
    : QObject(parent), m_tables(std::move(tables)),
      m_result(checkSafely(std::make_shared<const Drawing>(), *m_tables, 0)) {
    connect(&m_undo, &QUndoStack::cleanChanged, this, &Document::modifiedChanged);
    startCheck();
}

Document::~Document() {
    while (m_running.load() > 0)
        QThread::msleep(5); // let a worker finish before the tables and this object go
}

QString Document::open(const QString& path) {
    auto loaded = io::loadDrawing(path.toStdString());
    if (!loaded)
        return QString::fromStdString(loaded.error->text());
    reset(std::move(*loaded.drawing), absolute(path));
    spdlog::info("opened {}", path.toStdString());
    return {};
}

QString Document::saveAs(const QString& path) {
    if (auto why = io::saveDrawing(m_drawing, path.toStdString()))
        return QString::fromStdString(*why);
    m_path = absolute(path);
    m_recovered = false;
    m_undo.setClean();
    emit modifiedChanged();
    spdlog::info("saved {}", path.toStdString());
    return {};
}

void Document::replaceDrawing(Drawing drawing, const QString& path) {
    m_drawing = std::move(drawing);
    m_path = path;
    m_recovered = false;
    m_undo.clear();
    emit drawingReset();
    emit modifiedChanged();
}

void Document::reset(Drawing drawing, const QString& path) {
    replaceDrawing(std::move(drawing), path);
    startCheck();
}

void Document::resetRecovered(Drawing drawing, const QString& originalPath) {
    reset(std::move(drawing), absolute(originalPath));
    m_recovered = true;
    emit modifiedChanged();
}

void Document::resetChecked(std::shared_ptr<const CheckResult> result) {
    ++m_generation; // any check still running is older than this result
    m_result = result;
    replaceDrawing(*result->drawing, QString());
    emit reportChanged();
}

void Document::addPart(const Part& part) {
    m_drawing.addPart(part);
    emit partAdded(part.id);
    changed();
}

void Document::removePart(PartId id) {
    // Wires on the part go with it; the command that removes a part restores them itself.
    std::vector<WireId> wires;
    for (const auto& w : m_drawing.wires())
        if (w.a.part == id || w.b.part == id)
            wires.push_back(w.id);
    for (auto w : wires)
        removeWire(w);
    m_drawing.removePart(id);
    emit partRemoved(id);
    emit reviewChanged();
    emit bucketsChanged();
    changed();
}

void Document::replacePart(const Part& part) {
    if (Part* p = m_drawing.part(part.id)) {
        *p = part;
        emit partChanged(part.id);
        changed();
    }
}

void Document::addWire(const Wire& wire) {
    m_drawing.addWire(wire);
    emit wireAdded(wire.id);
    changed();
}

void Document::removeWire(WireId id) {
    if (m_drawing.removeWire(id)) {
        emit wireRemoved(id);
        changed();
    }
}

void Document::addBucket(const Bucket& bucket) {
    m_drawing.addBucket(bucket);
    emit bucketsChanged();
    changed();
}

void Document::removeBucket(BucketId id) {
    m_drawing.removeBucket(id);
    emit bucketsChanged();
    changed();
}

void Document::replaceBucket(const Bucket& bucket) {
    m_drawing.updateBucket(bucket);
    emit bucketsChanged();
    changed();
}

void Document::addParts(const std::vector<Part>& parts) {
    m_drawing.addParts(parts);
    for (const auto& p : parts)
        emit partAdded(p.id);
    changed();
}

void Document::removeParts(const std::vector<PartId>& ids) {
    std::unordered_set<std::uint32_t> gone;
    for (auto id : ids)
        gone.insert(id.value);
    std::vector<WireId> wires;
    for (const auto& w : m_drawing.wires())
        if (gone.count(w.a.part.value) || gone.count(w.b.part.value))
            wires.push_back(w.id);
    removeWires(wires);
    for (const auto& p : m_drawing.removeParts(ids))
        emit partRemoved(p.id);
    emit reviewChanged(); // their comments and places in acceptances went with them
    emit bucketsChanged();
    changed();
}

void Document::addWires(const std::vector<Wire>& wires) {
    m_drawing.addWires(wires);
    for (const auto& w : wires)
        emit wireAdded(w.id);
    changed();
}

void Document::removeWires(const std::vector<WireId>& ids) {
    for (const auto& w : m_drawing.removeWires(ids))
        emit wireRemoved(w.id);
    changed();
}

void Document::replaceBuckets(const std::vector<Bucket>& buckets) {
    m_drawing.updateBuckets(buckets);
    emit bucketsChanged();
    changed();
}

void Document::setSheet(const SheetInfo& sheet) {
    m_drawing.sheet = sheet;
    emit sheetChanged();
    changed();
}

void Document::setReview(const std::vector<Accepted>& accepted,
                         const std::vector<Comment>& comments) {
    m_drawing.accepted() = accepted;
    m_drawing.comments() = comments;
    emit reviewChanged();
    changed();
}

void Document::changed() {
    // Several edits of one command land in one check: queue it for the event loop.
    const quint64 gen = ++m_generation;
    QTimer::singleShot(0, this, [this, gen] {
        if (gen == m_generation)
            startCheck();
    });
}

void Document::startCheck() {
    const quint64 gen = ++m_generation;
    auto copy = std::make_shared<const Drawing>(m_drawing);
    if (m_drawing.parts().size() < kBackgroundParts) {
        m_lastOffThread = false;
        finishCheck(gen, checkSafely(std::move(copy), *m_tables, gen));
        return;
    }
    auto tables = m_tables;
    ++m_running;
    std::thread([this, copy, tables, gen] {
        auto r = checkSafely(copy, *tables, gen);
        QMetaObject::invokeMethod(
            this,
            [this, gen, r = std::move(r)]() mutable {
                if (gen == m_generation)
                    m_lastOffThread = true;
                finishCheck(gen, std::move(r));
            },
            Qt::QueuedConnection);
        --m_running;
    }).detach();
}

void Document::finishCheck(quint64 generation, std::shared_ptr<const CheckResult> result) {
    if (generation != m_generation)
        return; // a newer edit is being checked; this result is stale
    auto previous = std::exchange(m_result, std::move(result));
    emit reportChanged();
    // A large drawing's result takes milliseconds to free (its copy of the drawing, network,
    // studies, findings): free it on a worker instead of before the Sheet's repaint. Only
    // when nothing else holds it; the destructor waits for that worker as for a check.
    if (m_lastOffThread && previous.use_count() == 1) {
        ++m_running;
        std::thread([this, old = std::move(previous)]() mutable {
            old.reset();
            --m_running;
        }).detach();
    }
}

void Document::waitForCheck() {
    QCoreApplication::processEvents();
    QEventLoop loop;
    for (int i = 0; i < 2000 && (m_running.load() > 0); ++i) {
        loop.processEvents(QEventLoop::AllEvents, 10);
        QThread::msleep(2);
    }
    QCoreApplication::processEvents();
}

} // namespace lineward::ui
