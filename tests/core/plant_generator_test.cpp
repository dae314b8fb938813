// The generated plants behind the benchmarks are realistic: they check clean and round-trip.
#include "check/check.h"
#include "io/drawing_file.h"
#include "plant_generator.h"
#include "test_support.h"

#include <gtest/gtest.h>

using namespace lineward;

TEST(PlantGenerator, ChecksCleanAndRoundTrips) {
    const Drawing d = bench::makePlant(2000);
    EXPECT_GE(d.parts().size(), 2000u);
    EXPECT_LT(d.parts().size(), 2100u);
    // Clean but for the notes that generic thermal-magnetic pairs are undecided at the
    // listing limits (a plant of generic curves has them by design).
    for (const auto& f : checkDrawing(d, test::testTables()).findings)
        if (f.ruleId != "curve.selectivity.listing" || f.severity != Severity::Note)
            ADD_FAILURE() << f.ruleId << ": " << f.message;
    const std::string text = io::serializeDrawing(d);
    auto back = io::parseDrawing(text);
    ASSERT_TRUE(back) << back.error->text();
    EXPECT_EQ(io::serializeDrawing(*back.drawing), text);
}
