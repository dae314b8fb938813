// A lineup from a load list: sized buckets for an MCC bus (Import Load List) and a whole lineup
// — service, transformer, main breaker, MCC bus, buckets — for `lineward-cli new`. One core
// function serves both, so the window and the command line draw the same buckets.
#pragma once

#include "io/load_list.h"
#include "model/drawing.h"
#include "sizing/auto_size.h"
#include "tables/tables.h"
#include "util/trace.h"

#include <optional>
#include <string>
#include <utility>
#include <vector>

namespace lineward {

struct CheckResult;

/// One row's bucket: the proposal it was sized from and the parts, wires and bucket to add.
struct PlannedBucket {
    int line = 0; ///< the load list's line
    BucketProposal proposal;
    std::vector<Part>
        parts; ///< device(s), contactor/drive/soft starter, overload relay, cable, motor
    std::vector<Wire> wires; ///< bus → device → ... → motor
    Bucket bucket;
    std::vector<std::string> notes; ///< values assumed for a drive or soft starter, to enter
    /// Values the designer changed after sizing (part index, field key): changeBucketValue.
    std::vector<std::pair<std::size_t, std::string>> changed;
};

/// One line of a proposed bucket as a designer reads it: the part, its rating or setting, and
/// the clause or table that set it.
struct ProposalLine {
    std::string tag, value, basis;
};
std::vector<ProposalLine> describeBucket(const PlannedBucket& b);

/// Buckets for a bus, ready to add as one edit; rows that could not be sized are refused.
struct BucketPlan {
    std::vector<PlannedBucket> buckets;
    std::vector<LoadListIssue> refused;
    /// Every part, wire and bucket of every planned bucket (what one edit adds).
    std::vector<Part> allParts() const;
    std::vector<Wire> allWires() const;
    std::vector<Bucket> allBuckets() const;
};

/// Sizes one bucket per row (proposeBucket) and lays the buckets out below `bus`, to the right
/// of the buckets already on it, with ids and tags free in `d`. `interruptingKa` is the
/// interrupting rating and bucket SCCR given to the new devices.
BucketPlan planBuckets(const Drawing& d, PartId bus, const std::vector<LoadRow>& rows,
                       double interruptingKa, const Tables& t);

/// Standard duty ratings (kA) for bus bracing, breaker interrupting ratings and bucket SCCR
/// (common practice, from memory).
inline constexpr double kDutyKa[] = {42, 65, 85, 100, 150, 200};

/// The duty new buckets on `bus` need: the next of kDutyKa at or above the bus's available
/// fault in the check; nothing when the check has no fault there or it is above 200 kA.
std::optional<double> bucketDutyKa(const CheckResult& r, PartId bus);

/// Choices of `lineward-cli new`.
struct LineupOptions {
    double systemVolts = 480; ///< low-voltage system (the MCC bus)
    double serviceKv = 13.8;  ///< utility service voltage
    double serviceMva = 250;  ///< available three-phase fault at the service
    double serviceXr = 15;
};

/// Transformer impedance assumed for the new lineup's transformer (common practice for a
/// liquid-filled 13.8 kV unit; replace with the nameplate value) and its X/R (from memory,
/// a typical value for 500–1000 kVA).
inline constexpr double kAssumedTxZPct = 5.75;
inline constexpr double kAssumedTxXr = 5.7;

/// A whole lineup, its sizing basis and what the builder could not do.
struct Lineup {
    Drawing drawing;
    std::vector<TraceStep> basis; ///< how the transformer, main, bus and duty were chosen
    std::vector<std::string> notes;
    std::vector<LoadListIssue> refused; ///< rows that could not be sized
};

/// Builds a complete lineup from the rows. Refused rows are listed and left out; the caller
/// decides whether to keep a lineup with refusals (the command line does not).
Lineup buildLineup(const std::vector<LoadRow>& rows, const LineupOptions& o, const Tables& t);

} // namespace lineward
