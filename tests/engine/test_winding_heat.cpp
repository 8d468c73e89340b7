// Winding temperatures: the hot spot from conduction inside the winding, the temperature after
// switch-on, the adiabatic rise of one pulse. Against mpmath (closed form and heat balance by
// quadrature, tests/reference/winding_heat.csv), textbook limits, IEC 60949's adiabatic formula,
// numerical integration of the heat equation, and the steady state of budget.hpp.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>

#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/wire.hpp"
#include "reference_csv.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::rel;

namespace {
constexpr auto kCu = Conductor::Copper;
constexpr double kAlphaCu = 0.00393;  // IEC 60028, as conductor.hpp

// Classical fourth-order Runge-Kutta for dT/dt = f(T) from T0 over t in n steps.
template <class F>
double integrate(F f, double t0, double time, int n) {
    double t = t0;
    const double dt = time / n;
    for (int i = 0; i < n; ++i) {
        const double k1 = f(t), k2 = f(t + dt / 2 * k1), k3 = f(t + dt / 2 * k2), k4 = f(t + dt * k3);
        t += dt / 6 * (k1 + 2 * k2 + 2 * k3 + k4);
    }
    return t;
}
}  // namespace

TEST(WindingHotspot, AgreesWithMpmathTo1em13) {
    // Source: tests/reference/winding_heat.csv (mpmath, closed form and quadrature of the heat
    // balance agreeing to 1e-30), windings from a 1e-8 relative build to a near-solid rod.
    const auto rows = reference::read_reference("winding_heat.csv");
    ASSERT_GE(rows.size(), 10u);
    double worst = 0.0;
    for (const auto& row : rows) {
        const double outer = winding_hotspot_rise(row.num(0), row.num(1), row.num(3), row.num(2), row.num(4),
                                                  CooledSurfaces::Outer);
        const double both = winding_hotspot_rise(row.num(0), row.num(1), row.num(3), row.num(2), row.num(4),
                                                 CooledSurfaces::Both);
        EXPECT_LT(rel(outer, row.num(5)), 1e-13) << row.num(0) << " " << row.num(1);
        EXPECT_LT(rel(both, row.num(6)), 1e-13) << row.num(0) << " " << row.num(1);
        worst = std::fmax(worst, std::fmax(rel(outer, row.num(5)), rel(both, row.num(6))));
    }
    std::printf("hot-spot rise: worst relative error %.2e against mpmath\n", worst);
}

TEST(WindingHotspot, TendsToTheTextbookRodAndWalls) {
    const double p = 10.0, l = 0.05, k = 0.7;
    // Solid rod, radius b: T(0) - Ts = q b^2 / (4k) (Incropera sec. 3.5, eq. for the solid cylinder
    // with generation), q = P / (pi b^2 l), so P / (4 pi k l) whatever b; the bore of 1e-7 b changes
    // it by 2 (a/b)^2 ln(b/a) ~ 3e-13 (outer cooled).
    EXPECT_LT(rel(winding_hotspot_rise(1e-8, 0.1, l, p, k, CooledSurfaces::Outer), p / (4 * kPi * k * l)), 1e-12);
    // Thin wall of thickness t = 1e-6 a: a plane wall, insulated on one side q t^2 / (2k), cooled on
    // both q t^2 / (8k) (Incropera sec. 3.5, the plane wall with generation); the curvature
    // changes them by O(t / a).
    const double a = 0.02, t = 2e-8, q = p / (kPi * ((a + t) * (a + t) - a * a) * l);
    EXPECT_LT(rel(winding_hotspot_rise(a, a + t, l, p, k, CooledSurfaces::Outer), q * t * t / (2 * k)), 1e-5);
    EXPECT_LT(rel(winding_hotspot_rise(a, a + t, l, p, k, CooledSurfaces::Both), q * t * t / (8 * k)), 1e-5);
}

