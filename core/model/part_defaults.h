// Starting values for a newly placed part, so every part on the Sheet is valid from the start;
// tags and positions for pasted parts.
#pragma once

#include "model/drawing.h"

#include <optional>

namespace lineward {

/// A part of `kind` with typical low-voltage ratings filled in (a 480 V system, a 10 hp motor,
/// a 100 A breaker ...); the user edits them in the Inspector.
Part makeStarterPart(PartKind kind, PartId id, std::string tag);

/// A starter part for `d` (next id, next tag) whose voltage ratings follow the terminal it is
/// dropped onto (`onto`), or else the drawing's system voltage: a motor on a 480 V node is
/// rated 460 V, a bus below a 13.8 kV/480 V transformer's secondary 480 V, a new source 13.8 kV
/// like the starter transformer's primary.
Part makeStarterPart(const Drawing& d, PartKind kind, std::optional<WireEnd> onto);

/// System voltage (V) at a part's terminal: the rating of the nearest part that sets it,
/// walking wires and through series devices (never through a transformer); nothing when no
/// part on the way sets one.
std::optional<double> terminalVolts(const Drawing& d, WireEnd at);

/// The drawing's low-voltage system (V): the voltage most of its buses have, or 480 V.
double systemVolts(const Drawing& d);

/// Motor nameplate voltage for a system voltage: the column headings of NEC 2023 Table 430.250
/// (from memory): 115/200/230/460/575 V motors for 120/208/240/480/600 V systems. Other
/// systems give their own voltage.
double motorVoltsFor(double systemV);

/// The next free tag for a kind: its prefix and one more than the highest number in use
/// ("M-7" after "M-6").
std::string nextTag(const Drawing& d, PartKind kind);

/// Parts, wires and buckets ready to add to a drawing.
struct PasteSet {
    std::vector<Part> parts;
    std::vector<Wire> wires;
    std::vector<Bucket> buckets;
};

/// What pasting `clip` into `d` adds: new ids after d's; the copy lands 40 units down and right
/// of the original, further by 40 for each copy already there (pasting twice offsets twice).
/// Tags in use are renumbered: the parts of a bucket that share a number (CB-101, K-101, ...
/// in B-101), with the loose pasted parts of that number (its cable C-101 and motor M-101),
/// get one new number free for all their prefixes (all 106); a bucket numbered its own way
/// (MCC1-1A) takes its next free number; other parts get nextTag.
PasteSet preparePaste(const Drawing& d, const Drawing& clip);

} // namespace lineward
