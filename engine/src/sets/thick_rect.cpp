// Field of a thick rectangular winding: N turns spread uniformly over a cross-section of
// depth D (across the sides) and breadth W (along the axis). The turn at offset s from the
// mean turn, t along the axis, is a rectangle of width w + 2s and height h + 2s (sharp
// corners) in the plane z = t; the field is the closed-form filament field (rect.hpp)
// averaged over s in [-D/2, D/2] and t in [-W/2, W/2] by adaptive cubature. Inside the
// winding exactly one turn passes through the point (s*, t*); the cubature starts split there,
// so the integrable 1/distance singularity sits at box corners, where refinement handles it.
// D = 0 is a rectangular current sheet, W = 0 a flat rectangular spiral: their own surface
// is singular (the field jumps across it) and is an error, as for the coaxial sheet and spiral.
#include <algorithm>
#include <cmath>

#include "box_cubature.hpp"
#include "coil_kernels.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/rect.hpp"

namespace coilwright::sets_detail {

namespace {
constexpr int kOrder = 6;
constexpr double kRelTol = 1e-13;
constexpr double kFallbackTol = 1e-10;  // accepted only when the budget of splits is spent
constexpr int kMaxSplits = 3000;
}  // namespace

Eigen::Vector3d thick_rect_field_local(const SetCoil& coil, const Eigen::Vector3d& p) {
    const double w = coil.size, h = coil.height, D = coil.depth, W = coil.breadth;
    // The turn whose perimeter passes over the point: offsets from the mean turn's sides.
    const double s_star = std::max(std::fabs(p.x()) - 0.5 * w, std::fabs(p.y()) - 0.5 * h);
    const double t_star = p.z();
    const bool on_span_s = std::fabs(s_star) <= 0.5 * D, on_span_t = std::fabs(t_star) <= 0.5 * W;
    if (D == 0.0 && s_star == 0.0 && on_span_t)
        throw SingularPointError("the point lies on the rectangular current sheet (the field jumps across it)");
    if (W == 0.0 && t_star == 0.0 && on_span_s)
        throw SingularPointError("the point lies on the flat rectangular winding (the field jumps across it)");
    auto unit_turn = [&](double s, double t) {
        return rect_field({w + 2.0 * s, h + 2.0 * s, 1.0, 1.0}, {p.x(), p.y(), p.z() - t});
    };
    BoxCubature<decltype(unit_turn)> cubature(unit_turn, kOrder);
    const CubatureResult r =
        cubature.integrate({-0.5 * D, 0.5 * D}, {-0.5 * W, 0.5 * W}, s_star, t_star, kRelTol, kFallbackTol, kMaxSplits);
    const double area = (D == 0.0 ? 1.0 : D) * (W == 0.0 ? 1.0 : W);
    return (coil.turns * coil.current / area) * r.integral;
}

}  // namespace coilwright::sets_detail
