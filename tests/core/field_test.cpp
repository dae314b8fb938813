// Rating validation: bad values are refused with a reason and never clamped.
#include "model/conductor.h"
#include "model/part.h"

#include <cmath>
#include <gtest/gtest.h>
#include <limits>

using namespace lineward;

TEST(Fields, RefusesNanInfinityNegativeZeroAndHugeWithReasons) {
    Part m = Part::make(PartKind::Motor, PartId(1), "M");
    ASSERT_FALSE(m.set("volts", 460.0));
    const Part before = m;
    auto why = m.set("fla", std::numeric_limits<double>::quiet_NaN());
    ASSERT_TRUE(why);
    EXPECT_NE(why->find("not a number"), std::string::npos);
    why = m.set("fla", std::numeric_limits<double>::infinity());
    ASSERT_TRUE(why);
    EXPECT_NE(why->find("infinite"), std::string::npos);
    why = m.set("fla", -3.0);
    ASSERT_TRUE(why);
    EXPECT_NE(why->find("below the smallest accepted value 0.1 A"), std::string::npos);
    why = m.set("fla", 0.0);
    ASSERT_TRUE(why);
    why = m.set("fla", 1e9);
    ASSERT_TRUE(why);
    EXPECT_NE(why->find("above the largest accepted value 5000 A"), std::string::npos) << *why;
    why = m.set("design", std::string("Z"));
    ASSERT_TRUE(why);
    EXPECT_NE(why->find("not one of"), std::string::npos);
    why = m.set("nonexistent", 1.0);
    ASSERT_TRUE(why);
    EXPECT_EQ(m, before); // nothing applied, nothing clamped
}

TEST(Fields, CrossFieldRulesRefuseInconsistentParts) {
    Part ol = Part::make(PartKind::Overload, PartId(1), "OL");
    ASSERT_FALSE(ol.set("setting_a", 20.0));
    ASSERT_FALSE(ol.set("range_max_a", 25.0));
    auto why = ol.set("setting_a", 30.0); // above its own range
    ASSERT_TRUE(why);
    EXPECT_NE(why->find("setting_a 30 is above range_max_a 25"), std::string::npos) << *why;
    EXPECT_EQ(*ol.number("setting_a"), 20.0);

    Part cb = Part::make(PartKind::Breaker, PartId(2), "CB");
    ASSERT_FALSE(cb.set("frame_a", 100.0));
    EXPECT_TRUE(cb.set("trip_a", 125.0));

    Part c = Part::make(PartKind::Cable, PartId(3), "C");
    EXPECT_TRUE(c.set("insulation_c", 70.0));
    EXPECT_FALSE(c.set("insulation_c", 75.0));
    EXPECT_TRUE(c.set("sets", 1.5)); // whole numbers only
}

TEST(Conductors, SizeNamesAndAreas) {
    EXPECT_TRUE(isKnownConductorSize("8 AWG"));
    EXPECT_TRUE(isKnownConductorSize("4/0 AWG"));
    EXPECT_TRUE(isKnownConductorSize("500 kcmil"));
    EXPECT_TRUE(isKnownConductorSize("16 mm2"));
    EXPECT_FALSE(isKnownConductorSize("7 AWG"));
    // NEC 2023 Chapter 9 Table 8: 8 AWG = 16,510 cmil = 8.367 mm²; 4/0 = 211,600 cmil = 107.2 mm².
    EXPECT_NEAR(*conductorAreaMm2("8 AWG"), 8.367, 0.01);
    EXPECT_NEAR(*conductorAreaMm2("4/0 AWG"), 107.2, 0.1);
    EXPECT_NEAR(*conductorAreaMm2("250 kcmil"), 126.7, 0.1);
    EXPECT_DOUBLE_EQ(*conductorAreaMm2("16 mm2"), 16.0);
}
