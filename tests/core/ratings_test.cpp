// Typed ratings: every field of every kind has its typed reader, each key constant names a field
// of its kind, defaults are the field table's, and a corrupted value stops the reading.
#include "model/ratings.h"

#include <gtest/gtest.h>
#include <set>
#include <stdexcept>

using namespace lineward;

namespace {

// The key constants each struct declares, by kind; the test below holds them against the
// field table both ways, so a field added to a kind without a typed reader fails here.
std::set<std::string_view> declaredKeys(PartKind kind) {
    const std::set<std::string_view> protective{
        ProtectiveData::kInterruptingKa, ProtectiveData::kLetThrough, ProtectiveData::kClearS,
        ProtectiveData::kCurvePoints};
    auto with = [&](std::set<std::string_view> own) {
        own.insert(protective.begin(), protective.end());
        return own;
    };
    switch (kind) {
    case PartKind::Source:
        return {SourceRatings::kKv, SourceRatings::kFaultKa, SourceRatings::kFaultMva,
                SourceRatings::kXOverR};
    case PartKind::Transformer:
        return {TransformerRatings::kKva,    TransformerRatings::kPriV,
                TransformerRatings::kSecV,   TransformerRatings::kZPct,
                TransformerRatings::kXOverR, TransformerRatings::kTapPct};
    case PartKind::Bus:
        return {BusRatings::kType,      BusRatings::kVolts,       BusRatings::kAmps,
                BusRatings::kBracingKa, BusRatings::kPhases,      BusRatings::kAfConfig,
                BusRatings::kAfGapMm,   BusRatings::kAfWorkingMm, BusRatings::kAfHeightMm,
                BusRatings::kAfWidthMm, BusRatings::kAfDepthMm,   BusRatings::kService};
    case PartKind::Breaker:
        return with({BreakerRatings::kTripType, BreakerRatings::kConstruction,
                     BreakerRatings::kFrameA, BreakerRatings::kTripA, BreakerRatings::kInstX,
                     BreakerRatings::kLtPickupX, BreakerRatings::kLtDelayS,
                     BreakerRatings::kStPickupX, BreakerRatings::kStDelayS, BreakerRatings::kStI2t,
                     BreakerRatings::kOpen});
    case PartKind::InstBreaker:
        return with({InstBreakerRatings::kAmps, InstBreakerRatings::kPickupA,
                     InstBreakerRatings::kPickupMinA, InstBreakerRatings::kPickupMaxA,
                     InstBreakerRatings::kOpen});
    case PartKind::Fuse:
        return with({FuseRatings::kType, FuseRatings::kClass, FuseRatings::kAmps});
    case PartKind::Disconnect:
        return {DisconnectRatings::kAmps, DisconnectRatings::kHpRating, DisconnectRatings::kFused,
                DisconnectRatings::kOpen};
    case PartKind::Contactor:
        return {ContactorRatings::kNemaSize, ContactorRatings::kAc3A, ContactorRatings::kOpen};
    case PartKind::Overload:
        return {OverloadRatings::kSettingA,      OverloadRatings::kRangeMinA,
                OverloadRatings::kRangeMaxA,     OverloadRatings::kTripClass,
                OverloadRatings::kUltimateTripX, OverloadRatings::kCurvePoints};
    case PartKind::Vfd:
        return {VfdRatings::kHp, VfdRatings::kVolts, VfdRatings::kInputA, VfdRatings::kOutputA,
                VfdRatings::kMaxScpdA};
    case PartKind::SoftStarter:
        return {SoftStarterRatings::kHp,     SoftStarterRatings::kVolts,
                SoftStarterRatings::kAmps,   SoftStarterRatings::kStartLimitX,
                SoftStarterRatings::kBypass, SoftStarterRatings::kBypassA};
    case PartKind::Cable:
        return {CableRatings::kMaterial,     CableRatings::kSize,        CableRatings::kSets,
                CableRatings::kLengthFt,     CableRatings::kInsulationC, CableRatings::kRaceway,
                CableRatings::kTerminationC, CableRatings::kConductors,  CableRatings::kAmbientC,
                CableRatings::kEgcSize};
    case PartKind::Motor:
        return {MotorRatings::kHp,         MotorRatings::kKw,        MotorRatings::kVolts,
                MotorRatings::kPhases,     MotorRatings::kFla,       MotorRatings::kSf,
                MotorRatings::kDesign,     MotorRatings::kRotor,     MotorRatings::kCodeLetter,
                MotorRatings::kLra,        MotorRatings::kAccelS,    MotorRatings::kStallHotS,
                MotorRatings::kStallColdS, MotorRatings::kTempRiseC, MotorRatings::kPremiumEff,
                MotorRatings::kHardToStart};
    case PartKind::Load:
        return {LoadRatings::kKva,   LoadRatings::kKw,     LoadRatings::kPf,
                LoadRatings::kVolts, LoadRatings::kPhases, LoadRatings::kContinuous};
    }
    return {};
}

// Reads a part of any kind through its typed reader (throws where a key constant is wrong).
void readTyped(const Part& p) {
    switch (p.kind) {
    case PartKind::Source:
        SourceRatings::of(p);
        break;
    case PartKind::Transformer:
        TransformerRatings::of(p);
        break;
    case PartKind::Bus:
        BusRatings::of(p);
        break;
    case PartKind::Breaker:
        BreakerRatings::of(p);
        break;
    case PartKind::InstBreaker:
        InstBreakerRatings::of(p);
        break;
    case PartKind::Fuse:
        FuseRatings::of(p);
        break;
    case PartKind::Disconnect:
        DisconnectRatings::of(p);
        break;
    case PartKind::Contactor:
        ContactorRatings::of(p);
        break;
    case PartKind::Overload:
        OverloadRatings::of(p);
        break;
    case PartKind::Vfd:
        VfdRatings::of(p);
        break;
    case PartKind::SoftStarter:
        SoftStarterRatings::of(p);
        break;
    case PartKind::Cable:
        CableRatings::of(p);
        break;
    case PartKind::Motor:
        MotorRatings::of(p);
        break;
    case PartKind::Load:
        LoadRatings::of(p);
        break;
    }
}

} // namespace

