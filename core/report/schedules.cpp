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

} // namespace

std::vector<Schedule> buildSchedules(const CheckResult& result) {
    const Drawing& d = *result.drawing;
    Schedule motors{"motors",
                    {"Tag", "Rating", "Volts", "FLC A", "FLA A", "Short-circuit device",
                     "Contactor", "Overload A", "Class", "Conductor", "Length ft", "EGC", "Drop %",
                     "Fault kA", "Findings"},
                    {}};
    Schedule cables{"cables",
                    {"Tag", "Material", "Size", "Sets", "Length ft", "Insulation °C", "Ampacity A",
                     "Load A", "Drop at load end %", "Fault kA at line end", "Findings"},
                    {}};
    Schedule devices{
        "devices",
        {"Tag", "Kind", "Rating", "Interrupting kA", "Line-side fault kA", "Duty %", "Findings"},
        {}};
    // IEEE 1584-2018 arc-flash study of every bus and bucket (the governing case).
    Schedule arcflash{"arcflash",
                      {"Equipment", "Kind", "Volts", "Bolted kA", "Arcing kA", "Reduced kA",
                       "Clearing device", "Time s", "Reduced time s", "Working distance mm",
                       "Incident energy cal/cm²", "Arc-flash boundary mm", "Case", "Remark"},
                      {}};
    if (result.arcFlash)
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
                 ok ? fmt(*e.boundaryMm(), 0) : "",
                 ok ? (r.reducedGoverns ? "reduced" : "full") : "", remark});
        }
    // Without a network and studies the schedules have their headers and no rows.
    if (!result.view())
        return {motors, cables, devices, arcflash};
    const Network& net = *result.net;
    const Flow& flow = *result.flow;
    const StudyResults& r = *result.study;
    // The Findings column: what the check found about the row's part (a motor's row: about any
    // part of its branch), open by severity and accepted.
    const auto tally = tallyFindings(result.report);
    auto findingsOf = [&](const std::vector<const Part*>& parts) {
        FindingTally t;
        for (const Part* p : parts)
            if (auto it = tally.find(p->id); it != tally.end())
                t.add(it->second);
        return t.text();
    };
    for (const auto& facts : result.motors) {
        const MotorBranch& b = facts.branch;
        const Part& m = *b.motor;
        const auto& flc = facts.flc;
        const Part* cable = b.cables.empty() ? nullptr : b.cables.front();
        const double drop = dropPct(r, net, flow, m);
        const auto mr = MotorRatings::of(m);
        const auto cr = cable ? std::optional(CableRatings::of(*cable)) : std::nullopt;
        const auto kr =
            b.contactor ? std::optional(ContactorRatings::of(*b.contactor)) : std::nullopt;
        const auto ol = b.overload ? std::optional(OverloadRatings::of(*b.overload)) : std::nullopt;
        motors.rows.push_back(
            {m.tag, mr.hp ? fmt(*mr.hp, 2) + " hp" : num(mr.kw, 2) + " kW", fmt(mr.volts, 0),
             flc ? fmt(flc->amps) : "", num(mr.fla), deviceText(b.scpd),
             // The column names what starts the motor: a contactor, else a drive or soft
             // starter.
             kr        ? (kr->nemaSize ? "NEMA " + *kr->nemaSize : num(kr->ac3A, 0) + " A AC-3")
             : b.drive ? deviceText(b.drive)
             : b.softStarter ? deviceText(b.softStarter)
                             : "",
             ol ? fmt(ol->settingA) : "", ol ? ol->tripClass : "",
             cr ? (cr->sets > 1 ? std::to_string(cr->sets) + " × " : "") + cr->size : "",
             cr ? fmt(cr->lengthFt, 0) : "", cr ? cr->egcSize : "",
             std::isnan(drop) ? "" : fmt(drop, 2),
             b.scpd ? faultAt(r, flow.lineNode(b.scpd->id)) : faultAt(r, net.nodeOf(m.id, 0)),
             findingsOf(branchParts(b))});
    }
    for (const auto& p : d.parts()) {
        auto load = r.loadAmps.find(p.id);
        if (p.kind == PartKind::Cable) {
            const auto cr = CableRatings::of(p);
            const auto amp = result.cableAmpacityA.find(p.id); // computed once by the check
            const double drop = dropPct(r, net, flow, p);
            cables.rows.push_back({p.tag, cr.material == Material::Al ? "Al" : "Cu", cr.size,
                                   std::to_string(cr.sets), fmt(cr.lengthFt, 0),
                                   std::to_string(cr.insulationC),
                                   amp != result.cableAmpacityA.end() ? fmt(amp->second) : "",
                                   load == r.loadAmps.end() ? "" : fmt(load->second),
                                   std::isnan(drop) ? "" : fmt(drop, 2),
                                   faultAt(r, flow.lineNode(p.id)), findingsOf({&p})});
        } else if (kindInfo(p.kind).protective || p.kind == PartKind::Vfd ||
                   p.kind == PartKind::SoftStarter) {
            const auto* f = r.faultAtNode(flow.lineNode(p.id));
            const auto data = protectiveDataOf(p);
            const auto ic = data ? std::optional(data->interruptingKa) : std::nullopt;
            devices.rows.push_back({p.tag, std::string(kindInfo(p.kind).name), deviceText(&p),
                                    num(ic), f ? fmt(f->ikKa, 2) : "",
                                    f && ic ? fmt(f->ikKa / *ic * 100, 0) : "", findingsOf({&p})});
        }
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
