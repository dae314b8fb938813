// libFuzzer target for the .lineward loader: any bytes must give a drawing or a located
// error, never a crash, and an accepted drawing must round-trip through the writer.
#include "io/drawing_file.h"

#include <cstdint>
#include <cstdlib>
#include <string_view>

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    const std::string_view text(reinterpret_cast<const char*>(data), size);
    auto r = lineward::io::parseDrawing(text, "fuzz.lineward");
    if (r) {
        const std::string once = lineward::io::serializeDrawing(*r.drawing);
        auto again = lineward::io::parseDrawing(once, "fuzz-again.lineward");
        if (!again || lineward::io::serializeDrawing(*again.drawing) != once)
            std::abort();
    } else if (r.error->message.empty()) {
        std::abort();
    }
    return 0;
}
