// Shared helpers of the sizing rule families.
#include "rules/rule_context.h"

#include <cmath>

namespace lineward {

std::string RuleContext::tag(PartId id) const {
    const Part* p = drawing.part(id);
    return p && !p->tag.empty() ? p->tag : "#" + std::to_string(id.value);
}

std::vector<MotorBranch> motorBranches(const RuleContext& ctx) {
    std::vector<MotorBranch> out;
    for (const auto& p : ctx.drawing.parts()) {
        if (p.kind != PartKind::Motor || !ctx.net.partReachable(p.id))
            continue;
        MotorBranch b;
        b.motor = &p;
        for (auto id : ctx.net.branchChain(p.id)) {
            const Part* q = ctx.drawing.part(id);
            b.chain.push_back(q);
            switch (q->kind) {
            case PartKind::Breaker:
            case PartKind::InstBreaker:
            case PartKind::Fuse:
                b.scpd = q; // the last one met is nearest the bus
                break;
            case PartKind::Disconnect:
                b.disconnect = q;
                break;
            case PartKind::Contactor:
                b.contactor = q;
                break;
            case PartKind::Overload:
                b.overload = q;
                break;
            case PartKind::Cable:
                b.cables.push_back(q);
                break;
            default:
                break;
            }
        }
        out.push_back(b);
    }
    return out;
}

double loadAmps(const Part& l) {
    const double kva =
        l.number("kva").value_or(l.number("kw").value_or(0) / l.number("pf").value());
    const double v = l.number("volts").value_or(1);
    const bool one = l.number("phases").value_or(3) == 1;
    return kva * 1000.0 / (one ? v : std::sqrt(3.0) * v);
}

} // namespace lineward
