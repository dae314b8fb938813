// Sparse complex nodal admittance matrix, factorised once and solved for many right-hand sides.
#pragma once

#include "studies/network_model.h"

#include <Eigen/SparseCore>
#include <Eigen/SparseLU>
#include <memory>

namespace lineward {

/// Y = branches + chosen shunts to ground, LU-factorised.
class Admittance {
public:
    /// Test seam: while true, every factorisation reports failure — this LU and the loop
    /// solver's correction of a meshed network (a singular matrix cannot be built from
    /// physical ratings, but the path that handles one must be tested).
    static inline bool failForTests = false;

    /// `withMotors` adds the motors' fault contribution shunts (fault study); the load flow
    /// leaves them out. Buses with no path to a shunt get a tiny shunt so Y stays regular.
    Admittance(const NetworkModel& m, bool withMotors);
    bool ok() const { return m_ok; }
    int size() const { return m_n; }
    /// Solves Y x = b.
    Eigen::VectorXcd solve(const Eigen::VectorXcd& b) const;
    /// Column k of Z = Y⁻¹ (the voltages for a unit current injected at bus k).
    Eigen::VectorXcd zColumn(int k) const;

private:
    int m_n = 0;
    bool m_ok = false;
    Eigen::SparseMatrix<Complex> m_y;
    std::unique_ptr<Eigen::SparseLU<Eigen::SparseMatrix<Complex>>> m_lu;
};

} // namespace lineward
