// What every rule family receives: the network, its supply tree, the tables and settings.
#pragma once

#include "model/drawing.h"
#include "rules/finding.h"
#include "studies/study.h"
#include "tables/tables.h"
#include "topology/flow.h"
#include "topology/network.h"

#include <optional>
#include <vector>

namespace lineward {

/// Read-only inputs of one check.
struct RuleContext {
    const Drawing& drawing;
    const Network& net;
    const Flow& flow;
    const Tables& tables;
    const StudyResults& study;
    const Settings& settings() const { return drawing.settings; }
    std::string tag(PartId id) const;
};

/// The parts of one motor's branch circuit, found from the motor back to its bus.
struct MotorBranch {
    const Part* motor = nullptr;
    std::vector<const Part*> chain; ///< nearest the motor first
    const Part* scpd = nullptr;     ///< the protective part nearest the bus
    const Part* disconnect = nullptr;
    const Part* contactor = nullptr;
    const Part* overload = nullptr;
    std::vector<const Part*> cables;
};
std::vector<MotorBranch> motorBranches(const RuleContext& ctx);

/// Current drawn by a static load at its rated voltage.
double loadAmps(const Part& load);

void checkMotorBranches(const RuleContext& ctx, std::vector<Finding>& out);
void checkFeeders(const RuleContext& ctx, std::vector<Finding>& out);
void checkDuty(const RuleContext& ctx, std::vector<Finding>& out);
void checkVoltage(const RuleContext& ctx, std::vector<Finding>& out);
void checkCurves(const RuleContext& ctx, std::vector<Finding>& out);

} // namespace lineward
