// The Add Bucket dialog: the row is checked and sized by the core (loadRowFrom, planBuckets),
// each value's basis comes from the core (bucketFields), a changed value is checked by the
// part's own validation (changeBucketValue), and the findings come from the one check run on a
// copy of the drawing with the bucket added (findingsWithPlan). Everything is shown as plain
// text.
#include "add_bucket_dialog.h"

#include "check/check.h"
#include "field_text.h"
#include "guard.h"
#include "model/part_defaults.h"
#include "model/ratings.h"
#include "plain_text.h"
#include "report/report_format.h"

#include <QComboBox>
#include <QDialogButtonBox>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QPushButton>
#include <QSignalBlocker>
#include <QSplitter>
#include <QTableWidget>
#include <QVBoxLayout>
#include <cmath>

namespace lineward::ui {

namespace {
QString q(const std::string& s) {
    return QString::fromStdString(s);
}

QTableWidget* makeTable(QWidget* parent, const char* name, const QStringList& headers) {
    auto* t = new QTableWidget(0, static_cast<int>(headers.size()), parent);
    t->setObjectName(name);
    t->setHorizontalHeaderLabels(headers);
    t->verticalHeader()->hide();
    t->horizontalHeader()->setStretchLastSection(true);
    t->setWordWrap(false);
    return t;
}

QTableWidgetItem* cell(const QString& text, bool editable) {
    auto* item = new QTableWidgetItem(text);
    item->setToolTip(plainToolTip(text));
    Qt::ItemFlags f = Qt::ItemIsEnabled | Qt::ItemIsSelectable;
    if (editable)
        f |= Qt::ItemIsEditable;
    item->setFlags(f);
    return item;
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

AddBucketDialog::AddBucketDialog(const Document& doc, PartId bus, QWidget* parent,
                                 const LoadRow* fromTemplate, const QString& templateName)
    : QDialog(parent), m_doc(doc), m_bus(bus) {
    setObjectName("addBucketDialog");
    const Part& b = *doc.drawing().part(bus);
    setWindowTitle(tr("Add Bucket to %1").arg(q(b.tag)));
    auto* layout = new QVBoxLayout(this);
    auto* top = new QHBoxLayout;
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
    top->addLayout(form);
    m_message = new QLabel(this);
    m_message->setObjectName("bucketMessage");
    m_message->setTextFormat(Qt::PlainText);
    m_message->setWordWrap(true);
    m_message->setAlignment(Qt::AlignTop | Qt::AlignLeft);
    top->addWidget(m_message, 1);
    layout->addLayout(top);

    auto* hint = new QLabel(tr("Proposed bucket — double-click a value to change it:"), this);
    layout->addWidget(hint);
    auto* split = new QSplitter(Qt::Vertical, this);
    m_table =
        makeTable(this, "bucketProposal", {tr("Part"), tr("Rating"), tr("Value"), tr("Set by")});
    m_table->setEditTriggers(QAbstractItemView::DoubleClicked | QAbstractItemView::EditKeyPressed |
                             QAbstractItemView::AnyKeyPressed);
    connect(m_table, &QTableWidget::itemChanged, this,
            guarded(this, tr("Changing a value"),
                    [this](QTableWidgetItem* item) { valueEdited(item); }));
    split->addWidget(m_table);
    auto* findingsBox = new QWidget(this);
    auto* fl = new QVBoxLayout(findingsBox);
    fl->setContentsMargins(0, 0, 0, 0);
    m_findingsSummary = new QLabel(findingsBox);
    m_findingsSummary->setObjectName("bucketFindingsSummary");
    m_findingsSummary->setTextFormat(Qt::PlainText);
    fl->addWidget(m_findingsSummary);
    m_findings = makeTable(findingsBox, "bucketFindings",
                           {tr("Severity"), tr("Rule"), tr("Clause"), tr("Finding")});
    m_findings->setEditTriggers(QAbstractItemView::NoEditTriggers);
    fl->addWidget(m_findings);
    split->addWidget(findingsBox);
    split->setStretchFactor(0, 3);
    split->setStretchFactor(1, 2);
    layout->addWidget(split, 1);
    auto* caution = new QLabel(q(kSafetyCaution), this);
    caution->setTextFormat(Qt::PlainText);
    caution->setWordWrap(true);
    layout->addWidget(caution);
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Cancel, this);
    m_place = buttons->addButton(tr("Place"), QDialogButtonBox::AcceptRole);
    m_place->setObjectName("placeBucket");
    m_place->setAutoDefault(false); // Return commits a typed value, it does not place
    connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    layout->addWidget(buttons);
    resize(1000, 720);
    if (fromTemplate)
        startFrom(*fromTemplate, templateName);
    replan();
}

void AddBucketDialog::startFrom(const LoadRow& row, const QString& name) {
    const Part& bus = *m_doc.drawing().part(m_bus);
    const double volts = motorVoltsFor(BusRatings::of(bus).volts);
    const auto oldVolts = row.motor.number(MotorRatings::kVolts);
    const bool sameVolts = oldVolts && std::abs(*oldVolts - volts) < 0.5;
    auto put = [this](const char* key, std::optional<double> v) {
        for (auto& [k, edit] : m_fields)
            if (k == key) {
                QSignalBlocker quiet(edit); // one replan at the end, not one per field
                edit->setText(v ? QString::fromStdString(formatNumber(*v)) : QString());
            }
    };
    put("hp", row.motor.number(MotorRatings::kHp));
    put("kw", row.motor.number(MotorRatings::kKw));
    put("volts", volts);
    // A nameplate current (and locked-rotor current) belongs to the voltage it was read at.
    put("fla", sameVolts ? row.motor.number(MotorRatings::kFla) : std::nullopt);
    put("length_ft", row.lengthFt);
    {
        QSignalBlocker a(m_protection), b(m_starter);
        m_protection->setCurrentText(q(std::string(loadProtectionKey(row.protection))));
        m_starter->setCurrentText(q(std::string(loadStarterKey(row.starter))));
    }
    m_templateMotor = row.motor;
    if (!sameVolts)
        for (auto key : {MotorRatings::kFla, std::string_view("lra")})
            (void)m_templateMotor->set(key, FieldValue{});
    m_templateNote = tr("From template \"%1\": sized again for %2 at %3 V%4.")
                         .arg(name, q(bus.tag))
                         .arg(volts)
                         .arg(sameVolts ? QString()
                                        : tr(" (the template's motor was %1 V: its nameplate "
                                             "FLA and locked-rotor current were dropped)")
                                              .arg(oldVolts.value_or(0)));
}

void AddBucketDialog::replan() {
    const bool hadChanges = !m_plan.buckets.empty() && !m_plan.buckets[0].changed.empty();
    m_plan = {};
    std::vector<std::pair<std::string, std::string>> cells;
    for (const auto& [key, edit] : m_fields)
        cells.emplace_back(key, edit->text().toStdString());
    cells.emplace_back("protection", m_protection->currentText().toStdString());
    cells.emplace_back("starter", m_starter->currentText().toStdString());
    LoadListIssue bad;
    QString message;
    if (auto row = loadRowFrom(cells, bad)) {
        if (m_templateMotor) // the template's other ratings (service factor, design, code ...)
            for (const auto& spec : kindInfo(PartKind::Motor).fields) {
                const std::string_view k = spec.key;
                if (k != MotorRatings::kHp && k != MotorRatings::kKw && k != MotorRatings::kVolts &&
                    k != MotorRatings::kFla)
                    (void)row->motor.set(k, m_templateMotor->value(k));
            }
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
        if (hadChanges)
            message += (message.isEmpty() ? "" : "\n") +
                       tr("The motor changed: the bucket was sized again and the values you "
                          "had changed were dropped.");
    } else {
        message = q(bad.reason);
    }
    if (!m_templateNote.isEmpty())
        message = m_templateNote + (message.isEmpty() ? "" : "\n") + message;
    m_planMessage = message;
    m_message->setText(message);
    m_place->setEnabled(!m_plan.buckets.empty());
    m_shown = m_plan.buckets.empty() ? std::vector<BucketField>{} : bucketFields(m_plan.buckets[0]);
    m_filling = true;
    m_table->setRowCount(static_cast<int>(m_shown.size()));
    for (int r = 0; r < static_cast<int>(m_shown.size()); ++r) {
        const Part& p = m_plan.buckets[0].parts[m_shown[r].partIndex];
        m_table->setItem(r, 0, cell(q(p.tag), false));
        m_table->setItem(r, 1, cell(peopleFieldName(*findField(p.kind, m_shown[r].key)), false));
        m_table->setItem(r, 2, cell(QString(), true));
        m_table->setItem(r, 3, cell(QString(), false));
    }
    m_filling = false;
    fillValues();
    m_table->resizeColumnsToContents();
    refreshFindings();
}

void AddBucketDialog::fillValues() {
    if (m_plan.buckets.empty())
        return;
    // The bases are read again: a changed value says so.
    const auto fields = bucketFields(m_plan.buckets[0]);
    m_filling = true;
    for (int r = 0; r < static_cast<int>(m_shown.size()); ++r) {
        const Part& p = m_plan.buckets[0].parts[m_shown[r].partIndex];
        const FieldSpec& spec = *findField(p.kind, m_shown[r].key);
        const QString value = shownFieldText(spec, p.value(spec.key));
        QString basis = tr("(cleared)");
        for (const auto& f : fields)
            if (f.partIndex == m_shown[r].partIndex && f.key == m_shown[r].key)
                basis = q(f.basis);
        for (auto [c, text] : {std::pair{2, value}, std::pair{3, basis}}) {
            QTableWidgetItem* item = m_table->item(r, c);
            if (item->text() != text) {
                item->setText(text);
                item->setToolTip(plainToolTip(text));
            }
        }
    }
    m_filling = false;
}

void AddBucketDialog::valueEdited(QTableWidgetItem* item) {
    if (m_filling || item->column() != 2 || m_plan.buckets.empty())
        return;
    const int r = item->row();
    if (r < 0 || r >= static_cast<int>(m_shown.size()))
        return;
    PlannedBucket& b = m_plan.buckets[0];
    const BucketField& f = m_shown[r];
    const Part& p = b.parts[f.partIndex];
    const FieldSpec& spec = *findField(p.kind, f.key);
    FieldValue v;
    QString why = parseFieldText(spec, item->text(), v);
    if (why.isEmpty())
        if (auto refused = changeBucketValue(b, f.partIndex, f.key, v))
            why = q(*refused);
    if (!why.isEmpty())
        m_message->setText(tr("Refused: %1: %2").arg(q(p.tag), why));
    else
        m_message->setText(m_planMessage);
    // Written back after the edit has finished: the table is inside its own itemChanged here.
    QMetaObject::invokeMethod(this,
                              guarded(this, tr("Changing a value"),
                                      [this] {
                                          fillValues();
                                          refreshFindings();
                                      }),
                              Qt::QueuedConnection);
}

void AddBucketDialog::refreshFindings() {
    std::vector<Finding> found;
    if (!m_plan.buckets.empty())
        found = findingsWithPlan(m_doc.drawing(), m_plan, m_bus, m_doc.report(), m_doc.tables());
    m_findingsSummary->setText(
        m_plan.buckets.empty() ? QString()
        : found.empty()        ? tr("With this bucket on the bus the check finds nothing on it.")
                        : tr("With this bucket on the bus the check finds %n finding(s):", nullptr,
                             static_cast<int>(found.size())));
    m_findings->setRowCount(static_cast<int>(found.size()));
    for (int r = 0; r < static_cast<int>(found.size()); ++r) {
        const Finding& f = found[r];
        const QStringList texts{q(std::string(severityName(f.severity))), q(f.ruleId), q(f.clause),
                                q(f.message)};
        for (int c = 0; c < 4; ++c)
            m_findings->setItem(r, c, cell(texts[c], false));
    }
    m_findings->resizeColumnsToContents();
}

} // namespace lineward::ui
