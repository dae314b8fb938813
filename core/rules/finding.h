// Findings: what a rule reports about the drawing, with its numbers, trace and proposed fix.
#pragma once

#include "model/field.h"
#include "model/ids.h"
#include "util/trace.h"

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace lineward {

/// How serious a finding is. Violations break a code rule; cautions pass a setting or
/// recommendation; notes inform.
enum class Severity { Note = 0, Caution = 1, Violation = 2 };

std::string_view severityName(Severity s);
std::optional<Severity> severityFromName(std::string_view s);

/// One change of one rating; the editor applies all changes of a fix as one undoable edit.
struct FieldChange {
    PartId part;
    std::string_view field; ///< a key constant of model/ratings.h (static storage)
    FieldValue value;
};

/// The smallest change that would satisfy the rule. Some fixes are advice only (no changes).
struct Fix {
    std::string description;
    std::vector<FieldChange> changes;
};

/// A rule's result about some parts of the drawing.
struct Finding {
    std::string ruleId;
    Severity severity = Severity::Note;
    std::string clause;
    std::vector<PartId> parts;
    std::string message;
    std::optional<double> computed;
    std::optional<double> limit;
    std::string unit;
    std::vector<TraceStep> trace;
    std::optional<Fix> fix;
    /// Set where a reviewer accepted this deviation (see Drawing::accepted()).
    bool accepted = false;
    std::string acceptedNote;
};

} // namespace lineward
