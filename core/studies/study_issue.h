// What a study could not do, as a typed result: the studies compute and report; the rules turn
// each issue into a finding (rules/study_rules.cpp). Studies never build findings themselves.
#pragma once

#include "model/ids.h"

#include <string>
#include <vector>

namespace lineward {

/// Why a study result is missing or approximate.
enum class StudyIssueKind {
    CableNoData,         ///< a cable size without impedance data: treated as having none
    NotFinite,           ///< a value left the range of numbers and is shown as unknown
    FaultSolveFailed,    ///< the fault study's admittance matrix did not factorise
    LoadFlowSolveFailed, ///< the load flow's admittance matrix did not factorise
    LoadFlowDiverged,    ///< the load flow did not settle within its iteration limit
    RatioMismatch,       ///< transformers around a loop disagree on a bus's voltage
};

/// One thing a study could not compute, where and why.
struct StudyIssue {
    StudyIssueKind kind;
    std::vector<PartId> parts; ///< the parts it concerns (none for the whole network)
    std::string message;       ///< what could not be computed and why, in words
};

} // namespace lineward
