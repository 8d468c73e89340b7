// Force and torque on one coil of a set from all the others: the Lorentz force
// F = N I integral dl x B and the torque about the coil's centre integral (x - c) x (N I dl x B),
// along the turn (adaptive Gauss-Legendre, filament.cpp), averaged over a thick winding's
// cross-section by 4 x 4 Gauss-Legendre points.
#include <Eigen/Geometry>
#include <string>

#include "numerics/checks.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/sets.hpp"
#include "filament.hpp"
#include "inductance_detail.hpp"

namespace coilwright {

using namespace internal;

namespace {

// The field of every row but `skip`.
Eigen::Vector3d others_field(const CoilSet& set, std::size_t skip, const Eigen::Vector3d& x) {
    Eigen::Vector3d b = Eigen::Vector3d::Zero();
    for (std::size_t j = 0; j < set.size(); ++j) {
        if (j == skip) continue;
        try {
            b += coil_field(set.coil(j), set.frame(j), x);
        } catch (const SingularPointError&) {
            raise_singular_point("rows " + std::to_string(set.label(skip)) + " and " +
                                     std::to_string(set.label(j)) + " touch: the force on a wire lying on another is infinite");
        }
    }
    return b;
}

template <class Integrand>
Eigen::Vector3d over_winding(const CoilSet& set, std::size_t row, Integrand integrand) {
    if (row >= set.size()) raise_domain_error("row must name a row of the set");
    const SetCoil& coil = set.coil(row);
    Eigen::Vector3d total = Eigen::Vector3d::Zero();
    for (const auto& node : internal::cross_section_nodes(coil, internal::kCrossSectionOrder)) {
        const internal::Filament f = internal::turn_filament(coil, set.frame(row), node.s, node.t);
        total += node.weight * internal::filament_integral(f, [&](const Eigen::Vector3d& x, const Eigen::Vector3d& t) {
                     return integrand(x, t, others_field(set, row, x));
                 });
    }
    return (coil.turns * coil.current) * total;
}

}  // namespace

Eigen::Vector3d set_force(const CoilSet& set, std::size_t row) {
    const Eigen::Vector3d f = over_winding(set, row, [](const Eigen::Vector3d&, const Eigen::Vector3d& t,
                                                         const Eigen::Vector3d& b) { return t.cross(b).eval(); });
    for (int k = 0; k < 3; ++k) check::finite_result(f[k], "the force");
    return f;
}

Eigen::Vector3d set_torque(const CoilSet& set, std::size_t row) {
    if (row >= set.size()) raise_domain_error("row must name a row of the set");
    const Eigen::Vector3d c = set.frame(row).centre;
    const Eigen::Vector3d tq = over_winding(set, row, [&c](const Eigen::Vector3d& x, const Eigen::Vector3d& t,
                                                           const Eigen::Vector3d& b) {
        return (x - c).cross(t.cross(b)).eval();
    });
    for (int k = 0; k < 3; ++k) check::finite_result(tq[k], "the torque");
    return tq;
}

}  // namespace coilwright
