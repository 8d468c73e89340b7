// The thick-coil field near a corner of the winding, integrated end plane by end plane
// (thick_corner.cpp), against the general route over whole sheets and against mpmath.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <random>

#include "coilwright/constants.hpp"
#include "coilwright/field.hpp"
#include "field/sheet_kernel.hpp"
#include "field/thick_kernel.hpp"
#include "numerics/radial_quadrature.hpp"
#include "reference_csv.hpp"

using namespace coilwright;
using namespace coilwright::internal;

namespace {

// The general route (whole sheets over the radius) with far more points than it uses: the
// comparison for the route by ends. Field per current density, z >= 0.
FieldRZ by_whole_sheets(double a1, double a2, double h, double z, double r) {
    const double beyond = z - h;
    const auto sheets = [&](const double* a, const double* a_minus_r, int n, FieldRZ* out) {
        SheetPoint p[kMaxGaussNodes];
        for (int i = 0; i < n; ++i) p[i] = SheetPoint{z / a[i], r / a[i], a_minus_r[i] / a[i], h / a[i], beyond / a[i]};
        sheet_fields_normalized(p, n, 256.0, Components::Both, out);
    };
    RadialQuadratureOptions fine;
    fine.exponent = 34.0;
    fine.min_rho = 6.0;
    fine.max_depth = 16;
    return integrate_over_radius(sheets, a1, a2, {r, {std::fabs(z - h), z + h}, 2}, fine);
}

double reach_of(double a1, double a2, double h) { return 0.25 * std::min({a2 - a1, 2 * h, a1}); }

}  // namespace

TEST(ThickCorner, TheRouteByEndsAgreesWithWholeSheets) {
    // Random windings (inner radius 1e-3..10, build 1e-4..100 of it, length from a quarter of
    // the build up), points at 1e-9..1 of the corner's reach in every direction.
    std::mt19937_64 rng(1202);
    std::uniform_real_distribution<double> u(0.0, 1.0);
    double worst = 0.0;
    int used = 0;
    for (int i = 0; i < 3000; ++i) {
        const double a1 = std::pow(10.0, -3 + 4 * u(rng)), build = a1 * std::pow(10.0, -4 + 6 * u(rng));
        const double length = build * std::pow(10.0, -0.6 + 4 * u(rng)), a2 = a1 + build, h = length / 2;
        const double corner_r = (i & 1) ? a2 : a1, corner_z = (i & 2) ? h : -h;
        const double d = reach_of(a1, a2, h) * std::pow(10.0, -9 + 9 * u(rng)), angle = 2 * kPi * u(rng);
        const double z = corner_z + d * std::sin(angle), r = corner_r + d * std::cos(angle);
        if (!near_a_winding_corner(a1, a2, h, z, r)) continue;
        ++used;
        const FieldRZ f = thick_field_by_ends(a1, a2, h, std::fabs(z), r, Components::Both, 20.0);
        const FieldRZ g = by_whole_sheets(a1, a2, h, std::fabs(z), r);
        const double e = std::max(std::fabs(f.bz - g.bz), std::fabs(f.br - g.br)) / std::hypot(g.bz, g.br);
        worst = std::max(worst, e);
        EXPECT_LT(e, 5e-13) << a1 << " " << a2 << " " << length << " " << z << " " << r;
    }
    EXPECT_GT(used, 2500);
    std::printf("route by ends against whole sheets: worst %.2e of |B| over %d points\n", worst, used);
}

TEST(ThickCorner, AgreesWithMpmathNextToTheCorners) {
    // tests/reference/thick_corner_field.csv: mpmath at 40 digits (generate_corner_reference.py).
    double worst = 0.0;
    const auto rows = reference::read_reference("thick_corner_field.csv");
    ASSERT_GE(rows.size(), 40u);
    for (const auto& row : rows) {
        const double a1 = row.num(0), a2 = row.num(1), length = row.num(2), z = row.num(3), r = row.num(4);
        const double bz = row.num(5), br = row.num(6);
        ASSERT_TRUE(near_a_winding_corner(a1, a2, length / 2, z, r)) << z << " " << r;
        // Through the public function: per density times mu0 J.
        const double mu0_j = kMu0 * 1000.0 * 2.0 / ((a2 - a1) * length);
        const FieldRZ f = thick_coil_field({a1, a2, length, 1000.0, 2.0}, z, r);
        const double e = std::max(std::fabs(f.bz - mu0_j * bz), std::fabs(f.br - mu0_j * br)) / (mu0_j * std::hypot(bz, br));
        worst = std::max(worst, e);
        EXPECT_LT(e, 1e-12) << a1 << " " << a2 << " " << length << " " << z << " " << r;
    }
    std::printf("thick coil next to corners against mpmath: worst %.2e of |B| (%zu points)\n", worst, rows.size());
}

TEST(ThickCorner, WhereTheRouteByEndsApplies) {
    // Within a quarter of min(build, length, inner radius) of a corner, on both axes.
    EXPECT_TRUE(near_a_winding_corner(1.0, 1.3, 0.5, 0.5, 1.0));
    EXPECT_TRUE(near_a_winding_corner(1.0, 1.3, 0.5, -0.5 - 0.07, 1.3 + 0.07));
    EXPECT_FALSE(near_a_winding_corner(1.0, 1.3, 0.5, 0.5 - 0.08, 1.0));
    EXPECT_FALSE(near_a_winding_corner(1.0, 1.3, 0.5, 0.0, 1.15));
    // A small bore sets the reach; a winding flatter than a quarter of its build keeps the
    // general route (its two end integrals would nearly cancel).
    EXPECT_FALSE(near_a_winding_corner(0.01, 1.0, 2.0, 2.0, 0.01 + 0.003));
    EXPECT_FALSE(near_a_winding_corner(1.0, 2.0, 0.1, 0.1, 1.0));
}
