// The Drawing: sheet data, settings, parts, wires, buckets, accepted deviations and review
// comments.
#pragma once

#include "model/ids.h"
#include "model/part.h"

#include <optional>
#include <string>
#include <unordered_map>
#include <vector>

namespace lineward {

enum class UnitSystem { US, SI };

/// One row of the revision table.
struct Revision {
    std::string rev, date, by, note;
    /// The drawing as issued at this revision: the copy the editor saved beside this
    /// revision's Submittal (relative to the drawing's folder where it lies there or below).
    /// Empty: none kept. The next revision's Submittal flags the parts changed since it.
    std::string file;
    bool operator==(const Revision&) const = default;
};

/// Title-block data of the Sheet.
struct SheetInfo {
    std::string title, project, drawingNo, drawnBy, checkedBy;
    UnitSystem units = UnitSystem::US;
    std::string ruleSet = "NEC 2023";
    std::vector<Revision> revisions;
    bool operator==(const SheetInfo&) const = default;
};

/// How running motors feed a fault: a fixed multiple of FLC (common practice under the NEC),
/// or the IEC 60909-0 motor impedance from locked-rotor current with R/X by motor size.
enum class MotorContribution { Multiple, Iec60909 };

/// Which generic time-current bands judge selectivity and cable damage: the typical shapes of
/// today's devices, or the maximum clearing times the listing standards allow.
enum class CurveBands { Typical, ListingLimits };

/// Limits that are recommendations or common practice; each produces a caution when exceeded.
struct Settings {
    double vdropBranchPct = 3.0;      ///< NEC 210.19(A) informational note
    double vdropTotalPct = 5.0;       ///< NEC 215.2(A) informational note
    double startDipPct = 15.0;        ///< common practice
    double startTerminalPct = 80.0;   ///< common practice
    double coordinationMarginS = 0.1; ///< common practice for low-voltage devices
    double ambientC = 30.0;           ///< NEC Table 310.16 base ambient
    double asymmetryFactor = 1.5;     ///< common practice
    double startPf = 0.3;             ///< common practice
    double motorContributionX = 4.0;  ///< common practice: running motor feeds ~4 x FLC
    MotorContribution motorContribution = MotorContribution::Multiple;
    CurveBands curveBands = CurveBands::Typical;
    /// Maximum fault current, for duty: the voltage factor c (IEC 60909-0 c_max; 1.0 is the
    /// usual NEC-practice prefault voltage), conductors at this temperature (20 °C: cold
    /// conductors give the highest current) and transformer impedance this % below nameplate.
    double faultCMax = 1.0;
    double faultConductorC = 20.0;
    double txZTolerancePct = 0.0;
    /// Minimum fault current, for the checks that need the least current: voltage factor c
    /// (IEC 60909-0 c_min, 0.95 for low voltage, from memory), conductors at their insulation
    /// rating, no motor contribution.
    double faultCMin = 0.95;
    /// Arc flash: incident energy above which the equipment is marked with a caution, cal/cm².
    double arcFlashCautionCal = 8.0; ///< common practice (a drawing setting)
    /// Arc flash: longest arcing time taken, s (a worker can move away; common practice).
    double arcFlashMaxTimeS = 2.0;
    /// Arc flash: report the arcflash.* findings in the check (the study itself always runs).
    bool arcFlashFindings = true;
    bool operator==(const Settings&) const = default;
};

/// One end of a wire: a part and one of its terminals (index into the kind's terminal list).
struct WireEnd {
    PartId part;
    int terminal = 0;
    bool operator==(const WireEnd&) const = default;
};

/// A wire joining two part terminals; drawn orthogonally on the Sheet.
struct Wire {
    WireId id;
    WireEnd a, b;
    bool operator==(const Wire&) const = default;
};

/// A bucket: the parts of one MCC unit (combination starter) with its short-circuit rating.
struct Bucket {
    BucketId id;
    std::string tag;
    std::optional<double> sccrKa;
    std::vector<PartId> parts;
    bool operator==(const Bucket&) const = default;
};

/// A reviewer's accepted deviation from a rule for a set of parts.
struct Accepted {
    std::string rule;
    std::vector<PartId> parts;
    std::string by, date, note;
    bool operator==(const Accepted&) const = default;
};

/// A reviewer's note pinned to one part: who, when, what, and whether it is resolved.
struct Comment {
    std::uint32_t id = 0; ///< unique among the drawing's comments; printed as "C<id>"
    PartId part;
    std::string by, date, text;
    bool resolved = false;
    bool operator==(const Comment&) const = default;
};

/// The whole one-line drawing: plain values, owned by value.
class Drawing {
public:
    SheetInfo sheet;
    Settings settings;

