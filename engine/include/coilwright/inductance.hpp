// The inductance family: self- and mutual inductance of loops, solenoids and thick coaxial
// coils, the inductance matrix, stored energy and axial forces of a coil table. Include this
// header; its parts live in coilwright/inductance/.
#pragma once

#include "coilwright/coil_table.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/inductance/mutual.hpp"
#include "coilwright/inductance/self.hpp"
#include "coilwright/inductance/table.hpp"
