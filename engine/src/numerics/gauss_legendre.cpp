#include "numerics/gauss_legendre.hpp"

#include <algorithm>
#include <cmath>

#include "coilwright/constants.hpp"
#include "numerics/policy.hpp"

namespace coilwright::internal {

namespace {

// Nodes are the roots of the Legendre polynomial P_n, found by Newton's method from the
// classical starting guesses cos(pi (i - 1/4) / (n + 1/2)); weights 2 / ((1 - x^2) P_n'(x)^2).
GaussRule build(int n) {
    GaussRule rule;
    rule.n = n;
    for (int i = 0; i < n; ++i) {
        double x = std::cos(kPi * (i + 0.75) / (n + 0.5));
        double dp = 1.0;
        // Newton converges quadratically from these guesses: a handful of steps.
        for (StepBudget budget(100, "Newton's method for the Gauss-Legendre nodes");; budget.step()) {
            double p0 = 1.0, p1 = x;
            for (int k = 2; k <= n; ++k) {
                const double p2 = ((2.0 * k - 1.0) * x * p1 - (k - 1.0) * p0) / k;
                p0 = p1;
                p1 = p2;
            }
            dp = n * (x * p1 - p0) / (x * x - 1.0);
            const double dx = p1 / dp;
            x -= dx;
            if (std::fabs(dx) <= 1e-15) break;  // the next step would change x below rounding
        }
        // Map from [-1, 1] to [0, 1]: node (1 - x) / 2 keeps the nodes increasing.
        rule.x[i] = 0.5 * (1.0 - x);
        rule.w[i] = 1.0 / ((1.0 - x * x) * dp * dp);  // = (2 / ((1 - x^2) P'^2)) / 2
    }
    return rule;
}

}  // namespace

const GaussRule& gauss_rule(int n) {
    static const std::array<GaussRule, kMaxGaussOrder + 1> rules = [] {
        std::array<GaussRule, kMaxGaussOrder + 1> all{};
        for (int k = 1; k <= kMaxGaussOrder; ++k) all[k] = build(k);
        return all;
    }();
    if (n < 1 || n > kMaxGaussOrder) raise_domain_error("Gauss-Legendre order out of range (internal)");
    return rules[n];
}

namespace {

template <unsigned N>
SymmetricGaussRule from_tables() {
    using Rule = boost::math::quadrature::gauss<double, N>;
    const auto& abscissa = Rule::abscissa();
    const auto& weights = Rule::weights();
    SymmetricGaussRule out;
    std::size_t i = 0;
    if constexpr (N % 2 == 1) {
        out.centre_weight = weights[0];  // odd rules list the centre first
        i = 1;
    }
    for (; i < abscissa.size(); ++i, ++out.pairs) {
        out.offset[static_cast<std::size_t>(out.pairs)] = abscissa[i];
        out.weight[static_cast<std::size_t>(out.pairs)] = weights[i];
    }
    return out;
}

// From gauss_rule(n): node k and its mirror n - 1 - k differ from exact symmetry by a rounding.
SymmetricGaussRule from_rule(int n) {
    const GaussRule& rule = gauss_rule(n);
    SymmetricGaussRule out;
    for (int k = 0; k < n / 2; ++k, ++out.pairs) {
        out.offset[static_cast<std::size_t>(k)] = 1.0 - 2.0 * rule.x[static_cast<std::size_t>(k)];
        out.weight[static_cast<std::size_t>(k)] = 2.0 * rule.w[static_cast<std::size_t>(k)];
    }
    if (n % 2 == 1) out.centre_weight = 2.0 * rule.w[static_cast<std::size_t>(n / 2)];
    return out;
}

}  // namespace

const SymmetricGaussRule& symmetric_gauss_rule(int points) {
    constexpr int kMinNodes = 7;
    static const std::array<SymmetricGaussRule, kMaxGaussOrder + 1> exact = [] {
        std::array<SymmetricGaussRule, kMaxGaussOrder + 1> all{};
        for (int n = kMinNodes; n <= kMaxGaussOrder; ++n) all[static_cast<std::size_t>(n)] = from_rule(n);
        return all;
    }();
    static const SymmetricGaussRule rule25 = from_tables<25>(), rule30 = from_tables<30>();
    if (points <= kMaxGaussOrder) return exact[static_cast<std::size_t>(std::max(points, kMinNodes))];
    return points <= 25 ? rule25 : rule30;
}

}  // namespace coilwright::internal
