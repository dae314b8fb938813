// Time-current bands of protective parts: the shortest time a part may trip (minimum) and the
// time by which it has cleared (maximum) at each current. Infinity means "does not trip".
#pragma once

#include "model/curve_points.h"
#include "model/drawing.h"
#include "model/part.h"

#include <limits>
#include <optional>
#include <string>
#include <vector>

namespace lineward {

inline constexpr double kNoTrip = std::numeric_limits<double>::infinity();

/// Settings assumed where a breaker's data leaves them blank; each curve label says "(assumed)"
/// where one was used. A thermal-magnetic molded-case breaker's instantaneous pickup of 10 ×
/// its trip rating (common practice: the usual fixed or lowest adjustable setting); an
/// electronic trip unit's long-time band of 10 s at 6 × pickup and short-time band of 0.1 s
/// (common practice: middle settings of the usual ranges).
inline constexpr double kAssumedThermalMagneticInstX = 10.0;
/// An electronic trip unit's long-time pickup left blank: the trip rating itself (1.0 ×, the
/// highest setting; common practice).
inline constexpr double kAssumedLongTimePickupX = 1.0;
inline constexpr double kAssumedLongTimeDelayS = 10.0;
inline constexpr double kAssumedShortTimeDelayS = 0.1;

/// A protective part's band. Built from its ratings, or from its user points when it has them.
class TripCurve {
public:
    enum class Model {
        ThermalMagnetic,
        Electronic,
        Instantaneous,
        TimeDelayFuse,
        FastFuse,
        Overload,
        Points
    };

    /// The band of a breaker, instantaneous-only breaker, fuse or overload relay; nothing for
    /// other parts.
    /// `bands` chooses a thermal-magnetic breaker's overload maximum: the typical generic
    /// shape, or the slowest clearing the listing standard allows (UL 489 at 135 % and 200 %).
    static std::optional<TripCurve> of(const Part& part, CurveBands bands = CurveBands::Typical);

    double minTime(double amps) const;
    double maxTime(double amps) const;
    /// Hot-start maximum (overload relays: preloaded at their setting); maxTime otherwise.
    double maxTimeHot(double amps) const;
    /// The current below which the part never trips.
    double pickupA() const { return m_pickupA; }
    Model model() const { return m_model; }
    /// Short description of the settings for legends ("CB-101 90 A TM, inst 10×").
    const std::string& label() const { return m_label; }

    /// Generic thermal-magnetic maximum at 200 % of rating (common practice; within the UL 489
    /// calibration limits, which the tests check).
    static double thermalTime200(double ratingA);
    /// UL 489 maximum tripping time at 200 % of rating, s (from memory: 2 min to 30 A, then
    /// 2 min more per rating band up to 30 min at 6000 A).
    static double listingTime200(double ratingA);
    /// UL 489 maximum tripping time at 135 % of rating, s (from memory: 1 h to 50 A, 2 h above).
    static double listingTime135(double ratingA);
    /// True where the band is generic (built from ratings), false for user points.
    bool generic() const { return m_model != Model::Points; }

private:
    static TripCurve ofBreaker(const Part& p);
    static TripCurve ofOverload(const Part& p);
    Model m_model = Model::Points;
    double m_ratingA = 0; ///< In, Ir, fuse rating or relay setting
    double m_pickupA = 0;
    double m_a = 0, m_b = 0, m_c = 0, m_d = 0; ///< model parameters (see trip_curve.cpp)
    double m_stDelayS = 0.1;                   ///< electronic short-time delay
    bool m_stI2t = false;                      ///< short-time delay ramps as I²t below 10 × Ir
    bool m_listing = false;            ///< overload maximum at the listing standard's limits
    double listingMax(double m) const; ///< the listing maximum at m × rating
    double stDelay(double amps) const;
    std::vector<CurvePoint> m_points;
    std::string m_label;
};

} // namespace lineward
