// Pickup coils: Faraday's law, effective area, sensitivity, Johnson noise, noise-equivalent field.
#include <gtest/gtest.h>

#include <cmath>

#include "coilwright/ac.hpp"
#include "coilwright/errors.hpp"

using namespace coilwright;

namespace {
constexpr double kPiLit = 3.14159265358979323846;
constexpr double kBoltzmannSi = 1.380649e-23;  // J/K, exact (SI 2019, CODATA)
}  // namespace

TEST(PickupEmf, IsFaradaysLaw) {
    // EMF = -d(flux)/dt with flux N A B sin(w t): its amplitude is the slope at t = 0, taken
    // here by a Richardson-extrapolated central difference of the flux itself.
    const double n = 500, a = 2e-3, f = 1e3, b = 1e-6;
    const auto flux = [&](double t) { return n * a * b * std::sin(2.0 * kPiLit * f * t); };
    const double h = 1e-6 / f;
    const double d1 = (flux(h) - flux(-h)) / (2.0 * h), d2 = (flux(h / 2) - flux(-h / 2)) / h;
    const double slope = (4.0 * d2 - d1) / 3.0;
    EXPECT_NEAR(pickup_emf(n, a, f, b) / slope, 1.0, 1e-9);
    EXPECT_EQ(pickup_emf(n, a, 0.0, b), 0.0);
    EXPECT_THROW(pickup_emf(n, a, -f, b), DomainError);
    EXPECT_THROW(pickup_emf(n, a, f, -b), DomainError);
    EXPECT_THROW(pickup_emf(-n, a, f, b), DomainError);
}

TEST(PickupArea, IsTheSumOverTheTurns) {
    // 400 layers of 25 turns at the mid-radii of equal radial steps: the sum of pi r^2 tends to
    // the uniform-density limit N pi (ri^2 + ri ro + ro^2)/3 (midpoint rule, error (dr)^2/12).
    const double ri = 0.01, ro = 0.03, turns = 10000.0;
    const int layers = 400;
    const double dr = (ro - ri) / layers;
    double sum = 0.0;
    for (int k = 0; k < layers; ++k) {
        const double r = ri + (k + 0.5) * dr;
        sum += (turns / layers) * kPiLit * r * r;
    }
    const double limit = pickup_area(ri, ro, 0.02, turns);
    EXPECT_NEAR((sum + turns * kPiLit * dr * dr / 12.0) / limit, 1.0, 1e-13);
    EXPECT_NEAR(pickup_area(0.05, 0.05, 0.0, 1.0), kPiLit * 0.0025, 1e-17);  // one thin turn
    EXPECT_THROW(pickup_area(0.03, 0.01, 0.02, 10.0), DomainError);
    EXPECT_THROW(pickup_area(0.01, 0.03, -0.02, 10.0), DomainError);
}

TEST(PickupSensitivity, FaradayBelowResonanceAndTheDivider) {
    const double n = 2000, a = 1e-3, r = 150.0, l = 0.2, c = 200e-12;
    // Without a capacitance: w N A, whatever R and L (open circuit).
    EXPECT_NEAR(pickup_sensitivity(n, a, 1e3, r, l, 0.0) / (2.0 * kPiLit * 1e3 * n * a), 1.0, 1e-15);
    // With it: w N A / |1 - w^2 L C + j w R C|.
    const double f = 20e3, w = 2.0 * kPiLit * f;
    const double divider = std::hypot(1.0 - w * w * l * c, w * r * c);
    EXPECT_NEAR(pickup_sensitivity(n, a, f, r, l, c) / (w * n * a / divider), 1.0, 1e-14);
    // Near the resonance it rises by about Q; above it the model stops holding.
    EXPECT_GT(pickup_sensitivity(n, a, 0.99 * coil_srf(l, c), r, l, c), 2.0 * w * n * a);
    EXPECT_THROW(pickup_sensitivity(n, a, 1.01 * coil_srf(l, c), r, l, c), DomainError);
    EXPECT_THROW(pickup_sensitivity(n, a, -1.0, r, l, c), DomainError);
}

TEST(PickupNoise, IsFourKTR) {
    // sqrt(4 k T R B), k = 1.380649e-23 J/K; 1 kOhm at 20 C: about 4 nV/sqrt(Hz) (common practice).
    const double v = johnson_noise(1000.0, 20.0, 1.0);
    EXPECT_NEAR(v / std::sqrt(4.0 * kBoltzmannSi * 293.15 * 1000.0), 1.0, 1e-15);
    EXPECT_NEAR(v, 4.02e-9, 0.01e-9);
    EXPECT_NEAR(johnson_noise(1000.0, 20.0, 1e4) / v, 100.0, 1e-12);
    EXPECT_EQ(johnson_noise(1000.0, -273.15 + 1e-9, 1.0) > 0.0, true);
    EXPECT_THROW(johnson_noise(1000.0, -273.15, 1.0), DomainError);  // absolute zero and below
    EXPECT_THROW(johnson_noise(1000.0, -300.0, 1.0), DomainError);
    EXPECT_THROW(johnson_noise(-1.0, 20.0, 1.0), DomainError);
    EXPECT_THROW(johnson_noise(1000.0, 20.0, 0.0), DomainError);
}

TEST(PickupNef, NoiseOverSensitivity) {
    const double n = 2000, a = 1e-3, f = 100.0, r = 150.0, t = 25.0, l = 0.2, c = 200e-12, ea = 3e-9;
    const double thermal = std::sqrt(4.0 * kBoltzmannSi * (t + 273.15) * r);
    // Coil noise alone: sqrt(4kTR) / (w N A), the divider cancels (noise and EMF share it).
    EXPECT_NEAR(pickup_nef(n, a, f, r, t, l, c, 0.0) / (thermal / (2.0 * kPiLit * f * n * a)), 1.0, 1e-14);
    // With an amplifier: the noise at the terminals (the coil's through the divider D, the
    // amplifier's not), in quadrature, over the sensitivity S = w N A / |D|.
    const double s = pickup_sensitivity(n, a, f, r, l, c);
    const double divider = 2.0 * kPiLit * f * n * a / s;
    const double nef = std::hypot(thermal / divider, ea) / s;
    EXPECT_NEAR(pickup_nef(n, a, f, r, t, l, c, ea) / nef, 1.0, 1e-14);
    EXPECT_THROW(pickup_nef(n, a, 0.0, r, t, l, c, ea), DomainError);
    EXPECT_THROW(pickup_nef(n, a, 1.01 * coil_srf(l, c), r, t, l, c, ea), DomainError);
    EXPECT_THROW(pickup_nef(0.0, a, f, r, t, l, c, ea), DomainError);
    EXPECT_THROW(pickup_nef(n, a, f, r, t, l, c, -ea), DomainError);
}
