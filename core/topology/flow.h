// Direction of supply: a breadth-first tree from the sources over closed branches, giving each
// branch a line side and a load side and each node the loads it feeds.
#pragma once

#include "topology/network.h"

#include <optional>
#include <vector>

namespace lineward {

/// The supply tree of a network. In a meshed network the tree is the breadth-first one: loads
/// are counted once, through the path nearest a source.
class Flow {
public:
    explicit Flow(const Network& net);

    /// Node on the source side of a two-terminal part (terminal 0's node when not energized).
    NodeIndex lineNode(PartId part) const;
    NodeIndex loadNode(PartId part) const;
    /// The branch feeding a node, or nothing at a source node or an unfed node.
    std::optional<PartId> feedingBranch(NodeIndex n) const;
    /// Motors and static loads fed from this node (through the tree), nearest first.
    std::vector<PartId> loadsBelow(NodeIndex n) const;
    /// The first protective part met walking from this node toward the source.
    std::optional<PartId> protectionAbove(NodeIndex n) const;

private:
    const Network& m_net;
    std::vector<std::optional<BranchDesc>> m_parentEdge; // by node
    std::vector<std::vector<BranchDesc>> m_children;     // by node
};

} // namespace lineward
