// Helpers shared by the core tests: build small drawings in code, read sample files.
#pragma once

#include "check/check.h"
#include "model/drawing.h"
#include "studies/study.h"
#include "tables/tables.h"

#include <memory>
#include <string>

namespace lineward::test {

/// Builds drawings part by part; ids are assigned in order from 1.
class DrawingBuilder {
public:
    PartId add(PartKind kind, const std::string& tag,
               std::initializer_list<std::pair<const char*, FieldValue>> values = {});
    void wire(PartId a, int ta, PartId b, int tb);
    BucketId bucket(const std::string& tag, std::vector<PartId> parts, double sccrKa = 65);
    Drawing& drawing() { return m_d; }

private:
    Drawing m_d;
};

/// The built-in tables, loaded once for the test run.
const Tables& testTables();

/// Whole file as a string; empty when missing.
std::string readFile(const std::string& path);
std::string sourcePath(const std::string& relative);

/// A drawing with its network, supply tree and study results, for tests of the studies.
struct Studied {
    Drawing d;
    std::unique_ptr<Network> net;
    std::unique_ptr<Flow> flow;
    StudyResults r;
    explicit Studied(Drawing dr);
    const FaultAtBus& faultAt(PartId part, int terminal = 0) const;
    /// |V| in per unit of nominal at the part's terminal.
    double vAt(PartId part, int terminal = 0) const;
};

/// The first finding of a rule in a report, or nothing.
const Finding* findRule(const CheckReport& r, std::string_view rule);

/// A radial 480 V lineup: utility, transformer, main breaker, MCC bus, and one motor bucket
/// (inverse-time breaker, contactor, overload, cable, 25 hp motor). Ids: source 1, tx 2,
/// main 3, bus 4, breaker 5, contactor 6, overload 7, cable 8, motor 9.
Drawing smallLineup();

} // namespace lineward::test
