// RECT_* and RECTPAIR_*: rectangular loops and pairs of them.
#include "coilwright/field.hpp"
#include "coilwright/design.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

std::vector<Implementation> rect_functions() {
    // Argument order as in idl/functions/50_rect.toml:
    // loop: width, height, turns, current, x, y, z; pair: width, height, spacing, turns, current, x, y, z.
    auto loop = [](const double* a) { return rect_field({a[0], a[1], a[2], a[3]}, {a[4], a[5], a[6]}); };
    auto pair = [](const double* a) { return rect_pair_field({a[0], a[1], a[3], a[4]}, a[2], {a[5], a[6], a[7]}); };
    return {
        numeric("RECT_BX", [loop](const double* a) { return loop(a).x(); }),
        numeric("RECT_BY", [loop](const double* a) { return loop(a).y(); }),
        numeric("RECT_BZ", [loop](const double* a) { return loop(a).z(); }),
        numeric("RECT_B", [loop](const double* a) { return loop(a).stableNorm(); }),
        numeric("RECTPAIR_BX", [pair](const double* a) { return pair(a).x(); }, 2.0),
        numeric("RECTPAIR_BY", [pair](const double* a) { return pair(a).y(); }, 2.0),
        numeric("RECTPAIR_BZ", [pair](const double* a) { return pair(a).z(); }, 2.0),
        numeric("RECTPAIR_B", [pair](const double* a) { return pair(a).stableNorm(); }, 2.0),
        numeric("RECTPAIR_SPACING", [](const double* a) { return rect_pair_spacing(a[0], a[1]); }, 20.0),
    };
}

}  // namespace coilwright::sheet
