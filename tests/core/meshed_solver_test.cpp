// The loop solver (tree solver on a spanning forest + Woodbury correction per chord) against the
// dense inverse and the sparse LU on random meshed networks, a hand case, and a whole plant.
#include "plant_generator.h"
#include "studies/admittance.h"
#include "studies/loop_solver.h"
#include "studies/study.h"
#include "test_support.h"

#include <Eigen/Dense>
#include <gtest/gtest.h>
#include <random>

using namespace lineward;

namespace {

Complex randomZ(std::mt19937& rng, double scale) {
    std::uniform_real_distribution<double> u(0.2, 1.0);
    return Complex(u(rng), 4 * u(rng)) * scale; // X/R between 0.8 and 20
}

// `islands` separate networks of `perIsland` buses: a random tree from each island's first
// bus, then ties between random buses, parallel twins of random branches, a second source in
// the first island, and motors.
NetworkModel randomMeshed(unsigned seed, int islands, int perIsland, int ties) {
    std::mt19937 rng(seed);
    NetworkModel m;
    const int n = islands * perIsland;
    m.baseV.assign(static_cast<std::size_t>(n), 480.0);
    auto pick = [&](int lo, int hi) { return std::uniform_int_distribution<int>(lo, hi)(rng); };
    for (int isl = 0; isl < islands; ++isl) {
        const int first = isl * perIsland;
        m.sources.push_back({first, randomZ(rng, 0.05), PartId(1)});
        for (int v = first + 1; v < first + perIsland; ++v)
            m.branches.push_back({pick(first, v - 1), v, randomZ(rng, 0.5), PartId(2)});
        for (int t = 0; t < ties; ++t) {
            const int a = pick(first, first + perIsland - 1),
                      b = pick(first, first + perIsland - 1);
            if (a != b)
                m.branches.push_back({a, b, randomZ(rng, 0.5), PartId(3)});
            const auto twin = m.branches[static_cast<std::size_t>(
                pick(0, static_cast<int>(m.branches.size()) - 1))];
            m.branches.push_back(twin); // two equal cables in parallel
        }
        m.motors.push_back({first + perIsland - 1, randomZ(rng, 20), PartId(4)});
    }
    m.sources.push_back({perIsland / 2, randomZ(rng, 0.1), PartId(5)});
    return m;
}

// Y assembled densely from the model, as Admittance assembles it sparsely.
Eigen::MatrixXcd denseY(const NetworkModel& m, bool withMotors) {
    const int n = m.busCount();
    Eigen::MatrixXcd y = Eigen::MatrixXcd::Zero(n, n);
    for (const auto& b : m.branches) {
        const Complex a = 1.0 / b.z;
        y(b.from, b.from) += a;
        y(b.to, b.to) += a;
        y(b.from, b.to) -= a;
        y(b.to, b.from) -= a;
    }
    for (const auto& s : m.sources)
        y(s.bus, s.bus) += 1.0 / s.z;
    if (withMotors)
        for (const auto& s : m.motors)
            y(s.bus, s.bus) += 1.0 / s.z;
    for (int i = 0; i < n; ++i)
        y(i, i) += 1e-12;
    return y;
}

void expectClose(Complex got, Complex want, const char* what, int a, int b) {
    EXPECT_LE(std::abs(got - want), 1e-9 * std::abs(want)) << what << " " << a << "," << b;
}

} // namespace

// Property: on random meshed networks (ties, parallel twins, two sources, islands) every Z
// entry and every solve equals the dense inverse, and the diagonal equals the LU's zColumn.
class LoopSolverProperty : public ::testing::TestWithParam<int> {};
TEST_P(LoopSolverProperty, EqualsDenseInverseAndSparseLu) {
    const NetworkModel m = randomMeshed(static_cast<unsigned>(GetParam()), 3, 14, 4);
    for (bool withMotors : {true, false}) {
        const auto built = LoopSolver::build(m, withMotors);
        ASSERT_EQ(built.outcome, LoopSolver::Outcome::Solved);
        const LoopSolver& s = *built.solver;
        EXPECT_GE(s.chordCount(), 3 * 4); // the ties and twins close loops in every island
        const Eigen::MatrixXcd z = denseY(m, withMotors).inverse();
        const Admittance lu(m, withMotors);
        ASSERT_TRUE(lu.ok());
        for (int a = 0; a < m.busCount(); ++a) {
            expectClose(s.zth(a), z(a, a), "zth", a, a);
            expectClose(s.zth(a), lu.zColumn(a)[a], "zth vs LU", a, a);
            for (int b = 0; b < m.busCount(); ++b) {
                if (std::abs(z(a, b)) < 1e-6 * std::abs(z(a, a)))
                    EXPECT_LT(std::abs(s.transfer(a, b)), 1e-9) << a << "," << b; // two islands
                else
                    expectClose(s.transfer(a, b), z(a, b), "transfer", a, b);
            }
        }
        std::vector<Complex> inj(static_cast<std::size_t>(m.busCount()));
        for (std::size_t k = 0; k < inj.size(); ++k)
            inj[k] = Complex(0.01 * static_cast<double>(k), -0.02);
        const auto v = s.solve(inj);
        const Eigen::VectorXcd want = z * Eigen::Map<const Eigen::VectorXcd>(
                                              inj.data(), static_cast<Eigen::Index>(inj.size()));
        for (int k = 0; k < m.busCount(); ++k)
            expectClose(v[static_cast<std::size_t>(k)], want[k], "solve", k, k);
    }
}
INSTANTIATE_TEST_SUITE_P(Seeds, LoopSolverProperty, ::testing::Range(1, 13));

