// The topology.* rules of docs/rules.md.
#include "rules/topology_rules.h"

#include "rules/rule_catalog.h"

#include <algorithm>
#include <deque>
#include <set>

namespace lineward {

namespace {

std::string tagOf(const Drawing& d, PartId id) {
    const Part* p = d.part(id);
    return p && !p->tag.empty() ? p->tag : "#" + std::to_string(id.value);
}

std::string tagList(const Drawing& d, const std::vector<PartId>& ids) {
    std::string s;
    for (std::size_t i = 0; i < ids.size() && i < 8; ++i)
        s += (i ? ", " : "") + tagOf(d, ids[i]);
    if (ids.size() > 8)
        s += " and " + std::to_string(ids.size() - 8) + " more";
    return s;
}

// Groups parts that fail `bad` by the nodes they share, so one isolated group gives one finding.
std::vector<std::vector<PartId>> groupParts(const Network& net, auto bad) {
    const Drawing& d = net.drawing();
    std::vector<std::vector<PartId>> groups;
    std::vector<int> groupOfNode(net.nodeCount(), -1);
    for (const auto& p : d.parts()) {
        if (!bad(p))
            continue;
        const auto terms = kindInfo(p.kind).terminals.size();
        int g = -1;
        for (std::size_t t = 0; t < terms && g < 0; ++t)
            g = groupOfNode[net.nodeOf(p.id, static_cast<int>(t))];
        if (g < 0) {
            g = static_cast<int>(groups.size());
            groups.emplace_back();
        }
        groups[static_cast<std::size_t>(g)].push_back(p.id);
        for (std::size_t t = 0; t < terms; ++t)
            groupOfNode[net.nodeOf(p.id, static_cast<int>(t))] = g;
    }
    return groups;
}

void unfed(const Network& net, std::vector<Finding>& out) {
    const Drawing& d = net.drawing();
    for (auto& group : groupParts(net, [&](const Part& p) { return !net.partReachable(p.id); })) {
        auto f = makeFinding("topology.unfed", group,
                             "fed by nothing: " + tagList(d, group) +
                                 " has no path to a source, even with every device closed");
        f.trace = {{"parts in the group", std::to_string(group.size())},
                   {"sources in the drawing", std::to_string(net.sources().size())}};
        f.fix = Fix{"wire the group to a bus or source", {}};
        out.push_back(std::move(f));
    }
}

void deenergized(const Network& net, std::vector<Finding>& out) {
    const Drawing& d = net.drawing();
    auto bad = [&](const Part& p) {
        return (p.kind == PartKind::Motor || p.kind == PartKind::Load || p.kind == PartKind::Bus) &&
               net.partReachable(p.id) && !net.partEnergized(p.id);
    };
    for (const auto& p : d.parts()) {
        if (!bad(p))
            continue;
        auto f = makeFinding("topology.deenergized", {p.id},
                             tagOf(d, p.id) + " is de-energized: every path from a source passes "
                                              "an open device");
        out.push_back(std::move(f));
    }
}

void loops(const Network& net, std::vector<Finding>& out) {
    const Drawing& d = net.drawing();
    for (auto& parts : net.loops()) {
        auto f = makeFinding("topology.loop", parts,
                             "closed loop or parallel sources through " + tagList(d, parts) +
                                 "; fault and voltage studies solve it by nodal analysis");
        f.computed = static_cast<double>(parts.size());
        f.trace = {{"branches or sources closing the loop", tagList(d, parts)}};
        out.push_back(std::move(f));
    }
}

void voltage(const Network& net, std::vector<Finding>& out) {
    const Drawing& d = net.drawing();
    for (const auto& c : net.voltageConflicts()) {
        const bool motor = d.part(c.part)->kind == PartKind::Motor;
        auto f = makeFinding("topology.voltage.mismatch", {c.part},
                             tagOf(d, c.part) + ": " + c.what + " " + formatNumber(c.ratedV) +
                                 " V on a " + formatNumber(c.systemV) + " V system");
        f.computed = c.systemV;
        f.limit = c.ratedV;
        f.unit = "V";
        const double tol = motor ? 10.0 : 5.0;
        f.trace = {
            {"system voltage at the part", formatNumber(c.systemV) + " V"},
            {"rated voltage", formatNumber(c.ratedV) + " V"},
            {"difference",
             formatNumber(std::round(std::abs(c.systemV - c.ratedV) / c.ratedV * 1000.0) / 10.0) +
                 " %"},
            {"accepted difference", formatNumber(tol) + " % of rated"}};
        f.fix = Fix{"use equipment rated for the " + formatNumber(c.systemV) +
                        " V system, or feed it from a system of its voltage",
                    {}};
        out.push_back(std::move(f));
    }
}

void motorOverload(const Network& net, std::vector<Finding>& out) {
    const Drawing& d = net.drawing();
    for (const auto& p : d.parts()) {
        if (p.kind != PartKind::Motor || !net.partReachable(p.id))
            continue;
        auto chain = net.branchChain(p.id);
        // A drive provides the motor's overload protection (NEC 2023 430.124(A)): its branch
        // needs no separate relay. A soft starter does not; its branch still does.
        const bool has = std::any_of(chain.begin(), chain.end(), [&](PartId id) {
            const PartKind k = d.part(id)->kind;
            return k == PartKind::Overload || k == PartKind::Vfd;
        });
        if (has)
            continue;
        std::vector<PartId> parts{p.id};
        parts.insert(parts.end(), chain.begin(), chain.end());
        auto f = makeFinding("topology.motor.no_overload", parts,
                             tagOf(d, p.id) + " has no overload relay in its branch" +
                                 (chain.empty() ? "" : " (" + tagList(d, chain) + ")"));
        f.trace = {{"branch parts from the motor to its bus",
                    chain.empty() ? "(none)" : tagList(d, chain)}};
        f.fix = Fix{"add an overload relay sized from the nameplate full-load current", {}};
        out.push_back(std::move(f));
    }
}

void instBreakerOverload(const Network& net, std::vector<Finding>& out) {
    const Drawing& d = net.drawing();
    for (const auto& p : d.parts()) {
        if (p.kind != PartKind::InstBreaker)
            continue;
        const Bucket* b = d.bucketOf(p.id);
        bool has = false;
        if (b)
            for (auto id : b->parts)
                has = has || d.part(id)->kind == PartKind::Overload;
        if (has)
            continue;
        auto f = makeFinding("topology.inst_breaker.no_overload", {p.id},
                             b ? tagOf(d, p.id) + " is in bucket " + b->tag +
                                     ", which holds no overload relay"
                               : tagOf(d, p.id) + " is in no bucket; an instantaneous-only "
                                                  "breaker is allowed only as part of a listed "
                                                  "combination starter with overload protection");
        f.trace = {{"bucket", b ? b->tag : "(none)"}};
        f.fix = Fix{b ? "add the bucket's overload relay to it"
                      : "put the breaker in a bucket with its contactor and overload relay",
                    {}};
        out.push_back(std::move(f));
    }
}

void dangling(const Network& net, std::vector<Finding>& out) {
    const Drawing& d = net.drawing();
    for (const auto& p : d.parts()) {
        const auto& terms = kindInfo(p.kind).terminals;
        for (std::size_t t = 0; t < terms.size(); ++t) {
            if (net.wireCount(p.id, static_cast<int>(t)) > 0)
                continue;
            auto f = makeFinding("topology.dangling", {p.id},
                                 tagOf(d, p.id) + ": terminal '" + std::string(terms[t]) +
                                     "' has no wire");
            f.trace = {{"terminal", std::string(terms[t])}};
            f.fix = Fix{"wire the terminal or delete the part", {}};
            out.push_back(std::move(f));
        }
    }
}

} // namespace

void checkTopology(const Network& net, std::vector<Finding>& out) {
    unfed(net, out);
    deenergized(net, out);
    loops(net, out);
    voltage(net, out);
    motorOverload(net, out);
    instBreakerOverload(net, out);
    dangling(net, out);
}

} // namespace lineward
