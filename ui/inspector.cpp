// Inspector: rebuilt for the selected part; each editor checks its text with the core's own
// field validation before anything is applied.
#include "inspector.h"

#include <QCheckBox>
#include <QComboBox>
#include <QFormLayout>
#include <QLabel>
#include <QLineEdit>
#include <QScrollArea>
#include <QVBoxLayout>

namespace lineward::ui {

Inspector::Inspector(Document& doc, QWidget* parent)
    : QWidget(parent), m_doc(doc), m_form(new QFormLayout), m_title(new QLabel),
      m_message(new QLabel) {
    setObjectName("inspector");
    m_message->setObjectName("inspectorMessage");
    m_message->setWordWrap(true);
    m_message->setTextFormat(Qt::PlainText); // refusals quote the file's text
    m_message->setStyleSheet("color: #b23a1e;");
    auto* inner = new QWidget;
    inner->setLayout(m_form);
    auto* scroll = new QScrollArea;
    scroll->setWidget(inner);
    scroll->setWidgetResizable(true);
    auto* lay = new QVBoxLayout(this);
    lay->addWidget(m_title);
    lay->addWidget(scroll, 1);
    lay->addWidget(m_message);
    connect(&doc, &Document::partChanged, this, [this](PartId id) {
        if (m_part && *m_part == id)
            rebuild();
    });
    connect(&doc, &Document::partRemoved, this, [this](PartId id) {
        if (m_part && *m_part == id)
            showPart(std::nullopt);
    });
    connect(&doc, &Document::drawingReset, this, [this] { showPart(std::nullopt); });
    rebuild();
}

QString Inspector::message() const {
    return m_message->text();
}

void Inspector::showPart(std::optional<PartId> id) {
    m_part = id;
    m_message->clear();
    rebuild();
}

QString Inspector::validate(const std::string& key, const QString& text, Part& trial) const {
    if (key == "tag") {
        if (text.trimmed().isEmpty())
            return tr("tag must not be empty");
        if (text.size() > 200)
            return tr("tag is longer than 200 characters");
        trial.tag = text.trimmed().toStdString();
        return {};
    }
    const FieldSpec* spec = findField(trial.kind, key);
    if (!spec)
        return tr("no rating %1").arg(QString::fromStdString(key));
    FieldValue v;
    const QString t = text.trimmed();
    if (t.isEmpty()) {
        v = FieldValue{};
    } else if (spec->type == FieldType::Number || spec->type == FieldType::Integer) {
        bool ok = false;
        const double d = QLocale::c().toDouble(t, &ok);
        if (!ok)
            return tr("%1: '%2' is not a number")
                .arg(QString::fromUtf8(spec->key.data(), static_cast<int>(spec->key.size())), t);
        v = d;
    } else if (spec->type == FieldType::Flag) {
        v = (t == "true" || t == "yes" || t == "1");
    } else {
        v = t.toStdString();
    }
    if (auto why = trial.set(key, v))
        return QString::fromStdString(*why);
    return {};
}

QString Inspector::commit(const std::string& key, const QString& text) {
    if (!m_part || !m_doc.drawing().part(*m_part))
        return tr("no part selected");
    Part trial = *m_doc.drawing().part(*m_part);
    const QString why = validate(key, text, trial);
    if (!why.isEmpty()) {
        m_message->setText(tr("Refused: %1").arg(why));
        return why;
    }
    m_message->clear();
    if (!(trial == *m_doc.drawing().part(*m_part)))
        emit editRequested(
            trial,
            tr("Set %1 of %2").arg(QString::fromStdString(key), QString::fromStdString(trial.tag)));
    return {};
}

QWidget* Inspector::editorFor(const FieldSpec& spec, const Part& p) {
    const std::string key(spec.key);
    const FieldValue& v = p.value(spec.key);
    if (spec.type == FieldType::Choice) {
        auto* box = new QComboBox;
        if (!spec.required)
            box->addItem(QString());
        for (auto c : spec.choices)
            box->addItem(QString::fromUtf8(c.data(), static_cast<int>(c.size())));
        if (auto s = std::get_if<std::string>(&v))
            box->setCurrentText(QString::fromStdString(*s));
        connect(box, &QComboBox::activated, this,
                [this, key, box] { commit(key, box->currentText()); });
        return box;
    }
    if (spec.type == FieldType::Flag) {
        auto* check = new QCheckBox;
        check->setChecked(std::holds_alternative<bool>(v) && std::get<bool>(v));
        connect(check, &QCheckBox::toggled, this,
                [this, key](bool on) { commit(key, on ? "true" : "false"); });
        return check;
    }
    auto* edit = new QLineEdit;
    if (auto d = std::get_if<double>(&v))
        edit->setText(QString::fromStdString(formatNumber(*d)));
    else if (auto s = std::get_if<std::string>(&v))
        edit->setText(QString::fromStdString(*s));
    edit->setObjectName(QString::fromStdString("field_" + key));
    edit->setToolTip(QString::fromUtf8(spec.help.data(), static_cast<int>(spec.help.size())));
    // Validation as typed: the text turns red with the reason while it would be refused.
    connect(edit, &QLineEdit::textEdited, this, [this, key, edit](const QString& text) {
        Part trial = *m_doc.drawing().part(*m_part);
        const QString why = validate(key, text, trial);
        edit->setStyleSheet(why.isEmpty() ? QString() : "color: #b23a1e;");
        m_message->setText(why.isEmpty() ? QString() : why);
    });
    connect(edit, &QLineEdit::editingFinished, this, [this, key, edit] {
        if (edit->isModified())
            commit(key, edit->text());
        edit->setModified(false);
    });
    return edit;
}

void Inspector::rebuild() {
    while (m_form->rowCount() > 0)
        m_form->removeRow(0);
    const Part* p = m_part ? m_doc.drawing().part(*m_part) : nullptr;
    if (!p) {
        m_title->setText(tr("Select a part to see its ratings."));
        return;
    }
    m_title->setText("<b>" + QString::fromStdString(p->tag).toHtmlEscaped() + "</b> — " +
                     QString::fromUtf8(kindInfo(p->kind).name.data(),
                                       static_cast<int>(kindInfo(p->kind).name.size())));
    auto* tag = new QLineEdit(QString::fromStdString(p->tag));
    tag->setObjectName("field_tag");
    connect(tag, &QLineEdit::editingFinished, this, [this, tag] {
        if (tag->isModified())
            commit("tag", tag->text());
        tag->setModified(false);
    });
    m_form->addRow(tr("Tag"), tag);
    for (const auto& spec : kindInfo(p->kind).fields) {
        QString label = QString::fromUtf8(spec.label.data(), static_cast<int>(spec.label.size()));
        if (!spec.unit.empty())
            label += " (" +
                     QString::fromUtf8(spec.unit.data(), static_cast<int>(spec.unit.size())) + ")";
        m_form->addRow(label, editorFor(spec, *p));
    }
}

} // namespace lineward::ui
