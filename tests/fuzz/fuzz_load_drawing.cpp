// libFuzzer target for the .lineward loader: any bytes must give a drawing or a located
// error, never a crash, and an accepted drawing must round-trip through the writer. Small
// accepted drawings are also checked: no study or rule may produce a NaN or an infinity.
#include "check/check.h"
#include "io/drawing_file.h"

#include <cmath>
#include <cstdint>
#include <cstdlib>
#include <string_view>

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    static const auto tables = lineward::loadBuiltinTables();
    const std::string_view text(reinterpret_cast<const char*>(data), size);
    auto r = lineward::io::parseDrawing(text, "fuzz.lineward");
    if (!r) {
        if (r.error->message.empty())
            std::abort();
        return 0;
    }
    const std::string once = lineward::io::serializeDrawing(*r.drawing);
    auto again = lineward::io::parseDrawing(once, "fuzz-again.lineward");
    if (!again || lineward::io::serializeDrawing(*again.drawing) != once)
        std::abort();
    if (r.drawing->parts().size() <= 200)
        for (const auto& f : lineward::checkDrawing(*r.drawing, *tables).findings)
            if ((f.computed && !std::isfinite(*f.computed)) ||
                (f.limit && !std::isfinite(*f.limit)))
                std::abort();
    return 0;
}
