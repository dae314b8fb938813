// The Add Bucket preview in core: every value of a proposed bucket with what set it, a changed
// value checked by the part's own validation, and the findings of the drawing with the bucket.
#include "check/check.h"
#include "io/drawing_file.h"
#include "lineup/bucket_preview.h"
#include "model/ratings.h"
#include "test_support.h"

#include <algorithm>
#include <gtest/gtest.h>

using namespace lineward;
using lineward::test::sourcePath;
using lineward::test::testTables;

namespace {

struct Sample {
    Drawing d;
    PartId mcc;
    BucketPlan plan;
};

// A 20 hp, 460 V motor with a nameplate FLA on the sample's MCC bus, fused.
Sample sampleWithPlan() {
    auto loaded = io::loadDrawing(sourcePath("samples/kestrel-mill-mcc1.lineward"));
    EXPECT_TRUE(loaded);
    Sample s{*loaded.drawing, {}, {}};
    s.mcc = s.d.partByTag("MCC-1")->id;
    const auto list = readLoadList("tag,hp,volts,fla,protection\nP-150,20,460,25,fuse\n");
    EXPECT_TRUE(list.ok());
    s.plan = planBuckets(s.d, s.mcc, list.rows, 65, testTables());
    EXPECT_EQ(s.plan.buckets.size(), 1u);
    return s;
}

std::size_t indexOf(const PlannedBucket& b, const std::string& tag) {
    for (std::size_t i = 0; i < b.parts.size(); ++i)
        if (b.parts[i].tag == tag)
            return i;
    ADD_FAILURE() << "no part " << tag;
    return 0;
}

const BucketField* fieldOf(const std::vector<BucketField>& fields, std::size_t part,
                           const std::string& key) {
    for (const auto& f : fields)
        if (f.partIndex == part && f.key == key)
            return &f;
    return nullptr;
}

} // namespace

TEST(BucketPreview, EveryValueOfEveryPartIsListedWithWhatSetIt) {
    const auto s = sampleWithPlan();
    const PlannedBucket& b = s.plan.buckets[0];
    const auto fields = bucketFields(b);
    std::size_t valued = 0;
    for (const auto& p : b.parts)
        for (const auto& v : p.values)
            valued += std::holds_alternative<std::monostate>(v) ? 0 : 1;
    EXPECT_EQ(fields.size(), valued);
    for (const auto& f : fields)
        EXPECT_FALSE(f.basis.empty()) << b.parts[f.partIndex].tag << " " << f.key;
    const auto* fuse = fieldOf(fields, indexOf(b, "FU-P-150"), "amps");
    ASSERT_NE(fuse, nullptr);
    EXPECT_NE(fuse->basis.find("Table 430.52(C)(1)"), std::string::npos) << fuse->basis;
    const auto* size = fieldOf(fields, indexOf(b, "C-P-150"), "size");
    ASSERT_NE(size, nullptr);
    EXPECT_NE(size->basis.find("430.22"), std::string::npos) << size->basis;
    const auto* setting = fieldOf(fields, indexOf(b, "OL-P-150"), "setting_a");
    ASSERT_NE(setting, nullptr);
    EXPECT_NE(setting->basis.find("430.32(A)(1)"), std::string::npos) << setting->basis;
    const auto* rk5 = fieldOf(fields, indexOf(b, "FU-P-150"), "interrupting_ka");
    ASSERT_NE(rk5, nullptr);
    EXPECT_NE(rk5->basis.find("UL 248-12"), std::string::npos) << rk5->basis;
}

TEST(BucketPreview, AChangeIsValidatedAsTheInspectorDoesAndMarked) {
    auto s = sampleWithPlan();
    PlannedBucket& b = s.plan.buckets[0];
    const std::size_t ol = indexOf(b, "OL-P-150");
    const Part before = b.parts[ol];
    // Negative, and outside the relay's adjustment range: refused, with the rating named.
    auto why = changeBucketValue(b, ol, "setting_a", -4.0);
    ASSERT_TRUE(why);
    EXPECT_NE(why->find("Setting (A)"), std::string::npos) << *why;
    EXPECT_TRUE(changeBucketValue(b, ol, "setting_a", 1000.0));
    EXPECT_EQ(b.parts[ol], before);
    EXPECT_TRUE(b.changed.empty());
    EXPECT_TRUE(changeBucketValue(b, ol, "no_such_rating", 1.0));

    const std::size_t cable = indexOf(b, "C-P-150");
    EXPECT_FALSE(changeBucketValue(b, cable, "length_ft", 140.0));
    EXPECT_EQ(CableRatings::of(b.parts[cable]).lengthFt, 140);
    const auto fields = bucketFields(b);
    EXPECT_EQ(fieldOf(fields, cable, "length_ft")->basis, "changed by the designer");
    EXPECT_NE(fieldOf(fields, cable, "size")->basis, "changed by the designer");
    // The plan placed is the changed one.
    EXPECT_EQ(CableRatings::of(s.plan.allParts()[cable]).lengthFt, 140);
}

TEST(BucketPreview, FindingsAreThoseTheBucketWouldCause) {
    auto s = sampleWithPlan();
    const auto before = runCheck(s.d, testTables());
    // As sized: no violation with it on the sample's bus (430.22, 430.52 and the rest hold);
    // cautions may remain (the fuse's let-through is assumed, duty.withstand.assumed).
    const auto asSized = findingsWithPlan(s.d, s.plan, s.mcc, before->report, testTables());
    for (const auto& f : asSized)
        EXPECT_NE(f.severity, Severity::Violation) << f.ruleId << ": " << f.message;
    // A 14 AWG copper branch for a 20 hp, 460 V motor (FLC 27 A, NEC 2023 Table 430.250):
    // 1.25 × 27 = 33.75 A exceeds 14 AWG's 20 A at 75 °C (Table 310.16) — 430.22 fails.
    PlannedBucket& b = s.plan.buckets[0];
    ASSERT_FALSE(changeBucketValue(b, indexOf(b, "C-P-150"), "size", std::string("14 AWG")));
    const auto found = findingsWithPlan(s.d, s.plan, s.mcc, before->report, testTables());
    const bool ampacity = std::any_of(found.begin(), found.end(), [](const Finding& f) {
        return f.ruleId == "branch.conductor.ampacity";
    });
    EXPECT_TRUE(ampacity);
    // Only findings that name the new bucket's parts (or new ones on its bus) are listed.
    for (const auto& f : found) {
        const bool ours = std::any_of(f.parts.begin(), f.parts.end(), [&](PartId id) {
            return id == s.mcc || id.value >= s.d.nextPartId().value;
        });
        EXPECT_TRUE(ours) << f.ruleId;
    }
}
