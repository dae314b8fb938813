// Typed ratings of each part kind: what sizing, studies, curves, rules and reports read instead of
// spelling field keys. Each struct is read from a Part by `of()`, which takes every default from
// the field table in part_kind.cpp (one default per rating, the one the reader, writer and
// Inspector use). Ratings without a default are optional; required ratings with no default read
// as 0 when absent, which only a part built in code can be (the file reader and Part::set refuse
// a drawing or an edit without them) and which no duty or sizing check passes (a 0 A rating is
// below every load, a 0 kA interrupting rating below every fault).
#pragma once

#include "model/part.h"

#include <optional>
#include <string>
#include <string_view>

namespace lineward {

enum class BusType { Switchboard, Mcc, Panelboard, CableJunction };
enum class TripType { ThermalMagnetic, Electronic };
/// What a breaker's interrupting rating was tested as: the test circuit's X/R differs.
enum class BreakerConstruction { MoldedCase, Power, PowerFused };
enum class FuseType { TimeDelay, Fast };
enum class Rotor { SquirrelCage, WoundRotor, Synchronous };
enum class Material { Cu, Al };
enum class Raceway { Steel, Pvc, Aluminum };

struct SourceRatings {
    static constexpr std::string_view kKv = "kv", kFaultKa = "fault_ka", kFaultMva = "fault_mva",
                                      kXOverR = "x_over_r";
    double kv = 0;
    std::optional<double> faultKa, faultMva;
    double xOverR = 0;
    static SourceRatings of(const Part& p);
};

struct TransformerRatings {
    static constexpr std::string_view kKva = "kva", kPriV = "pri_v", kSecV = "sec_v",
                                      kZPct = "z_pct", kXOverR = "x_over_r", kTapPct = "tap_pct";
    double kva = 0, priV = 0, secV = 0, zPct = 0, xOverR = 0;
    double tapPct = 0; ///< primary tap, % of rated primary voltage
    static TransformerRatings of(const Part& p);
    /// Secondary volts per primary volt at this tap: secV / (priV · (1 + tap/100)).
    double voltsRatio() const { return secV / (priV * (1.0 + tapPct / 100.0)); }
};

struct BusRatings {
    static constexpr std::string_view kType = "bus_type", kVolts = "volts", kAmps = "amps",
                                      kBracingKa = "bracing_ka", kPhases = "phases",
                                      kAfConfig = "af_electrodes", kAfGapMm = "af_gap_mm",
                                      kAfWorkingMm = "af_working_distance_mm",
                                      kAfHeightMm = "af_enclosure_height_mm",
                                      kAfWidthMm = "af_enclosure_width_mm",
                                      kAfDepthMm = "af_enclosure_depth_mm",
                                      kService = "service_equipment";
    BusType type = BusType::Mcc;
    double volts = 0, amps = 0;
    std::optional<double> bracingKa;
    int phases = 3;
    /// Arc-flash equipment data; blank: the typical value of IEEE 1584-2018 Tables 8 and 10 for
    /// the equipment type. The electrode configuration is a key ("VCB", ...); empty: typical.
    std::string afConfig;
    std::optional<double> afGapMm, afWorkingMm, afHeightMm, afWidthMm, afDepthMm;
    /// Service equipment (NEC 2023 110.16(B)): its label carries the service data too.
    bool service = false;
    static BusRatings of(const Part& p);
};

/// What the three protective kinds share: the manufacturer's let-through and clearing data and
/// a user curve that replaces the generic one.
struct ProtectiveData {
    static constexpr std::string_view kInterruptingKa = "interrupting_ka",
                                      kLetThrough = "let_through_a2s", kClearS = "clear_s",
                                      kCurvePoints = "curve_points";
    double interruptingKa = 0;
    std::optional<double> letThroughA2s, clearS;
    std::string curvePoints; ///< empty: the generic curve
};

/// The shared block of a breaker, instantaneous-only breaker or fuse; nothing for other kinds.
std::optional<ProtectiveData> protectiveDataOf(const Part& p);

struct BreakerRatings : ProtectiveData {
    static constexpr std::string_view kTripType = "trip_type", kConstruction = "construction",
                                      kFrameA = "frame_a", kTripA = "trip_a", kInstX = "inst_x",
                                      kLtPickupX = "lt_pickup_x", kLtDelayS = "lt_delay_s",
                                      kStPickupX = "st_pickup_x", kStDelayS = "st_delay_s",
                                      kStI2t = "st_i2t", kOpen = "open";
    TripType tripType = TripType::ThermalMagnetic;
    BreakerConstruction construction = BreakerConstruction::MoldedCase;
    std::optional<double> frameA;
    double tripA = 0;
    std::optional<double> instX, ltPickupX, ltDelayS, stPickupX, stDelayS;
    bool stI2t = false, open = false;
    static BreakerRatings of(const Part& p);
};

struct InstBreakerRatings : ProtectiveData {
    static constexpr std::string_view kAmps = "amps", kPickupA = "pickup_a",
                                      kPickupMinA = "pickup_min_a", kPickupMaxA = "pickup_max_a",
                                      kOpen = "open";
    double amps = 0, pickupA = 0;
    std::optional<double> pickupMinA, pickupMaxA;
    bool open = false;
    static InstBreakerRatings of(const Part& p);
};

struct FuseRatings : ProtectiveData {
    static constexpr std::string_view kType = "fuse_type", kClass = "fuse_class", kAmps = "amps";
    FuseType type = FuseType::TimeDelay;
    std::optional<std::string> fuseClass;
    double amps = 0;
    static FuseRatings of(const Part& p);
};

struct DisconnectRatings {
    static constexpr std::string_view kAmps = "amps", kHpRating = "hp_rating", kFused = "fused",
                                      kOpen = "open";
    double amps = 0;
    std::optional<double> hpRating;
    bool fused = false, open = false;
    static DisconnectRatings of(const Part& p);
};

struct ContactorRatings {
    static constexpr std::string_view kNemaSize = "nema_size", kAc3A = "ac3_a", kOpen = "open";
    std::optional<std::string> nemaSize;
    std::optional<double> ac3A;
    bool open = false;
    static ContactorRatings of(const Part& p);
};

struct OverloadRatings {
    static constexpr std::string_view kSettingA = "setting_a", kRangeMinA = "range_min_a",
                                      kRangeMaxA = "range_max_a", kTripClass = "trip_class",
                                      kUltimateTripX = "ultimate_trip_x",
                                      kCurvePoints = "curve_points";
    double settingA = 0;
    double ultimateTripX = 1.15; ///< surely trips above this multiple of the setting
    /// The current above which the relay surely trips: what NEC 430.32 limits.
    double tripCurrentA() const { return ultimateTripX * settingA; }
    std::optional<double> rangeMinA, rangeMaxA;
    std::string tripClass; ///< "10A", "10", "20" or "30"
    std::string curvePoints;
    static OverloadRatings of(const Part& p);
};

/// A variable-frequency drive (NEC 2023 Article 430 Part X, power conversion equipment).
struct VfdRatings {
    static constexpr std::string_view kHp = "hp", kVolts = "volts", kInputA = "input_a",
                                      kOutputA = "output_a", kMaxScpdA = "max_scpd_a";
    double hp = 0, volts = 0;
    double inputA = 0;  ///< rated input (line-side) current
    double outputA = 0; ///< rated continuous output current
    /// Largest short-circuit device the drive's listing names; nothing: not given (the rule
    /// then assumes kAssumedDriveScpdX × the input current).
    std::optional<double> maxScpdA;
    static VfdRatings of(const Part& p);
};

/// A soft starter with its bypass contactor (a field of its own: the bypass is part of the
/// starter's assembly and carries the motor once it is up to speed).
struct SoftStarterRatings {
    static constexpr std::string_view kHp = "hp", kVolts = "volts", kAmps = "amps",
                                      kStartLimitX = "start_limit_x", kBypass = "bypass",
                                      kBypassA = "bypass_a";
    double hp = 0, volts = 0, amps = 0;
    double startLimitX = 0; ///< starting current limit, multiple of the motor's FLC
    bool bypass = true;
    std::optional<double> bypassA; ///< nothing: integral bypass rated with the starter
    static SoftStarterRatings of(const Part& p);
};

struct CableRatings {
    static constexpr std::string_view kMaterial = "material", kSize = "size", kSets = "sets",
                                      kLengthFt = "length_ft", kInsulationC = "insulation_c",
                                      kTerminationC = "termination_c", kRaceway = "raceway",
                                      kConductors = "conductors", kAmbientC = "ambient_c",
                                      kEgcSize = "egc_size";
    Material material = Material::Cu;
    std::string size;
    int sets = 1;
    double lengthFt = 0;
    int insulationC = 90, terminationC = 75;
    Raceway raceway = Raceway::Steel;
    int conductors = 3;
    std::optional<double> ambientC; ///< nothing: the drawing's ambient
    std::string egcSize;            ///< empty: the raceway serves as the EGC
    static CableRatings of(const Part& p);
};

struct MotorRatings {
    static constexpr std::string_view kHp = "hp", kKw = "kw", kVolts = "volts", kPhases = "phases",
                                      kFla = "fla", kSf = "sf", kDesign = "design",
                                      kRotor = "rotor", kCodeLetter = "code_letter", kLra = "lra",
                                      kAccelS = "accel_s", kStallHotS = "stall_hot_s",
                                      kStallColdS = "stall_cold_s", kTempRiseC = "temp_rise_c",
                                      kPremiumEff = "premium_eff", kHardToStart = "hard_to_start";
    std::optional<double> hp, kw;
    double volts = 0;
    int phases = 3;
    std::optional<double> fla;
    double serviceFactor = 0;
    std::string design; ///< NEMA design letter
    Rotor rotor = Rotor::SquirrelCage;
    std::optional<std::string> codeLetter;
    std::optional<double> lra;
    double accelS = 0;
    std::optional<double> stallHotS, stallColdS, tempRiseC;
    bool premiumEff = false, hardToStart = false;
    static MotorRatings of(const Part& p);
};

struct LoadRatings {
    static constexpr std::string_view kKva = "kva", kKw = "kw", kPf = "pf", kVolts = "volts",
                                      kPhases = "phases", kContinuous = "continuous";
    std::optional<double> kva, kw;
    double pf = 0;
    double volts = 0;
    int phases = 3;
    bool continuous = false;
    /// kVA as given, or kW / pf (the kind's validation gives one of the two).
    double apparentKva() const { return kva ? *kva : kw.value_or(0) / pf; }
    static LoadRatings of(const Part& p);
};

/// A protective part's user curve text (curve_points); empty where it has none or its kind
/// takes no user curve.
std::string userCurvePoints(const Part& p);

/// Rated voltage of a one-terminal part (source, bus, motor, load) in volts; 0 for other kinds.
double ratedVolts(const Part& p);

/// The key of a device's ampere rating as NEC 240.6 and the feeder rules read it: an
/// inverse-time breaker's trip rating, the continuous rating of an instantaneous-only breaker,
/// fuse or switch.
std::string_view ampereRatingKey(PartKind kind);
/// That rating's value (0 when absent, as for every required rating).
double ampereRatingA(const Part& device);

/// The key of the setting that Table 430.52 limits on a motor branch's short-circuit device:
/// the pickup setting of an instantaneous-only breaker, else the ampere rating.
std::string_view branchSettingKey(PartKind kind);
double branchSettingA(const Part& device);

} // namespace lineward
