// Unchecked kernels shared by the inductance and force code: coaxial filaments of radii r1 and
// r2 (m) at axial offset u (m). `diff` = r1 - r2 must be passed exactly (computed from the
// quantities the caller integrates over), so that near-coincident filaments keep precision.
#pragma once

namespace coilwright::internal {

// Maxwell's mutual inductance (H). Throws SingularPointError when the filaments coincide.
double filament_mutual(double r1, double r2, double diff, double u);

// dM/du (H/m). Throws SingularPointError when the filaments coincide.
double filament_mutual_slope(double r1, double r2, double diff, double u);

}  // namespace coilwright::internal
