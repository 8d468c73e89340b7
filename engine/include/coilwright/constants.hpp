// Physical and mathematical constants used across the engine: one place, one value.
#pragma once

namespace coilwright {

// Vacuum permeability, CODATA 2022 recommended value (N/A^2). Since the 2019 SI revision
// mu0 is measured, no longer exactly 4*pi*1e-7.
inline constexpr double kMu0 = 1.25663706127e-6;

inline constexpr double kPi = 3.14159265358979323846264338327950288;
inline constexpr double kHalfPi = kPi / 2.0;

}  // namespace coilwright
