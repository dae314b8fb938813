// Atomic replacement of a file: write beside it, flush to disk, rename over it, flush the folder.
// Keeps what the user had: a symlink stays a link (its target is replaced), and the file's
// permissions, owner and group carry over.
#include "io/drawing_file.h"

#include <cerrno>
#include <chrono>
#include <cstring>
#include <dirent.h>
#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>

namespace lineward::io {

namespace {

namespace fs = std::filesystem;

constexpr std::string_view kTempMarker = ".saving-";
constexpr std::size_t kTempSuffix = 6; // mkstemp's XXXXXX

// The file a save must replace: `path`, or the end of the chain of symlinks it starts.
fs::path saveTarget(fs::path path) {
    for (int hop = 0; hop < 40; ++hop) {
        std::error_code ec;
        if (!fs::is_symlink(fs::symlink_status(path, ec)))
            return path;
        fs::path next = fs::read_symlink(path, ec);
        if (ec)
            return path;
        path = next.is_absolute() ? next : path.parent_path() / next;
    }
    return path; // a loop of links: the rename below reports it
}

std::string errnoText() {
    return std::strerror(errno);
}

// ".name.saving-" cut so that it plus mkstemp's six characters fit the folder's name limit.
std::string tempPrefix(const fs::path& dir, const std::string& name) {
    long max = ::pathconf(dir.c_str(), _PC_NAME_MAX);
    if (max <= 0)
        max = 255;
    const std::size_t room = static_cast<std::size_t>(max) - 1 - kTempMarker.size() - kTempSuffix;
    return "." + name.substr(0, room) + std::string(kTempMarker);
}

// Removes temporaries of this file's name pattern that an earlier, killed save left behind.
// Only those older than a minute: a younger one may be another save still writing.
void removeStaleTemporaries(const fs::path& dir, const std::string& prefix) {
    DIR* d = ::opendir(dir.c_str());
    if (!d)
        return;
    const auto cutoff = std::chrono::system_clock::now() - std::chrono::minutes(1);
    while (const dirent* e = ::readdir(d)) {
        const std::string_view name = e->d_name;
        if (name.size() != prefix.size() + kTempSuffix || !name.starts_with(prefix))
            continue;
        const fs::path p = dir / std::string(name);
        struct stat st {};
        if (::lstat(p.c_str(), &st) != 0 || !S_ISREG(st.st_mode))
            continue;
        if (std::chrono::system_clock::from_time_t(st.st_mtime) < cutoff)
            ::unlink(p.c_str());
    }
    ::closedir(d);
}

mode_t newFileMode() {
    const mode_t mask = ::umask(0);
    ::umask(mask);
    return 0666 & ~mask;
}

// Gives the temporary the old file's mode, owner and group (owner and group where allowed:
// only root may give a file away, and a group the user is not in is refused).
std::optional<std::string> copyAttributes(int fd, const fs::path& target) {
    struct stat st {};
    if (::stat(target.c_str(), &st) != 0)
        return ::fchmod(fd, newFileMode()) == 0 ? std::nullopt : std::optional(errnoText());
    if (::fchown(fd, st.st_uid, st.st_gid) != 0 && ::fchown(fd, ::geteuid(), st.st_gid) != 0) {
        // keep our own owner and group; the mode below still carries over
    }
    if (::fchmod(fd, st.st_mode & 07777) != 0)
        return errnoText();
    return std::nullopt;
}

std::optional<std::string> writeAll(int fd, std::string_view bytes) {
    std::size_t done = 0;
    while (done < bytes.size()) {
        const auto n = ::write(fd, bytes.data() + done, bytes.size() - done);
        if (n < 0) {
            if (errno == EINTR)
                continue;
            return errnoText();
        }
        done += static_cast<std::size_t>(n);
    }
    return std::nullopt;
}

void syncFolder(const fs::path& dir) {
    const int fd = ::open(dir.c_str(), O_RDONLY | O_DIRECTORY | O_CLOEXEC);
    if (fd < 0)
        return;
    ::fsync(fd);
    ::close(fd);
}

} // namespace

std::optional<std::string> writeFileAtomic(const std::filesystem::path& path,
                                           std::string_view bytes) {
    const fs::path target = saveTarget(path);
    const auto dir = target.has_parent_path() ? target.parent_path() : fs::path(".");
    const std::string prefix = tempPrefix(dir, target.filename().string());
    removeStaleTemporaries(dir, prefix);
    std::string tmpl = (dir / (prefix + "XXXXXX")).string();
    int fd = ::mkostemp(tmpl.data(), O_CLOEXEC);
    if (fd < 0)
        return "cannot create a temporary file in " + dir.string() + ": " + errnoText();
    auto fail = [&](const std::string& what) {
        ::close(fd);
        ::unlink(tmpl.c_str());
        return what;
    };
    if (auto why = writeAll(fd, bytes))
        return fail("cannot write " + tmpl + ": " + *why);
    if (auto why = copyAttributes(fd, target))
        return fail("cannot set the permissions of " + tmpl + ": " + *why);
    if (::fsync(fd) != 0)
        return fail("cannot flush " + tmpl + ": " + errnoText());
    if (::close(fd) != 0) {
        const std::string why = errnoText();
        ::unlink(tmpl.c_str());
        return "cannot flush " + tmpl + ": " + why;
    }
    if (::rename(tmpl.c_str(), target.c_str()) != 0) {
        const std::string why = errnoText();
        ::unlink(tmpl.c_str());
        return "cannot replace " + target.string() + ": " + why;
    }
    syncFolder(dir);
    return std::nullopt;
}

std::optional<std::string> saveDrawing(const Drawing& drawing, const std::filesystem::path& path) {
    return writeFileAtomic(path, serializeDrawing(drawing));
}

} // namespace lineward::io
