// The Import Load List preview: the core plans the buckets (planBuckets, the same function as
// `lineward-cli new`); this dialog only shows the plan as plain text and lets the user choose
// the bus.
#include "import_loads_dialog.h"

#include "check/check.h"
#include "guard.h"
#include "model/ratings.h"
#include "plain_text.h"
#include "report/report_format.h"
#include "util/trace.h"

#include <QComboBox>
#include <QDialogButtonBox>
#include <QFormLayout>
#include <QHeaderView>
#include <QLabel>
#include <QPushButton>
#include <QTableWidget>
#include <QVBoxLayout>
#include <map>

namespace lineward::ui {

namespace {

QString q(const std::string& s) {
    return QString::fromStdString(s);
}

// The proposed bucket in one line, from the plan's own parts and proposal.
QString bucketText(const PlannedBucket& b) {
    QStringList parts;
    for (const auto& p : b.parts) {
        switch (p.kind) {
        case PartKind::Breaker:
            parts << q(p.tag + " " + fmt(BreakerRatings::of(p).tripA, 0) + " A");
            break;
        case PartKind::InstBreaker:
            parts << q(p.tag + " set " + fmt(InstBreakerRatings::of(p).pickupA, 0) + " A");
            break;
        case PartKind::Fuse:
            parts << q(p.tag + " " + fmt(FuseRatings::of(p).amps, 0) + " A");
            break;
        case PartKind::Contactor:
            parts << q(p.tag + " NEMA " + b.proposal.nemaSize);
            break;
        case PartKind::Vfd: {
            const auto v = VfdRatings::of(p);
            parts << q(p.tag + " drive " + fmt(v.outputA) + " A out, " + fmt(v.inputA) + " A in");
            break;
        }
        case PartKind::SoftStarter:
            parts << q(p.tag + " soft starter " + fmt(SoftStarterRatings::of(p).amps, 0) + " A");
            break;
        case PartKind::Overload:
            parts << q(p.tag + " " + fmt(b.proposal.overloadSettingA) + " A class " +
                       b.proposal.tripClass);
            break;
        case PartKind::Cable:
            parts << q(p.tag + " " + b.proposal.conductorSize +
                       (b.proposal.egcSize.empty() ? "" : ", EGC " + b.proposal.egcSize));
            break;
        default:
            break;
        }
    }
    return q("FLC " + fmt(b.proposal.flc.amps) + " A: ") + parts.join(QStringLiteral("; "));
}

} // namespace

ImportLoadsDialog::ImportLoadsDialog(const Document& doc, const QString& fileName, LoadList list,
                                     std::vector<PartId> buses, PartId preferred, QWidget* parent)
    : QDialog(parent), m_doc(doc), m_list(std::move(list)), m_buses(std::move(buses)) {
    setObjectName("importLoadsDialog");
    setWindowTitle(tr("Import Load List — %1").arg(fileName));
    auto* layout = new QVBoxLayout(this);
    auto* form = new QFormLayout;
    m_bus = new QComboBox(this);
    m_bus->setObjectName("targetBus");
    for (PartId id : m_buses)
        m_bus->addItem(q(doc.drawing().part(id)->tag));
    const auto at = std::find(m_buses.begin(), m_buses.end(), preferred);
    m_bus->setCurrentIndex(at == m_buses.end() ? 0 : static_cast<int>(at - m_buses.begin()));
    form->addRow(tr("Add the buckets to bus"), m_bus);
    layout->addLayout(form);
    m_table = new QTableWidget(0, 4, this);
    m_table->setObjectName("importPreview");
    m_table->setHorizontalHeaderLabels(
        {tr("Line"), tr("Tag"), tr("Result"), tr("Proposed bucket, or why the row is refused")});
    m_table->setEditTriggers(QAbstractItemView::NoEditTriggers);
    m_table->verticalHeader()->hide();
    m_table->horizontalHeader()->setStretchLastSection(true);
    m_table->setWordWrap(true);
    layout->addWidget(m_table, 1);
    m_notes = new QLabel(this);
    m_notes->setObjectName("importNotes");
    m_notes->setTextFormat(Qt::PlainText); // text from the file is never rich text
    m_notes->setWordWrap(true);
    layout->addWidget(m_notes);
    auto* caution = new QLabel(q(kSafetyCaution), this);
    caution->setTextFormat(Qt::PlainText);
    caution->setWordWrap(true);
    layout->addWidget(caution);
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Cancel, this);
    m_import = buttons->addButton(tr("Import"), QDialogButtonBox::AcceptRole);
    m_import->setObjectName("importButton");
    connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    layout->addWidget(buttons);
    connect(m_bus, &QComboBox::currentIndexChanged, this,
            guarded(this, tr("Import Load List"), [this] { replan(); }));
    resize(900, 480);
    replan();
}

PartId ImportLoadsDialog::bus() const {
    const int i = m_bus->currentIndex();
    return i >= 0 && i < static_cast<int>(m_buses.size()) ? m_buses[i] : PartId();
}

void ImportLoadsDialog::replan() {
    m_plan = {};
    QStringList notes;
    for (const auto& n : m_list.notes)
        notes << q(n);
    if (bus().valid()) {
        const auto duty = bucketDutyKa(m_doc.result(), bus());
        if (!duty)
            notes << tr("The available fault at this bus is not known; the new buckets are "
                        "rated 65 kA. Check their interrupting ratings and SCCR.");
        m_plan =
            planBuckets(m_doc.drawing(), bus(), m_list.rows, duty.value_or(65), m_doc.tables());
        for (const auto& b : m_plan.buckets)
            for (const auto& n : b.notes)
                notes << q(n);
    }
    m_notes->setText(notes.join('\n'));
    m_import->setEnabled(!m_plan.buckets.empty());
    const auto n = static_cast<int>(m_plan.buckets.size());
    m_import->setText(n == 0   ? tr("Import")
                      : n == 1 ? tr("Import 1 Bucket")
                               : tr("Import %1 Buckets").arg(n));
    fillTable();
}

void ImportLoadsDialog::fillTable() {
    // Every row of the file, in line order: planned buckets and refusals alike.
    std::map<int, QStringList> rows;
    for (const auto& b : m_plan.buckets) {
        const Part& motor = b.parts.back();
        rows[b.line] = {QString::number(b.line), q(motor.tag),
                        tr("adds bucket %1").arg(q(b.bucket.tag)), bucketText(b)};
    }
    auto refuse = [&](const LoadListIssue& i) {
        rows[i.line] = {QString::number(i.line), QString(),
                        tr("refused at line %1, column %2").arg(i.line).arg(i.column), q(i.reason)};
    };
    for (const auto& i : m_list.refused)
        refuse(i);
    for (const auto& i : m_plan.refused)
        refuse(i);
    m_table->setRowCount(static_cast<int>(rows.size()));
    int r = 0;
    for (const auto& [line, cells] : rows) {
        for (int c = 0; c < cells.size(); ++c) {
            auto* item = new QTableWidgetItem(cells[c]); // items show plain text
            item->setToolTip(plainToolTip(cells[c]));
            m_table->setItem(r, c, item);
        }
        ++r;
    }
    for (int c = 0; c < 3; ++c)
        m_table->resizeColumnToContents(c);
    if (isVisible())
        m_table->resizeRowsToContents(); // the last column wraps long reasons
}

void ImportLoadsDialog::showEvent(QShowEvent* e) {
    QDialog::showEvent(e);
    // Row heights follow the wrapped last column, whose width is known once the dialog is laid
    // out.
    m_table->resizeRowsToContents();
}

} // namespace lineward::ui
