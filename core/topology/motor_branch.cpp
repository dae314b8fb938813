// Motor branches from the network's branch chains.
#include "topology/motor_branch.h"

#include "topology/network.h"

namespace lineward {

const Part* startingDevice(const Drawing& d, const std::vector<PartId>& chain) {
    for (auto id : chain)
        if (const Part* q = d.part(id);
            q && (q->kind == PartKind::Vfd || q->kind == PartKind::SoftStarter))
            return q;
    return nullptr;
}

std::vector<MotorBranch> findMotorBranches(const Drawing& d, const Network& net) {
    std::vector<MotorBranch> out;
    for (const auto& p : d.parts()) {
        if (p.kind != PartKind::Motor || !net.partReachable(p.id))
            continue;
        MotorBranch b;
        b.motor = &p;
        for (auto id : net.branchChain(p.id)) {
            const Part* q = d.part(id);
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
            case PartKind::Vfd:
                if (!b.drive)
                    b.drive = q;
                break;
            case PartKind::SoftStarter:
                if (!b.softStarter)
                    b.softStarter = q;
                break;
            case PartKind::Cable:
                b.cables.push_back(q);
                if (b.drive)
                    b.driveInputCables.push_back(q); // met after the drive: on its line side
                break;
            default:
                break;
            }
        }
        out.push_back(b);
    }
    return out;
}

} // namespace lineward
