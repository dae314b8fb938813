// Arc-flash label content: one label per bus and bucket with the study's own numbers, the shock
// approach boundaries of NFPA 70E Table 130.4(E)(a) by voltage, and the NEC 110.16(B) block on
// service equipment only.
#include "check/check.h"
#include "curves/arc_flash_study.h"
#include "io/drawing_file.h"
#include "model/ratings.h"
#include "report/arc_flash_labels.h"
#include "test_support.h"

#include <algorithm>
#include <cmath>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::test;

namespace {

struct ApproachCase {
    double volts;
    const char *movable, *fixed, *restricted;
    const char* source;
};

class ApproachBoundaries : public ::testing::TestWithParam<ApproachCase> {};

TEST_P(ApproachBoundaries, MatchTheTableRowForTheVoltage) {
    const auto& c = GetParam();
    const ApproachRow* row = testTables().approachFor(c.volts);
    ASSERT_NE(row, nullptr) << c.source;
    EXPECT_EQ(row->limitedMovable, c.movable) << c.source;
    EXPECT_EQ(row->limitedFixed, c.fixed) << c.source;
    EXPECT_EQ(row->restricted, c.restricted) << c.source;
}

// NFPA 70E 2024 Table 130.4(E)(a), from memory (see the CSV's source line).
INSTANTIATE_TEST_SUITE_P(
    Nfpa70e2024Table130_4Ea, ApproachBoundaries,
    ::testing::Values(
        ApproachCase{480, "3.0 m (10 ft 0 in)", "1.0 m (3 ft 6 in)", "0.3 m (1 ft 0 in)",
                     "NFPA 70E 2024 Table 130.4(E)(a), 151 V-750 V row (from memory)"},
        ApproachCase{208, "3.0 m (10 ft 0 in)", "1.0 m (3 ft 6 in)", "0.3 m (1 ft 0 in)",
                     "NFPA 70E 2024 Table 130.4(E)(a), 151 V-750 V row (from memory)"},
        ApproachCase{120, "3.0 m (10 ft 0 in)", "1.0 m (3 ft 6 in)", "avoid contact",
                     "NFPA 70E 2024 Table 130.4(E)(a), 50 V-150 V row (from memory)"},
        ApproachCase{4160, "3.0 m (10 ft 0 in)", "1.5 m (5 ft 0 in)", "0.7 m (2 ft 2 in)",
                     "NFPA 70E 2024 Table 130.4(E)(a), 751 V-15 kV row (from memory)"},
        ApproachCase{13800, "3.0 m (10 ft 0 in)", "1.5 m (5 ft 0 in)", "0.7 m (2 ft 2 in)",
                     "NFPA 70E 2024 Table 130.4(E)(a), 751 V-15 kV row (from memory)"},
        ApproachCase{150.5, "3.0 m (10 ft 0 in)", "1.0 m (3 ft 6 in)", "0.3 m (1 ft 0 in)",
                     "between the 150 V and 151 V rows: the higher row (conservative)"}));

TEST(ApproachTable, NoRowAboveTheTable) {
    EXPECT_EQ(testTables().approachFor(40000), nullptr); // the table's ac rows stop at 36 kV here
    EXPECT_EQ(testTables().approachFor(std::nan("")), nullptr);
}

std::shared_ptr<const CheckResult> checkedSample(const char* name) {
    auto loaded = io::loadDrawing(sourcePath(std::string("samples/") + name));
    EXPECT_TRUE(loaded) << loaded.error->text();
    return runCheck(*loaded.drawing, testTables());
}

} // namespace

