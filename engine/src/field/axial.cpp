#include "coilwright/field/axial.hpp"

#include "field/axial_jet.hpp"

#include <string>

#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "numerics/policy.hpp"

namespace coilwright {

using namespace internal;

namespace internal {

namespace {

template <std::size_t N>
Jet<N> solenoid_term(double a, const Jet<N>& u) {
    return u / sqrt(u * u + a * a);
}

template <std::size_t N>
Jet<N> thick_term(double a1, double a2, const Jet<N>& u) {
    const Jet<N> u2 = u * u;
    return u * log((sqrt(u2 + a2 * a2) + a2) / (sqrt(u2 + a1 * a1) + a1));
}

template <std::size_t N>
Jet<N> spiral_term(double a, const Jet<N>& u) {
    const Jet<N> r = sqrt(u * u + a * a);
    return log(r + a) - a * (Jet<N>::constant(1.0) / r);
}

}  // namespace

template <std::size_t N>
Jet<N> axial_jet_n(const CoilRow& row, double z0) {
    const double k = kMu0 * row.turns * row.current / 2.0;
    const Jet<N> u = Jet<N>::variable(z0 - row.centre_z);  // position relative to the centre
    const double a1 = row.inner_radius, a2 = row.outer_radius, len = row.length;
    switch (row.kind()) {
        case CoilRow::Kind::Loop:
            return (k * a1 * a1) * pow(u * u + a1 * a1, -1.5);
        case CoilRow::Kind::ThinSolenoid:
            return (k / len) * (solenoid_term(a1, u + len / 2) - solenoid_term(a1, u + (-len / 2)));
        case CoilRow::Kind::Thick:
            return (k / (len * (a2 - a1))) * (thick_term(a1, a2, u + len / 2) - thick_term(a1, a2, u + (-len / 2)));
        case CoilRow::Kind::FlatSpiral:
            return (k / (a2 - a1)) * (spiral_term(a2, u) - spiral_term(a1, u));
    }
    raise_domain_error("unknown coil kind");
}

template <std::size_t N>
Jet<N> axial_jet_n(const CoilTable& table, double z0) {
    check::finite(z0, "z");
    Jet<N> sum;
    for (const CoilRow& row : table.rows()) sum += axial_jet_n<N>(row, z0);
    return sum;
}

#define COILWRIGHT_AXIAL_ORDER(N)                                          \
    template Jet<N> axial_jet_n<N>(const CoilRow& row, double z0);        \
    template Jet<N> axial_jet_n<N>(const CoilTable& table, double z0);
COILWRIGHT_AXIAL_ORDER(1)
COILWRIGHT_AXIAL_ORDER(2)
COILWRIGHT_AXIAL_ORDER(3)
COILWRIGHT_AXIAL_ORDER(4)
COILWRIGHT_AXIAL_ORDER(kMaxAxialOrder + 1)
COILWRIGHT_AXIAL_ORDER(kDesignJetSize)
#undef COILWRIGHT_AXIAL_ORDER

}  // namespace internal

using internal::axial_jet;
using internal::axial_jet_n;

double axial_field(const CoilTable& table, double z) {
    return check::finite_result(axial_jet_n<1>(table, z).c[0], "Bz");
}

std::vector<double> axial_derivatives(const CoilTable& table, double z, int order) {
    if (order < 0 || order > kMaxAxialOrder)
        internal::raise_domain_error("order must be a whole number from 0 to " + std::to_string(kMaxAxialOrder));
    const AxialJet j = axial_jet(table, z);
    std::vector<double> out(static_cast<std::size_t>(order) + 1);
    for (int k = 0; k <= order; ++k)
        out[static_cast<std::size_t>(k)] = check::finite_result(j.derivative(static_cast<std::size_t>(k)), "derivative");
    return out;
}

}  // namespace coilwright
