// The one-line drawing as DXF for CAD users: each part kind on its own layer, wires, tags,
// ratings, badges, bucket frames and a title block on layers of their own (docs/dxf.md).
#pragma once

#include "check/check.h"

#include <filesystem>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace lineward::dxf {

/// Layers besides the part kinds' (docs/dxf.md lists them all).
inline constexpr std::string_view kWireLayer = "LW-WIRES";
inline constexpr std::string_view kTagLayer = "LW-TEXT-TAGS";
inline constexpr std::string_view kRatingLayer = "LW-TEXT-RATINGS";
inline constexpr std::string_view kBadgeLayer = "LW-BADGES";
inline constexpr std::string_view kBucketLayer = "LW-BUCKETS";
inline constexpr std::string_view kTitleLayer = "LW-TITLE-BLOCK";

/// DXF units: one drawing unit is one inch; the Sheet's grid unit is 0.1 in.
inline constexpr double kInchesPerSheetUnit = 0.1;

/// The layer of a part kind's symbols, e.g. "LW-PART-MOTOR".
std::string partLayer(PartKind kind);
/// Every layer the export declares, in the order it declares them.
std::vector<std::string> allLayers();

/// The rating lines written under a part's tag: "key = value unit", one per rating given.
std::vector<std::string> ratingLines(const Part& part);

/// The DXF text of a checked drawing: symbols, wires, tags, ratings, the badges of its open
/// findings (worst severity per part), bucket frames and the title block.
std::string oneLineDxf(const CheckResult& result);

/// oneLineDxf written atomically to `path` (io::writeFileAtomic): the old file stays as it was
/// on failure. Returns the reason on failure.
std::optional<std::string> writeOneLineDxf(const CheckResult& result,
                                           const std::filesystem::path& path);

} // namespace lineward::dxf
