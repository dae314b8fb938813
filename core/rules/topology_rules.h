// Topology rules: feeding, loops, voltage levels, overload presence, loose terminals.
#pragma once

#include "rules/finding.h"
#include "topology/network.h"

#include <vector>

namespace lineward {

/// Appends the findings of every topology.* rule.
void checkTopology(const Network& net, std::vector<Finding>& out);

} // namespace lineward
