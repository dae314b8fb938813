// IEEE Std 1584-2018 arc-flash model; equation numbers are the standard's.
#include "studies/arc_flash.h"

#include <algorithm>
#include <cmath>
#include <sstream>

namespace lineward::arcflash {

namespace {

constexpr double kLvLimitKv = 0.6; // the low-voltage path (Equations (6), (10), (25)) at or below

std::string fmt(double v) {
    std::ostringstream s;
    s.precision(6);
    s << v;
    return s.str();
}

bool enclosed(ElectrodeConfig c) {
    return c == ElectrodeConfig::VCB || c == ElectrodeConfig::VCBB || c == ElectrodeConfig::HCB;
}

/// Equations (16) to (18) (and their twins (19) to (24) for energy and boundary): the value at
/// Voc from the values at 600, 2700 and 14 300 V.
double interpolate(double x600, double x2700, double x14300, double vocKv) {
    const double x1 = (x2700 - x600) / 2.1 * (vocKv - 2.7) + x2700;
    const double x2 = (x14300 - x2700) / 11.6 * (vocKv - 14.3) + x14300;
    const double x3 = x1 * (2.7 - vocKv) / 2.1 + x2 * (vocKv - 0.6) / 2.1;
    return vocKv <= 2.7 ? x3 : x2;
}

/// Equation (1): intermediate average arcing current at one of the three test voltages.
double intermediateCurrent(const std::array<double, 10>& k, double ibf, double gap) {
    const double poly = k[3] * std::pow(ibf, 6) + k[4] * std::pow(ibf, 5) +
                        k[5] * std::pow(ibf, 4) + k[6] * std::pow(ibf, 3) + k[7] * ibf * ibf +
                        k[8] * ibf + k[9];
    return std::pow(10.0, k[0] + k[1] * std::log10(ibf) + k[2] * std::log10(gap)) * poly;
}

/// The exponent shared by Equations (3) to (10) without the distance and time terms.
/// `iarcK3` is the current of the k3 term, `iarcK13` the current of the k13 term (they differ
/// only in Equations (6) and (10), where k3 takes Iarc_600 and k13 the final Iarc).
double energyExponent(const std::array<double, 13>& k, double ibf, double gap, double iarcK3,
                      double iarcK13, double cf) {
    const double poly = k[3] * std::pow(ibf, 7) + k[4] * std::pow(ibf, 6) +
                        k[5] * std::pow(ibf, 5) + k[6] * std::pow(ibf, 4) +
                        k[7] * std::pow(ibf, 3) + k[8] * ibf * ibf + k[9] * ibf;
    return k[0] + k[1] * std::log10(gap) + k[2] * iarcK3 / poly + k[10] * std::log10(ibf) +
           k[12] * std::log10(iarcK13) + std::log10(1.0 / cf);
}

/// Equations (3) to (6): incident energy in J/cm² at distance d (mm) after tMs.
double energyFrom(const std::array<double, 13>& k, double exponent, double d, double tMs) {
    return 12.552 / 50.0 * tMs * std::pow(10.0, exponent + k[11] * std::log10(d));
}

/// Equations (7) to (10): distance (mm) at which the energy falls to 5.0 J/cm² (1.2 cal/cm²).
double boundaryFrom(const std::array<double, 13>& k, double exponent, double tMs) {
    return std::pow(10.0, (exponent - std::log10(20.0 / tMs)) / -k[11]);
}

/// Table 6: equivalent width (or height, for VCBB and HCB) above 660.4 mm, Equations (11)
/// and (12), in inches.
double stretched(double mm, double vocKv, double a, double b) {
    return (660.4 + (mm - 660.4) * ((vocKv + a) / b)) / 25.4;
}

} // namespace

RangeCheck checkRange(const Input& in) {
    RangeCheck r;
    auto bad = [&](const std::string& what) { r.outside.push_back(what); };
    const bool lv = in.vocKv <= kLvLimitKv;
    if (!std::isfinite(in.vocKv) || in.vocKv < 0.208 || in.vocKv > 15.0)
        bad("system voltage " + fmt(in.vocKv * 1000) +
            " V is outside 208 V to 15 kV (IEEE 1584-2018 4.2)");
    const double ibfMin = lv ? 0.5 : 0.2, ibfMax = lv ? 106 : 65;
    if (!std::isfinite(in.ibfKa) || in.ibfKa < ibfMin || in.ibfKa > ibfMax)
        bad("bolted fault current " + fmt(in.ibfKa) + " kA is outside " + fmt(ibfMin) + " to " +
            fmt(ibfMax) + " kA for " + (lv ? "208 V to 600 V" : "601 V to 15 kV") +
            " (IEEE 1584-2018 4.2)");
    const double gMin = lv ? 6.35 : 19.05, gMax = lv ? 76.2 : 254;
    if (!std::isfinite(in.gapMm) || in.gapMm < gMin || in.gapMm > gMax)
        bad("gap " + fmt(in.gapMm) + " mm is outside " + fmt(gMin) + " to " + fmt(gMax) +
            " mm for " + (lv ? "208 V to 600 V" : "601 V to 15 kV") + " (IEEE 1584-2018 4.2)");
    if (!std::isfinite(in.workingDistanceMm) || in.workingDistanceMm < 305)
        bad("working distance " + fmt(in.workingDistanceMm) +
            " mm is under the model's 305 mm (IEEE 1584-2018 4.2)");
    if (enclosed(in.config)) {
        const auto& e = in.enclosure;
        if (!(e.heightMm > 0) || !(e.widthMm > 0) || !(e.depthMm > 0) ||
            !std::isfinite(e.heightMm + e.widthMm + e.depthMm))
            bad("enclosure height, width and depth must all be positive for " +
                std::string(electrodeConfigKey(in.config)));
        else if (e.widthMm < 4 * in.gapMm)
            bad("enclosure width " + fmt(e.widthMm) + " mm is under four times the gap (" +
                fmt(4 * in.gapMm) + " mm) (IEEE 1584-2018 4.2)");
        if (e.heightMm > 1244.6 || e.widthMm > 1244.6)
            r.notes.push_back("enclosure over 1244.6 mm high or wide: taken as 1244.6 mm, as "
                              "IEEE 1584-2018 Table 6 directs (the tests went no larger)");
    }
    if (in.vocKv <= 0.24 && in.ibfKa < 2.0)
        r.notes.push_back("at 240 V and less with under 2 kA available, a sustained arc is "
                          "possible but less likely (IEEE 1584-2018 4.3)");
    return r;
}

EnclosureFactor enclosureFactor(const ArcFlashTables& t, const Input& in) {
    EnclosureFactor f;
    if (!enclosed(in.config))
        return f; // open air: CF = 1
    f.applies = true;
    const auto& e = in.enclosure;
    // Shallow: below 600 V, both height and width under 508 mm, depth at most 203.2 mm (6.1).
    f.shallow = in.vocKv < 0.6 && e.heightMm < 508 && e.widthMm < 508 && e.depthMm <= 203.2;
    const auto& row = t.enclosure.at(in.config)[f.shallow ? 1 : 0];
    // Table 6, width: the same rule for the three configurations.
    const double w = e.widthMm;
    if (w < 508)
        f.width1 = f.shallow ? 0.03937 * w : 20.0;
    else if (w <= 660.4)
        f.width1 = 0.03937 * w;
    else
        f.width1 = stretched(std::min(w, 1244.6), in.vocKv, row.a, row.b);
    // Table 6, height: VCB keeps the actual height (49 in above 1244.6 mm); VCBB and HCB
    // stretch it by Equation (12) as the width.
    const double h = e.heightMm;
    if (h < 508)
        f.height1 = f.shallow ? 0.03937 * h : 20.0;
    else if (h <= 660.4)
        f.height1 = 0.03937 * h;
    else if (in.config == ElectrodeConfig::VCB)
        f.height1 = h <= 1244.6 ? 0.03937 * h : 49.0;
    else
        f.height1 = stretched(std::min(h, 1244.6), in.vocKv, row.a, row.b);
    f.ees = (f.height1 + f.width1) / 2.0; // Equation (13)
    if (!f.shallow)
        f.ees = std::max(f.ees, 20.0); // typical enclosures: EES no less than 20
    const double q = row.b1 * f.ees * f.ees + row.b2 * f.ees + row.b3;
    f.cf = f.shallow ? 1.0 / q : q; // Equations (15) and (14)
    return f;
}

ArcingCurrents arcingCurrents(const ArcFlashTables& t, const Input& in) {
    ArcingCurrents c;
    const auto& k = t.arcingCurrent.at(in.config);
    c.iarc600 = intermediateCurrent(k[0], in.ibfKa, in.gapMm);
    c.iarc2700 = intermediateCurrent(k[1], in.ibfKa, in.gapMm);
    c.iarc14300 = intermediateCurrent(k[2], in.ibfKa, in.gapMm);
    const auto& v = t.varCf.at(in.config);
    const double u = in.vocKv;
    c.varCf = v[0] * std::pow(u, 6) + v[1] * std::pow(u, 5) + v[2] * std::pow(u, 4) +
              v[3] * std::pow(u, 3) + v[4] * u * u + v[5] * u + v[6];
    const double reduce = 1.0 - 0.5 * c.varCf; // Equation (2)
    if (u <= kLvLimitKv) {
        // Equation (25): the final current below 600 V from Iarc_600 and Ibf.
        const double ibf = in.ibfKa;
        c.iarc =
            1.0 / std::sqrt(std::pow(0.6 / u, 2) * (1.0 / (c.iarc600 * c.iarc600) -
                                                    (0.6 * 0.6 - u * u) / (0.6 * 0.6 * ibf * ibf)));
        // Below 600 V the factor reduces the final current only (4.6).
        c.iarcMin = c.iarc * reduce;
    } else {
        c.iarc = interpolate(c.iarc600, c.iarc2700, c.iarc14300, u);
        // Above 600 V it reduces the three intermediate currents, then they are interpolated.
        c.iarcMin600 = c.iarc600 * reduce;
        c.iarcMin2700 = c.iarc2700 * reduce;
        c.iarcMin14300 = c.iarc14300 * reduce;
        c.iarcMin = interpolate(c.iarcMin600, c.iarcMin2700, c.iarcMin14300, u);
    }
    return c;
}

Energy incidentEnergy(const ArcFlashTables& t, const Input& in, const ArcingCurrents& c,
                      const EnclosureFactor& f, double timeMs, bool reduced) {
    Energy e;
    e.timeMs = timeMs;
    const auto& k = t.energy.at(in.config);
    const double g = in.gapMm, ibf = in.ibfKa, d = in.workingDistanceMm, cf = f.cf;
    if (in.vocKv <= kLvLimitKv) {
        // Equations (6) and (10): Table 3's coefficients; k3 takes Iarc_600, k13 the final
        // (or reduced final) current.
        const double x = energyExponent(k[0], ibf, g, c.iarc600, reduced ? c.iarcMin : c.iarc, cf);
        e.eJcm2 = energyFrom(k[0], x, d, timeMs);
        e.afbMm = boundaryFrom(k[0], x, timeMs);
        return e;
    }
    const double i600 = reduced ? c.iarcMin600 : c.iarc600;
    const double i2700 = reduced ? c.iarcMin2700 : c.iarc2700;
    const double i14300 = reduced ? c.iarcMin14300 : c.iarc14300;
    const double x600 = energyExponent(k[0], ibf, g, i600, i600, cf);
    const double x2700 = energyExponent(k[1], ibf, g, i2700, i2700, cf);
    const double x14300 = energyExponent(k[2], ibf, g, i14300, i14300, cf);
    e.e600 = energyFrom(k[0], x600, d, timeMs);                       // Equation (3)
    e.e2700 = energyFrom(k[1], x2700, d, timeMs);                     // Equation (4)
    e.e14300 = energyFrom(k[2], x14300, d, timeMs);                   // Equation (5)
    e.afb600 = boundaryFrom(k[0], x600, timeMs);                      // Equation (7)
    e.afb2700 = boundaryFrom(k[1], x2700, timeMs);                    // Equation (8)
    e.afb14300 = boundaryFrom(k[2], x14300, timeMs);                  // Equation (9)
    e.eJcm2 = interpolate(e.e600, e.e2700, e.e14300, in.vocKv);       // Equations (19)-(21)
    e.afbMm = interpolate(e.afb600, e.afb2700, e.afb14300, in.vocKv); // Equations (22)-(24)
    return e;
}

Result evaluate(const ArcFlashTables& t, const Input& in, double timeFullMs, double timeReducedMs) {
    Result r;
    r.range = checkRange(in);
    if (!std::isfinite(timeFullMs) || timeFullMs <= 0 || !std::isfinite(timeReducedMs) ||
        timeReducedMs <= 0)
        r.range.outside.push_back("arcing time must be a positive number of milliseconds");
    if (!r.range.ok())
        return r;
    r.enclosure = enclosureFactor(t, in);
    r.currents = arcingCurrents(t, in);
    r.full = incidentEnergy(t, in, r.currents, r.enclosure, timeFullMs, false);
    r.reduced = incidentEnergy(t, in, r.currents, r.enclosure, timeReducedMs, true);
    r.reducedGoverns = r.reduced.eJcm2 > r.full.eJcm2;
    return r;
}

} // namespace lineward::arcflash
