// Motor branch-circuit sizing by NEC 2023 Article 430: the calculations shared by the rules,
// the auto-size proposal and `lineward-cli size`. Each result carries its trace.
#pragma once

#include "model/drawing.h"
#include "tables/tables.h"
#include "util/trace.h"

#include <optional>
#include <string>
#include <vector>

namespace lineward {

/// Full-load current used for conductors, short-circuit device and disconnect (430.6(A)(1)).
struct MotorFlc {
    double amps = 0;
    bool fromTable = true; ///< false where the table has no row and the nameplate was used
    double hpUsed = 0;     ///< table row (kW motors use the next hp row at or above kW/0.746)
    double columnV = 0;
    std::vector<TraceStep> trace;
};
std::optional<MotorFlc> motorFlc(const Part& motor, const Tables& t, bool withTrace = true);
double motorHp(const Part& motor); ///< hp, or kW / kKwPerHp
MotorType motorTypeOf(const Part& motor);

/// Largest permitted rating or setting by Table 430.52(C)(1).
struct ScpdLimit {
    double pct = 0;  ///< table percentage
    double rawA = 0; ///< pct × FLC
    double maxA = 0; ///< after the next-standard-size rule (Exc. 1); the raw value for settings
    bool roundedUp = false;
    double excPct = 0;   ///< Exception No. 2 or 430.52(C)(3) percentage
    double excMaxA = 0;  ///< largest rating the exception permits (rounded down for ratings)
    std::string excNote; ///< why the ceiling is not excPct × FLC, where it is not
};
ScpdLimit scpdLimit(ScpdType type, MotorType motor, double flc, const Tables& t);
/// The row of Table 430.52(C)(1) a motor is judged on, in words, for a trace (a motor marked
/// Design E, which the 2023 table has no row for, says so).
TraceStep scpdRowStep(const Part& motor);
std::optional<ScpdType> scpdTypeOf(const Part& device);

/// Locked-rotor current: the given LRA, else from the code letter (upper end of its range).
std::optional<double> lockedRotorA(const Part& motor, const Tables& t,
                                   std::vector<TraceStep>* trace);

/// Locked-rotor multiple assumed where a motor has neither an LRA nor a code letter (common
/// practice: 6 × full-load current for a squirrel-cage motor across the line).
inline constexpr double kAssumedLockedRotorMultiple = 6.0;
/// NEC 2023 430.52(C)(1) Exception No. 2(a) covers non-time-delay fuses "not exceeding 600
/// amperes"; Exception No. 2(d) permits fuses rated 601–6000 A up to 300 % of FLC.
inline constexpr double kExc2aFuseMaxA = 600.0;
inline constexpr double kExc2dPct = 300.0;
/// kW per horsepower for turning a kW rating into a table row (746 W per hp, common practice;
/// 1 hp is 745.7 W).
inline constexpr double kKwPerHp = 0.746;

/// The locked-rotor current every study, curve and rule uses: lockedRotorA where it is known,
/// else kAssumedLockedRotorMultiple × the table FLC (the nameplate FLA where the table has no
/// row), marked assumed and said so in the trace. Nothing where there is no current to base it on.
struct LockedRotor {
    double amps = 0;
    bool assumed = false;
};
std::optional<LockedRotor> lockedRotor(const Part& motor, const Tables& t,
                                       std::vector<TraceStep>* trace);
/// The largest short-circuit device assumed for a drive whose listing maximum is not given: 175 %
/// of its rated input current (common practice, from memory: drive instructions commonly name
/// fuses or breakers of about 150–200 % of the input current). Shown in every trace that uses it.
inline constexpr double kAssumedDriveScpdX = 1.75;

/// What a motor draws from its supply while it starts. Across the line: its locked-rotor
/// current (lockedRotor), with an asymmetrical offset. Through a drive: the drive's rated input
/// current (assumed: the drive accelerates the motor within its current limit, and the line
/// side draws no more than about its rated input current; no asymmetrical inrush, the DC bus
/// charges through its pre-charge circuit). Through a soft starter: its current limit
/// (start_limit_x) × the motor's FLC, at most the locked-rotor current, no asymmetrical offset
/// (the starter ramps the voltage from a fraction of rated).
struct StartingCurrent {
    double amps = 0;
    bool limited = false; ///< a drive or soft starter sets it (no asymmetrical inrush)
    bool assumed = false; ///< across the line with the locked-rotor current assumed
    std::string basis;    ///< how it was found, for traces
};
/// `starter` is the drive or soft starter of the motor's branch, or null (across the line).
std::optional<StartingCurrent> startingCurrent(const Part& motor, const Part* starter,
                                               const Tables& t);

/// Instantaneous pickup tolerance assumed below the setting (common practice: ±20 %).
inline constexpr double kInstantaneousTolerance = 0.20;

/// Installation conditions of a conductor.
struct CableConditions {
    Material material = Material::Cu;
    int insulationC = 90, terminationC = 75;
    double ambientC = 30;
    int conductors = 3;
    int sets = 1;
};
CableConditions conditionsOf(const Part& cable, const Settings& s);

/// Ampacity after 110.14(C), 310.15(B)(1) and 310.15(C)(1), times parallel sets.
struct Ampacity {
    double amps = 0;
    std::vector<TraceStep> trace;
};
/// `withTrace` false skips building the trace text (the checks ask again when they report).
std::optional<Ampacity> cableAmpacity(const std::string& size, const CableConditions& c,
                                      const Tables& t, bool withTrace = true);
/// Smallest US size (from `minSize`) whose ampacity reaches `requiredA`.
std::optional<std::pair<std::string, Ampacity>>
smallestCable(double requiredA, const CableConditions& c, const Tables& t,
              const std::string& minSize = "14 AWG", bool withTrace = true);

/// Overload limits of 430.32(A)(1) and (C) from the nameplate FLA.
struct OverloadLimit {
    double pctA = 0, maxA = 0; ///< 125 % or 115 %
    double pctC = 0, maxC = 0; ///< 140 % or 130 %
    std::string basis;
};
OverloadLimit overloadLimit(const Part& motor, double fla);

/// Smallest NEMA size rated for the hp at the voltage and the current.
std::optional<std::string> smallestNemaSize(double hp, double volts, int phases, double amps,
                                            const Tables& t);

/// Equipment grounding conductor by Table 250.122, increased by 250.122(B) in proportion to the
/// phase conductor's area over the minimum size.
struct EgcSize {
    std::string size;
    std::vector<TraceStep> trace;
};
std::optional<EgcSize> egcSize(double deviceA, Material m, const std::string& phaseSize,
                               const std::string& minPhaseSize, const Tables& t,
                               bool withTrace = true);
/// Device rating used for the EGC (250.122(D)(1): a time-delay fuse rating for instantaneous
/// breakers).
double egcDeviceRating(const Part& device, ScpdType type, MotorType motor, double flc,
                       const Tables& t);

} // namespace lineward
