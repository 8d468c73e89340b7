// Root finding and minimisation with their iteration counts checked: Boost.Math's TOMS 748 and
// Brent report how many iterations they used and return their best guess silently when the
// budget runs out; these wrappers turn that into the engine's ConvergenceError.
#pragma once

#include <boost/math/tools/minima.hpp>
#include <boost/math/tools/roots.hpp>
#include <cstdint>
#include <string>
#include <utility>

#include "numerics/policy.hpp"

namespace coilwright::internal {

inline constexpr std::uintmax_t kMaxRootIterations = 100;

// The root of f in [lo, hi], where f(lo) and f(hi) have opposite signs, to within `bits`
// binary digits: the midpoint of the final bracket.
template <class F>
double bracketed_root(F&& f, double lo, double hi, double f_lo, double f_hi, const char* what, int bits = 50) {
    std::uintmax_t iterations = kMaxRootIterations;
    const auto [a, b] = boost::math::tools::toms748_solve(f, lo, hi, f_lo, f_hi,
                                                          boost::math::tools::eps_tolerance<double>(bits), iterations);
    if (iterations >= kMaxRootIterations) raise_no_convergence(std::string(what) + " did not converge");
    return 0.5 * (a + b);
}

template <class F>
double bracketed_root(F&& f, double lo, double hi, const char* what, int bits = 50) {
    return bracketed_root(f, lo, hi, f(lo), f(hi), what, bits);
}

// The minimum of f on [lo, hi] (Brent's method): {abscissa, value}.
template <class F>
std::pair<double, double> bracketed_minimum(F&& f, double lo, double hi, const char* what, int bits = 40) {
    std::uintmax_t iterations = kMaxRootIterations;
    const auto found = boost::math::tools::brent_find_minima(f, lo, hi, bits, iterations);
    if (iterations >= kMaxRootIterations) raise_no_convergence(std::string(what) + " did not converge");
    return found;
}

}  // namespace coilwright::internal
