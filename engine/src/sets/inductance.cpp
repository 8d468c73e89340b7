// Inductance of coils in a set: mutual inductance at any position and tilt, self-inductance of
// circles and rectangles of round wire or of thick windings, the matrix per circuit.
//
// Mutual inductance of two filaments is Neumann's double integral written as a single one,
// M = integral over filament 2 of A_1 . dl_2, with A_1 the closed-form vector potential of
// filament 1 (filament.cpp). For two circles this is the formula of S. Babic, F. Sirois,
// C. Akyel, C. Girardi, "Mutual inductance calculation between circular filaments arbitrarily
// positioned in space: alternative to Grover's formula", IEEE Trans. Magn. 46(9), 3591-3600
// (2010), derived there the same way (vector potential of the primary circle integrated over
// the secondary); for rectangles and mixed pairs the potential is the sum of the straight
// sides' closed forms. The integral is adaptive Gauss-Legendre to 1e-13 relative.
// Coaxial circles take the exact coaxial path (Maxwell's formula averaged over both windings,
// mutual_inductance.hpp). Thick windings otherwise: the filament formula averaged over both
// cross-sections by 4 x 4 Gauss-Legendre points.
#include <Eigen/Geometry>
#include <cmath>
#include <string>

#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/inductance/mutual.hpp"
#include "coilwright/inductance/self.hpp"
#include "coilwright/sets.hpp"
#include "filament.hpp"
#include "inductance_detail.hpp"