    const std::vector<Part>& parts() const { return m_parts; }
    const std::vector<Wire>& wires() const { return m_wires; }
    const std::vector<Bucket>& buckets() const { return m_buckets; }
    std::vector<Accepted>& accepted() { return m_accepted; }
    const std::vector<Accepted>& accepted() const { return m_accepted; }
    std::vector<Comment>& comments() { return m_comments; }
    const std::vector<Comment>& comments() const { return m_comments; }
    /// The next unused comment id.
    std::uint32_t nextCommentId() const;

    const Part* part(PartId id) const;
    Part* part(PartId id);
    const Part* partByTag(std::string_view tag) const;
    /// Position of the part in parts(), or nothing.
    std::optional<std::size_t> indexOf(PartId id) const;
    const Wire* wire(WireId id) const;
    const Bucket* bucket(BucketId id) const;
    /// The bucket that holds this part, if any.
    const Bucket* bucketOf(PartId id) const;

    PartId nextPartId() const { return PartId(m_maxPart + 1); }
    WireId nextWireId() const { return WireId(m_maxWire + 1); }
    BucketId nextBucketId() const { return BucketId(m_maxBucket + 1); }

    /// Adds a part; its id must be unused. Parts stay ordered by id.
    void addPart(Part p);
    /// Adds many parts at once (the loader): one sort, so any id order costs n log n.
    /// Throws std::invalid_argument on an invalid or repeated id, leaving the drawing unchanged.
    void addParts(std::vector<Part> parts);
    /// Removes a part and every wire on it (and its review comments, and its place in accepted
    /// deviations, so the file never names a part that is gone); returns what was removed.
    std::optional<Part> removePart(PartId id);
    /// Adds a wire; its id must be unused. Both ends must name existing parts (checked by the
    /// loader and the editor, not here).
    void addWire(Wire w);
    /// Adds many wires at once, sorted once; ids as for addWire.
    void addWires(std::vector<Wire> wires);
    std::optional<Wire> removeWire(WireId id);
    void addBucket(Bucket b);
    /// Adds many buckets at once, sorted once; ids as for addBucket.
    void addBuckets(std::vector<Bucket> buckets);
    std::optional<Bucket> removeBucket(BucketId id);
    /// Replaces the bucket with the same id; false where there is none.
    bool updateBucket(Bucket b);

    bool operator==(const Drawing& o) const {
        return sheet == o.sheet && settings == o.settings && m_parts == o.m_parts &&
               m_wires == o.m_wires && m_buckets == o.m_buckets && m_accepted == o.m_accepted &&
               m_comments == o.m_comments;
    }

    // --- bulk edits: one pass and one reindex for many parts (Select All + Delete, undo); see
    // addParts / addWires above for adding many ---
    /// Removes parts, every wire on them, their places in buckets and accepted deviations, and
    /// their review comments; returns the removed parts in id order.
    std::vector<Part> removeParts(const std::vector<PartId>& ids);
    /// Removes wires; returns those removed in id order.
    std::vector<Wire> removeWires(const std::vector<WireId>& ids);
    /// Replaces each bucket with the same id (others are ignored); returns how many were.
    std::size_t updateBuckets(const std::vector<Bucket>& buckets);

private:
    void reindex();
    /// A removed part leaves the accepted deviations (one that names no part is then stale and
    /// listed as such) and takes its review comments with it.
    template <typename Gone> void forgetReviewOf(Gone gone) {
        for (auto& a : m_accepted)
            std::erase_if(a.parts, gone);
        std::erase_if(m_comments, [&](const Comment& c) { return gone(c.part); });
    }
    std::vector<Part> m_parts;
    std::vector<Wire> m_wires;
    std::vector<Bucket> m_buckets;
    std::vector<Accepted> m_accepted;
    std::vector<Comment> m_comments;
    /// Id value to position in m_parts. A hash map, so memory follows the number of parts and
    /// never the size of an id (one part with id 4,000,000,000 costs one entry).
    std::unordered_map<std::uint32_t, std::size_t> m_partIndex;
    std::unordered_map<std::uint32_t, std::size_t> m_bucketOfPart;
    std::uint32_t m_maxPart = 0, m_maxWire = 0, m_maxBucket = 0;
};

} // namespace lineward
