// The loop field against the committed mpmath reference (tests/reference/loop_field.csv:
// Biot-Savart quadrature at 40 digits, cross-checked with the elliptic closed form of
// Smythe 1950 at 60 digits). Covers near-axis, far-field, near-wire, tiny and large coils, in
// both copies of the kernel (baseline x86-64, and AVX2 with FMA where the processor has them).
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>

#include "coilwright/field.hpp"
#include "field/loop_batch_code.hpp"
#include "reference_csv.hpp"

using namespace coilwright;

TEST(LoopReference, AgreesWithMpmathEverywhere) {
    const auto rows = reference::read_reference("loop_field.csv");
    ASSERT_GT(rows.size(), 40u);
    using internal::BatchCode;
    for (const BatchCode code : {BatchCode::Baseline, BatchCode::Avx2Fma, BatchCode::Avx512}) {
    if (code != internal::best_batch_code() && code != BatchCode::Baseline) continue;
    double worst = 0.0;
    for (const auto& row : rows) {
        const LoopSpec loop{row.num(1), row.num(2), row.num(3)};
        const double z = row.num(4), r = row.num(5);
        const double bz_ref = row.num(6), br_ref = row.num(7);
        const FieldRZ f = internal::loop_field_with(code, loop, z, r);
        const double scale = std::hypot(bz_ref, br_ref);
        // Each component relative to itself, except where it is tiny next to |B| (a sign
        // change of Bz, or Br near the axis is measured against itself: it must stay relative).
        const bool sign_change = row.cells[0] == "sign change";
        const double ebz = std::fabs(f.bz - bz_ref) / (sign_change ? scale : std::fabs(bz_ref));
        const double ebr = br_ref == 0.0 ? std::fabs(f.br) / scale : std::fabs(f.br - br_ref) / std::fabs(br_ref);
        EXPECT_LT(ebz, 5e-15) << row.cells[0] << " z=" << z << " r=" << r;
        EXPECT_LT(ebr, 5e-15) << row.cells[0] << " z=" << z << " r=" << r;
        worst = std::max({worst, ebz, ebr});
    }
    std::printf("loop field (%s): worst relative error over %zu reference points: %.2e\n",
                code == BatchCode::Baseline ? "baseline" : code == BatchCode::Avx2Fma ? "AVX2+FMA" : "AVX-512", rows.size(), worst);
    }
}
