// The Add Bucket dialog: the row is checked and sized by the core (loadRowFrom, planBuckets,
// describeBucket), the same as a load-list row; the dialog shows the result as plain text.
#include "add_bucket_dialog.h"

#include "check/check.h"
#include "guard.h"
#include "model/part_defaults.h"
#include "model/ratings.h"
#include "plain_text.h"
#include "report/report_format.h"

#include <QComboBox>
#include <QDialogButtonBox>
#include <QFormLayout>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QPushButton>
#include <QTableWidget>
#include <QVBoxLayout>

namespace lineward::ui {

namespace {
QString q(const std::string& s) {
    return QString::fromStdString(s);
}
} // namespace

QLineEdit* AddBucketDialog::addField(QFormLayout* form, const char* key, const QString& label,
                                     const QString& text) {
    auto* edit = new QLineEdit(text, this);
    edit->setObjectName(QStringLiteral("bucket_") + key);
    form->addRow(label, edit);
    m_fields.emplace_back(key, edit);
    connect(edit, &QLineEdit::textChanged, this,
            guarded(this, tr("Add Bucket"), [this] { replan(); }));
    return edit;
}

AddBucketDialog::AddBucketDialog(const Document& doc, PartId bus, QWidget* parent)
    : QDialog(parent), m_doc(doc), m_bus(bus) {
    setObjectName("addBucketDialog");
    const Part& b = *doc.drawing().part(bus);
    setWindowTitle(tr("Add Bucket to %1").arg(q(b.tag)));
    auto* layout = new QVBoxLayout(this);
    auto* form = new QFormLayout;
    addField(form, "tag", tr("Motor tag"), q(nextTag(doc.drawing(), PartKind::Motor)));
    addField(form, "hp", tr("Rating (hp)"), QString());
    addField(form, "kw", tr("or rating (kW)"), QString());
    addField(form, "volts", tr("Motor voltage (V)"),
             QString::number(motorVoltsFor(BusRatings::of(b).volts)));
    addField(form, "fla", tr("Nameplate FLA (A), optional"), QString());
    m_protection = new QComboBox(this);
    m_protection->setObjectName("bucket_protection");
    m_protection->addItems({"breaker", "inst_breaker", "fuse"});
    form->addRow(tr("Short-circuit device"), m_protection);
    m_starter = new QComboBox(this);
    m_starter->setObjectName("bucket_starter");
    m_starter->addItems({"fvnr", "fvr", "soft", "vfd"});
    form->addRow(tr("Starter"), m_starter);
    addField(form, "length_ft", tr("Cable length (ft)"), QString::number(kLoadListDefaultLengthFt));
    for (auto* box : {m_protection, m_starter})
        connect(box, &QComboBox::currentIndexChanged, this,
                guarded(this, tr("Add Bucket"), [this] { replan(); }));
    layout->addLayout(form);
    m_table = new QTableWidget(0, 3, this);
    m_table->setObjectName("bucketProposal");
    m_table->setHorizontalHeaderLabels({tr("Part"), tr("Proposed"), tr("Set by")});
    m_table->setEditTriggers(QAbstractItemView::NoEditTriggers);
    m_table->verticalHeader()->hide();
    m_table->horizontalHeader()->setStretchLastSection(true);
    layout->addWidget(m_table, 1);
    m_message = new QLabel(this);
    m_message->setObjectName("bucketMessage");
    m_message->setTextFormat(Qt::PlainText);
    m_message->setWordWrap(true);
    layout->addWidget(m_message);
    auto* caution = new QLabel(q(kSafetyCaution), this);
    caution->setTextFormat(Qt::PlainText);
    caution->setWordWrap(true);
    layout->addWidget(caution);
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Cancel, this);
    m_place = buttons->addButton(tr("Place"), QDialogButtonBox::AcceptRole);
    m_place->setObjectName("placeBucket");
    connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    layout->addWidget(buttons);
    resize(860, 560);
    replan();
}

void AddBucketDialog::replan() {
    m_plan = {};
    std::vector<std::pair<std::string, std::string>> cells;
    for (const auto& [key, edit] : m_fields)
        cells.emplace_back(key, edit->text().toStdString());
    cells.emplace_back("protection", m_protection->currentText().toStdString());
    cells.emplace_back("starter", m_starter->currentText().toStdString());
    LoadListIssue bad;
    QString message;
    if (auto row = loadRowFrom(cells, bad)) {
        const auto duty = bucketDutyKa(m_doc.result(), m_bus);
        m_plan = planBuckets(m_doc.drawing(), m_bus, {*row}, duty.value_or(65), m_doc.tables());
        if (!m_plan.refused.empty())
            message = q(m_plan.refused.front().reason);
        else if (!duty)
            message = tr("The available fault at this bus is not known; the bucket is rated "
                         "65 kA. Check its interrupting ratings and SCCR.");
        for (const auto& b : m_plan.buckets)
            for (const auto& n : b.notes)
                message += (message.isEmpty() ? "" : "\n") + q(n);
    } else {
        message = q(bad.reason);
    }
    m_message->setText(message);
    m_place->setEnabled(!m_plan.buckets.empty());
    const auto lines =
        m_plan.buckets.empty() ? std::vector<ProposalLine>{} : describeBucket(m_plan.buckets[0]);
    m_table->setRowCount(static_cast<int>(lines.size()));
    for (int r = 0; r < static_cast<int>(lines.size()); ++r) {
        const QStringList cellsShown{q(lines[r].tag), q(lines[r].value), q(lines[r].basis)};
        for (int c = 0; c < 3; ++c) {
            auto* item = new QTableWidgetItem(cellsShown[c]);
            item->setToolTip(plainToolTip(cellsShown[c]));
            m_table->setItem(r, c, item);
        }
    }
    m_table->resizeColumnToContents(0);
    m_table->resizeColumnToContents(1);
}

} // namespace lineward::ui
