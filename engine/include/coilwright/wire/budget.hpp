// Electrical and thermal budget of a winding: resistance, power, temperature, insulation class,
// stored energy and time constant.
//
// Thermal model (steady state, stated in the README): the winding is one body at a uniform
// temperature T that loses heat from its cooling surface A to still ambient air at Ta through a
// combined (natural convection plus radiation) heat-transfer coefficient h:
//   P = h A (T - Ta).
// Common practice puts h near 10 W/(m^2 K) for a coil in still room air (about 5 by natural
// convection plus 5 to 7 by radiation from an enamelled or varnished surface at a 20 to 50 K
// rise); it is an argument the user can change (lower for enclosed coils, far higher for forced
// air or oil). Resistance follows the linear law of conductor.hpp, R(T) = R20 (1 + alpha (T - 20)).
#pragma once

#include "coilwright/wire/conductor.hpp"

namespace coilwright {

// Resistance (ohm) of `turns` turns of mean length `mean_turn` (m), bare diameter d (m).
double coil_resistance(double turns, double mean_turn, double diameter, Conductor c, double temperature_c);

double coil_voltage(double resistance, double current);  // I R, V
double coil_power(double resistance, double current);    // I^2 R, W
// |I| / (pi d^2 / 4), A/m^2.
double coil_current_density(double current, double diameter);

// Cooling surface of a cylindrical winding: the outer cylinder 2 pi ro l and both annular ends
// 2 pi (ro^2 - ri^2); the bore is left out (little air moves through it). m^2.
double coil_cooling_area(double inner_radius, double outer_radius, double length);

// Cooling surface of a winding of build b and axial length l on a sharp-cornered rectangular
// former w x h, with the outer corners rounded at radius b (the turn model of
// winding_mean_turn_rect): outer surface (2 (w + h) + 2 pi b) l plus both end faces
// 2 (2 (w + h) b + pi b^2); the inside is left out. m^2.
double coil_cooling_area_rect(double inner_width, double inner_height, double build, double length);

// Steady rise (K) for power P (W) through area A (m^2) at coefficient h (W/(m^2 K)): P / (h A).
double coil_temperature_rise(double power, double area, double h);

// Steady state of a winding whose resistance at 20 C is r20, fed at constant current or
// constant voltage. The heat balance I^2 R(T) = h A (T - Ta) is linear in T and is solved
// exactly: with k = I^2 r20 / (h A), T - Ta = k (1 + alpha (Ta - 20)) / (1 - alpha k). When
// alpha k >= 1 the dissipation grows faster than the cooling (thermal runaway): DomainError.
// At constant voltage V^2 / R(T) = h A (T - Ta) is a quadratic with one positive root, always
// stable. A steady temperature above 400 C (outside the resistance law) is a DomainError too.
struct HotState {
    double temperature;  // C
    double resistance;   // ohm
};
HotState hot_state_at_current(double r20, double current, double area, double ambient_c, double h, Conductor c);
HotState hot_state_at_voltage(double r20, double voltage, double area, double ambient_c, double h, Conductor c);

// Largest steady current (A) that keeps the winding at or below max_temperature_c:
// sqrt(h A (Tmax - Ta) / R(Tmax)).
double coil_max_current(double r20, double area, double max_temperature_c, double ambient_c, double h, Conductor c);

// IEC 60085 thermal class (C): one of 90, 105, 120, 130, 155, 180, 200, 220, 250. Throws
// DomainError for any other number.
double insulation_class_limit(double thermal_class);

// Margin (K) of a winding at `temperature_c` (its mean temperature, e.g. from resistance) to its
// class, after a hot-spot allowance (K) for the hottest point being above the mean:
// class - temperature - allowance. Negative: the insulation is overheated.
double insulation_margin(double thermal_class, double temperature_c, double hot_spot_allowance);

double coil_energy(double inductance, double current);          // L I^2 / 2, J
double coil_time_constant(double inductance, double resistance);  // L / R, s

}  // namespace coilwright