TEST(WindingHotspot, BadInputIsAnError) {
    EXPECT_THROW(winding_hotspot_rise(0.02, 0.02, 0.05, 10, 0.7, CooledSurfaces::Outer), DomainError);  // no build
    EXPECT_THROW(winding_hotspot_rise(0.03, 0.02, 0.05, 10, 0.7, CooledSurfaces::Outer), DomainError);
    EXPECT_THROW(winding_hotspot_rise(0.0, 0.02, 0.05, 10, 0.7, CooledSurfaces::Outer), DomainError);
    EXPECT_THROW(winding_hotspot_rise(0.02, 0.03, 0.0, 10, 0.7, CooledSurfaces::Outer), DomainError);
    EXPECT_THROW(winding_hotspot_rise(0.02, 0.03, 0.05, -1, 0.7, CooledSurfaces::Outer), DomainError);
    EXPECT_THROW(winding_hotspot_rise(0.02, 0.03, 0.05, 10, 0.0, CooledSurfaces::Outer), DomainError);
    EXPECT_THROW(winding_hotspot_rise(0.02, 0.03, 0.05, 10, 0.7, static_cast<CooledSurfaces>(2)), DomainError);
    EXPECT_EQ(winding_hotspot_rise(0.02, 0.03, 0.05, 0.0, 0.7, CooledSurfaces::Both), 0.0);
}

TEST(WindingWarmUp, TendsToTheSteadyStateAndFollowsTheHeatEquation) {
    // The hand case of test_budget.cpp: R20 = 2 ohm, 3 A, A = 0.05 m^2, h = 10, Ta = 25 C, settling
    // at 67.7566 C; with C = 500 J/K the time constant is C / (h A - alpha I^2 R20) = 1165 s.
    const double c = 500.0;
    const HotState steady = hot_state_at_current(2.0, 3.0, 0.05, 25.0, 10.0, kCu);
    EXPECT_LT(rel(coil_temperature_at_time(2.0, 3.0, 0.05, c, 50 * 1165.0, 25.0, 10.0, kCu), steady.temperature), 1e-14);
    EXPECT_EQ(coil_temperature_at_time(2.0, 3.0, 0.05, c, 0.0, 25.0, 10.0, kCu), 25.0);
    // Against the heat equation integrated numerically (RK4, 20000 steps over 1000 s).
    const auto f = [&](double temp) { return (9.0 * 2.0 * (1 + kAlphaCu * (temp - 20.0)) - 0.5 * (temp - 25.0)) / c; };
    for (double time : {1.0, 100.0, 1000.0})
        EXPECT_LT(rel(coil_temperature_at_time(2.0, 3.0, 0.05, c, time, 25.0, 10.0, kCu) - 25.0,
                      integrate(f, 25.0, time, 20000) - 25.0), 1e-11) << time;
    // Early on the winding heats as if adiabatic: rise ~ I^2 R(Ta) t / C.
    EXPECT_LT(rel(coil_temperature_at_time(2.0, 3.0, 0.05, c, 1e-3, 25.0, 10.0, kCu) - 25.0,
                  9.0 * 2.0 * (1 + kAlphaCu * 5.0) * 1e-3 / c), 1e-6);
}

TEST(WindingWarmUp, RunawayIsFollowedUntil400CThenAnError) {
    // 8 A: h A - alpha I^2 R20 = 0.5 - 0.503 < 0, no steady state (budget.hpp), but the winding
    // takes time to heat: after 60 s a number (against RK4), long after it the error.
    const double c = 500.0;
    const auto f = [&](double temp) { return (64.0 * 2.0 * (1 + kAlphaCu * (temp - 20.0)) - 0.5 * (temp - 25.0)) / c; };
    EXPECT_LT(rel(coil_temperature_at_time(2.0, 8.0, 0.05, c, 60.0, 25.0, 10.0, kCu) - 25.0,
                  integrate(f, 25.0, 60.0, 20000) - 25.0), 1e-11);
    EXPECT_THROW(coil_temperature_at_time(2.0, 8.0, 0.05, c, 1e5, 25.0, 10.0, kCu), DomainError);
    // lambda = 0 exactly: the linear rise P t / C (the relaxation factor's limit).
    const double i0 = std::sqrt(0.5 / (kAlphaCu * 2.0));
    EXPECT_LT(rel(coil_temperature_at_time(2.0, i0, 0.05, c, 10.0, 25.0, 10.0, kCu) - 25.0,
                  i0 * i0 * 2.0 * (1 + kAlphaCu * 5.0) * 10.0 / c), 1e-12);
    EXPECT_THROW(coil_temperature_at_time(2.0, 3.0, 0.05, 0.0, 10.0, 25.0, 10.0, kCu), DomainError);
    EXPECT_THROW(coil_temperature_at_time(2.0, 3.0, 0.05, c, -1.0, 25.0, 10.0, kCu), DomainError);
    EXPECT_THROW(coil_temperature_at_time(2.0, 3.0, 0.05, c, 10.0, 450.0, 10.0, kCu), DomainError);
}

