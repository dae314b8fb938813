// Small helpers the lineup builder's two files share (not part of the lineup's interface).
#pragma once

#include "model/part.h"

#include <cstddef>
#include <optional>
#include <stdexcept>
#include <string_view>
#include <utility>
#include <vector>

namespace lineward::lineup_detail {

/// The first rating of an ascending list at or above `v`.
template <std::size_t N> std::optional<double> firstAtOrAbove(const double (&list)[N], double v) {
    for (double x : list)
        if (x >= v - 1e-9)
            return x;
    return std::nullopt;
}

/// Sets several values as one change, so related values (frame, trip) move together; a refusal
/// is a bug in the builder and stops it with the part's tag.
inline void put(Part& p, const std::vector<std::pair<std::string_view, FieldValue>>& values) {
    if (auto err = p.set(values))
        throw std::runtime_error(p.tag + ": " + *err);
}

} // namespace lineward::lineup_detail
