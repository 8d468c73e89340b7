// LOOP_* : N coincident thin circular turns.
#include "coilwright/loop.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

std::vector<Implementation> loop_functions() {
    // Argument order as in idl/functions/10_loop.toml: radius, turns, current, z, r.
    auto field = [](const double* a) { return loop_field({a[0], a[1], a[2]}, a[3], a[4]); };
    return {
        numeric("LOOP_BZ", [field](const double* a) { return field(a).bz; }),
        numeric("LOOP_BR", [field](const double* a) { return field(a).br; }),
        numeric("LOOP_B", [field](const double* a) { return field(a).magnitude(); }),
    };
}

}  // namespace coilwright::sheet
