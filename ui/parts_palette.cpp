// PartsPalette: one row per kind, in the order power flows (source to load).
#include "parts_palette.h"

#include "part_item.h"
#include "sheet_view.h"

#include <QMimeData>

namespace lineward::ui {

PartsPalette::PartsPalette(QWidget* parent) : QListWidget(parent) {
    setObjectName("partsPalette");
    setDragEnabled(true);
    setDragDropMode(QAbstractItemView::DragOnly);
    setIconSize(QSize(28, 28));
    for (int k = 0; k < kPartKindCount; ++k) {
        const auto& info = kindInfo(static_cast<PartKind>(k));
        auto* item = new QListWidgetItem(
            QString::fromUtf8(info.name.data(), static_cast<int>(info.name.size())), this);
        item->setData(Qt::UserRole, k);
        item->setIcon(PartItem::symbolIcon(static_cast<PartKind>(k), 28));
        item->setToolTip(
            tr("Click, then click on the Sheet to place (Shift-click to place several); or drag"));
    }
    connect(this, &QListWidget::itemClicked, this, [this](QListWidgetItem* item) {
        emit kindChosen(static_cast<PartKind>(item->data(Qt::UserRole).toInt()));
    });
}

QStringList PartsPalette::mimeTypes() const {
    return {kPartKindMime};
}

QMimeData* PartsPalette::mimeData(const QList<QListWidgetItem*>& items) const {
    auto* data = new QMimeData;
    if (!items.isEmpty()) {
        const auto& info =
            kindInfo(static_cast<PartKind>(items.first()->data(Qt::UserRole).toInt()));
        data->setData(kPartKindMime,
                      QByteArray(info.key.data(), static_cast<int>(info.key.size())));
    }
    return data;
}

} // namespace lineward::ui
