// Arc-flash rules on the check's arc-flash study: caution above the drawing's setting,
// violation above 40 cal/cm², and equipment the model cannot take.
#pragma once

#include "curves/arc_flash_study.h"
#include "rules/finding.h"

#include <vector>

namespace lineward {

void checkArcFlash(const StudyView& ctx, const std::vector<ArcFlashEquipment>& equipment,
                   std::vector<Finding>& out);

} // namespace lineward
