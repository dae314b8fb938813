// The drawing.* rules of docs/rules.md.
#include "rules/drawing_rules.h"

#include "rules/rule_catalog.h"

#include <map>

namespace lineward {

void checkDrawingRules(const Drawing& d, std::vector<Finding>& out) {
    // Tags are how people, schedules and the command line name parts; two parts with one tag
    // make every report about either ambiguous.
    std::map<std::string, std::vector<PartId>> byTag;
    for (const auto& p : d.parts())
        if (!p.tag.empty())
            byTag[p.tag].push_back(p.id);
    for (const auto& [tag, ids] : byTag) {
        if (ids.size() < 2)
            continue;
        auto f = makeFinding("drawing.tag.duplicate", ids,
                             "tag " + tag + " is used by " + std::to_string(ids.size()) + " parts");
        f.computed = static_cast<double>(ids.size());
        f.limit = 1;
        f.unit = "parts";
        std::string list;
        for (auto id : ids)
            list += (list.empty() ? "" : ", ") + std::string(kindInfo(d.part(id)->kind).name) +
                    " #" + std::to_string(id.value);
        f.trace = {{"parts with this tag", list}};
        f.fix = Fix{"give each part its own tag", {}};
        out.push_back(std::move(f));
    }
}

} // namespace lineward
