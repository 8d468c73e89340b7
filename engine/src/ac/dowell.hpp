// Dowell's one-dimensional proximity-effect model and the round-wire porosity treatment.
#pragma once

namespace coilwright::internal {

// Normalised conductor thickness Delta of a layer of round wires of diameter d at pitch p
// (centre distance of neighbouring turns) and skin depth delta, after the usual porosity
// treatment: square of equal area, side h = d sqrt(pi)/2, layer porosity eta = h / p, foil of
// conductivity eta sigma: Delta = h sqrt(eta) / delta = (pi/4)^(3/4) (d / delta) sqrt(d / p).
double round_wire_delta(double diameter, double pitch, double skin_depth);

}  // namespace coilwright::internal
