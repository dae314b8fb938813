// Supply tree: one breadth-first walk; queries walk it up or down.
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
    }
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

std::vector<PartId> Flow::loadsBelow(NodeIndex n) const {
    const auto& g = m_net.graph();
    const Drawing& d = m_net.drawing();
    std::vector<PartId> out;
    std::deque<NodeIndex> queue{n};
    while (!queue.empty()) {
        auto v = queue.front();
        queue.pop_front();
        for (auto id : g[v].attached) {
            const auto k = d.part(id)->kind;
            if (k == PartKind::Motor || k == PartKind::Load)
                out.push_back(id);
        }
        for (const auto& e : m_children[v])
            queue.push_back(boost::target(e, g));
    }
    return out;
}

std::optional<PartId> Flow::protectionAbove(NodeIndex n) const {
    const auto& g = m_net.graph();
    const Drawing& d = m_net.drawing();
    std::size_t guard = 0;
    while (m_parentEdge[n] && guard++ < m_parentEdge.size()) {
        const PartId p = g[*m_parentEdge[n]].part;
        if (kindInfo(d.part(p)->kind).protective)
            return p;
        n = boost::source(*m_parentEdge[n], g) == n ? boost::target(*m_parentEdge[n], g)
                                                    : boost::source(*m_parentEdge[n], g);
    }
    return std::nullopt;
}

} // namespace lineward
