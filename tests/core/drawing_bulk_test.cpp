// Bulk edits of a Drawing give the same drawing as the same edits one at a time.
#include "test_support.h"

#include <gtest/gtest.h>

using namespace lineward;

TEST(DrawingBulk, RemoveAndAddBackGiveTheSameDrawingAsOneByOne) {
    const Drawing original = test::smallLineup(); // 5 breaker, 6 contactor in bucket, 9 motor
    Drawing bulk = original, single = original;
    const std::vector<PartId> ids{PartId(9), PartId(5), PartId(6)};
    const std::vector<Bucket> bucketsBefore = original.buckets();
    std::vector<Wire> wiresBefore;
    for (const auto& w : original.wires())
        if (w.a.part == PartId(5) || w.b.part == PartId(5) || w.a.part == PartId(6) ||
            w.b.part == PartId(6) || w.a.part == PartId(9) || w.b.part == PartId(9))
            wiresBefore.push_back(w);

    const auto removed = bulk.removeParts(ids);
    for (auto id : ids)
        single.removePart(id);
    EXPECT_EQ(bulk, single);
    ASSERT_EQ(removed.size(), 3u);
    EXPECT_EQ(removed[0].id, PartId(5)); // id order
    EXPECT_EQ(bulk.part(PartId(9)), nullptr);
    EXPECT_EQ(bulk.bucketOf(PartId(7))->parts, std::vector<PartId>{PartId(7)});
    EXPECT_EQ(bulk.wires().size(), original.wires().size() - wiresBefore.size());

    bulk.addParts(removed);
    bulk.addWires(wiresBefore);
    EXPECT_EQ(bulk.updateBuckets(bucketsBefore), 1u);
    EXPECT_EQ(bulk, original);
    EXPECT_EQ(bulk.part(PartId(6))->tag, "K-1");
    EXPECT_EQ(bulk.bucketOf(PartId(5))->tag, "MCC-1A");
}

TEST(DrawingBulk, RefusesUsedIdsBeforeChangingAnything) {
    Drawing d = test::smallLineup();
    const Drawing before = d;
    Part fresh = Part::make(PartKind::Motor, PartId(40), "M-40");
    Part clash = Part::make(PartKind::Motor, PartId(3), "M-3");
    EXPECT_THROW(d.addParts({fresh, clash}), std::invalid_argument);
    EXPECT_THROW(d.addParts({fresh, fresh}), std::invalid_argument);
    EXPECT_THROW(d.addWires({d.wires().front()}), std::invalid_argument);
    EXPECT_EQ(d, before);
    d.addParts({fresh});
    EXPECT_EQ(d.nextPartId(), PartId(41));
    EXPECT_EQ(d.part(PartId(40))->tag, "M-40");
    EXPECT_TRUE(d.removeWires({WireId(999)}).empty());
}
