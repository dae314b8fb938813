// The spanning forest is chosen by union-find in branch order; a branch joining two buses
// already connected is a chord. Self-loops are dropped: their admittance cancels in Y.
#include "studies/loop_solver.h"

#include "studies/admittance.h"

#include <Eigen/LU>
#include <numeric>

namespace lineward {

namespace {
// Smallest reciprocal condition number of a loop block's correction matrix that the solver
// trusts: below it, about 13 of the 16 significant digits of a double would be lost and the
// study falls back to the sparse LU, which factorises the whole matrix afresh.
constexpr double kMinReciprocalCondition = 1e-13;
} // namespace

namespace {
std::size_t at(int i) {
    return static_cast<std::size_t>(i);
}
int findRoot(std::vector<int>& parent, int v) {
    while (parent[at(v)] != v) {
        parent[at(v)] = parent[at(parent[at(v)])]; // path halving keeps the forest shallow
        v = parent[at(v)];
    }
    return v;
}
} // namespace

LoopSolver::Built LoopSolver::build(const NetworkModel& m, bool withMotors) {
    const int n = m.busCount();
    std::vector<int> uf(at(n));
    std::iota(uf.begin(), uf.end(), 0);
    std::vector<ModelBranch> forest;
    std::vector<Chord> chords;
    for (const auto& b : m.branches) {
        if (b.from == b.to)
            continue;
        const int ra = findRoot(uf, b.from), rb = findRoot(uf, b.to);
        if (ra == rb) {
            chords.push_back({b.from, b.to, b.z});
        } else {
            uf[at(ra)] = rb;
            forest.push_back(b);
        }
    }
    auto solver = std::make_unique<LoopSolver>();
    LoopSolver& s = *solver;
    s.m_tree = TreeSolver::build(forest, TreeSolver::shunts(m, withMotors), m.sources);
    s.m_chords = static_cast<int>(chords.size());
    s.m_blockOfTree.assign(at(s.m_tree->treeCount()), -1);
    for (const auto& c : chords) {
        int& bi = s.m_blockOfTree[at(s.m_tree->treeOf(c.a))];
        if (bi < 0) {
            bi = static_cast<int>(s.m_blocks.size());
            s.m_blocks.push_back({});
            s.m_blocks.back().tree = s.m_tree->treeOf(c.a);
        }
        s.m_blocks[at(bi)].chords.push_back(c);
        if (static_cast<int>(s.m_blocks[at(bi)].chords.size()) > kMaxChordsPerTree)
            return {Outcome::TooManyLoops, nullptr};
    }
    // The seam fails the meshed solve as it fails the LU, so the failure path stays tested.
    if (s.m_chords > 0 && Admittance::failForTests)
        return {Outcome::Singular, nullptr};
    std::vector<Complex> current(at(n), 0), volt(at(n), 0); // shared: O(n) once, not per tree
    for (auto& b : s.m_blocks)
        if (!s.correct(b, current, volt))
            return {Outcome::Singular, nullptr};
    return {Outcome::Solved, std::move(solver)};
}

bool LoopSolver::correct(Block& b, std::vector<Complex>& current, std::vector<Complex>& volt) {
    const auto buses = m_tree->treeBuses(b.tree);
    const auto nt = static_cast<Eigen::Index>(buses.size());
    const auto k = static_cast<Eigen::Index>(b.chords.size());
    // W = Z_t·A, one tree solve per chord: +1 at one end, −1 at the other (one solve rather
    // than two differenced, which would cancel digits).
    b.w.resize(nt, k);
    for (Eigen::Index c = 0; c < k; ++c) {
        current[at(b.chords[at(static_cast<int>(c))].a)] += 1.0;
        current[at(b.chords[at(static_cast<int>(c))].b)] -= 1.0;
        m_tree->solveTree(b.tree, current, volt);
        for (Eigen::Index i = 0; i < nt; ++i) {
            const auto v = at(buses[at(static_cast<int>(i))]);
            b.w(i, c) = volt[v];
            current[v] = 0;
        }
    }
    // M = diag(z) + Aᵀ·W: row c is W at chord c's first end less W at its second.
    Eigen::MatrixXcd mm(k, k);
    for (Eigen::Index c = 0; c < k; ++c) {
        const auto& ch = b.chords[at(static_cast<int>(c))];
        mm.row(c) = b.w.row(m_tree->indexInTree(ch.a)) - b.w.row(m_tree->indexInTree(ch.b));
        mm(c, c) += ch.z;
    }
    const Eigen::PartialPivLU<Eigen::MatrixXcd> lu(mm);
    if (!(lu.rcond() > kMinReciprocalCondition)) // also false for NaN
        return false;
    b.mInv = lu.inverse();
    if (!b.mInv.allFinite())
        return false;
    b.diag = ((b.w * b.mInv).array() * b.w.array()).rowwise().sum();
    return true;
}

const LoopSolver::Block* LoopSolver::blockOf(int bus) const {
    const int bi = m_blockOfTree[at(m_tree->treeOf(bus))];
    return bi < 0 ? nullptr : &m_blocks[at(bi)];
}

Complex LoopSolver::zth(int bus) const {
    const Complex z = m_tree->zth(bus);
    const Block* b = blockOf(bus);
    return b ? z - b->diag[m_tree->indexInTree(bus)] : z;
}

Complex LoopSolver::transfer(int a, int bus) const {
    const Complex z = m_tree->transferAny(a, bus);
    const Block* b = blockOf(a);
    if (!b || m_tree->treeOf(a) != m_tree->treeOf(bus))
        return z;
    const auto ia = m_tree->indexInTree(a), ib = m_tree->indexInTree(bus);
    return z - (b->w.row(ia) * b->mInv * b->w.row(ib).transpose()).value();
}

std::vector<Complex> LoopSolver::solve(const std::vector<Complex>& injections) const {
    std::vector<Complex> v = m_tree->solve(injections);
    for (const auto& b : m_blocks) {
        // v = v_t − W·M⁻¹·Aᵀ·v_t: Aᵀ·v_t is the tree voltage across each chord.
        Eigen::VectorXcd across(static_cast<Eigen::Index>(b.chords.size()));
        for (std::size_t c = 0; c < b.chords.size(); ++c)
            across[static_cast<Eigen::Index>(c)] = v[at(b.chords[c].a)] - v[at(b.chords[c].b)];
        const Eigen::VectorXcd share = b.w * (b.mInv * across);
        const auto buses = m_tree->treeBuses(b.tree);
        for (std::size_t i = 0; i < buses.size(); ++i)
            v[at(buses[i])] -= share[static_cast<Eigen::Index>(i)];
    }
    return v;
}

} // namespace lineward
