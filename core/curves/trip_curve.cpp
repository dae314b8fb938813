// Generic band shapes anchored at the points the standards state. Sources beside each; where a
// number is a generic shape rather than a standard's limit it says "common practice".
#include "curves/trip_curve.h"

#include "model/field.h"
#include "model/ratings.h"

#include <algorithm>
#include <array>
#include <cmath>
#include <sstream>

namespace lineward {

namespace {

// Log-log interpolation in a table of points; outside the range the band is open below and
// flat above.
double interpolate(const std::vector<CurvePoint>& pts, double amps, bool wantMax) {
    if (pts.empty() || amps < pts.front().amps)
        return kNoTrip;
    if (amps >= pts.back().amps)
        return wantMax ? pts.back().maxS : pts.back().minS;
    for (std::size_t i = 1; i < pts.size(); ++i) {
        if (amps > pts[i].amps)
            continue;
        const auto& a = pts[i - 1];
        const auto& b = pts[i];
        const double ta = wantMax ? a.maxS : a.minS, tb = wantMax ? b.maxS : b.minS;
        const double f = std::log(amps / a.amps) / std::log(b.amps / a.amps);
        return std::exp(std::log(ta) + f * (std::log(tb) - std::log(ta)));
    }
    return kNoTrip;
}

std::string num(double v) {
    return formatNumber(std::round(v * 100) / 100);
}

} // namespace

double TripCurve::thermalTime200(double ratingA) {
    // Typical molded-case breaker clearing at 200 % of rating (common practice, a generic
    // shape); UL 489's calibration limits (from memory: 2 min to 30 A, 4 min to 50 A, 6 min
    // to 100 A and longer above) are looser.
    return ratingA <= 100 ? 40 : ratingA <= 400 ? 80 : 120;
}

double TripCurve::listingTime200(double ratingA) {
    // UL 489 calibration limits at 200 % (from memory; the rating bands of its table).
    constexpr std::array<std::pair<double, double>, 14> kBands{{{30, 120},
                                                                {50, 240},
                                                                {100, 360},
                                                                {150, 480},
                                                                {225, 600},
                                                                {400, 720},
                                                                {600, 840},
                                                                {800, 960},
                                                                {1000, 1080},
                                                                {1200, 1200},
                                                                {1600, 1320},
                                                                {2000, 1440},
                                                                {2500, 1560},
                                                                {5000, 1680}}};
    for (auto [upTo, seconds] : kBands)
        if (ratingA <= upTo)
            return seconds;
    return 1800;
}

double TripCurve::listingTime135(double ratingA) {
    return ratingA <= 50 ? 3600 : 7200; // UL 489 at 135 % (from memory)
}

double TripCurve::listingMax(double m) const {
    // Through the two listed points, log-log between them; above 200 % an I²t slope (common
    // practice: the standard states no point there) down to the instantaneous region.
    if (m < 1.35)
        return kNoTrip;
    const double t135 = listingTime135(m_ratingA), t200 = listingTime200(m_ratingA);
    if (m <= 2.0)
        return t135 * std::pow(t200 / t135, std::log(m / 1.35) / std::log(2.0 / 1.35));
    return t200 * (2.0 / m) * (2.0 / m);
}

TripCurve TripCurve::ofBreaker(const Part& p) {
    TripCurve c;
    const auto b = BreakerRatings::of(p);
    c.m_ratingA = b.tripA;
    const auto assumed = [](bool given) { return given ? "" : " (assumed)"; };
    if (b.tripType == TripType::Electronic) {
        c.m_model = Model::Electronic;
        // No short-time or instantaneous element where none is given.
        const double ir = c.m_ratingA * b.ltPickupX.value_or(kAssumedLongTimePickupX);
        c.m_a = ir;
        c.m_b = b.ltDelayS.value_or(kAssumedLongTimeDelayS);
        c.m_c = b.stPickupX ? *b.stPickupX * ir : 0;
        c.m_d = b.instX ? *b.instX * c.m_ratingA : 0;
        c.m_pickupA = 1.05 * ir;
        c.m_label = p.tag + " " + num(c.m_ratingA) + " A LSI, LT " +
                    (b.ltPickupX ? "" : num(ir) + " A (assumed) ") + num(c.m_b) + " s" +
                    assumed(b.ltDelayS.has_value()) +
                    (c.m_c > 0 ? ", ST " + num(c.m_c) + " A " +
                                     num(b.stDelayS.value_or(kAssumedShortTimeDelayS)) + " s" +
                                     assumed(b.stDelayS.has_value())
                               : "") +
                    (c.m_d > 0 ? ", I " + num(c.m_d) + " A" : "");
    } else {
        c.m_model = Model::ThermalMagnetic;
        c.m_a = thermalTime200(c.m_ratingA);
        c.m_d = b.instX.value_or(kAssumedThermalMagneticInstX) * c.m_ratingA;
        c.m_pickupA = 1.05 * c.m_ratingA;
        c.m_label = p.tag + " " + num(c.m_ratingA) + " A TM, inst " + num(c.m_d) + " A" +
                    assumed(b.instX.has_value());
    }
    c.m_stDelayS = b.stDelayS.value_or(kAssumedShortTimeDelayS);
    c.m_stI2t = b.stI2t;
    return c;
}

TripCurve TripCurve::ofOverload(const Part& p) {
    TripCurve c;
    c.m_model = Model::Overload;
    const auto ol = OverloadRatings::of(p);
    c.m_ratingA = ol.settingA;
    // IEC 60947-4-1 Table 3 (from memory): trip time at 7.2 × setting from cold, by class;
    // Table 2: no trip at 1.05 ×, trip within 2 h at 1.2 ×, within the class limit at 1.5 ×
    // from hot. τ_min puts the fastest trip at 7.2 × on the class minimum; τ_max puts the
    // slowest on the class maximum, or lower where the 1.5 × hot limit demands it.
    const std::string& cls = ol.tripClass;
    const double tpMin = cls == "10A" ? 2 : cls == "10" ? 4 : cls == "20" ? 6 : 9;
    const double tpMax = cls == "10A" ? 10 : cls == "10" ? 10 : cls == "20" ? 20 : 30;
    const double hot15 = (cls == "10A" ? 2 : cls == "10" ? 4 : cls == "20" ? 8 : 12) * 60.0;
    const double m = 7.2;
    c.m_a = tpMin / std::log(m * m / (m * m - 1.05 * 1.05));
    // The maximum band never trips below the relay's ultimate trip multiple u (1.15 × unless
    // its data says otherwise; IEC 60947-4-1 requires a trip within 2 h at 1.2 ×).
    const double u = ol.ultimateTripX;
    c.m_c = u;
    c.m_b = std::min(tpMax / std::log(m * m / (m * m - u * u)),
                     hot15 / std::log((2.25 - 1.0) / (2.25 - u * u)));
    c.m_pickupA = 1.05 * c.m_ratingA;
    c.m_label = p.tag + " " + num(c.m_ratingA) + " A class " + cls;
    return c;
}

std::optional<TripCurve> TripCurve::of(const Part& p, CurveBands bands) {
    TripCurve c;
    const std::string pts = userCurvePoints(p);
    if (!pts.empty()) {
        if (parseCurvePoints(pts, c.m_points))
            return std::nullopt;
        c.m_model = Model::Points;
        c.m_pickupA = c.m_points.front().amps;
        c.m_label = p.tag + " (user curve)";
        return c;
    }
    switch (p.kind) {
    case PartKind::Breaker: {
        // An electronic trip's long-time band follows its set delay (its tolerance is the
        // manufacturer's, far inside the listing's); only the thermal element's shape is a
        // guess that the listing limits bound.
        c = ofBreaker(p);
        c.m_listing =
            bands == CurveBands::ListingLimits && c.m_model == Model::ThermalMagnetic;
        if (c.m_listing)
            c.m_label += " [listing limits]";
        return c;
    }
    case PartKind::InstBreaker:
        c.m_model = Model::Instantaneous;
        c.m_ratingA = InstBreakerRatings::of(p).pickupA;
        c.m_pickupA = 0.8 * c.m_ratingA;
        c.m_label = p.tag + " inst " + num(c.m_ratingA) + " A";
        return c;
    case PartKind::Fuse: {
        const auto fuse = FuseRatings::of(p);
        c.m_model = fuse.type == FuseType::Fast ? Model::FastFuse : Model::TimeDelayFuse;
        c.m_ratingA = fuse.amps;
        c.m_a = c.m_ratingA <= 30 ? 120 : 240; // UL 248 opening limit at 200 % (from memory)
        c.m_pickupA = 1.1 * c.m_ratingA;
        c.m_label = p.tag + " " + num(c.m_ratingA) + " A " +
                    (c.m_model == Model::FastFuse ? "fast" : "time-delay") + " fuse";
        return c;
    }
    case PartKind::Overload:
        return ofOverload(p);
    default:
        return std::nullopt;
    }
}

double TripCurve::minTime(double amps) const {
    const double m = amps / std::max(m_ratingA, 1e-9);
    switch (m_model) {
    case Model::Points:
        return interpolate(m_points, amps, false);
    case Model::ThermalMagnetic: {
        double t = m <= 1.05 ? kNoTrip : 0.724 * m_a / (m * m - 1.1025);
        if (amps >= 0.8 * m_d) // instantaneous tolerance ±20 % (common practice)
            t = std::min(t, 0.008);
        return t;
    }
    case Model::Electronic: {
        const double mr = amps / m_a;
        double t =
            mr <= 1.05 ? kNoTrip : 0.8 * m_b * 36.0 / (mr * mr); // LT I²t, −20 % (common practice)
        if (m_c > 0 && amps >= 0.9 * m_c)
            t = std::min(t, stDelay(amps)); // ST delay (flat or I²t), pickup ±10 %
        if (m_d > 0 && amps >= 0.9 * m_d)
            t = std::min(t, 0.01);
        return t;
    }
    case Model::Instantaneous:
        return amps >= 0.8 * m_ratingA ? 0.008 : kNoTrip;
    case Model::TimeDelayFuse:
        // Holds 500 % for at least 10 s (UL 248 time-delay fuses, from memory).
        return m <= 1.1 ? kNoTrip : std::max(0.001, 10.0 * std::pow(5.0 / m, 2.5));
    case Model::FastFuse:
        return m <= 1.1 ? kNoTrip : std::max(0.001, 0.5 * std::pow(5.0 / m, 2.5));
    case Model::Overload:
        return m <= 1.05 ? kNoTrip : m_a * std::log(m * m / (m * m - 1.1025));
    }
    return kNoTrip;
}

double TripCurve::maxTime(double amps) const {
    const double m = amps / std::max(m_ratingA, 1e-9);
    switch (m_model) {
    case Model::Points:
        return interpolate(m_points, amps, true);
    case Model::ThermalMagnetic: {
        double t = m < 1.35 ? kNoTrip : m_a * 3.0 / (m * m - 1.0);
        if (m_listing)
            t = std::max(t, listingMax(m));
        if (amps >= 1.2 * m_d)
            t = std::min(t, 0.025); // 1.5 cycles (common practice)
        return t;
    }
    case Model::Electronic: {
        const double mr = amps / m_a;
        double t = mr < 1.2 ? kNoTrip : 1.2 * m_b * 36.0 / (mr * mr);
        if (m_c > 0 && amps >= 1.1 * m_c)
            t = std::min(t, stDelay(amps) + 0.05);
        if (m_d > 0 && amps >= 1.1 * m_d)
            t = std::min(t, 0.05);
        return t;
    }
    case Model::Instantaneous:
        return amps >= 1.2 * m_ratingA ? 0.025 : kNoTrip;
    case Model::TimeDelayFuse:
    case Model::FastFuse: {
        // UL 248 opening limits (from memory): within 1 h at 135 %, within m_a seconds at 200 %.
        if (m < 1.35)
            return kNoTrip;
        const double t =
            m <= 2 ? 3600.0 * std::pow(m_a / 3600.0, std::log(m / 1.35) / std::log(2 / 1.35))
                   : m_a * std::pow(2.0 / m, 2.5);
        return std::max({t, 0.004, minTime(amps) * 1.2});
    }
    case Model::Overload:
        return m <= m_c ? kNoTrip : m_b * std::log(m * m / (m * m - m_c * m_c));
    }
    return kNoTrip;
}

double TripCurve::stDelay(double amps) const {
    // I²t ramp: the delay at 10 × Ir, longer below it in proportion to 1/I² (common practice).
    if (!m_stI2t)
        return m_stDelayS;
    const double knee = 10.0 * m_a;
    return amps >= knee ? m_stDelayS : m_stDelayS * (knee / amps) * (knee / amps);
}

double TripCurve::maxTimeHot(double amps) const {
    if (m_model != Model::Overload)
        return maxTime(amps);
    const double m = amps / m_ratingA;
    return m <= m_c ? kNoTrip : m_b * std::log((m * m - 1.0) / (m * m - m_c * m_c));
}

} // namespace lineward
