// Compares two revisions: pairs the parts, then walks parts, wires, buckets, sheet, settings,
// accepted deviations and findings once each.
#include "compare/drawing_compare.h"

#include "io/field_json.h"

#include <algorithm>
#include <map>
#include <set>
#include <unordered_map>

namespace lineward {

namespace {

using ojson = nlohmann::ordered_json;

/// Old part id → new part id for the paired parts, and the reverse.
struct Pairing {
    std::unordered_map<PartId, PartId> oldToNew, newToOld;
    void pair(PartId o, PartId n) {
        oldToNew.emplace(o, n);
        newToOld.emplace(n, o);
    }
    bool oldPaired(PartId id) const { return oldToNew.count(id) != 0; }
    bool newPaired(PartId id) const { return newToOld.count(id) != 0; }
};

// Pass 2: tags that name exactly one unpaired part on each side, of the same kind.
void pairByUniqueTag(const Drawing& o, const Drawing& n, Pairing& pairing) {
    std::unordered_map<std::string, std::vector<const Part*>> oldByTag, newByTag;
    for (const auto& p : o.parts())
        if (!pairing.oldPaired(p.id) && !p.tag.empty())
            oldByTag[p.tag].push_back(&p);
    for (const auto& p : n.parts())
        if (!pairing.newPaired(p.id) && !p.tag.empty())
            newByTag[p.tag].push_back(&p);
    for (const auto& p : o.parts()) {
        auto ol = oldByTag.find(p.tag);
        auto nl = newByTag.find(p.tag);
        if (ol == oldByTag.end() || nl == newByTag.end() || ol->second.size() != 1 ||
            nl->second.size() != 1 || ol->second.front() != &p)
            continue;
        if (nl->second.front()->kind == p.kind)
            pairing.pair(p.id, nl->second.front()->id);
    }
}

// Pass 3: the same kind at the same place (a part retagged or renumbered where it stood).
void pairByPlace(const Drawing& o, const Drawing& n, Pairing& pairing) {
    std::map<std::tuple<int, double, double>, std::vector<const Part*>> newAt;
    for (const auto& p : n.parts())
        if (!pairing.newPaired(p.id))
            newAt[{static_cast<int>(p.kind), p.x, p.y}].push_back(&p);
    for (const auto& p : o.parts()) {
        if (pairing.oldPaired(p.id))
            continue;
        auto it = newAt.find({static_cast<int>(p.kind), p.x, p.y});
        if (it == newAt.end() || it->second.size() != 1 || pairing.newPaired(it->second[0]->id))
            continue;
        pairing.pair(p.id, it->second[0]->id);
    }
}

Pairing pairParts(const Drawing& o, const Drawing& n) {
    Pairing pairing;
    for (const auto& p : o.parts()) // pass 1: the same part, untouched in name
        if (const Part* q = n.part(p.id); q && q->kind == p.kind && q->tag == p.tag)
            pairing.pair(p.id, q->id);
    pairByUniqueTag(o, n, pairing);
    pairByPlace(o, n, pairing);
    for (const auto& p : o.parts()) // pass 4: the same id and kind, tag and place both changed
        if (const Part* q = n.part(p.id);
            !pairing.oldPaired(p.id) && q && q->kind == p.kind && !pairing.newPaired(q->id))
            pairing.pair(p.id, q->id);
    return pairing;
}

// Keys of two JSON objects in the order of the newer one (then keys only the older has).
std::vector<ValueChange> objectChanges(const ojson& a, const ojson& b,
                                       const std::set<std::string>& skip = {}) {
    std::vector<ValueChange> out;
    for (auto it = b.begin(); it != b.end(); ++it) {
        if (skip.count(it.key()))
            continue;
        const ojson old = a.contains(it.key()) ? a.at(it.key()) : ojson();
        if (old != it.value())
            out.push_back({it.key(), old, it.value()});
    }
    for (auto it = a.begin(); it != a.end(); ++it)
        if (!skip.count(it.key()) && !b.contains(it.key()))
            out.push_back({it.key(), it.value(), ojson()});
    return out;
}

std::string tagOf(const Drawing& d, PartId id) {
    const Part* p = d.part(id);
    return p ? p->tag : "#" + std::to_string(id.value);
}

std::vector<std::string> tagsOf(const Drawing& d, const std::vector<PartId>& ids) {
    std::vector<std::string> tags;
    for (auto id : ids)
        tags.push_back(tagOf(d, id));
    return tags;
}

void compareParts(const Drawing& o, const Drawing& n, const Pairing& pairing,
                  DrawingComparison& c) {
    for (const auto& p : o.parts()) {
        auto it = pairing.oldToNew.find(p.id);
        if (it == pairing.oldToNew.end()) {
            c.partsRemoved.push_back({p});
            continue;
        }
        const Part& q = *n.part(it->second);
        // Most parts are untouched between revisions: only those that differ are spelt out.
        if (p.tag == q.tag && p.x == q.x && p.y == q.y && p.rotation == q.rotation &&
            p.values == q.values)
            continue;
        auto fields = objectChanges(io::partJson(p), io::partJson(q), {"id", "kind"});
        if (!fields.empty())
            c.partsChanged.push_back({p.id, q.id, q.kind, q.tag, std::move(fields)});
    }
    for (const auto& q : n.parts())
        if (!pairing.newPaired(q.id))
            c.partsAdded.push_back({q});
    std::sort(c.partsChanged.begin(), c.partsChanged.end(),
              [](const PartChange& a, const PartChange& b) { return a.newId < b.newId; });
}

WireEndRef endRef(const Drawing& d, const WireEnd& e) {
    WireEndRef r{e.part, tagOf(d, e.part), "?"};
    if (const Part* p = d.part(e.part);
        p && e.terminal >= 0 &&
        static_cast<std::size_t>(e.terminal) < kindInfo(p->kind).terminals.size())
        r.terminal = std::string(kindInfo(p->kind).terminals[e.terminal]);
    return r;
}

// A wire as an unordered pair of (part, terminal) ends; old parts are named by their paired
// new id, unpaired ones by a value no new id can take.
using EndKey = std::pair<std::int64_t, int>;
using WireKey = std::pair<EndKey, EndKey>;

WireKey wireKey(EndKey a, EndKey b) {
    return a < b ? WireKey{a, b} : WireKey{b, a};
}

void compareWires(const Drawing& o, const Drawing& n, const Pairing& pairing,
                  DrawingComparison& c) {
    auto oldEnd = [&](const WireEnd& e) -> EndKey {
        auto it = pairing.oldToNew.find(e.part);
        return {it == pairing.oldToNew.end() ? -static_cast<std::int64_t>(e.part.value) - 1
                                             : static_cast<std::int64_t>(it->second.value),
                e.terminal};
    };
    auto newEnd = [](const WireEnd& e) -> EndKey {
        return {static_cast<std::int64_t>(e.part.value), e.terminal};
    };
    std::map<WireKey, int> newCount;
    for (const auto& w : n.wires())
        ++newCount[wireKey(newEnd(w.a), newEnd(w.b))];
    std::map<WireKey, int> oldCount;
    for (const auto& w : o.wires()) {
        const auto key = wireKey(oldEnd(w.a), oldEnd(w.b));
        ++oldCount[key];
        if (auto it = newCount.find(key); it != newCount.end() && it->second > 0)
            --it->second;
        else
            c.wiresRemoved.push_back({w.id, endRef(o, w.a), endRef(o, w.b)});
    }
    for (const auto& w : n.wires()) {
        const auto key = wireKey(newEnd(w.a), newEnd(w.b));
        if (auto it = oldCount.find(key); it != oldCount.end() && it->second > 0)
            --it->second;
        else
            c.wiresAdded.push_back({w.id, endRef(n, w.a), endRef(n, w.b)});
    }
}

ojson bucketJson(const Drawing& d, const Bucket& b) {
    ojson j;
    j["tag"] = b.tag;
    j["sccr_ka"] = b.sccrKa ? io::fieldValueJson(*b.sccrKa) : ojson();
    ojson tags = ojson::array();
    for (const auto& t : tagsOf(d, b.parts))
        tags.push_back(t);
    j["parts"] = tags;
    return j;
}

// The bucket's parts differ when the older ones, paired, are not the newer ones (a part that was
// only retagged keeps its bucket unchanged).
bool sameMembers(const Bucket& b, const Bucket& q, const Pairing& pairing) {
    std::vector<std::int64_t> olds, news;
    for (auto id : b.parts) {
        auto it = pairing.oldToNew.find(id);
        olds.push_back(it == pairing.oldToNew.end() ? -static_cast<std::int64_t>(id.value) - 1
                                                    : static_cast<std::int64_t>(it->second.value));
    }
    for (auto id : q.parts)
        news.push_back(id.value);
    std::sort(olds.begin(), olds.end());
    std::sort(news.begin(), news.end());
    return olds == news;
}

void compareBuckets(const Drawing& o, const Drawing& n, const Pairing& pairing,
                    DrawingComparison& c) {
    std::unordered_map<BucketId, BucketId> oldToNew;
    std::set<std::uint32_t> newPaired;
    std::map<std::string, int> oldTags, newTags;
    for (const auto& b : o.buckets())
        ++oldTags[b.tag];
    for (const auto& b : n.buckets())
        ++newTags[b.tag];
    for (const auto& b : o.buckets())
        if (oldTags[b.tag] == 1 && newTags[b.tag] == 1)
            for (const auto& q : n.buckets())
                if (q.tag == b.tag) {
                    oldToNew.emplace(b.id, q.id);
                    newPaired.insert(q.id.value);
                }
    for (const auto& b : o.buckets())
        if (const Bucket* q = n.bucket(b.id);
            !oldToNew.count(b.id) && q && !newPaired.count(q->id.value)) {
            oldToNew.emplace(b.id, q->id);
            newPaired.insert(q->id.value);
        }
    for (const auto& b : o.buckets()) {
        auto it = oldToNew.find(b.id);
        if (it == oldToNew.end()) {
            c.bucketsRemoved.push_back({b.id, b.tag, tagsOf(o, b.parts)});
            continue;
        }
        const Bucket& q = *n.bucket(it->second);
        const ojson a = bucketJson(o, b), z = bucketJson(n, q);
        auto fields = objectChanges(a, z, {"parts"});
        if (!sameMembers(b, q, pairing))
            fields.push_back({"parts", a["parts"], z["parts"]});
        if (!fields.empty())
            c.bucketsChanged.push_back({b.id, q.id, q.tag, std::move(fields)});
    }
    for (const auto& q : n.buckets())
        if (!newPaired.count(q.id.value))
            c.bucketsAdded.push_back({q.id, q.tag, tagsOf(n, q.parts)});
}

ojson revisionsJson(const std::vector<Revision>& revs) {
    ojson a = ojson::array();
    for (const auto& r : revs) {
        ojson row{{"rev", r.rev}, {"date", r.date}, {"by", r.by}, {"note", r.note}};
        if (!r.file.empty()) // as the file writes it: only where an issued drawing was kept
            row["file"] = r.file;
        a.push_back(std::move(row));
    }
    return a;
}

AcceptedRef acceptedRef(const Drawing& d, const Accepted& a) {
    return {a.rule, tagsOf(d, a.parts), a.by, a.date, a.note};
}

bool sameAccepted(const AcceptedRef& a, const AcceptedRef& b) {
    return a.rule == b.rule && a.tags == b.tags && a.by == b.by && a.date == b.date &&
           a.note == b.note;
}

void compareAccepted(const Drawing& o, const Drawing& n, DrawingComparison& c) {
    std::vector<AcceptedRef> olds, news;
    for (const auto& a : o.accepted())
        olds.push_back(acceptedRef(o, a));
    for (const auto& a : n.accepted())
        news.push_back(acceptedRef(n, a));
    std::vector<bool> newUsed(news.size(), false);
    for (const auto& a : olds) {
        bool found = false;
        for (std::size_t i = 0; i < news.size() && !found; ++i)
            if (!newUsed[i] && sameAccepted(a, news[i]))
                newUsed[i] = found = true;
        if (!found)
            c.acceptedRemoved.push_back(a);
    }
    for (std::size_t i = 0; i < news.size(); ++i)
        if (!newUsed[i])
            c.acceptedAdded.push_back(news[i]);
}

CommentRef commentRef(const Drawing& d, const Comment& x) {
    return {x.id, x.part, tagOf(d, x.part), x.by, x.date, x.text, x.resolved};
}

std::vector<ValueChange> commentChanges(const Comment& a, const Comment& b) {
    std::vector<ValueChange> out;
    auto status = [](const Comment& x) { return x.resolved ? "resolved" : "open"; };
    if (a.resolved != b.resolved)
        out.push_back({"status", status(a), status(b)});
    if (a.text != b.text)
        out.push_back({"text", a.text, b.text});
    if (a.by != b.by)
        out.push_back({"by", a.by, b.by});
    if (a.date != b.date)
        out.push_back({"date", a.date, b.date});
    return out;
}

void compareComments(const Drawing& o, const Drawing& n, const Pairing& pairing,
                     DrawingComparison& c) {
    auto samePart = [&](const Comment& a, const Comment& b) {
        auto it = pairing.oldToNew.find(a.part);
        return it != pairing.oldToNew.end() && it->second == b.part;
    };
    const auto& olds = o.comments();
    const auto& news = n.comments();
    std::vector<int> pairOf(olds.size(), -1);
    std::vector<bool> newUsed(news.size(), false);
    // Two passes: the same id on the paired part; then, for ids renumbered, the same author,
    // date and text on the paired part.
    auto pass = [&](auto same) {
        for (std::size_t i = 0; i < olds.size(); ++i)
            for (std::size_t k = 0; k < news.size() && pairOf[i] < 0; ++k)
                if (!newUsed[k] && samePart(olds[i], news[k]) && same(olds[i], news[k])) {
                    pairOf[i] = static_cast<int>(k);
                    newUsed[k] = true;
                }
    };
    pass([](const Comment& a, const Comment& b) { return a.id == b.id; });
    pass([](const Comment& a, const Comment& b) {
        return a.by == b.by && a.date == b.date && a.text == b.text;
    });
    for (std::size_t i = 0; i < olds.size(); ++i) {
        if (pairOf[i] < 0) {
            c.commentsRemoved.push_back(commentRef(o, olds[i]));
            continue;
        }
        const Comment& b = news[static_cast<std::size_t>(pairOf[i])];
        if (auto fields = commentChanges(olds[i], b); !fields.empty())
            c.commentsChanged.push_back(
                {olds[i].id, b.id, b.part, tagOf(n, b.part), std::move(fields)});
    }
    for (std::size_t k = 0; k < news.size(); ++k)
        if (!newUsed[k])
            c.commentsAdded.push_back(commentRef(n, news[k]));
}

// A finding's identity across revisions: its rule and its parts, old parts named as the newer
// revision names them (an unpaired old part by a value no new id takes), in sorted order.
using FindingKey = std::pair<std::string, std::vector<std::int64_t>>;

FindingRef findingRef(const Drawing& d, const Finding& f) {
    return {f.ruleId, f.severity, f.parts, tagsOf(d, f.parts), f.message, f.accepted};
}

void compareFindings(const CheckResult& o, const CheckResult& n, const Pairing& pairing,
                     DrawingComparison& c) {
    auto key = [](const Finding& f, auto mapId) {
        FindingKey k{f.ruleId, {}};
        for (auto id : f.parts)
            k.second.push_back(mapId(id));
        std::sort(k.second.begin(), k.second.end());
        return k;
    };
    auto oldId = [&](PartId id) -> std::int64_t {
        auto it = pairing.oldToNew.find(id);
        return it == pairing.oldToNew.end() ? -static_cast<std::int64_t>(id.value) - 1
                                            : static_cast<std::int64_t>(it->second.value);
    };
    auto newId = [](PartId id) { return static_cast<std::int64_t>(id.value); };
    std::map<FindingKey, int> oldCount;
    for (const auto& f : o.report.findings)
        ++oldCount[key(f, oldId)];
    std::map<FindingKey, int> matched;
    for (const auto& f : n.report.findings) {
        const auto k = key(f, newId);
        auto it = oldCount.find(k);
        if (it != oldCount.end() && it->second > 0) {
            --it->second;
            ++matched[k];
            c.findingsOpen.push_back(findingRef(*n.drawing, f));
        } else {
            c.findingsNew.push_back(findingRef(*n.drawing, f));
        }
    }
    for (const auto& f : o.report.findings) {
        const auto k = key(f, oldId);
        if (auto it = matched.find(k); it != matched.end() && it->second > 0)
            --it->second;
        else
            c.findingsResolved.push_back(findingRef(*o.drawing, f));
    }
}

} // namespace

bool DrawingComparison::same() const {
    return partsAdded.empty() && partsRemoved.empty() && partsChanged.empty() &&
           wiresAdded.empty() && wiresRemoved.empty() && bucketsAdded.empty() &&
           bucketsRemoved.empty() && bucketsChanged.empty() && sheet.empty() && settings.empty() &&
           acceptedAdded.empty() && acceptedRemoved.empty() && commentsAdded.empty() &&
           commentsRemoved.empty() && commentsChanged.empty();
}

DrawingComparison compareDrawings(const CheckResult& oldResult, const CheckResult& newResult) {
    const Drawing& o = *oldResult.drawing;
    const Drawing& n = *newResult.drawing;
    DrawingComparison c;
    const Pairing pairing = pairParts(o, n);
    compareParts(o, n, pairing, c);
    compareWires(o, n, pairing, c);
    compareBuckets(o, n, pairing, c);
    c.sheet = objectChanges(io::sheetJson(o.sheet), io::sheetJson(n.sheet));
    if (o.sheet.revisions != n.sheet.revisions)
        c.sheet.push_back(
            {"revisions", revisionsJson(o.sheet.revisions), revisionsJson(n.sheet.revisions)});
    c.settings = objectChanges(io::settingsJson(o.settings), io::settingsJson(n.settings));
    compareAccepted(o, n, c);
    compareComments(o, n, pairing, c);
    compareFindings(oldResult, newResult, pairing, c);
    c.pairedParts = pairing.oldToNew;
    return c;
}

DrawingComparison compareDrawings(const Drawing& oldDrawing, const Drawing& newDrawing,
                                  const Tables& tables) {
    const auto o = runCheck(oldDrawing, tables);
    const auto n = runCheck(newDrawing, tables);
    return compareDrawings(*o, *n);
}

std::string valueText(const ojson& v) {
    if (v.is_null())
        return "(none)";
    if (v.is_string())
        return v.get<std::string>().empty() ? "(none)" : v.get<std::string>();
    if (v.is_array()) {
        std::string out;
        for (const auto& e : v)
            out += (out.empty() ? "" : ", ") + valueText(e);
        return out.empty() ? "(none)" : out;
    }
    if (v.is_object()) {
        std::string out;
        for (auto it = v.begin(); it != v.end(); ++it)
            out += (out.empty() ? "" : " ") + valueText(it.value());
        return out;
    }
    return v.dump();
}

} // namespace lineward
