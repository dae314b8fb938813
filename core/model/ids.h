// Strongly typed, hashable ids for parts, wires and buckets; kept apart from graph descriptors.
#pragma once

#include <cstdint>
#include <functional>

namespace lineward {

/// A typed id: a number that cannot be mixed up with an id of another kind.
template <typename Tag> struct Id {
    std::uint32_t value = 0;
    constexpr Id() = default;
    constexpr explicit Id(std::uint32_t v) : value(v) {}
    constexpr bool valid() const { return value != 0; }
    constexpr bool operator==(const Id& o) const { return value == o.value; }
    constexpr bool operator!=(const Id& o) const { return value != o.value; }
    constexpr bool operator<(const Id& o) const { return value < o.value; }
    constexpr bool operator<=(const Id& o) const { return value <= o.value; }
};

struct PartTag {};
struct WireTag {};
struct BucketTag {};

/// Id of a part; stable for the life of the drawing and written to the file.
using PartId = Id<PartTag>;
/// Id of a wire between two part terminals.
using WireId = Id<WireTag>;
/// Id of a bucket (one MCC unit).
using BucketId = Id<BucketTag>;

} // namespace lineward

template <typename Tag> struct std::hash<lineward::Id<Tag>> {
    std::size_t operator()(const lineward::Id<Tag>& id) const noexcept {
        return std::hash<std::uint32_t>{}(id.value);
    }
};
