// The rule catalogue's rows: id, title, clause, severity and formula of every rule. A header
// so that rule ids are checked at compile time (RuleId); docs/rules.md mirrors it and a test
// keeps the two equal. Add a row here, a row in docs/rules.md, and the check itself.
#pragma once

#include "rules/finding.h"

#include <array>
#include <string_view>

namespace lineward {

/// Fixed facts about one rule.
struct RuleInfo {
    std::string_view id;      ///< dotted id of our own, e.g. "topology.unfed"
    std::string_view title;   ///< short title shown in the Findings list
    std::string_view clause;  ///< code clause or source ("NEC 2023 430.32", "common practice")
    Severity severity;        ///< severity when the rule is broken
    std::string_view formula; ///< the test, in words or symbols
};

namespace catalog_data {

inline constexpr std::array kRules{
    RuleInfo{
        "topology.unfed", "part fed by nothing", "common practice", Severity::Violation,
        "no path of parts and wires joins the part to a source, even with every device closed"},
    RuleInfo{"topology.deenergized", "part de-energized by an open device", "common practice",
             Severity::Note, "every path from a source to the part passes an open device"},
    RuleInfo{"topology.loop", "closed loop", "common practice", Severity::Note,
             "closed branches > nodes − components (a closed tie or parallel path); the "
             "studies solve it by nodal analysis"},
    RuleInfo{"topology.voltage.mismatch", "voltage mismatch", "NEMA MG 1-12.44; NEC 2023 110.3(B)",
             Severity::Violation,
             "motor: |V_system − V_rated| ≤ 10 % of V_rated; bus, load, transformer winding: "
             "|V_system − V_rated| ≤ 5 % of V_rated"},
    RuleInfo{"topology.motor.no_overload", "motor without overload protection",
             "NEC 2023 430.32; 430.124(A)", Severity::Violation,
             "an overload relay, or a drive that provides the overload protection (430.124(A)), "
             "lies in the branch between the motor and its feeding bus"},
    RuleInfo{"topology.inst_breaker.no_overload",
             "instantaneous-only breaker without an overload relay in its bucket",
             "NEC 2023 430.52(C)(3)", Severity::Violation,
             "the bucket holding the instantaneous-only breaker also holds an overload relay"},
    RuleInfo{"branch.flc.nameplate", "FLC taken from the nameplate", "NEC 2023 430.6(A)(1)",
             Severity::Note,
             "no row in Table 430.248/430.250 for the motor's hp and voltage: the "
             "nameplate FLA sizes the branch"},
    RuleInfo{"branch.flc.unknown", "no full-load current", "NEC 2023 430.6(A)(1)",
             Severity::Caution, "no table row and no nameplate FLA: the branch cannot be sized"},
    RuleInfo{"branch.conductor.ampacity", "branch conductor too small", "NEC 2023 430.22",
             Severity::Violation,
             "ampacity ≥ 1.25 × FLC; ampacity = min(A_ins × k_ambient × k_adjust, "
             "A_termination) × sets"},
    RuleInfo{"branch.scpd.missing", "no short-circuit protective device", "NEC 2023 430.52(A)",
             Severity::Violation, "the motor branch holds a breaker or fuses"},
    RuleInfo{"branch.scpd.rating", "short-circuit device too large", "NEC 2023 430.52(C)(1)",
             Severity::Violation,
             "rating ≤ Table 430.52(C)(1) % × FLC, raised to the next standard "
             "rating of the device type (Exception No. 1; fuses also 1, 3, 6, 10, 601 A)"},
    RuleInfo{"branch.scpd.low", "short-circuit device cannot carry the motor", "NEC 2023 430.52(B)",
             Severity::Violation,
             "rating ≥ the motor's running current (the larger of table FLC and nameplate FLA)"},
    RuleInfo{"branch.scpd.exception", "short-circuit device under Exception No. 2",
             "NEC 2023 430.52(C)(1) Exception No. 2", Severity::Caution,
             "rating above the table value but within the Exception No. 2 maximum (a "
             "non-time-delay fuse above 600 A: 300 %, 2(d)), motor marked hard to start"},
    RuleInfo{"branch.inst.setting", "instantaneous setting too high", "NEC 2023 430.52(C)(3)",
             Severity::Violation,
             "setting ≤ 800 % × FLC (1100 % Design B premium); up to 1300 % "
             "(1700 %) where the inrush needs it"},
    RuleInfo{"branch.inst.inrush", "instantaneous pickup below motor inrush", "common practice",
             Severity::Caution, "setting × (1 − 0.20) ≥ LRA × asymmetry factor"},
    RuleInfo{"branch.overload.no_fla", "overload setting cannot be judged", "NEC 2023 430.6(A)(2)",
             Severity::Caution, "the motor has a nameplate FLA"},
    RuleInfo{"branch.overload.low", "overload set below the motor's current",
             "common practice (430.32 sets the upper limit)", Severity::Violation,
             "setting ≥ nameplate FLA: a relay set lower trips the motor at full load"},
    RuleInfo{"branch.overload.setting", "overload setting too high", "NEC 2023 430.32(A)(1)",
             Severity::Violation,
             "trip current (ultimate trip multiple × setting) ≤ 125 % FLA (SF ≥ 1.15 or rise ≤ "
             "40 °C), else ≤ 115 % FLA"},
    RuleInfo{"branch.overload.exception", "overload setting under 430.32(C)", "NEC 2023 430.32(C)",
             Severity::Caution, "trip current above 430.32(A)(1) but ≤ 140 % (130 %) FLA"},
    RuleInfo{"branch.contactor.size", "contactor too small", "NEMA ICS 2 Table 2-4-1",
             Severity::Violation,
             "NEMA size hp at the motor voltage ≥ motor hp and continuous A ≥ "
             "motor current; or AC-3 A ≥ motor current"},
    RuleInfo{"branch.drive.input_conductor", "drive input conductor too small",
             "NEC 2023 430.122(A)", Severity::Violation,
             "ampacity of each cable between the bus and the drive ≥ 1.25 × the drive's rated "
             "input current"},
    RuleInfo{"branch.drive.scpd", "short-circuit device above the drive's listing",
             "NEC 2023 110.3(B); 430.130 (from memory)", Severity::Violation,
             "branch short-circuit device rating ≤ the drive's listed maximum (max_scpd_a; "
             "blank: 1.75 × rated input current, common practice)"},
    RuleInfo{"branch.drive.output", "drive output current below the motor's",
             "common practice (430.122, 430.124(A) context)", Severity::Violation,
             "rated output current ≥ motor current (the larger of table FLC and nameplate FLA)"},
    RuleInfo{"branch.soft_starter.rating", "soft starter rated below the motor",
             "common practice; NEC 2023 110.3(B)", Severity::Violation,
             "rated current ≥ motor current (the larger of table FLC and nameplate FLA)"},
    RuleInfo{"branch.soft_starter.bypass", "bypass contactor too small",
             "IEC 60947-4-1 AC-3; common practice", Severity::Violation,
             "where a bypass rating is given: bypass AC-3 rated current ≥ motor current"},
    RuleInfo{"branch.disconnect.rating", "disconnect ampere rating too low", "NEC 2023 430.110(A)",
             Severity::Violation, "ampere rating ≥ 1.15 × FLC"},
    RuleInfo{"branch.disconnect.hp", "disconnect horsepower rating too low",
             "NEC 2023 430.109(A)(1)", Severity::Violation, "hp rating ≥ motor hp"},
    RuleInfo{"branch.egc.size", "equipment grounding conductor too small", "NEC 2023 250.122",
             Severity::Violation,
             "EGC ≥ Table 250.122 size for the device, increased in proportion "
             "to the phase conductors (250.122(B))"},
    RuleInfo{"feeder.conductor.ampacity", "feeder conductor too small",
             "NEC 2023 430.24; 215.2(A)(1)", Severity::Violation,
             "ampacity ≥ 1.25 × largest FLC + other FLC + 1.25 × continuous + "
             "non-continuous"},
    RuleInfo{"feeder.device.rating", "feeder device too large", "NEC 2023 430.62(A)",
             Severity::Violation,
             "rating ≤ largest branch device + other motors' FLC + other loads, "
             "rounded down to a standard rating"},
    RuleInfo{"conductor.protection", "conductor not protected at its ampacity", "NEC 2023 240.4",
             Severity::Violation,
             "device rating ≤ ampacity, or the next standard rating up to 800 A "
             "(240.4(B)); small conductors per 240.4(D)"},
    RuleInfo{"bus.load", "bus rating below its load", "NEC 2023 110.3(B)", Severity::Violation,
             "continuous rating ≥ calculated load (430.24 method)"},
    RuleInfo{"transformer.load", "transformer loaded above its rating", "common practice",
             Severity::Caution, "sum of running currents ≤ rated secondary current"},
    RuleInfo{"transformer.protection", "transformer protection too large",
             "NEC 2023 Table 450.3(B)", Severity::Violation,
             "primary ≤ 125 % (next size) alone, or ≤ 250 % with secondary ≤ 125 % (next size)"},
    RuleInfo{"check.incomplete", "a family of checks could not run", "common practice",
             Severity::Violation,
             "every rule family ran to the end; one that stops on an internal error reports "
             "this instead of its findings, which are missing"},
    RuleInfo{"study.cable.no_data", "cable without impedance data", "common practice",
             Severity::Caution,
             "the cable's size has a row in NEC Chapter 9 Table 9 (or is a mm² size)"},
    RuleInfo{"study.loadflow.diverged", "load flow did not settle", "common practice",
             Severity::Caution,
             "the fixed-point load flow converges within 200 iterations to 1e−9 per unit"},
    RuleInfo{"study.ratio.mismatch", "transformer ratios disagree around a loop", "common practice",
             Severity::Caution,
             "every closed path between two buses gives the same no-load voltage ratio (turns "
             "ratio and tap of each transformer on it); otherwise a circulating current flows "
             "that the studies do not model"},
    RuleInfo{"study.solve.failed", "a study could not be solved", "common practice",
             Severity::Violation,
             "the network's admittance matrix factorises, so the short-circuit study and the "
             "load flow have an answer (the checks that need them are otherwise not "
             "performed)"},
    RuleInfo{"study.not_finite", "a study result could not be computed", "common practice",
             Severity::Caution,
             "every fault current, voltage, running current and starting voltage is a finite "
             "number"},
    RuleInfo{"duty.interrupting", "interrupting rating below available fault", "NEC 2023 110.9",
             Severity::Violation,
             "interrupting rating ≥ symmetrical fault current at the line side; the rating is "
             "divided by the X/R multiplying factor where the system X/R exceeds the X/R of the "
             "rating's test circuit (IEEE Std 1015 method)"},
    RuleInfo{"duty.sccr", "bucket SCCR below available fault", "NEC 2023 110.10; 430.8; 409.22",
             Severity::Violation,
             "bucket short-circuit current rating ≥ fault current at its line side"},
    RuleInfo{"duty.bracing", "bus bracing below available fault", "NEC 2023 110.10",
             Severity::Violation, "bus bracing ≥ fault current at the bus"},
    RuleInfo{"duty.withstand", "cable cannot withstand the let-through",
             "ICEA P-32-382; IEC 60364-4-43", Severity::Violation,
             "stated let-through I²t (or I² × stated clearing time) ≤ cable I²t = "
             "0.0297·log10((T2+234)/(T1+234))·A² for copper (0.0125, 228 for aluminium), "
             "k²S² for mm² sizes"},
    RuleInfo{"duty.withstand.assumed", "cable withstand not shown", "ICEA P-32-382; IEC 60364-4-43",
             Severity::Caution,
             "as duty.withstand with an assumed clearing time: 1.5 cycles in a breaker's "
             "instantaneous region, half a cycle for a fuse above 20 × rating"},
    RuleInfo{"voltage.drop.branch", "branch voltage drop above the limit",
             "NEC 2023 210.19 informational note (setting)", Severity::Caution,
             "(|V_bus| − |V_load|) / V_nominal ≤ vdrop_branch_pct"},
    RuleInfo{"voltage.drop.total", "feeder + branch voltage drop above the limit",
             "NEC 2023 215.2 informational note (setting)", Severity::Caution,
             "(|V_origin| − |V_load|) / V_nominal ≤ vdrop_total_pct; origin = supplying "
             "transformer or source"},
    RuleInfo{"voltage.motor.range", "motor runs outside its voltage range", "NEMA MG 1-12.44",
             Severity::Violation,
             "steady-state terminal voltage within ±10 % of the motor's rated voltage (the "
             "load flow, with every source at its rating and each transformer at its tap)"},
    RuleInfo{"voltage.start.dip", "bus dip while a motor starts", "common practice (setting)",
             Severity::Caution,
             "dip at the motor's bus with it at locked rotor, others running ≤ start_dip_pct"},
    RuleInfo{"voltage.start.terminal", "low motor voltage while starting",
             "common practice (setting)", Severity::Caution,
             "terminal voltage at locked rotor ≥ start_terminal_pct of rated"},
    RuleInfo{"curve.nuisance", "device may trip on motor start", "common practice",
             Severity::Caution,
             "device minimum time > 0.1 s at the asymmetrical inrush, > acceleration time at "
             "locked-rotor "
             "current, and no trip at running current"},
    RuleInfo{"curve.overload.stall", "overload relay slower than the motor's stall time",
             "IEC 60947-4-1; common practice", Severity::Caution,
             "relay maximum time from hot at locked-rotor current < safe stall time (hot)"},
    RuleInfo{"curve.overload.start", "overload relay may trip during acceleration",
             "IEC 60947-4-1; common practice", Severity::Caution,
             "relay minimum time from cold at locked-rotor current > acceleration time"},
    RuleInfo{"curve.cable.damage", "protection slower than the cable's damage curve",
             "NEC 2023 110.10; ICEA P-32-382", Severity::Caution,
             "combined maximum clearing time < I²t / I² at every current from 2 × ampacity to the "
             "instantaneous region (below the available fault)"},
    RuleInfo{"curve.min_fault.reach", "minimum fault below the fast region",
             "common practice; IEC 60909-0 c_min (setting)", Severity::Caution,
             "minimum fault at the cable's far end (c_min, conductors at their insulation "
             "rating, no motors) ≥ the current from which its protection's instantaneous or "
             "short-time region clears (1.2 × a thermal-magnetic or instantaneous-only pickup, "
             "1.1 × an electronic pickup)"},
    RuleInfo{"curve.selectivity", "devices not selective", "common practice (setting)",
             Severity::Caution,
             "upstream minimum time > downstream maximum time + coordination margin for every "
             "current up "
             "to the fault available at the downstream device"},
    RuleInfo{"curve.selectivity.listing", "selective only on typical generic bands",
             "common practice (setting curve_bands)", Severity::Note,
             "a pair judged selective on the typical generic bands is also selective with the "
             "downstream thermal-magnetic breaker at its listing limits (UL 489 at 135 % and "
             "200 %); where not, the manufacturers' curves must decide"},
    RuleInfo{"drawing.tag.duplicate", "duplicate tag", "common practice", Severity::Caution,
             "no two parts share a tag"},
    RuleInfo{"topology.dangling", "unconnected terminal", "common practice", Severity::Caution,
             "every terminal of a part has at least one wire"},
    RuleInfo{"arcflash.energy.caution", "arc-flash incident energy above the caution setting",
             "NFPA 70E 2024 130.5; NEC 2023 110.16 (setting: common practice)", Severity::Caution,
             "IEEE 1584-2018 incident energy at the working distance ≤ arc_flash_caution_cal "
             "(worse of the full and the reduced arcing current)"},
    RuleInfo{"arcflash.energy.limit", "arc-flash incident energy above 40 cal/cm²",
             "NFPA 70E 2024 130.5 (40 cal/cm²: common practice)", Severity::Violation,
             "IEEE 1584-2018 incident energy at the working distance ≤ 40 cal/cm² (above it, "
             "energized work is not permitted: common practice)"},
    RuleInfo{"arcflash.outside_model", "arc flash not computed: outside the model",
             "IEEE 1584-2018 4.2", Severity::Caution,
             "208 V ≤ Voc ≤ 15 kV; bolted fault, gap, working distance and enclosure within the "
             "model's range; otherwise no incident energy is given"},
};

} // namespace catalog_data

} // namespace lineward
