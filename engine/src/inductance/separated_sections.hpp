// Averages of a coaxial-filament kernel over two winding cross-sections that keep a gap
// (internal): one tensor Gauss-Legendre rule, no refinement.
//
// Where the cross-sections are apart, the kernel is analytic over the whole integration box and
// a product rule converges geometrically. It sums weighted values of the filament kernel (loop
// fields from the vectorised batch), so it keeps its digits where the closed-form corner sums of
// thick_pair.cpp cancel (coils far apart compared with their windings' sizes), and it costs
// least there: the farther apart, the fewer nodes.
#pragma once

#include <optional>

#include "inductance/section_integral.hpp"

namespace coilwright::internal {

// The gap between the cross-sections: radial and axial separation combined (> 0 here), and the
// radial separation alone (>= 0).
struct SectionGap {
    double total, radial;
};

// The same average as average_over_sections. Returns nothing when the rule would need more than
// `max_evaluations` kernel values (cross-sections close compared with their size): the caller
// then takes another method.
std::optional<double> average_over_separated_sections(RadialExtent r1, RadialExtent r2, const OffsetWeights& u,
                                                      FilamentKernel kernel, SectionGap gap, int max_evaluations);

}  // namespace coilwright::internal
