// Layer windings of round wire in a rectangular winding window (radial build x axial length).
//
// Model. Wire of overall (insulated) diameter d is wound in layers along the axial length l,
// the first layer against the former.
//   Square packing: every layer holds floor(l / d) turns; layers are d apart (radially).
//   Hexagonal (orthocyclic) packing: each layer lies in the grooves of the one below, offset by
//   d/2 axially and d sqrt(3)/2 radially. Odd layers (1st, 3rd, ...) hold floor(l / d) turns,
//   even layers floor(l / d - 1/2) (one fewer unless the spare length is at least d/2).
// A turn or layer counts when it fits to within one part in 1e9 (so 100 mm / 1 mm is 100).
// Counts are whole numbers; the field functions take turns as given.
#pragma once

namespace coilwright {

// The numbers are the indices the spreadsheet's "packing" argument converts to
// (idl/functions/70_winding.toml): keep them in step.
enum class Packing { Square = 0, Hexagonal = 1 };

Packing packing_from_index(double index);

// Layers that fit in a radial build (m) for wire of overall diameter d (m).
double winding_layers(double build, double wire_diameter, Packing packing);

// Turns in the first (full) layer along the axial length (m).
double winding_turns_per_layer(double length, double wire_diameter);

// Turns that fit in the window build x length.
double winding_turns(double build, double length, double wire_diameter, Packing packing);

// Radial build (m) needed for `turns` whole turns in the axial length: layer centres
// d (square) or d sqrt(3)/2 (hexagonal) apart, plus one wire diameter.
double winding_build(double turns, double length, double wire_diameter, Packing packing);

// Length (m) of wire in `turns` whole turns wound layer by layer on a cylindrical former of
// radius inner_radius: each turn is a circle through the wire's centre,
// 2 pi (inner_radius + d/2 + (layer - 1) * pitch); the last layer may be partly filled.
double winding_wire_length(double inner_radius, double length, double wire_diameter, double turns, Packing packing);

// Copper fill: turns * (pi d_bare^2 / 4) / (build * length), the conductor's share of the
// window. Throws DomainError above pi / (2 sqrt 3) = 0.9069, the densest packing of circles.
double winding_fill(double turns, double bare_diameter, double build, double length);

// Mean turn length (m) of a cylindrical winding between inner and outer radius: pi (ri + ro).
double winding_mean_turn(double inner_radius, double outer_radius);

// Mean turn length (m) on a rectangular former (inner width x inner height, sharp corners):
// a turn at distance t from the former is 2 (w + h) + 2 pi t, averaged over the build:
// 2 (w + h) + pi * build.
double winding_mean_turn_rect(double inner_width, double inner_height, double build);

}  // namespace coilwright
