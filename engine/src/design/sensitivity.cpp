#include "coilwright/design/sensitivity.hpp"

#include <algorithm>
#include <cmath>
#include <string>

#include "coilwright/field/axial.hpp"
#include "field/axial_jet.hpp"
#include "numerics/checks.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/design/uniform_region.hpp"
#include "design/scan.hpp"

namespace coilwright {

using namespace internal;

namespace {

const CoilRow& row_at(const CoilTable& table, std::size_t index) {
    if (index >= table.size()) raise_domain_error("row " + std::to_string(index + 1) + " is not in the coil table");
    return table.rows()[index];
}

void check_parameter(CoilParameter parameter) {
    if (static_cast<unsigned>(parameter) > static_cast<unsigned>(CoilParameter::Current))
        raise_domain_error("parameter must be radius, inner, outer, length, position, turns or current");
}

bool is_thin(const CoilRow& row) { return row.inner_radius == row.outer_radius; }

// A step for finite differences, small next to the row's own dimensions.
double step_for(const CoilRow& row, CoilParameter parameter) {
    switch (parameter) {
        case CoilParameter::Turns:
            return 1e-6 * std::max(row.turns, 1.0);
        case CoilParameter::Current:
            return 1e-6 * std::max(std::fabs(row.current), 1.0);
        default:
            return 1e-6 * std::max({row.outer_radius, row.length});
    }
}

}  // namespace

CoilTable perturbed(const CoilTable& table, std::size_t index, CoilParameter parameter, double delta) {
    row_at(table, index);  // checks the index
    std::vector<CoilRow> rows = table.rows();
    CoilRow& row = rows[index];
    const bool thin = is_thin(row);
    switch (parameter) {
        case CoilParameter::Radius:
            row.inner_radius += delta;
            row.outer_radius += delta;
            break;
        case CoilParameter::Inner:
        case CoilParameter::Outer:
            if (thin) raise_domain_error("row " + std::to_string(table.label(index)) +
                                        " is thin (inner = outer): use the parameter \"radius\"");
            (parameter == CoilParameter::Inner ? row.inner_radius : row.outer_radius) += delta;
            break;
        case CoilParameter::Length:
            row.length += delta;
            break;
        case CoilParameter::Position:
            row.centre_z += delta;
            break;
        case CoilParameter::Turns:
            row.turns += delta;
            break;
        case CoilParameter::Current:
            row.current += delta;
            break;
    }
    std::vector<std::size_t> labels(table.size());
    for (std::size_t i = 0; i < labels.size(); ++i) labels[i] = table.label(i);
    return CoilTable(std::move(rows), std::move(labels));
}

double field_sensitivity(const CoilTable& table, std::size_t index, CoilParameter parameter, double z0) {
    check::finite(z0, "z");
    check_parameter(parameter);
    const CoilRow& row = row_at(table, index);
    switch (parameter) {
        case CoilParameter::Turns:
        case CoilParameter::Current: {
            // The row's field is proportional to its ampere-turns.
            CoilRow unit = row;
            unit.turns = 1.0;
            unit.current = 1.0;
            const double per_ampere_turn = axial_jet_n<1>(unit, z0).c[0];
            return check::finite_result(per_ampere_turn * (parameter == CoilParameter::Turns ? row.current : row.turns),
                                        "the sensitivity");
        }
        case CoilParameter::Position:
            // Moving a coil by d shifts its field: dB(z0)/d(centre) = -dB/dz.
            return check::finite_result(-axial_jet_n<2>(row, z0).c[1], "the sensitivity");
        default:
            break;
    }
    const double h = step_for(row, parameter);
    const bool at_lower_limit = parameter == CoilParameter::Length && row.length == 0.0;
    const auto b = [&](double delta) { return axial_jet_n<1>(perturbed(table, index, parameter, delta), z0).c[0]; };
    if (at_lower_limit) {
        // A loop can only grow a length: one-sided differences, Richardson to second order.
        const double d1 = (b(h) - b(0)) / h, d2 = (b(h / 2) - b(0)) / (h / 2);
        return check::finite_result(2 * d2 - d1, "the sensitivity");
    }
    const double d1 = (b(h) - b(-h)) / (2 * h), d2 = (b(h / 2) - b(-h / 2)) / h;
    return check::finite_result((4 * d2 - d1) / 3, "the sensitivity");
}

double uniform_length_sensitivity(const CoilTable& table, std::size_t index, CoilParameter parameter,
                                  double z0, double tolerance) {
    check_parameter(parameter);
    const CoilRow& row = row_at(table, index);
    const double h = step_for(row, parameter) * 10;  // the half-length is itself a root: keep roundoff small
    const double base = axial_uniform_half_length(table, tolerance, z0);
    const auto half = [&](double delta) {
        return axial_uniform_half_length(perturbed(table, index, parameter, delta), tolerance, z0);
    };
    // One-sided slopes (second order by Richardson) in each direction of the error.
    const auto slope = [&](double sign) {
        const double d1 = (half(sign * h) - base) / h, d2 = (half(sign * h / 2) - base) / (h / 2);
        return 2 * d2 - d1;
    };
    const bool only_up = parameter == CoilParameter::Length && row.length == 0.0;
    const double up = slope(+1.0);
    const double down = only_up ? 0.0 : slope(-1.0);
    return check::finite_result(std::min({up, down, 0.0}), "the sensitivity");
}

double sensitivity(const CoilTable& table, std::size_t index, CoilParameter parameter, SensitivityQuantity quantity,
                   double z0, double tolerance) {
    switch (quantity) {
        case SensitivityQuantity::Field: return field_sensitivity(table, index, parameter, z0);
        case SensitivityQuantity::Uniform: return uniform_length_sensitivity(table, index, parameter, z0, tolerance);
    }
    raise_domain_error("quantity must be field or uniform");
}

}  // namespace coilwright
