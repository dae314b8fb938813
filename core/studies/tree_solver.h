// Thevenin impedances on a radial (tree) bus network in linear time: one pass up the tree and
// one pass down. The loop solver (loop_solver.h) builds it on a spanning forest of a meshed
// network and corrects for the branches left out; tests check both against the sparse LU.
#pragma once

#include "studies/network_model.h"

#include <optional>
#include <span>
#include <vector>

namespace lineward {

/// Per-bus Thevenin impedances and the voltage-transfer ratios toward the root of each tree.
class TreeSolver {
public:
    /// Builds the solver when the branches form a forest; nothing when there is a loop.
    static std::optional<TreeSolver> build(const NetworkModel& m, bool withMotors);
    /// The same on given branches and per-bus shunt admittances (see `shunts`).
    static std::optional<TreeSolver> build(const std::vector<ModelBranch>& branches,
                                           std::vector<Complex> shunt,
                                           const std::vector<ModelShunt>& sources);
    /// Shunt admittance to ground at every bus: sources, motors when asked, and a negligible
    /// shunt everywhere so an island without a source stays regular (as in Admittance).
    static std::vector<Complex> shunts(const NetworkModel& m, bool withMotors);

    /// Thevenin (driving-point) impedance at a bus.
    Complex zth(int bus) const {
        return 1.0 / (m_down[static_cast<std::size_t>(bus)] + m_up[static_cast<std::size_t>(bus)]);
    }
    /// Transfer impedance: voltage at `to` per unit current injected at `from`, where `to` is
    /// `from` or one of its ancestors; nothing otherwise.
    std::optional<Complex> transfer(int from, int to) const;
    /// Transfer impedance between any two buses (zero between two trees): up from `from` to
    /// the lowest common ancestor, then down to `to`. Costs the length of that path.
    Complex transferAny(int from, int to) const;
    /// Solves Y v = i exactly in linear time: Norton equivalents up the tree, voltages down.
    std::vector<Complex> solve(const std::vector<Complex>& injections) const;

    /// The trees of the forest; each tree's buses lie together in breadth-first order.
    int treeOf(int bus) const { return m_tree[static_cast<std::size_t>(bus)]; }
    int treeCount() const { return static_cast<int>(m_treeStart.size()) - 1; }
    std::span<const int> treeBuses(int tree) const;
    /// Index of a bus within `treeBuses(treeOf(bus))`.
    int indexInTree(int bus) const;
    /// Solves Y v = i on one tree only, in time proportional to its size. `current` holds the
    /// injections (full length) and is left holding the subtrees' Norton currents; the tree's
    /// entries of `volt` are overwritten.
    void solveTree(int tree, std::vector<Complex>& current, std::vector<Complex>& volt) const;

private:
    void sweep();                 ///< m_down (holding the shunts) up the tree, then m_up down
    Complex upRatio(int v) const; ///< V_parent / V_v for current injected at or below v
    std::vector<int> m_order;     ///< breadth-first order, roots first, tree by tree
    std::vector<int> m_treeStart; ///< where each tree starts in m_order, then the size
    std::vector<int> m_tree, m_pos, m_depth;
    std::vector<int> m_parent;
    std::vector<Complex> m_zParent;    ///< impedance of the branch to the parent
    std::vector<Complex> m_down, m_up; ///< admittance looking into the subtree / toward the rest
};

} // namespace lineward
