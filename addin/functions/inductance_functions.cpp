// SOLENOID_L, LOOP_M, LOOP_L, LOOP_K, COIL_L, COIL_M, COIL_K, STACK_LMATRIX, STACK_L, STACK_ENERGY.
#include <cmath>
#include <optional>

#include "../core/coil_table_arg.hpp"
#include "../core/matrix_result.hpp"
#include "../core/registry.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/inductance.hpp"

namespace coilwright::sheet {

namespace {

// Kernel evaluations per element, for the call layer's work bound.
constexpr double kLoopCost = 1.0;
constexpr double kWindingCost = 5e4;

CoilSection section(const double* a) { return {a[0], a[1], a[2]}; }

// A function of a coil table (first argument) and numbers.
Implementation table_function(const char* name, std::function<Prepared(CoilTable)> make) {
    return {name, [make = std::move(make)](std::span<const Arg* const> tables) {
                return make(read_coil_table(*tables[0]));
            }};
}

// One number from the whole table and the optional wire diameter of its loop rows.
template <class F>
Implementation table_quantity(const char* name, F quantity) {
    return table_function(name, [quantity](CoilTable table) {
        const double cost = table_work_estimate(table);
        return Prepared{[table, quantity](const double* a) { return quantity(table, optional_wire_diameter(a[0])); },
                        cost, {}, {}, {}};
    });
}

}  // namespace

std::vector<Implementation> inductance_functions() {
    // Argument orders as in idl/functions/90_inductance.toml.
    return {
        numeric("SOLENOID_L", [](const double* a) { return solenoid_inductance(a[0], a[1], a[2]); }, kLoopCost),
        numeric("LOOP_M", [](const double* a) { return loop_mutual_inductance(a[0], a[1], a[2]); }, kLoopCost),
        numeric("LOOP_L", [](const double* a) { return loop_self_inductance(a[0], a[1], a[2]); }, kLoopCost),
        numeric("LOOP_K",
                [](const double* a) { return loop_coupling(a[0], a[1], a[2], a[3], a[4]); },
                kLoopCost),
        numeric("COIL_L",
                [](const double* a) { return coil_self_inductance(section(a), a[3]); },
                kWindingCost),
        numeric("COIL_M",
                [](const double* a) { return coil_mutual_inductance(section(a), a[3], section(a + 4), a[7], a[8]); },
                kWindingCost),
        numeric("COIL_K",
                [](const double* a) { return coil_coupling(section(a), section(a + 3), a[6]); },
                3 * kWindingCost),
        table_function("STACK_LMATRIX",
                       [](CoilTable table) {
                           Prepared p;
                           p.cost = table_work_estimate(table);
                           p.shaped = [table](const double* a) {
                               return matrix_call_result(inductance_matrix(table, optional_wire_diameter(a[0])));
                           };
                           return p;
                       }),
        table_quantity("STACK_L", [](const CoilTable& t, std::optional<double> d) { return series_inductance(t, d); }),
        table_quantity("STACK_ENERGY", [](const CoilTable& t, std::optional<double> d) { return stored_energy(t, d); }),
    };
}

}  // namespace coilwright::sheet
