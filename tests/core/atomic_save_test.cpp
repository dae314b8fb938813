// Saving keeps what the user had: a symlink's target is written (the link stays), the file's
// permissions carry over, no temporary outlives a save, stale ones are cleaned, long names save.
#include "io/drawing_file.h"
#include "test_support.h"

#include <filesystem>
#include <gtest/gtest.h>
#include <sys/stat.h>
#include <utime.h>

using namespace lineward;
using namespace lineward::test;
namespace fs = std::filesystem;

namespace {

fs::path freshDir(const char* name) {
    const auto dir = fs::temp_directory_path() / name;
    fs::remove_all(dir);
    fs::create_directories(dir);
    return dir;
}

int regularFiles(const fs::path& dir) {
    int n = 0;
    for (const auto& e : fs::directory_iterator(dir))
        n += e.is_regular_file() && !e.is_symlink();
    return n;
}

mode_t modeOf(const fs::path& p) {
    struct stat st {};
    ::stat(p.c_str(), &st);
    return st.st_mode & 07777;
}

} // namespace

TEST(AtomicSave, ThroughASymlinkWritesItsTargetAndKeepsTheLink) {
    const auto dir = freshDir("lineward-save-link");
    fs::create_directories(dir / "real");
    const auto target = dir / "real" / "plant.lineward";
    ASSERT_FALSE(io::writeFileAtomic(target, "old\n"));
    fs::create_symlink("real/plant.lineward", dir / "link.lineward");
    const Drawing d = smallLineup();
    ASSERT_FALSE(io::saveDrawing(d, dir / "link.lineward"));
    EXPECT_TRUE(fs::is_symlink(dir / "link.lineward"));
    EXPECT_EQ(readFile(target.string()), io::serializeDrawing(d));
    EXPECT_EQ(regularFiles(dir), 0); // nothing written beside the link
    EXPECT_EQ(regularFiles(dir / "real"), 1);
    fs::remove_all(dir);
}

TEST(AtomicSave, KeepsTheFilesPermissions) {
    const auto dir = freshDir("lineward-save-mode");
    const auto path = dir / "plant.lineward";
    ASSERT_FALSE(io::writeFileAtomic(path, "old\n"));
    ASSERT_EQ(::chmod(path.c_str(), 0640), 0);
    ASSERT_FALSE(io::writeFileAtomic(path, "new\n"));
    EXPECT_EQ(modeOf(path), 0640u);
    ASSERT_EQ(::chmod(path.c_str(), 0600), 0);
    ASSERT_FALSE(io::writeFileAtomic(path, "newer\n"));
    EXPECT_EQ(modeOf(path), 0600u);
    EXPECT_EQ(readFile(path.string()), "newer\n");
    // A new file gets the usual mode for the user's umask, not mkstemp's 0600.
    const mode_t mask = ::umask(022);
    ASSERT_FALSE(io::writeFileAtomic(dir / "new.lineward", "x"));
    ::umask(mask);
    EXPECT_EQ(modeOf(dir / "new.lineward"), 0644u);
    fs::remove_all(dir);
}

TEST(AtomicSave, LongFileNamesSave) {
    // 250 bytes: the longest names a folder allows (255) still save; the temporary's name
    // is cut to fit instead of failing with "File name too long".
    const auto dir = freshDir("lineward-save-long");
    const std::string name = std::string(241, 'n') + ".lineward";
    ASSERT_EQ(name.size(), 250u);
    ASSERT_FALSE(io::writeFileAtomic(dir / name, "long\n"));
    EXPECT_EQ(readFile((dir / name).string()), "long\n");
    EXPECT_EQ(regularFiles(dir), 1);
    fs::remove_all(dir);
}

TEST(AtomicSave, StaleTemporariesOfOurPatternAreCleaned) {
    const auto dir = freshDir("lineward-save-stale");
    const auto stale = dir / ".plant.lineward.saving-Ab12Cd";
    const auto young = dir / ".plant.lineward.saving-Zz99Yy";
    const auto other = dir / ".plant.lineward.saving-notours";
    for (const auto& p : {stale, young, other})
        ASSERT_FALSE(io::writeFileAtomic(p, "partial"));
    const utimbuf hourAgo{::time(nullptr) - 3600, ::time(nullptr) - 3600};
    ASSERT_EQ(::utime(stale.c_str(), &hourAgo), 0);
    ASSERT_EQ(::utime(other.c_str(), &hourAgo), 0);
    ASSERT_FALSE(io::writeFileAtomic(dir / "plant.lineward", "saved\n"));
    EXPECT_FALSE(fs::exists(stale));
    EXPECT_TRUE(fs::exists(young)) << "a save younger than a minute may still be writing";
    EXPECT_TRUE(fs::exists(other)) << "only our own pattern is removed";
    fs::remove_all(dir);
}

TEST(AtomicSave, AFailedSaveLeavesNoTemporary) {
    const auto dir = freshDir("lineward-save-fail");
    fs::create_directories(dir / "taken.lineward" / "inside"); // rename onto a full folder fails
    EXPECT_TRUE(io::writeFileAtomic(dir / "taken.lineward", "x").has_value());
    EXPECT_EQ(regularFiles(dir), 0);
    fs::remove_all(dir);
}
