// Currents of the circuits that make a target field: a linear least-squares problem, since
// the field is linear in the currents. Solved with Eigen's complete orthogonal decomposition,
// which also reveals the rank; a rank-deficient or unreachable problem is an error saying why.
#include <Eigen/QR>
#include <cmath>
#include <string>

#include "numerics/checks.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/sets.hpp"

namespace coilwright {

using namespace internal;

Eigen::MatrixXd circuit_field_matrix(const CoilSet& set, const Eigen::Vector3d& point) {
    for (int k = 0; k < 3; ++k) check::finite(point[k], k == 0 ? "x" : k == 1 ? "y" : "z");
    Eigen::MatrixXd a = Eigen::MatrixXd::Zero(3, static_cast<Eigen::Index>(set.circuit_count()));
    for (std::size_t i = 0; i < set.size(); ++i) {
        SetCoil unit = set.coil(i);
        unit.current = set.polarity(i);  // one ampere in the sense the row is connected
        try {
            a.col(static_cast<Eigen::Index>(set.circuit_of(i))) += coil_field(unit, set.frame(i), point);
        } catch (const DomainError& e) {
            raise_singular_point("row " + std::to_string(set.label(i)) + ": " + e.what());
        }
    }
    return a;
}

namespace {

// "12.3 %" (three significant figures are enough to say how far off a target is).
std::string percent(double fraction) {
    const double p = 100.0 * fraction;
    const int digits = p >= 100.0 ? 0 : p >= 10.0 ? 1 : 2;
    const double scale = std::pow(10.0, digits);
    std::string text = std::to_string(std::round(p * scale) / scale);
    text.erase(text.find('.') + (digits == 0 ? 0 : digits + 1));
    return text + " %";
}

// Why the columns of `a` (the circuits' fields per ampere) are not independent.
[[noreturn]] void explain_rank(const CoilSet& set, const Eigen::MatrixXd& a, Eigen::Index rank, bool one_point) {
    const double largest = a.colwise().norm().maxCoeff();
    for (Eigen::Index c = 0; c < a.cols(); ++c)
        if (a.col(c).norm() <= 1e-12 * largest)
            raise_domain_error(set.circuit_name(static_cast<std::size_t>(c)) + " makes no field at " +
                              (one_point ? "the point" : "these points") +
                              ": its current cannot be found (give it turns, or leave it out)");
    for (Eigen::Index c = 0; c < a.cols(); ++c)
        for (Eigen::Index d = c + 1; d < a.cols(); ++d) {
            const double cosine = std::fabs(a.col(c).dot(a.col(d))) / (a.col(c).norm() * a.col(d).norm());
            if (cosine >= 1.0 - 1e-12)
                raise_domain_error(set.circuit_name(static_cast<std::size_t>(c)) + " and " +
                                  set.circuit_name(static_cast<std::size_t>(d)) + " make parallel fields at " +
                                  (one_point ? "the point" : "these points") +
                                  ": only their combination is determined (join them in one circuit)");
        }
    raise_domain_error(std::to_string(a.cols()) + " circuits but only " + std::to_string(rank) +
                      " independent field directions at " + (one_point ? "the point" : "these points") +
                      ": the currents are not determined (fewer circuits, or more points)");
}

}  // namespace

Eigen::VectorXd set_currents(const CoilSet& set, const std::vector<Eigen::Vector3d>& points,
                             const std::vector<Eigen::Vector3d>& targets) {
    if (points.empty() || points.size() != targets.size())
        raise_domain_error("one target vector per point is needed");
    const auto n = static_cast<Eigen::Index>(points.size());
    const auto c = static_cast<Eigen::Index>(set.circuit_count());
    Eigen::MatrixXd a(3 * n, c);
    Eigen::VectorXd b(3 * n);
    for (Eigen::Index p = 0; p < n; ++p) {
        const Eigen::Vector3d& t = targets[static_cast<std::size_t>(p)];
        for (int k = 0; k < 3; ++k) check::finite(t[k], k == 0 ? "bx" : k == 1 ? "by" : "bz");
        a.middleRows(3 * p, 3) = circuit_field_matrix(set, points[static_cast<std::size_t>(p)]);
        b.segment(3 * p, 3) = t;
    }
    const bool one_point = n == 1;
    // Columns scaled to unit length, so the rank threshold does not depend on the turns.
    const Eigen::VectorXd norms = a.colwise().norm().transpose();
    if (!(norms.maxCoeff() > 0.0))
        raise_domain_error(std::string("no circuit makes a field at ") + (one_point ? "the point" : "these points"));
    Eigen::VectorXd safe = norms;
    for (Eigen::Index k = 0; k < c; ++k)
        if (!(safe[k] > 0.0)) safe[k] = 1.0;
    const Eigen::MatrixXd scaled = a * safe.cwiseInverse().asDiagonal();
    Eigen::CompleteOrthogonalDecomposition<Eigen::MatrixXd> cod(scaled);
    cod.setThreshold(1e-10);
    if (cod.rank() < c) explain_rank(set, a, cod.rank(), one_point);
    const Eigen::VectorXd currents = cod.solve(b).cwiseQuotient(safe);
    const double target = b.norm();
    const double residual = (a * currents - b).norm();
    if (target > 0.0 && one_point && residual > 1e-9 * target)
        raise_domain_error("the circuits cannot make this field vector at the point: their fields span only " +
                          std::to_string(cod.rank()) + " directions, and the nearest field they make misses the target by " +
                          percent(residual / target));
    if (target > 0.0 && residual >= target * (1.0 - 1e-12))
        raise_domain_error("the circuits cannot make any part of the target field at these points");
    for (Eigen::Index k = 0; k < c; ++k) check::finite_result(currents[k], "a current");
    return currents;
}

}  // namespace coilwright
