// Root finding and minimisation with their iteration counts checked: Boost.Math's TOMS 748 and
// Brent report how many iterations they used and return their best guess silently when the
// budget runs out; these wrappers turn that into the engine's ConvergenceError.
#pragma once

#include <boost/math/tools/minima.hpp>
#include <boost/math/tools/roots.hpp>
#include <cmath>
#include <cstdint>
#include <stdexcept>
#include <string>
#include <utility>

#include "numerics/policy.hpp"

namespace coilwright::internal {

inline constexpr std::uintmax_t kMaxRootIterations = 100;

// The root of f in [lo, hi], where f(lo) and f(hi) have opposite signs, to within `bits`
// binary digits: the midpoint of the final bracket.
template <class F>
double bracketed_root(F&& f, double lo, double hi, double f_lo, double f_hi, const char* what, int bits = 50) {
    if (f_lo == 0.0) return lo;
    if (f_hi == 0.0) return hi;
    // Boost.Math reports an unbracketed root by throwing its own error: refused here first.
    if (!(std::signbit(f_lo) != std::signbit(f_hi) && std::isfinite(f_lo) && std::isfinite(f_hi)))
        raise_no_convergence(std::string(what) + ": no sign change to refine");
    std::uintmax_t iterations = kMaxRootIterations;
    std::pair<double, double> bracket;
    try {
        bracket = boost::math::tools::toms748_solve(f, lo, hi, f_lo, f_hi, boost::math::tools::eps_tolerance<double>(bits),
                                                    iterations);
    } catch (const std::domain_error&) {  // NaN met inside the bracket
        raise_no_convergence(std::string(what) + " met a value that is not a number");
    }
    if (iterations >= kMaxRootIterations) raise_no_convergence(std::string(what) + " did not converge");
    return 0.5 * (bracket.first + bracket.second);
}

template <class F>
double bracketed_root(F&& f, double lo, double hi, const char* what, int bits = 50) {
    return bracketed_root(f, lo, hi, f(lo), f(hi), what, bits);
}

// The minimum of f on [lo, hi] (Brent's method): {abscissa, value}.
template <class F>
std::pair<double, double> bracketed_minimum(F&& f, double lo, double hi, const char* what, int bits = 40) {
    if (!(std::isfinite(lo) && std::isfinite(hi) && lo < hi)) raise_no_convergence(std::string(what) + ": empty interval");
    std::uintmax_t iterations = kMaxRootIterations;
    const auto found = boost::math::tools::brent_find_minima(f, lo, hi, bits, iterations);
    if (iterations >= kMaxRootIterations) raise_no_convergence(std::string(what) + " did not converge");
    return found;
}

}  // namespace coilwright::internal
