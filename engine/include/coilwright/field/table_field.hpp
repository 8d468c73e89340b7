// The field of a coaxial coil table: the sum of its rows.
#pragma once

#include "coilwright/coil_table.hpp"
#include "coilwright/field/field_rz.hpp"

namespace coilwright {

// Field at axial position z (m) and distance r >= 0 (m) from the common axis: each row is a
// loop, thin solenoid, flat spiral or thick coil (CoilRow::kind) centred at its centre_z.
// A point on any row's winding where that row's field is singular is a SingularPointError
// naming the row.
FieldRZ table_field(const CoilTable& table, double z, double r);

// Field of one row at (z, r) in the table's coordinates.
FieldRZ row_field(const CoilRow& row, double z, double r);

// Work of one row per field point, in loop-field evaluations (typical, for bounding a call).
double row_cost(const CoilRow& row);

}  // namespace coilwright
