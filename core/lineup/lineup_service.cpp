// buildLineup: the service, transformer, main breaker and MCC bus sized around the buckets of
// a load list, and the lineup's fault duty read from the one check.
#include "check/check.h"
#include "lineup/lineup_builder.h"
#include "lineup/lineup_detail.h"
#include "model/ratings.h"
#include "studies/study.h"
#include "topology/flow.h"
#include "topology/network.h"

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace lineward {

namespace {

constexpr double kFrames[] = {100,  150,  225,  250,  400,  600, 800,
                              1200, 1600, 2000, 2500, 3000, 4000};
constexpr double kTxKva[] = {45,   75,   112.5, 150,  225,  300,  500, 750,
                             1000, 1500, 2000,  2500, 3000, 3750, 5000};
constexpr double kMccBusA[] = {600, 800, 1000, 1200, 1600, 2000, 2500, 3000};
constexpr double kServiceY = -80, kTxY = 0, kMainY = 80, kBusY = 150;
/// Interrupting rating used while the fault duty is not yet known (replaced after the check).
constexpr double kProvisionalKa = 65;

using lineup_detail::firstAtOrAbove;
using lineup_detail::put;

// Service, transformer, main breaker and bus with provisional ratings; ids 1–4.
Drawing skeleton(const LineupOptions& o) {
    Drawing d;
    d.sheet.title = "MCC-1 lineup";
    Part src = Part::make(PartKind::Source, PartId(1), "UTIL-1");
    put(src, {{SourceRatings::kKv, o.serviceKv},
              {SourceRatings::kFaultMva, o.serviceMva},
              {"x_over_r", o.serviceXr}});
    Part tx = Part::make(PartKind::Transformer, PartId(2), "TX-1");
    put(tx, {{TransformerRatings::kKva, 500.0},
             {TransformerRatings::kPriV, o.serviceKv * 1000},
             {TransformerRatings::kSecV, o.systemVolts},
             {"z_pct", kAssumedTxZPct},
             {"x_over_r", kAssumedTxXr}});
    Part main = Part::make(PartKind::Breaker, PartId(3), "CB-MAIN");
    put(main, {{BreakerRatings::kTripType, std::string("electronic")},
               {BreakerRatings::kFrameA, 800.0},
               {BreakerRatings::kTripA, 800.0},
               {BreakerRatings::kInterruptingKa, kProvisionalKa},
               {"lt_pickup_x", 1.0},
               {"lt_delay_s", 10.0},
               {"st_pickup_x", 10.0},
               {"st_delay_s", 0.4}});
    Part bus = Part::make(PartKind::Bus, PartId(4), "MCC-1");
    put(bus, {{BusRatings::kType, std::string("mcc")},
              {BusRatings::kVolts, o.systemVolts},
              {BusRatings::kAmps, 600.0},
              {BusRatings::kBracingKa, kProvisionalKa}});
    src.y = kServiceY;
    tx.y = kTxY;
    main.y = kMainY;
    bus.y = kBusY;
    d.addParts({src, tx, main, bus});
    d.addWires({{WireId(1), {PartId(1), 0}, {PartId(2), 0}},
                {WireId(2), {PartId(2), 1}, {PartId(3), 0}},
                {WireId(3), {PartId(3), 1}, {PartId(4), 0}}});
    return d;
}

struct FeederSize {
    double needA = 0, limitA = 0, tripA = 0, kva = 0, busA = 0;
};

// 430.24 load, 430.62(A) limit, the main's trip, the transformer (450.3) and the bus.
FeederSize sizeFeeder(const BucketPlan& plan, const Tables& t, double volts,
                      std::vector<TraceStep>& basis) {
    FeederSize f;
    double sum = 0, largest = 0;
    for (const auto& b : plan.buckets) {
        sum += b.proposal.flc.amps;
        largest = std::max(largest, b.proposal.flc.amps);
    }
    f.needA = 1.25 * largest + (sum - largest);
    for (const auto& b : plan.buckets) {
        // An instantaneous-only breaker counts at the inverse-time breaker's 430.52 limit.
        const double dev = b.proposal.device == ScpdType::InstantaneousBreaker
                               ? b.proposal.scpdMaxA.at(ScpdType::InverseTimeBreaker)
                               : b.proposal.deviceRatingA;
        f.limitA = std::max(f.limitA, dev + sum - b.proposal.flc.amps);
    }
    f.tripA = t.nextStandardAtOrAbove(f.needA).value_or(f.needA);
    if (f.tripA > f.limitA)
        f.tripA = t.standardAtOrBelow(f.limitA).value_or(f.limitA);
    basis.push_back(
        {"motor load (430.24)",
         "1.25 × " + fmt(largest) + " A + " + fmt(sum - largest) + " A = " + fmt(f.needA) + " A"});
    basis.push_back({"main breaker", "at least the " + fmt(f.needA) + " A load, at most " +
                                         fmt(f.limitA) +
                                         " A (430.62(A): largest branch device + other FLCs) → " +
                                         fmt(f.tripA, 0) + " A"});
    const double perKva = 1000.0 / (std::sqrt(3.0) * volts);
    for (double kva : kTxKva) {
        const double is = kva * perKva;
        if (is >= f.needA && t.nextStandardAtOrAbove(1.25 * is).value_or(0) >= f.tripA) {
            f.kva = kva;
            break;
        }
    }
    if (f.kva == 0)
        throw std::runtime_error("the load (" + fmt(f.needA) + " A) needs a transformer above " +
                                 "5000 kVA; split the list over more than one lineup");
    basis.push_back({"transformer", fmt(f.kva, 1) + " kVA: rated secondary " + fmt(f.kva * perKva) +
                                        " A ≥ " + fmt(f.needA) +
                                        " A; the main at most 125 % of it (secondary protection of "
                                        "Table 450.3(A), or 450.3(B) at 1000 V and less)"});
    f.busA = firstAtOrAbove(kMccBusA, std::max(f.needA, f.tripA)).value_or(0);
    if (f.busA == 0)
        throw std::runtime_error("the load needs an MCC bus above 3000 A");
    basis.push_back({"MCC bus", fmt(f.busA, 0) + " A ≥ " + fmt(std::max(f.needA, f.tripA)) +
                                    " A (load and main trip)"});
    return f;
}

// Fault at the bus and at the main's line side, kA, from the check's fault study.
double lineupFaultKa(const Drawing& d, const Tables& t) {
    auto r = runCheck(d, t);
    if (!r->study || !r->study->faultSolved)
        throw std::runtime_error("the fault study could not be solved for the new lineup");
    double ka = 0;
    for (NodeIndex n : {r->net->nodeOf(PartId(4), 0), r->net->nodeOf(PartId(3), 0)})
        if (const auto* f = r->study->faultAtNode(n))
            ka = std::max(ka, f->ikKa);
    return ka;
}

void applyDuty(Drawing& d, double kA) {
    for (const auto& p : d.parts()) {
        Part q = p;
        if (q.kind == PartKind::Breaker || q.kind == PartKind::InstBreaker)
            put(q, {{"interrupting_ka", kA}});
        else if (q.kind == PartKind::Bus)
            put(q, {{BusRatings::kBracingKa, kA}});
        else
            continue;
        *d.part(q.id) = std::move(q);
    }
    std::vector<Bucket> buckets = d.buckets();
    for (auto& b : buckets)
        b.sccrKa = kA;
    d.updateBuckets(buckets);
}

} // namespace

std::optional<double> bucketDutyKa(const CheckResult& r, PartId bus) {
    if (!r.study || !r.net || !r.drawing->part(bus))
        return std::nullopt;
    const auto* f = r.study->faultAtNode(r.net->nodeOf(bus, 0));
    if (!f)
        return std::nullopt;
    return firstAtOrAbove(kDutyKa, f->ikKa);
}

Lineup buildLineup(const std::vector<LoadRow>& rows, const LineupOptions& o, const Tables& t) {
    Lineup out;
    out.drawing = skeleton(o);
    BucketPlan plan = planBuckets(out.drawing, PartId(4), rows, kProvisionalKa, t);
    out.refused = plan.refused;
    if (plan.buckets.empty())
        return out;
    const FeederSize f = sizeFeeder(plan, t, o.systemVolts, out.basis);
    Drawing& d = out.drawing;
    put(*d.part(PartId(2)), {{TransformerRatings::kKva, f.kva}});
    put(*d.part(PartId(3)),
        {{BreakerRatings::kFrameA, firstAtOrAbove(kFrames, f.tripA).value_or(f.tripA)},
         {BreakerRatings::kTripA, f.tripA}});
    put(*d.part(PartId(4)), {{BusRatings::kAmps, f.busA}});
    d.addParts(plan.allParts());
    d.addWires(plan.allWires());
    d.addBuckets(plan.allBuckets());
    for (const auto& b : plan.buckets)
        out.notes.insert(out.notes.end(), b.notes.begin(), b.notes.end());
    const double faultKa = lineupFaultKa(d, t);
    const auto duty = firstAtOrAbove(kDutyKa, faultKa);
    if (!duty)
        throw std::runtime_error("the available fault (" + fmt(faultKa) +
                                 " kA) exceeds 200 kA; no standard bracing is chosen");
    applyDuty(d, *duty);
    out.basis.push_back({"fault duty", fmt(faultKa) +
                                           " kA at the bus (fault study, with motor "
                                           "contribution) → bracing, interrupting ratings and "
                                           "bucket SCCR " +
                                           fmt(*duty, 0) + " kA"});
    out.notes.push_back("TX-1 primary protection (Table 450.3(A) above 1000 V) is not drawn; "
                        "add the service's primary fuses or breaker");
    out.notes.push_back("TX-1 impedance " + fmt(kAssumedTxZPct, 2) + " % and X/R " +
                        fmt(kAssumedTxXr) + " are assumed; enter the nameplate values");
    return out;
}

} // namespace lineward
