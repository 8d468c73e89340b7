// SOLENOID_L, LOOP_M, LOOP_L, LOOP_K, COIL_L, COIL_M, COIL_K, STACK_LMATRIX, STACK_L, STACK_ENERGY.
#include "coilwright/inductance.hpp"
#include "../core/matrix_result.hpp"
#include "../core/table_binding.hpp"

namespace coilwright::sheet {

namespace {

// One number from the whole table and the optional conductor diameter of its loop rows.
template <class Fn, class F>
Implementation table_quantity(F quantity) {
    return prepared<Fn>([quantity](std::span<const Arg* const> tables) {
        const CoilTable table = read_coil_table(*tables[0]);
        return Prepared{[table, quantity](const double* a) {
                            return quantity(table, optional_wire_diameter(Fn::Args::from(a).conductorDiameter));
                        },
                        work::inductance_matrix(table), {}, {}, {}};
    });
}

}  // namespace

template <> Implementation implement<fn::SOLENOID_L>() {
    return numeric<fn::SOLENOID_L>(
        [](const fn::SOLENOID_L::Args& a) { return solenoid_inductance(a.radius, a.length, a.turns); });
}

template <> Implementation implement<fn::LOOP_M>() {
    return numeric<fn::LOOP_M>(
        [](const fn::LOOP_M::Args& a) { return loop_mutual_inductance(a.radius1, a.radius2, a.distance); });
}

template <> Implementation implement<fn::LOOP_L>() {
    return numeric<fn::LOOP_L>(
        [](const fn::LOOP_L::Args& a) { return loop_self_inductance(a.radius, a.conductorDiameter, a.turns); });
}

template <> Implementation implement<fn::LOOP_K>() {
    return numeric<fn::LOOP_K>([](const fn::LOOP_K::Args& a) {
        return loop_coupling(a.radius1, a.conductorDiameter1, a.radius2, a.conductorDiameter2, a.distance);
    });
}

template <> Implementation implement<fn::COIL_L>() {
    return numeric<fn::COIL_L>(
        [](const fn::COIL_L::Args& a) {
            return coil_self_inductance({a.innerRadius, a.outerRadius, a.length}, a.turns);
        },
        work::kThickInductance);
}

template <> Implementation implement<fn::COIL_M>() {
    return numeric<fn::COIL_M>(
        [](const fn::COIL_M::Args& a) {
            return coil_mutual_inductance({a.innerRadius1, a.outerRadius1, a.length1}, a.turns1,
                                          {a.innerRadius2, a.outerRadius2, a.length2}, a.turns2, a.distance);
        },
        work::kThickInductance);
}

template <> Implementation implement<fn::COIL_K>() {
    return numeric<fn::COIL_K>(
        [](const fn::COIL_K::Args& a) {
            return coil_coupling({a.innerRadius1, a.outerRadius1, a.length1}, {a.innerRadius2, a.outerRadius2, a.length2},
                                 a.distance);
        },
        3 * work::kThickInductance);
}

template <> Implementation implement<fn::STACK_LMATRIX>() {
    return prepared<fn::STACK_LMATRIX>([](std::span<const Arg* const> tables) {
        const CoilTable table = read_coil_table(*tables[0]);
        Prepared p;
        p.cost = work::inductance_matrix(table);
        p.shaped = [table](const double* a) {
            const auto args = fn::STACK_LMATRIX::Args::from(a);
            return matrix_call_result(inductance_matrix(table, optional_wire_diameter(args.conductorDiameter)));
        };
        return p;
    });
}

template <> Implementation implement<fn::STACK_L>() {
    return table_quantity<fn::STACK_L>(
        [](const CoilTable& t, std::optional<double> d) { return series_inductance(t, d); });
}

template <> Implementation implement<fn::STACK_ENERGY>() {
    return table_quantity<fn::STACK_ENERGY>(
        [](const CoilTable& t, std::optional<double> d) { return stored_energy(t, d); });
}

}  // namespace coilwright::sheet
