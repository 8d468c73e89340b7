// Whole-coil quantities built on the per-turn inductances: turns applied, coupling
// coefficients and the axial force from the slope of the mutual inductance.
#include <cmath>
#include <string>

#include "coilwright/inductance/mutual.hpp"
#include "coilwright/inductance/self.hpp"
#include "coilwright/inductance/table.hpp"
#include "numerics/checks.hpp"
#include "numerics/policy.hpp"

namespace coilwright {

using namespace internal;

namespace {

double coupling(double m, double l1, double l2) {
    if (!(l1 > 0.0 && l2 > 0.0)) raise_domain_error("a coil without turns or area has no coupling coefficient");
    return check::finite_result(m / (std::sqrt(l1) * std::sqrt(l2)), "the coupling coefficient");  // no underflow of l1 l2
}

// N1 N2 I1 I2, checking each factor.
double ampere_turn_product(double n1, double i1, double n2, double i2) {
    check::non_negative(n1, "turns 1");
    check::finite(i1, "current 1");
    check::non_negative(n2, "turns 2");
    check::finite(i2, "current 2");
    return (n1 * i1) * (n2 * i2);
}

// A winding with area; a loop has no self-inductance without its wire diameter.
double self_per_turn(const CoilSection& w, const char* which) {
    if (w.inner_radius == w.outer_radius && w.length == 0.0)
        raise_domain_error(std::string(which) + " is a loop: its self-inductance needs a wire diameter (use LOOP_K)");
    return coil_self_inductance(w);
}

}  // namespace

double coil_self_inductance(const CoilSection& shape, double turns) {
    check::non_negative(turns, "turns");
    return check::finite_result(turns * turns * coil_self_inductance(shape), "the inductance");
}

double coil_mutual_inductance(const CoilSection& w1, double turns1, const CoilSection& w2, double turns2,
                              double distance) {
    check::non_negative(turns1, "turns 1");
    check::non_negative(turns2, "turns 2");
    return check::finite_result(turns1 * turns2 * coil_mutual_inductance(w1, w2, distance), "the inductance");
}

double loop_coupling(double radius1, double wire_diameter1, double radius2, double wire_diameter2, double distance) {
    const double m = loop_mutual_inductance(radius1, radius2, distance);
    return coupling(m, loop_self_inductance(radius1, wire_diameter1, 1.0),
                    loop_self_inductance(radius2, wire_diameter2, 1.0));
}

double coil_coupling(const CoilSection& w1, const CoilSection& w2, double distance) {
    const double m = coil_mutual_inductance(w1, w2, distance);
    return coupling(m, self_per_turn(w1, "coil 1"), self_per_turn(w2, "coil 2"));
}

double loop_axial_force(double radius1, double turns1, double current1, double radius2, double turns2, double current2,
                        double distance) {
    const double scale = ampere_turn_product(turns1, current1, turns2, current2);
    return check::finite_result(scale * loop_mutual_inductance_slope(radius1, radius2, distance), "the force");
}

double coil_axial_force(const CoilSection& w1, double turns1, double current1, const CoilSection& w2, double turns2,
                        double current2, double distance) {
    const double scale = ampere_turn_product(turns1, current1, turns2, current2);
    return check::finite_result(scale * coil_mutual_inductance_slope(w1, w2, distance), "the force");
}

std::optional<double> optional_wire_diameter(double diameter) {
    if (diameter == 0.0) return std::nullopt;
    check::positive(diameter, "wire diameter");
    return diameter;
}

}  // namespace coilwright
