// Bucket templates in core: a bucket's fragment holds its devices, cable and motor wired as
// drawn; its row keeps the motor whole, and planning that row sizes the bucket again for the
// bus it goes on (here a 208 V bus, where the sample's 460 V motor becomes a 200 V motor).
#include "check/check.h"
#include "io/drawing_file.h"
#include "lineup/bucket_template.h"
#include "lineup/lineup_builder.h"
#include "model/ratings.h"
#include "test_support.h"

#include <gtest/gtest.h>

using namespace lineward;
using lineward::test::sourcePath;
using lineward::test::testTables;

namespace {
Drawing sample() {
    auto loaded = io::loadDrawing(sourcePath("samples/kestrel-mill-mcc1.lineward"));
    EXPECT_TRUE(loaded);
    return *loaded.drawing;
}
} // namespace

TEST(BucketTemplate, FragmentHoldsTheBucketItsCableAndMotorAndReadsBack) {
    const Drawing d = sample();
    const Bucket* b = d.bucketOf(d.partByTag("CB-104")->id);
    ASSERT_NE(b, nullptr);
    std::string why;
    const auto fragment = bucketFragment(d, b->id, why);
    ASSERT_TRUE(fragment) << why;
    for (const char* tag : {"CB-104", "K-104", "OL-104", "C-104", "CV-104"})
        EXPECT_NE(fragment->partByTag(tag), nullptr) << tag;
    EXPECT_EQ(fragment->parts().size(), 5u); // not the bus, not a neighbour's parts
    EXPECT_EQ(fragment->wires().size(), 4u); // the chain; the bus wire is left behind
    // Written and read back as a .lineward file.
    const auto back = io::parseDrawing(io::serializeDrawing(*fragment));
    ASSERT_TRUE(back) << back.error->text();
    EXPECT_EQ(*back.drawing, *fragment);

    const auto row = templateRow(*back.drawing, why);
    ASSERT_TRUE(row) << why;
    EXPECT_EQ(row->protection, LoadProtection::Breaker);
    EXPECT_EQ(row->lengthFt, CableRatings::of(*d.partByTag("C-104")).lengthFt);
    EXPECT_EQ(row->motor, *d.partByTag("CV-104"));
}

TEST(BucketTemplate, ABucketWithoutAMotorIsRefused) {
    Drawing d = sample();
    const Part* ds = d.partByTag("DS-103");
    const Part* fu = d.partByTag("FU-103");
    Bucket lone;
    lone.id = d.nextBucketId();
    lone.tag = "LONE";
    // A bucket of a fuse alone, its wires removed: nothing below it.
    Drawing bare;
    bare.addParts({*ds, *fu});
    lone.parts = {ds->id, fu->id};
    bare.addBucket(lone);
    std::string why;
    EXPECT_FALSE(bucketFragment(bare, lone.id, why));
    EXPECT_NE(why.find("exactly one motor"), std::string::npos) << why;
    EXPECT_FALSE(templateRow(bare, why));
}

TEST(BucketTemplate, InsertedOnAnotherBusTheBucketIsSizedForIt) {
    const Drawing d = sample();
    std::string why;
    const auto fragment = bucketFragment(d, d.bucketOf(d.partByTag("CB-107")->id)->id, why);
    ASSERT_TRUE(fragment) << why;
    auto row = templateRow(*fragment, why);
    ASSERT_TRUE(row) << why;
    // The same motor at 200 V (what the window gives a 208 V bus): FLC from NEC 2023 Table
    // 430.250, so the branch is larger than at 460 V.
    Part at200 = row->motor;
    ASSERT_FALSE(at200.set({{MotorRatings::kVolts, 200.0},
                            {MotorRatings::kFla, FieldValue{}},
                            {"lra", FieldValue{}}}));
    row->motor = at200;
    row->motor.tag = "M-900";
    const PartId mcc = d.partByTag("MCC-1")->id;
    const auto plan = planBuckets(d, mcc, {*row}, 65, testTables());
    ASSERT_EQ(plan.buckets.size(), 1u) << (plan.refused.empty() ? "" : plan.refused[0].reason);
    const auto& p = plan.buckets[0].proposal;
    SizeOptions o;
    o.ambientC = d.settings.ambientC;
    o.asymmetryFactor = d.settings.asymmetryFactor;
    const auto expected = proposeBucket(row->motor, o, testTables(), why);
    ASSERT_TRUE(expected) << why;
    EXPECT_EQ(p.conductorSize, expected->conductorSize);
    EXPECT_NE(p.conductorSize, CableRatings::of(*d.partByTag("C-107")).size)
        << "a 200 V motor draws 2.3 times the 460 V current (Table 430.250)";
}
