// The electrical network of a drawing as a Boost graph: nodes are sets of joined terminals,
// two-terminal parts are branches, sources, motors, loads and buses attach to a node.
#pragma once

#include "model/drawing.h"

#include <boost/graph/adjacency_list.hpp>
#include <optional>
#include <vector>

namespace lineward {

/// An electrical node: every terminal joined to it by wires.
struct NodeProps {
    std::vector<PartId> attached; ///< one-terminal parts here (source, bus, motor, load)
    double nominalV = 0.0;        ///< system voltage found by walking from the sources; 0 unknown
    bool reachable = false;       ///< joined to a source when every device is closed
    bool energized = false;       ///< joined to a source through closed devices
    int component = -1;           ///< connected component over closed branches
};

/// A branch: one two-terminal part between two nodes.
struct BranchProps {
    PartId part;
    bool closed = true;
};

using NetGraph =
    boost::adjacency_list<boost::vecS, boost::vecS, boost::undirectedS, NodeProps, BranchProps>;
using NodeIndex = NetGraph::vertex_descriptor;
using BranchDesc = NetGraph::edge_descriptor;

/// A voltage conflict found while walking: a part whose rating disagrees with its node.
struct VoltageConflict {
    PartId part;
    double systemV = 0.0;
    double ratedV = 0.0;
    std::string what; ///< which rating ("motor rated", "transformer primary", ...)
};

/// The graph built from a drawing; rebuilt on every check (it is cheap).
class Network {
public:
    explicit Network(const Drawing& drawing);

    const NetGraph& graph() const { return m_graph; }
    const Drawing& drawing() const { return m_drawing; }
    std::size_t nodeCount() const { return boost::num_vertices(m_graph); }

    /// Node of a part's terminal.
    NodeIndex nodeOf(PartId part, int terminal) const;
    /// The branch of a two-terminal part.
    std::optional<BranchDesc> branchOf(PartId part) const;
    /// Number of wires on a terminal.
    int wireCount(PartId part, int terminal) const;
    /// Source parts, in id order.
    const std::vector<PartId>& sources() const { return m_sources; }
    const std::vector<VoltageConflict>& voltageConflicts() const { return m_conflicts; }

    /// The parts in series between a one-terminal part (a motor) and the first junction (a bus,
    /// a source, or a node where the circuit branches), nearest first.
    std::vector<PartId> branchChain(PartId part) const;

    bool partReachable(PartId part) const;
    bool partEnergized(PartId part) const;
    /// Branch parts that close loops: for each closed component, branches outside a spanning
    /// tree, plus every source beyond the first. Grouped per component.
    std::vector<std::vector<PartId>> loops() const;

private:
    std::size_t terminalSlot(PartId part, int terminal) const;
    void buildNodes();
    void walkReach();
    void walkVoltage();
    void checkRatedVoltages();

    const Drawing& m_drawing;
    NetGraph m_graph;
    std::vector<std::size_t> m_slotBase; // by part index: first terminal slot
    std::vector<NodeIndex> m_nodeOfSlot;
    std::vector<int> m_wiresOfSlot;
    std::vector<std::optional<BranchDesc>> m_branchOfPart; // by part index
    std::vector<PartId> m_sources;
    std::vector<VoltageConflict> m_conflicts;
};

} // namespace lineward