namespace coilwright {

namespace internal {

double filament_mutual(const Filament& a, const Filament& b) {
    const auto integrand = [&](const Eigen::Vector3d& x, const Eigen::Vector3d& tangent) {
        return Eigen::Vector3d(filament_potential(a, x).dot(tangent), 0.0, 0.0);
    };
    return filament_integral(b, integrand).x();
}

double general_mutual(const SetCoil& a, const CoilFrame& fa, const SetCoil& b, const CoilFrame& fb) {
    double m = 0.0;
    for (const CrossSectionNode& na : cross_section_nodes(a, kCrossSectionOrder))
        for (const CrossSectionNode& nb : cross_section_nodes(b, kCrossSectionOrder))
            m += na.weight * nb.weight *
                 filament_mutual(turn_filament(a, fa, na.s, na.t), turn_filament(b, fb, nb.s, nb.t));
    return a.turns * b.turns * m;
}

// Partial inductance of a straight filament of length l with a parallel one of the same length
// at distance d, side by side: (mu0 l / 2pi) [asinh(l/d) - sqrt(1 + d^2/l^2) + d/l]
// (E. B. Rosa, Bull. Bureau of Standards 4, 301, 1908; F. W. Grover, Inductance Calculations,
// 1946, ch. 5). With d the geometric mean distance of a cross-section from itself it is the
// partial self-inductance of the straight conductor (Grover's GMD method).
double parallel_partial(double l, double d) {
    const double q = d / l;
    // sqrt(1 + q^2) - q = 1 / (sqrt(1 + q^2) + q): no cancellation for large q.
    return kMu0 * l / (2.0 * kPi) * (std::asinh(1.0 / q) - 1.0 / (std::sqrt(1.0 + q * q) + q));
}

// Rectangle of width w and height h whose conductor's cross-section has geometric mean
// distance g from itself: four partial self-inductances less the opposite sides' mutual
// partials (perpendicular sides have none).
double rect_inductance_gmd(double w, double h, double g) {
    return 2.0 * (parallel_partial(w, g) + parallel_partial(h, g) - parallel_partial(w, h) - parallel_partial(h, w));
}

// Geometric mean distance of a b x c rectangle from itself (J. C. Maxwell, A Treatise on
// Electricity and Magnetism, 1873, art. 692): ln g = ln d - (b^2/12c^2) ln(1 + c^2/b^2)
// - (c^2/12b^2) ln(1 + b^2/c^2) + (2b/3c) atan(c/b) + (2c/3b) atan(b/c) - 25/12, d^2 = b^2 + c^2;
// 0.44705 b for a square. A line of length l (c = 0): l e^{-3/2}.
double rectangle_gmd(double b, double c) {
    if (b == 0.0 || c == 0.0) return std::max(b, c) * std::exp(-1.5);
    const double x = b / c, y = c / b;
    const double ln_g = std::log(std::hypot(b, c)) - x * x / 12.0 * std::log1p(y * y) - y * y / 12.0 * std::log1p(x * x) +
                        2.0 * x / 3.0 * std::atan(y) + 2.0 * y / 3.0 * std::atan(x) - 25.0 / 12.0;
    return std::exp(ln_g);
}

}  // namespace internal

using namespace internal;

namespace {

// Both circles on one axis line (parallel or opposed axes): Maxwell's exact coaxial path.
bool coaxial_circles(const SetCoil& a, const CoilFrame& fa, const SetCoil& b, const CoilFrame& fb, double& sign,
                     double& distance) {
    if (a.shape != SetShape::Circle || b.shape != SetShape::Circle) return false;
    if (fa.n.cross(fb.n).squaredNorm() != 0.0) return false;
    const Eigen::Vector3d d = fb.centre - fa.centre;
    if (d.cross(fa.n).squaredNorm() != 0.0) return false;
    sign = fa.n.dot(fb.n) > 0.0 ? 1.0 : -1.0;
    distance = d.dot(fa.n);
    return true;
}

CoilSection winding_of(const SetCoil& c) { return {c.size - 0.5 * c.depth, c.size + 0.5 * c.depth, c.breadth}; }

}  // namespace

double coil_mutual_inductance(const SetCoil& a, const CoilFrame& fa, const SetCoil& b, const CoilFrame& fb) {
    double sign = 1.0, distance = 0.0;
    if (coaxial_circles(a, fa, b, fb, sign, distance))
        return sign * a.turns * b.turns * coil_mutual_inductance(winding_of(a), winding_of(b), distance);
    return check::finite_result(general_mutual(a, fa, b, fb), "the mutual inductance");
}

double coil_self_inductance(const SetCoil& c, double wire_diameter) {
    const double n2 = c.turns * c.turns;
    if (c.shape == SetShape::Circle) {
        if (c.thick()) return n2 * coil_self_inductance(winding_of(c));
        return loop_self_inductance(c.size, wire_diameter, c.turns);
    }
    double g;
    if (c.thick()) {
        g = rectangle_gmd(c.depth, c.breadth);
    } else {
        check::positive(wire_diameter, "wire diameter");
        if (wire_diameter > 0.5 * std::min(c.size, c.height))
            raise_domain_error("the wire diameter must not exceed half the shorter side of the rectangle");
        g = 0.5 * wire_diameter * std::exp(-0.25);  // round wire: rho e^(-1/4) (Maxwell, art. 692)
    }
    return n2 * rect_inductance_gmd(c.size, c.height, g);
}

Eigen::MatrixXd set_inductance_matrix(const CoilSet& set, double wire_diameter) {
    const auto n = static_cast<Eigen::Index>(set.size());
    Eigen::MatrixXd rows(n, n);
    for (Eigen::Index i = 0; i < n; ++i) {
        const auto ui = static_cast<std::size_t>(i);
        try {
            rows(i, i) = coil_self_inductance(set.coil(ui), wire_diameter);
        } catch (const DomainError& e) {
            raise_domain_error("row " + std::to_string(set.label(ui)) + ": " + e.what());
        }
        for (Eigen::Index j = i + 1; j < n; ++j) {
            const auto uj = static_cast<std::size_t>(j);
            try {
                rows(i, j) = rows(j, i) = coil_mutual_inductance(set.coil(ui), set.frame(ui), set.coil(uj), set.frame(uj));
            } catch (const SingularPointError& e) {
                raise_singular_point("rows " + std::to_string(set.label(ui)) + " and " +
                                         std::to_string(set.label(uj)) + ": " + e.what());
            }
        }
    }
    const auto c = static_cast<Eigen::Index>(set.circuit_count());
    Eigen::MatrixXd out = Eigen::MatrixXd::Zero(c, c);
    for (Eigen::Index i = 0; i < n; ++i)
        for (Eigen::Index j = 0; j < n; ++j) {
            const auto ui = static_cast<std::size_t>(i), uj = static_cast<std::size_t>(j);
            out(static_cast<Eigen::Index>(set.circuit_of(ui)), static_cast<Eigen::Index>(set.circuit_of(uj))) +=
                set.polarity(ui) * set.polarity(uj) * rows(i, j);
        }
    for (Eigen::Index k = 0; k < out.size(); ++k) check::finite_result(out.data()[k], "the inductance");
    return out;
}

}  // namespace coilwright
