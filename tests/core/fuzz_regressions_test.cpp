// Replays every input the fuzzer ever found (tests/fuzz/regressions/) and the hand-made
// hostile files (tests/data/hostile/) with the fuzz target's own property: a drawing that
// round-trips and checks to finite numbers, or a located, non-empty, bounded message.
#include "check/check.h"
#include "io/drawing_file.h"
#include "test_support.h"

#include <cmath>
#include <filesystem>
#include <gtest/gtest.h>

using namespace lineward;

namespace {

std::vector<std::filesystem::path> inputs() {
    std::vector<std::filesystem::path> out;
    for (const char* dir : {"tests/fuzz/regressions", "tests/data/hostile"})
        for (const auto& e : std::filesystem::directory_iterator(test::sourcePath(dir)))
            if (e.is_regular_file() && e.path().filename() != "README.md")
                out.push_back(e.path());
    std::sort(out.begin(), out.end());
    return out;
}

} // namespace

TEST(FuzzRegressions, EveryStoredInputLoadsOrIsRefusedCleanly) {
    const auto files = inputs();
    ASSERT_GE(files.size(), 7u);
    for (const auto& path : files) {
        SCOPED_TRACE(path.filename().string());
        auto r = io::loadDrawing(path);
        if (!r) {
            EXPECT_FALSE(r.error->message.empty());
            EXPECT_LT(r.error->message.size(), 400u);
            continue;
        }
        const std::string once = io::serializeDrawing(*r.drawing);
        auto again = io::parseDrawing(once);
        ASSERT_TRUE(again);
        EXPECT_EQ(io::serializeDrawing(*again.drawing), once);
        for (const auto& f : checkDrawing(*r.drawing, test::testTables()).findings) {
            EXPECT_TRUE(!f.computed || std::isfinite(*f.computed)) << f.ruleId;
            EXPECT_TRUE(!f.limit || std::isfinite(*f.limit)) << f.ruleId;
        }
    }
}
