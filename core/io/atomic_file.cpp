// Atomic replacement of a file: write beside it, flush to disk, then rename over it.
#include "io/drawing_file.h"

#include <cerrno>
#include <cstring>
#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>

namespace lineward::io {

std::optional<std::string> writeFileAtomic(const std::filesystem::path& path,
                                           std::string_view bytes) {
    const auto dir = path.has_parent_path() ? path.parent_path() : std::filesystem::path(".");
    std::string tmpl = (dir / ("." + path.filename().string() + ".saving-XXXXXX")).string();
    int fd = ::mkstemp(tmpl.data());
    if (fd < 0)
        return "cannot create a temporary file in " + dir.string() + ": " + std::strerror(errno);
    std::size_t done = 0;
    while (done < bytes.size()) {
        const auto n = ::write(fd, bytes.data() + done, bytes.size() - done);
        if (n < 0) {
            if (errno == EINTR)
                continue;
            const std::string why = std::strerror(errno);
            ::close(fd);
            ::unlink(tmpl.c_str());
            return "cannot write " + tmpl + ": " + why;
        }
        done += static_cast<std::size_t>(n);
    }
    if (::fsync(fd) != 0 || ::fchmod(fd, 0644) != 0) {
        const std::string why = std::strerror(errno);
        ::close(fd);
        ::unlink(tmpl.c_str());
        return "cannot flush " + tmpl + ": " + why;
    }
    ::close(fd);
    if (::rename(tmpl.c_str(), path.c_str()) != 0) {
        const std::string why = std::strerror(errno);
        ::unlink(tmpl.c_str());
        return "cannot replace " + path.string() + ": " + why;
    }
    return std::nullopt;
}

std::optional<std::string> saveDrawing(const Drawing& drawing, const std::filesystem::path& path) {
    return writeFileAtomic(path, serializeDrawing(drawing));
}

} // namespace lineward::io
