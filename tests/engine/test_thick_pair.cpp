// Thick coils by one angle integral of closed forms (engine/src/inductance/thick_pair.cpp):
// against an mpmath reference, the engine's independent cubature, symmetry, the force as the
// slope of M, and the thin limits.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <optional>
#include <random>

#include "coilwright/constants.hpp"
#include "coilwright/inductance.hpp"
#include "inductance/section_integral.hpp"
#include "inductance/thick_pair.hpp"
#include "reference_csv.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::derivative;
using coilwright::test::rel;

namespace {

// Random thick windings up to radius 1, builds 2 % to 100 % of the radius, lengths 0.02 to 1.5.
struct RandomPairs {
    std::mt19937_64 rng{20261202};
    std::uniform_real_distribution<double> unit{0.0, 1.0};
    CoilSection winding() {
        const double a = 0.05 + 0.9 * unit(rng);
        return {a, a + (0.02 + unit(rng)) * (1.0 - 0.5 * a), 0.02 + 1.5 * unit(rng)};
    }
};

// The engine's other route: Maxwell's formula averaged over both cross-sections by adaptive
// cubature (section_integral.cpp), about 1e-15 (tests/engine/test_winding_inductance.cpp).
double cubature_mutual(const CoilSection& w1, const CoilSection& w2, double d) {
    const internal::OffsetWeights u = internal::winding_offsets(w1.length, w2.length, d, 1);
    return internal::average_over_sections({w1.inner_radius, w1.outer_radius}, {w2.inner_radius, w2.outer_radius}, u,
                                           internal::FilamentKernel::Mutual);
}

}  // namespace

TEST(ThickPair, AgreesWithMpmathReference) {
    // tests/reference/thick_self_inductance.csv: Neumann's angle integral with closed forms over
    // the axial offsets and one radius only, tanh-sinh over the other radius and the angle in
    // mpmath at 20 digits (generate_thick_self_reference.py).
    const auto rows = reference::read_reference("thick_self_inductance.csv");
    ASSERT_GE(rows.size(), 6u);
    double worst = 0;
    for (const auto& row : rows) {
        const CoilSection w1{row.num(1), row.num(2), row.num(3)}, w2{row.num(4), row.num(5), row.num(6)};
        const double d = row.num(7), ref = row.num(8);
        const double got = coil_mutual_inductance(w1, w2, d);
        EXPECT_LT(rel(got, ref), 1e-12) << row.cells[0];
        EXPECT_LT(rel(coil_mutual_inductance(w2, w1, -d), ref), 1e-12) << row.cells[0];
        if (d == 0 && w1.inner_radius == w2.inner_radius && w1.outer_radius == w2.outer_radius && w1.length == w2.length) {
            EXPECT_LT(rel(coil_self_inductance(w1), ref), 1e-12) << row.cells[0];
        }
        worst = std::max(worst, rel(got, ref));
        std::printf("  %-18s rel. error %.1e\n", row.cells[0].c_str(), rel(got, ref));
    }
    std::printf("thick pairs vs mpmath: worst relative error %.2e over %zu values\n", worst, rows.size());
}

TEST(ThickPair, AgreesWithTheCubatureOnRandomPairs) {
    // Nested, overlapping, touching, stacked and separated thick pairs, including each winding
    // with itself and stacked end to end.
    RandomPairs pairs;
    double worst = 0;
    int closed_form = 0;
    for (int i = 0; i < 120; ++i) {
        CoilSection w1 = pairs.winding(), w2 = pairs.winding();
        double d = 3.0 * (pairs.unit(pairs.rng) - 0.5);
        if (i % 5 == 0) d = 0.0;
        if (i % 7 == 0) {
            w2 = w1;
            d = i % 2 ? 0.0 : w1.length;
        }
        // Double where it keeps its digits, else extended precision where that does.
        const internal::AngleIntegral in_double = internal::thick_pair_angle_integral(
            w1, w2, d, internal::PairQuantity::Mutual, internal::AnglePrecision::Double);
        std::optional<double> fast = in_double.value;
        if (!fast && in_double.extended_may_help)
            fast = internal::thick_pair_angle_integral(w1, w2, d, internal::PairQuantity::Mutual,
                                                       internal::AnglePrecision::Extended)
                       .value;
        if (!fast) continue;
        ++closed_form;
        const double e = rel(*fast, cubature_mutual(w1, w2, d));
        EXPECT_LT(e, 1e-12) << w1.inner_radius << " " << w1.outer_radius << " " << w1.length << " | " << w2.inner_radius
                            << " " << w2.outer_radius << " " << w2.length << " | " << d;
        worst = std::max(worst, e);
    }
    EXPECT_GE(closed_form, 110);
    std::printf("closed form vs cubature: worst %.2e over %d random pairs\n", worst, closed_form);
}

