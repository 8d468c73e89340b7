// Self-inductance of a thin solenoid (current sheet) in closed form, stable for every shape.
//
// Lorenz's formula as given by E. B. Rosa and F. W. Grover (Bull. Bureau of Standards 8, 1912)
// and tabulated by H. Nagaoka (1909) reads, with d = sqrt(4a^2 + l^2), k = 2a / d and the
// complementary modulus x = l / d,
//   L = mu0 N^2 pi a^2 / l * k_N,  k_N = 4 / (3 pi x) [ (x^2/k^2) (K - E) + E - k ].
// It cancels badly for short solenoids (E - k with both near 1) and, computed naively, for long
// ones (K - E with both near pi/2). Rearranged (our algebra):
//   L = mu0 N^2 d k^2 Q / 3,   Q = (K - E)/k^2 + (E - 1)/x^2 + 1/(1 + k),
// where (K - E)/k^2 = integral sin^2 t / D dt = cel(x, 1, 0, 1) has only positive terms, and
// E - 1 >= 0 comes from cel(x, 1, 1, x^2) - 1 when x >= 1/4 (at most one digit lost) and from
// the series of DLMF 19.12.2 in x^2 (positive terms only) below that. Q -> 3 pi / 4 for a long
// solenoid (L -> mu0 N^2 pi a^2 / l) and L -> mu0 N^2 a (ln(8a/l) - 1/2) for a short one.
// Differentiating in a at fixed l (our algebra, checked against finite differences):
//   dL/da = (2/3) mu0 N^2 k [ E + (E - 1)(3 - x^2)/x^2 + k^2/(1 + k) + x^2 (k + 2)/(1 + k)^2 ],
// again a sum of positive terms.
#include <cmath>

#include "numerics/bulirsch_cel.hpp"
#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/inductance/self.hpp"

namespace coilwright {

using namespace internal;

namespace {

constexpr double kSeriesBelow = 0.25;

// (E(k) - 1) / x^2 for the complementary modulus x = sqrt(1 - k^2) <= kSeriesBelow, from
// DLMF 19.12.2: E = 1 + (1/2) sum_m c_m x^(2m+2) (ln(1/x) + d(m) - 1/((2m+1)(2m+2))),
// c_m = (1/2)_m (3/2)_m / ((2)_m m!), d(0) = ln 4, d(m+1) = d(m) - 1/((m+1)(2m+1)).
double e_minus_one_over_x2_series(double x) {
    const double log_inv_x = -std::log(x);
    const double x2 = x * x;
    double c = 1.0, d = 2.0 * std::log(2.0), power = 1.0, sum = 0.0;
    // x <= 1/4: each term is at most 1/16 of the one before, so about 15 terms suffice.
    StepBudget budget(60, "the series of E(k) near k = 1");
    for (int m = 0;; ++m, budget.step()) {
        const double term = c * power * (log_inv_x + d - 1.0 / ((2.0 * m + 1.0) * (2.0 * m + 2.0)));
        sum += term;
        if (term < 1e-18 * sum) break;
        c *= (m + 0.5) * (m + 1.5) / ((m + 2.0) * (m + 1.0));
        d -= 1.0 / ((m + 1.0) * (2.0 * m + 1.0));
        power *= x2;
    }
    return 0.5 * sum;
}

struct SheetTerms {
    double d;           // sqrt(4a^2 + l^2)
    double k, x;        // modulus 2a/d and complementary modulus l/d
    double k_minus_e;   // (K - E) / k^2
    double e;           // E(k)
    double e_minus_1;   // (E - 1) / x^2
};

SheetTerms sheet_terms(double radius, double length) {
    SheetTerms t{};
    t.d = std::hypot(2.0 * radius, length);
    t.k = 2.0 * radius / t.d;
    t.x = length / t.d;
    if (!(t.x > 0.0)) raise_domain_error("length is too small against the radius (below 1e-300 of it)");
    t.k_minus_e = cel(t.x, 1.0, 0.0, 1.0);
    if (t.x < kSeriesBelow) {
        t.e_minus_1 = e_minus_one_over_x2_series(t.x);
        t.e = 1.0 + t.e_minus_1 * t.x * t.x;
    } else {
        t.e = cel(t.x, 1.0, 1.0, t.x * t.x);
        t.e_minus_1 = (t.e - 1.0) / (t.x * t.x);
    }
    return t;
}

void check_sheet(double radius, double length, double turns) {
    check::positive(radius, "radius");
    check::positive(length, "length");
    check::non_negative(turns, "turns");
}

}  // namespace

double solenoid_inductance(double radius, double length, double turns) {
    check_sheet(radius, length, turns);
    const SheetTerms t = sheet_terms(radius, length);
    const double q = t.k_minus_e + t.e_minus_1 + 1.0 / (1.0 + t.k);
    return check::finite_result(kMu0 * turns * turns * t.d * (t.k * t.k) * q / 3.0, "the inductance");
}

double nagaoka_coefficient(double diameter_over_length) {
    check::positive(diameter_over_length, "diameter / length");
    const SheetTerms t = sheet_terms(0.5 * diameter_over_length, 1.0);
    const double q = t.k_minus_e + t.e_minus_1 + 1.0 / (1.0 + t.k);
    return 4.0 * t.x * q / (3.0 * kPi);
}

double solenoid_inductance_radius_slope(double radius, double length, double turns) {
    check_sheet(radius, length, turns);
    const SheetTerms t = sheet_terms(radius, length);
    const double k = t.k, x2 = t.x * t.x;
    const double bracket = t.e + t.e_minus_1 * (3.0 - x2) + k * k / (1.0 + k) + x2 * (k + 2.0) / ((1.0 + k) * (1.0 + k));
    return check::finite_result(2.0 / 3.0 * kMu0 * turns * turns * k * bracket, "dL/da");
}

double solenoid_mean_pressure(double radius, double length, double turns, double current) {
    check::finite(current, "current");
    const double slope = solenoid_inductance_radius_slope(radius, length, turns);
    // (I^2 / 2) dL/da over 2 pi a l, ordered to avoid overflow of I^2 where possible.
    const double p = (0.5 * current) * (current * (slope / (2.0 * kPi * radius * length)));
    return check::finite_result(p, "the pressure");
}

}  // namespace coilwright
