#include "coilwright/field/gradient.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

#include "coilwright/field/table_field.hpp"
#include "design/scan.hpp"
#include "field/axial_jet.hpp"
#include "numerics/checks.hpp"
#include "numerics/policy.hpp"

namespace coilwright {

using namespace internal;

namespace {

// Distance in the (r, z) half-plane from the point to the nearest winding cross-section (0
// inside a thick winding's cross-section: then the distance to its boundary).
double distance_to_windings(const CoilTable& table, double z, double r) {
    double best = std::numeric_limits<double>::infinity();
    for (const CoilRow& row : table.rows()) {
        const double z1 = row.centre_z - row.length / 2, z2 = row.centre_z + row.length / 2;
        const double dz = std::max({z1 - z, 0.0, z - z2});
        const double dr = std::max({row.inner_radius - r, 0.0, r - row.outer_radius});
        double d = std::hypot(dz, dr);
        if (d == 0.0)  // inside the cross-section: distance to its edge
            d = std::min({z - z1, z2 - z, r - row.inner_radius, row.outer_radius - r});
        best = std::min(best, d);
    }
    return best;
}

}  // namespace

double table_gradient(const CoilTable& table, double z, double r) {
    check::finite(z, "z");
    check::non_negative(r, "r");
    if (r == 0.0) return check::finite_result(internal::axial_jet_n<2>(table, z).c[1], "dBz/dz");
    const double d = distance_to_windings(table, z, r);
    if (d == 0.0) internal::raise_singular_point("the point lies on a winding");
    const double h = 1e-3 * std::min(d, internal::smallest_radius(table));
    const auto bz = [&](double zz) { return table_field(table, zz, r).bz; };
    const double d1 = (bz(z + h) - bz(z - h)) / (2 * h);
    const double d2 = (bz(z + h / 2) - bz(z - h / 2)) / h;
    return check::finite_result((4 * d2 - d1) / 3, "dBz/dz");
}

}  // namespace coilwright
