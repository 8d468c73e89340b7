#include "coilwright/axial.hpp"

#include <string>

#include "coilwright/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"

namespace coilwright {

namespace {

AxialJet solenoid_term(double a, const AxialJet& u) {
    return u / sqrt(u * u + a * a);
}

AxialJet thick_term(double a1, double a2, const AxialJet& u) {
    const AxialJet u2 = u * u;
    return u * log((sqrt(u2 + a2 * a2) + a2) / (sqrt(u2 + a1 * a1) + a1));
}

AxialJet spiral_term(double a, const AxialJet& u) {
    const AxialJet r = sqrt(u * u + a * a);
    return log(r + a) - a * (AxialJet::constant(1.0) / r);
}

}  // namespace

AxialJet axial_jet(const CoilRow& row, double z0) {
    const double k = kMu0 * row.turns * row.current / 2.0;
    const AxialJet u = AxialJet::variable(z0 - row.centre_z);  // position relative to the centre
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
    throw DomainError("unknown coil kind");
}

AxialJet axial_jet(const CoilTable& table, double z0) {
    check::finite(z0, "z");
    AxialJet sum;
    for (const CoilRow& row : table.rows()) sum += axial_jet(row, z0);
    return sum;
}

double axial_field(const CoilTable& table, double z) {
    return check::finite_result(axial_jet(table, z).c[0], "Bz");
}

std::vector<double> axial_derivatives(const CoilTable& table, double z, int order) {
    if (order < 0 || order > kMaxAxialOrder)
        throw DomainError("order must be a whole number from 0 to " + std::to_string(kMaxAxialOrder));
    const AxialJet j = axial_jet(table, z);
    std::vector<double> out(static_cast<std::size_t>(order) + 1);
    for (int k = 0; k <= order; ++k)
        out[static_cast<std::size_t>(k)] = check::finite_result(j.derivative(static_cast<std::size_t>(k)), "derivative");
    return out;
}

}  // namespace coilwright
