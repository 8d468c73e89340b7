// UNIFORM_COILS, GRADIENT_COILS, MULTIPAIR_COILS, GRADMULTIPAIR_COILS, STACK_ORDER and the
// TURNS_ functions: higher-order designs and the real turns of a layer winding.
#include <cmath>

#include "coilwright/design.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field.hpp"
#include "../core/table_binding.hpp"
#include "../core/table_result.hpp"

namespace coilwright::sheet {

namespace {

int whole_pairs(double v) {
    if (!(v >= 1 && v <= kMaxDesignPairs && v == std::floor(v)))
        throw DomainError("pairs must be a whole number from 1 to " + std::to_string(kMaxDesignPairs));
    return static_cast<int>(v);
}

// A function of single numbers whose result is a coil table: make(const Fn::Args&).
template <class Fn, class F> Implementation design_table(F make, double cost) {
    return prepared<Fn>([make, cost](std::span<const Arg* const>) {
        Prepared p;
        p.cost = cost;
        p.shaped = [make](const double* a) { return coil_table_result(make(Fn::Args::from(a))); };
        return p;
    });
}

template <class A> LayerWinding winding_of(const A& a) {
    return {a.innerRadius, a.insulatedDiameter, a.turnsPerLayer, a.layers, a.current, a.packing};
}

}  // namespace

template <> Implementation implement<fn::UNIFORM_COILS>() {
    return design_table<fn::UNIFORM_COILS>(
        [](const fn::UNIFORM_COILS::Args& a) {
            return uniform_coils(a.radius, whole_pairs(a.pairs), a.ampereTurns, a.constraint, a.centre);
        },
        work::kLoopDesign);
}

template <> Implementation implement<fn::GRADIENT_COILS>() {
    return design_table<fn::GRADIENT_COILS>(
        [](const fn::GRADIENT_COILS::Args& a) {
            return gradient_coils(a.radius, whole_pairs(a.pairs), a.ampereTurns, a.constraint);
        },
        work::kLoopDesign);
}

template <> Implementation implement<fn::MULTIPAIR_COILS>() {
    return design_table<fn::MULTIPAIR_COILS>(
        [](const fn::MULTIPAIR_COILS::Args& a) {
            return uniform_thick_coils({a.innerRadius, a.outerRadius, a.length}, whole_pairs(a.pairs), a.ampereTurns,
                                       a.centre);
        },
        work::kWindingDesign);
}

template <> Implementation implement<fn::GRADMULTIPAIR_COILS>() {
    return design_table<fn::GRADMULTIPAIR_COILS>(
        [](const fn::GRADMULTIPAIR_COILS::Args& a) {
            return gradient_thick_coils({a.innerRadius, a.outerRadius, a.length}, whole_pairs(a.pairs), a.ampereTurns);
        },
        work::kWindingDesign);
}

template <> Implementation implement<fn::STACK_ORDER>() {
    return on_coil_table<fn::STACK_ORDER>(
        [](const CoilTable& t, const fn::STACK_ORDER::Args& a) { return static_cast<double>(design_order(t, a.z0)); },
        per_row(work::kOrderJetPerRow));
}

template <> Implementation implement<fn::TURNS_BZ>() {
    return numeric<fn::TURNS_BZ>(
        [](const fn::TURNS_BZ::Args& a) { return real_turns_field(winding_of(a), a.z, a.r).bz; },
        work::kRealTurnsPoint);
}

template <> Implementation implement<fn::TURNS_BR>() {
    return numeric<fn::TURNS_BR>(
        [](const fn::TURNS_BR::Args& a) { return real_turns_field(winding_of(a), a.z, a.r).br; },
        work::kRealTurnsPoint);
}

template <> Implementation implement<fn::TURNS_B>() {
    return numeric<fn::TURNS_B>(
        [](const fn::TURNS_B::Args& a) { return real_turns_field(winding_of(a), a.z, a.r).magnitude(); },
        work::kRealTurnsPoint);
}

template <> Implementation implement<fn::TURNS_BPHI>() {
    return numeric<fn::TURNS_BPHI>(
        [](const fn::TURNS_BPHI::Args& a) { return real_turns_bphi(winding_of(a), a.z, a.r); }, work::kClosedForm);
}

template <> Implementation implement<fn::TURNS_MODEL_ERROR>() {
    return numeric<fn::TURNS_MODEL_ERROR>(
        [](const fn::TURNS_MODEL_ERROR::Args& a) { return real_turns_model_error(winding_of(a), a.z, a.r); },
        work::kRealTurnsPoint + work::kThickField);
}

template <> Implementation implement<fn::TURNS_SENSITIVITY>() {
    return numeric<fn::TURNS_SENSITIVITY>(
        [](const fn::TURNS_SENSITIVITY::Args& a) {
            return turn_sensitivity(winding_of(a), a.layer, a.turn, a.parameter, a.displacement, a.quantity, a.z0,
                                    a.tolerance);
        },
        work::kTurnSensitivity);
}

}  // namespace coilwright::sheet
