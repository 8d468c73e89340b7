// Off the axis: the axial gradient anywhere, the radial and spherical uniform regions, and the
// ampere-turn scale that meets a target.
#include <gtest/gtest.h>

#include <cmath>

#include "coilwright/field.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/design.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::rel;

namespace {
const double R = 0.3;
const CoilTable kHelmholtz({{R, R, 0, -R / 2, 50, 1}, {R, R, 0, R / 2, 50, 1}});
const CoilTable kThickPair({{0.2, 0.23, 0.03, -0.11, 100, 2}, {0.2, 0.23, 0.03, 0.11, 100, 2}});
}  // namespace

TEST(Regions, GradientOffTheAxisAgreesWithTheOffAxisExpansion) {
    // Near the axis Bz(z, r) = sum_n (-1)^n (r/2)^(2n) / (n!)^2 d^(2n)B0/dz^(2n) (the field of an
    // axisymmetric source from its axial values; e.g. M. W. Garrett, J. Appl. Phys. 22, 1091,
    // 1951), so dBz/dz = sum_n (-1)^n (r/2)^(2n) / (n!)^2 d^(2n+1)B0/dz^(2n+1), here from the exact
    // on-axis derivatives. Independent of the finite differences of the off-axis field.
    for (const CoilTable* table : {&kHelmholtz, &kThickPair})
        for (double z : {0.02, 0.07})
            for (double r : {0.005, 0.02}) {
                const auto d = axial_derivatives(*table, z, 11);
                double series = 0, term_scale = 1;
                for (int n = 0; 2 * n + 1 <= 11; ++n) {
                    if (n > 0) term_scale *= -(r / 2) * (r / 2) / (n * n);
                    series += term_scale * d[static_cast<std::size_t>(2 * n + 1)];
                }
                EXPECT_LT(rel(table_gradient(*table, z, r), series), 1e-8) << z << " " << r;
            }
    // On the axis the gradient is the exact first derivative.
    EXPECT_EQ(table_gradient(kThickPair, 0.05, 0.0), axial_derivatives(kThickPair, 0.05, 1)[1]);
}

TEST(Regions, RadialExtentMatchesADirectBisection) {
    for (double tol : {1e-4, 1e-3}) {
        const double b0 = axial_field(kHelmholtz, 0.0);
        double lo = 0, hi = 0.9 * R;  // the deviation grows monotonically out to near the wire here
        for (int i = 0; i < 200; ++i) {
            const double mid = (lo + hi) / 2;
            (std::fabs(table_field(kHelmholtz, 0.0, mid).magnitude() / b0 - 1) > tol ? hi : lo) = mid;
        }
        EXPECT_LT(rel(radial_uniform_extent(kHelmholtz, tol, 0.0), lo), 1e-9) << tol;
    }
}

TEST(Regions, SphereIsWithinTheAxialAndRadialExtentsAndMeetsItsDefinition) {
    const double tol = 1e-3;
    const double s = spherical_uniform_radius(kThickPair, tol, 0.0);
    EXPECT_LE(s, axial_uniform_half_length(kThickPair, tol, 0.0) * (1 + 1e-9));
    EXPECT_LE(s, radial_uniform_extent(kThickPair, tol, 0.0) * (1 + 1e-9));
    EXPECT_GT(s, 0.02);
    const double b0 = axial_field(kThickPair, 0.0);
    const auto worst = [&](double radius) {
        double w = 0;
        for (int i = 0; i <= 720; ++i) {
            const double t = kPi * i / 720;
            w = std::max(w, std::fabs(table_field(kThickPair, radius * std::cos(t), radius * std::sin(t)).magnitude() / b0 - 1));
        }
        return w;
    };
    EXPECT_LE(worst(0.999 * s), tol);
    EXPECT_GT(worst(1.001 * s), tol);
}

TEST(Regions, ScaleForATargetFieldAndGradient) {
    const double target = 2e-4;
    const double k = scale_for_field(kThickPair, target, 0.01, 0.02);
    std::vector<CoilRow> rows = kThickPair.rows();
    for (auto& row : rows) row.current *= k;
    EXPECT_LT(rel(table_field(CoilTable(rows), 0.01, 0.02).bz, target), 1e-14);
    const CoilTable opposed({{0.1, 0.1, 0, -0.0866, 10, -1}, {0.1, 0.1, 0, 0.0866, 10, 1}});
    const double kg = scale_for_gradient(opposed, 0.5, 0.0, 0.0);
    EXPECT_LT(rel(kg * axial_derivatives(opposed, 0.0, 1)[1], 0.5), 1e-14);
    EXPECT_THROW(scale_for_field(opposed, 1e-3, 0.0, 0.0), DomainError);  // Bz = 0 at the centre
}

TEST(Regions, BadInputsAreErrors) {
    EXPECT_THROW(radial_uniform_extent(kHelmholtz, 0.0, 0.0), DomainError);
    EXPECT_THROW(spherical_uniform_radius(kHelmholtz, 1.5, 0.0), DomainError);
    EXPECT_THROW(table_gradient(kHelmholtz, R / 2, R), SingularPointError);  // on a loop
    EXPECT_THROW(table_gradient(kHelmholtz, 0.0, -0.1), DomainError);
}
