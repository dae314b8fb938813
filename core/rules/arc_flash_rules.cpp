// Arc-flash findings: each names the equipment, its energy and how it was found (trace), and
// the caution that the study supports an engineer's assessment and does not replace it.
#include "rules/arc_flash_rules.h"

#include "rules/rule_catalog.h"
#include "util/trace.h"

#include <cmath>
#include <map>

namespace lineward {

namespace {

constexpr double kLimitCal = 40.0; // common practice: energized work not permitted above

const char* kCaution = "the study supports a licensed engineer's arc-flash risk assessment and "
                       "the local code; it does not replace them";

std::vector<TraceStep> traceOf(const StudyView& ctx, const ArcFlashEquipment& e) {
    const auto& in = e.input;
    const auto& r = e.result;
    std::vector<TraceStep> t{
        {"equipment", e.tag + " (" + e.kind + "), " + fmt(in.vocKv * 1000, 0) + " V, " +
                          std::string(electrodeConfigKey(in.config)) + ", gap " + fmt(in.gapMm, 1) +
                          " mm, working distance " + fmt(in.workingDistanceMm, 1) +
                          " mm, enclosure " + fmt(in.enclosure.heightMm, 1) + " × " +
                          fmt(in.enclosure.widthMm, 1) + " × " + fmt(in.enclosure.depthMm, 1) +
                          " mm"},
        {"bolted fault current", fmt(in.ibfKa, 2) + " kA"},
        {"arcing current (IEEE 1584-2018 Eq. 1, 16–18, 25)",
         fmt(r.currents.iarc, 2) + " kA; reduced (Eq. 2, VarCf " + fmt(r.currents.varCf, 4) + ") " +
             fmt(r.currents.iarcMin, 2) + " kA"},
        {"enclosure size correction (Eq. 11–15)",
         r.enclosure.applies
             ? "EES " + fmt(r.enclosure.ees, 2) + " in, CF " + fmt(r.enclosure.cf, 3) +
                   (r.enclosure.shallow ? " (shallow)" : " (typical)")
             : std::string("open air: CF 1")},
        {"clearing device", e.clearing ? ctx.tag(e.clearing->id) : std::string("none found")},
        {"arcing time", fmt(e.tFullS, 3) + " s at the full, " + fmt(e.tReducedS, 3) +
                            " s at the reduced arcing current"},
        {"incident energy (Eq. 3–6, 19–21)",
         fmt(r.full.eCalCm2(), 2) + " cal/cm² (full), " + fmt(r.reduced.eCalCm2(), 2) +
             " cal/cm² (reduced); governing: " + (r.reducedGoverns ? "reduced" : "full")},
        {"arc-flash boundary (Eq. 7–10, 22–24)", fmt(r.governing().afbMm, 0) + " mm"}};
    for (const auto& n : e.notes)
        t.push_back({"note", n});
    for (const auto& n : r.range.notes)
        t.push_back({"note", n});
    t.push_back({"caution", kCaution});
    return t;
}

// A bucket whose result is its bus's (the same clearing device and energy: it is taken at the
// bus side of its own device) is told in its bus's finding, not in one finding per bucket.
const ArcFlashEquipment* sameAsBus(const std::vector<ArcFlashEquipment>& all,
                                   const ArcFlashEquipment& e) {
    if (!e.bucket)
        return nullptr;
    for (const auto& b : all)
        if (!b.bucket && b.part == e.part) {
            const auto eb = b.energyCal(), ee = e.energyCal();
            const bool same = b.clearing == e.clearing &&
                              ((!eb && !ee) || (eb && ee && std::abs(*eb - *ee) < 0.05));
            return same ? &b : nullptr;
        }
    return nullptr;
}

} // namespace

void checkArcFlash(const StudyView& ctx, const std::vector<ArcFlashEquipment>& equipment,
                   std::vector<Finding>& out) {
    const double caution = ctx.settings().arcFlashCautionCal;
    std::map<PartId, std::vector<std::string>> folded; // bus -> its buckets told with it
    for (const auto& e : equipment)
        if (sameAsBus(equipment, e))
            folded[e.part].push_back(e.tag);
    auto withBuckets = [&](const ArcFlashEquipment& e) {
        const auto it = folded.find(e.part);
        if (e.bucket || it == folded.end())
            return e.tag;
        return e.tag + " and its " + std::to_string(it->second.size()) + " bucket" +
               (it->second.size() == 1 ? "" : "s");
    };
    auto bucketStep = [&](const ArcFlashEquipment& e, std::vector<TraceStep>& trace) {
        const auto it = folded.find(e.part);
        if (e.bucket || it == folded.end())
            return;
        std::string tags;
        for (const auto& t : it->second)
            tags += (tags.empty() ? "" : ", ") + t;
        trace.push_back({"buckets with the same result (taken at their bus side)", tags});
    };
    for (const auto& e : equipment) {
        if (sameAsBus(equipment, e))
            continue;
        const std::vector<PartId> parts{e.part};
        if (!e.result.range.ok()) {
            auto x = makeFinding("arcflash.outside_model", parts,
                                 withBuckets(e) + ": no arc-flash incident energy: " +
                                     e.result.range.outside.front());
            for (const auto& o : e.result.range.outside)
                x.trace.push_back({"outside the model", o});
            bucketStep(e, x.trace);
            x.trace.push_back({"caution", kCaution});
            x.fix = Fix{"give the equipment's arc-flash data in the Inspector, or assess it by "
                        "another method an engineer accepts",
                        {}};
            out.push_back(std::move(x));
            continue;
        }
        const double cal = *e.energyCal();
        if (cal <= caution && cal <= kLimitCal)
            continue;
        const bool limit = cal > kLimitCal;
        auto x = makeFinding(
            limit ? RuleId("arcflash.energy.limit") : RuleId("arcflash.energy.caution"), parts,
            withBuckets(e) + " arc-flash incident energy " + fmt(cal, 1) + " cal/cm² at " +
                fmt(e.input.workingDistanceMm, 0) + " mm is above " +
                fmt(limit ? kLimitCal : caution, 1) + " cal/cm²");
        x.computed = cal;
        x.limit = limit ? kLimitCal : caution;
        x.unit = "cal/cm²";
        x.trace = traceOf(ctx, e);
        bucketStep(e, x.trace);
        x.fix = Fix{"shorten the clearing time at the arcing current (a faster or instantaneous "
                    "setting, a maintenance switch, differential or optical arc protection), or "
                    "lower the fault current; otherwise work on the equipment de-energized",
                    {}};
        out.push_back(std::move(x));
    }
}

} // namespace lineward
