// Reading typed ratings from a part. Defaults come from the field table;
// choice words become enums here and nowhere else.
#include "model/ratings.h"

#include <array>
#include <stdexcept>

namespace lineward {

namespace {

void expectKind(const Part& p, PartKind kind) {
    if (p.kind != kind)
        throw std::logic_error("ratings of a " + std::string(kindInfo(kind).key) + " read from " +
                               p.tag + ", a " + std::string(kindInfo(p.kind).key));
}

// Where a key sits in each kind's field list, found once per place that reads it: the check
// reads ratings hundreds of thousands of times, and a search by name each time was a third of
// its cost. A function-local static is built once, thread-safely (the editor checks on a
// worker thread while the window reads the same parts).
struct Place {
    std::size_t index = 0;
    const FieldSpec* spec = nullptr; ///< null: the kind has no such field
};
using KindIndex = std::array<Place, kPartKindCount>;

KindIndex fieldIndices(std::string_view key) {
    KindIndex t;
    for (int k = 0; k < kPartKindCount; ++k)
        if (auto i = fieldIndex(static_cast<PartKind>(k), key))
            t[static_cast<std::size_t>(k)] = {*i, &kindInfo(static_cast<PartKind>(k)).fields[*i]};
    return t;
}

struct Slot {
    const KindIndex* at;
    std::string_view key;
};
#define SLOT(key)                                                                                  \
    (Slot{[] {                                                                                     \
              static const KindIndex t = fieldIndices(key);                                        \
              return &t;                                                                           \
          }(),                                                                                     \
          (key)})

const FieldValue kEmpty{};

[[noreturn]] void noField(const Part& p, Slot s) {
    throw std::logic_error("part kind " + std::string(kindInfo(p.kind).key) + " has no field " +
                           std::string(s.key));
}

// The stored value and the field's spec; a key the kind lacks is a bug and throws.
inline std::pair<const FieldValue*, const FieldSpec*> slotOf(const Part& p, Slot s) {
    const Place& at = (*s.at)[static_cast<std::size_t>(p.kind)];
    if (!at.spec)
        noField(p, s);
    return {at.index < p.values.size() ? &p.values[at.index] : &kEmpty, at.spec};
}

// A value of another type than the field's is a bug (no file or edit can make one): it stops
// the reading instead of passing for "absent".
[[noreturn]] void wrongType(const Part& p, Slot s, const char* expected) {
    throw std::logic_error(p.tag + ": rating " + std::string(s.key) +
                           " holds a value that is not " + expected);
}

// A rating read as its type, else its default when empty (one default per rating: the field
// table's), else nothing.
template <class T> inline std::optional<T> read(const Part& p, Slot s, const char* expected) {
    const auto [v, spec] = slotOf(p, s);
    if (auto x = std::get_if<T>(v))
        return *x;
    if (!std::holds_alternative<std::monostate>(*v))
        wrongType(p, s, expected);
    if (auto d = std::get_if<T>(&spec->defaultValue))
        return *d;
    return std::nullopt;
}

inline std::optional<double> opt(const Part& p, Slot s) {
    return read<double>(p, s, "a number");
}
// A rating with a default in the field table, or a required one (0 when absent; see ratings.h).
inline double num(const Part& p, Slot s) {
    return opt(p, s).value_or(0.0);
}
int whole(const Part& p, Slot s) {
    return static_cast<int>(num(p, s));
}
// The stored text, else the field's default text, else nothing; no copy.
inline const std::string* wordRef(const Part& p, Slot s) {
    const auto [v, spec] = slotOf(p, s);
    if (auto x = std::get_if<std::string>(v))
        return x;
    if (!std::holds_alternative<std::monostate>(*v))
        wrongType(p, s, "text");
    return std::get_if<std::string>(&spec->defaultValue);
}
std::optional<std::string> word(const Part& p, Slot s) {
    const std::string* w = wordRef(p, s);
    return w ? std::optional(*w) : std::nullopt;
}
std::string text(const Part& p, Slot s) {
    const std::string* w = wordRef(p, s);
    return w ? *w : std::string(); // empty: not given
}
bool flag(const Part& p, Slot s) {
    return read<bool>(p, s, "true or false").value_or(false);
}

template <class E, std::size_t N>
E choice(const Part& p, Slot key, const std::pair<std::string_view, E> (&words)[N]) {
    const std::string* stored = wordRef(p, key);
    const std::string_view w = stored ? std::string_view(*stored) : std::string_view();
    for (const auto& [word, e] : words)
        if (word == w)
            return e;
    throw std::logic_error(std::string(kindInfo(p.kind).key) + " " + std::string(key.key) +
                           " has no enum for '" + std::string(w) + "'");
}

void protective(const Part& p, ProtectiveData& d) {
    d.interruptingKa = num(p, SLOT(ProtectiveData::kInterruptingKa));
    d.letThroughA2s = opt(p, SLOT(ProtectiveData::kLetThrough));
    d.clearS = opt(p, SLOT(ProtectiveData::kClearS));
    d.curvePoints = text(p, SLOT(ProtectiveData::kCurvePoints));
}

} // namespace

std::optional<ProtectiveData> protectiveDataOf(const Part& p) {
    if (!kindInfo(p.kind).protective) // breakers, instantaneous-only breakers, fuses
        return std::nullopt;
    ProtectiveData d;
    protective(p, d);
    return d;
}

SourceRatings SourceRatings::of(const Part& p) {
    expectKind(p, PartKind::Source);
    SourceRatings r;
    r.kv = num(p, SLOT(kKv));
    r.faultKa = opt(p, SLOT(kFaultKa));
    r.faultMva = opt(p, SLOT(kFaultMva));
    r.xOverR = num(p, SLOT(kXOverR));
    return r;
}

TransformerRatings TransformerRatings::of(const Part& p) {
    expectKind(p, PartKind::Transformer);
    TransformerRatings r;
    r.kva = num(p, SLOT(kKva));
    r.priV = num(p, SLOT(kPriV));
    r.secV = num(p, SLOT(kSecV));
    r.zPct = num(p, SLOT(kZPct));
    r.xOverR = num(p, SLOT(kXOverR));
    r.tapPct = num(p, SLOT(kTapPct));
    return r;
}

BusRatings BusRatings::of(const Part& p) {
    expectKind(p, PartKind::Bus);
    static constexpr std::pair<std::string_view, BusType> kWords[] = {
        {"switchboard", BusType::Switchboard},
        {"mcc", BusType::Mcc},
        {"panelboard", BusType::Panelboard},
        {"cable_junction", BusType::CableJunction}};
    BusRatings r;
    r.type = choice(p, SLOT(kType), kWords);
    r.volts = num(p, SLOT(kVolts));
    r.amps = num(p, SLOT(kAmps));
    r.bracingKa = opt(p, SLOT(kBracingKa));
    r.phases = whole(p, SLOT(kPhases));
    r.afConfig = text(p, SLOT(kAfConfig));
    r.afGapMm = opt(p, SLOT(kAfGapMm));
    r.afWorkingMm = opt(p, SLOT(kAfWorkingMm));
    r.afHeightMm = opt(p, SLOT(kAfHeightMm));
    r.afWidthMm = opt(p, SLOT(kAfWidthMm));
    r.afDepthMm = opt(p, SLOT(kAfDepthMm));
    r.service = flag(p, SLOT(kService));
    return r;
}

BreakerRatings BreakerRatings::of(const Part& p) {
    expectKind(p, PartKind::Breaker);
    static constexpr std::pair<std::string_view, TripType> kWords[] = {
        {"thermal_magnetic", TripType::ThermalMagnetic}, {"electronic", TripType::Electronic}};
    BreakerRatings r;
    protective(p, r);
    r.tripType = choice(p, SLOT(kTripType), kWords);
    static constexpr std::pair<std::string_view, BreakerConstruction> kBuilt[] = {
        {"molded_case", BreakerConstruction::MoldedCase},
        {"power", BreakerConstruction::Power},
        {"power_fused", BreakerConstruction::PowerFused}};
    r.construction = choice(p, SLOT(kConstruction), kBuilt);
    r.frameA = opt(p, SLOT(kFrameA));
    r.tripA = num(p, SLOT(kTripA));
    r.instX = opt(p, SLOT(kInstX));
    r.ltPickupX = opt(p, SLOT(kLtPickupX));
    r.ltDelayS = opt(p, SLOT(kLtDelayS));
    r.stPickupX = opt(p, SLOT(kStPickupX));
    r.stDelayS = opt(p, SLOT(kStDelayS));
    r.stI2t = flag(p, SLOT(kStI2t));
    r.open = flag(p, SLOT(kOpen));
    return r;
}

InstBreakerRatings InstBreakerRatings::of(const Part& p) {
    expectKind(p, PartKind::InstBreaker);
    InstBreakerRatings r;
    protective(p, r);
    r.amps = num(p, SLOT(kAmps));
    r.pickupA = num(p, SLOT(kPickupA));
    r.pickupMinA = opt(p, SLOT(kPickupMinA));
    r.pickupMaxA = opt(p, SLOT(kPickupMaxA));
    r.open = flag(p, SLOT(kOpen));
    return r;
}

FuseRatings FuseRatings::of(const Part& p) {
    expectKind(p, PartKind::Fuse);
    static constexpr std::pair<std::string_view, FuseType> kWords[] = {
        {"time_delay", FuseType::TimeDelay}, {"fast", FuseType::Fast}};
    FuseRatings r;
    protective(p, r);
    r.type = choice(p, SLOT(kType), kWords);
    r.fuseClass = word(p, SLOT(kClass));
    r.amps = num(p, SLOT(kAmps));
    return r;
}

DisconnectRatings DisconnectRatings::of(const Part& p) {
    expectKind(p, PartKind::Disconnect);
    DisconnectRatings r;
    r.amps = num(p, SLOT(kAmps));
    r.hpRating = opt(p, SLOT(kHpRating));
    r.fused = flag(p, SLOT(kFused));
    r.open = flag(p, SLOT(kOpen));
    return r;
}

ContactorRatings ContactorRatings::of(const Part& p) {
    expectKind(p, PartKind::Contactor);
    ContactorRatings r;
    r.nemaSize = word(p, SLOT(kNemaSize));
    r.ac3A = opt(p, SLOT(kAc3A));
    r.open = flag(p, SLOT(kOpen));
    return r;
}

OverloadRatings OverloadRatings::of(const Part& p) {
    expectKind(p, PartKind::Overload);
    OverloadRatings r;
    r.settingA = num(p, SLOT(kSettingA));
    r.rangeMinA = opt(p, SLOT(kRangeMinA));
    r.rangeMaxA = opt(p, SLOT(kRangeMaxA));
    r.tripClass = text(p, SLOT(kTripClass));
    r.ultimateTripX = num(p, SLOT(kUltimateTripX));
    r.curvePoints = text(p, SLOT(kCurvePoints));
    return r;
}

VfdRatings VfdRatings::of(const Part& p) {
    expectKind(p, PartKind::Vfd);
    VfdRatings r;
    r.hp = num(p, SLOT(kHp));
    r.volts = num(p, SLOT(kVolts));
    r.inputA = num(p, SLOT(kInputA));
    r.outputA = num(p, SLOT(kOutputA));
    r.maxScpdA = opt(p, SLOT(kMaxScpdA));
    return r;
}

SoftStarterRatings SoftStarterRatings::of(const Part& p) {
    expectKind(p, PartKind::SoftStarter);
    SoftStarterRatings r;
    r.hp = num(p, SLOT(kHp));
    r.volts = num(p, SLOT(kVolts));
    r.amps = num(p, SLOT(kAmps));
    r.startLimitX = num(p, SLOT(kStartLimitX));
    r.bypass = flag(p, SLOT(kBypass));
    r.bypassA = opt(p, SLOT(kBypassA));
    return r;
}

CableRatings CableRatings::of(const Part& p) {
    expectKind(p, PartKind::Cable);
    static constexpr std::pair<std::string_view, Material> kMaterials[] = {{"cu", Material::Cu},
                                                                           {"al", Material::Al}};
    static constexpr std::pair<std::string_view, Raceway> kRaceways[] = {
        {"steel", Raceway::Steel}, {"pvc", Raceway::Pvc}, {"aluminum", Raceway::Aluminum}};
    CableRatings r;
    r.material = choice(p, SLOT(kMaterial), kMaterials);
    r.size = text(p, SLOT(kSize));
    r.sets = whole(p, SLOT(kSets));
    r.lengthFt = num(p, SLOT(kLengthFt));
    r.insulationC = whole(p, SLOT(kInsulationC));
    r.terminationC = whole(p, SLOT(kTerminationC));
    r.raceway = choice(p, SLOT(kRaceway), kRaceways);
    r.conductors = whole(p, SLOT(kConductors));
    r.ambientC = opt(p, SLOT(kAmbientC));
    r.egcSize = text(p, SLOT(kEgcSize));
    return r;
}

MotorRatings MotorRatings::of(const Part& p) {
    expectKind(p, PartKind::Motor);
    static constexpr std::pair<std::string_view, Rotor> kRotors[] = {
        {"squirrel_cage", Rotor::SquirrelCage},
        {"wound_rotor", Rotor::WoundRotor},
        {"synchronous", Rotor::Synchronous}};
    MotorRatings r;
    r.hp = opt(p, SLOT(kHp));
    r.kw = opt(p, SLOT(kKw));
    r.volts = num(p, SLOT(kVolts));
    r.phases = whole(p, SLOT(kPhases));
    r.fla = opt(p, SLOT(kFla));
    r.serviceFactor = num(p, SLOT(kSf));
    r.design = text(p, SLOT(kDesign));
    r.rotor = choice(p, SLOT(kRotor), kRotors);
    r.codeLetter = word(p, SLOT(kCodeLetter));
    r.lra = opt(p, SLOT(kLra));
    r.accelS = num(p, SLOT(kAccelS));
    r.stallHotS = opt(p, SLOT(kStallHotS));
    r.stallColdS = opt(p, SLOT(kStallColdS));
    r.tempRiseC = opt(p, SLOT(kTempRiseC));
    r.premiumEff = flag(p, SLOT(kPremiumEff));
    r.hardToStart = flag(p, SLOT(kHardToStart));
    return r;
}

LoadRatings LoadRatings::of(const Part& p) {
    expectKind(p, PartKind::Load);
    LoadRatings r;
    r.kva = opt(p, SLOT(kKva));
    r.kw = opt(p, SLOT(kKw));
    r.pf = num(p, SLOT(kPf));
    r.volts = num(p, SLOT(kVolts));
    r.phases = whole(p, SLOT(kPhases));
    r.continuous = flag(p, SLOT(kContinuous));
    return r;
}

std::string userCurvePoints(const Part& p) {
    const Slot s = SLOT(ProtectiveData::kCurvePoints);
    return (*s.at)[static_cast<std::size_t>(p.kind)].spec ? text(p, s) : std::string();
}

double ratedVolts(const Part& p) {
    switch (p.kind) {
    case PartKind::Source:
        return num(p, SLOT(SourceRatings::kKv)) * 1000.0;
    case PartKind::Bus:
        return num(p, SLOT(BusRatings::kVolts));
    case PartKind::Motor:
        return num(p, SLOT(MotorRatings::kVolts));
    case PartKind::Load:
        return num(p, SLOT(LoadRatings::kVolts));
    default:
        return 0.0;
    }
}

std::string_view ampereRatingKey(PartKind kind) {
    return kind == PartKind::Breaker ? BreakerRatings::kTripA : InstBreakerRatings::kAmps;
}

double ampereRatingA(const Part& device) {
    return device.kind == PartKind::Breaker ? num(device, SLOT(BreakerRatings::kTripA))
                                            : num(device, SLOT(InstBreakerRatings::kAmps));
}

std::string_view branchSettingKey(PartKind kind) {
    return kind == PartKind::InstBreaker ? InstBreakerRatings::kPickupA : ampereRatingKey(kind);
}

double branchSettingA(const Part& device) {
    return device.kind == PartKind::InstBreaker ? num(device, SLOT(InstBreakerRatings::kPickupA))
                                                : ampereRatingA(device);
}

} // namespace lineward