TEST(LoopSolver, TwoEqualCablesInParallelGiveHalfTheImpedance) {
    // Series-parallel arithmetic (textbook): source impedance, then two equal branches in
    // parallel, z/2. The second cable is a chord: the correction alone must halve it.
    NetworkModel m;
    m.baseV = {480.0, 480.0};
    const Complex zs(0.01, 0.1), zc(0.3, 0.2);
    m.sources.push_back({0, zs, PartId(1)});
    m.branches.push_back({0, 1, zc, PartId(2)});
    m.branches.push_back({1, 0, zc, PartId(3)});
    const auto built = LoopSolver::build(m, false);
    ASSERT_EQ(built.outcome, LoopSolver::Outcome::Solved);
    EXPECT_EQ(built.solver->chordCount(), 1);
    const Complex want = zs + zc / 2.0;
    EXPECT_LE(std::abs(built.solver->zth(1) - want), 1e-9 * std::abs(want));
    EXPECT_LE(std::abs(built.solver->zth(0) - zs), 1e-9 * std::abs(zs));
    // Voltage at the load bus for current at the source bus: the source bus voltage.
    EXPECT_LE(std::abs(built.solver->transfer(0, 1) - zs), 1e-9 * std::abs(zs));
}

TEST(LoopSolver, ManyLoopsInOneTreeGoToTheLuAndTheSeamFailsTheCorrection) {
    NetworkModel m;
    m.baseV = {480.0, 480.0};
    m.sources.push_back({0, Complex(0.01, 0.1), PartId(1)});
    for (int i = 0; i <= LoopSolver::kMaxChordsPerTree; ++i)
        m.branches.push_back({0, 1, Complex(0.3, 0.2), PartId(2)});
    EXPECT_EQ(LoopSolver::build(m, false).outcome, LoopSolver::Outcome::Solved); // 64 chords
    m.branches.push_back({0, 1, Complex(0.3, 0.2), PartId(2)});
    EXPECT_EQ(LoopSolver::build(m, false).outcome, LoopSolver::Outcome::TooManyLoops);
    m.branches.resize(2);
    Admittance::failForTests = true;
    const auto meshed = LoopSolver::build(m, false).outcome;
    m.branches.resize(1);
    const auto radial = LoopSolver::build(m, false).outcome;
    Admittance::failForTests = false;
    EXPECT_EQ(meshed, LoopSolver::Outcome::Singular);
    EXPECT_EQ(radial, LoopSolver::Outcome::Solved); // nothing to factorise
}

TEST(LoopSolver, MeshedPlantFaultsAndVoltagesEqualTheSparseLu) {
    // The generated plant with its switchboard ties closed: every bus's fault current from the
    // loop solver equals one LU solve per bus, and the load flow is the LU's fixed point.
    Drawing d = bench::makePlant(700, 12, bench::Ties::Closed);
    // Conductors at 75 °C for the fault too, so the fault study's model is the one stored
    // (the load flow's), which the LU below is built on.
    d.settings.faultConductorC = 75;
    const Network net(d);
    const Flow flow(net);
    const StudyResults r = runStudies(net, flow, test::testTables(), d.settings);
    ASSERT_TRUE(r.faultSolved);
    ASSERT_TRUE(r.loadFlowConverged);
    const auto built = LoopSolver::build(r.model, true);
    ASSERT_EQ(built.outcome, LoopSolver::Outcome::Solved);
    EXPECT_EQ(built.solver->chordCount(), 5); // 11 lineups: one loop per closed pair tie
    const Admittance lu(r.model, true);
    ASSERT_TRUE(lu.ok());
    ASSERT_EQ(r.fault.size(), static_cast<std::size_t>(r.model.busCount()));
    for (int k = 0; k < r.model.busCount(); ++k) {
        const double want = 1.0 / std::abs(lu.zColumn(k)[k]) * r.model.baseAmps(k) / 1000.0;
        EXPECT_NEAR(r.fault[static_cast<std::size_t>(k)].ikKa, want, want * 1e-9) << k;
    }
    const Admittance y(r.model, false);
    const int n = r.model.busCount();
    const Eigen::Map<const Eigen::VectorXcd> v(r.voltage.data(), n);
    Eigen::VectorXcd rhs = Eigen::VectorXcd::Zero(n);
    for (const auto& s : r.model.sources)
        rhs[s.bus] += 1.0 / s.z;
    for (const auto& l : r.model.loads)
        rhs[l.bus] -= std::conj(l.s / v[l.bus]);
    EXPECT_LT((y.solve(rhs) - v).cwiseAbs().maxCoeff(), 1e-8);
}
