// SOLENOID_L, LOOP_M, LOOP_L, LOOP_K, COIL_L, COIL_M, COIL_K, STACK_LMATRIX, STACK_L, STACK_ENERGY.
#include <cmath>
#include <optional>

#include "../core/coil_table_arg.hpp"
#include "../core/registry.hpp"
#include "coilwright/checks.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/mutual_inductance.hpp"
#include "coilwright/self_inductance.hpp"
#include "coilwright/stack_inductance.hpp"

namespace coilwright::sheet {

namespace {

// Kernel evaluations per element, for the call layer's work bound.
constexpr double kLoopCost = 1.0;
constexpr double kWindingCost = 5e4;

// The optional wire diameter of table functions: 0 (the default) means "not given".
std::optional<double> optional_diameter(double d) {
    if (d == 0.0) return std::nullopt;
    check::positive(d, "wire diameter");
    return d;
}

double coupling(double m, double l1, double l2) {
    if (!(l1 > 0.0 && l2 > 0.0)) throw DomainError("a coil without turns or area has no coupling coefficient");
    return m / std::sqrt(l1 * l2);
}

WindingShape winding(const double* a) { return {a[0], a[1], a[2]}; }

// COIL_K is defined for windings with area; a loop needs LOOP_K and its wire diameter.
double shape_self(const WindingShape& w, const char* which) {
    if (w.inner == w.outer && w.length == 0.0)
        throw DomainError(std::string(which) + " is a loop: its self-inductance needs a wire diameter (use LOOP_K)");
    return winding_self_inductance(w);
}

CallResult matrix_result(const MatrixWithProblems& m) {
    CallResult r;
    r.rows = static_cast<std::size_t>(m.values.rows());
    r.cols = static_cast<std::size_t>(m.values.cols());
    r.values.resize(r.rows * r.cols);
    r.errors.assign(r.rows * r.cols, CellError::None);
    for (std::size_t i = 0; i < r.rows; ++i)
        for (std::size_t j = 0; j < r.cols; ++j) {
            const std::size_t at = i * r.cols + j;
            r.values[at] = m.values(static_cast<Eigen::Index>(i), static_cast<Eigen::Index>(j));
            if (!m.problems[at].empty()) r.errors[at] = CellError::IllegalArgument;
        }
    return r;
}

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
        const double cost = stack_work_estimate(table);
        return Prepared{[table, quantity](const double* a) { return quantity(table, optional_diameter(a[0])); },
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
                [](const double* a) {
                    const double m = loop_mutual_inductance(a[0], a[2], a[4]);
                    return coupling(m, loop_self_inductance(a[0], a[1], 1.0), loop_self_inductance(a[2], a[3], 1.0));
                },
                kLoopCost),
        numeric("COIL_L",
                [](const double* a) {
                    check::non_negative(a[3], "turns");
                    return a[3] * a[3] * winding_self_inductance(winding(a));
                },
                kWindingCost),
        numeric("COIL_M",
                [](const double* a) {
                    check::non_negative(a[3], "turns 1");
                    check::non_negative(a[7], "turns 2");
                    return a[3] * a[7] * winding_mutual_inductance(winding(a), winding(a + 4), a[8]);
                },
                kWindingCost),
        numeric("COIL_K",
                [](const double* a) {
                    const WindingShape w1 = winding(a), w2 = winding(a + 3);
                    const double m = winding_mutual_inductance(w1, w2, a[6]);
                    return coupling(m, shape_self(w1, "coil 1"), shape_self(w2, "coil 2"));
                },
                3 * kWindingCost),
        table_function("STACK_LMATRIX",
                       [](CoilTable table) {
                           Prepared p;
                           p.cost = stack_work_estimate(table);
                           p.shaped = [table](const double* a) {
                               return matrix_result(inductance_matrix(table, optional_diameter(a[0])));
                           };
                           return p;
                       }),
        table_quantity("STACK_L", [](const CoilTable& t, std::optional<double> d) { return series_inductance(t, d); }),
        table_quantity("STACK_ENERGY", [](const CoilTable& t, std::optional<double> d) { return stored_energy(t, d); }),
    };
}

}  // namespace coilwright::sheet
