// Compare two revisions of a drawing: parts, wires and buckets added, removed and changed,
// sheet and settings changes, and the findings the newer revision introduced, resolved or kept.
// One comparison feeds the command line's `compare` and the editor's Changes panel.
#pragma once

#include "check/check.h"
#include "model/drawing.h"

#include <nlohmann/json.hpp>
#include <string>
#include <unordered_map>
#include <vector>

namespace lineward {

/// One value that differs: its key as the file writes it and both values in the file's JSON
/// spelling (null where a side has no value).
struct ValueChange {
    std::string key;
    nlohmann::ordered_json oldValue, newValue;
};

/// A part present on one side only (a copy, so a removed part can still be drawn as a ghost).
struct PartOnOneSide {
    Part part;
};

/// A part present in both revisions whose values differ. Parts are paired by id and tag, then
/// by tag, then by place, then by id (see compareDrawings), so the ids may differ.
struct PartChange {
    PartId oldId, newId;
    PartKind kind = PartKind::Load;
    std::string tag; ///< the newer tag (a changed tag is also one of `fields`)
    std::vector<ValueChange> fields;
};

/// One end of a wire named by its part's tag and terminal.
struct WireEndRef {
    PartId part;
    std::string tag, terminal;
};

/// A wire present on one side only.
struct WireOnOneSide {
    WireId id;
    WireEndRef a, b;
};

/// A bucket present on one side only, with the tags of its parts.
struct BucketOnOneSide {
    BucketId id;
    std::string tag;
    std::vector<std::string> partTags;
};

/// A bucket in both revisions whose short-circuit rating or parts differ.
struct BucketChange {
    BucketId oldId, newId;
    std::string tag;
    std::vector<ValueChange> fields; ///< "tag", "sccr_ka", "parts" (lists of part tags)
};

/// A finding as the comparison reports it: rule, severity, parts (ids of its own revision and
/// their tags) and message.
struct FindingRef {
    std::string rule;
    Severity severity = Severity::Note;
    std::vector<PartId> parts;
    std::vector<std::string> tags;
    std::string message;
    bool accepted = false;
};

/// An accepted deviation present on one side only (its parts named by tag).
struct AcceptedRef {
    std::string rule;
    std::vector<std::string> tags;
    std::string by, date, note;
};

/// A review comment present on one side only (its part named by tag; "C<id>" in the file).
struct CommentRef {
    std::uint32_t id = 0;
    PartId part; ///< its part, an id of its own revision
    std::string tag; ///< the tag of the part it is pinned to, in its own revision
    std::string by, date, text;
    bool resolved = false;
};

/// A review comment in both revisions whose status, text, author or date differ.
struct CommentChange {
    std::uint32_t oldId = 0, newId = 0;
    PartId part;                     ///< its part in the newer revision
    std::string tag;                 ///< the newer tag of its part
    std::vector<ValueChange> fields; ///< "status" ("open"/"resolved"), "text", "by", "date"
};

/// Everything that differs between an older and a newer revision.
struct DrawingComparison {
    std::vector<PartOnOneSide> partsAdded, partsRemoved;
    std::vector<PartChange> partsChanged;
    std::vector<WireOnOneSide> wiresAdded, wiresRemoved;
    std::vector<BucketOnOneSide> bucketsAdded, bucketsRemoved;
    std::vector<BucketChange> bucketsChanged;
    std::vector<ValueChange> sheet;    ///< title-block values and "revisions"
    std::vector<ValueChange> settings; ///< the drawing's limits
    std::vector<AcceptedRef> acceptedAdded, acceptedRemoved;
    /// Review comments: pinned to a part on one side only, or changed (see compareDrawings).
    std::vector<CommentRef> commentsAdded, commentsRemoved;
    std::vector<CommentChange> commentsChanged;
    /// Findings of the newer revision it did not have before (ids of the newer drawing).
    std::vector<FindingRef> findingsNew;
    /// Findings of the older revision the newer one no longer has (ids of the older drawing).
    std::vector<FindingRef> findingsResolved;
    /// Findings in both (as the newer revision reports them).
    std::vector<FindingRef> findingsOpen;
    /// Older part id → newer part id of each part present in both revisions.
    std::unordered_map<PartId, PartId> pairedParts;

    /// True when the drawings differ in nothing but their ids (findings follow the drawing).
    bool same() const;
};

/// Compares two check results. Pure. Parts are paired in four passes, each among the parts
/// still unpaired and always of the same kind: same id and tag; the same tag (unique on both
/// sides); the same place on the Sheet; the same id. Wires are the same when they join the
/// same terminals of paired parts; buckets pair by tag, then by id. Findings are the same when
/// their rule and their (paired) parts are the same, whatever their message says. Review
/// comments are the same when they carry the same id on paired parts, or else (ids renumbered)
/// the same author, date and text on paired parts; a comment moved to another part is one
/// removed and one added.
DrawingComparison compareDrawings(const CheckResult& oldResult, const CheckResult& newResult);

/// Checks both drawings (runCheck) and compares them.
DrawingComparison compareDrawings(const Drawing& oldDrawing, const Drawing& newDrawing,
                                  const Tables& tables);

/// A value of a ValueChange as people read it: text without quotes, numbers as the file
/// writes them, "(none)" for null or empty text, lists joined with ", ". Not escaped.
std::string valueText(const nlohmann::ordered_json& v);

} // namespace lineward
