// Two-pass admittance recursion. Y_down[v] = y_shunt[v] + Σ_children Y_c / (1 + z_c·Y_c), where
// Y_c = Y_down[child]; Y_up[child] = Y_rest / (1 + z_c·Y_rest) with Y_rest = Y_down[v] +
// Y_up[v] − contribution of that child. Written as Y/(1 + zY) so empty subtrees (Y = 0) need no
// special case.
#include "studies/tree_solver.h"

#include <deque>

namespace lineward {

namespace {
Complex through(Complex z, Complex y) {
    return y / (1.0 + z * y);
}
} // namespace

std::optional<TreeSolver> TreeSolver::build(const NetworkModel& m, bool withMotors) {
    const int n = m.busCount();
    std::vector<std::vector<std::pair<int, Complex>>> adj(static_cast<std::size_t>(n));
    for (const auto& b : m.branches) {
        if (b.from == b.to)
            return std::nullopt;
        adj[static_cast<std::size_t>(b.from)].push_back({b.to, b.z});
        adj[static_cast<std::size_t>(b.to)].push_back({b.from, b.z});
    }
    TreeSolver t;
    t.m_parent.assign(static_cast<std::size_t>(n), -2);
    t.m_zParent.assign(static_cast<std::size_t>(n), 0);
    std::vector<Complex> shunt(static_cast<std::size_t>(n), Complex(1e-12, 0));
    for (const auto& s : m.sources)
        shunt[static_cast<std::size_t>(s.bus)] += 1.0 / s.z;
    if (withMotors)
        for (const auto& s : m.motors)
            shunt[static_cast<std::size_t>(s.bus)] += 1.0 / s.z;
    std::vector<int> order;
    order.reserve(static_cast<std::size_t>(n));
    std::size_t edgesSeen = 0;
    // Root each tree at a source so "up" means toward the supply.
    std::vector<int> roots;
    for (const auto& s : m.sources)
        roots.push_back(s.bus);
    for (int i = 0; i < n; ++i)
        roots.push_back(i);
    for (int root : roots) {
        if (t.m_parent[static_cast<std::size_t>(root)] != -2)
            continue;
        t.m_parent[static_cast<std::size_t>(root)] = -1;
        std::deque<int> queue{root};
        while (!queue.empty()) {
            const int v = queue.front();
            queue.pop_front();
            order.push_back(v);
            for (auto [w, z] : adj[static_cast<std::size_t>(v)]) {
                if (w == t.m_parent[static_cast<std::size_t>(v)] &&
                    z == t.m_zParent[static_cast<std::size_t>(v)])
                    continue; // the branch we came by (parallel branches are caught below)
                if (t.m_parent[static_cast<std::size_t>(w)] != -2)
                    return std::nullopt; // reached twice: a loop
                t.m_parent[static_cast<std::size_t>(w)] = v;
                t.m_zParent[static_cast<std::size_t>(w)] = z;
                ++edgesSeen;
                queue.push_back(w);
            }
        }
    }
    if (edgesSeen != m.branches.size())
        return std::nullopt;
    t.m_order = order;
    t.m_down = shunt;
    for (auto it = order.rbegin(); it != order.rend(); ++it) {
        const int p = t.m_parent[static_cast<std::size_t>(*it)];
        if (p >= 0)
            t.m_down[static_cast<std::size_t>(p)] +=
                through(t.m_zParent[static_cast<std::size_t>(*it)],
                        t.m_down[static_cast<std::size_t>(*it)]);
    }
    t.m_up.assign(static_cast<std::size_t>(n), 0);
    for (int v : order) {
        const int p = t.m_parent[static_cast<std::size_t>(v)];
        if (p < 0)
            continue;
        const Complex z = t.m_zParent[static_cast<std::size_t>(v)];
        const Complex rest = t.m_down[static_cast<std::size_t>(p)] +
                             t.m_up[static_cast<std::size_t>(p)] -
                             through(z, t.m_down[static_cast<std::size_t>(v)]);
        t.m_up[static_cast<std::size_t>(v)] = through(z, rest);
    }
    return t;
}

std::optional<Complex> TreeSolver::transfer(int from, int to) const {
    Complex z = zth(from);
    int v = from;
    while (v != to) {
        const int p = m_parent[static_cast<std::size_t>(v)];
        if (p < 0)
            return std::nullopt;
        // Voltage divider from v up to p: everything at p except v's branch, against that branch.
        const Complex zv = m_zParent[static_cast<std::size_t>(v)];
        const Complex rest = m_down[static_cast<std::size_t>(p)] +
                             m_up[static_cast<std::size_t>(p)] -
                             through(zv, m_down[static_cast<std::size_t>(v)]);
        z *= 1.0 / (1.0 + zv * rest);
        v = p;
    }
    return z;
}

} // namespace lineward

namespace lineward {

std::vector<Complex> TreeSolver::solve(const std::vector<Complex>& inj) const {
    const std::size_t n = m_parent.size();
    // Norton current of each subtree as seen at its top: I' = I / (1 + z·Y) through a branch.
    std::vector<Complex> current(inj.begin(), inj.end());
    current.resize(n, 0);
    for (auto it = m_order.rbegin(); it != m_order.rend(); ++it) {
        const auto v = static_cast<std::size_t>(*it);
        const int p = m_parent[v];
        if (p >= 0)
            current[static_cast<std::size_t>(p)] += current[v] / (1.0 + m_zParent[v] * m_down[v]);
    }
    std::vector<Complex> volt(n, 0);
    for (int vi : m_order) {
        const auto v = static_cast<std::size_t>(vi);
        const int p = m_parent[v];
        if (p < 0)
            volt[v] = current[v] / m_down[v];
        else // (V_p − V_v)/z + I_v = Y_v·V_v
            volt[v] = (volt[static_cast<std::size_t>(p)] + m_zParent[v] * current[v]) /
                      (1.0 + m_zParent[v] * m_down[v]);
    }
    return volt;
}

} // namespace lineward
