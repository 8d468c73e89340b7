#include "coilwright/design/turn_sensitivity.hpp"

#include <cmath>
#include <string>
#include <vector>

#include "coilwright/design/uniform_region.hpp"
#include "coilwright/field/loop.hpp"
#include "numerics/checks.hpp"
#include "numerics/policy.hpp"

namespace coilwright {

using namespace internal;

namespace {

// Index into winding_turn_positions of the given layer and turn (both 1-based).
std::size_t turn_index(const LayerWinding& w, double layer, double turn) {
    if (!(std::isfinite(layer) && layer >= 1.0 && layer <= w.layers && layer == std::floor(layer)))
        raise_domain_error("layer must be a whole number from 1 to the number of layers");
    const int j = static_cast<int>(layer) - 1;
    const double n = layer_turns(w, j);
    if (!(std::isfinite(turn) && turn >= 1.0 && turn <= n && turn == std::floor(turn)))
        raise_domain_error("turn must be a whole number from 1 to the turns of that layer (" +
                           std::to_string(static_cast<int>(n)) + ")");
    std::size_t index = 0;
    for (int k = 0; k < j; ++k) index += static_cast<std::size_t>(layer_turns(w, k));
    return index + static_cast<std::size_t>(turn) - 1;
}

CoilTable loops(const std::vector<TurnPosition>& turns, double current) {
    std::vector<CoilRow> rows;
    rows.reserve(turns.size());
    for (const TurnPosition& t : turns) rows.push_back({t.radius, t.radius, 0.0, t.z, 1.0, current});
    return CoilTable(std::move(rows));
}

}  // namespace

double turn_sensitivity(const LayerWinding& w, double layer, double turn, CoilParameter parameter, double displacement,
                        SensitivityQuantity quantity, double z0, double tolerance) {
    std::vector<TurnPosition> turns = winding_turn_positions(w);
    const std::size_t i = turn_index(w, layer, turn);
    check::finite(z0, "z0");
    const TurnPosition before = turns[i];
    bool missing = false;
    switch (parameter) {
        case CoilParameter::Position:
            check::finite(displacement, "displacement");
            turns[i].z += displacement;
            break;
        case CoilParameter::Radius:
            check::finite(displacement, "displacement");
            turns[i].radius += displacement;
            if (!(turns[i].radius > 0.0)) raise_domain_error("the displaced turn's radius must stay > 0");
            break;
        case CoilParameter::Turns:
            missing = true;
            break;
        default:
            raise_domain_error("for one turn the parameter must be position, radius or turns (a missing turn)");
    }
    if (quantity == SensitivityQuantity::Field) {
        const double old_bz = loop_field({before.radius, 1.0, w.current}, z0 - before.z, 0.0).bz;
        const double new_bz = missing ? 0.0 : loop_field({turns[i].radius, 1.0, w.current}, z0 - turns[i].z, 0.0).bz;
        return check::finite_result(new_bz - old_bz, "the change of the field");
    }
    if (quantity != SensitivityQuantity::Uniform) raise_domain_error("quantity must be field or uniform");
    if (static_cast<double>(turns.size()) > kMaxSearchTurns)
        raise_domain_error("the uniform region of a winding with more than 5000 turns is not searched turn by turn");
    if (!(tolerance > 0.0 && tolerance < 1.0)) raise_domain_error("tolerance must be between 0 and 1");
    const double base = axial_uniform_half_length(loops(winding_turn_positions(w), w.current), tolerance, z0);
    if (missing) turns.erase(turns.begin() + static_cast<std::ptrdiff_t>(i));
    const double changed = axial_uniform_half_length(loops(turns, w.current), tolerance, z0);
    return check::finite_result(changed - base, "the change of the uniform half-length");
}

}  // namespace coilwright
