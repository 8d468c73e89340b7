// R_ac / R_dc of a layered winding of solid round wire or of litz wire (Dowell per strand layer).
#include <cmath>
#include <string>

#include "ac/dowell.hpp"
#include "coilwright/ac.hpp"
#include "numerics/checks.hpp"
#include "coilwright/errors.hpp"

namespace coilwright {

using namespace internal;

namespace {

void check_whole(double v, double minimum, const char* name) {
    if (!(std::isfinite(v) && v >= minimum && v == std::floor(v)))
        throw DomainError(std::string(name) + " must be a whole number >= " + std::to_string(static_cast<int>(minimum)));
}

}  // namespace

double coil_rac_ratio(double bare_diameter, double wire_diameter, double frequency, double layers, double strands,
                      Conductor c, double temperature_c) {
    check::positive(bare_diameter, "bare diameter");
    check::positive(wire_diameter, "wire diameter");
    check::non_negative(frequency, "frequency");
    check_whole(layers, 1.0, "layers");
    check_whole(strands, 1.0, "strands");
    if (strands > 1e6) throw DomainError("strands must be at most 1e6");
    const double across = std::sqrt(strands);  // strands across a bundle: strand layers per layer
    const double strand_pitch = wire_diameter / across;
    if (strand_pitch < bare_diameter)
        throw DomainError(strands == 1.0 ? "wire diameter (over the insulation) must be >= the bare diameter"
                                         : "the strands do not fit: n strands of diameter d need a bundle of at "
                                           "least d sqrt(n)");
    if (frequency == 0.0) {
        resistivity(c, temperature_c);  // the temperature is checked at DC too
        return 1.0;
    }
    const double delta = skin_depth(frequency, c, temperature_c);
    return dowell_factor(internal::round_wire_delta(bare_diameter, strand_pitch, delta), layers * across);
}

}  // namespace coilwright
