// A read-only view of one analysis below the rules: the drawing, its network and supply tree,
// the motor branches, the tables and the study results. The check builds each of these once;
// the curves and the rules read them through this view and never build their own.
#pragma once

#include "model/drawing.h"
#include "studies/study.h"
#include "tables/tables.h"
#include "topology/flow.h"
#include "topology/motor_branch.h"
#include "topology/network.h"

#include <string>
#include <vector>

namespace lineward {

class PathDeviceTable; // curves/path_curves.h

/// Inputs every curve and rule computation reads; all owned by the check result.
struct StudyView {
    const Drawing& drawing;
    const Network& net;
    const Flow& flow;
    const Tables& tables;
    const StudyResults& study;
    const std::vector<MotorBranch>& branches;
    /// Every protective part's band, built once by the check; null: curves are built per use.
    const PathDeviceTable* devices = nullptr;
    const Settings& settings() const { return drawing.settings; }
    /// The part's tag, or "#id" for a part without one.
    std::string tag(PartId id) const;
};

} // namespace lineward
