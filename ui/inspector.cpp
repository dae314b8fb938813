// Inspector: built once for the selected part, then updated in place. Each editor checks its
// text with the core's own field validation (messages name the rating by label and unit)
// before anything is applied.
#include "inspector.h"

#include "check/check.h"
#include "curves/arc_flash_study.h"
#include "field_text.h"
#include "guard.h"
#include "util/trace.h"

#include <QCheckBox>
#include <QComboBox>
#include <QFormLayout>
#include <QLabel>
#include <QLineEdit>
#include <QScrollArea>
#include <QVBoxLayout>
#include <algorithm>
#include <cmath>

namespace lineward::ui {

namespace {

QString qs(std::string_view s) {
    return QString::fromUtf8(s.data(), static_cast<int>(s.size()));
}

QString peopleName(const FieldSpec& spec) {
    return peopleFieldName(spec);
}

constexpr const char* kRefusedStyle = "color: #b23a1e;";

} // namespace

Inspector::Inspector(Document& doc, QWidget* parent)
    : QWidget(parent), m_doc(doc), m_form(new QFormLayout), m_title(new QLabel),
      m_message(new QLabel), m_arcFlash(new QLabel) {
    setObjectName("inspector");
    m_title->setObjectName("inspectorTitle");
    m_title->setTextFormat(Qt::PlainText); // the tag comes from the file
    QFont bold = m_title->font();
    bold.setBold(true);
    m_title->setFont(bold);
    m_message->setObjectName("inspectorMessage");
    m_message->setTextFormat(Qt::PlainText);
    m_message->setWordWrap(true);
    m_message->setStyleSheet(kRefusedStyle);
    m_form->setFieldGrowthPolicy(QFormLayout::AllNonFixedFieldsGrow);
    auto* inner = new QWidget;
    inner->setLayout(m_form);
    auto* scroll = new QScrollArea;
    scroll->setWidget(inner);
    scroll->setWidgetResizable(true);
    auto* lay = new QVBoxLayout(this);
    lay->addWidget(m_title);
    lay->addWidget(scroll, 1);
    m_arcFlash->setObjectName("inspectorArcFlash");
    m_arcFlash->setTextFormat(Qt::PlainText); // tags come from the file
    m_arcFlash->setWordWrap(true);
    lay->addWidget(m_arcFlash);
    lay->addWidget(m_message);
    connect(&doc, &Document::reportChanged, this, [this] { refreshArcFlash(); });
    setMinimumWidth(360); // narrower than this the form scrolls sideways
    connect(&doc, &Document::partChanged, this, [this](PartId id) {
        if (std::find(m_parts.begin(), m_parts.end(), id) != m_parts.end() && current())
            refreshValues();
    });
    connect(&doc, &Document::partRemoved, this, [this](PartId id) {
        if (std::find(m_parts.begin(), m_parts.end(), id) != m_parts.end())
            showPart(std::nullopt);
    });
    connect(&doc, &Document::drawingReset, this, [this] { showPart(std::nullopt); });
    showPart(std::nullopt);
}

Inspector::~Inspector() {
    for (const Row& row : m_rows)
        for (QObject* w : {static_cast<QObject*>(row.edit), static_cast<QObject*>(row.combo),
                           static_cast<QObject*>(row.check), static_cast<QObject*>(row.pairBox)})
            if (w)
                w->disconnect(this);
}

QSize Inspector::sizeHint() const {
    return {neededWidth(), 600};
}

int Inspector::neededWidth() const {
    // Wide enough for the longest label of any kind beside an editor that shows its longest
    // choice ("thermal-magnetic") in full: measured in the font in use, not a fixed pixel count.
    const QFontMetrics fm(font());
    int label = 0, choice = fm.horizontalAdvance(QStringLiteral("0000.000 (none)"));
    for (int k = 0; k < kPartKindCount; ++k)
        for (const auto& spec : kindInfo(static_cast<PartKind>(k)).fields) {
            label = std::max(label, fm.horizontalAdvance(peopleName(spec)));
            for (auto c : spec.choices)
                choice = std::max(choice, fm.horizontalAdvance(qs(choiceLabel(c))));
        }
    const int comboChrome = 48; // arrow, frame and padding of a combo box (common style sizes)
    const int chrome = 2 * 24 + style()->pixelMetric(QStyle::PM_ScrollBarExtent) + 24;
    return label + choice + comboChrome + chrome;
}

const Part* Inspector::current() const {
    return m_parts.empty() ? nullptr : m_doc.drawing().part(m_parts.front());
}

std::vector<const Part*> Inspector::shown() const {
    std::vector<const Part*> out;
    for (PartId id : m_parts)
        if (const Part* p = m_doc.drawing().part(id))
            out.push_back(p);
    return out;
}

void Inspector::showPart(std::optional<PartId> id) {
    showParts(id ? std::vector<PartId>{*id} : std::vector<PartId>{});
}

void Inspector::showParts(const std::vector<PartId>& ids) {
    std::vector<const Part*> parts;
    for (PartId id : ids)
        if (const Part* p = m_doc.drawing().part(id))
            parts.push_back(p);
    const bool oneKind = !parts.empty() && std::all_of(parts.begin(), parts.end(), [&](auto* p) {
        return p->kind == parts.front()->kind;
    });
    if (oneKind && ids == m_parts && m_formKind == parts.front()->kind) {
        refreshValues();
        return;
    }
    clearForm(); // before the parts change: nothing of the old form may reach the new parts
    m_parts = oneKind ? ids : std::vector<PartId>{};
    refreshArcFlash();
    m_message->clear();
    if (!oneKind) {
        m_title->setText(parts.empty() ? tr("Select a part to see its ratings.")
                                       : tr("%1 parts of different kinds: select parts of one "
                                            "kind to edit them together.")
                                             .arg(parts.size()));
        return;
    }
    buildForm(*parts.front());
}

void Inspector::clearForm() {
    // deleteLater, never delete: this may run inside a signal of one of these editors.
    while (m_form->rowCount() > 0) {
        const auto row = m_form->takeRow(0);
        for (QLayoutItem* item : {row.labelItem, row.fieldItem}) {
            if (!item)
                continue;
            if (QWidget* w = item->widget()) {
                w->disconnect(this);         // hiding a focused editor emits editingFinished
                w->setObjectName(QString()); // gone from the form, though deleted later
                w->hide();
                w->deleteLater();
            }
            delete item;
        }
    }
    m_rows.clear();
    m_formKind.reset();
}

void Inspector::buildForm(const Part& p) {
    m_formKind = p.kind;
    const auto& info = kindInfo(p.kind);
    auto* tag = new QLineEdit;
    tag->setObjectName("field_tag");
    m_rows.push_back(Row{});
    m_rows.back().edit = tag;
    connect(tag, &QLineEdit::editingFinished, this,
            guarded(this, tr("Renaming the part"), [this, tag] {
                if (!tag->isModified())
                    return;
                tag->setModified(false);
                commitTag(tag->text());
            }));
    m_form->addRow(tr("Tag"), tag);
    // Tags are each part's own: several parts cannot share one.
    tag->setEnabled(m_parts.size() == 1);
    for (const auto& spec : info.fields) {
        const FieldAlternative* pair = nullptr;
        for (const auto& alt : info.alternatives)
            if (alt.first == spec.key || alt.second == spec.key)
                pair = &alt;
        if (pair && pair->second == spec.key)
            continue; // edited together with the first of the pair
        Row row;
        row.spec = &spec;
        row.pair = pair;
        m_rows.push_back(row);
        const std::size_t index = m_rows.size() - 1;
        if (pair) {
            QWidget* edit = makePairRow(index);
            m_form->addRow(m_rows[index].pairBox, edit);
            continue;
        }
        QWidget* editor = spec.type == FieldType::Choice ? makeChoiceRow(index)
                          : spec.type == FieldType::Flag ? makeFlagRow(index)
                                                         : makeTextRow(index);
        auto* label = new QLabel(peopleName(spec));
        label->setTextFormat(Qt::PlainText);
        label->setToolTip(qs(spec.help));
        m_form->addRow(label, editor);
    }
    refreshValues();
}

QWidget* Inspector::makeTextRow(std::size_t index) {
    Row& row = m_rows[index];
    auto* edit = new QLineEdit;
    edit->setObjectName("field_" + qs(row.spec->key));
    edit->setToolTip(qs(row.spec->help));
    row.edit = edit;
    connect(edit, &QLineEdit::textEdited, this,
            guarded(this, tr("Checking a rating"), [this, index] { onTextEdited(index); }));
    connect(edit, &QLineEdit::editingFinished, this,
            guarded(this, tr("Changing a rating"), [this, index] { onTextCommitted(index); }));
    return edit;
}

QWidget* Inspector::makeChoiceRow(std::size_t index) {
    Row& row = m_rows[index];
    auto* box = new QComboBox;
    box->setObjectName("field_" + qs(row.spec->key));
    if (!row.spec->required)
        box->addItem(tr("(none)"), QString());
    for (auto c : row.spec->choices)
        box->addItem(qs(choiceLabel(c)), qs(c));
    row.combo = box;
    const std::string_view key = row.spec->key;
    connect(box, &QComboBox::activated, this,
            guarded(this, tr("Changing a rating"), [this, key, box](int i) {
                const QString word = box->itemData(i).toString();
                FieldValue v = word.isEmpty() ? FieldValue{} : FieldValue{word.toStdString()};
                commit({{key, v}}, peopleName(*findField(*m_formKind, key)));
            }));
    return box;
}

QWidget* Inspector::makeFlagRow(std::size_t index) {
    Row& row = m_rows[index];
    auto* check = new QCheckBox;
    check->setObjectName("field_" + qs(row.spec->key));
    row.check = check;
    const std::string_view key = row.spec->key;
    // clicked, not toggled: refreshing the box from the model must not commit.
    connect(check, &QCheckBox::clicked, this,
            guarded(this, tr("Changing a rating"), [this, key](bool on) {
                commit({{key, FieldValue{on}}}, peopleName(*findField(*m_formKind, key)));
            }));
    return check;
}

QWidget* Inspector::makePairRow(std::size_t index) {
    Row& row = m_rows[index];
    const QString name = qs(row.pair->first) + "_or_" + qs(row.pair->second);
    auto* box = new QComboBox;
    box->setObjectName("pair_" + name);
    for (auto key : {row.pair->first, row.pair->second})
        box->addItem(peopleName(*findField(*m_formKind, key)));
    box->setToolTip(tr("Give one of the two; choosing the other clears this one"));
    row.pairBox = box;
    auto* edit = new QLineEdit;
    edit->setObjectName("field_" + name);
    row.edit = edit;
    connect(box, &QComboBox::activated, this,
            guarded(this, tr("Choosing a rating"), [this, index](int i) {
                Row& r = m_rows[index];
                if (r.pairChoice == i)
                    return;
                // Switching the quantity asks for its value; the model changes when it is entered,
                // in one edit that also clears the other.
                r.pairChoice = i;
                r.edit->clear();
                r.edit->setModified(true);
                r.edit->setPlaceholderText(tr("type the %1").arg(r.pairBox->itemText(i)));
                r.edit->setFocus(Qt::OtherFocusReason);
            }));
    connect(edit, &QLineEdit::textEdited, this,
            guarded(this, tr("Checking a rating"), [this, index] { onTextEdited(index); }));
    connect(edit, &QLineEdit::editingFinished, this,
            guarded(this, tr("Changing a rating"), [this, index] { onTextCommitted(index); }));
    return edit;
}

std::string_view Inspector::rowKey(const Row& row) const {
    if (row.pair)
        return row.pairChoice == 0 ? row.pair->first : row.pair->second;
    return row.spec->key;
}

QString Inspector::parseRow(const Row& row, const QString& text,
                            std::vector<std::pair<std::string_view, FieldValue>>& changes) const {
    return typedFieldChanges(*m_formKind, rowKey(row), text, changes);
}

void Inspector::onTextEdited(std::size_t index) {
    const auto parts = shown();
    if (parts.empty() || index >= m_rows.size() || !m_rows[index].spec)
        return;
    Row& row = m_rows[index];
    std::vector<std::pair<std::string_view, FieldValue>> changes;
    QString why = parseRow(row, row.edit->text(), changes);
    std::vector<Part> after;
    if (why.isEmpty())
        why = changedParts(parts, changes, after);
    row.edit->setStyleSheet(why.isEmpty() ? QString() : kRefusedStyle);
    m_message->setText(why);
}

void Inspector::onTextCommitted(std::size_t index) {
    if (index >= m_rows.size())
        return;
    Row& row = m_rows[index];
    QLineEdit* edit = row.edit;
    if (!edit->isModified())
        return; // Enter then focus-out: committed once
    edit->setModified(false);
    std::vector<std::pair<std::string_view, FieldValue>> changes;
    const QString why = parseRow(row, edit->text(), changes);
    if (!why.isEmpty()) {
        m_message->setText(refusedText(why));
        return;
    }
    commit(changes, peopleName(*findField(*m_formKind, rowKey(row))));
}

QString Inspector::commit(const std::vector<std::pair<std::string_view, FieldValue>>& changes,
                          const QString& what) {
    const auto parts = shown();
    if (parts.empty())
        return tr("no part selected");
    std::vector<Part> after;
    if (QString why = changedParts(parts, changes, after); !why.isEmpty()) {
        m_message->setText(refusedText(why));
        return why;
    }
    m_message->clear();
    if (!after.empty())
        emit editRequested(std::move(after), setFieldText(what, parts));
    // The edit may have been refused further up, or changed nothing: show the model's values.
    if (current())
        refreshValues();
    return {};
}

QString Inspector::commitTag(const QString& text) {
    const Part* p = current();
    if (!p || m_parts.size() != 1)
        return tr("select one part to rename it");
    QString why;
    const QString t = text.trimmed();
    if (t.isEmpty())
        why = tr("the tag must not be empty");
    else if (t.size() > 200)
        why = tr("the tag is longer than 200 characters");
    if (!why.isEmpty()) {
        m_message->setText(refusedText(why));
        return why;
    }
    m_message->clear();
    Part trial = *p;
    trial.tag = t.toStdString();
    if (!(trial == *p))
        emit editRequested({trial}, tr("Rename %1 to %2").arg(QString::fromStdString(p->tag), t));
    if (current())
        refreshValues();
    return {};
}

void Inspector::refreshValues() {
    const auto parts = shown();
    if (parts.empty())
        return;
    const Part& p = *parts.front();
    m_title->setText(parts.size() == 1
                         ? QString::fromStdString(p.tag) + " — " + qs(kindInfo(p.kind).name)
                         : tr("%1 parts — %2 (blank: values differ)")
                               .arg(parts.size())
                               .arg(qs(kindInfo(p.kind).name)));
    for (Row& row : m_rows)
        refreshRow(row, parts);
}

void Inspector::refreshRow(Row& row, const std::vector<const Part*>& parts) {
    const Part& p = *parts.front();
    if (!row.spec) { // the tag
        const QString text = parts.size() == 1 ? QString::fromStdString(p.tag) : QString();
        if (!row.edit->isModified() && row.edit->text() != text)
            row.edit->setText(text);
        return;
    }
    if (row.pair && !row.edit->isModified()) {
        if (p.number(row.pair->second) && !p.number(row.pair->first))
            row.pairChoice = 1;
        else if (p.number(row.pair->first))
            row.pairChoice = 0;
        row.pairBox->setCurrentIndex(row.pairChoice);
        row.edit->setPlaceholderText({});
    }
    const FieldSpec& spec = *findField(p.kind, rowKey(row));
    const FieldValue& v = p.value(spec.key);
    // Several parts: a value they do not all share shows blank (the box unchecked, no choice).
    const bool mixed = std::any_of(parts.begin(), parts.end(),
                                   [&](const Part* o) { return !(o->value(spec.key) == v); });
    if (row.edit && !row.edit->isModified()) {
        const QString text = mixed ? QString() : shownFieldText(spec, v);
        if (row.edit->text() != text)
            row.edit->setText(text);
        row.edit->setPlaceholderText(mixed ? tr("(differs)") : QString());
        row.edit->setStyleSheet({});
    } else if (row.combo) {
        const auto* s = std::get_if<std::string>(&v);
        const int i = mixed ? -1 : row.combo->findData(s ? QString::fromStdString(*s) : QString());
        row.combo->setCurrentIndex(i);
    } else if (row.check) {
        row.check->setTristate(mixed);
        if (mixed)
            row.check->setCheckState(Qt::PartiallyChecked);
        else
            row.check->setChecked(std::holds_alternative<bool>(v) && std::get<bool>(v));
    }
}

void Inspector::refreshArcFlash() {
    const Part* p = m_parts.size() == 1 ? current() : nullptr;
    const auto& af = m_doc.result().arcFlash;
    const ArcFlashEquipment* e = nullptr;
    if (p && p->kind == PartKind::Bus && af)
        for (const auto& x : *af)
            if (x.part == p->id && !x.bucket)
                e = &x;
    m_arcFlash->setVisible(e != nullptr);
    if (!e) {
        m_arcFlash->clear();
        return;
    }
    // Every number is the check result's (curves/arc_flash_study.h); nothing is computed here.
    QString text = tr("Arc flash (IEEE 1584-2018): ");
    if (auto cal = e->energyCal()) {
        const auto& g = e->result.governing();
        text += QString::fromStdString(
            fmt(*cal, 2) + " cal/cm² at " + fmt(e->input.workingDistanceMm, 0) + " mm, boundary " +
            fmt(*e->boundaryMm(), 0) + " mm; " + (e->result.reducedGoverns ? "reduced" : "full") +
            " arcing current " +
            fmt(e->result.reducedGoverns ? e->result.currents.iarcMin : e->result.currents.iarc,
                2) +
            " kA cleared by " + (e->clearing ? e->clearing->tag : std::string("no device")) +
            " in " + fmt(g.timeMs / 1000.0, 3) + " s.");
    } else {
        text += QString::fromStdString("not computed: " + e->result.range.outside.front() + ".");
    }
    text += tr(" The study supports, and does not replace, an engineer's assessment.");
    m_arcFlash->setText(text);
}

} // namespace lineward::ui
