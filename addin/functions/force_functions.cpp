// LOOP_FZ, COIL_FZ, STACK_FZ, SOLENOID_PRESSURE.
#include "../core/coil_table_arg.hpp"
#include "../core/matrix_result.hpp"
#include "../core/registry.hpp"
#include "coilwright/inductance.hpp"

namespace coilwright::sheet {

namespace {

constexpr double kLoopCost = 1.0;
constexpr double kWindingCost = 5e4;

}  // namespace

std::vector<Implementation> force_functions() {
    // Argument orders as in idl/functions/95_force.toml.
    return {
        numeric("LOOP_FZ",
                [](const double* a) { return loop_axial_force(a[0], a[1], a[2], a[3], a[4], a[5], a[6]); },
                kLoopCost),
        numeric("COIL_FZ",
                [](const double* a) {
                    return coil_axial_force({a[0], a[1], a[2]}, a[3], a[4], {a[5], a[6], a[7]}, a[8], a[9], a[10]);
                },
                kWindingCost),
        {"STACK_FZ",
         [](std::span<const Arg* const> tables) {
             const CoilTable table = read_coil_table(*tables[0]);
             Prepared p;
             p.cost = table_work_estimate(table);
             p.shaped = [table](const double*) { return matrix_call_result(axial_forces(table)); };
             return p;
         }},
        numeric("SOLENOID_PRESSURE",
                [](const double* a) { return solenoid_mean_pressure(a[0], a[1], a[2], a[3]); }, kLoopCost),
    };
}

}  // namespace coilwright::sheet
