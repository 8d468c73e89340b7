// Physical and mathematical constants used across the engine: one place, one value.
#pragma once

namespace coilwright {

// Vacuum permeability, CODATA 2022 recommended value (N/A^2). Since the 2019 SI revision
// mu0 is measured, no longer exactly 4*pi*1e-7.
inline constexpr double kMu0 = 1.25663706127e-6;

// Speed of light in vacuum (m/s) and the Boltzmann constant (J/K): exact since the 2019 SI.
inline constexpr double kSpeedOfLight = 299792458.0;
inline constexpr double kBoltzmann = 1.380649e-23;
// Vacuum permittivity (F/m) from mu0 and c: eps0 = 1 / (mu0 c^2).
inline constexpr double kEpsilon0 = 1.0 / (kMu0 * kSpeedOfLight * kSpeedOfLight);
// Degrees Celsius to kelvin.
inline constexpr double kZeroCelsius = 273.15;

inline constexpr double kPi = 3.14159265358979323846264338327950288;
inline constexpr double kHalfPi = kPi / 2.0;

}  // namespace coilwright
