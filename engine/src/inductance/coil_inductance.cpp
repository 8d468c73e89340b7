// Mutual and self-inductance of coaxial windings, and the slope dM/dz that gives the force.
//
// The axial offset u = z2 - z1 of two points, one in each winding, is distributed as the
// convolution of the two axial extents: a point (two flat windings), a box (one flat), or a
// trapezoid rising over the shorter length, flat, and falling. The force needs
// d/dd of the average of M over that weight. Where the cross-sections are well apart (their
// separation at least a quarter of the offsets' span) the slope kernel dM/du, smooth there, is
// averaged directly. Where they are close, touch or overlap, dM/du ~ 1/distance would be
// costly or not integrable, so the derivative is moved onto the weight by parts (the
// trapezoid's slope is +-1/(h1 h2) on its ramps, a box's derivative a pair of point masses),
// which leaves only the kernel M: coinciding filaments then cost only a logarithm. (By parts is
// not used far apart, where it would subtract nearly equal averages.)
#include <algorithm>
#include <cmath>
#include <optional>
#include <string>

#include "numerics/checks.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/inductance/mutual.hpp"
#include "coilwright/inductance/self.hpp"
#include "inductance/section_integral.hpp"
#include "inductance/separated_sections.hpp"
#include "inductance/thick_pair.hpp"

