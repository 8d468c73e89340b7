// Thick coils and flat spirals against the committed mpmath reference (tests/reference/
// coil_field.csv: quadrature over the radius at 40 digits, each row checked by a second method
// named in its last column). Covers the axis, the inside of the winding, its surfaces, end faces
// and corners (down to nanometres), the bore, outside, far away, and several shapes.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdio>

#include "coilwright/field.hpp"
#include "reference_csv.hpp"

using namespace coilwright;

TEST(CoilReference, AgreesWithMpmathEverywhere) {
    const auto rows = reference::read_reference("coil_field.csv");
    ASSERT_GT(rows.size(), 60u);
    double worst_thick = 0, worst_spiral = 0;
    for (const auto& row : rows) {
        const std::string& kind = row.cells[0];
        const double a1 = row.num(2), a2 = row.num(3), length = row.num(4), n = row.num(5), i = row.num(6);
        const double z = row.num(7), r = row.num(8), bz_ref = row.num(9), br_ref = row.num(10);
        const FieldRZ f = kind == "thick" ? thick_coil_field({a1, a2, length, n, i}, z, r)
                                          : flat_spiral_field({a1, a2, n, i}, z, r);
        const double mag = std::hypot(bz_ref, br_ref);
        // Each component relative to itself, or to |B| / 100 where it is smaller than that
        // (near its zeros); a component that is zero by symmetry must come out exactly zero.
        const double ebz = std::fabs(f.bz - bz_ref) / std::max(std::fabs(bz_ref), 1e-2 * mag);
        const double ebr = std::fabs(f.br - br_ref) / std::max(std::fabs(br_ref), 1e-2 * mag);
        const double e = std::max(ebz, ebr);
        EXPECT_LT(e, 1e-12) << kind << " " << row.cells[1] << " z=" << z << " r=" << r;
        if (br_ref == 0.0) {
            EXPECT_EQ(f.br, 0.0) << kind << " " << row.cells[1] << " z=" << z << " r=" << r;
        }
        (kind == "thick" ? worst_thick : worst_spiral) = std::max(kind == "thick" ? worst_thick : worst_spiral, e);
    }
    std::printf("coil reference: worst relative error, thick coil %.2e, flat spiral %.2e (%zu points)\n", worst_thick,
                worst_spiral, rows.size());
}