TEST(ThickPair, MutualInductanceIsSymmetric) {
    // Neumann's formula is symmetric in the two windings; seen from winding 2, winding 1 lies at
    // -distance; and the mirror image (distance -> -distance) has the same M.
    RandomPairs pairs;
    for (int i = 0; i < 60; ++i) {
        const CoilSection w1 = pairs.winding(), w2 = pairs.winding();
        const double d = 2.0 * (pairs.unit(pairs.rng) - 0.5);
        const double m = coil_mutual_inductance(w1, w2, d);
        EXPECT_LT(rel(coil_mutual_inductance(w2, w1, -d), m), 1e-12) << i;
        EXPECT_LT(rel(coil_mutual_inductance(w1, w2, -d), m), 1e-12) << i;
    }
}

TEST(ThickPair, ForceIsTheSlopeOfTheMutualInductance) {
    // Virtual work: the axial force on winding 2 is N1 N2 I1 I2 dM/d(distance), here against
    // finite differences (Richardson, error ~ h^4) of the engine's own M.
    RandomPairs pairs;
    double worst = 0;
    for (int i = 0; i < 40; ++i) {
        const CoilSection w1 = pairs.winding(), w2 = pairs.winding();
        const double d = 2.0 * (pairs.unit(pairs.rng) - 0.5);
        const double n1 = 120, i1 = 1.5, n2 = 80, i2 = -2.5;
        const double fd = derivative([&](double x) { return coil_mutual_inductance(w1, w2, x); }, d, 1e-3);
        const double force = coil_axial_force(w1, n1, i1, w2, n2, i2, d);
        const double e = std::fabs(force - n1 * n2 * i1 * i2 * fd) / std::fabs(n1 * n2 * i1 * i2 * fd);
        EXPECT_LT(e, 2e-9) << i;
        worst = std::max(worst, e);
    }
    std::printf("COIL_FZ vs finite differences of COIL_M, random thick pairs: worst %.1e\n", worst);
}

TEST(ThickPair, ThinLimitsApproachTheThinFormulas) {
    // A build or length shrinking to zero tends to the engine's thin-sheet (Nagaoka), flat
    // spiral and filament (Maxwell) results, the gap shrinking in proportion; the windings pass
    // from the closed form to extended precision and to the cubature on the way.
    const double sheet = solenoid_inductance(1, 0.5, 1), flat = coil_self_inductance({0.5, 1, 0});
    const double loops = loop_mutual_inductance(1.0, 0.8, 0.6);
    for (double eps : {1e-1, 1e-2, 1e-3, 1e-4}) {
        EXPECT_LT(rel(coil_self_inductance({1, 1 + eps, 0.5}), sheet), 2 * eps) << eps;
        EXPECT_LT(rel(coil_self_inductance({0.5, 1, eps}), flat), 2 * eps * std::log(1 / eps)) << eps;
        const double m = coil_mutual_inductance({1, 1 + eps, eps}, {0.8, 0.8 + eps, eps}, 0.6);
        EXPECT_LT(rel(m, loops), 2 * eps) << eps;
    }
}

TEST(ThickPair, SlenderRingMatchesTheMeanDistanceFormula) {
    // A winding far from the axis compared with its cross-section: L = mu0 a (ln(8 a / g) - 2)
    // with g the geometric mean distance of the section from itself (Maxwell; E. B. Rosa and
    // F. W. Grover, Bull. Bureau of Standards 8, 1912), corrections of order (c/a)^2 ln(a/c).
    for (double a : {20.0, 50.0}) {
        const double c = 1.0;
        const double l = coil_self_inductance({a - c / 2, a + c / 2, c});
        // Square section: geometric mean distance 0.447049 c (Maxwell's value, quoted from
        // memory).
        const double gmd = 0.447049 * c;
        const double ring = kMu0 * a * (std::log(8 * a / gmd) - 2.0);
        EXPECT_LT(rel(l, ring), 1e-3) << a;
    }
}
