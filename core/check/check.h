// The check: drawing → network → studies → rules → findings, once per edit. It returns one
// immutable check result that every consumer (the editor's panels and badges, the Submittal,
// the command line) reads; none of them builds a network or runs a study itself.
#pragma once

#include "curves/path_types.h"
#include "model/drawing.h"
#include "rules/finding.h"
#include "sizing/motor_sizing.h"
#include "tables/tables.h"
#include "topology/motor_branch.h"

#include <array>
#include <cstdint>
#include <memory>
#include <optional>
#include <unordered_map>
#include <vector>

namespace lineward {

// Held by pointer so that this header (and the editor's Document) pulls in no graph or solver
// headers; include topology/network.h, topology/flow.h, studies/study.h or
// studies/study_view.h where they are read.
class Network;
class Flow;
struct StudyResults;
struct StudyView;
struct ArcFlashEquipment;

/// Everything one check of a drawing found.
struct CheckReport {
    std::vector<Finding> findings; ///< sorted: severity (worst first), first part, rule
    /// Open (not accepted) findings by severity: note, caution, violation.
    std::array<int, 3> openCounts{0, 0, 0};
    int acceptedCount = 0;
    /// Accepted deviations (indexes into Drawing::accepted()) that match no finding any longer:
    /// the drawing changed under them. Listed, never silently kept.
    std::vector<std::size_t> staleAccepted;
    /// True where an open finding is at or above `threshold`.
    bool hasOpenAtLeast(Severity threshold) const;
};

/// One analysis of one drawing: immutable once made, shared read-only by every consumer. Each
/// stage is present when the stage before it could be built (a drawing whose network cannot be
/// built has findings and nothing else).
struct CheckResult {
    std::shared_ptr<const Drawing> drawing; ///< the drawing this result was made from
    const Tables* tables = nullptr;         ///< owned by the caller, who keeps it alive
    std::uint64_t generation = 0;           ///< the editor's edit count when it was made
    std::unique_ptr<const Network> net;
    std::unique_ptr<const Flow> flow;
    std::unique_ptr<const StudyResults> study;
    std::vector<MotorBranch> branches;
    std::vector<MotorFacts> motors; ///< one per motor the network reaches
    /// Each energized cable's ampacity (NEC Table 310.16 with its conditions), where the table
    /// has its size: what the schedules show.
    std::unordered_map<PartId, double> cableAmpacityA;
    /// The arc-flash study (IEEE 1584-2018) at every energized bus and bucket
    /// (curves/arc_flash_study.h); empty when no study could run.
    std::shared_ptr<const std::vector<ArcFlashEquipment>> arcFlash;
    CheckReport report;

    CheckResult();
    ~CheckResult();
    CheckResult(const CheckResult&) = delete; // the network points into `drawing`
    CheckResult& operator=(const CheckResult&) = delete;

    /// The view the curves, schedules and rules read; empty when no study could run.
    std::optional<StudyView> view() const;
    /// The facts of a motor, or nothing when the motor is not reached.
    const MotorFacts* motorFacts(PartId motor) const;
};

/// Runs the whole analysis of a drawing. Pure: the same drawing gives the same result. Never
/// throws: an internal error becomes the finding `check.incomplete`.
std::shared_ptr<const CheckResult> runCheck(std::shared_ptr<const Drawing> drawing,
                                            const Tables& tables, std::uint64_t generation = 0);
/// The same on a copy of the drawing.
std::shared_ptr<const CheckResult> runCheck(const Drawing& drawing, const Tables& tables,
                                            std::uint64_t generation = 0);

/// The findings of a check (tests and callers that want nothing else).
CheckReport checkDrawing(const Drawing& drawing, const Tables& tables);

/// Whether an accepted deviation covers a finding: the same rule, and the acceptance names the
/// finding's first part (the part it is about). The one test the check, the editor and the
/// Submittal use.
bool acceptanceCovers(const Accepted& a, const Finding& f);

/// Drops a finding's computed value or limit where it is not finite (there is no number to
/// show), keeping the finding and saying so in its trace.
void guardFindingNumbers(std::vector<Finding>& findings);

} // namespace lineward
