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
    auto it = m_partIndex.find(id.value);
    if (it == m_partIndex.end())
        return std::nullopt;
    return it->second;
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
        m_partIndex[p.id.value] = m_parts.size();
        m_parts.push_back(std::move(p));
        return;
    }
    auto it = std::lower_bound(m_parts.begin(), m_parts.end(), p.id,
                               [](const Part& a, PartId i) { return a.id < i; });
    m_parts.insert(it, std::move(p));
    reindex();
}

namespace {

// Merges `more` into `items` (both by id), sorting once; throws on an invalid or repeated id
// before anything is changed.
template <typename T>
void mergeSorted(std::vector<T>& items, std::vector<T> more, const char* what,
                 std::uint32_t& maxId) {
    auto byId = [](const T& a, const T& b) { return a.id < b.id; };
    std::sort(more.begin(), more.end(), byId);
    for (std::size_t i = 0; i < more.size(); ++i) {
        const bool repeated = (i > 0 && more[i - 1].id == more[i].id) ||
                              std::binary_search(items.begin(), items.end(), more[i], byId);
        if (!more[i].id.valid() || repeated)
            throw std::invalid_argument(std::string(what) + " id " +
                                        std::to_string(more[i].id.value) + " is in use");
    }
    if (!more.empty())
        maxId = std::max(maxId, more.back().id.value);
    const auto mid = items.size();
    items.insert(items.end(), std::make_move_iterator(more.begin()),
                 std::make_move_iterator(more.end()));
    std::inplace_merge(items.begin(), items.begin() + static_cast<std::ptrdiff_t>(mid), items.end(),
                       byId);
}

} // namespace

void Drawing::addParts(std::vector<Part> parts) {
    mergeSorted(m_parts, std::move(parts), "part", m_maxPart);
    reindex();
}

void Drawing::addWires(std::vector<Wire> wires) {
    mergeSorted(m_wires, std::move(wires), "wire", m_maxWire);
}

void Drawing::addBuckets(std::vector<Bucket> buckets) {
    mergeSorted(m_buckets, std::move(buckets), "bucket", m_maxBucket);
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
    forgetReviewOf([&](PartId p) { return p == id; });
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
    m_partIndex.clear();
    m_partIndex.reserve(m_parts.size());
    for (std::size_t i = 0; i < m_parts.size(); ++i)
        m_partIndex[m_parts[i].id.value] = i;
    m_bucketOfPart.clear();
    for (std::size_t i = 0; i < m_buckets.size(); ++i)
        for (auto pid : m_buckets[i].parts)
            m_bucketOfPart[pid.value] = i;
}

// --- bulk edits ---

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
    forgetReviewOf(isGone);
    reindex();
    return removed;
}

std::uint32_t Drawing::nextCommentId() const {
    std::uint32_t top = 0;
    for (const auto& c : m_comments)
        top = std::max(top, c.id);
    return top + 1;
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
