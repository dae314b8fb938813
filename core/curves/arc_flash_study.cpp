// The arc-flash study: equipment data, fault current, clearing device and time, the model.
#include "curves/arc_flash_study.h"

#include "curves/path_curves.h"
#include "model/field.h"
#include "model/ratings.h"

#include <cmath>
#include <unordered_map>

namespace lineward {

namespace {

std::string_view busKindKey(BusType t) {
    switch (t) {
    case BusType::Switchboard:
        return "switchboard";
    case BusType::Mcc:
        return "mcc";
    case BusType::Panelboard:
        return "panelboard";
    case BusType::CableJunction:
        return "cable_junction";
    }
    return "mcc";
}

// The bus a bucket hangs from: the first bus on either terminal of one of its parts.
const Part* busOfBucket(const StudyView& ctx, const Bucket& b) {
    for (PartId pid : b.parts) {
        const Part* p = ctx.drawing.part(pid);
        if (!p || !isTwoTerminal(p->kind))
            continue;
        for (int t : {0, 1})
            for (PartId a : ctx.net.graph()[ctx.net.nodeOf(pid, t)].attached)
                if (const Part* q = ctx.drawing.part(a); q && q->kind == PartKind::Bus)
                    return q;
    }
    return nullptr;
}

// Devices that interrupt a fault above a bus, nearest first (overload relays open a contactor,
// which is not rated to interrupt a fault: they never clear an arc).
std::vector<PathDevice> clearingDevices(const StudyView& ctx, const Part& bus) {
    std::vector<PathDevice> out;
    for (auto& d : devicesOnPath(ctx, bus.id, PathExtent::ToSource))
        if (d.part->kind != PartKind::Overload)
            out.push_back(std::move(d));
    return out;
}

double nodeVolts(const StudyView& ctx, NodeIndex n) {
    return ctx.net.graph()[n].nominalV;
}

// The equipment's data: the bus's own values, blanks from the typical table.
void equipmentData(const StudyView& ctx, const Part& bus, std::string_view kind, double volts,
                   ArcFlashEquipment& e) {
    const BusRatings r = BusRatings::of(bus);
    const auto* typ = ctx.tables.arcFlash.typicalFor(kind, volts);
    auto pick = [&](const std::optional<double>& own, double ArcFlashTables::TypicalRow::*field,
                    const char* what) -> double {
        if (own)
            return *own;
        if (typ) {
            e.usedTypical = true;
            return typ->*field;
        }
        e.result.range.outside.push_back(
            std::string("no typical ") + what + " for " + std::string(kind) + " at " +
            formatNumber(volts) + " V in IEEE 1584-2018 Tables 8 and 10: give it on " + bus.tag);
        return 0;
    };
    arcflash::Input& in = e.input;
    in.vocKv = volts / 1000.0;
    in.gapMm = pick(r.afGapMm, &ArcFlashTables::TypicalRow::gapMm, "gap");
    in.workingDistanceMm =
        pick(r.afWorkingMm, &ArcFlashTables::TypicalRow::workingDistanceMm, "working distance");
    in.enclosure.heightMm =
        pick(r.afHeightMm, &ArcFlashTables::TypicalRow::heightMm, "enclosure height");
    in.enclosure.widthMm =
        pick(r.afWidthMm, &ArcFlashTables::TypicalRow::widthMm, "enclosure width");
    in.enclosure.depthMm =
        pick(r.afDepthMm, &ArcFlashTables::TypicalRow::depthMm, "enclosure depth");
    if (auto c = electrodeConfigFromKey(r.afConfig))
        in.config = *c;
    else if (typ) {
        in.config = typ->config;
        e.usedTypical = true;
    }
}

// The arcing time at an arcing current: the clearing device's maximum time at the current it
// sees (scaled by the voltage ratio across transformers), cut to the setting.
double arcingTimeS(const StudyView& ctx, const PathDevice* dev, double iarcKa, double equipV,
                   bool& capped) {
    const double cap = ctx.settings().arcFlashMaxTimeS;
    capped = true;
    if (!dev)
        return cap;
    const double devV = nodeVolts(ctx, ctx.flow.lineNode(dev->part->id));
    const double seenA = iarcKa * 1000.0 * (devV > 0 && equipV > 0 ? equipV / devV : 1.0);
    const double t = dev->curve.maxTime(seenA);
    if (!std::isfinite(t) || t <= 0 || t > cap)
        return cap;
    capped = false;
    return t;
}

// The clearing device's maximum time at the bolted fault current, as arcingTimeS refers it,
// but never capped: the clearing time NEC 110.16(B) asks for.
std::optional<double> boltedClearingS(const StudyView& ctx, const PathDevice* dev, double ibfKa,
                                      double equipV) {
    if (!dev)
        return std::nullopt;
    const double devV = nodeVolts(ctx, ctx.flow.lineNode(dev->part->id));
    const double seenA = ibfKa * 1000.0 * (devV > 0 && equipV > 0 ? equipV / devV : 1.0);
    const double t = dev->curve.maxTime(seenA);
    if (!std::isfinite(t) || t <= 0)
        return std::nullopt;
    return t;
}

ArcFlashEquipment evaluateAt(const StudyView& ctx, const Part& bus, std::string_view kind,
                             std::optional<const Bucket*> bucket) {
    ArcFlashEquipment e;
    e.part = bus.id;
    e.kind = bucket ? "bucket" : std::string(kind);
    e.tag = bucket ? (**bucket).tag : bus.tag;
    if (bucket)
        e.bucket = (**bucket).id;
    const NodeIndex node = ctx.net.nodeOf(bus.id, 0);
    double volts = nodeVolts(ctx, node);
    if (volts <= 0)
        volts = BusRatings::of(bus).volts;
    // A bucket is a compartment of an MCC: the MCC's typical data (Tables 8 and 10).
    equipmentData(ctx, bus, bucket ? std::string_view("mcc") : kind, volts, e);
    const FaultAtBus* f = ctx.study.faultAtNode(node);
    if (!f) {
        e.result.range.outside.push_back("the fault study did not reach " + bus.tag);
        return e;
    }
    e.input.ibfKa = f->ikKa;
    if (!e.result.range.ok())
        return e;

    const auto devices = clearingDevices(ctx, bus);
    const PathDevice* dev = devices.empty() ? nullptr : &devices.front();
    e.clearing = dev ? dev->part : nullptr;
    const arcflash::Result probe = arcflash::evaluate(ctx.tables.arcFlash, e.input, 1, 1);
    if (!probe.range.ok()) {
        e.result = probe;
        return e;
    }
    e.tBoltedS = boltedClearingS(ctx, dev, e.input.ibfKa, volts);
    e.tFullS = arcingTimeS(ctx, dev, probe.currents.iarc, volts, e.cappedFull);
    e.tReducedS = arcingTimeS(ctx, dev, probe.currents.iarcMin, volts, e.cappedReduced);
    e.result =
        arcflash::evaluate(ctx.tables.arcFlash, e.input, e.tFullS * 1000.0, e.tReducedS * 1000.0);

    const std::string capText = formatNumber(ctx.settings().arcFlashMaxTimeS) + " s";
    if (!dev)
        e.notes.push_back("no protective device found on the line side: arcing time taken as " +
                          capText + " (arc-flash time cap setting, common practice)");
    else if (e.cappedFull || e.cappedReduced)
        e.notes.push_back(dev->part->tag + " does not clear the arcing current within " + capText +
                          ": arcing time cut to " + capText +
                          " (arc-flash time cap setting, common practice: a worker can move away)");
    if (dev && !bucket) {
        const std::string byWhom = devices.size() > 1
                                       ? "is cleared only by " + devices[1].part->tag
                                       : std::string("is cleared by no device in the drawing");
        e.notes.push_back("an arc on the line side of " + dev->part->tag +
                          " (the equipment's own main or feeder) " + byWhom +
                          "; this result holds for its load side");
    }
    if (bucket)
        e.notes.push_back("taken at the line side of the bucket's own device, cleared by " +
                          (dev ? dev->part->tag : std::string("no device")) +
                          " (conservative: the bucket's own device clears only a fault on its "
                          "load side)");
    if (e.usedTypical)
        e.notes.push_back("equipment data not given are the typical values of IEEE 1584-2018 "
                          "Tables 8 and 10 for " +
                          std::string(bucket ? "an MCC" : kind));
    return e;
}

} // namespace

std::optional<double> ArcFlashEquipment::energyCal() const {
    if (!result.range.ok() || result.full.timeMs <= 0)
        return std::nullopt;
    return result.governing().eCalCm2();
}

std::optional<double> ArcFlashEquipment::boundaryMm() const {
    if (!result.range.ok() || result.full.timeMs <= 0)
        return std::nullopt;
    return result.governing().afbMm;
}

std::vector<ArcFlashEquipment> arcFlashStudy(const StudyView& ctx) {
    std::vector<ArcFlashEquipment> out;
    if (!ctx.study.faultSolved)
        return out;
    // Each bucket's bus found once (asking per bus and bucket was buses × buckets).
    std::unordered_map<const Part*, std::vector<const Bucket*>> bucketsOf;
    for (const Bucket& b : ctx.drawing.buckets())
        if (const Part* bus = busOfBucket(ctx, b))
            bucketsOf[bus].push_back(&b);
    for (const Part& p : ctx.drawing.parts()) {
        if (p.kind != PartKind::Bus || !ctx.net.partEnergized(p.id))
            continue;
        const BusRatings r = BusRatings::of(p);
        out.push_back(evaluateAt(ctx, p, busKindKey(r.type), std::nullopt));
        if (const auto it = bucketsOf.find(&p); it != bucketsOf.end())
            for (const Bucket* b : it->second) // in the drawing's order, as before
                out.push_back(evaluateAt(ctx, p, busKindKey(r.type), b));
    }
    return out;
}

} // namespace lineward
