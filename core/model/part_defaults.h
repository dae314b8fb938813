// Starting values for a newly placed part, so every part on the Sheet is valid from the start.
#pragma once

#include "model/drawing.h"

namespace lineward {

/// A part of `kind` with typical low-voltage ratings filled in (a 480 V system, a 10 hp motor,
/// a 100 A breaker ...); the user edits them in the Inspector.
Part makeStarterPart(PartKind kind, PartId id, std::string tag);

/// The next free tag for a kind: its prefix and one more than the highest number in use
/// ("M-7" after "M-6").
std::string nextTag(const Drawing& d, PartKind kind);

} // namespace lineward
