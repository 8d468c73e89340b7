// Dowell's factor for m layers in a one-dimensional field, evaluated without cancellation.
#include "ac/dowell.hpp"

#include <cmath>

#include "coilwright/ac.hpp"
#include "numerics/checks.hpp"
#include "numerics/policy.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"

namespace coilwright {

using namespace internal;

namespace {

// sinh x - sin x = 2 (x^3/3! + x^7/7! + x^11/11! + ...), for 0 <= x < 1 (no cancellation).
double sinh_minus_sin(double x) {
    const double x4 = x * x * x * x;
    double term = x * x * x / 6.0, sum = term;
    StepBudget budget(30, "the series of sinh x - sin x");
    for (int k = 1;; ++k, budget.step()) {
        term *= x4 / ((4.0 * k) * (4.0 * k + 1) * (4.0 * k + 2) * (4.0 * k + 3));
        sum += term;
        if (term <= 1e-17 * sum) return 2.0 * sum;
    }
}

// The skin term (sinh 2D + sin 2D) / (cosh 2D - cos 2D) and the proximity term
// (sinh D - sin D) / (cosh D + cos D) of Dowell's factor.
struct DowellTerms {
    double skin;
    double proximity;
};

DowellTerms dowell_terms(double d) {
    if (d < 1.0) {
        // cosh 2D - cos 2D = 2 (sinh^2 D + sin^2 D): a sum, where the difference would cancel.
        const double sh = std::sinh(d), s = std::sin(d);
        return {(std::sinh(2.0 * d) + std::sin(2.0 * d)) / (2.0 * (sh * sh + s * s)),
                sinh_minus_sin(d) / (std::cosh(d) + std::cos(d))};
    }
    // Divided by cosh, so nothing overflows (1/cosh becomes 0 for large D).
    const double c2 = std::cosh(2.0 * d), c1 = std::cosh(d);
    return {(std::tanh(2.0 * d) + std::sin(2.0 * d) / c2) / (1.0 - std::cos(2.0 * d) / c2),
            (std::tanh(d) - std::sin(d) / c1) / (1.0 + std::cos(d) / c1)};
}

}  // namespace

double dowell_factor(double delta_norm, double layers) {
    check::non_negative(delta_norm, "normalised layer thickness");
    if (!(std::isfinite(layers) && layers >= 1.0)) throw DomainError("layers must be a finite number >= 1");
    const double m2 = layers * layers;
    // Below 1e-4: F = 1 + (5 m^2 - 1) Delta^4 / 45 + O(m^4 Delta^8) (the factor's series).
    if (delta_norm < 1e-4) {
        const double d4 = delta_norm * delta_norm * delta_norm * delta_norm;
        return check::finite_result(1.0 + (5.0 * m2 - 1.0) * d4 / 45.0, "AC resistance ratio");
    }
    const DowellTerms t = dowell_terms(delta_norm);
    return check::finite_result(delta_norm * (t.skin + 2.0 * (m2 - 1.0) / 3.0 * t.proximity), "AC resistance ratio");
}

namespace internal {

double round_wire_delta(double diameter, double pitch, double skin_depth) {
    // (pi/4)^(3/4)
    const double k = std::pow(kPi / 4.0, 0.75);
    return k * (diameter / skin_depth) * std::sqrt(diameter / pitch);
}

}  // namespace internal

}  // namespace coilwright
