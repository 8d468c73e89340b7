#include <algorithm>
#include <cmath>
#include <string>

#include "coilwright/design/higher_order.hpp"
#include "field/axial_jet.hpp"
#include "numerics/checks.hpp"
#include "numerics/policy.hpp"

namespace coilwright {

using namespace internal;

namespace {

// Distance from the point z0 on the axis to the nearest point of any row's winding: the
// radius of convergence of the axial field's Taylor series there (its nearest singularity).
double convergence_radius(const CoilTable& table, double z0) {
    double rho = HUGE_VAL;
    for (const CoilRow& row : table.rows()) {
        const double dz = std::max(0.0, std::fabs(row.centre_z - z0) - row.length / 2.0);
        rho = std::min(rho, std::hypot(row.inner_radius, dz));
    }
    return rho;
}

}  // namespace

int design_order(const CoilTable& table, double z0) {
    check::finite(z0, "z0");
    if (table.size() == 0) raise_domain_error("the table has no coils");
    const double rho = convergence_radius(table, z0);
    const Jet<kDesignJetSize> jet = axial_jet_n<kDesignJetSize>(table, z0);
    double scaled[kDesignJetSize];
    double largest = 0.0;
    for (std::size_t k = 0; k < kDesignJetSize; ++k) {
        scaled[k] = std::fabs(jet.c[k]) * std::pow(rho, static_cast<double>(k));
        if (!std::isfinite(scaled[k])) raise_singular_point("the axial field's derivatives are not finite here");
        largest = std::max(largest, scaled[k]);
    }
    if (largest == 0.0) raise_domain_error("the field and all its axial derivatives vanish here");
    const double threshold = 1e-8 * largest;
    int lowest = -1;
    for (std::size_t k = 0; k < kDesignJetSize; ++k) {
        if (scaled[k] <= threshold) continue;
        if (lowest < 0) {
            lowest = static_cast<int>(k);
            continue;
        }
        return static_cast<int>(k);
    }
    raise_domain_error("no derivative after order " + std::to_string(lowest) +
                       " is above 1e-8 of the largest up to order " + std::to_string(kMaxDesignOrder) +
                       ": the design is better than this function can tell");
}

}  // namespace coilwright
