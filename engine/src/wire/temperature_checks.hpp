// The conductor temperature range every winding and budget function accepts (internal).
#pragma once

#include <string>

#include "coilwright/errors.hpp"
#include "coilwright/wire/conductor.hpp"
#include "numerics/checks.hpp"

namespace coilwright::internal {

inline void check_conductor_temperature(double t, const char* name) {
    check::finite(t, name);
    if (t < kMinConductorTemperature || t > kMaxConductorTemperature)
        raise_domain_error(std::string(name) + " must lie between -100 and 400 C");
}

}  // namespace coilwright::internal
