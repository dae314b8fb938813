// Builds the network: union-find over wired terminals, then walks from the sources.
#include "topology/network.h"

#include "model/ratings.h"

#include <cmath>
#include <deque>
#include <numeric>

namespace lineward {

namespace {

struct UnionFind {
    std::vector<std::size_t> parent;
    explicit UnionFind(std::size_t n) : parent(n) { std::iota(parent.begin(), parent.end(), 0); }
    std::size_t find(std::size_t x) {
        while (parent[x] != x) {
            parent[x] = parent[parent[x]];
            x = parent[x];
        }
        return x;
    }
    void join(std::size_t a, std::size_t b) { parent[find(a)] = find(b); }
};

bool differs(double systemV, double ratedV, double tolerance) {
    return systemV > 0 && ratedV > 0 && std::abs(systemV - ratedV) > tolerance * ratedV;
}

} // namespace

Network::Network(const Drawing& drawing) : m_drawing(drawing) {
    buildNodes();
    walkReach();
    walkVoltage();
    checkRatedVoltages();
}

std::size_t Network::terminalSlot(PartId part, int terminal) const {
    return m_slotBase[*m_drawing.indexOf(part)] + static_cast<std::size_t>(terminal);
}

NodeIndex Network::nodeOf(PartId part, int terminal) const {
    return m_nodeOfSlot[terminalSlot(part, terminal)];
}

int Network::wireCount(PartId part, int terminal) const {
    return m_wiresOfSlot[terminalSlot(part, terminal)];
}

std::optional<BranchDesc> Network::branchOf(PartId part) const {
    auto i = m_drawing.indexOf(part);
    return i ? m_branchOfPart[*i] : std::nullopt;
}

void Network::buildNodes() {
    const auto& parts = m_drawing.parts();
    m_slotBase.resize(parts.size());
    std::size_t slots = 0;
    for (std::size_t i = 0; i < parts.size(); ++i) {
        m_slotBase[i] = slots;
        slots += kindInfo(parts[i].kind).terminals.size();
    }
    UnionFind uf(slots);
    m_wiresOfSlot.assign(slots, 0);
    for (const auto& w : m_drawing.wires()) {
        const auto a = terminalSlot(w.a.part, w.a.terminal),
                   b = terminalSlot(w.b.part, w.b.terminal);
        uf.join(a, b);
        ++m_wiresOfSlot[a];
        ++m_wiresOfSlot[b];
    }
    std::vector<NodeIndex> nodeOfRoot(slots, NetGraph::null_vertex());
    m_nodeOfSlot.resize(slots);
    for (std::size_t s = 0; s < slots; ++s) {
        const auto r = uf.find(s);
        if (nodeOfRoot[r] == NetGraph::null_vertex())
            nodeOfRoot[r] = boost::add_vertex(m_graph);
        m_nodeOfSlot[s] = nodeOfRoot[r];
    }
    m_branchOfPart.assign(parts.size(), std::nullopt);
    for (std::size_t i = 0; i < parts.size(); ++i) {
        const Part& p = parts[i];
        if (isTwoTerminal(p.kind)) {
            auto [e, ok] =
                boost::add_edge(m_nodeOfSlot[m_slotBase[i]], m_nodeOfSlot[m_slotBase[i] + 1],
                                BranchProps{p.id, !p.isOpen()}, m_graph);
            (void)ok;
            m_branchOfPart[i] = e;
        } else {
            m_graph[m_nodeOfSlot[m_slotBase[i]]].attached.push_back(p.id);
            if (p.kind == PartKind::Source)
                m_sources.push_back(p.id);
        }
    }
}

void Network::walkReach() {
    // Breadth-first from every source node: once over all branches, once over closed ones.
    for (bool closedOnly : {false, true}) {
        std::deque<NodeIndex> queue;
        for (auto s : m_sources) {
            auto n = nodeOf(s, 0);
            bool& flag = closedOnly ? m_graph[n].energized : m_graph[n].reachable;
            if (!flag) {
                flag = true;
                queue.push_back(n);
            }
        }
        while (!queue.empty()) {
            auto n = queue.front();
            queue.pop_front();
            for (auto [e, end] = boost::out_edges(n, m_graph); e != end; ++e) {
                if (closedOnly && !m_graph[*e].closed)
                    continue;
                auto t = boost::target(*e, m_graph);
                bool& flag = closedOnly ? m_graph[t].energized : m_graph[t].reachable;
                if (!flag) {
                    flag = true;
                    queue.push_back(t);
                }
            }
        }
    }
    // Components over closed branches, for loop counting.
    int comp = 0;
    for (auto [v, vend] = boost::vertices(m_graph); v != vend; ++v) {
        if (m_graph[*v].component >= 0)
            continue;
        std::deque<NodeIndex> queue{*v};
        m_graph[*v].component = comp;
        while (!queue.empty()) {
            auto n = queue.front();
            queue.pop_front();
            for (auto [e, end] = boost::out_edges(n, m_graph); e != end; ++e) {
                auto t = boost::target(*e, m_graph);
                if (m_graph[*e].closed && m_graph[t].component < 0) {
                    m_graph[t].component = comp;
                    queue.push_back(t);
                }
            }
        }
        ++comp;
    }
}

void Network::walkVoltage() {
    std::deque<NodeIndex> queue;
    for (auto s : m_sources) {
        const Part& src = *m_drawing.part(s);
        auto n = nodeOf(s, 0);
        const double v = ratedVolts(src);
        if (m_graph[n].nominalV == 0) {
            m_graph[n].nominalV = v;
            queue.push_back(n);
        } else if (differs(m_graph[n].nominalV, v, 0.05)) {
            m_conflicts.push_back({s, m_graph[n].nominalV, v, "source rated"});
        }
    }
    while (!queue.empty()) {
        auto n = queue.front();
        queue.pop_front();
        const double here = m_graph[n].nominalV;
        for (auto [e, end] = boost::out_edges(n, m_graph); e != end; ++e) {
            const Part& p = *m_drawing.part(m_graph[*e].part);
            auto t = boost::target(*e, m_graph);
            double there = here;
            if (p.kind == PartKind::Transformer) {
                const bool fromPrimary = nodeOf(p.id, 0) == n;
                const auto tx = TransformerRatings::of(p);
                const double ratedHere = fromPrimary ? tx.priV : tx.secV;
                if (differs(here, ratedHere, 0.05))
                    m_conflicts.push_back({p.id, here, ratedHere,
                                           fromPrimary ? "transformer primary rated"
                                                       : "transformer secondary rated"});
                there = fromPrimary ? tx.secV : tx.priV;
            }
            if (m_graph[t].nominalV == 0) {
                m_graph[t].nominalV = there;
                queue.push_back(t);
            }
        }
    }
}

void Network::checkRatedVoltages() {
    for (auto [v, vend] = boost::vertices(m_graph); v != vend; ++v) {
        const double sys = m_graph[*v].nominalV;
        for (auto pid : m_graph[*v].attached) {
            const Part& p = *m_drawing.part(pid);
            if (p.kind == PartKind::Source)
                continue;
            // NEMA MG 1-12.44: motors run at ±10 % of rated voltage (a 460 V motor on 480 V).
            const double tol = p.kind == PartKind::Motor ? 0.10 : 0.05;
            if (differs(sys, ratedVolts(p), tol))
                m_conflicts.push_back(
                    {pid, sys, ratedVolts(p), std::string(kindInfo(p.kind).name) + " rated"});
        }
    }
}

bool Network::partReachable(PartId part) const {
    const Part& p = *m_drawing.part(part);
    for (std::size_t t = 0; t < kindInfo(p.kind).terminals.size(); ++t)
        if (m_graph[nodeOf(part, static_cast<int>(t))].reachable)
            return true;
    return false;
}

bool Network::partEnergized(PartId part) const {
    const Part& p = *m_drawing.part(part);
    for (std::size_t t = 0; t < kindInfo(p.kind).terminals.size(); ++t)
        if (m_graph[nodeOf(part, static_cast<int>(t))].energized)
            return true;
    return false;
}

std::vector<PartId> Network::branchChain(PartId part) const {
    std::vector<PartId> chain;
    NodeIndex n = nodeOf(part, 0);
    std::optional<BranchDesc> came;
    while (true) {
        const auto& props = m_graph[n];
        // Stop at a junction: a bus or source here, or anything else attached beside the start.
        bool junction = false;
        for (auto a : props.attached)
            junction = junction || a != part;
        if (junction || boost::out_degree(n, m_graph) != (came ? 2u : 1u))
            break;
        std::optional<BranchDesc> next;
        for (auto [e, end] = boost::out_edges(n, m_graph); e != end; ++e)
            if (!came || m_graph[*e].part != m_graph[*came].part)
                next = *e;
        if (!next)
            break;
        const PartId bp = m_graph[*next].part;
        if (m_drawing.part(bp)->kind == PartKind::Transformer)
            break;
        chain.push_back(bp);
        came = next;
        n = boost::target(*next, m_graph);
        if (chain.size() > m_drawing.parts().size())
            break; // a ring of series parts with nothing attached; stop rather than loop
    }
    return chain;
}

std::vector<std::vector<PartId>> Network::loops() const {
    // A spanning forest over closed branches; every branch outside it closes a loop.
    const auto n = boost::num_vertices(m_graph);
    std::vector<char> seen(n, 0);
    std::vector<std::vector<PartId>> byComponent;
    std::vector<int> sourcesInComponent;
    for (auto s : m_sources) {
        const int c = m_graph[nodeOf(s, 0)].component;
        if (c >= static_cast<int>(sourcesInComponent.size()))
            sourcesInComponent.resize(static_cast<std::size_t>(c) + 1, 0);
        ++sourcesInComponent[static_cast<std::size_t>(c)];
    }
    std::vector<char> treeEdge(m_drawing.parts().size(), 0); // by part index: 1 tree, 2 loop
    for (std::size_t start = 0; start < n; ++start) {
        if (seen[start])
            continue;
        std::vector<PartId> extra;
        std::deque<NodeIndex> queue{start};
        seen[start] = 1;
        while (!queue.empty()) {
            auto v = queue.front();
            queue.pop_front();
            for (auto [e, end] = boost::out_edges(v, m_graph); e != end; ++e) {
                if (!m_graph[*e].closed)
                    continue;
                auto t = boost::target(*e, m_graph);
                const auto idx = *m_drawing.indexOf(m_graph[*e].part);
                if (!seen[t]) {
                    seen[t] = 1;
                    treeEdge[idx] = 1;
                    queue.push_back(t);
                } else if (!treeEdge[idx]) {
                    // each undirected edge is met from both ends; the mark counts it once
                    extra.push_back(m_graph[*e].part);
                    treeEdge[idx] = 2;
                }
            }
        }
        const int c = m_graph[start].component;
        const bool manySources = c < static_cast<int>(sourcesInComponent.size()) &&
                                 sourcesInComponent[static_cast<std::size_t>(c)] > 1;
        if (!extra.empty() || manySources) {
            if (manySources)
                for (auto s : m_sources)
                    if (m_graph[nodeOf(s, 0)].component == c)
                        extra.push_back(s);
            byComponent.push_back(std::move(extra));
        }
    }
    return byComponent;
}

} // namespace lineward
