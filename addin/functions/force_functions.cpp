// LOOP_FZ, COIL_FZ, STACK_FZ, SOLENOID_PRESSURE.
#include "coilwright/inductance.hpp"
#include "../core/matrix_result.hpp"
#include "../core/table_binding.hpp"

namespace coilwright::sheet {

template <> Implementation implement<fn::LOOP_FZ>() {
    return numeric<fn::LOOP_FZ>([](const fn::LOOP_FZ::Args& a) {
        return loop_axial_force(a.radius1, a.turns1, a.current1, a.radius2, a.turns2, a.current2, a.distance);
    });
}

template <> Implementation implement<fn::COIL_FZ>() {
    return numeric<fn::COIL_FZ>(
        [](const fn::COIL_FZ::Args& a) {
            return coil_axial_force({a.innerRadius1, a.outerRadius1, a.length1}, a.turns1, a.current1,
                                    {a.innerRadius2, a.outerRadius2, a.length2}, a.turns2, a.current2, a.distance);
        },
        work::kThickInductance);
}

template <> Implementation implement<fn::STACK_FZ>() {
    return prepared<fn::STACK_FZ>([](std::span<const Arg* const> tables) {
        const CoilTable table = read_coil_table(*tables[0]);
        Prepared p;
        p.cost = work::inductance_matrix(table);
        p.shaped = [table](const double*) { return matrix_call_result(axial_forces(table)); };
        return p;
    });
}

template <> Implementation implement<fn::SOLENOID_PRESSURE>() {
    return numeric<fn::SOLENOID_PRESSURE>([](const fn::SOLENOID_PRESSURE::Args& a) {
        return solenoid_mean_pressure(a.radius, a.length, a.turns, a.current);
    });
}

}  // namespace coilwright::sheet
