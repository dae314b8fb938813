// Arc-flash study on one analysis: for every bus and every bucket, the IEEE 1584-2018 model
// (studies/arc_flash.h) with the bolted fault current of the fault study and the arcing time of
// the protective device that clears the arc (its band's maximum time at the arcing current it
// sees). The check runs it once and keeps the result; every consumer reads that.
//
// The study supports a licensed engineer's assessment; it does not replace it.
#pragma once

#include "studies/arc_flash.h"
#include "studies/study_view.h"

#include <optional>
#include <string>
#include <vector>

namespace lineward {

/// One piece of equipment's arc-flash result.
struct ArcFlashEquipment {
    PartId part;                    ///< the bus, or the bucket's bus for a bucket
    std::optional<BucketId> bucket; ///< set for a bucket
    std::string tag;                ///< bus tag, or bucket tag
    std::string kind;         ///< "switchboard", "mcc", "panelboard", "cable_junction", "bucket"
    bool usedTypical = false; ///< some equipment data came from Tables 8 and 10
    arcflash::Input input;
    arcflash::Result result;          ///< result.range.outside non-empty: no number
    const Part* clearing = nullptr;   ///< the device that clears the arc; null: none found
    double tFullS = 0, tReducedS = 0; ///< arcing times at the full and reduced arcing current
    bool cappedFull = false, cappedReduced = false; ///< arcing time cut to the setting
    /// The clearing device's maximum clearing time at the bolted fault current (not capped):
    /// NEC 2023 110.16(B)'s clearing time for service equipment; nothing without a device.
    std::optional<double> tBoltedS;
    std::vector<std::string> notes; ///< the study's own notes (cap, line side, assumptions)
    /// Incident energy of the governing case, cal/cm²; nothing when outside the model.
    std::optional<double> energyCal() const;
    std::optional<double> boundaryMm() const;
};

/// The study over every energized bus and bucket, in drawing order (each bus, then its
/// buckets). Equipment the fault study did not reach is left out.
std::vector<ArcFlashEquipment> arcFlashStudy(const StudyView& ctx);

} // namespace lineward
