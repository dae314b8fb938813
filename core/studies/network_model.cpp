// Per-unit model: closed switching devices, fuses and overload relays have no impedance, so the
// nodes they join become one solve bus; cables and transformers are branches.
#include "studies/network_model.h"

#include "model/ratings.h"
#include "sizing/motor_sizing.h"

#include <cmath>
#include <numeric>

namespace lineward {

namespace {

Complex fromMagnitude(double mag, double xr) {
    const double angle = std::atan(xr);
    return std::polar(mag, angle);
}

int find(std::vector<int>& p, int x) {
    while (p[x] != x)
        x = p[x] = p[p[x]];
    return x;
}

bool hasImpedance(PartKind k) {
    return k == PartKind::Cable || k == PartKind::Transformer;
}

double zBase(double volts) {
    return volts * volts / (kBaseMva * 1e6);
}

} // namespace

double NetworkModel::baseAmps(int bus) const {
    return kBaseMva * 1e6 / (std::sqrt(3.0) * baseV[static_cast<std::size_t>(bus)]);
}

std::optional<Complex> cableOhms(const Part& cable, const Tables& t) {
    const auto c = CableRatings::of(cable);
    const std::string& size = c.size;
    const double lengthFt = c.lengthFt;
    const double sets = c.sets;
    const bool al = c.material == Material::Al;
    const auto raceway = c.raceway;
    if (size.ends_with(" mm2")) {
        // Resistivity at 75 °C (Cu 0.0210, Al 0.0346 ohm·mm²/m, from memory) and 0.08 ohm/km
        // reactance (common practice) where IEC tables are not loaded.
        const double area = std::stod(size);
        const double rPerM = (al ? 0.0346 : 0.0210) / area;
        return Complex(rPerM, 0.08e-3) * (lengthFt * 0.3048) / sets;
    }
    const ImpedanceRow* row = t.impedanceRow(size);
    if (!row)
        return std::nullopt;
    const int col = raceway == Raceway::Pvc ? 0 : raceway == Raceway::Aluminum ? 1 : 2;
    const auto r = (al ? row->alR : row->cuR)[col];
    if (!r)
        return std::nullopt;
    const double x = raceway == Raceway::Steel ? row->xlSteel : row->xlPvcAl;
    return Complex(*r, x) * (lengthFt / 1000.0) / sets;
}

double resistanceFactorFrom75C(bool aluminium, double tempC) {
    return 1.0 + (aluminium ? 0.00330 : 0.00323) * (tempC - 75.0);
}

namespace {

// Closed zero-impedance devices join nodes into one solve bus; each energized bus takes its
// node's nominal voltage as base.
void mergeBuses(NetworkModel& m, const Network& net) {
    const Drawing& d = net.drawing();
    const auto& g = net.graph();
    const int n = static_cast<int>(net.nodeCount());
    std::vector<int> parent(static_cast<std::size_t>(n));
    std::iota(parent.begin(), parent.end(), 0);
    for (auto [e, end] = boost::edges(g); e != end; ++e) {
        const Part& p = *d.part(g[*e].part);
        if (g[*e].closed && !hasImpedance(p.kind))
            parent[static_cast<std::size_t>(find(parent, static_cast<int>(boost::source(*e, g))))] =
                find(parent, static_cast<int>(boost::target(*e, g)));
    }
    m.busOfNode.assign(static_cast<std::size_t>(n), -1);
    std::vector<int> busOfRoot(static_cast<std::size_t>(n), -1);
    for (int v = 0; v < n; ++v) {
        if (!g[static_cast<std::size_t>(v)].energized ||
            g[static_cast<std::size_t>(v)].nominalV <= 0)
            continue;
        const int r = find(parent, v);
        if (busOfRoot[static_cast<std::size_t>(r)] < 0) {
            busOfRoot[static_cast<std::size_t>(r)] = m.busCount();
            m.baseV.push_back(g[static_cast<std::size_t>(v)].nominalV);
        }
        m.busOfNode[static_cast<std::size_t>(v)] = busOfRoot[static_cast<std::size_t>(r)];
    }
}

// Transformers and cables between solve buses.
void addBranches(NetworkModel& m, const Network& net, const Tables& t, const Settings& s) {
    const Drawing& d = net.drawing();
    const auto& g = net.graph();
    for (auto [e, end] = boost::edges(g); e != end; ++e) {
        const Part& p = *d.part(g[*e].part);
        const int a = m.busOfNode[boost::source(*e, g)], b = m.busOfNode[boost::target(*e, g)];
        if (!g[*e].closed || !hasImpedance(p.kind) || a < 0 || b < 0)
            continue;
        Complex z, zMax, zMin;
        if (p.kind == PartKind::Transformer) {
            // kVA and %Z are required ratings: every drawing read or edited has them.
            const auto tx = TransformerRatings::of(p);
            const double zpu = tx.zPct / 100.0 * kBaseMva / (tx.kva / 1000.0);
            z = fromMagnitude(zpu, tx.xOverR);
            zMax = z * (1.0 - s.txZTolerancePct / 100.0);
            zMin = z;
        } else if (auto ohms = cableOhms(p, t)) {
            z = *ohms / zBase(m.baseV[static_cast<std::size_t>(a)]);
            const auto cable = CableRatings::of(p);
            const bool al = cable.material == Material::Al;
            zMax = Complex(z.real() * resistanceFactorFrom75C(al, s.faultConductorC), z.imag());
            zMin = Complex(z.real() * resistanceFactorFrom75C(al, cable.insulationC), z.imag());
        } else {
            m.issues.push_back({StudyIssueKind::CableNoData,
                                {p.id},
                                p.tag + ": no impedance data for " + CableRatings::of(p).size +
                                    "; the studies treat it as having none"});
            z = Complex(kNoDataCablePu, kNoDataCablePu);
            zMax = zMin = z;
        }
        m.branches.push_back({a, b, z, p.id, zMax, zMin});
    }
}

// Sources and running motors as EMFs behind impedances; motors and static loads as loads.
void addShunts(NetworkModel& m, const Network& net, const Tables& t, const Settings& s) {
    const Drawing& d = net.drawing();
    for (const auto& p : d.parts()) {
        const int bus = isTwoTerminal(p.kind) ? -1 : m.busOfNode[net.nodeOf(p.id, 0)];
        if (bus < 0)
            continue;
        const double vb = m.baseV[static_cast<std::size_t>(bus)];
        if (p.kind == PartKind::Source) {
            // The source gives exactly one of the two (the kind's validation).
            const auto src = SourceRatings::of(p);
            const double mva =
                src.faultMva ? *src.faultMva : std::sqrt(3.0) * src.kv * src.faultKa.value_or(0);
            m.sources.push_back({bus, fromMagnitude(kBaseMva / mva, src.xOverR), p.id});
        } else if (p.kind == PartKind::Motor) {
            auto flc = motorFlc(p, t, false);
            const auto motor = MotorRatings::of(p);
            const double amps = motor.fla ? *motor.fla : flc ? flc->amps : 0;
            if (amps <= 0)
                continue;
            const double rated = motor.volts;
            const double sPu = std::sqrt(3.0) * rated * amps / (kBaseMva * 1e6);
            m.loads.push_back({bus, std::polar(sPu, std::acos(kRunningPf)), p.id});
            if (s.motorContributionX > 0) {
                const double zOhm =
                    rated / std::sqrt(3.0) / (s.motorContributionX * (flc ? flc->amps : amps));
                m.motors.push_back({bus, fromMagnitude(zOhm / zBase(vb), kMotorXr), p.id});
            }
        } else if (p.kind == PartKind::Load) {
            const auto load = LoadRatings::of(p);
            const double pf = load.pf;
            const double kva = load.apparentKva();
            m.loads.push_back({bus, std::polar(kva / 1000.0 / kBaseMva, std::acos(pf)), p.id});
        }
    }
}

} // namespace

NetworkModel buildNetworkModel(const Network& net, const Tables& t, const Settings& s) {
    NetworkModel m;
    mergeBuses(m, net);
    addBranches(m, net, t, s);
    addShunts(m, net, t, s);
    return m;
}

} // namespace lineward
