// The centre line of one turn of a coil in a set, as a closed filament in space: its vector
// potential anywhere, and line integrals along it. Inductances and forces are built on these.
#pragma once

#include <Eigen/Core>
#include <functional>

#include "coilwright/sets.hpp"

namespace coilwright::internal {

struct Filament {
    SetShape shape;
    CoilFrame frame;       // centre and axes of the turn
    double half_u, half_v;  // circle: radius, radius; rect: half width, half height
};

// The turn of `coil` at offset s across the winding (radius + s, or sides + 2s) and t along
// its axis; (0, 0) is the mean turn.
Filament turn_filament(const SetCoil& coil, const CoilFrame& frame, double s, double t);

// Vector potential (T m per ampere, in global components) of the filament at `point`; a point
// on the filament is a SingularPointError.
Eigen::Vector3d filament_potential(const Filament& f, const Eigen::Vector3d& point);

// Integral over the filament, in the sense of its current, of g(x, dx/dl) dl for a 3-vector
// valued g, by adaptive Gauss-Legendre on each arc or side (relative tolerance 1e-13, bounded:
// ConvergenceError when it does not converge).
Eigen::Vector3d filament_integral(const Filament& f,
                                  const std::function<Eigen::Vector3d(const Eigen::Vector3d&, const Eigen::Vector3d&)>& g);

// Gauss-Legendre nodes and weights (weights summing to 1) over a winding's cross-section:
// a thin coil has the single node (0, 0). `order` points per direction that has extent.
struct CrossSectionNode {
    double s, t, weight;
};
std::vector<CrossSectionNode> cross_section_nodes(const SetCoil& coil, int order);

}  // namespace coilwright::internal
