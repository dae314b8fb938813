// transformer.load and transformer.protection (NEC 2023 Table 450.3(B), 1000 V and less).
#include "model/ratings.h"
#include "rules/feeder_calc.h"
#include "rules/rule_catalog.h"
#include "sizing/motor_sizing.h"

#include <cmath>

namespace lineward {

namespace {

// First protective device met going downstream from a node along a single path.
const Part* protectionBelow(const RuleContext& ctx, NodeIndex n, PartId from) {
    const auto& g = ctx.net.graph();
    for (std::size_t guard = 0; guard < 64; ++guard) {
        std::optional<BranchDesc> only;
        int count = 0;
        for (auto [e, end] = boost::out_edges(n, g); e != end; ++e)
            if (g[*e].part != from && g[*e].closed) {
                only = *e;
                ++count;
            }
        if (count != 1)
            return nullptr;
        const Part* p = ctx.drawing.part(g[*only].part);
        if (kindInfo(p->kind).protective)
            return p;
        if (p->kind != PartKind::Cable)
            return nullptr;
        from = p->id;
        n = boost::target(*only, g) == n ? boost::source(*only, g) : boost::target(*only, g);
    }
    return nullptr;
}

// Largest rating Table 450.3(B) permits for one side and method.
double limitFor(const Tables& t, bool primaryOnly, bool primarySide, double ratedA,
                std::string& why) {
    for (const auto& r : t.transformerProtection) {
        if (r.primaryOnly != primaryOnly || r.primarySide != primarySide)
            continue;
        if (ratedA < r.currentMinA || ratedA >= r.currentMaxA)
            continue;
        const double raw = r.pct / 100.0 * ratedA;
        const double lim = r.nextSize ? t.nextStandardAtOrAbove(raw).value_or(raw) : raw;
        why = fmt(r.pct, 0) + " % × " + fmt(ratedA) + " A = " + fmt(raw) + " A" +
              (r.nextSize ? " → next standard " + fmt(lim, 0) + " A (Note 1)" : "");
        return lim;
    }
    return 0;
}

void protection(const RuleContext& ctx, const Part& tx, std::vector<Finding>& out) {
    const auto r = TransformerRatings::of(tx);
    const double kva = r.kva, pv = r.priV, sv = r.secV;
    if (pv > 1000 || sv > 1000)
        return; // Table 450.3(A) governs; not checked here
    const double ip = kva * 1000.0 / (std::sqrt(3.0) * pv),
                 is = kva * 1000.0 / (std::sqrt(3.0) * sv);
    auto priId = ctx.flow.protectionAbove(ctx.flow.lineNode(tx.id));
    const Part* pri = priId ? ctx.drawing.part(*priId) : nullptr;
    const Part* sec = protectionBelow(ctx, ctx.flow.loadNode(tx.id), tx.id);
    std::string secWhy, priWhy;
    const double secLim = limitFor(ctx.tables, false, false, is, secWhy);
    const bool secOk = sec && ampereRatingA(*sec) <= secLim + 1e-9;
    const double priLim = limitFor(ctx.tables, !secOk, true, ip, priWhy);
    if (pri && ampereRatingA(*pri) <= priLim + 1e-9)
        return;
    auto f =
        makeFinding("transformer.protection", {tx.id},
                    pri ? tx.tag + " primary device " + pri->tag + " at " +
                              fmt(ampereRatingA(*pri), 0) + " A exceeds " + fmt(priLim, 0) + " A"
                        : tx.tag + " has no primary overcurrent device");
    if (pri)
        f.parts.push_back(pri->id);
    f.computed = pri ? ampereRatingA(*pri) : 0;
    f.limit = priLim;
    f.unit = "A";
    f.trace = {{"rated currents", "primary " + fmt(ip) + " A, secondary " + fmt(is) + " A"},
               {"secondary device", sec ? sec->tag + " " + fmt(ampereRatingA(*sec), 0) + " A" +
                                              (secOk ? " within " : " above ") + secWhy
                                        : "none"},
               {"method", secOk ? "primary and secondary protection" : "primary protection only"},
               {"primary limit", priWhy}};
    if (pri)
        f.fix = Fix{"set " + pri->tag + " to " +
                        fmt(ctx.tables.standardAtOrBelow(priLim).value_or(priLim), 0) + " A",
                    {{pri->id, ampereRatingKey(pri->kind),
                      ctx.tables.standardAtOrBelow(priLim).value_or(priLim)}}};
    else
        f.fix = Fix{"add a primary breaker or fuses", {}};
    out.push_back(std::move(f));
}

void loading(const RuleContext& ctx, const FeederMotorMap& motors, const Part& tx,
             std::vector<Finding>& out) {
    const auto r = TransformerRatings::of(tx);
    const double kva = r.kva, sv = r.secV;
    const double rated = kva * 1000.0 / (std::sqrt(3.0) * sv);
    const auto load = feederLoad(ctx, motors, ctx.flow.loadNode(tx.id));
    if (load.running() <= rated + 1e-9)
        return;
    auto f = makeFinding("transformer.load", {tx.id},
                         tx.tag + " carries " + fmt(load.running()) + " A, above its rated " +
                             fmt(rated) + " A");
    f.computed = load.running();
    f.limit = rated;
    f.unit = "A";
    f.trace = load.trace(ctx);
    f.trace.push_back({"running load", fmt(load.running()) + " A (sum of FLC and load currents)"});
    f.trace.push_back({"rated secondary current", fmt(kva, 0) + " kVA × 1000 / (√3 × " +
                                                      fmt(sv, 0) + " V) = " + fmt(rated) + " A"});
    f.fix = Fix{"use a larger transformer or move load", {}};
    out.push_back(std::move(f));
}

} // namespace

void checkTransformers(const RuleContext& ctx, const FeederMotorMap& motors,
                       std::vector<Finding>& out) {
    for (const auto& p : ctx.drawing.parts()) {
        if (p.kind != PartKind::Transformer || !ctx.net.partEnergized(p.id))
            continue;
        loading(ctx, motors, p, out);
        protection(ctx, p, out);
    }
}

} // namespace lineward
