// Direction of supply: a breadth-first tree from the sources over closed branches, giving each
// branch a line side and a load side and each node the loads it feeds.
#pragma once

#include "topology/network.h"

#include <optional>
#include <span>
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
    /// The node on the source side of the branch feeding `n`, or nothing at a source node or an
    /// unfed node.
    std::optional<NodeIndex> parentNode(NodeIndex n) const;
    /// Motors and static loads fed from this node (through the tree), in depth-first order from
    /// the node. A view into one list laid out once, so asking is constant time at any depth.
    std::span<const PartId> loadsBelow(NodeIndex n) const;
    /// The first protective part met walking from this node toward the source (found once for
    /// every node, top down).
    std::optional<PartId> protectionAbove(NodeIndex n) const;
    /// The first protective part or overload relay (a part with a trip curve) above the node.
    std::optional<PartId> curveDeviceAbove(NodeIndex n) const;
    /// Fed nodes, every node after the node that feeds it (breadth-first from the sources).
    /// Walking it forward passes values down the tree, backward sums them up, each in one pass.
    const std::vector<NodeIndex>& topDown() const { return m_order; }

private:
    void layOutLoads();

    const Network& m_net;
    std::vector<std::optional<BranchDesc>> m_parentEdge; // by node
    std::vector<std::vector<BranchDesc>> m_children;     // by node
    std::vector<NodeIndex> m_order;                      // fed nodes, breadth-first
    std::vector<PartId> m_loads;                         // depth-first: each subtree contiguous
    std::vector<std::pair<std::size_t, std::size_t>> m_loadRange; // by node: [first, last)
    std::vector<std::optional<PartId>> m_protection;              // by node
    std::vector<std::optional<PartId>> m_curveDevice;             // by node
};

} // namespace lineward
