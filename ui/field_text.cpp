// Field text: the one place the ui turns a rating into text and typed text into a rating.
#include "field_text.h"

#include <QCoreApplication>
#include <QLocale>
#include <cmath>

namespace lineward::ui {

namespace {
QString qs(std::string_view s) {
    return QString::fromUtf8(s.data(), static_cast<int>(s.size()));
}
QString tr(const char* s) {
    return QCoreApplication::translate("FieldText", s);
}
} // namespace

QString peopleFieldName(const FieldSpec& spec) {
    return QString::fromStdString(fieldName(spec, FieldNaming::People));
}

QString shownFieldText(const FieldSpec& spec, const FieldValue& v) {
    if (auto d = std::get_if<double>(&v)) {
        double shown = *d * spec.shownScale;
        if (spec.shownScale != 1.0)
            shown = std::round(shown * 1e6) / 1e6; // without binary noise (13.8 kV → 13800)
        return QString::fromStdString(formatNumber(shown));
    }
    if (auto s = std::get_if<std::string>(&v))
        // A choice reads as people say it ("thermal-magnetic"), as the Inspector's lists show.
        return spec.type == FieldType::Choice ? qs(choiceLabel(*s)) : QString::fromStdString(*s);
    if (auto b = std::get_if<bool>(&v))
        return *b ? tr("yes") : tr("no");
    return {};
}

QString parseFieldText(const FieldSpec& spec, const QString& text, FieldValue& out) {
    const QString t = text.trimmed();
    out = FieldValue{};
    if (t.isEmpty())
        return {};
    switch (spec.type) {
    case FieldType::Number:
    case FieldType::Integer: {
        bool ok = false;
        const double d = QLocale::c().toDouble(t, &ok);
        if (!ok)
            return tr("%1: '%2' is not a number").arg(peopleFieldName(spec), t);
        out = d / spec.shownScale;
        return {};
    }
    case FieldType::Flag:
        if (t.compare(tr("yes"), Qt::CaseInsensitive) == 0)
            out = true;
        else if (t.compare(tr("no"), Qt::CaseInsensitive) == 0)
            out = false;
        else
            return tr("%1: type yes or no").arg(peopleFieldName(spec));
        return {};
    case FieldType::Choice:
        for (auto c : spec.choices)
            if (t.compare(qs(c), Qt::CaseInsensitive) == 0 ||
                t.compare(qs(choiceLabel(c)), Qt::CaseInsensitive) == 0) {
                out = std::string(c);
                return {};
            }
        out = t.toStdString(); // the field's validation names the accepted words
        return {};
    case FieldType::Text:
        break;
    }
    out = t.toStdString();
    return {};
}

QString typedFieldChanges(PartKind kind, std::string_view key, const QString& text,
                          FieldChanges& out) {
    const FieldSpec* spec = findField(kind, key);
    if (!spec)
        return tr("%1 has no rating %2").arg(qs(kindInfo(kind).name), qs(key));
    FieldValue v;
    if (QString why = parseFieldText(*spec, text, v); !why.isEmpty())
        return why;
    out.emplace_back(spec->key, v);
    // Giving one of an either-or pair clears the other (the file holds exactly one).
    for (const auto& alt : kindInfo(kind).alternatives) {
        if (alt.first == spec->key)
            out.emplace_back(alt.second, FieldValue{});
        else if (alt.second == spec->key)
            out.emplace_back(alt.first, FieldValue{});
    }
    return {};
}

QString changedParts(const std::vector<const Part*>& parts, const FieldChanges& changes,
                     std::vector<Part>& after) {
    std::vector<Part> out;
    for (const Part* p : parts) {
        Part trial = *p;
        if (auto why = trial.set(changes, FieldNaming::People))
            // All or none: one part refusing the value leaves every part as it was.
            return (parts.size() > 1 ? QString::fromStdString(p->tag) + ": " : QString()) +
                   QString::fromStdString(*why);
        if (!(trial == *p))
            out.push_back(std::move(trial));
    }
    after = std::move(out);
    return {};
}

QString setFieldText(const QString& what, const std::vector<const Part*>& parts) {
    return parts.size() == 1
               ? tr("Set %1 of %2").arg(what, QString::fromStdString(parts.front()->tag))
               : tr("Set %1 of %2 parts").arg(what).arg(parts.size());
}

QString refusedText(const QString& why) {
    return tr("Refused: %1").arg(why);
}

} // namespace lineward::ui