namespace coilwright {

using namespace internal;

namespace {

using internal::FilamentKernel;
using internal::OffsetWeights;
using internal::RadialExtent;

constexpr int kEven = 1, kOdd = -1;

RadialExtent radial(const CoilSection& w) { return {w.inner_radius, w.outer_radius}; }

// Lengths and distances this many times the larger outer radius and more are refused: the
// cubature's accuracy falls to about 1e-8 from a thousand radii on (measured up to a million),
// and far beyond, its refinement stalls on differences that round away.
constexpr double kMaxProportion = 1e6;

void check_pair(const CoilSection& w1, const CoilSection& w2, double distance) {
    validate(w1, "coil 1 ");
    validate(w2, "coil 2 ");
    check::finite(distance, "distance");
    const double reach = std::max({w1.length, w2.length, std::fabs(distance)});
    if (reach > kMaxProportion * std::max(w1.outer_radius, w2.outer_radius))
        raise_domain_error("a length or the distance is more than a million times the larger outer radius: "
                          "outside the accurate range");
}


}  // namespace

namespace {

// Lengths in units of the larger outer radius keep every intermediate (weights 1/(h1 h2),
// products of extents) representable for coils from micrometres to kilometres and beyond.
struct Normalised {
    CoilSection w1, w2;
    double distance, scale;
};

Normalised normalise(const CoilSection& w1, const CoilSection& w2, double distance) {
    const double s = std::fmax(w1.outer_radius, w2.outer_radius);
    return {{w1.inner_radius / s, w1.outer_radius / s, w1.length / s}, {w2.inner_radius / s, w2.outer_radius / s, w2.length / s}, distance / s, s};
}

double mutual_normalised(const CoilSection& w1, const CoilSection& w2, double distance);
double slope_normalised(const CoilSection& w1, const CoilSection& w2, double distance);

}  // namespace

double coil_mutual_inductance(const CoilSection& w1, const CoilSection& w2, double distance) {
    check_pair(w1, w2, distance);
    const Normalised n = normalise(w1, w2, distance);
    // M scales like a length.
    return check::finite_result(n.scale * mutual_normalised(n.w1, n.w2, n.distance), "the mutual inductance");
}

double coil_mutual_inductance_slope(const CoilSection& w1, const CoilSection& w2, double distance) {
    check_pair(w1, w2, distance);
    const Normalised n = normalise(w1, w2, distance);
    return check::finite_result(slope_normalised(n.w1, n.w2, n.distance), "dM/dz");  // dimensionless in scale
}

namespace {

// Kernel values one product rule over separated cross-sections may take: before the closed
// forms (the rule costs 12-25 ns a value, the closed forms' corner sums 10-55 us in double:
// measured crossing near 1600 values on field-bench's pairs), and, where the corner sums would
// cancel too much in double, before their far slower extended-precision rerun.
constexpr int kCheapSeparatedEvaluations = 1600;
constexpr int kMaxSeparatedEvaluations = 3000;

// The gap between the cross-sections in the (r, z) half-plane.
internal::SectionGap section_gap(const CoilSection& w1, const CoilSection& w2, double distance) {
    const double radial = std::fmax(0.0, std::fmax(w1.inner_radius, w2.inner_radius) - std::fmin(w1.outer_radius, w2.outer_radius));
    const double axial = std::fmax(0.0, std::fabs(distance) - 0.5 * (w1.length + w2.length));
    return {std::hypot(radial, axial), radial};
}

// Both windings with area and length: the angle integral of closed forms (thick_pair.cpp) when
// its corner sums keep their digits.
bool both_thick(const CoilSection& w1, const CoilSection& w2) {
    return w1.inner_radius < w1.outer_radius && w1.length > 0.0 && w2.inner_radius < w2.outer_radius && w2.length > 0.0;
}

// The methods in order of cost for the case: the product rule where the cross-sections are well
// apart, the closed forms in double, the product rule with more nodes, the closed forms in
// extended precision where that keeps enough digits. Nothing: the refining cubature is left.
// (The rule's values cost half as much for the slope, which may take twice as many before the
// extended precision; the closed forms' corner sums cost the same for both.)
std::optional<double> fast_methods(const CoilSection& w1, const CoilSection& w2, double distance, FilamentKernel kernel,
                                   const OffsetWeights& u) {
    const bool slope = kernel == FilamentKernel::Slope;
    const int scale = slope ? 2 : 1;
    const internal::SectionGap gap = section_gap(w1, w2, distance);
    const auto separated = [&](int max_evaluations) -> std::optional<double> {
        if (!(gap.total > 0.0)) return std::nullopt;
        return internal::average_over_separated_sections(radial(w1), radial(w2), u, kernel, gap, max_evaluations);
    };
    if (const auto v = separated(kCheapSeparatedEvaluations)) return v;
    if (!both_thick(w1, w2)) return separated(scale * kMaxSeparatedEvaluations);
    const auto quantity = slope ? internal::PairQuantity::Slope : internal::PairQuantity::Mutual;
    const internal::AngleIntegral in_double =
        internal::thick_pair_angle_integral(w1, w2, distance, quantity, internal::AnglePrecision::Double);
    if (in_double.value) return in_double.value;
    if (const auto v = separated(scale * kMaxSeparatedEvaluations)) return v;
    if (!in_double.extended_may_help) return std::nullopt;
    return internal::thick_pair_angle_integral(w1, w2, distance, quantity, internal::AnglePrecision::Extended).value;
}

double mutual_normalised(const CoilSection& w1, const CoilSection& w2, double distance) {
    const OffsetWeights u = internal::winding_offsets(w1.length, w2.length, distance, kEven);
    if (const auto m = fast_methods(w1, w2, distance, FilamentKernel::Mutual, u)) return *m;
    return internal::average_over_sections(radial(w1), radial(w2), u, FilamentKernel::Mutual);
}

double slope_normalised(const CoilSection& w1, const CoilSection& w2, double distance) {
    if (distance == 0.0) {
        if (w1.length == 0.0 && w2.length == 0.0 && w1.inner_radius == w1.outer_radius &&
            w2.inner_radius == w2.outer_radius && w1.inner_radius == w2.inner_radius)
            raise_singular_point("the two loops coincide: the force between them is undefined");
        return 0.0;  // windings centred on each other: no axial force, by symmetry
    }
    if (const auto s = fast_methods(w1, w2, distance, FilamentKernel::Slope, internal::winding_offsets(w1.length, w2.length, distance, kOdd)))
        return *s;
    const internal::SectionGap gap = section_gap(w1, w2, distance);
    const double h1 = w1.length, h2 = w2.length;
    const double reach = 0.5 * (h1 + h2);  // the offsets span distance -+ reach
    const bool apart = gap.total >= 0.25 * (h1 + h2);
    double slope;
    if (h1 == 0.0 && h2 == 0.0) {
        OffsetWeights u;
        u.add_point(distance, 1.0, kOdd);
        slope = internal::average_over_sections(radial(w1), radial(w2), u, FilamentKernel::Slope);
    } else if (apart) {
        const OffsetWeights u = internal::winding_offsets(h1, h2, distance, kOdd);
        slope = internal::average_over_sections(radial(w1), radial(w2), u, FilamentKernel::Slope);
    } else {
        // By parts: d/dd of the average of M is minus the average of M against the weight's slope.
        OffsetWeights u;
        if (h1 == 0.0 || h2 == 0.0) {
            const double h = h1 + h2;
            u.add_point(distance + 0.5 * h, 1.0 / h, kEven);
            u.add_point(distance - 0.5 * h, -1.0 / h, kEven);
        } else {
            const double s = 1.0 / (h1 * h2), shorter = std::fmin(h1, h2);
            u.add_piece(distance - reach, distance - reach + shorter, -s, -s, kEven);
            u.add_piece(distance + reach - shorter, distance + reach, s, s, kEven);
        }
        slope = internal::average_over_sections(radial(w1), radial(w2), u, FilamentKernel::Mutual);
    }
    return slope;
}

}  // namespace

double coil_self_inductance(const CoilSection& shape) {
    validate(shape);
    if (shape.inner_radius == shape.outer_radius) {
        if (shape.length == 0.0)
            raise_domain_error("a loop's self-inductance depends on its wire diameter (use LOOP_L)");
        return solenoid_inductance(shape.inner_radius, shape.length, 1.0);
    }
    return coil_mutual_inductance(shape, shape, 0.0);
}

}  // namespace coilwright
