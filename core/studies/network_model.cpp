// Per-unit model: closed switching devices, fuses and overload relays have no impedance, so the
// nodes they join become one solve bus; cables and transformers are branches.
#include "studies/network_model.h"

#include "model/ratings.h"
#include "sizing/motor_sizing.h"

#include <algorithm>
#include <cmath>
#include <deque>
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

double iecMotorROverX(double ratedV, double kw) {
    if (ratedV <= 1000.0)
        return 0.42; // low-voltage motors with their connection cables
    // Medium voltage: 0.10 where the power per pole pair is 1 MW or more, else 0.15; the pole
    // count is not in the drawing, so four poles (two pairs) are assumed.
    return kw / 2.0 >= 1000.0 ? 0.10 : 0.15;
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

// Each bus's per-unit base is the voltage it has at no load: sources at their rating, carried
// through every transformer's turns ratio and tap (a cable keeps it). Where the transformers'
// voltages match the drawing's this is the nominal voltage; an off-nominal tap or a winding
// rated for another system voltage moves it, and with it every secondary voltage and fault
// current. A loop whose ratios disagree keeps the first path's base and is reported.
void ratioBases(NetworkModel& m, const Network& net) {
    const Drawing& d = net.drawing();
    const auto& g = net.graph();
    const int n = m.busCount();
    m.nominalV = m.baseV;
    struct Link {
        int to;
        double ratio; ///< volts at `to` per volt here
        PartId part;
    };
    std::vector<std::vector<Link>> links(static_cast<std::size_t>(n));
    for (auto [e, end] = boost::edges(g); e != end; ++e) {
        const Part& p = *d.part(g[*e].part);
        const int a = m.busOfNode[boost::source(*e, g)], b = m.busOfNode[boost::target(*e, g)];
        if (!g[*e].closed || !hasImpedance(p.kind) || a < 0 || b < 0 || a == b)
            continue;
        double ratio = 1.0;
        if (p.kind == PartKind::Transformer) {
            const double r = TransformerRatings::of(p).voltsRatio();
            const bool aIsPrimary = m.busOfNode[net.nodeOf(p.id, 0)] == a;
            ratio = aIsPrimary ? r : 1.0 / r;
        }
        links[static_cast<std::size_t>(a)].push_back({b, ratio, p.id});
        links[static_cast<std::size_t>(b)].push_back({a, 1.0 / ratio, p.id});
    }
    std::vector<char> seen(static_cast<std::size_t>(n), 0);
    std::deque<int> queue;
    for (const auto& p : d.parts()) {
        if (p.kind != PartKind::Source)
            continue;
        const int bus = m.busOfNode[net.nodeOf(p.id, 0)];
        if (bus >= 0 && !seen[static_cast<std::size_t>(bus)]) {
            seen[static_cast<std::size_t>(bus)] = 1;
            m.baseV[static_cast<std::size_t>(bus)] = SourceRatings::of(p).kv * 1000.0;
            queue.push_back(bus);
        }
    }
    std::vector<PartId> reported;
    while (!queue.empty()) {
        const int u = queue.front();
        queue.pop_front();
        for (const Link& l : links[static_cast<std::size_t>(u)]) {
            const double v = m.baseV[static_cast<std::size_t>(u)] * l.ratio;
            auto& there = m.baseV[static_cast<std::size_t>(l.to)];
            if (!seen[static_cast<std::size_t>(l.to)]) {
                seen[static_cast<std::size_t>(l.to)] = 1;
                there = v;
                queue.push_back(l.to);
            } else if (std::abs(v / there - 1.0) > kRatioMismatchTolerance &&
                       std::find(reported.begin(), reported.end(), l.part) == reported.end()) {
                reported.push_back(l.part);
                m.issues.push_back(
                    {StudyIssueKind::RatioMismatch,
                     {l.part},
                     d.part(l.part)->tag +
                         ": the voltage ratios around a closed loop through it "
                         "disagree (" +
                         formatNumber(std::round(v)) + " V against " +
                         formatNumber(std::round(there)) +
                         " V at no load); the circulating current this drives is not modelled"});
            }
        }
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
            // %Z is on the rated kVA and the rated secondary voltage; the secondary bus's base
            // differs from that rating where a tap or an off-nominal primary moves it.
            const auto tx = TransformerRatings::of(p);
            const double secBase =
                m.baseV[static_cast<std::size_t>(m.busOfNode[net.nodeOf(p.id, 1)])];
            const double zpu = tx.zPct / 100.0 * kBaseMva / (tx.kva / 1000.0) *
                               (tx.secV / secBase) * (tx.secV / secBase);
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
            if (s.motorContribution == MotorContribution::Iec60909) {
                // IEC 60909-0 3.8.2 (from memory): Z_M = U_rM / (√3 · I_LR), R/X by size.
                const auto lr = lockedRotor(p, t, nullptr);
                const double lra = lr ? lr->amps : kAssumedLockedRotorMultiple * amps;
                const double zOhm = rated / std::sqrt(3.0) / lra;
                const double kw = motor.kw ? *motor.kw : motor.hp.value_or(0) * 0.746;
                m.motors.push_back(
                    {bus, fromMagnitude(zOhm / zBase(vb), 1.0 / iecMotorROverX(rated, kw)), p.id});
            } else if (s.motorContributionX > 0) {
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
    ratioBases(m, net);
    addBranches(m, net, t, s);
    addShunts(m, net, t, s);
    return m;
}

} // namespace lineward