TEST(Ratings, EveryFieldOfEveryKindHasATypedReaderAndNoMore) {
    for (int k = 0; k < kPartKindCount; ++k) {
        const auto kind = static_cast<PartKind>(k);
        std::set<std::string_view> table;
        for (const auto& f : kindInfo(kind).fields)
            table.insert(f.key);
        EXPECT_EQ(declaredKeys(kind), table) << kindInfo(kind).key;
        // Every choice word of the table has its enum (the reader throws on one it lacks).
        Part p = Part::make(kind, PartId(1), "X");
        EXPECT_NO_THROW(readTyped(p)) << kindInfo(kind).key;
        for (const auto& f : kindInfo(kind).fields)
            for (auto word : f.choices) {
                Part q = p;
                q.values[*fieldIndex(kind, f.key)] = std::string(word);
                EXPECT_NO_THROW(readTyped(q)) << kindInfo(kind).key << " " << f.key << " " << word;
            }
    }
}

TEST(Ratings, DefaultsAreTheFieldTablesAndAClearedRatingReadsItsDefault) {
    Part m = Part::make(PartKind::Motor, PartId(1), "M-1");
    const auto* sf = findField(PartKind::Motor, MotorRatings::kSf);
    ASSERT_TRUE(sf);
    EXPECT_EQ(MotorRatings::of(m).serviceFactor, std::get<double>(sf->defaultValue));
    m.values[*fieldIndex(PartKind::Motor, MotorRatings::kSf)] = FieldValue{}; // blank, as cleared
    EXPECT_EQ(MotorRatings::of(m).serviceFactor, std::get<double>(sf->defaultValue));
    Part load = Part::make(PartKind::Load, PartId(2), "LD-1");
    load.values[*fieldIndex(PartKind::Load, LoadRatings::kPf)] = FieldValue{};
    EXPECT_EQ(LoadRatings::of(load).pf,
              std::get<double>(findField(PartKind::Load, LoadRatings::kPf)->defaultValue));
    Part cable = Part::make(PartKind::Cable, PartId(3), "C-1");
    cable.values[*fieldIndex(PartKind::Cable, CableRatings::kRaceway)] = FieldValue{};
    EXPECT_EQ(CableRatings::of(cable).raceway, Raceway::Steel); // the table's "steel"
}

TEST(Ratings, AValueOfTheWrongTypeOrAPartOfAnotherKindStopsTheReading) {
    Part m = Part::make(PartKind::Motor, PartId(1), "M-1");
    m.values[*fieldIndex(PartKind::Motor, MotorRatings::kSf)] = std::string("1.15");
    EXPECT_THROW(MotorRatings::of(m), std::logic_error);
    EXPECT_THROW(CableRatings::of(Part::make(PartKind::Motor, PartId(2), "M-2")), std::logic_error);
}

TEST(Ratings, DeviceRatingKeysNameTheFieldAFixChanges) {
    EXPECT_EQ(ampereRatingKey(PartKind::Breaker), "trip_a");
    EXPECT_EQ(ampereRatingKey(PartKind::Fuse), "amps");
    EXPECT_EQ(branchSettingKey(PartKind::InstBreaker), "pickup_a");
    for (auto kind :
         {PartKind::Breaker, PartKind::InstBreaker, PartKind::Fuse, PartKind::Disconnect}) {
        EXPECT_TRUE(findField(kind, ampereRatingKey(kind))) << kindInfo(kind).key;
        EXPECT_TRUE(findField(kind, branchSettingKey(kind))) << kindInfo(kind).key;
    }
    Part cb = Part::make(PartKind::Breaker, PartId(1), "CB-1");
    ASSERT_FALSE(cb.set(BreakerRatings::kTripA, 70.0));
    EXPECT_EQ(ampereRatingA(cb), 70.0);
    Part mcp = Part::make(PartKind::InstBreaker, PartId(2), "MCP-1");
    ASSERT_FALSE(mcp.set(InstBreakerRatings::kPickupA, 350.0));
    EXPECT_EQ(branchSettingA(mcp), 350.0);
}
