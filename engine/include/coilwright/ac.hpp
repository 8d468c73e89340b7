// Coils at a frequency: skin and proximity effect, self-capacitance, the lumped impedance,
// series resonance, and pickup (search) coils. Frequencies in hertz; currents, voltages and
// fields are amplitudes (not RMS) unless a name says otherwise; noise is RMS (it has no
// amplitude). Temperatures in degrees Celsius.
#pragma once

#include "coilwright/wire/conductor.hpp"

namespace coilwright {

// ---- Skin effect -------------------------------------------------------------------------

// Skin depth sqrt(rho / (pi f mu0)) (m) of a non-magnetic conductor at frequency f > 0 (Hz),
// rho at the temperature from conductor.hpp (IEC 60028 copper, IEC 60889 aluminium).
double skin_depth(double frequency, Conductor c, double temperature_c);

// R_ac / R_dc of an isolated straight round wire of bare diameter d (m) at frequency f >= 0:
// the exact solution in Kelvin functions (A&S 9.9, DLMF 10.61),
//   (x/2) (ber x bei' x - bei x ber' x) / (ber'^2 x + bei'^2 x),  x = d / (sqrt2 delta).
// Exactly 1 at f = 0. Accurate to 1e-13 (tested against mpmath) at every x.
double wire_rac_ratio(double diameter, double frequency, Conductor c, double temperature_c);

// ---- Proximity effect in a layered winding (Dowell) ----------------------------------------

// Dowell's factor (P. L. Dowell, Proc. IEE 113(8), 1387-1394, 1966) for m layers of
// conductors of normalised thickness Delta = h / delta' in a one-dimensional field:
//   F = Delta [ (sinh 2D + sin 2D) / (cosh 2D - cos 2D)
//               + (2 (m^2 - 1) / 3) (sinh D - sin D) / (cosh D + cos D) ].
// Delta >= 0, m >= 1 (real: litz wire gives non-whole strand layers). 1 at Delta = 0.
double dowell_factor(double delta_norm, double layers);

// R_ac / R_dc of a layered winding of round wire (strands = 1) or of litz wire (strands > 1):
// Dowell's factor with the usual round-wire porosity treatment: each round conductor of
// diameter d is replaced by the square of equal area (side h = d sqrt(pi)/2) and the layer
// by a foil of conductivity eta sigma, eta = h / pitch, so
//   Delta = (pi/4)^(3/4) (d / delta) sqrt(d / pitch).
// Litz wire: bare_diameter is the strand diameter, wire_diameter the bundle's (the pitch of
// the turns); the sqrt(n) strands across each bundle are sqrt(n) strand layers per winding
// layer at the strand pitch wire_diameter / sqrt(n) (common practice for litz in Dowell's model;
// one strand is the solid wire).
// Validity (stated in the help): a one-dimensional field parallel to the layers (long layers
// filling the winding length), close winding; litz strands twisted so they share the current.
double coil_rac_ratio(double bare_diameter, double wire_diameter, double frequency, double layers, double strands,
                      Conductor c, double temperature_c);

// ---- Self-capacitance and self-resonance ----------------------------------------------------

// Self-capacitance (F) of a winding on a former of radius inner_radius (m), axial length
// length (m), `turns` turns of wire of bare and insulated diameters in `layers` layers, the
// insulation's relative permittivity `permittivity`.
// One layer: Medhurst's measurements (R. G. Medhurst, Wireless Engineer 24, 35-43 and 80-92,
// 1947), C = H(l/D) D with D the mean diameter, interpolated in his table, l/D from 1 to 5.
// Several layers: the energy of the layer-to-layer capacitances with the voltage rising
// linearly along each layer of a back-and-forth winding, C = (4 / (3 n^2)) sum C_layer, each
// C_layer the turns per layer times the turn-to-turn capacitance of touching insulated round
// wires (A. Massarini, M. K. Kazimierczuk, IEEE Trans. Power Electron. 12(4), 671-676, 1997).
double coil_self_capacitance(double inner_radius, double length, double turns, double layers, double bare_diameter,
                             double wire_diameter, double permittivity);

// Self-resonant frequency 1 / (2 pi sqrt(L C)) (Hz); L, C > 0.
double coil_srf(double inductance, double self_capacitance);

// ---- Lumped impedance: R + jwL in parallel with C ---------------------------------------------

struct Impedance {
    double magnitude;  // ohm
    double phase;      // degrees, positive inductive
};
// Z = (R + jwL) / (1 - w^2 L C + jwRC). Frequencies above the self-resonance (L, C > 0) are a
// DomainError: there the winding acts as a distributed line the lumped model does not have.
Impedance coil_impedance(double resistance, double inductance, double frequency, double self_capacitance);

// Voltage amplitude across a winding carrying a current amplitude I through R + jwL:
// |I| sqrt(R^2 + (wL)^2). The self-capacitance (in parallel) does not change it.
double coil_voltage_ac(double resistance, double inductance, double frequency, double current);

// Series resonance: the capacitor 1 / (w^2 L) (F) that resonates L at f, and the voltage
// amplitude across it, |I| w L (V), for a current amplitude I. L > 0, f > 0.
double resonance_capacitance(double inductance, double frequency);
double resonance_cap_voltage(double current, double inductance, double frequency);

// ---- Pickup (search) coils ------------------------------------------------------------------

// EMF amplitude w N A B (V) of N turns of area A (m^2) in a uniform field of amplitude B (T)
// along the axis at frequency f (Faraday's law).
double pickup_emf(double turns, double area, double frequency, double field);

// Sum of the turn areas of a winding between radii ri and ro with the turns spread uniformly
// over the radius: N pi (ri^2 + ri ro + ro^2) / 3 (m^2); the length does not enter.
double pickup_area(double inner_radius, double outer_radius, double length, double turns);

// Open-circuit sensitivity (V/T) at f: w N A / |1 - w^2 L C + jwRC| (the self-capacitance
// across the terminals, R and L in series). Above the self-resonance: DomainError.
double pickup_sensitivity(double turns, double area, double frequency, double resistance, double inductance,
                          double self_capacitance);

// Johnson noise sqrt(4 k T R B) (V RMS) of a resistance at temperature_c in a bandwidth (Hz).
double johnson_noise(double resistance, double temperature_c, double bandwidth);

// Noise-equivalent field density (T/sqrt(Hz), RMS): the coil's Johnson noise and an amplifier's
// input voltage noise density e_a (V/sqrt(Hz)) in quadrature, referred to the field:
//   sqrt(4 k T R |H|^2 + e_a^2) / (w N A |H|),  H = 1 / (1 - w^2 L C + jwRC).
double pickup_nef(double turns, double area, double frequency, double resistance, double temperature_c,
                  double inductance, double self_capacitance, double amplifier_noise);

}  // namespace coilwright