TEST(ArcFlashLabels, OnePerBusAndBucketWithTheStudysNumbers) {
    const auto r = checkedSample("kestrel-mill-mcc1.lineward");
    ASSERT_TRUE(r->arcFlash);
    const auto labels = arcFlashLabels(*r, "2026-12-03");
    ASSERT_EQ(labels.size(), r->arcFlash->size());
    std::size_t buckets = 0;
    for (std::size_t i = 0; i < labels.size(); ++i) {
        const auto& l = labels[i];
        const auto& e = (*r->arcFlash)[i];
        SCOPED_TRACE(l.tag);
        EXPECT_EQ(l.tag, e.tag);
        EXPECT_EQ(l.date, "2026-12-03");
        ASSERT_EQ(l.computed, e.energyCal().has_value());
        if (l.computed) {
            EXPECT_DOUBLE_EQ(l.energyCal, *e.energyCal());
            EXPECT_NEAR(l.energyJ, l.energyCal * 4.184, 1e-9); // 1 cal = 4.184 J
            EXPECT_DOUBLE_EQ(l.boundaryMm, *e.boundaryMm());
            EXPECT_DOUBLE_EQ(l.workingDistanceMm, e.input.workingDistanceMm);
        }
        EXPECT_TRUE(l.approachKnown);
        if (e.bucket) {
            ++buckets;
            EXPECT_EQ(l.equipment, "MCC bucket on MCC-1");
        }
    }
    // Every bucket of the drawing has its label (the sample's buckets all sit on MCC-1).
    EXPECT_EQ(buckets, r->drawing->buckets().size());
}

TEST(ArcFlashLabels, ServiceBlockOnlyOnServiceEquipment) {
    const auto r = checkedSample("kestrel-mill-mcc1.lineward");
    const auto labels = arcFlashLabels(*r, "2026-12-03");
    int service = 0;
    for (const auto& l : labels) {
        const Part* bus = r->drawing->part(l.part);
        ASSERT_NE(bus, nullptr);
        const bool isService = !l.bucket && BusRatings::of(*bus).service;
        EXPECT_EQ(l.service.has_value(), isService) << l.tag;
        if (!l.service)
            continue;
        ++service;
        // NEC 2023 110.16(B): nominal voltage, available fault current at the service
        // equipment, clearing time of the service overcurrent device at it, and the date.
        const auto& e = *std::find_if(r->arcFlash->begin(), r->arcFlash->end(),
                                      [&](const ArcFlashEquipment& x) { return x.tag == l.tag; });
        EXPECT_EQ(l.tag, "SWBD-1");
        EXPECT_DOUBLE_EQ(l.service->nominalV, 480);
        ASSERT_TRUE(l.service->availableFaultKa);
        EXPECT_DOUBLE_EQ(*l.service->availableFaultKa, e.input.ibfKa);
        EXPECT_EQ(l.service->deviceTag, "CB-MAIN");
        ASSERT_TRUE(l.service->clearingS);
        EXPECT_DOUBLE_EQ(*l.service->clearingS, *e.tBoltedS);
        // The bolted current is above the arcing current: the device clears it no slower.
        EXPECT_LE(*l.service->clearingS, e.tFullS + 1e-12);
        EXPECT_EQ(l.service->date, "2026-12-03");
    }
    EXPECT_EQ(service, 1);
}

TEST(ArcFlashLabels, OutsideTheModelStillGetsALabelThatSaysWhy) {
    auto loaded = io::loadDrawing(sourcePath("samples/kestrel-mill-mcc1.lineward"));
    ASSERT_TRUE(loaded);
    Drawing d = *loaded.drawing;
    Part* mcc = nullptr;
    for (const auto& p : d.parts())
        if (p.tag == "MCC-1")
            mcc = d.part(p.id);
    ASSERT_NE(mcc, nullptr);
    ASSERT_FALSE(mcc->set(BusRatings::kAfGapMm, 150.0)); // > 76.2 mm at 480 V (IEEE 1584 4.2)
    const auto r = runCheck(d, testTables());
    const auto labels = arcFlashLabels(*r, "2026-12-03");
    const auto it = std::find_if(labels.begin(), labels.end(),
                                 [](const ArcFlashLabel& l) { return l.tag == "MCC-1"; });
    ASSERT_NE(it, labels.end());
    EXPECT_FALSE(it->computed);
    EXPECT_NE(it->notComputedWhy.find("6.35 to 76.2 mm"), std::string::npos) << it->notComputedWhy;
}

TEST(ArcFlashLabels, LengthsInMillimetresAndFeet) {
    EXPECT_EQ(labelLength(609.6), "610 mm (2 ft 0 in)"); // 24 in
    EXPECT_EQ(labelLength(457.2), "457 mm (1 ft 6 in)"); // 18 in
    EXPECT_EQ(labelLength(1540), "1540 mm (5 ft 1 in)"); // 60.6 in rounds to 61 in
}
