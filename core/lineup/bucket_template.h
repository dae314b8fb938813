// Bucket templates: a bucket saved as a small .lineward fragment (its devices, cable and motor,
// wired, and the bucket) and, on insert, the load-list row it stands for — so the bucket is
// sized again for the bus it goes on rather than copied with another bus's ratings.
#pragma once

#include "io/load_list.h"
#include "model/drawing.h"

#include <optional>
#include <string>

namespace lineward {

/// The fragment of one bucket of `d`: the bucket's parts, the cable and motor wired below its
/// last device, the wires between them and the bucket itself. Refused (reason in `why`) when
/// the bucket has no motor below it.
std::optional<Drawing> bucketFragment(const Drawing& d, BucketId bucket, std::string& why);

/// The row a template stands for: its motor (every rating kept), its short-circuit device
/// (inverse-time breaker, instantaneous-only breaker or fused switch), its starter (a drive or
/// soft starter where the fragment holds one, else full voltage) and its cable's length. Refused
/// (reason in `why`) for a fragment without exactly one motor or without a short-circuit device.
std::optional<LoadRow> templateRow(const Drawing& fragment, std::string& why);

} // namespace lineward
