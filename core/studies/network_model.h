// The electrical model of a drawing for the studies: solve buses (network nodes joined by
// closed zero-impedance devices), branch impedances in per unit, sources, motors and loads.
#pragma once

#include "studies/study_issue.h"
#include "tables/tables.h"
#include "topology/network.h"

#include <complex>
#include <optional>
#include <vector>

namespace lineward {

using Complex = std::complex<double>;

/// System base of every per-unit value.
inline constexpr double kBaseMva = 100.0;

/// A series element between two solve buses.
struct ModelBranch {
    int from = -1, to = -1;
    Complex z; ///< per unit on kBaseMva and the buses' nominal voltage
    PartId part;
    /// The same for the maximum fault current: conductors at the drawing's fault temperature,
    /// transformers at nameplate %Z less the drawing's tolerance.
    Complex zMaxFault;
    /// The same for the minimum fault current: conductors at their insulation rating.
    Complex zMinFault;
};

/// A conductor's resistance at `tempC` over its resistance at 75 °C, the temperature of NEC
/// Chapter 9 Table 9: R2 = R1·[1 + α(T2 − 75)] with α = 0.00323 for copper and 0.00330 for
/// aluminium (NEC Chapter 9 Table 8, Note 2, from memory).
double resistanceFactorFrom75C(bool aluminium, double tempC);

/// R/X of a motor's fault impedance under IEC 60909-0 3.8.2 (from memory): 0.42 for
/// low-voltage motors (≤ 1000 V, with their connection cables); medium-voltage 0.10 where the
/// rated power per pole pair is ≥ 1 MW, else 0.15 (four poles assumed).
double iecMotorROverX(double ratedV, double kw);

/// A source or motor seen as an EMF of 1 per unit behind an impedance to ground.
struct ModelShunt {
    int bus = -1;
    Complex z;
    PartId part;
};

/// A load drawing constant power at its bus.
struct ModelLoad {
    int bus = -1;
    Complex s; ///< per unit (P + jQ)
    PartId part;
};

/// Per-unit model of the energized network.
struct NetworkModel {
    std::vector<int> busOfNode; ///< network node → solve bus (−1 when not energized)
    /// By solve bus: the per-unit base, line-to-line volts — the bus's no-load voltage with
    /// every source at its rating and every transformer at its turns ratio and tap (equal to
    /// the nominal voltage where the ratios agree with the drawing's voltages).
    std::vector<double> baseV;
    std::vector<double> nominalV; ///< by solve bus: the node's nominal line-to-line volts
    std::vector<ModelBranch> branches;
    std::vector<ModelShunt> sources, motors;
    std::vector<ModelLoad> loads;   ///< motors running and static loads
    std::vector<StudyIssue> issues; ///< parts the model could not represent
    int busCount() const { return static_cast<int>(baseV.size()); }
    /// Base current in amperes at a bus.
    double baseAmps(int bus) const;
};

/// Builds the model. Motors contribute `motorContributionX` × FLC to faults; running motors
/// draw FLA at `runningPf`.
NetworkModel buildNetworkModel(const Network& net, const Tables& tables, const Settings& s);

/// Series impedance of a cable in ohms per phase (NEC Chapter 9 Table 9; mm² sizes from
/// resistivity). Nothing when the size has no data.
std::optional<Complex> cableOhms(const Part& cable, const Tables& tables);

/// Admittance to ground added at every bus (per unit): keeps the admittance matrix regular for
/// an island with no source (it would otherwise be singular) while changing no fault or
/// voltage result in the digits shown (1e12 per unit: about 2e9 ohms at 480 V on the 100 MVA
/// base).
inline constexpr double kGroundLeakPu = 1e-12;
/// Two paths' no-load voltages at a bus that differ by more than this fraction are reported as
/// a ratio mismatch (0.5 %: a fifth of one 2.5 % tap step; common practice).
inline constexpr double kRatioMismatchTolerance = 0.005;
/// Impedance (per unit, R and X each) given to a cable whose size has no impedance data: a
/// closed connection that the studies treat as having none, as their study issue says.
inline constexpr double kNoDataCablePu = 1e-9;

/// Power factor of running motors (common practice).
inline constexpr double kRunningPf = 0.85;
/// X/R of a motor's fault contribution (common practice for low-voltage induction motors).
inline constexpr double kMotorXr = 6.0;

} // namespace lineward
