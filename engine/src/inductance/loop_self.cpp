// Self-inductance of a circular ring of round wire, uniform current (low frequency).
//
// For uniform current density the inductance is the average of the filament mutual
// inductance over pairs of points of the wire's cross-section. Averaging Maxwell's series for
// nearby coaxial circles (radii a and a + c at axial distance b, r^2 = b^2 + c^2):
//   M = mu0 a [ ln(8a/r) (1 + c/2a + (c^2 + 3b^2)/16a^2) - 2 - c/2a + (3c^2 - b^2)/16a^2 + ... ]
// over a disc of radius rho, using the geometric mean distance of a disc from itself
// (ln GMD = ln rho - 1/4) and the second moments of ln r over the disc, gives
//   L = mu0 a [ (1 + rho^2/8a^2) ln(8a/rho) - 7/4 + rho^2/24a^2 ] + O(rho^4 ln rho / a^3).
// The first two terms are the classical thin-ring formula (Rosa and Grover 1912; Grover 1946);
// the rho^2 terms are our derivation, confirmed by direct quadrature
// (tests/reference/generate_ring_reference.py).
#include <cmath>

#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/inductance/self.hpp"

namespace coilwright {

using namespace internal;

double loop_self_inductance(double radius, double wire_diameter, double turns) {
    check::positive(radius, "radius");
    check::positive(wire_diameter, "wire diameter");
    check::non_negative(turns, "turns");
    if (wire_diameter > radius)
        raise_domain_error("wire diameter must not exceed the loop radius (thin-ring formula)");
    const double rho = 0.5 * wire_diameter / radius;  // wire radius in units of the loop radius
    const double log_term = std::log(8.0 / rho);
    const double per_radius = (1.0 + rho * rho / 8.0) * log_term - 1.75 + rho * rho / 24.0;
    return check::finite_result(kMu0 * radius * turns * turns * per_radius, "the inductance");
}

}  // namespace coilwright
