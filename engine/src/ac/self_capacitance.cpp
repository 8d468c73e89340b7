// Self-capacitance of a winding: Medhurst's table for one layer, the energy of the layer-to-layer
// capacitances for several.
#include "ac/self_capacitance.hpp"

#include <array>
#include <cmath>
#include <string>

#include "coilwright/ac.hpp"
#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"

namespace coilwright {

using namespace internal;

namespace internal {

namespace {

// R. G. Medhurst, "H.F. resistance and self-capacitance of single-layer solenoids", Wireless
// Engineer 24, 35-43 (Feb. 1947) and 80-92 (Mar. 1947): C = H D pF, D in cm, for coils of
// length l and diameter D, measured. The values for l/D = 1 to 5 as reproduced from his table by
// M. S. Rzeszotarski (1997); his table goes further, but only this part is cited here.
struct MedhurstPoint {
    double l_over_d;
    double h;  // pF/cm
};
constexpr std::array<MedhurstPoint, 9> kMedhurst{{{1.0, 0.46},
                                                  {1.5, 0.47},
                                                  {2.0, 0.50},
                                                  {2.5, 0.56},
                                                  {3.0, 0.61},
                                                  {3.5, 0.67},
                                                  {4.0, 0.72},
                                                  {4.5, 0.77},
                                                  {5.0, 0.81}}};

}  // namespace

double medhurst_h(double l_over_d) {
    if (!(std::isfinite(l_over_d) && l_over_d >= kMedhurst.front().l_over_d && l_over_d <= kMedhurst.back().l_over_d))
        throw DomainError("a single layer needs length / mean diameter between 1 and 5 (the range of Medhurst's "
                          "table cited here)");
    for (std::size_t i = 1; i < kMedhurst.size(); ++i) {
        const MedhurstPoint& a = kMedhurst[i - 1];
        const MedhurstPoint& b = kMedhurst[i];
        if (l_over_d <= b.l_over_d) return a.h + (b.h - a.h) * (l_over_d - a.l_over_d) / (b.l_over_d - a.l_over_d);
    }
    return kMedhurst.back().h;
}

double turn_to_turn_capacitance_per_length(double conductor_diameter, double outer_diameter, double permittivity) {
    const double log_ratio = std::log(outer_diameter / conductor_diameter);
    const double sixth = kPi / 6.0;
    // 1 - cos(theta) = 2 sin^2(theta/2): theta from an arcsine, exact for thin insulation.
    const double s = std::sqrt(log_ratio / (2.0 * permittivity));
    const double theta = s < 1.0 ? 2.0 * std::asin(s) : kPi;
    if (theta >= sixth) return kEpsilon0 * permittivity * sixth / log_ratio;
    return kEpsilon0 * (permittivity * theta / log_ratio + 1.0 / std::tan(theta / 2.0) - 1.0 / std::tan(kPi / 12.0));
}

}  // namespace internal

double coil_self_capacitance(double inner_radius, double length, double turns, double layers, double bare_diameter,
                             double wire_diameter, double permittivity) {
    check::positive(inner_radius, "inner radius");
    check::positive(length, "length");
    check::positive(turns, "turns");
    if (!(std::isfinite(layers) && layers >= 1.0 && layers == std::floor(layers) && layers <= 1e4))
        throw DomainError("layers must be a whole number from 1 to 10000");
    check::positive(bare_diameter, "bare diameter");
    check::positive(wire_diameter, "wire diameter");
    if (!(std::isfinite(permittivity) && permittivity >= 1.0))
        throw DomainError("permittivity (relative, of the insulation) must be a finite number >= 1");
    if (!(wire_diameter > bare_diameter))
        throw DomainError("wire diameter (over the insulation) must exceed the bare diameter: touching bare wires "
                          "have no finite capacitance");
    const double turns_per_layer = turns / layers;
    if (turns_per_layer < 1.0) throw DomainError("turns must be at least the number of layers");

    if (layers == 1.0) {
        const double mean_diameter = 2.0 * inner_radius + wire_diameter;
        // H pF/cm times D cm = H D[m] 1e-10 F.
        return check::finite_result(internal::medhurst_h(length / mean_diameter) * mean_diameter * 1e-10,
                                    "self-capacitance");
    }
    // Layers k and k+1 meet at radius r_k = ri + k d_o (square packing). Along a back-and-forth
    // winding the voltage between them rises linearly from 0 to 2V/n, storing
    // (1/2) C_k (4 V^2 / (3 n^2)); summed, C = (4 / (3 n^2)) sum_k C_k.
    const double n = layers;
    const double sum_radii = (n - 1.0) * inner_radius + wire_diameter * n * (n - 1.0) / 2.0;
    const double per_length = internal::turn_to_turn_capacitance_per_length(bare_diameter, wire_diameter, permittivity);
    const double c_layers = turns_per_layer * per_length * 2.0 * kPi * sum_radii;
    return check::finite_result(4.0 / (3.0 * n * n) * c_layers, "self-capacitance");
}

double coil_srf(double inductance, double self_capacitance) {
    check::positive(inductance, "inductance");
    check::positive(self_capacitance, "self-capacitance");
    return check::finite_result(1.0 / (2.0 * kPi * std::sqrt(inductance) * std::sqrt(self_capacitance)), "self-resonant frequency");
}

}  // namespace coilwright
