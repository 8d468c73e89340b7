// Field of a rectangular loop: four straight segments, each by Biot-Savart in closed form.
//
// A straight segment with current I gives at P
//   B = mu0 I / (4 pi) * (e x r1) * F(d^2),   F = (t1/R1 - t2/R2) / d^2,
// with e the unit vector along the current, r1 the vector from the segment's start to P,
// t1 > t2 the signed distances along e from the two ends to P (t1 - t2 = L), d the distance
// from the segment's line and R1, R2 the distances to the ends: the textbook
// (cos a1 - cos a2) / d form. Beside the segment (t1 > 0 > t2) both terms add. Beyond an end
// they nearly cancel; there the same F is written without subtraction as
//   F = L (t1 + t2) / H,   H = R1 R2 (t1 R2 + t2 R1),
// which also stays finite on the line of the segment (d = 0), where e x r1 = 0.
//
// Opposite sides of the rectangle are taken in pairs: they share t1, t2 and differ only in
// d^2. Summed naively, their fields cancel near the axis (Bx, By ~ distance from the axis) and
// far away (each side ~ 1/R^2, the loop ~ 1/R^3). So each pair is evaluated from F at the two
// distances and the divided difference [F] = (F(d1^2) - F(d2^2)) / (d1^2 - d2^2), itself
// computed without subtraction ([1/R] = -1/(Ra Rb (Ra + Rb)), [R] = 1/(Ra + Rb) and a symmetric
// product rule). With the half sides a, b and coordinates scaled by the half-diagonal:
//   Bx = -4 a x z [F]_y,   By = -4 b y z [F]_x,
// and for Bz the form that adds terms of one sign: inside the strip between two sides the plain
// sum, outside it the far side's field plus a divided-difference correction. Offsets from the
// sides are formed in metres before scaling, so points near a side keep their precision, and
// mirror-image points give bitwise mirror-image fields (exact zeros on the symmetry planes).
// Beyond 1e30 half-diagonals the loop is a point dipole to within 1e-60 and is evaluated so.
#include "coilwright/field/rect.hpp"

#include <cmath>
#include <utility>

#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "field/rect_kernel.hpp"

