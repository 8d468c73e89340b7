#include "coilwright/design/arrangements.hpp"

#include <cmath>

#include "coilwright/design/pair_spacing.hpp"
#include "numerics/checks.hpp"

namespace coilwright {

using namespace internal;

CoilTable flat_pair_table(const CoilSection& coil, double turns, double current) {
    const double s = flat_pair_spacing(coil);
    check::non_negative(turns, "turns");
    check::finite(current, "current");
    return CoilTable({{coil.inner_radius, coil.outer_radius, coil.length, -s / 2, turns, current},
                      {coil.inner_radius, coil.outer_radius, coil.length, s / 2, turns, current}});
}

CoilTable gradient_pair_table(const CoilSection& coil, double turns, double current) {
    const double s = gradient_pair_spacing(coil);
    check::non_negative(turns, "turns");
    check::finite(current, "current");
    return CoilTable({{coil.inner_radius, coil.outer_radius, coil.length, -s / 2, turns, -current},
                      {coil.inner_radius, coil.outer_radius, coil.length, s / 2, turns, current}});
}

CoilTable maxwell_table(double radius, double turns, double current) {
    check::positive(radius, "radius");
    check::non_negative(turns, "turns");
    check::finite(current, "current");
    const double r2 = radius * std::sqrt(4.0 / 7.0), z2 = radius * std::sqrt(3.0 / 7.0);
    const double outer_turns = turns * 49.0 / 64.0;
    return CoilTable({{r2, r2, 0, -z2, outer_turns, current},
                      {radius, radius, 0, 0, turns, current},
                      {r2, r2, 0, z2, outer_turns, current}});
}

}  // namespace coilwright
