// Supply tree: one breadth-first walk, then every per-node answer laid out once, so no query
// walks the tree (a chain of 50,000 parts costs no more per part than a short branch).
#include "topology/flow.h"

#include <deque>

namespace lineward {

Flow::Flow(const Network& net) : m_net(net) {
    const auto& g = net.graph();
    const auto n = boost::num_vertices(g);
    m_parentEdge.assign(n, std::nullopt);
    m_children.assign(n, {});
    std::vector<char> seen(n, 0);
    std::deque<NodeIndex> queue;
    for (auto s : net.sources()) {
        auto v = net.nodeOf(s, 0);
        if (!seen[v]) {
            seen[v] = 1;
            queue.push_back(v);
        }
    }
    while (!queue.empty()) {
        auto v = queue.front();
        queue.pop_front();
        for (auto [e, end] = boost::out_edges(v, g); e != end; ++e) {
            if (!g[*e].closed)
                continue;
            auto t = boost::target(*e, g);
            if (seen[t])
                continue;
            seen[t] = 1;
            m_parentEdge[t] = *e;
            m_children[v].push_back(*e);
            queue.push_back(t);
        }
        m_order.push_back(v);
    }
    // Nearest protection above each node, passed down the tree in breadth-first order.
    const Drawing& d = net.drawing();
    m_protection.assign(n, std::nullopt);
    m_curveDevice.assign(n, std::nullopt);
    for (auto v : m_order)
        for (const auto& e : m_children[v]) {
            const PartId p = g[e].part;
            const auto t = boost::target(e, g);
            const auto kind = d.part(p)->kind;
            const bool protective = kindInfo(kind).protective;
            m_protection[t] = protective ? std::optional(p) : m_protection[v];
            m_curveDevice[t] =
                protective || kind == PartKind::Overload ? std::optional(p) : m_curveDevice[v];
        }
    layOutLoads();
}

void Flow::layOutLoads() {
    // Depth-first preorder with an explicit stack: each node's loads and its subtree's loads
    // are one contiguous range. Unfed nodes get their own loads only.
    const auto& g = m_net.graph();
    const Drawing& d = m_net.drawing();
    const auto n = boost::num_vertices(g);
    m_loadRange.assign(n, {0, 0});
    std::vector<char> done(n, 0);
    auto ownLoads = [&](NodeIndex v) {
        for (auto id : g[v].attached) {
            const auto k = d.part(id)->kind;
            if (k == PartKind::Motor || k == PartKind::Load)
                m_loads.push_back(id);
        }
    };
    std::vector<std::pair<NodeIndex, std::size_t>> stack; // node, next child
    auto enter = [&](NodeIndex v) {
        done[v] = 1;
        m_loadRange[v].first = m_loads.size();
        ownLoads(v);
        stack.push_back({v, 0});
    };
    for (std::size_t root = 0; root < n; ++root) {
        if (done[root] || m_parentEdge[root])
            continue;
        enter(root);
        while (!stack.empty()) {
            auto& [v, next] = stack.back();
            if (next < m_children[v].size()) {
                const auto child = boost::target(m_children[v][next++], g);
                enter(child);
                continue;
            }
            m_loadRange[v].second = m_loads.size();
            stack.pop_back();
        }
    }
}

std::optional<NodeIndex> Flow::parentNode(NodeIndex n) const {
    if (!m_parentEdge[n])
        return std::nullopt;
    const auto& g = m_net.graph();
    const auto e = *m_parentEdge[n];
    return boost::source(e, g) == n ? boost::target(e, g) : boost::source(e, g);
}

NodeIndex Flow::lineNode(PartId part) const {
    auto a = m_net.nodeOf(part, 0), b = m_net.nodeOf(part, 1);
    const auto& g = m_net.graph();
    if (m_parentEdge[a] && g[*m_parentEdge[a]].part == part)
        return b;
    return a;
}

NodeIndex Flow::loadNode(PartId part) const {
    auto a = m_net.nodeOf(part, 0), b = m_net.nodeOf(part, 1);
    return lineNode(part) == a ? b : a;
}

std::optional<PartId> Flow::feedingBranch(NodeIndex n) const {
    if (!m_parentEdge[n])
        return std::nullopt;
    return m_net.graph()[*m_parentEdge[n]].part;
}

std::span<const PartId> Flow::loadsBelow(NodeIndex n) const {
    const auto [first, last] = m_loadRange[n];
    return std::span<const PartId>(m_loads).subspan(first, last - first);
}

std::optional<PartId> Flow::protectionAbove(NodeIndex n) const {
    return m_protection[n];
}

std::optional<PartId> Flow::curveDeviceAbove(NodeIndex n) const {
    return m_curveDevice[n];
}

} // namespace lineward
