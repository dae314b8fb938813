// The curves on a path: the protective parts from a part back to its source, the motor's
// starting profile and the cable's damage curve. Shared by the rules, `lineward-cli trip`,
// `lineward-cli curves` and the Curves panel.
#pragma once

#include "curves/path_types.h"
#include "studies/study_view.h"

#include <optional>
#include <unordered_map>
#include <vector>

namespace lineward {

/// Every protective part's band and breaking limit, built once per check: the rules and the
/// arc-flash study ask for the same devices many times (each motor, cable, bus and selectivity
/// pair walks up through them), and a band built again per ask cost as much as the rule.
class PathDeviceTable {
public:
    explicit PathDeviceTable(const StudyView& ctx);
    /// The part's band, or null when it has none (not protective, or its user points are bad).
    const PathDevice* find(PartId part) const;

private:
    std::unordered_map<PartId, PathDevice> m_devices;
};

/// How far up devicesOnPath goes: to the source; only to the first device above the part that
/// is not an overload relay (what a selectivity check compares against); or only to the first
/// device that is not an overload relay, the part itself included (a conductor's own
/// protection: its branch device and the overload relay of its bucket).
enum class PathExtent { ToSource, NearestUpstream, OwnProtection };

/// Protective parts (breakers, fuses, overload relays) from `part` toward the source, nearest
/// first: the part itself when protective, its branch chain, then each device above.
std::vector<PathDevice> devicesOnPath(const StudyView& ctx, PartId part,
                                      PathExtent extent = PathExtent::ToSource);

/// The current an overload relay's contactor can break (kContactorBreakingX × its AC-3 rating
/// or NEMA size continuous current; the relay's setting where the branch has no rated
/// contactor); `how` receives the reason in words.
double overloadBreakingA(const StudyView& ctx, const Part& overload, std::string* how = nullptr);
/// The same for a relay whose contactor is known (null: none in its branch).
double overloadBreakingA(const Tables& tables, const Part& overload, const Part* contactor,
                         std::string* how = nullptr);

std::optional<StartProfile> startProfile(const StudyView& ctx, const Part& motor);

/// Cable damage: the I²t it takes (ICEA P-32-382 / IEC adiabatic, per parallel set times sets²).
std::optional<double> cableDamageI2t(const StudyView& ctx, const Part& cable);

/// Fault current available at a part's line side, in amperes (0 when unknown).
double availableFaultA(const StudyView& ctx, const Part& part);

} // namespace lineward