TEST(PulseRise, IsTheAdiabaticFormulaOfIec60949) {
    // 1 m of 1 mm^2 copper: R20 = 1/58 ohm (IEC 60028), heat capacity 3.45e6 J/(K m^3) * 1e-6 m^3
    // (IEC 60949's volumetric specific heat of copper, quoted from memory; with it and rho20, beta
    // the standard's K = sqrt(sigma (beta + 20) / rho20) comes out at 225.7), 100 A for 1 s from 20 C.
    // IEC 60949:1988, adiabatic: I^2 t = K^2 S^2 ln((Tf + beta)/(Ti + beta)), copper K = 226
    // A s^0.5/mm^2, beta = 234.5 K (as published summaries of the standard quote them; K and beta are
    // rounded, our beta = 1/alpha - 20 = 234.45 K): agreement to 0.5 % of the rise.
    const double r20 = 1.0 / 58.0, c = 3.45, i = 100.0;
    const double rise = pulse_temperature_rise(r20, i, 1.0, c, 20.0, kCu);
    const double iec = (20.0 + 234.5) * std::exp(i * i / (226.0 * 226.0)) - 234.5 - 20.0;
    EXPECT_LT(rel(rise, iec), 5e-3) << rise << " " << iec;
    // With IEC's K written out, K^2 = sigma (beta + 20) / rho20, from the same data, it is the same formula.
    const double beta = 1.0 / kAlphaCu - 20.0, k2 = 3.45e6 * (beta + 20.0) / (1.0 / 58.0 * 1e-6) * 1e-12;
    EXPECT_LT(rel(rise, (20.0 + beta) * std::exp(i * i / k2) - beta - 20.0), 1e-13);
    std::printf("pulse rise: %.6f K, IEC 60949 with K = 226, beta = 234.5: %.6f K\n", rise, iec);
}

TEST(PulseRise, FollowsTheHeatEquationAndTheShortPulseLimit) {
    const double r20 = 0.5, c = 40.0;
    const auto f = [&](double temp) { return 400.0 * r20 * (1 + kAlphaCu * (temp - 20.0)) / c; };
    EXPECT_LT(rel(pulse_temperature_rise(r20, 20.0, 0.3, c, 60.0, kCu), integrate(f, 60.0, 0.3, 20000) - 60.0), 1e-12);
    // A short pulse: I^2 R(T0) t / C.
    EXPECT_LT(rel(pulse_temperature_rise(r20, 20.0, 1e-6, c, 60.0, kCu), 400.0 * r20 * (1 + kAlphaCu * 40.0) * 1e-6 / c),
              1e-6);
    EXPECT_EQ(pulse_temperature_rise(r20, 0.0, 1.0, c, 60.0, kCu), 0.0);
    EXPECT_THROW(pulse_temperature_rise(r20, 200.0, 10.0, c, 60.0, kCu), DomainError);  // beyond 400 C
    EXPECT_THROW(pulse_temperature_rise(r20, 20.0, -1.0, c, 60.0, kCu), DomainError);
    EXPECT_THROW(pulse_temperature_rise(r20, 20.0, 1.0, 0.0, 60.0, kCu), DomainError);
    EXPECT_THROW(pulse_temperature_rise(0.0, 20.0, 1.0, c, 60.0, kCu), DomainError);
}
