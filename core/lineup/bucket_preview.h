// A proposed bucket before it is placed: every value of every part with what set it, a value
// the designer changes (checked as the Inspector checks it), and the findings the bucket would
// cause once on the bus (the one check, run on a copy of the drawing).
#pragma once

#include "lineup/lineup_builder.h"
#include "rules/finding.h"

#include <string>
#include <vector>

namespace lineward {

struct CheckReport;

/// One value of a proposed part and the clause, table or practice that set it.
struct BucketField {
    std::size_t partIndex = 0; ///< index into PlannedBucket::parts
    std::string key;           ///< the field's file key
    std::string basis;
};

/// Every value the parts of `b` carry (fields left empty are not listed), in the order of the
/// parts and of each kind's field list.
std::vector<BucketField> bucketFields(const PlannedBucket& b);

/// Sets one value of one part of the bucket as the Inspector would: the part's own field
/// validation decides; returns the reason when refused (the bucket is unchanged). The basis of
/// a changed value becomes "changed by the designer".
std::optional<std::string> changeBucketValue(PlannedBucket& b, std::size_t partIndex,
                                             std::string_view key, FieldValue v);

/// The open findings the plan would cause once added to `d`: runCheck on a copy of the drawing
/// with the plan's parts, wires and buckets; those naming a part of the plan, and those naming
/// `bus` that `before` (the drawing's own check) does not already hold.
std::vector<Finding> findingsWithPlan(const Drawing& d, const BucketPlan& plan, PartId bus,
                                      const CheckReport& before, const Tables& t);

} // namespace lineward
