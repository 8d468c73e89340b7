// Closed filaments: circles and rectangles in space.
//
// Vector potential of a circle of radius a (unit current), in its own cylindrical
// coordinates: A_phi = (mu0 / (pi k)) sqrt(a / rho) [(1 - k^2/2) K - E] (W. R. Smythe, Static
// and Dynamic Electricity, 1950, sec. 7.10), k^2 = 4 a rho / beta^2, beta^2 = (a + rho)^2 + z^2.
// With (2 - k^2) K - 2E = k^2 cel(kc, 1, -1, 1) and the first Gauss step taken by hand
// (loop_mutual.cpp), A_phi / rho = 4 mu0 a^2 C / (pi beta^3), C = cel(kc, 1, -1, 1) / k^2,
// which has no cancellation near the axis or far away and no division by rho.
// Vector potential of a straight segment from P1 to P2 (unit current along e):
// A = (mu0 / 2pi) e atanh(L / (R1 + R2)) (the classical log form), with R1 + R2 - L formed
// from positive terms near the segment's line.
#include <Eigen/Geometry>
#include <cmath>

#include "box_cubature.hpp"
#include "numerics/bulirsch_cel.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "filament.hpp"
#include "numerics/policy.hpp"

namespace coilwright::internal {

Filament turn_filament(const SetCoil& coil, const CoilFrame& frame, double s, double t) {
    Filament f{coil.shape, frame, 0.0, 0.0};
    f.frame.centre = frame.centre + t * frame.n;
    if (coil.shape == SetShape::Circle) {
        f.half_u = f.half_v = coil.size + s;
    } else {
        f.half_u = 0.5 * coil.size + s;
        f.half_v = 0.5 * coil.height + s;
    }
    return f;
}

namespace {

[[noreturn]] void on_filament() { raise_singular_point("the point lies on a current filament"); }

Eigen::Vector3d circle_potential(const Filament& f, const Eigen::Vector3d& p) {
    const Eigen::Vector3d l = f.frame.to_local(p);
    const double a = f.half_u, rho = std::hypot(l.x(), l.y());
    const double alpha = std::hypot(a - rho, l.z()), beta = std::hypot(a + rho, l.z());
    if (alpha == 0.0) on_filament();
    const double kc = alpha / beta;
    const double c = CelLoop<1>::after_first_step(kc, {0.0}, {2.0 / (1.0 + kc)}).finish()[0];
    const double per_rho = 4.0 * kMu0 * (a / beta) * (a / beta) * c / (kPi * beta);
    return f.frame.to_global({-per_rho * l.y(), per_rho * l.x(), 0.0});
}

// (mu0 / 2pi) atanh(L / (R1 + R2)) along e, for the segment from p1 of length len along e.
Eigen::Vector3d segment_potential(const Eigen::Vector3d& p1, const Eigen::Vector3d& e, double len,
                                  const Eigen::Vector3d& p) {
    const Eigen::Vector3d d = p - p1;
    const double s1 = d.dot(e), s2 = len - s1;  // along the segment from each end to the point
    const double r1 = d.norm(), r2 = (d - len * e).norm();
    const double d2 = (d - s1 * e).squaredNorm();  // squared distance from the line
    // R - s for each end, without cancellation when s > 0: (R^2 - s^2) / (R + s) = d2 / (R + s).
    const double g1 = s1 > 0.0 ? d2 / (r1 + s1) : r1 - s1;
    const double g2 = s2 > 0.0 ? d2 / (r2 + s2) : r2 - s2;
    const double gap = g1 + g2;  // R1 + R2 - L
    if (!(gap > 0.0)) on_filament();
    // atanh(L / (R1 + R2)) = 0.5 ln((R1 + R2 + L) / (R1 + R2 - L))
    const double value = 0.5 * std::log((r1 + r2 + len) / gap);
    return (kMu0 / (2.0 * kPi) * value) * e;
}

// The four sides of a rectangle in the sense of its current (counter-clockwise about n):
// start point, unit direction, length.
struct Side {
    Eigen::Vector3d start, dir;
    double len;
};

void rect_sides(const Filament& f, Side out[4]) {
    const Eigen::Vector3d& c = f.frame.centre;
    const Eigen::Vector3d hu = f.half_u * f.frame.u, hv = f.half_v * f.frame.v;
    out[0] = {c - hu - hv, f.frame.u, 2.0 * f.half_u};   // bottom, along +u
    out[1] = {c + hu - hv, f.frame.v, 2.0 * f.half_v};   // right, along +v
    out[2] = {c + hu + hv, -f.frame.u, 2.0 * f.half_u};  // top, along -u
    out[3] = {c - hu + hv, -f.frame.v, 2.0 * f.half_v};  // left, along -v
}

}  // namespace

Eigen::Vector3d filament_potential(const Filament& f, const Eigen::Vector3d& p) {
    if (f.shape == SetShape::Circle) return circle_potential(f, p);
    Side sides[4];
    rect_sides(f, sides);
    Eigen::Vector3d a = Eigen::Vector3d::Zero();
    for (const Side& s : sides) a += segment_potential(s.start, s.dir, s.len, p);
    return a;
}

namespace {
constexpr int kLineOrder = 8;
constexpr double kLineRelTol = 1e-13;
constexpr double kLineFallbackTol = 1e-10;
constexpr int kLineMaxSplits = 2000;
}  // namespace

Eigen::Vector3d filament_integral(const Filament& f,
                                  const std::function<Eigen::Vector3d(const Eigen::Vector3d&, const Eigen::Vector3d&)>& g) {
    Eigen::Vector3d total = Eigen::Vector3d::Zero();
    if (f.shape == SetShape::Circle) {
        // Four quarter arcs, parameter phi; dl = a dphi along the tangent.
        const double a = f.half_u;
        auto arc = [&](double phi, double) {
            const double c = std::cos(phi), s = std::sin(phi);
            const Eigen::Vector3d x = f.frame.centre + a * (c * f.frame.u + s * f.frame.v);
            const Eigen::Vector3d tangent = -s * f.frame.u + c * f.frame.v;
            return (a * g(x, tangent)).eval();
        };
        BoxCubature<decltype(arc)> cubature(arc, kLineOrder);
        for (int q = 0; q < 4; ++q) {
            const double lo = q * kHalfPi, hi = (q + 1) * kHalfPi;
            total += cubature.integrate({lo, hi}, {0.0, 0.0}, lo, 0.0, kLineRelTol, kLineFallbackTol, kLineMaxSplits)
                         .integral;
        }
        return total;
    }
    Side sides[4];
    rect_sides(f, sides);
    for (const Side& side : sides) {
        auto along = [&](double x, double) { return g(side.start + x * side.dir, side.dir).eval(); };
        BoxCubature<decltype(along)> cubature(along, kLineOrder);
        total += cubature.integrate({0.0, side.len}, {0.0, 0.0}, 0.0, 0.0, kLineRelTol, kLineFallbackTol, kLineMaxSplits)
                     .integral;
    }
    return total;
}

std::vector<CrossSectionNode> cross_section_nodes(const SetCoil& coil, int order) {
    std::vector<CrossSectionNode> nodes;
    const GaussRule& rule = gauss_rule(order);
    const int ns = coil.depth > 0.0 ? order : 1, nt = coil.breadth > 0.0 ? order : 1;
    for (int i = 0; i < ns; ++i)
        for (int j = 0; j < nt; ++j) {
            const double s = ns == 1 ? 0.0 : (rule.x[i] - 0.5) * coil.depth;
            const double t = nt == 1 ? 0.0 : (rule.x[j] - 0.5) * coil.breadth;
            const double w = (ns == 1 ? 1.0 : rule.w[i]) * (nt == 1 ? 1.0 : rule.w[j]);
            nodes.push_back({s, t, w});
        }
    return nodes;
}

}  // namespace coilwright::internal
