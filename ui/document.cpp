// Document: file I/O and re-checking go through the core only.
#include "document.h"

#include "io/drawing_file.h"

#include <spdlog/spdlog.h>

namespace lineward::ui {

Document::Document(std::shared_ptr<const Tables> tables, QObject* parent)
    : QObject(parent), m_tables(std::move(tables)) {
    recheck();
}

QString Document::open(const QString& path) {
    auto loaded = io::loadDrawing(path.toStdString());
    if (!loaded)
        return QString::fromStdString(loaded.error->text());
    m_drawing = std::move(*loaded.drawing);
    m_path = path;
    spdlog::info("opened {}", path.toStdString());
    emit drawingReset();
    recheck();
    return {};
}

QString Document::saveAs(const QString& path) {
    if (auto why = io::saveDrawing(m_drawing, path.toStdString()))
        return QString::fromStdString(*why);
    m_path = path;
    return {};
}

void Document::recheck() {
    m_report = checkDrawing(m_drawing, *m_tables);
    emit reportChanged();
}

} // namespace lineward::ui
