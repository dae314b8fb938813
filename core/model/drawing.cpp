// Drawing storage: parts kept sorted by id with a hash index for lookups.
#include "model/drawing.h"

#include <algorithm>
#include <iterator>
#include <stdexcept>
#include <unordered_set>

namespace lineward {

const Part* Drawing::part(PartId id) const {
    auto i = indexOf(id);
    return i ? &m_parts[*i] : nullptr;
}

Part* Drawing::part(PartId id) {
    auto i = indexOf(id);
    return i ? &m_parts[*i] : nullptr;
}

std::optional<std::size_t> Drawing::indexOf(PartId id) const {
    if (id.value >= m_partIndex.size() || m_partIndex[id.value] < 0)
        return std::nullopt;
    return static_cast<std::size_t>(m_partIndex[id.value]);
}

const Part* Drawing::partByTag(std::string_view tag) const {
    for (const auto& p : m_parts)
        if (p.tag == tag)
            return &p;
    return nullptr;
}

const Wire* Drawing::wire(WireId id) const {
    auto it = std::lower_bound(m_wires.begin(), m_wires.end(), id,
                               [](const Wire& w, WireId i) { return w.id < i; });
    return it != m_wires.end() && it->id == id ? &*it : nullptr;
}

const Bucket* Drawing::bucket(BucketId id) const {
    auto it = std::lower_bound(m_buckets.begin(), m_buckets.end(), id,
                               [](const Bucket& b, BucketId i) { return b.id < i; });
    return it != m_buckets.end() && it->id == id ? &*it : nullptr;
}

bool Drawing::updateBucket(Bucket b) {
    for (auto& old : m_buckets)
        if (old.id == b.id) {
            old = std::move(b);
            reindex();
            return true;
        }
    return false;
}

const Bucket* Drawing::bucketOf(PartId id) const {
    auto it = m_bucketOfPart.find(id.value);
    return it == m_bucketOfPart.end() ? nullptr : &m_buckets[it->second];
}

void Drawing::addPart(Part p) {
    if (!p.id.valid() || part(p.id))
        throw std::invalid_argument("part id " + std::to_string(p.id.value) + " is in use");
    m_maxPart = std::max(m_maxPart, p.id.value);
    if (m_parts.empty() || m_parts.back().id < p.id) { // the common case: no reindex
        if (m_partIndex.size() <= p.id.value)
            m_partIndex.resize(std::max<std::size_t>(p.id.value + 1, m_partIndex.size() * 2), -1);
        m_partIndex[p.id.value] = static_cast<std::int64_t>(m_parts.size());
        m_parts.push_back(std::move(p));
        return;
    }
    auto it = std::lower_bound(m_parts.begin(), m_parts.end(), p.id,
                               [](const Part& a, PartId i) { return a.id < i; });
    m_parts.insert(it, std::move(p));
    reindex();
}

std::optional<Part> Drawing::removePart(PartId id) {
    auto it =
        std::find_if(m_parts.begin(), m_parts.end(), [&](const Part& p) { return p.id == id; });
    if (it == m_parts.end())
        return std::nullopt;
    Part removed = std::move(*it);
    m_parts.erase(it);
    std::erase_if(m_wires, [&](const Wire& w) { return w.a.part == id || w.b.part == id; });
    for (auto& b : m_buckets)
        std::erase(b.parts, id);
    reindex();
    return removed;
}

void Drawing::addWire(Wire w) {
    if (!w.id.valid() || wire(w.id))
        throw std::invalid_argument("wire id " + std::to_string(w.id.value) + " is in use");
    m_maxWire = std::max(m_maxWire, w.id.value);
    auto it = std::lower_bound(m_wires.begin(), m_wires.end(), w.id,
                               [](const Wire& a, WireId i) { return a.id < i; });
    m_wires.insert(it, w);
}

std::optional<Wire> Drawing::removeWire(WireId id) {
    auto it =
        std::find_if(m_wires.begin(), m_wires.end(), [&](const Wire& w) { return w.id == id; });
    if (it == m_wires.end())
        return std::nullopt;
    Wire w = *it;
    m_wires.erase(it);
    return w;
}

void Drawing::addBucket(Bucket b) {
    if (!b.id.valid() || bucket(b.id))
        throw std::invalid_argument("bucket id " + std::to_string(b.id.value) + " is in use");
    m_maxBucket = std::max(m_maxBucket, b.id.value);
    if (m_buckets.empty() || m_buckets.back().id < b.id) {
        for (auto pid : b.parts)
            m_bucketOfPart[pid.value] = m_buckets.size();
        m_buckets.push_back(std::move(b));
        return;
    }
    auto it = std::lower_bound(m_buckets.begin(), m_buckets.end(), b.id,
                               [](const Bucket& a, BucketId i) { return a.id < i; });
    m_buckets.insert(it, std::move(b));
    reindex();
}

std::optional<Bucket> Drawing::removeBucket(BucketId id) {
    auto it = std::find_if(m_buckets.begin(), m_buckets.end(),
                           [&](const Bucket& b) { return b.id == id; });
    if (it == m_buckets.end())
        return std::nullopt;
    Bucket b = std::move(*it);
    m_buckets.erase(it);
    reindex();
    return b;
}

void Drawing::reindex() {
    m_partIndex.assign(m_maxPart + 1, -1);
    for (std::size_t i = 0; i < m_parts.size(); ++i)
        m_partIndex[m_parts[i].id.value] = static_cast<std::int64_t>(i);
    m_bucketOfPart.clear();
    for (std::size_t i = 0; i < m_buckets.size(); ++i)
        for (auto pid : m_buckets[i].parts)
            m_bucketOfPart[pid.value] = i;
}

// --- bulk edits ---

namespace {
template <typename T, typename IdOf> void sortById(std::vector<T>& v, IdOf idOf) {
    if (!std::is_sorted(v.begin(), v.end(),
                        [&](const T& a, const T& b) { return idOf(a) < idOf(b); }))
        std::stable_sort(v.begin(), v.end(),
                         [&](const T& a, const T& b) { return idOf(a) < idOf(b); });
}
} // namespace

void Drawing::addParts(std::vector<Part> parts) {
    std::unordered_set<std::uint32_t> fresh;
    for (const auto& p : parts)
        if (!p.id.valid() || part(p.id) || !fresh.insert(p.id.value).second)
            throw std::invalid_argument("part id " + std::to_string(p.id.value) + " is in use");
    for (auto& p : parts) {
        m_maxPart = std::max(m_maxPart, p.id.value);
        m_parts.push_back(std::move(p));
    }
    sortById(m_parts, [](const Part& p) { return p.id; });
    reindex();
}

std::vector<Part> Drawing::removeParts(const std::vector<PartId>& ids) {
    std::unordered_set<std::uint32_t> gone;
    for (auto id : ids)
        if (part(id))
            gone.insert(id.value);
    std::vector<Part> removed;
    removed.reserve(gone.size());
    auto isGone = [&](PartId id) { return gone.count(id.value) > 0; };
    auto keep = std::stable_partition(m_parts.begin(), m_parts.end(),
                                      [&](const Part& p) { return !isGone(p.id); });
    std::move(keep, m_parts.end(), std::back_inserter(removed));
    m_parts.erase(keep, m_parts.end());
    std::erase_if(m_wires, [&](const Wire& w) { return isGone(w.a.part) || isGone(w.b.part); });
    for (auto& b : m_buckets)
        std::erase_if(b.parts, isGone);
    reindex();
    return removed;
}

void Drawing::addWires(std::vector<Wire> wires) {
    std::unordered_set<std::uint32_t> fresh;
    for (const auto& w : wires)
        if (!w.id.valid() || wire(w.id) || !fresh.insert(w.id.value).second)
            throw std::invalid_argument("wire id " + std::to_string(w.id.value) + " is in use");
    for (auto& w : wires) {
        m_maxWire = std::max(m_maxWire, w.id.value);
        m_wires.push_back(w);
    }
    sortById(m_wires, [](const Wire& w) { return w.id; });
}

std::vector<Wire> Drawing::removeWires(const std::vector<WireId>& ids) {
    std::unordered_set<std::uint32_t> gone;
    for (auto id : ids)
        gone.insert(id.value);
    auto keep = std::stable_partition(m_wires.begin(), m_wires.end(),
                                      [&](const Wire& w) { return !gone.count(w.id.value); });
    std::vector<Wire> removed(keep, m_wires.end());
    m_wires.erase(keep, m_wires.end());
    return removed;
}

std::size_t Drawing::updateBuckets(const std::vector<Bucket>& buckets) {
    std::size_t n = 0;
    for (const auto& b : buckets) {
        auto it = std::lower_bound(m_buckets.begin(), m_buckets.end(), b.id,
                                   [](const Bucket& a, BucketId i) { return a.id < i; });
        if (it != m_buckets.end() && it->id == b.id) {
            *it = b;
            ++n;
        }
    }
    reindex();
    return n;
}

} // namespace lineward
