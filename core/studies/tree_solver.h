// Thevenin impedances on a radial (tree) bus network in linear time: one pass up the tree and
// one pass down. The studies use it when the network has no loops and fall back to the sparse
// LU otherwise; tests check both give the same answer.
#pragma once

#include "studies/network_model.h"

#include <optional>
#include <vector>

namespace lineward {

/// Per-bus Thevenin impedances and the voltage-transfer ratios toward the root of each tree.
class TreeSolver {
public:
    /// Builds the solver when the branches form a forest; nothing when there is a loop.
    static std::optional<TreeSolver> build(const NetworkModel& m, bool withMotors);
    /// Thevenin (driving-point) impedance at a bus.
    Complex zth(int bus) const {
        return 1.0 / (m_down[static_cast<std::size_t>(bus)] + m_up[static_cast<std::size_t>(bus)]);
    }
    /// Transfer impedance: voltage at `to` per unit current injected at `from`, where `to` is
    /// `from` or one of its ancestors; nothing otherwise.
    std::optional<Complex> transfer(int from, int to) const;
    /// Solves Y v = i exactly in linear time: Norton equivalents up the tree, voltages down.
    std::vector<Complex> solve(const std::vector<Complex>& injections) const;

private:
    std::vector<int> m_order; ///< breadth-first order, roots first
    std::vector<int> m_parent;
    std::vector<Complex> m_zParent;    ///< impedance of the branch to the parent
    std::vector<Complex> m_down, m_up; ///< admittance looking into the subtree / toward the rest
};

} // namespace lineward
