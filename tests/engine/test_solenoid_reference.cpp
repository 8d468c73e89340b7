// The thin-sheet solenoid against the committed mpmath reference (tests/reference/
// solenoid_field.csv: quadrature of the loop field along the winding at 50 digits, checked
// against the Derby-Olbert closed form at 50 digits). Covers the inside, the sheet, the rims, the
// end planes, the mid-plane, near the axis, long and short sheets, far away, several scales.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdio>

#include "coilwright/field.hpp"
#include "field/sheet_kernel.hpp"
#include "reference_csv.hpp"

using namespace coilwright;

TEST(SolenoidReference, AgreesWithMpmathEverywhere) {
    const auto rows = reference::read_reference("solenoid_field.csv");
    ASSERT_GT(rows.size(), 50u);
    double worst_bz = 0, worst_br = 0, worst_vs_b = 0;
    for (const auto& row : rows) {
        const SolenoidSpec s{row.num(1), row.num(2), row.num(3), row.num(4)};
        const double z = row.num(5), r = row.num(6), bz_ref = row.num(7), br_ref = row.num(8);
        const FieldRZ f = solenoid_field(s, z, r);
        const double mag = std::hypot(bz_ref, br_ref);
        const std::string& label = row.cells[0];
        // Bz relative to itself, except where it changes sign (there: relative to |B|).
        const double ebz = std::fabs(f.bz - bz_ref) / (label == "sign change" ? mag : std::fabs(bz_ref));
        const double ebr = br_ref == 0.0 ? std::fabs(f.br) / mag : std::fabs(f.br - br_ref) / std::fabs(br_ref);
        EXPECT_LT(ebz, 2e-14) << label << " z=" << z << " r=" << r;
        EXPECT_LT(ebr, 2e-14) << label << " z=" << z << " r=" << r;
        if (br_ref == 0.0) {
            EXPECT_EQ(f.br, 0.0) << label << " z=" << z << " r=" << r;
        }
        worst_bz = std::max(worst_bz, ebz);
        worst_br = std::max(worst_br, ebr);
        worst_vs_b = std::max({worst_vs_b, std::fabs(f.bz - bz_ref) / mag, std::fabs(f.br - br_ref) / mag});
    }
    std::printf("solenoid: worst relative error over %zu reference points: Bz %.2e, Br %.2e (%.2e of |B|)\n",
                rows.size(), worst_bz, worst_br, worst_vs_b);
}

TEST(SolenoidReference, AgreesWithMpmathAtRandomPoints) {
    // tests/reference/solenoid_field_random.csv: seeded random points in every region (near the
    // sheet and the rims down to 1e-12 radii, near the axis, beyond the ends, far away), by the
    // Derby-Olbert closed form at 50 digits. Bz is compared with |B| / 100 where it is below that
    // (its zeros), Br always with itself.
    const auto rows = reference::read_reference("solenoid_field_random.csv");
    ASSERT_GT(rows.size(), 300u);
    double worst_bz = 0, worst_br = 0;
    for (const auto& row : rows) {
        const double a = row.num(0), z = row.num(1), r = row.num(2), h = row.num(3);
        const double bz_ref = row.num(4), br_ref = row.num(5);
        const FieldRZ f = internal::sheet_field_normalized(z / a, r / a, (a - r) / a, h / a);
        const double mag = std::hypot(bz_ref, br_ref);
        const double ebz = std::fabs(f.bz - bz_ref) / std::max(std::fabs(bz_ref), 1e-2 * mag);
        const double ebr = br_ref == 0.0 ? std::fabs(f.br) / mag : std::fabs(f.br - br_ref) / std::fabs(br_ref);
        EXPECT_LT(ebz, 2e-14) << "z=" << z << " r=" << r << " h=" << h;
        EXPECT_LT(ebr, 2e-14) << "z=" << z << " r=" << r << " h=" << h;
        worst_bz = std::max(worst_bz, ebz);
        worst_br = std::max(worst_br, ebr);
    }
    std::printf("solenoid: worst relative error over %zu random points: Bz %.2e, Br %.2e\n", rows.size(), worst_bz,
                worst_br);
}
