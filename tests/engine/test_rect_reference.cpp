// The rectangular loop and pair against committed mpmath references (tests/reference/:
// rect_field.csv, Biot-Savart line-integral quadrature at 40 digits cross-checked with the
// closed-form segment sum at 80 digits; rect_pair_spacing.csv, mpmath findroot at 50 digits).
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdio>

#include "coilwright/field.hpp"
#include "coilwright/design.hpp"
#include "reference_csv.hpp"

using namespace coilwright;

TEST(RectReference, FieldAgreesWithMpmathEverywhere) {
    const auto rows = reference::read_reference("rect_field.csv");
    ASSERT_GT(rows.size(), 40u);
    double worst = 0.0, worst_tiny = 0.0;
    for (const auto& row : rows) {
        const RectSpec rect{row.num(1), row.num(2), row.num(3), row.num(4)};
        const Eigen::Vector3d p(row.num(5), row.num(6), row.num(7));
        const Eigen::Vector3d ref(row.num(8), row.num(9), row.num(10));
        const Eigen::Vector3d got = rect_field(rect, p);
        const double mag = ref.norm();
        for (int k = 0; k < 3; ++k) {
            // Each component relative to itself; an exactly zero reference (a symmetry plane) exactly;
            // at the points labelled "sign change" (a component passing through zero) relative to |B|.
            if (ref[k] == 0.0) {
                EXPECT_EQ(got[k], 0.0) << row.cells[0] << " component " << k << " at " << p.transpose();
                continue;
            }
            const bool tiny = row.cells[0] == "sign change" && std::fabs(ref[k]) < 0.1 * mag;
            const double err = std::fabs(got[k] - ref[k]) / (tiny ? mag : std::fabs(ref[k]));
            EXPECT_LT(err, tiny ? 5e-15 : 1e-14) << row.cells[0] << " component " << k << " at " << p.transpose();
            (tiny ? worst_tiny : worst) = std::max(tiny ? worst_tiny : worst, err);
        }
    }
    std::printf("rect field: worst relative error per component over %zu points: %.2e (components near a sign change: %.2e of |B|)\n",
                rows.size(), worst, worst_tiny);
}

TEST(RectReference, PairSpacingAgreesWithMpmath) {
    const auto rows = reference::read_reference("rect_pair_spacing.csv");
    ASSERT_GE(rows.size(), 8u);
    double worst = 0.0;
    for (const auto& row : rows) {
        const double got = rect_pair_spacing(row.num(0), row.num(1));
        const double err = std::fabs(got - row.num(2)) / row.num(2);
        EXPECT_LT(err, 1e-14) << row.num(0) << " x " << row.num(1);
        worst = std::max(worst, err);
    }
    std::printf("rect pair spacing: worst relative error over %zu aspect ratios: %.2e\n", rows.size(), worst);
}
