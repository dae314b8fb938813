// Assembly by triplets; SparseLU with COLAMD ordering handles meshed networks as readily as
// radial ones.
#include "studies/admittance.h"

#include <vector>

namespace lineward {

Admittance::Admittance(const NetworkModel& m, bool withMotors) : m_n(m.busCount()) {
    if (m_n == 0)
        return;
    std::vector<Eigen::Triplet<Complex>> trip;
    trip.reserve(m.branches.size() * 4 + m.sources.size() + m.motors.size() +
                 static_cast<std::size_t>(m_n));
    for (const auto& b : m.branches) {
        const Complex y = 1.0 / b.z;
        trip.emplace_back(b.from, b.from, y);
        trip.emplace_back(b.to, b.to, y);
        trip.emplace_back(b.from, b.to, -y);
        trip.emplace_back(b.to, b.from, -y);
    }
    for (const auto& s : m.sources)
        trip.emplace_back(s.bus, s.bus, 1.0 / s.z);
    if (withMotors)
        for (const auto& s : m.motors)
            trip.emplace_back(s.bus, s.bus, 1.0 / s.z);
    // A negligible shunt on every bus keeps Y regular for islands without a source.
    for (int i = 0; i < m_n; ++i)
        trip.emplace_back(i, i, Complex(kGroundLeakPu, 0));
    m_y.resize(m_n, m_n);
    m_y.setFromTriplets(trip.begin(), trip.end());
    m_y.makeCompressed();
    m_lu = std::make_unique<Eigen::SparseLU<Eigen::SparseMatrix<Complex>>>();
    m_lu->analyzePattern(m_y);
    m_lu->factorize(m_y);
    m_ok = m_lu->info() == Eigen::Success && !failForTests;
}

Eigen::VectorXcd Admittance::solve(const Eigen::VectorXcd& b) const {
    return m_lu->solve(b);
}

Eigen::VectorXcd Admittance::zColumn(int k) const {
    Eigen::VectorXcd e = Eigen::VectorXcd::Zero(m_n);
    e[k] = 1.0;
    return m_lu->solve(e);
}

} // namespace lineward
