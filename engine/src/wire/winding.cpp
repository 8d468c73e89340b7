#include "coilwright/wire/winding.hpp"

#include <cmath>
#include <string>

#include "numerics/checks.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"

namespace coilwright {

using namespace internal;

namespace {

constexpr double kFitTolerance = 1e-9;  // relative: a turn that fits to 1 part in 1e9 counts
constexpr double kMaxCount = 1e9;       // turns per layer or layers: beyond, the units are wrong
const double kHexPitch = std::sqrt(3.0) / 2.0;
const double kDensestFill = kPi / (2.0 * std::sqrt(3.0));

// floor(x) with the fit tolerance; x >= 0.
double whole(double x) { return std::floor(x * (1.0 + kFitTolerance)); }

double checked_count(double n, const char* what) {
    if (!(n <= kMaxCount))
        raise_domain_error(std::string("more than 1e9 ") + what + " (check the units: metres)");
    return n;
}

// Turns in odd (1st, 3rd, ...) and even layers.
struct LayerTurns {
    double odd, even;
};

LayerTurns layer_turns(double length, double d, Packing packing) {
    const double odd = checked_count(whole(length / d), "turns per layer");
    if (packing == Packing::Square) return {odd, odd};
    // Below 1.5 d the second layer has no groove to lie in: the winding is not hexagonal.
    const double even = whole(length / d - 0.5);
    if (odd > 0.0 && !(even >= 1.0))
        raise_domain_error("hexagonal packing needs a winding length of at least 1.5 wire diameters");
    return {odd, even};
}

double pitch(double d, Packing packing) { return packing == Packing::Square ? d : kHexPitch * d; }

double whole_turns(double turns) {
    check::non_negative(turns, "turns");
    if (turns != std::floor(turns)) raise_domain_error("turns must be a whole number for a layer winding");
    return turns;
}

// Layers needed for n turns: full pairs of (odd, even) layers, then what is left.
double layers_for(double n, const LayerTurns& t) {
    if (n == 0.0) return 0.0;
    if (t.odd == 0.0) raise_domain_error("the wire is thicker than the winding length: no turn fits");
    const double pair = t.odd + t.even;
    const double pairs = std::floor(n / pair);
    const double rest = n - pairs * pair;
    return 2.0 * pairs + (rest == 0.0 ? 0.0 : rest <= t.odd ? 1.0 : 2.0);
}

}  // namespace

Packing packing_from_index(double index) {
    if (index == 0.0) return Packing::Square;
    if (index == 1.0) return Packing::Hexagonal;
    raise_domain_error("packing must be square or hexagonal");
}

double winding_layers(double build, double wire_diameter, Packing packing) {
    check::non_negative(build, "build");
    check::positive(wire_diameter, "wire diameter");
    const double ratio = build / wire_diameter;
    if (packing == Packing::Square) return checked_count(whole(ratio), "layers");
    if (whole(ratio) < 1.0) return 0.0;
    return checked_count(1.0 + whole((ratio - 1.0) / kHexPitch), "layers");
}

double winding_turns_per_layer(double length, double wire_diameter) {
    check::non_negative(length, "length");
    check::positive(wire_diameter, "wire diameter");
    return layer_turns(length, wire_diameter, Packing::Square).odd;
}

double winding_turns(double build, double length, double wire_diameter, Packing packing) {
    check::non_negative(length, "length");
    const double layers = winding_layers(build, wire_diameter, packing);
    const LayerTurns t = layer_turns(length, wire_diameter, packing);
    return std::ceil(layers / 2.0) * t.odd + std::floor(layers / 2.0) * t.even;
}

double winding_build(double turns, double length, double wire_diameter, Packing packing) {
    const double n = whole_turns(turns);
    check::positive(length, "length");
    check::positive(wire_diameter, "wire diameter");
    const double layers = layers_for(n, layer_turns(length, wire_diameter, packing));
    if (layers == 0.0) return 0.0;
    return check::finite_result(wire_diameter + (layers - 1.0) * pitch(wire_diameter, packing), "build");
}

double winding_wire_length(double inner_radius, double length, double wire_diameter, double turns, Packing packing) {
    check::positive(inner_radius, "inner radius");
    const double n = whole_turns(turns);
    check::positive(length, "length");
    check::positive(wire_diameter, "wire diameter");
    const LayerTurns t = layer_turns(length, wire_diameter, packing);
    const double layers = layers_for(n, t);
    if (layers == 0.0) return 0.0;
    const double p = pitch(wire_diameter, packing);
    const double r1 = inner_radius + 0.5 * wire_diameter;  // centre radius of the first layer
    // Full layers 1 .. full, then `rest` turns in the next one. Layer k has centre radius
    // r1 + (k - 1) p; the sums over odd and even layers are arithmetic series.
    const double full_pairs = std::floor(n / (t.odd + t.even));
    double rest = n - full_pairs * (t.odd + t.even);
    double full = 2.0 * full_pairs;
    if (rest > t.odd) {  // the next odd layer is full too
        full += 1.0;
        rest -= t.odd;
    }
    const double odd_layers = std::ceil(full / 2.0), even_layers = std::floor(full / 2.0);
    // sum over odd k = 1, 3, .. of (k - 1) = 2 * (0 + 1 + .. + (odd_layers - 1)); even k: 1, 3, 5, ..
    const double odd_radii = odd_layers * r1 + p * odd_layers * (odd_layers - 1.0);
    const double even_radii = even_layers * (r1 + p) + p * even_layers * (even_layers - 1.0);
    const double partial_radius = r1 + full * p;  // layer number full + 1
    const double circumference_sum = t.odd * odd_radii + t.even * even_radii + rest * partial_radius;
    return check::finite_result(2.0 * kPi * circumference_sum, "wire length");
}

double winding_fill(double turns, double bare_diameter, double build, double length) {
    check::non_negative(turns, "turns");
    check::positive(bare_diameter, "bare diameter");
    check::positive(build, "build");
    check::positive(length, "length");
    const double fill = turns * (0.25 * kPi * bare_diameter * bare_diameter) / (build * length);
    if (!(fill <= kDensestFill * (1.0 + kFitTolerance)))
        raise_domain_error("these turns cannot fit in the window: the fill would exceed 0.9069, the densest packing of round wire");
    return fill;
}

double winding_mean_turn(double inner_radius, double outer_radius) {
    check::radial_extent(inner_radius, outer_radius);
    return check::finite_result(kPi * (inner_radius + outer_radius), "mean turn");
}

double winding_mean_turn_rect(double inner_width, double inner_height, double build) {
    check::positive(inner_width, "inner width");
    check::positive(inner_height, "inner height");
    check::non_negative(build, "build");
    return check::finite_result(2.0 * (inner_width + inner_height) + kPi * build, "mean turn");
}

}  // namespace coilwright
