// Arc-flash label content from the check result's arc-flash study.
#include "report/arc_flash_labels.h"

#include "curves/arc_flash_study.h"
#include "model/ratings.h"

#include <cmath>

namespace lineward {

namespace {

constexpr double kLimitCal = 40.0; // common practice: energized work not permitted above

std::string equipmentWords(const ArcFlashEquipment& e, const Drawing& d) {
    if (e.bucket) {
        const Part* bus = d.part(e.part);
        return "MCC bucket on " + (bus ? bus->tag : std::string("its bus"));
    }
    if (e.kind == "switchboard")
        return "Switchboard";
    if (e.kind == "mcc")
        return "Motor control center";
    if (e.kind == "panelboard")
        return "Panelboard";
    if (e.kind == "cable_junction")
        return "Cable junction";
    return e.kind;
}

void fillApproach(const Tables* tables, ArcFlashLabel& l) {
    const ApproachRow* row = tables ? tables->approachFor(l.nominalV) : nullptr;
    if (!row)
        return;
    l.approachKnown = true;
    l.limitedMovable = row->limitedMovable;
    l.limitedFixed = row->limitedFixed;
    l.restricted = row->restricted;
}

} // namespace

std::string labelLength(double mm) {
    const long totalIn = std::lround(mm / 25.4);
    return std::to_string(std::lround(mm)) + " mm (" + std::to_string(totalIn / 12) + " ft " +
           std::to_string(totalIn % 12) + " in)";
}

std::vector<ArcFlashLabel> arcFlashLabels(const CheckResult& result, const std::string& date) {
    std::vector<ArcFlashLabel> out;
    if (!result.arcFlash || !result.drawing)
        return out;
    const Drawing& d = *result.drawing;
    for (const auto& e : *result.arcFlash) {
        ArcFlashLabel l;
        l.part = e.part;
        l.bucket = e.bucket;
        l.tag = e.tag;
        l.equipment = equipmentWords(e, d);
        l.nominalV = e.input.vocKv * 1000.0;
        l.date = date;
        const Part* bus = d.part(e.part);
        const BusRatings busR = bus ? BusRatings::of(*bus) : BusRatings{};
        l.phases = bus ? busR.phases : 3;
        if (l.nominalV <= 0)
            l.nominalV = busR.volts;
        fillApproach(result.tables, l);
        l.clearingTag = e.clearing ? e.clearing->tag : std::string();
        if (auto cal = e.energyCal()) {
            const auto& g = e.result.governing();
            l.computed = true;
            l.energyCal = *cal;
            l.energyJ = g.eJcm2;
            l.workingDistanceMm = e.input.workingDistanceMm;
            l.boundaryMm = g.afbMm;
            l.aboveLimit = *cal > kLimitCal;
            l.arcingTimeS = e.result.reducedGoverns ? e.tReducedS : e.tFullS;
            l.timeCapped = e.result.reducedGoverns ? e.cappedReduced : e.cappedFull;
        } else {
            l.notComputedWhy = e.result.range.outside.empty() ? std::string("no result")
                                                              : e.result.range.outside.front();
            l.workingDistanceMm = e.input.workingDistanceMm;
        }
        if (!e.bucket && bus && busR.service) {
            ServiceLabelData s;
            s.nominalV = l.nominalV;
            if (e.input.ibfKa > 0)
                s.availableFaultKa = e.input.ibfKa;
            s.deviceTag = l.clearingTag;
            s.clearingS = e.tBoltedS;
            s.date = date;
            l.service = s;
        }
        out.push_back(std::move(l));
    }
    return out;
}

} // namespace lineward
