// Conductor materials and round bare wire: resistivity at temperature, resistance, mass.
#pragma once

namespace coilwright {

// Conductor materials (the spreadsheet's choice set "material" of idl/addin.toml; the generated
// argument structs check the values at compile time).
enum class Conductor { Copper = 0, Aluminium = 1 };

struct ConductorData {
    double resistivity_20;    // ohm m at 20 C
    double temp_coefficient;  // 1/K, of the resistance at 20 C
    double density;           // kg/m^3 at 20 C
};

// Copper: IEC 60028 (annealed copper standard): 1/58 ohm mm^2/m, 0.00393 /K, 8890 kg/m^3.
// Aluminium: IEC 60889 (hard-drawn aluminium wire): 0.028264 ohm mm^2/m (61 % IACS), 0.00403 /K
// (both as tabulated in K. C. Agrawal, Industrial Power Engineering and Applications Handbook,
// 2001), 2703 kg/m^3 (quoted from memory of the standard). DomainError for a value that names
// no conductor.
const ConductorData& conductor_data(Conductor c);

// Temperatures (C) accepted by the linear resistance law below: from -100 to 400 C.
inline constexpr double kMinConductorTemperature = -100.0;
inline constexpr double kMaxConductorTemperature = 400.0;

// rho(T) = rho20 (1 + alpha (T - 20)), ohm m. Throws DomainError outside the range above.
double resistivity(Conductor c, double temperature_c);

// Cross-section pi d^2 / 4 (m^2) of a round wire of bare diameter d (m).
double wire_area(double diameter);

// Resistance (ohm) of `length` m of round wire of bare diameter d at `temperature_c`.
double wire_resistance(double diameter, double length, Conductor c, double temperature_c);

// Mass (kg) of `length` m of round bare wire.
double wire_mass(double diameter, double length, Conductor c);

// Bare diameter (m) of the round wire that carries `current` A at `current_density` A/m^2.
double wire_diameter_for_current(double current, double current_density);

}  // namespace coilwright
