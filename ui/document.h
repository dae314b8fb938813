// The open drawing in the editor: the core Drawing, its file, and its latest check report.
#pragma once

#include "model/drawing.h"
#include "rules/check.h"

#include <memory>

#include <QObject>
#include <QString>

namespace lineward::ui {

/// Owns the Drawing of one window; re-checks it through the core after every change.
class Document : public QObject {
    Q_OBJECT
public:
    explicit Document(std::shared_ptr<const Tables> tables, QObject* parent = nullptr);
    const Tables& tables() const { return *m_tables; }

    const Drawing& drawing() const { return m_drawing; }
    const CheckReport& report() const { return m_report; }
    const QString& filePath() const { return m_path; }

    /// Loads a file; on failure returns the message (file:line:column: what) and keeps the
    /// current drawing.
    QString open(const QString& path);
    /// Saves atomically; returns the reason on failure (the old file is kept).
    QString saveAs(const QString& path);

signals:
    /// The drawing was replaced (opened) — scene items are rebuilt.
    void drawingReset();
    /// The check report changed — badges and lists refresh.
    void reportChanged();

private:
    void recheck();
    std::shared_ptr<const Tables> m_tables;
    Drawing m_drawing;
    CheckReport m_report;
    QString m_path;
};

} // namespace lineward::ui
