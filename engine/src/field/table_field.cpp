#include "coilwright/field/table_field.hpp"

#include <string>

#include "numerics/checks.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field/flat_spiral.hpp"
#include "coilwright/field/loop.hpp"
#include "coilwright/field/solenoid.hpp"
#include "coilwright/field/thick_coil.hpp"

namespace coilwright {

using namespace internal;

FieldRZ row_field(const CoilRow& row, double z, double r) {
    const double dz = z - row.centre_z;
    switch (row.kind()) {
        case CoilRow::Kind::Loop:
            return loop_field({row.inner_radius, row.turns, row.current}, dz, r);
        case CoilRow::Kind::ThinSolenoid:
            return solenoid_field({row.inner_radius, row.length, row.turns, row.current}, dz, r);
        case CoilRow::Kind::FlatSpiral:
            return flat_spiral_field({row.inner_radius, row.outer_radius, row.turns, row.current}, dz, r);
        case CoilRow::Kind::Thick:
            return thick_coil_field({row.inner_radius, row.outer_radius, row.length, row.turns, row.current}, dz, r);
    }
    raise_domain_error("unknown coil kind");
}

double row_cost(const CoilRow& row) {
    // CPU time per point relative to one loop evaluation, measured by tests/engine/
    // test_field_timing.cpp (typical points near the coil) and rounded up.
    switch (row.kind()) {
        case CoilRow::Kind::Loop: return 1.0;
        case CoilRow::Kind::ThinSolenoid: return 8.0;
        case CoilRow::Kind::FlatSpiral: return 40.0;
        case CoilRow::Kind::Thick: return 100.0;
    }
    return 100.0;
}

FieldRZ table_field(const CoilTable& table, double z, double r) {
    check::finite(z, "z");
    check::non_negative(r, "r");
    FieldRZ total{};
    for (std::size_t i = 0; i < table.size(); ++i) {
        try {
            total += row_field(table.rows()[i], z, r);
        } catch (const SingularPointError& e) {
            raise_singular_point("row " + std::to_string(table.label(i)) + ": " + e.what());
        }
    }
    check::finite_result(total.bz, "Bz");
    check::finite_result(total.br, "Br");
    return total;
}

}  // namespace coilwright
