// Dowell's factor against its published complex form, the round-wire porosity treatment, litz.
#include <gtest/gtest.h>

#include <cmath>
#include <complex>

#include "ac/dowell.hpp"
#include "coilwright/ac.hpp"
#include "coilwright/errors.hpp"

using namespace coilwright;

namespace {

// P. L. Dowell, "Effects of eddy currents in transformer windings", Proc. IEE 113(8), 1387-1394
// (1966): for a portion of m layers, R_ac/R_dc = M' + ((m^2 - 1)/3) D' with
// M' = Re[alpha h coth(alpha h)], D' = Re[2 alpha h tanh(alpha h / 2)], alpha h = (1 + j) Delta.
// Evaluated here in complex long double, independently of the engine's real form.
double dowell_published(double delta, double m) {
    using C = std::complex<long double>;
    const C ah(delta, delta);
    const long double mprime = (ah * std::cosh(ah) / std::sinh(ah)).real();
    const long double dprime = (2.0L * ah * std::tanh(ah / 2.0L)).real();
    return static_cast<double>(mprime + (static_cast<long double>(m) * m - 1.0L) / 3.0L * dprime);
}

}  // namespace

TEST(Dowell, AgreesWithThePublishedComplexForm) {
    double worst = 0.0;
    for (double delta : {0.05, 0.1, 0.3, 0.5, 0.9, 1.0, 1.1, 1.5, 2.0, 3.0, 5.0, 8.0, 12.0, 20.0})
        for (double m : {1.0, 2.0, 3.0, 5.0, 7.0710678, 10.0, 40.0}) {
            const double err = std::fabs(dowell_factor(delta, m) / dowell_published(delta, m) - 1.0);
            worst = std::max(worst, err);
            EXPECT_LT(err, 1e-13) << delta << " " << m;
        }
    std::printf("Dowell factor: worst relative difference from the published form %.2e\n", worst);
}

TEST(Dowell, LowFrequencySeries) {
    // F = 1 + (5 m^2 - 1) Delta^4 / 45 + O(Delta^8), the classical low-frequency form, from the
    // published form's series (M' = 1 + 4 Delta^4/45, D' = Delta^4 / 3 to that order).
    for (double m : {1.0, 4.0, 20.0})
        for (double delta : {1e-6, 1e-4, 1e-3, 0.01}) {
            const double d4 = std::pow(delta, 4);
            EXPECT_NEAR(dowell_factor(delta, m), 1.0 + (5.0 * m * m - 1.0) * d4 / 45.0, 3e-16 + m * m * m * m * d4 * d4)
                << delta << " " << m;
        }
    EXPECT_EQ(dowell_factor(0.0, 3.0), 1.0);
}

TEST(Dowell, HighFrequencyLimit) {
    // Both terms tend to 1: F -> Delta (1 + 2 (m^2 - 1) / 3) (the thick-layer limit).
    for (double m : {1.0, 3.0})
        EXPECT_NEAR(dowell_factor(50.0, m) / (50.0 * (1.0 + 2.0 * (m * m - 1.0) / 3.0)), 1.0, 1e-15);
    EXPECT_TRUE(std::isfinite(dowell_factor(1e6, 2.0)));
}

TEST(Dowell, RoundWirePorosity) {
    // Square of equal area h = d sqrt(pi)/2, porosity eta = h / p, Delta = h sqrt(eta) / delta.
    const double d = 1e-3, p = 1.1e-3, delta = 0.4e-3;
    const double h = d * std::sqrt(3.14159265358979323846) / 2.0;
    EXPECT_NEAR(internal::round_wire_delta(d, p, delta) / (h * std::sqrt(h / p) / delta), 1.0, 1e-15);
}

TEST(CoilRacRatio, OneStrandIsTheSolidWire) {
    const double d = 0.8e-3, p = 0.86e-3;
    for (double f : {0.0, 50.0, 1e3, 2e4, 1e5, 1e6})
        for (double layers : {1.0, 4.0, 12.0}) {
            const double solid = coil_rac_ratio(d, p, f, layers, 1.0, Conductor::Copper, 20.0);
            const double expected =
                f == 0.0 ? 1.0
                         : dowell_factor(internal::round_wire_delta(d, p, skin_depth(f, Conductor::Copper, 20.0)), layers);
            EXPECT_DOUBLE_EQ(solid, expected) << f << " " << layers;
        }
}

TEST(CoilRacRatio, LitzIsDowellPerStrandLayer) {
    // 100 strands of 0.1 mm in a 1.2 mm bundle: 10 strand layers per winding layer at pitch 0.12 mm.
    const double f = 1e5, delta = skin_depth(f, Conductor::Copper, 20.0);
    const double litz = coil_rac_ratio(0.1e-3, 1.2e-3, f, 3.0, 100.0, Conductor::Copper, 20.0);
    EXPECT_DOUBLE_EQ(litz, dowell_factor(internal::round_wire_delta(0.1e-3, 0.12e-3, delta), 30.0));
    // At 100 kHz such litz beats solid wire of the same copper (1 mm) in the same 3 layers.
    const double solid = coil_rac_ratio(1.0e-3, 1.2e-3, f, 3.0, 1.0, Conductor::Copper, 20.0);
    EXPECT_LT(litz, solid);
    EXPECT_GT(litz, 1.0);
}

TEST(CoilRacRatio, RejectsBadArguments) {
    const auto call = [](double d, double w, double f, double m, double n) {
        return coil_rac_ratio(d, w, f, m, n, Conductor::Copper, 20.0);
    };
    EXPECT_THROW(call(1e-3, 0.9e-3, 1e3, 2, 1), DomainError);   // insulation thinner than nothing
    EXPECT_THROW(call(1e-3, 1.1e-3, -1.0, 2, 1), DomainError);  // negative frequency
    EXPECT_THROW(call(1e-3, 1.1e-3, 1e3, 0.0, 1), DomainError);
    EXPECT_THROW(call(1e-3, 1.1e-3, 1e3, 2.5, 1), DomainError);
    EXPECT_THROW(call(1e-3, 1.1e-3, 1e3, 2, 0), DomainError);
    EXPECT_THROW(call(1e-3, 1.1e-3, 1e3, 2, 1.5), DomainError);
    EXPECT_THROW(call(0.1e-3, 0.5e-3, 1e3, 2, 100), DomainError);  // 100 strands do not fit
    EXPECT_THROW(call(0.0, 1.1e-3, 1e3, 2, 1), DomainError);
}
