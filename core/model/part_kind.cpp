// The kind table: each kind's file word, name, tag prefix, terminals and field table (the
// field tables by family in part_fields_*.cpp), and the lookups by kind and key.
#include "model/part_kind.h"

#include "model/part_fields.h"

#include <array>

namespace lineward {

namespace {

constexpr std::array<std::string_view, 1> kOut{"out"};
constexpr std::array<std::string_view, 1> kIn{"in"};
constexpr std::array<std::string_view, 1> kBar{"bar"};
constexpr std::array<std::string_view, 2> kLineLoad{"line", "load"};
constexpr std::array<std::string_view, 2> kPriSec{"pri", "sec"};

constexpr std::array<FieldAlternative, 1> kSourceAlt{{{"fault_ka", "fault_mva"}}};
constexpr std::array<FieldAlternative, 1> kMotorAlt{{{"hp", "kw"}}};
constexpr std::array<FieldAlternative, 1> kLoadAlt{{{"kva", "kw"}}};

// Built on first use: the field tables live in other files, so their order of static
// initialization is not known here.
const std::array<KindInfo, kPartKindCount>& kinds() {
    using namespace part_fields;
    static const std::array<KindInfo, kPartKindCount> table{{
        {PartKind::Source, "source", "Utility source", "UTIL-", kOut, sourceFields(), false, false,
         kSourceAlt},
        {PartKind::Transformer, "transformer", "Transformer", "TX-", kPriSec, transformerFields()},
        {PartKind::Bus, "bus", "Bus", "BUS-", kBar, busFields()},
        {PartKind::Breaker, "breaker", "Breaker", "CB-", kLineLoad, breakerFields(), true, true},
        {PartKind::InstBreaker, "inst_breaker", "Instantaneous-only breaker", "MCP-", kLineLoad,
         instBreakerFields(), true, true},
        {PartKind::Fuse, "fuse", "Fuse", "FU-", kLineLoad, fuseFields(), false, true},
        {PartKind::Disconnect, "disconnect", "Disconnect switch", "DS-", kLineLoad,
         disconnectFields(), true, false},
        {PartKind::Contactor, "contactor", "Contactor", "K-", kLineLoad, contactorFields(), true,
         false},
        {PartKind::Overload, "overload", "Overload relay", "OL-", kLineLoad, overloadFields()},
        {PartKind::Vfd, "vfd", "Variable-frequency drive", "VFD-", kLineLoad, vfdFields()},
        {PartKind::SoftStarter, "soft_starter", "Soft starter", "SS-", kLineLoad,
         softStarterFields()},
        {PartKind::Cable, "cable", "Cable", "C-", kLineLoad, cableFields()},
        {PartKind::Motor, "motor", "Motor", "M-", kIn, motorFields(), false, false, kMotorAlt},
        {PartKind::Load, "load", "Static load", "LD-", kIn, loadFields(), false, false, kLoadAlt},
    }};
    return table;
}

} // namespace

const KindInfo& kindInfo(PartKind kind) {
    return kinds()[static_cast<std::size_t>(kind)];
}

std::optional<PartKind> kindFromKey(std::string_view key) {
    for (const auto& k : kinds())
        if (k.key == key)
            return k.kind;
    return std::nullopt;
}

std::optional<std::size_t> fieldIndex(PartKind kind, std::string_view key) {
    const auto& fields = kindInfo(kind).fields;
    for (std::size_t i = 0; i < fields.size(); ++i)
        if (fields[i].key == key)
            return i;
    return std::nullopt;
}

const FieldSpec* findField(PartKind kind, std::string_view key) {
    auto i = fieldIndex(kind, key);
    return i ? &kindInfo(kind).fields[*i] : nullptr;
}

} // namespace lineward
