// Arc-flash incident energy and arc-flash boundary by the IEEE Std 1584-2018 model for
// three-phase ac systems of 208 V to 15 kV. Pure arithmetic on the coefficient tables
// (resources/tables/ieee1584_2018_*.csv); the clearing time comes from the caller.
//
// The study supports a licensed engineer's assessment; it does not replace it, nor the local
// code, nor the equipment's own data.
#pragma once

#include "tables/tables.h"

#include <optional>
#include <string>
#include <vector>

namespace lineward::arcflash {

/// Enclosure inside dimensions (IEEE 1584-2018 6.1, Table 8).
struct Enclosure {
    double heightMm = 0, widthMm = 0, depthMm = 0;
};

/// One piece of equipment as the model sees it.
struct Input {
    double vocKv = 0;             ///< open-circuit (system line-to-line) voltage, kV
    double ibfKa = 0;             ///< bolted three-phase fault current, symmetrical rms, kA
    double gapMm = 0;             ///< gap between conductors, mm
    double workingDistanceMm = 0; ///< distance from the arc to the worker's face and chest, mm
    ElectrodeConfig config = ElectrodeConfig::VCB;
    Enclosure enclosure; ///< ignored for open air (VOA, HOA)
};

/// Enclosure size correction (IEEE 1584-2018 6.1, Equations (11) to (15), Tables 6 and 7).
struct EnclosureFactor {
    bool applies = false; ///< false for open air, where CF = 1
    bool shallow = false;
    double width1 = 0, height1 = 0; ///< equivalent width and height, in
    double ees = 0;                 ///< equivalent enclosure size, in
    double cf = 1;
};

/// Arcing currents (IEEE 1584-2018 4.4 to 4.6, Equations (1), (2), (16) to (18), (25)).
struct ArcingCurrents {
    double iarc600 = 0, iarc2700 = 0, iarc14300 = 0; ///< intermediate, Equation (1), kA
    double iarc = 0;                                 ///< final arcing current, kA
    double varCf = 0;                                ///< Equation (2)
    /// Intermediate currents reduced by (1 - 0.5 VarCf) (used above 600 V only), kA.
    double iarcMin600 = 0, iarcMin2700 = 0, iarcMin14300 = 0;
    double iarcMin = 0; ///< reduced final arcing current, kA
};

/// Incident energy and boundary for one arcing current and one arcing time.
struct Energy {
    double timeMs = 0;
    double e600 = 0, e2700 = 0, e14300 = 0;       ///< intermediate, J/cm² (above 600 V)
    double afb600 = 0, afb2700 = 0, afb14300 = 0; ///< intermediate, mm (above 600 V)
    double eJcm2 = 0;                             ///< final incident energy, J/cm²
    double afbMm = 0;                             ///< arc-flash boundary (1.2 cal/cm²), mm
    double eCalCm2() const { return eJcm2 / 4.184; }
};

/// Why the model cannot be applied, or nothing when it can.
struct RangeCheck {
    std::vector<std::string> outside; ///< each limit the input breaks, in words (empty: in range)
    std::vector<std::string> notes;   ///< stated cautions that do not stop the calculation
    bool ok() const { return outside.empty(); }
};

/// The standard's range of the model (IEEE 1584-2018 4.2) and its stated cautions (4.3: arcs
/// at 240 V and less with under 2 kA available are less likely to be sustained; enclosures
/// beyond Table 6's 1244.6 mm are taken as 1244.6 mm).
RangeCheck checkRange(const Input& in);

/// Enclosure size correction factor; CF = 1 for open air.
EnclosureFactor enclosureFactor(const ArcFlashTables& t, const Input& in);

/// Arcing currents, full and reduced. Call only with an input checkRange accepts.
ArcingCurrents arcingCurrents(const ArcFlashTables& t, const Input& in);

/// Incident energy and boundary at an arcing time (ms). `reduced` takes the reduced arcing
/// currents of `currents` instead of the full ones.
Energy incidentEnergy(const ArcFlashTables& t, const Input& in, const ArcingCurrents& currents,
                      const EnclosureFactor& cf, double timeMs, bool reduced);

/// Every step for one piece of equipment and the two arcing times (full and reduced current),
/// or the reasons it lies outside the model.
struct Result {
    RangeCheck range;
    EnclosureFactor enclosure;
    ArcingCurrents currents;
    Energy full, reduced;
    bool reducedGoverns = false; ///< the reduced-current case gives the higher energy
    const Energy& governing() const { return reducedGoverns ? reduced : full; }
};
Result evaluate(const ArcFlashTables& t, const Input& in, double timeFullMs, double timeReducedMs);

} // namespace lineward::arcflash
