// SchedulesPanel: the check result's schedules in model/view tables, refilled after each
// check while shown. Marks and editable cells come from the core's Schedule (which rating a
// cell shows, what the check found about a row); the ui computes nothing.
#include "schedules_panel.h"

#include "field_text.h"
#include "guard.h"
#include "severity_style.h"

#include <QHeaderView>
#include <QLabel>
#include <QPainter>
#include <QPixmap>
#include <QTabWidget>
#include <QTableView>
#include <QVBoxLayout>
#include <array>

namespace lineward::ui {

namespace {

// The Findings list's badge for a severity, as a small icon for the Findings cell.
QPixmap badgeIcon(Severity s) {
    static std::array<QPixmap, 3> icons;
    QPixmap& pm = icons[static_cast<std::size_t>(s)];
    if (pm.isNull()) {
        pm = QPixmap(16, 16);
        pm.fill(Qt::transparent);
        QPainter p(&pm);
        p.setRenderHint(QPainter::Antialiasing);
        paintSeverityBadge(p, s, QPointF(8, 8), 14);
    }
    return pm;
}

constexpr const char* kRefusedStyle = "color: #b23a1e;"; // the Inspector's refusal colour

} // namespace

ScheduleModel::ScheduleModel(const Document& doc, EditHandler onEdit, QObject* parent)
    : QAbstractTableModel(parent), m_doc(doc), m_onEdit(std::move(onEdit)) {}

void ScheduleModel::setSchedule(Schedule s) {
    beginResetModel();
    m_schedule = std::move(s);
    endResetModel();
}

int ScheduleModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : static_cast<int>(m_schedule.rows.size());
}

int ScheduleModel::columnCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : static_cast<int>(m_schedule.headers.size());
}

const ScheduleField* ScheduleModel::fieldAt(const QModelIndex& index) const {
    const auto r = static_cast<std::size_t>(index.row());
    const auto c = static_cast<std::size_t>(index.column());
    if (!index.isValid() || r >= m_schedule.fields.size() || c >= m_schedule.fields[r].size())
        return nullptr;
    const auto& f = m_schedule.fields[r][c];
    if (!f)
        return nullptr;
    const Part* p = m_doc.drawing().part(f->part);
    return p && findField(p->kind, f->key) ? &*f : nullptr;
}

const RowFindings* ScheduleModel::findingsAt(int row) const {
    const auto r = static_cast<std::size_t>(row);
    return r < m_schedule.findings.size() ? &m_schedule.findings[r] : nullptr;
}

QVariant ScheduleModel::data(const QModelIndex& index, int role) const {
    if (!index.isValid())
        return {};
    const auto& row = m_schedule.rows[static_cast<std::size_t>(index.row())];
    const auto c = static_cast<std::size_t>(index.column());
    const RowFindings* found = findingsAt(index.row());
    const bool findingsCell = c + 1 == m_schedule.headers.size() && found;
    switch (role) {
    case Qt::DisplayRole:
        return c < row.size() ? QString::fromStdString(row[c]) : QString();
    case Qt::EditRole: {
        // The value as the Inspector shows it for typing (13.8 kV as 13800), not the cell's text.
        const ScheduleField* f = fieldAt(index);
        if (!f)
            return c < row.size() ? QString::fromStdString(row[c]) : QString();
        const Part& p = *m_doc.drawing().part(f->part);
        const FieldSpec& spec = *findField(p.kind, f->key);
        return shownFieldText(spec, p.value(spec.key));
    }
    case Qt::BackgroundRole:
        // Open findings tint the whole row with the worst severity's colour; accepted ones don't.
        if (found && found->worst) {
            QColor tint = severityColor(*found->worst);
            tint.setAlpha(60);
            return tint;
        }
        return {};
    case Qt::DecorationRole:
        if (findingsCell && found->worst)
            return badgeIcon(*found->worst);
        return {};
    case Qt::ToolTipRole:
        if (findingsCell && found->worst)
            return tr("Worst open finding: %1 (%2 of %3 open)")
                .arg(severityLabel(*found->worst))
                .arg(found->worstCount)
                .arg(found->open);
        if (const ScheduleField* f = fieldAt(index)) {
            const Part& p = *m_doc.drawing().part(f->part);
            return tr("%1 of %2: double-click or F2 to change it")
                .arg(peopleFieldName(*findField(p.kind, f->key)), QString::fromStdString(p.tag));
        }
        return {};
    default:
        return {};
    }
}

QVariant ScheduleModel::headerData(int section, Qt::Orientation o, int role) const {
    if (role != Qt::DisplayRole)
        return {};
    if (o == Qt::Vertical)
        return section + 1;
    return section >= 0 && static_cast<std::size_t>(section) < m_schedule.headers.size()
               ? QString::fromStdString(m_schedule.headers[static_cast<std::size_t>(section)])
               : QVariant();
}

