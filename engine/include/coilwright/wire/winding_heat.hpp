// Temperatures inside and over time of a winding: the hot spot from conduction through the
// winding, the temperature after switch-on, and the adiabatic rise of one pulse. They extend the
// steady one-body model of budget.hpp (P = h A (T - Ta), R(T) = R20 (1 + alpha (T - 20))).
#pragma once

#include "coilwright/wire/conductor.hpp"

namespace coilwright {

// Which surfaces of a cylindrical winding carry its heat away (the spreadsheet's choice set
// "cooledSurfaces"): the outer one only (the bore on its former passes little heat: the model of
// COIL_COOLING_AREA), or the inner and outer ones at one temperature.
enum class CooledSurfaces { Outer = 0, Both = 1 };

// Hot-spot rise (K) above the cooled surface of a long hollow cylinder, radii a < b, length l,
// generating `power` W uniformly (q = P / (pi (b^2 - a^2) l)), with effective radial thermal
// conductivity k (W/(m K)); radial conduction only (the ends pass nothing: the larger rise).
// Steady conduction with uniform generation, T = -q r^2 / (4k) + C1 ln r + C2 (F. P. Incropera
// et al., Fundamentals of Heat and Mass Transfer, sec. 3.5, radial systems with generation;
// H. S. Carslaw and J. C. Jaeger, Conduction of Heat in Solids, 2nd ed. 1959, ch. 7):
//   outer cooled, bore adiabatic:  dT = q/(4k) (b^2 - a^2 - 2 a^2 ln(b/a)), the hot spot at r = a;
//   both cooled at one temperature: the hot spot at rm^2 = (b^2 - a^2) / (2 ln(b/a)), and
//                                   dT = q/(4k) (b^2 - rm^2 - 2 rm^2 ln(b/rm)).
// Limits: a solid rod q b^2/(4k); a thin wall of thickness t, q t^2/(2k) and q t^2/(8k).
double winding_hotspot_rise(double inner_radius, double outer_radius, double length, double power,
                            double conductivity, CooledSurfaces cooled);

// Winding temperature (C) a time t (s) after a constant current is switched on, the winding at
// the ambient temperature before: the one-body model of budget.hpp with heat capacity C (J/K),
//   C dT/dt = I^2 R20 (1 + alpha (T - 20)) - h A (T - Ta),
// linear in T, so exact: with lambda = h A - alpha I^2 R20 and P = I^2 R(Ta),
//   T - Ta = P t / C * (1 - exp(-x)) / x,  x = lambda t / C
// (the lumped-capacitance method, Incropera sec. 5.3, with the generation growing with T).
// lambda <= 0 is thermal runaway: the temperature grows without bound, and passing 400 C
// before t is a DomainError, as is any temperature above 400 C.
double coil_temperature_at_time(double r20, double current, double area, double heat_capacity, double time,
                                double ambient_c, double h, Conductor c);

// Adiabatic temperature rise (K) of a winding carrying `current` A for `duration` s from
// `start_c`: all the heat stays in the conductor's heat capacity C (J/K), with the resistance
// rising with temperature, C dT/dt = I^2 R20 (1 + alpha (T - 20)), so
//   dT = (1/alpha + T0 - 20) (exp(alpha I^2 R20 t / C) - 1),
// the adiabatic form of IEC 60949 (ln((Tf + beta)/(Ti + beta)) = I^2 t / (K^2 S^2), beta =
// 1/alpha - 20). Above 400 C at the end is a DomainError.
double pulse_temperature_rise(double r20, double current, double duration, double heat_capacity, double start_c,
                              Conductor c);

}  // namespace coilwright