namespace coilwright {

using namespace internal;

void validate(const RectSpec& rect) {
    check::positive(rect.width, "width");
    check::positive(rect.height, "height");
    check::turns_and_current(rect.turns, rect.current);
}

namespace {

// Beyond this distance (in half-diagonals) the loop is evaluated as a point dipole.
constexpr double kPointDipole = 1e30;

[[noreturn]] void on_filament() {
    raise_singular_point("the point lies on a side of the rectangle (the current filament)");
}

// [R Q^2] for R, Q = sqrt(t^2 + d) at the two distances a, b ([R] = 1/(Ra + Rb), [Q^2] = 1),
// by the symmetric product rule [uv] = ([u](va + vb) + (ua + ub)[v]) / 2.
double mixed(double ra, double rb, double qa, double qb) {
    return 0.5 * ((qa * qa + qb * qb) / (ra + rb) + (ra + rb));
}

struct SidePair {
    double f1, f2;  // F at the two squared distances
    double dd;      // [F], the divided difference between them (< 0: F falls with distance)
};

// F for two parallel sides of length len with the same end coordinates t1 > t2 at squared
// distances d1, d2. The length is passed, not formed as t1 - t2, which far away would cancel.
SidePair side_pair(double t1, double t2, double len, double d1, double d2) {
    const bool swapped = d1 > d2;  // a fixed order makes the result symmetric bit for bit
    if (swapped) std::swap(d1, d2);
    const double r1a = std::sqrt(t1 * t1 + d1), r1b = std::sqrt(t1 * t1 + d2);
    const double r2a = std::sqrt(t2 * t2 + d1), r2b = std::sqrt(t2 * t2 + d2);
    SidePair out{};
    if (t1 > 0.0 && t2 < 0.0) {
        if (d1 == 0.0) on_filament();
        const double ga = t1 / r1a - t2 / r2a, gb = t1 / r1b - t2 / r2b;  // both terms positive
        const double dg = -t1 / (r1a * r1b * (r1a + r1b)) + t2 / (r2a * r2b * (r2a + r2b));  // both negative
        out = {ga / d1, gb / d2, (d1 * dg - ga) / (d1 * d2)};
    } else {
        if (r1a == 0.0 || r2a == 0.0) on_filament();  // an end point: a corner
        const double sum = t1 + t2;
        const double ha = r1a * r2a * (t1 * r2a + t2 * r1a), hb = r1b * r2b * (t1 * r2b + t2 * r1b);
        const double dh = t1 * mixed(r1a, r1b, r2a, r2b) + t2 * mixed(r2a, r2b, r1a, r1b);  // one sign
        out = {len * sum / ha, len * sum / hb, -len * sum * dh / (ha * hb)};
    }
    if (swapped) std::swap(out.f1, out.f2);
    return out;
}

// The axial field of two opposite sides, p F_a - m F_b, with p and m the point's coordinate
// plus and minus the half-size `half` across them: written so that its terms share one sign
// whichever side of the pair the point lies (the plain form cancels outside the rectangle).
double opposite_sides(double p, double m, double f_a, double f_b, double half, double coord, double dd) {
    if (p > 0.0 && m < 0.0) return p * f_a - m * f_b;
    if (m >= 0.0) return 2.0 * half * f_a + 4.0 * coord * half * m * dd;
    return 2.0 * half * f_b + 4.0 * coord * half * p * dd;
}

// Field in units of mu0 I / (4 pi s) from coordinates in units of s (the half-diagonal):
// x, y, z and the offsets xm = x - a, xp = x + a, ym = y - b, yp = y + b.
Eigen::Vector3d segments(double a, double b, double x, double y, double z, double xm, double xp, double ym,
                         double yp) {
    const double z2 = z * z;
    // Sides along x: bottom (y = -b, current +x) and top (y = +b, current -x).
    const SidePair sx = side_pair(xp, xm, 2.0 * a, yp * yp + z2, ym * ym + z2);
    // Sides along y: right (x = +a, current +y) and left (x = -a, current -y).
    const SidePair sy = side_pair(yp, ym, 2.0 * b, xm * xm + z2, xp * xp + z2);
    const double f_bottom = sx.f1, f_top = sx.f2, f_right = sy.f1, f_left = sy.f2;

    const double bz_x = opposite_sides(yp, ym, f_bottom, f_top, b, y, sx.dd);  // yp F_bottom - ym F_top
    const double bz_y = opposite_sides(xp, xm, f_left, f_right, a, x, sy.dd);    // xp F_left - xm F_right
    return {-4.0 * a * x * z * sy.dd, -4.0 * b * y * z * sx.dd, bz_x + bz_y};
}

double distance(const Eigen::Vector3d& p) { return std::hypot(std::hypot(p.x(), p.y()), p.z()); }

}  // namespace

namespace internal {

Eigen::Vector3d rect_field_scaled(double a, double b, const Eigen::Vector3d& p) {
    return segments(a, b, p.x(), p.y(), p.z(), p.x() - a, p.x() + a, p.y() - b, p.y() + b);
}

}  // namespace internal

Eigen::Vector3d rect_field(const RectSpec& rect, const Eigen::Vector3d& point) {
    validate(rect);
    for (int k = 0; k < 3; ++k) check::finite(point[k], k == 0 ? "x" : k == 1 ? "y" : "z");
    const double hw = 0.5 * rect.width, hh = 0.5 * rect.height;
    const double s = std::hypot(hw, hh);  // half-diagonal: the unit of length below
    const double a = hw / s, b = hh / s;
    const double scale = kMu0 * rect.turns * rect.current / (4.0 * kPi * s);

    const double r = distance(point) / s;
    Eigen::Vector3d unit;
    if (r >= kPointDipole) {
        // m = I w h = 4 a b s^2 I; formed from ratios so that nothing overflows early.
        const Eigen::Vector3d n = point / distance(point);
        const Eigen::Vector3d shape(3.0 * n.z() * n.x(), 3.0 * n.z() * n.y(), 3.0 * n.z() * n.z() - 1.0);
        unit = (4.0 * a * b) * (shape / r) / r / r;
    } else {
        unit = segments(a, b, point.x() / s, point.y() / s, point.z() / s, (point.x() - hw) / s,
                        (point.x() + hw) / s, (point.y() - hh) / s, (point.y() + hh) / s);
    }
    const Eigen::Vector3d field = scale * unit;
    check::finite_result(field.x(), "Bx");
    check::finite_result(field.y(), "By");
    check::finite_result(field.z(), "Bz");
    return field;
}

Eigen::Vector3d rect_pair_field(const RectSpec& rect, double spacing, const Eigen::Vector3d& point) {
    validate(rect);
    check::positive(spacing, "spacing");
    for (int k = 0; k < 3; ++k) check::finite(point[k], k == 0 ? "x" : k == 1 ? "y" : "z");
    const double half = 0.5 * spacing;
    const Eigen::Vector3d lower = rect_field(rect, {point.x(), point.y(), point.z() + half});
    const Eigen::Vector3d upper = rect_field(rect, {point.x(), point.y(), point.z() - half});
    const Eigen::Vector3d field = lower + upper;
    for (int k = 0; k < 3; ++k) check::finite_result(field[k], "B");
    return field;
}

}  // namespace coilwright
