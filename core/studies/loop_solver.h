// Z = Y⁻¹ entries and Y v = i for networks with few loops in linear time: the tree solver on a
// spanning forest, corrected for the branches left out (chords) by a low-rank (Woodbury) update.
#pragma once

#include "studies/tree_solver.h"

#include <Eigen/Dense>
#include <memory>
#include <optional>
#include <vector>

namespace lineward {

/// With Y = Y_t + A·diag(y)·Aᵀ (Y_t: the forest and every shunt; A's column c is e_a − e_b for
/// chord c) and W = Z_t·A, Z = Z_t − W·M⁻¹·Wᵀ where M = diag(z) + Aᵀ·W (Y is symmetric: no
/// phase-shifting elements). Each tree of the forest carries its own chords, so W and M are
/// kept per tree: cost O(Σ n_t·k_t + k_t³), linear in buses for a few loops per tree.
class LoopSolver {
public:
    /// Above this many chords in one tree the dense k×k correction costs more than the sparse
    /// LU: the caller uses the LU instead.
    static constexpr int kMaxChordsPerTree = 64;

    enum class Outcome {
        Solved,       ///< the solver is ready
        TooManyLoops, ///< a tree has more than kMaxChordsPerTree chords: use the sparse LU
        Singular,     ///< a correction matrix M did not factorise (or the test seam forced it)
    };
    struct Built {
        Outcome outcome;
        std::unique_ptr<LoopSolver> solver; ///< set when Solved
    };
    /// `withMotors` adds the motors' fault-contribution shunts, as for Admittance.
    static Built build(const NetworkModel& m, bool withMotors);

    /// Driving-point impedance Z_kk.
    Complex zth(int bus) const;
    /// Transfer impedance Z_ab (= Z_ba).
    Complex transfer(int a, int b) const;
    /// Solves Y v = i: the tree solve, less the chords' circulating currents' share.
    std::vector<Complex> solve(const std::vector<Complex>& injections) const;
    /// Branches left out of the spanning forest (one per independent loop).
    int chordCount() const { return m_chords; }

private:
    struct Chord {
        int a, b;
        Complex z;
    };
    /// A tree of the forest with chords: W over its buses (in tree order), M⁻¹, and the
    /// diagonal correction (W·M⁻¹·Wᵀ)_kk.
    struct Block {
        int tree = -1;
        std::vector<Chord> chords;
        Eigen::MatrixXcd w, mInv;
        Eigen::VectorXcd diag;
    };
    bool correct(Block& b, std::vector<Complex>& current, std::vector<Complex>& volt);
    const Block* blockOf(int bus) const;

    std::optional<TreeSolver> m_tree;
    std::vector<Block> m_blocks;
    std::vector<int> m_blockOfTree; ///< by tree: index into m_blocks, or −1
    int m_chords = 0;
};

} // namespace lineward
