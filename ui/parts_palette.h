// Parts: the palette of every part kind; click to place on the next Sheet click, or drag.
#pragma once

#include "model/part_kind.h"

#include <QListWidget>

namespace lineward::ui {

class PartsPalette : public QListWidget {
    Q_OBJECT
public:
    explicit PartsPalette(QWidget* parent = nullptr);

signals:
    void kindChosen(lineward::PartKind kind);

protected:
    QMimeData* mimeData(const QList<QListWidgetItem*>& items) const override;
    QStringList mimeTypes() const override;
};

} // namespace lineward::ui
