#include "ac/kelvin.hpp"

#include <cmath>
#include <complex>

#include "numerics/checks.hpp"
#include "numerics/policy.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"

namespace coilwright::internal {

namespace {

using Complex = std::complex<double>;

constexpr double kSqrtHalf = 0.70710678118654752440084436210484903928;
constexpr int kMaxSeriesTerms = 200;
constexpr int kMaxAsymptoticTerms = 100;

// Ascending series, A&S 9.9.10 (ber, bei) and their term-by-term derivatives. With u = x^2/4
// and t_j = u^j / (j!)^2: ber = t0 - t2 + t4 - ..., bei = t1 - t3 + t5 - ...; with
// w_j = u^(j-1) / (j! (j-1)!): ber' = (x/2)(-w2 + w4 - ...), bei' = (x/2)(w1 - w3 + ...).
// Summed in long double: the alternating terms grow to e^{0.29 x} times the result.
Kelvin0 ascending_series(double x) {
    const long double u = static_cast<long double>(x) * x / 4.0L;
    long double t = 1.0L;  // t_0
    long double w = 1.0L;  // w_1
    long double ber = 1.0L, bei = 0.0L, dber = 0.0L, dbei = 0.0L;
    const long double root_u = std::sqrt(u);
    StepBudget budget(kMaxSeriesTerms, "the Kelvin-function series");
    for (int j = 1;; ++j, budget.step()) {
        t *= u / (static_cast<long double>(j) * j);
        if (j >= 2) w *= u / (static_cast<long double>(j) * (j - 1));
        const bool plus = (j % 4 == 0) || (j % 4 == 1);
        const long double st = plus ? t : -t;
        const long double sw = plus ? w : -w;
        if (j % 2 == 0) {
            ber += st;
            dber += sw;
        } else {
            bei += st;
            dbei += sw;
        }
        // Past the largest term the terms fall; |ber + i bei| >= 1 and the derivative series
        // starts at 1, so an absolute bound on the terms is a relative one on the results.
        if (j > root_u && t < 1e-21L && w < 1e-21L) {
            const long double half_x = x / 2.0L;
            return {static_cast<double>(ber), static_cast<double>(bei), static_cast<double>(half_x * dber),
                    static_cast<double>(half_x * dbei), 0.0};
        }
    }
}

// Hankel's sums P(+-) = sum_k (+-i)^k a_k(nu) / q^k, a_k = a_(k-1) (4 nu^2 - (2k-1)^2) / (8k)
// (DLMF 10.17.1), summed until the terms fall below 1e-17 of the sum; an asymptotic series
// whose terms turn to grow before that has no answer here (ConvergenceError, as is running out
// of its step budget).
Complex hankel_sum(int nu, Complex q, double sign) {
    const double mu = 4.0 * nu * nu;
    const Complex step = Complex(0.0, sign) / q;
    Complex term = 1.0, sum = 1.0;
    double previous = 1.0;
    StepBudget budget(kMaxAsymptoticTerms, "the Kelvin-function asymptotic series");
    for (int k = 1;; ++k, budget.step()) {
        const double odd = 2.0 * k - 1.0;
        term *= step * ((mu - odd * odd) / (8.0 * k));
        sum += term;
        const double size = std::abs(term);
        if (size <= 1e-17 * std::abs(sum)) return sum;
        if (size > previous) raise_no_convergence("the Kelvin-function asymptotic series");
        previous = size;
    }
}

// e^{i x/sqrt2} with the phase carried to twice double precision: x/sqrt2 = hi + lo exactly to
// ~1e-32 relative, so the functions keep full accuracy where the phase is thousands of radians.
Complex rotation_by_x_over_sqrt2(double x) {
    constexpr double kHi = 0.70710678118654757;  // 1/sqrt2 rounded to double
    constexpr double kLo = -4.8336466567264565e-17;  // 1/sqrt2 - kHi (mpmath)
    const double hi = x * kHi;
    const double lo = std::fma(x, kHi, -hi) + x * kLo;
    return std::polar(1.0, hi) * Complex(std::cos(lo), std::sin(lo));
}

// J_nu(q) e^{-x/sqrt2} at q = x e^{3 pi i/4} from H1 and H2 (DLMF 10.17.3/10.17.4), scaled:
// e^{-i q} e^{-x/sqrt2} = e^{i x/sqrt2} and e^{i q} e^{-x/sqrt2} = e^{-sqrt2 x} e^{-i x/sqrt2}.
// `turn` is e^{i x/sqrt2}, shared by both orders so their relative phase is exact.
Complex scaled_bessel_j(int nu, double x, Complex q, Complex turn) {
    const Complex pre = std::sqrt(2.0 / (kPi * q));
    const Complex offset = std::polar(1.0, nu * kHalfPi + 0.25 * kPi);  // e^{i (nu pi/2 + pi/4)}
    const Complex h2 = pre * turn * offset * hankel_sum(nu, q, -1.0);
    const Complex h1 = pre * std::exp(-2.0 * kSqrtHalf * x) * std::conj(turn * offset) * hankel_sum(nu, q, 1.0);
    return 0.5 * (h1 + h2);
}

Kelvin0 asymptotic(double x) {
    const Complex rotation(-kSqrtHalf, kSqrtHalf);  // e^{3 pi i/4}
    const Complex q = x * rotation;
    const Complex turn = rotation_by_x_over_sqrt2(x);
    const Complex j0 = scaled_bessel_j(0, x, q, turn);
    const Complex derivative = -rotation * scaled_bessel_j(1, x, q, turn);
    return {j0.real(), j0.imag(), derivative.real(), derivative.imag(), x * kSqrtHalf};
}

}  // namespace

Kelvin0 kelvin0(double x) {
    check::non_negative(x, "Kelvin-function argument");
    return x <= kKelvinSeriesLimit ? ascending_series(x) : asymptotic(x);
}

double round_wire_resistance_ratio(double x) {
    check::non_negative(x, "x");
    // 1 + x^4/192 + O(x^8) (the series of the ratio); below 1e-3 the next term is under 1e-27.
    if (x < 1e-3) return 1.0 + x * x * x * x / 192.0;
    const Kelvin0 k = kelvin0(x);
    // A phase-free combination of J0 and J1, so a common rounding of the phase cancels.
    const double numerator = k.ber * k.dbei - k.bei * k.dber;
    const double denominator = k.dber * k.dber + k.dbei * k.dbei;
    return check::finite_result(0.5 * x * (numerator / denominator), "AC resistance ratio");
}

}  // namespace coilwright::internal
