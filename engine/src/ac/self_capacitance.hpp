// Pieces of the self-capacitance models, exposed for their tests.
#pragma once

namespace coilwright::internal {

// Medhurst's H (pF per cm of mean diameter) of a single-layer solenoid at length / diameter
// ratio l_over_d in [1, 5], interpolated linearly in his table (DomainError outside it).
double medhurst_h(double l_over_d);

// Turn-to-turn capacitance per metre of turn length (F/m) of two touching round wires of
// conductor diameter dc and outer (insulated) diameter d_o, insulation permittivity eps_r
// (A. Massarini, M. K. Kazimierczuk, IEEE Trans. Power Electron. 12(4), 671-676, 1997; the
// formula quoted from memory of the paper, checked here against a direct integration of its cell):
//   eps0 [eps_r theta / ln(d_o/dc) + cot(theta/2) - cot(pi/12)],
//   theta = arccos(1 - ln(d_o/dc) / eps_r) (the angle beyond which the air gap dominates),
// the flux tubes within +-pi/6 of the line of centres; theta >= pi/6: eps0 eps_r (pi/6) / ln.
double turn_to_turn_capacitance_per_length(double conductor_diameter, double outer_diameter, double permittivity);

}  // namespace coilwright::internal
