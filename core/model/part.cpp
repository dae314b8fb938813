// Part field access and the cross-field checks of each kind.
#include "model/part.h"

#include "model/conductor.h"
#include "model/curve_points.h"

#include <algorithm>
#include <stdexcept>

namespace lineward {

namespace {
const FieldValue kNone{};
} // namespace

Part Part::make(PartKind kind, PartId id, std::string tag) {
    Part p;
    p.id = id;
    p.kind = kind;
    p.tag = std::move(tag);
    for (const auto& f : kindInfo(kind).fields)
        p.values.push_back(f.defaultValue);
    return p;
}

const FieldValue& Part::value(std::string_view key) const {
    auto i = fieldIndex(kind, key);
    if (!i)
        throw std::logic_error("part kind " + std::string(kindInfo(kind).key) + " has no field " +
                               std::string(key));
    return *i < values.size() ? values[*i] : kNone;
}

std::optional<double> Part::number(std::string_view key) const {
    const FieldValue& v = value(key);
    if (auto d = std::get_if<double>(&v))
        return *d;
    // An empty rating with a default reads as its default, as it does once saved and loaded
    // again: one default per rating, the one in the field table.
    if (std::holds_alternative<std::monostate>(v))
        if (auto i = fieldIndex(kind, key))
            if (auto d = std::get_if<double>(&kindInfo(kind).fields[*i].defaultValue))
                return *d;
    return std::nullopt;
}

std::optional<std::string> Part::word(std::string_view key) const {
    if (auto s = std::get_if<std::string>(&value(key)))
        return *s;
    return std::nullopt;
}

bool Part::flag(std::string_view key) const {
    auto b = std::get_if<bool>(&value(key));
    return b && *b;
}

std::optional<std::string> Part::set(std::string_view key, FieldValue v, FieldNaming naming) {
    return set({{key, std::move(v)}}, naming);
}

std::optional<std::string>
Part::set(const std::vector<std::pair<std::string_view, FieldValue>>& changes, FieldNaming naming) {
    Part trial = *this;
    trial.values.resize(kindInfo(kind).fields.size());
    for (const auto& [key, v] : changes) {
        auto i = fieldIndex(kind, key);
        if (!i)
            return std::string(kindInfo(kind).name) + " has no rating '" + std::string(key) + "'";
        const FieldSpec& spec = kindInfo(kind).fields[*i];
        if (auto why = validateField(spec, v, naming))
            return why;
        // Clearing a rating that has a default gives the default back (shown, and saved).
        trial.values[*i] = std::holds_alternative<std::monostate>(v) &&
                                   !std::holds_alternative<std::monostate>(spec.defaultValue)
                               ? spec.defaultValue
                               : v;
    }
    // Refuse only what this change breaks: a part still being filled in may lack other values.
    const auto before = validatePart(*this, naming);
    for (auto& problem : validatePart(trial, naming))
        if (std::find(before.begin(), before.end(), problem) == before.end())
            return problem;
    *this = std::move(trial);
    return std::nullopt;
}

namespace {

std::string nameOf(const Part& p, std::string_view key, FieldNaming naming) {
    const FieldSpec* spec = findField(p.kind, key);
    return spec ? fieldName(*spec, naming) : std::string(key);
}

void oneOf(const Part& p, const FieldAlternative& alt, FieldNaming naming,
           std::vector<std::string>& out) {
    const bool hasA = p.number(alt.first).has_value(), hasB = p.number(alt.second).has_value();
    if (hasA == hasB)
        out.push_back("give exactly one of " + nameOf(p, alt.first, naming) + " and " +
                      nameOf(p, alt.second, naming));
}

void notAbove(const Part& p, std::string_view lo, std::string_view hi, FieldNaming naming,
              std::vector<std::string>& out) {
    auto l = p.number(lo), h = p.number(hi);
    if (l && h && *l > *h)
        out.push_back(nameOf(p, lo, naming) + " " + formatNumber(*l) + " is above " +
                      nameOf(p, hi, naming) + " " + formatNumber(*h));
}

void temperatureColumn(const Part& p, std::string_view key, FieldNaming naming,
                       std::vector<std::string>& out) {
    auto t = p.number(key);
    if (t && *t != 60 && *t != 75 && *t != 90)
        out.push_back(nameOf(p, key, naming) + " must be 60, 75 or 90 °C (got " + formatNumber(*t) +
                      ")");
}

} // namespace

std::vector<std::string> validatePart(const Part& p, FieldNaming naming) {
    std::vector<std::string> out;
    const auto& fields = kindInfo(p.kind).fields;
    if (p.values.size() != fields.size())
        out.push_back("internal: wrong number of ratings");
    for (std::size_t i = 0; i < fields.size() && i < p.values.size(); ++i)
        if (auto why = validateField(fields[i], p.values[i], naming))
            out.push_back(*why);
    if (p.values.size() != fields.size())
        return out;
    for (const auto& alt : kindInfo(p.kind).alternatives)
        oneOf(p, alt, naming, out);
    switch (p.kind) {
    case PartKind::Breaker:
        notAbove(p, "trip_a", "frame_a", naming, out);
        break;
    case PartKind::InstBreaker:
        notAbove(p, "pickup_min_a", "pickup_a", naming, out);
        notAbove(p, "pickup_a", "pickup_max_a", naming, out);
        break;
    case PartKind::Overload:
        notAbove(p, "range_min_a", "setting_a", naming, out);
        notAbove(p, "setting_a", "range_max_a", naming, out);
        break;
    case PartKind::Contactor:
        if (!p.word("nema_size") && !p.number("ac3_a"))
            out.push_back("give nema_size or ac3_a");
        break;
    case PartKind::Cable:
        temperatureColumn(p, "insulation_c", naming, out);
        temperatureColumn(p, "termination_c", naming, out);
        if (auto egc = p.word("egc_size"); egc && !egc->empty() && !isKnownConductorSize(*egc))
            out.push_back("egc_size '" + *egc + "' is not a conductor size");
        if (auto size = p.word("size"); size && !isKnownConductorSize(*size))
            out.push_back("size '" + *size +
                          "' is not a conductor size (write e.g. \"8 AWG\", \"250 kcmil\" or "
                          "\"16 mm2\")");
        break;
    default:
        break;
    }
    if (auto i = fieldIndex(p.kind, "curve_points"); i && *i < p.values.size())
        if (auto text = std::get_if<std::string>(&p.values[*i]); text && !text->empty()) {
            std::vector<CurvePoint> pts;
            if (auto why = parseCurvePoints(*text, pts))
                out.push_back(*why);
        }
    if (p.rotation % 90 != 0 || p.rotation < 0 || p.rotation >= 360)
        out.push_back("rotation must be 0, 90, 180 or 270");
    return out;
}

} // namespace lineward
