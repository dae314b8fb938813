// The part kinds of a one-line drawing: their file keys, terminals and rating fields.
#pragma once

#include "model/field.h"

#include <optional>
#include <span>
#include <string>
#include <string_view>

namespace lineward {

/// Every kind of part the Sheet can hold.
enum class PartKind {
    Source,      ///< utility source
    Transformer, ///< two-winding transformer
    Bus,         ///< switchboard, MCC section or panelboard bus (one electrical node)
    Breaker,     ///< inverse-time breaker (thermal-magnetic or electronic trip)
    InstBreaker, ///< instantaneous-only breaker (motor circuit protector)
    Fuse,        ///< fuse (time-delay or fast-acting)
    Disconnect,  ///< disconnect switch
    Contactor,   ///< motor contactor
    Overload,    ///< overload relay
    Vfd,         ///< variable-frequency drive (power conversion equipment, NEC 430 Part X)
    SoftStarter, ///< reduced-voltage solid-state soft starter, with or without a bypass contactor
    Cable,       ///< cable run (one or more parallel sets)
    Motor,       ///< induction motor
    Load,        ///< static load
};

inline constexpr int kPartKindCount = 14;

/// Two ratings of which a part gives exactly one (a source's kA or MVA; a motor's hp or kW).
struct FieldAlternative {
    std::string_view first, second;
};

/// What the engine needs to know about a kind besides its fields.
struct KindInfo {
    PartKind kind;
    std::string_view key;                        ///< word used in the file ("motor")
    std::string_view name;                       ///< name shown to people ("Motor")
    std::string_view tagPrefix;                  ///< default tag prefix ("M-")
    std::span<const std::string_view> terminals; ///< terminal names; one or two
    std::span<const FieldSpec> fields;
    bool switching = false;  ///< has an open/closed state
    bool protective = false; ///< interrupts fault current
    /// Pairs of ratings given one or the other; the Inspector edits each pair as one choice.
    std::span<const FieldAlternative> alternatives = {};
};

const KindInfo& kindInfo(PartKind kind);
std::optional<PartKind> kindFromKey(std::string_view key);
/// Index of the field with this key in the kind's list, or nothing.
std::optional<std::size_t> fieldIndex(PartKind kind, std::string_view key);
const FieldSpec* findField(PartKind kind, std::string_view key);

inline bool isTwoTerminal(PartKind k) {
    return kindInfo(k).terminals.size() == 2;
}

} // namespace lineward
