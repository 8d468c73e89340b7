// The field family: the magnetic field of coaxial coils anywhere in space (loops, thin
// solenoids, thick windings, flat spirals, rectangular loops, whole coil tables), on the axis
// with derivatives of any order, and the axial gradient. Include this header; its parts live in
// coilwright/field/.
#pragma once

#include "coilwright/coil_table.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field/axial.hpp"
#include "coilwright/field/field_rz.hpp"
#include "coilwright/field/flat_spiral.hpp"
#include "coilwright/field/gradient.hpp"
#include "coilwright/field/loop.hpp"
#include "coilwright/field/loop_batch.hpp"
#include "coilwright/field/real_turns.hpp"
#include "coilwright/field/rect.hpp"
#include "coilwright/field/solenoid.hpp"
#include "coilwright/field/table_field.hpp"
#include "coilwright/field/thick_coil.hpp"
