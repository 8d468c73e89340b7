// Averages of a coaxial-filament kernel over two winding cross-sections (internal).
//
// With uniform current density, the mutual inductance of two windings is the average of
// Maxwell's filament formula M(r1, r2, u) over r1 in winding 1's radial extent, r2 in winding
// 2's, and u = z2 - z1, whose weight (the convolution of the two axial extents) is a trapezoid.
// The kernel is singular only where the filaments coincide (r1 = r2, u = 0), like the
// logarithm of the distance: integrable, but fatal to plain Gauss rules. See
// winding_integral.cpp for how the cross-sections are cut so that this set always lies on an
// edge or corner of the integration box, and how boxes are refined towards it.
#pragma once

#include <array>

namespace coilwright::internal {

// A radial extent lo..hi with uniform weight 1 / (hi - lo); lo == hi is a single radius.
struct RadialExtent {
    double lo, hi;
};

// Weight of the axial offset u, folded onto u >= 0 (the kernels are even or odd in u).
struct OffsetWeights {
    struct Piece {
        double lo, hi;        // 0 <= lo < hi
        double w_lo, w_hi;    // weight, linear from w_lo at lo to w_hi at hi
    };
    struct Point {
        double u;             // >= 0
        double mass;
    };
    std::array<Piece, 12> pieces{};
    int piece_count = 0;
    std::array<Point, 4> points{};
    int point_count = 0;

    // A linear weight on lo..hi (any sign of u). `parity` is +1 for a kernel even in u and -1
    // for an odd one: the part at negative u is reflected with this sign.
    void add_piece(double lo, double hi, double w_lo, double w_hi, int parity);
    void add_point(double u, double mass, int parity);
};

// The weight of u = z2 - z1 for windings of lengths h1, h2 (either may be 0) whose centres are d
// apart: a point, a box, or a trapezoid; each piece carries its true share even where the
// lengths are below the rounding of d.
OffsetWeights winding_offsets(double h1, double h2, double d, int parity);

enum class FilamentKernel {
    Mutual,  // M(r1, r2, u)
    Slope,   // dM/du (r1, r2, u)
};

// Integral over r1 and r2 (uniform weights) and over u (the given weights) of the kernel.
// Throws SingularPointError when the result is infinite (coincident filaments carry weight),
// ConvergenceError if the work bound is exceeded.
double average_over_sections(RadialExtent r1, RadialExtent r2, const OffsetWeights& u, FilamentKernel kernel);

}  // namespace coilwright::internal
