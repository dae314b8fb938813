// Schedules are views of the core's results; every number comes from sizing or the studies.
#include "report/schedules.h"

#include "curves/arc_flash_study.h"
#include "model/ratings.h"
#include "sizing/motor_sizing.h"
#include "studies/study.h"
#include "studies/study_view.h"

#include <algorithm>
#include <array>
#include <charconv>
#include <cmath>
#include <unordered_map>

namespace lineward {

namespace {

std::string num(std::optional<double> v, int decimals = 1) {
    return v ? fmt(*v, decimals) : "";
}

std::string deviceText(const Part* d) {
    if (!d)
        return "";
    switch (d->kind) {
    case PartKind::Breaker:
        return "breaker " + fmt(BreakerRatings::of(*d).tripA, 0) + " A";
    case PartKind::InstBreaker:
        return "inst. breaker " + fmt(InstBreakerRatings::of(*d).pickupA, 0) + " A setting";
    case PartKind::Fuse: {
        const auto fuse = FuseRatings::of(*d);
        return std::string(fuse.type == FuseType::Fast ? "fuse " : "TD fuse ") + fmt(fuse.amps, 0) +
               " A";
    }
    case PartKind::Vfd: {
        const auto v = VfdRatings::of(*d);
        return "drive " + fmt(v.inputA, 1) + " A in, " + fmt(v.outputA, 1) + " A out";
    }
    case PartKind::SoftStarter: {
        const auto ss = SoftStarterRatings::of(*d);
        return "soft starter " + fmt(ss.amps, 0) + " A" +
               (ss.bypass ? ss.bypassA ? ", bypass " + fmt(*ss.bypassA, 0) + " A" : ", bypass"
                          : "");
    }
    default:
        return "";
    }
}

double dropPct(const StudyResults& r, const Network& net, const Flow& flow, const Part& p) {
    const int bus = r.busOf(isTwoTerminal(p.kind) ? flow.loadNode(p.id) : net.nodeOf(p.id, 0));
    if (bus < 0 || r.voltage.empty())
        return std::nan("");
    return (r.originVoltagePu[static_cast<std::size_t>(bus)] -
            std::abs(r.voltage[static_cast<std::size_t>(bus)])) *
           100;
}

// The motor and every part of its branch, each once.
std::vector<const Part*> branchParts(const MotorBranch& b) {
    std::vector<const Part*> parts{b.motor};
    for (const Part* p : b.chain)
        if (std::find(parts.begin(), parts.end(), p) == parts.end())
            parts.push_back(p);
    for (const Part* p : {b.scpd, b.disconnect, b.contactor, b.overload})
        if (p && std::find(parts.begin(), parts.end(), p) == parts.end())
            parts.push_back(p);
    for (const Part* p : b.cables)
        if (std::find(parts.begin(), parts.end(), p) == parts.end())
            parts.push_back(p);
    return parts;
}

std::string faultAt(const StudyResults& r, NodeIndex n) {
    const auto* f = r.faultAtNode(n);
    return f ? fmt(f->ikKa, 2) : "";
}

// Open findings by severity and accepted ones, about one part or a few (a motor's branch).
struct FindingTally {
    std::array<int, 3> open{0, 0, 0};
    int accepted = 0;
    void add(const FindingTally& o) {
        for (std::size_t i = 0; i < 3; ++i)
            open[i] += o.open[i];
        accepted += o.accepted;
    }
    std::string text() const {
        static const char* names[3][2] = {
            {"note", "notes"}, {"caution", "cautions"}, {"violation", "violations"}};
        std::string out;
        auto put = [&](int n, const std::string& what) {
            if (n > 0)
                out += (out.empty() ? "" : ", ") + std::to_string(n) + " " + what;
        };
        for (int i = 2; i >= 0; --i) {
            const auto k = static_cast<std::size_t>(i);
            put(open[k], names[k][open[k] == 1 ? 0 : 1]);
        }
        put(accepted, "accepted");
        return out;
    }
};

// Each finding counts once, for the part it is about (its first part).
std::unordered_map<PartId, FindingTally> tallyFindings(const CheckReport& r) {
    std::unordered_map<PartId, FindingTally> out;
    for (const auto& f : r.findings) {
        if (f.parts.empty())
            continue;
        auto& t = out[f.parts.front()];
        if (f.accepted)
            ++t.accepted;
        else
            ++t.open[static_cast<std::size_t>(f.severity)];
    }
    return out;
}

RowFindings rowFindings(const FindingTally& t) {
    RowFindings out;
    out.accepted = t.accepted;
    for (int i = 2; i >= 0; --i) {
        const int n = t.open[static_cast<std::size_t>(i)];
        out.open += n;
        if (n > 0 && !out.worst) {
            out.worst = static_cast<Severity>(i);
            out.worstCount = n;
        }
    }
    return out;
}

using Fields = std::vector<std::optional<ScheduleField>>;

// Everything a row needs from the check: the study, the part lookups and the findings tally.
struct RowContext {
    const CheckResult& result;
    const Network& net;
    const Flow& flow;
    const StudyResults& r;
    std::unordered_map<PartId, FindingTally> tally;

