// The sheet's end terms and whole sheets many at a time (packs of four with AVX2 where the
// processor has it) give the bits of one at a time, for every form the end terms take.
#include <gtest/gtest.h>

#include <cmath>
#include <cstring>
#include <random>
#include <vector>

#include "field/sheet_end_terms.hpp"
#include "field/sheet_kernel.hpp"

using namespace coilwright;
using namespace coilwright::internal;

namespace {

bool same_bits(double a, double b) { return std::memcmp(&a, &b, sizeof a) == 0; }

// Requests in runs of one form and mixed, across the forms: inside and outside the radius
// (outside with k^2 above and below the split limit), A alone, zeta = 0, r = 0, r = 1 exactly,
// magnitudes where norm2 needs hypot, and the rim (an error, checked elsewhere: left out).
std::vector<EndTermRequest> mixed_requests(std::mt19937_64& rng) {
    std::uniform_real_distribution<double> u(0.0, 1.0);
    std::vector<EndTermRequest> out;
    const auto add = [&](double zeta, double r, bool axial, bool vector) {
        out.push_back({zeta, r, 1.0 - r, axial, vector});
    };
    for (int run = 0; run < 400; ++run) {
        const int length = 1 + static_cast<int>(u(rng) * 11);
        const int kind = static_cast<int>(u(rng) * 9);
        for (int i = 0; i < length; ++i) {
            const double zeta = std::pow(10.0, -8 + 10 * u(rng)), off = std::pow(10.0, -9 + 9 * u(rng));
            switch (kind) {
                case 0: add(zeta, 1.0 - off, true, true); break;                 // inside
                case 1: add(zeta, 1.0 + off, true, true); break;                 // outside, k^2 near 1
                case 2: add(zeta, 1.0 + 50 * u(rng) + off, true, u(rng) < 0.5); break;  // outside, any k^2
                case 3: add(zeta, 3 * u(rng), false, true); break;               // A alone
                case 4: add(0.0, 3 * u(rng) + 1e-3, true, true); break;          // on an end plane
                case 5: add(zeta, 0.0, true, true); break;                       // on the axis
                case 6: add(zeta, 1.0, true, true); break;                       // r = 1
                case 7: add(1e-160 * u(rng) + 1e-170, 1.0 - 1e-160, true, true); break;  // hypot range
                default: add(zeta, 2 * u(rng), u(rng) < 0.7, u(rng) < 0.7); break;      // mixed
            }
        }
    }
    return out;
}

}  // namespace

TEST(SheetEndTerms, PacksGiveTheBitsOfOneAtATime) {
    std::mt19937_64 rng(20261202);
    const std::vector<EndTermRequest> q = mixed_requests(rng);
    const int n = static_cast<int>(q.size());
    for (double min_split_k2 : {10.0 / 256.0, 0.7}) {
        std::vector<EndTerms> widest(q.size()), four(q.size()), single(q.size());
        end_terms_using(EndTermCode::Packs, q.data(), n, min_split_k2, widest.data());
        end_terms_using(EndTermCode::FourLanes, q.data(), n, min_split_k2, four.data());
        end_terms_using(EndTermCode::OneByOne, q.data(), n, min_split_k2, single.data());
        int differ = 0;
        for (int i = 0; i < n; ++i) {
            const auto at = static_cast<std::size_t>(i);
            const EndTerms alone = end_terms(q[at], min_split_k2);
            for (const EndTerms& t : {widest[at], four[at], alone})
                if (!same_bits(t.axial, single[at].axial) || !same_bits(t.vector, single[at].vector)) ++differ;
        }
        EXPECT_EQ(differ, 0) << "of " << n << " requests, min_split_k2 " << min_split_k2;
    }
}

TEST(SheetEndTerms, WholeSheetsManyAtATimeGiveTheBitsOfOneAtATime) {
    std::mt19937_64 rng(7);
    std::uniform_real_distribution<double> u(0.0, 1.0);
    for (int trial = 0; trial < 200; ++trial) {
        // A batch longer than kMaxSheetBatch sometimes, of sheets around one point as a thick
        // winding asks for them (also points far away, where the sheets fall back to quadrature).
        const int count = 1 + static_cast<int>(u(rng) * 2.5 * kMaxSheetBatch);
        const double z = (u(rng) - 0.5) * std::pow(10.0, -3 + 6 * u(rng)), r = 3 * u(rng), h = std::pow(10.0, -3 + 4 * u(rng));
        std::vector<SheetPoint> p;
        for (int i = 0; i < count; ++i) {
            const double a = std::pow(10.0, -1 + 2 * u(rng));
            p.push_back(SheetPoint::of(z, r, a, h * a));
        }
        for (Components want : {Components::Both, Components::Axial, Components::Radial}) {
            std::vector<FieldRZ> many(p.size());
            try {
                sheet_fields_normalized(p.data(), count, 256.0, want, many.data());
            } catch (const std::exception&) {
                continue;  // a point on a sheet: one at a time raises too (below)
            }
            for (int i = 0; i < count; ++i) {
                const FieldRZ one = sheet_field_normalized(p[static_cast<std::size_t>(i)], 256.0, want);
                ASSERT_TRUE(same_bits(one.bz, many[static_cast<std::size_t>(i)].bz) &&
                            same_bits(one.br, many[static_cast<std::size_t>(i)].br))
                    << "trial " << trial << " sheet " << i;
            }
        }
    }
}

TEST(SheetEndTerms, ThePointOnASheetIsAnErrorInABatchToo) {
    const SheetPoint on = SheetPoint::of(0.1, 1.0, 1.0, 0.5), off = SheetPoint::of(0.1, 0.5, 1.0, 0.5);
    const SheetPoint points[3] = {off, on, off};
    FieldRZ out[3];
    EXPECT_THROW(sheet_fields_normalized(points, 3, 256.0, Components::Both, out), std::exception);
}
