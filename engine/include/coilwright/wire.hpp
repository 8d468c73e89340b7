// The wire family: wire gauges, conductor materials, layer windings, and the electrical and
// thermal budget of a coil (resistance, supply, heating, insulation, energy). Include this
// header; its parts live in coilwright/wire/.
#pragma once

#include "coilwright/errors.hpp"
#include "coilwright/wire/budget.hpp"
#include "coilwright/wire/conductor.hpp"
#include "coilwright/wire/gauge.hpp"
#include "coilwright/wire/winding.hpp"
#include "coilwright/wire/winding_heat.hpp"
