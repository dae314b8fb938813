// Reading typed ratings from a part. Defaults come from the field table through Part::number;
// choice words become enums here and nowhere else.
#include "model/ratings.h"

#include <stdexcept>

namespace lineward {

namespace {

void expectKind(const Part& p, PartKind kind) {
    if (p.kind != kind)
        throw std::logic_error("ratings of a " + std::string(kindInfo(kind).key) + " read from " +
                               p.tag + ", a " + std::string(kindInfo(p.kind).key));
}

// A number rating, its default when empty; a value of another type is a bug (no file or edit
// can make one) and stops the reading instead of passing for "absent".
std::optional<double> opt(const Part& p, std::string_view key) {
    const FieldValue& v = p.value(key);
    if (!std::holds_alternative<std::monostate>(v) && !std::holds_alternative<double>(v))
        throw std::logic_error(p.tag + ": rating " + std::string(key) +
                               " holds a value that is not a number");
    return p.number(key);
}
// A rating with a default in the field table, or a required one (0 when absent; see ratings.h).
double num(const Part& p, std::string_view key) {
    return opt(p, key).value_or(0.0);
}
int whole(const Part& p, std::string_view key) {
    return static_cast<int>(num(p, key));
}
std::string text(const Part& p, std::string_view key) {
    if (auto w = p.word(key))
        return *w;
    // An empty choice reads as its default, as a number does (Part::number).
    if (const FieldSpec* f = findField(p.kind, key))
        if (auto s = std::get_if<std::string>(&f->defaultValue))
            return *s;
    return {};
}

template <class E, std::size_t N>
E choice(const Part& p, std::string_view key, const std::pair<std::string_view, E> (&words)[N]) {
    const std::string w = text(p, key);
    for (const auto& [word, e] : words)
        if (word == w)
            return e;
    throw std::logic_error(std::string(kindInfo(p.kind).key) + " " + std::string(key) +
                           " has no enum for '" + w + "'");
}

void protective(const Part& p, ProtectiveData& d) {
    d.interruptingKa = num(p, ProtectiveData::kInterruptingKa);
    d.letThroughA2s = opt(p, ProtectiveData::kLetThrough);
    d.clearS = opt(p, ProtectiveData::kClearS);
    d.curvePoints = text(p, ProtectiveData::kCurvePoints);
}

} // namespace

std::optional<ProtectiveData> protectiveDataOf(const Part& p) {
    if (p.kind != PartKind::Breaker && p.kind != PartKind::InstBreaker && p.kind != PartKind::Fuse)
        return std::nullopt;
    ProtectiveData d;
    protective(p, d);
    return d;
}

SourceRatings SourceRatings::of(const Part& p) {
    expectKind(p, PartKind::Source);
    SourceRatings r;
    r.kv = num(p, kKv);
    r.faultKa = opt(p, kFaultKa);
    r.faultMva = opt(p, kFaultMva);
    r.xOverR = num(p, kXOverR);
    return r;
}

TransformerRatings TransformerRatings::of(const Part& p) {
    expectKind(p, PartKind::Transformer);
    TransformerRatings r;
    r.kva = num(p, kKva);
    r.priV = num(p, kPriV);
    r.secV = num(p, kSecV);
    r.zPct = num(p, kZPct);
    r.xOverR = num(p, kXOverR);
    return r;
}

BusRatings BusRatings::of(const Part& p) {
    expectKind(p, PartKind::Bus);
    static constexpr std::pair<std::string_view, BusType> kWords[] = {
        {"switchboard", BusType::Switchboard},
        {"mcc", BusType::Mcc},
        {"panelboard", BusType::Panelboard}};
    BusRatings r;
    r.type = choice(p, kType, kWords);
    r.volts = num(p, kVolts);
    r.amps = num(p, kAmps);
    r.bracingKa = opt(p, kBracingKa);
    r.phases = whole(p, kPhases);
    return r;
}

BreakerRatings BreakerRatings::of(const Part& p) {
    expectKind(p, PartKind::Breaker);
    static constexpr std::pair<std::string_view, TripType> kWords[] = {
        {"thermal_magnetic", TripType::ThermalMagnetic}, {"electronic", TripType::Electronic}};
    BreakerRatings r;
    protective(p, r);
    r.tripType = choice(p, kTripType, kWords);
    r.frameA = opt(p, kFrameA);
    r.tripA = num(p, kTripA);
    r.instX = opt(p, kInstX);
    r.ltPickupX = opt(p, kLtPickupX);
    r.ltDelayS = opt(p, kLtDelayS);
    r.stPickupX = opt(p, kStPickupX);
    r.stDelayS = opt(p, kStDelayS);
    r.stI2t = p.flag(kStI2t);
    r.open = p.flag(kOpen);
    return r;
}

InstBreakerRatings InstBreakerRatings::of(const Part& p) {
    expectKind(p, PartKind::InstBreaker);
    InstBreakerRatings r;
    protective(p, r);
    r.amps = num(p, kAmps);
    r.pickupA = num(p, kPickupA);
    r.pickupMinA = opt(p, kPickupMinA);
    r.pickupMaxA = opt(p, kPickupMaxA);
    r.open = p.flag(kOpen);
    return r;
}

FuseRatings FuseRatings::of(const Part& p) {
    expectKind(p, PartKind::Fuse);
    static constexpr std::pair<std::string_view, FuseType> kWords[] = {
        {"time_delay", FuseType::TimeDelay}, {"fast", FuseType::Fast}};
    FuseRatings r;
    protective(p, r);
    r.type = choice(p, kType, kWords);
    r.fuseClass = p.word(kClass);
    r.amps = num(p, kAmps);
    return r;
}

DisconnectRatings DisconnectRatings::of(const Part& p) {
    expectKind(p, PartKind::Disconnect);
    DisconnectRatings r;
    r.amps = num(p, kAmps);
    r.hpRating = opt(p, kHpRating);
    r.fused = p.flag(kFused);
    r.open = p.flag(kOpen);
    return r;
}

ContactorRatings ContactorRatings::of(const Part& p) {
    expectKind(p, PartKind::Contactor);
    ContactorRatings r;
    r.nemaSize = p.word(kNemaSize);
    r.ac3A = opt(p, kAc3A);
    r.open = p.flag(kOpen);
    return r;
}

OverloadRatings OverloadRatings::of(const Part& p) {
    expectKind(p, PartKind::Overload);
    OverloadRatings r;
    r.settingA = num(p, kSettingA);
    r.rangeMinA = opt(p, kRangeMinA);
    r.rangeMaxA = opt(p, kRangeMaxA);
    r.tripClass = text(p, kTripClass);
    r.curvePoints = text(p, kCurvePoints);
    return r;
}

CableRatings CableRatings::of(const Part& p) {
    expectKind(p, PartKind::Cable);
    static constexpr std::pair<std::string_view, Material> kMaterials[] = {{"cu", Material::Cu},
                                                                           {"al", Material::Al}};
    static constexpr std::pair<std::string_view, Raceway> kRaceways[] = {
        {"steel", Raceway::Steel}, {"pvc", Raceway::Pvc}, {"aluminum", Raceway::Aluminum}};
    CableRatings r;
    r.material = choice(p, kMaterial, kMaterials);
    r.size = text(p, kSize);
    r.sets = whole(p, kSets);
    r.lengthFt = num(p, kLengthFt);
    r.insulationC = whole(p, kInsulationC);
    r.terminationC = whole(p, kTerminationC);
    r.raceway = choice(p, kRaceway, kRaceways);
    r.conductors = whole(p, kConductors);
    r.ambientC = opt(p, kAmbientC);
    r.egcSize = text(p, kEgcSize);
    return r;
}

MotorRatings MotorRatings::of(const Part& p) {
    expectKind(p, PartKind::Motor);
    static constexpr std::pair<std::string_view, Rotor> kRotors[] = {
        {"squirrel_cage", Rotor::SquirrelCage},
        {"wound_rotor", Rotor::WoundRotor},
        {"synchronous", Rotor::Synchronous}};
    MotorRatings r;
    r.hp = opt(p, kHp);
    r.kw = opt(p, kKw);
    r.volts = num(p, kVolts);
    r.phases = whole(p, kPhases);
    r.fla = opt(p, kFla);
    r.serviceFactor = num(p, kSf);
    r.design = text(p, kDesign);
    r.rotor = choice(p, kRotor, kRotors);
    r.codeLetter = p.word(kCodeLetter);
    r.lra = opt(p, kLra);
    r.accelS = num(p, kAccelS);
    r.stallHotS = opt(p, kStallHotS);
    r.stallColdS = opt(p, kStallColdS);
    r.tempRiseC = opt(p, kTempRiseC);
    r.premiumEff = p.flag(kPremiumEff);
    r.hardToStart = p.flag(kHardToStart);
    return r;
}

LoadRatings LoadRatings::of(const Part& p) {
    expectKind(p, PartKind::Load);
    LoadRatings r;
    r.kva = opt(p, kKva);
    r.kw = opt(p, kKw);
    r.pf = num(p, kPf);
    r.volts = num(p, kVolts);
    r.phases = whole(p, kPhases);
    r.continuous = p.flag(kContinuous);
    return r;
}

std::string userCurvePoints(const Part& p) {
    return fieldIndex(p.kind, ProtectiveData::kCurvePoints) ? text(p, ProtectiveData::kCurvePoints)
                                                            : std::string();
}

double ratedVolts(const Part& p) {
    switch (p.kind) {
    case PartKind::Source:
        return num(p, SourceRatings::kKv) * 1000.0;
    case PartKind::Bus:
        return num(p, BusRatings::kVolts);
    case PartKind::Motor:
        return num(p, MotorRatings::kVolts);
    case PartKind::Load:
        return num(p, LoadRatings::kVolts);
    default:
        return 0.0;
    }
}

std::string_view ampereRatingKey(PartKind kind) {
    return kind == PartKind::Breaker ? BreakerRatings::kTripA : InstBreakerRatings::kAmps;
}

double ampereRatingA(const Part& device) {
    return num(device, ampereRatingKey(device.kind));
}

std::string_view branchSettingKey(PartKind kind) {
    return kind == PartKind::InstBreaker ? InstBreakerRatings::kPickupA : ampereRatingKey(kind);
}

double branchSettingA(const Part& device) {
    return num(device, branchSettingKey(device.kind));
}

} // namespace lineward
