// The design family: pair spacings and ready-made arrangements, uniform and linear regions,
// inverse design (scaling to a target) and tolerance sensitivity of coil tables. Include this
// header; its parts live in coilwright/design/.
#pragma once

#include "coilwright/coil_table.hpp"
#include "coilwright/design/arrangements.hpp"
#include "coilwright/design/higher_order.hpp"
#include "coilwright/design/pair_spacing.hpp"
#include "coilwright/design/scaling.hpp"
#include "coilwright/design/sensitivity.hpp"
#include "coilwright/design/turn_sensitivity.hpp"
#include "coilwright/design/uniform_region.hpp"
#include "coilwright/errors.hpp"
