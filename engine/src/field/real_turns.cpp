#include "coilwright/field/real_turns.hpp"

#include <cmath>
#include <string>

#include "coilwright/constants.hpp"
#include "coilwright/field/loop.hpp"
#include "numerics/checks.hpp"
#include "numerics/policy.hpp"

namespace coilwright {

using namespace internal;

namespace {

void whole_at_least_one(double v, const char* name) {
    if (!(std::isfinite(v) && v >= 1.0 && v == std::floor(v)))
        raise_domain_error(std::string(name) + " must be a whole number >= 1");
}

double pitch(const LayerWinding& w) {
    return w.packing == Packing::Hexagonal ? w.wire_diameter * std::sqrt(3.0) / 2.0 : w.wire_diameter;
}

bool shifted(const LayerWinding& w, int layer) { return w.packing == Packing::Hexagonal && layer % 2 == 1; }

// The turns of a layer of a winding already validated (every second hexagonal layer holds one fewer).
double turns_in_layer(const LayerWinding& w, int layer) {
    return shifted(w, layer) ? w.turns_per_layer - 1.0 : w.turns_per_layer;
}

double layer_radius(const LayerWinding& w, int layer) {
    return w.inner_radius + w.wire_diameter / 2.0 + static_cast<double>(layer) * pitch(w);
}

}  // namespace

void validate(const LayerWinding& w) {
    check::positive(w.inner_radius, "inner radius");
    check::positive(w.wire_diameter, "wire diameter");
    whole_at_least_one(w.turns_per_layer, "turns per layer");
    whole_at_least_one(w.layers, "layers");
    check::finite(w.current, "current");
    if (w.packing != Packing::Square && w.packing != Packing::Hexagonal)
        raise_domain_error("packing must be square or hexagonal");
    if (w.turns_per_layer * w.layers > kMaxRealTurns)
        raise_domain_error("turns per layer times layers must be at most 100000 (each turn is summed at every point)");
    // The outermost layer's radius and the winding's length must be numbers (found by fuzzing).
    if (!std::isfinite(w.inner_radius + w.wire_diameter * (w.layers + 1.0)) ||
        !std::isfinite(w.wire_diameter * w.turns_per_layer))
        raise_domain_error("the winding is too large: its outer radius or length overflows");
}

double layer_turns(const LayerWinding& w, int layer) {
    validate(w);
    if (layer < 0 || static_cast<double>(layer) >= w.layers)
        raise_domain_error("the layer must be one of the winding's layers, counted from 0");
    return turns_in_layer(w, layer);
}

double winding_total_turns(const LayerWinding& w) {
    validate(w);
    double total = 0.0;
    for (int j = 0; j < static_cast<int>(w.layers); ++j) total += turns_in_layer(w, j);
    return total;
}

std::vector<TurnPosition> winding_turn_positions(const LayerWinding& w) {
    validate(w);
    std::vector<TurnPosition> turns;
    turns.reserve(static_cast<std::size_t>(w.turns_per_layer * w.layers));
    for (int j = 0; j < static_cast<int>(w.layers); ++j) {
        const double n = turns_in_layer(w, j), a = layer_radius(w, j);
        for (int k = 0; k < static_cast<int>(n); ++k)
            turns.push_back({a, (static_cast<double>(k) - (n - 1.0) / 2.0) * w.wire_diameter});
    }
    return turns;
}

FieldRZ real_turns_field(const LayerWinding& w, double z, double r) {
    check::finite(z, "z");
    check::non_negative(r, "r");
    FieldRZ sum;
    for (const TurnPosition& t : winding_turn_positions(w)) sum += loop_field({t.radius, 1.0, w.current}, z - t.z, r);
    sum.bz = check::finite_result(sum.bz, "Bz");
    sum.br = check::finite_result(sum.br, "Br");
    return sum;
}

double real_turns_bphi(const LayerWinding& w, double z, double r) {
    validate(w);
    check::finite(z, "z");
    check::non_negative(r, "r");
    if (r == 0.0) return 0.0;  // no layer's current lies inside
    double sum = 0.0;
    for (int j = 0; j < static_cast<int>(w.layers); ++j) {
        const double a = layer_radius(w, j);
        if (r < a) continue;
        const double half = turns_in_layer(w, j) * w.wire_diameter / 2.0;
        const double sign = j % 2 == 0 ? 1.0 : -1.0;
        const double ends = (z + half) / std::hypot(z + half, r) - (z - half) / std::hypot(z - half, r);
        sum += (r == a ? 0.5 : 1.0) * sign * ends;
    }
    return check::finite_result(kMu0 * w.current / (4.0 * kPi * r) * sum, "B_phi");
}

ThickCoilSpec smooth_winding(const LayerWinding& w) {
    const double turns = winding_total_turns(w);
    const double build = w.wire_diameter + (w.layers - 1.0) * pitch(w);
    return {w.inner_radius, w.inner_radius + build, w.turns_per_layer * w.wire_diameter, turns, w.current};
}

double real_turns_model_error(const LayerWinding& w, double z, double r) {
    const FieldRZ smooth = thick_coil_field(smooth_winding(w), z, r);
    const FieldRZ real = real_turns_field(w, z, r);
    const double scale = smooth.magnitude();
    if (!(scale > 0.0)) raise_singular_point("the smooth model's field vanishes here: no relative error");
    return check::finite_result(std::hypot(real.bz - smooth.bz, real.br - smooth.br) / scale, "the model error");
}

}  // namespace coilwright