Qt::ItemFlags ScheduleModel::flags(const QModelIndex& index) const {
    Qt::ItemFlags f = QAbstractTableModel::flags(index);
    if (fieldAt(index))
        f |= Qt::ItemIsEditable;
    return f;
}

bool ScheduleModel::setData(const QModelIndex& index, const QVariant& value, int role) {
    const ScheduleField* f = role == Qt::EditRole ? fieldAt(index) : nullptr;
    if (!f || !m_onEdit)
        return false;
    // The handler decides; the table changes only when the check after the edit refills it.
    m_onEdit(*f, value.toString());
    return true;
}

SchedulesPanel::SchedulesPanel(Document& doc, QWidget* parent)
    : QWidget(parent), m_doc(doc), m_tabs(new QTabWidget), m_message(new QLabel) {
    setObjectName("schedules");
    m_message->setObjectName("schedulesMessage");
    m_message->setTextFormat(Qt::PlainText); // tags and typed text
    m_message->setWordWrap(true);
    m_message->setStyleSheet(kRefusedStyle);
    m_message->hide(); // shown only with a refusal: an empty line would still take height
    auto* lay = new QVBoxLayout(this);
    lay->setContentsMargins(0, 0, 0, 0);
    lay->addWidget(m_tabs, 1);
    lay->addWidget(m_message);
    connect(&doc, &Document::reportChanged, this,
            guarded(this, tr("Building the schedules"), [this] { refresh(); }));
    connect(&doc, &Document::drawingReset, this, [this] { showMessage({}); });
    refresh();
}

void SchedulesPanel::showEvent(QShowEvent* e) {
    QWidget::showEvent(e);
    if (m_stale && m_onTop)
        runGuarded(this, tr("Building the schedules"), [this] { rebuild(); });
}

void SchedulesPanel::setOnTop(bool onTop) {
    m_onTop = onTop;
    if (m_onTop && m_stale && isVisible())
        runGuarded(this, tr("Building the schedules"), [this] { rebuild(); });
}

void SchedulesPanel::refresh() {
    m_stale = true;
    if (isVisible() && m_onTop)
        rebuild();
}

void SchedulesPanel::editCell(ScheduleField field, const QString& text) {
    const Part* p = m_doc.drawing().part(field.part);
    if (!p)
        return;
    // The Inspector's own reading and validation (field_text.h), and its refusal text.
    FieldChanges changes;
    std::vector<Part> after;
    QString why = typedFieldChanges(p->kind, field.key, text, changes);
    if (why.isEmpty())
        why = changedParts({p}, changes, after);
    if (!why.isEmpty()) {
        showMessage(refusedText(why));
        return;
    }
    showMessage({});
    if (!after.empty())
        emit editRequested(std::move(after),
                           setFieldText(peopleFieldName(*findField(p->kind, field.key)), {p}));
}

void SchedulesPanel::showMessage(const QString& text) {
    m_message->setText(text);
    m_message->setVisible(!text.isEmpty());
}

void SchedulesPanel::rebuild() {
    m_stale = false;
    auto schedules = buildSchedules(m_doc.result());
    for (std::size_t i = 0; i < schedules.size(); ++i) {
        if (i == m_models.size()) { // the first fill makes the tabs; later ones reuse them
            // The edit runs after the cell's editor has closed: it re-checks the drawing and
            // refills this model, which must not happen inside the view's commit of the editor.
            auto onEdit = [this](ScheduleField f, QString text) {
                auto edit = guarded(this, tr("Changing a rating"),
                                    [this, f, text] { editCell(f, text); });
                QMetaObject::invokeMethod(this, [edit] { edit(); }, Qt::QueuedConnection);
            };
            auto* model = new ScheduleModel(m_doc, onEdit, this);
            auto* view = new QTableView;
            view->setModel(model);
            view->setObjectName(QString::fromStdString("schedule_" + schedules[i].name));
            view->setEditTriggers(QAbstractItemView::DoubleClicked |
                                  QAbstractItemView::EditKeyPressed);
            view->verticalHeader()->hide();
            // Widths from the first rows, not every row (a large plant has thousands).
            view->horizontalHeader()->setResizeContentsPrecision(50);
            QString name = QString::fromStdString(schedules[i].name);
            name[0] = name[0].toUpper();
            m_tabs->addTab(view, name);
            m_models.push_back(model);
            m_views.push_back(view);
            m_sized.push_back(false);
        }
        const bool hasRows = !schedules[i].rows.empty();
        m_models[i]->setSchedule(std::move(schedules[i]));
        // Columns fit their contents once; after that the user's widths stay as they are.
        if (hasRows && !m_sized[i]) {
            m_views[i]->resizeColumnsToContents();
            m_sized[i] = true;
        }
    }
}

} // namespace lineward::ui
