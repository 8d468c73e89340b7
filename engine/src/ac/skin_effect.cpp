// Skin depth and the skin-effect resistance ratio of an isolated round wire.
#include <cmath>

#include "ac/kelvin.hpp"
#include "coilwright/ac.hpp"
#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"

namespace coilwright {

using namespace internal;

double skin_depth(double frequency, Conductor c, double temperature_c) {
    const double rho = resistivity(c, temperature_c);
    if (!(std::isfinite(frequency) && frequency > 0.0))
        throw DomainError("frequency must be a finite number > 0 (at 0 Hz the skin depth is infinite)");
    return check::finite_result(std::sqrt(rho / (kPi * frequency * kMu0)), "skin depth");
}

double wire_rac_ratio(double diameter, double frequency, Conductor c, double temperature_c) {
    check::positive(diameter, "diameter");
    check::non_negative(frequency, "frequency");
    const double rho = resistivity(c, temperature_c);
    if (frequency == 0.0) return 1.0;
    // x = sqrt2 a / delta = d / (sqrt2 delta) = d sqrt(pi f mu0 / (2 rho)).
    const double x = diameter * std::sqrt(kPi * frequency * kMu0 / (2.0 * rho));
    return internal::round_wire_resistance_ratio(check::finite_result(x, "diameter / skin depth"));
}

}  // namespace coilwright
