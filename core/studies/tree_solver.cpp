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
std::size_t at(int i) {
    return static_cast<std::size_t>(i);
}
} // namespace

std::vector<Complex> TreeSolver::shunts(const NetworkModel& m, bool withMotors) {
    std::vector<Complex> shunt(at(m.busCount()), Complex(kGroundLeakPu, 0));
    for (const auto& s : m.sources)
        shunt[at(s.bus)] += 1.0 / s.z;
    if (withMotors)
        for (const auto& s : m.motors)
            shunt[at(s.bus)] += 1.0 / s.z;
    return shunt;
}

std::optional<TreeSolver> TreeSolver::build(const NetworkModel& m, bool withMotors) {
    return build(m.branches, shunts(m, withMotors), m.sources);
}

std::optional<TreeSolver> TreeSolver::build(const std::vector<ModelBranch>& branches,
                                            std::vector<Complex> shunt,
                                            const std::vector<ModelShunt>& sources) {
    const int n = static_cast<int>(shunt.size());
    std::vector<std::vector<std::pair<int, int>>> adj(at(n)); // (neighbour, branch index)
    for (std::size_t i = 0; i < branches.size(); ++i) {
        const auto& b = branches[i];
        if (b.from == b.to)
            return std::nullopt;
        adj[at(b.from)].push_back({b.to, static_cast<int>(i)});
        adj[at(b.to)].push_back({b.from, static_cast<int>(i)});
    }
    TreeSolver t;
    t.m_parent.assign(at(n), -2);
    t.m_zParent.assign(at(n), 0);
    t.m_tree.assign(at(n), -1);
    t.m_depth.assign(at(n), 0);
    std::vector<int> via(at(n), -1); // branch to the parent
    t.m_order.reserve(at(n));
    // Root each tree at a source so "up" means toward the supply.
    std::vector<int> roots;
    for (const auto& s : sources)
        roots.push_back(s.bus);
    for (int i = 0; i < n; ++i)
        roots.push_back(i);
    for (int root : roots) {
        if (t.m_parent[at(root)] != -2)
            continue;
        t.m_parent[at(root)] = -1;
        t.m_treeStart.push_back(static_cast<int>(t.m_order.size()));
        const int tree = static_cast<int>(t.m_treeStart.size()) - 1;
        std::deque<int> queue{root};
        while (!queue.empty()) {
            const int v = queue.front();
            queue.pop_front();
            t.m_tree[at(v)] = tree;
            t.m_order.push_back(v);
            for (auto [w, bi] : adj[at(v)]) {
                if (bi == via[at(v)])
                    continue; // the branch we came by
                if (t.m_parent[at(w)] != -2)
                    return std::nullopt; // reached twice: a loop (or parallel branches)
                t.m_parent[at(w)] = v;
                t.m_zParent[at(w)] = branches[at(bi)].z;
                t.m_depth[at(w)] = t.m_depth[at(v)] + 1;
                via[at(w)] = bi;
                queue.push_back(w);
            }
        }
    }
    t.m_treeStart.push_back(n);
    t.m_pos.assign(at(n), 0);
    for (int i = 0; i < n; ++i)
        t.m_pos[at(t.m_order[at(i)])] = i;
    t.m_down = std::move(shunt);
    t.sweep();
    return t;
}

void TreeSolver::sweep() {
    for (auto it = m_order.rbegin(); it != m_order.rend(); ++it) {
        const int p = m_parent[at(*it)];
        if (p >= 0)
            m_down[at(p)] += through(m_zParent[at(*it)], m_down[at(*it)]);
    }
    m_up.assign(m_order.size(), 0);
    for (int v : m_order) {
        const int p = m_parent[at(v)];
        if (p < 0)
            continue;
        const Complex z = m_zParent[at(v)];
        const Complex rest = m_down[at(p)] + m_up[at(p)] - through(z, m_down[at(v)]);
        m_up[at(v)] = through(z, rest);
    }
}

Complex TreeSolver::upRatio(int v) const {
    // Voltage divider from v up to p: everything at p except v's branch, against that branch.
    const int p = m_parent[at(v)];
    const Complex zv = m_zParent[at(v)];
    const Complex rest = m_down[at(p)] + m_up[at(p)] - through(zv, m_down[at(v)]);
    return 1.0 / (1.0 + zv * rest);
}

std::optional<Complex> TreeSolver::transfer(int from, int to) const {
    Complex z = zth(from);
    for (int v = from; v != to; v = m_parent[at(v)]) {
        if (m_parent[at(v)] < 0)
            return std::nullopt;
        z *= upRatio(v);
    }
    return z;
}

Complex TreeSolver::transferAny(int from, int to) const {
    if (treeOf(from) != treeOf(to))
        return 0;
    // Up from `from`: the divider of each branch; down to `to`, with no injection below, each
    // branch divides V_child = V_parent / (1 + z·Y_down[child]).
    Complex up = zth(from), down = 1.0;
    int a = from, b = to;
    while (a != b) {
        if (m_depth[at(a)] >= m_depth[at(b)]) {
            up *= upRatio(a);
            a = m_parent[at(a)];
        } else {
            down /= 1.0 + m_zParent[at(b)] * m_down[at(b)];
            b = m_parent[at(b)];
        }
    }
    return up * down;
}

std::span<const int> TreeSolver::treeBuses(int tree) const {
    const auto first = at(m_treeStart[at(tree)]);
    const auto last = at(m_treeStart[at(tree) + 1]);
    return std::span<const int>(m_order).subspan(first, last - first);
}

int TreeSolver::indexInTree(int bus) const {
    return m_pos[at(bus)] - m_treeStart[at(treeOf(bus))];
}

void TreeSolver::solveTree(int tree, std::vector<Complex>& current,
                           std::vector<Complex>& volt) const {
    const auto buses = treeBuses(tree);
    // Norton current of each subtree as seen at its top: I' = I / (1 + z·Y) through a branch.
    for (auto it = buses.rbegin(); it != buses.rend(); ++it) {
        const auto v = at(*it);
        const int p = m_parent[v];
        if (p >= 0)
            current[at(p)] += current[v] / (1.0 + m_zParent[v] * m_down[v]);
    }
    for (int vi : buses) {
        const auto v = at(vi);
        const int p = m_parent[v];
        if (p < 0)
            volt[v] = current[v] / m_down[v];
        else // (V_p − V_v)/z + I_v = Y_v·V_v
            volt[v] = (volt[at(p)] + m_zParent[v] * current[v]) / (1.0 + m_zParent[v] * m_down[v]);
    }
}

std::vector<Complex> TreeSolver::solve(const std::vector<Complex>& inj) const {
    const std::size_t n = m_parent.size();
    std::vector<Complex> current(inj.begin(), inj.end());
    current.resize(n, 0);
    std::vector<Complex> volt(n, 0);
    for (int tree = 0; tree + 1 < static_cast<int>(m_treeStart.size()); ++tree)
        solveTree(tree, current, volt);
    return volt;
}

} // namespace lineward