    FindingTally tallyOf(const std::vector<const Part*>& parts) const {
        FindingTally t;
        for (const Part* p : parts)
            if (auto it = tally.find(p->id); it != tally.end())
                t.add(it->second);
        return t;
    }
    // The row's cells, the rating each shows and its findings (the last cell: their text).
    void push(Schedule& s, std::vector<std::string> cells, Fields fields,
              const std::vector<const Part*>& parts) const {
        const FindingTally t = tallyOf(parts);
        cells.push_back(t.text());
        fields.resize(cells.size());
        s.rows.push_back(std::move(cells));
        s.fields.push_back(std::move(fields));
        s.findings.push_back(rowFindings(t));
    }
};

std::optional<ScheduleField> field(const Part* p, std::string_view key) {
    if (!p)
        return std::nullopt;
    return ScheduleField{p->id, key};
}

// The short-circuit device cell's one rating: what deviceText shows as its amperes.
std::optional<ScheduleField> deviceField(const Part* d) {
    if (!d)
        return std::nullopt;
    switch (d->kind) {
    case PartKind::Breaker:
        return field(d, BreakerRatings::kTripA);
    case PartKind::InstBreaker:
        return field(d, InstBreakerRatings::kPickupA);
    case PartKind::Fuse:
        return field(d, FuseRatings::kAmps);
    default:
        return std::nullopt;
    }
}

void motorRow(Schedule& s, const RowContext& c, const MotorFacts& facts) {
    const MotorBranch& b = facts.branch;
    const Part& m = *b.motor;
    const auto& flc = facts.flc;
    const Part* cable = b.cables.empty() ? nullptr : b.cables.front();
    const double drop = dropPct(c.r, c.net, c.flow, m);
    const auto mr = MotorRatings::of(m);
    const auto cr = cable ? std::optional(CableRatings::of(*cable)) : std::nullopt;
    const auto kr = b.contactor ? std::optional(ContactorRatings::of(*b.contactor)) : std::nullopt;
    const auto ol = b.overload ? std::optional(OverloadRatings::of(*b.overload)) : std::nullopt;
    const auto contactorKey = kr && kr->nemaSize ? ContactorRatings::kNemaSize
                                                 : ContactorRatings::kAc3A;
    c.push(s,
           {m.tag, mr.hp ? fmt(*mr.hp, 2) + " hp" : num(mr.kw, 2) + " kW", fmt(mr.volts, 0),
            flc ? fmt(flc->amps) : "", num(mr.fla), deviceText(b.scpd),
            // The column names what starts the motor: a contactor, else a drive or soft starter.
            kr        ? (kr->nemaSize ? "NEMA " + *kr->nemaSize : num(kr->ac3A, 0) + " A AC-3")
            : b.drive ? deviceText(b.drive)
            : b.softStarter ? deviceText(b.softStarter)
                            : "",
            ol ? fmt(ol->settingA) : "", ol ? ol->tripClass : "",
            cr ? (cr->sets > 1 ? std::to_string(cr->sets) + " × " : "") + cr->size : "",
            cr ? fmt(cr->lengthFt, 0) : "", cr ? cr->egcSize : "",
            std::isnan(drop) ? "" : fmt(drop, 2),
            b.scpd ? faultAt(c.r, c.flow.lineNode(b.scpd->id))
                   : faultAt(c.r, c.net.nodeOf(m.id, 0))},
           {std::nullopt, field(&m, mr.hp || !mr.kw ? MotorRatings::kHp : MotorRatings::kKw),
            field(&m, MotorRatings::kVolts), std::nullopt, field(&m, MotorRatings::kFla),
            // A drive's or soft starter's cell shows two ratings: read-only here, edited in
            // the devices schedule or the Inspector.
            deviceField(b.scpd), field(b.contactor, contactorKey),
            field(b.overload, OverloadRatings::kSettingA),
            field(b.overload, OverloadRatings::kTripClass),
            // "2 × 500": two ratings in one cell, so only a single set's size is editable
            cr && cr->sets == 1 ? field(cable, CableRatings::kSize) : std::nullopt,
            field(cable, CableRatings::kLengthFt), field(cable, CableRatings::kEgcSize)},
           branchParts(b));
}

void cableRow(Schedule& s, const RowContext& c, const Part& p) {
    const auto cr = CableRatings::of(p);
    const auto amp = c.result.cableAmpacityA.find(p.id); // computed once by the check
    const auto load = c.r.loadAmps.find(p.id);
    const double drop = dropPct(c.r, c.net, c.flow, p);
    c.push(s,
           {p.tag, cr.material == Material::Al ? "Al" : "Cu", cr.size, std::to_string(cr.sets),
            fmt(cr.lengthFt, 0), std::to_string(cr.insulationC),
            amp != c.result.cableAmpacityA.end() ? fmt(amp->second) : "",
            load == c.r.loadAmps.end() ? "" : fmt(load->second),
            std::isnan(drop) ? "" : fmt(drop, 2), faultAt(c.r, c.flow.lineNode(p.id))},
           {std::nullopt, field(&p, CableRatings::kMaterial), field(&p, CableRatings::kSize),
            field(&p, CableRatings::kSets), field(&p, CableRatings::kLengthFt),
            field(&p, CableRatings::kInsulationC)},
           {&p});
}

bool isDevice(PartKind k) {
    return kindInfo(k).protective || k == PartKind::Disconnect || k == PartKind::Contactor ||
           k == PartKind::Overload || k == PartKind::Vfd || k == PartKind::SoftStarter;
}

// A device's rating (A), setting (A) and type cells and the one rating each shows, if one.
struct DeviceCells {
    std::string rating, setting, type;
    std::optional<ScheduleField> ratingField, settingField, typeField;
};

DeviceCells deviceCells(const Part& p) {
    DeviceCells c;
    switch (p.kind) {
    case PartKind::Breaker: {
        const auto b = BreakerRatings::of(p);
        c = {fmt(b.tripA, 0), "",
             b.tripType == TripType::Electronic ? "electronic trip" : "thermal-magnetic trip",
             field(&p, BreakerRatings::kTripA), std::nullopt,
             field(&p, BreakerRatings::kTripType)};
        break;
    }
    case PartKind::InstBreaker: {
        const auto b = InstBreakerRatings::of(p);
        c = {fmt(b.amps, 0), fmt(b.pickupA, 0), "instantaneous only",
             field(&p, InstBreakerRatings::kAmps), field(&p, InstBreakerRatings::kPickupA),
             std::nullopt};
        break;
    }
    case PartKind::Fuse: {
        const auto f = FuseRatings::of(p);
        const std::string type = f.type == FuseType::Fast ? "fast-acting" : "time-delay";
        c = {fmt(f.amps, 0), "", f.fuseClass ? type + ", class " + *f.fuseClass : type,
             field(&p, FuseRatings::kAmps), std::nullopt,
             f.fuseClass ? std::nullopt : field(&p, FuseRatings::kType)};
        break;
    }
    case PartKind::Disconnect: {
        const auto d = DisconnectRatings::of(p);
        const std::string type = d.fused ? "fused" : "non-fused";
        c = {fmt(d.amps, 0), "", d.hpRating ? type + ", " + fmt(*d.hpRating, 1) + " hp" : type,
             field(&p, DisconnectRatings::kAmps), std::nullopt,
             d.hpRating ? std::nullopt : field(&p, DisconnectRatings::kFused)};
        break;
    }
    case PartKind::Contactor: {
        const auto k = ContactorRatings::of(p);
        c = {num(k.ac3A, 0), "", k.nemaSize ? "NEMA " + *k.nemaSize : "",
             field(&p, ContactorRatings::kAc3A), std::nullopt,
             field(&p, ContactorRatings::kNemaSize)};
        break;
    }
    case PartKind::Overload: {
        const auto o = OverloadRatings::of(p);
        const bool range = o.rangeMinA && o.rangeMaxA;
        c = {range ? fmt(*o.rangeMinA) + "–" + fmt(*o.rangeMaxA) : "", fmt(o.settingA),
             o.tripClass.empty() ? "" : "class " + o.tripClass, std::nullopt,
             field(&p, OverloadRatings::kSettingA), field(&p, OverloadRatings::kTripClass)};
        break;
    }
    case PartKind::Vfd: {
        // Rating: the output current the motor may draw; setting: none; type: the input
        // current its line-side conductors are sized from (430.122(A)).
        const auto v = VfdRatings::of(p);
        c = {fmt(v.outputA, 0), "", "drive, input " + fmt(v.inputA, 0) + " A",
             field(&p, VfdRatings::kOutputA), std::nullopt, std::nullopt};
        break;
    }
    case PartKind::SoftStarter: {
        const auto ss = SoftStarterRatings::of(p);
        c = {fmt(ss.amps, 0), "",
             "soft starter, limit " + fmt(ss.startLimitX, 1) + " × FLC" +
                 (ss.bypass ? ", bypass" : ""),
             field(&p, SoftStarterRatings::kAmps), std::nullopt, std::nullopt};
        break;
    }
    default:
        break;
    }
    return c;
}

void deviceRow(Schedule& s, const RowContext& c, const Part& p) {
    const auto* f = c.r.faultAtNode(c.flow.lineNode(p.id));
    const auto data = protectiveDataOf(p);
    const auto ic = data ? std::optional(data->interruptingKa) : std::nullopt;
    DeviceCells d = deviceCells(p);
    c.push(s,
           {p.tag, std::string(kindInfo(p.kind).name), d.rating, d.setting, d.type, num(ic),
            f ? fmt(f->ikKa, 2) : "", f && ic ? fmt(f->ikKa / *ic * 100, 0) : ""},
           {std::nullopt, std::nullopt, d.ratingField, d.settingField, d.typeField,
            ic ? field(&p, ProtectiveData::kInterruptingKa) : std::nullopt},
           {&p});
}

Schedule arcFlashSchedule(const CheckResult& result) {
    // IEEE 1584-2018 arc-flash study of every bus and bucket (the governing case).
    Schedule arcflash{"arcflash",
                      {"Equipment", "Kind", "Volts", "Bolted kA", "Arcing kA", "Reduced kA",
                       "Clearing device", "Time s", "Reduced time s", "Working distance mm",
                       "Incident energy cal/cm²", "Arc-flash boundary mm", "Case", "Remark"},
                      {},
                      {},
                      {}};
    if (!result.arcFlash)
        return arcflash;
    for (const auto& e : *result.arcFlash) {
        const auto& r = e.result;
        const bool ok = e.energyCal().has_value();
        std::string remark = ok ? "" : "outside the model: " + r.range.outside.front();
        if (ok && (e.cappedFull || e.cappedReduced))
            remark = "arcing time cut to the cap";
        arcflash.rows.push_back(
            {e.tag, e.kind, fmt(e.input.vocKv * 1000, 0),
             e.input.ibfKa > 0 ? fmt(e.input.ibfKa, 2) : "", ok ? fmt(r.currents.iarc, 2) : "",
             ok ? fmt(r.currents.iarcMin, 2) : "", e.clearing ? e.clearing->tag : "",
             ok ? fmt(e.tFullS, 3) : "", ok ? fmt(e.tReducedS, 3) : "",
             fmt(e.input.workingDistanceMm, 0), ok ? fmt(*e.energyCal(), 2) : "",
             ok ? fmt(*e.boundaryMm(), 0) : "", ok ? (r.reducedGoverns ? "reduced" : "full") : "",
             remark});
    }
    return arcflash;
}

} // namespace

std::vector<Schedule> buildSchedules(const CheckResult& result) {
    const Drawing& d = *result.drawing;
    Schedule motors{"motors",
                    {"Tag", "Rating", "Volts", "FLC A", "FLA A", "Short-circuit device",
                     "Contactor", "Overload A", "Class", "Conductor", "Length ft", "EGC", "Drop %",
                     "Fault kA", "Findings"},
                    {},
                    {},
                    {}};
    Schedule cables{"cables",
                    {"Tag", "Material", "Size", "Sets", "Length ft", "Insulation °C", "Ampacity A",
                     "Load A", "Drop at load end %", "Fault kA at line end", "Findings"},
                    {},
                    {},
                    {}};
    // Every device of a branch or feeder: short-circuit devices, disconnects, contactors and
    // overload relays, each with its rating, setting and type.
    Schedule devices{"devices",
                     {"Tag", "Kind", "Rating A", "Setting A", "Type", "Interrupting kA",
                      "Line-side fault kA", "Duty %", "Findings"},
                     {},
                     {},
                     {}};
    Schedule arcflash = arcFlashSchedule(result);
    // Without a network and studies the schedules have their headers and no rows.
    if (!result.view())
        return {motors, cables, devices, arcflash};
    // The Findings column: what the check found about the row's part (a motor's row: about any
    // part of its branch), open by severity and accepted.
    const RowContext c{result, *result.net, *result.flow, *result.study,
                       tallyFindings(result.report)};
    for (const auto& facts : result.motors)
        motorRow(motors, c, facts);
    for (const auto& p : d.parts()) {
        if (p.kind == PartKind::Cable)
            cableRow(cables, c, p);
        else if (isDevice(p.kind))
            deviceRow(devices, c, p);
    }
    return {motors, cables, devices, arcflash};
}

namespace {

bool isNumber(const std::string& v) {
    double d = 0;
    const auto [end, ec] = std::from_chars(v.data(), v.data() + v.size(), d);
    return ec == std::errc() && end == v.data() + v.size();
}

} // namespace

std::string csvSafeCell(const std::string& v) {
    // A spreadsheet runs a cell that starts with = + - @ (or a tab or CR before one) as a
    // formula. Text from a drawing (a tag "=HYPERLINK(...)") gets a leading apostrophe, which
    // spreadsheets show as text; numbers such as -5 stay numbers.
    if (v.empty() || v.find_first_of("=+-@\t\r", 0) != 0 || isNumber(v))
        return v;
    return "'" + v;
}

std::string toCsv(const Schedule& s) {
    auto field = [](const std::string& raw) {
        const std::string v = csvSafeCell(raw);
        if (v.find_first_of(",\"\r\n") == std::string::npos)
            return v;
        std::string q = "\"";
        for (char c : v)
            q += c == '"' ? std::string("\"\"") : std::string(1, c);
        return q + "\"";
    };
    std::string out;
    auto line = [&](const std::vector<std::string>& cells) {
        for (std::size_t i = 0; i < cells.size(); ++i)
            out += (i ? "," : "") + field(cells[i]);
        out += "\r\n";
    };
    line(s.headers);
    for (const auto& r : s.rows)
        line(r);
    return out;
}

} // namespace lineward
