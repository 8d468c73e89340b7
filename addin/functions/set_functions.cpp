// SET_* and RIG3_COILS: coils anywhere in space. Thin bindings: the physics is in
// engine/include/coilwright/sets.hpp; argument orders as in idl/functions/52_sets.toml.
#include <cmath>
#include <memory>
#include <string>
#include <vector>

#include "../core/coil_set_arg.hpp"
#include "../core/registry.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/sets.hpp"

namespace coilwright::sheet {

namespace {

using SetPtr = std::shared_ptr<const CoilSet>;

// A function of a coil set (first argument, read once per call) and numbers.
template <class F, class Cost>
Implementation on_coil_set(const char* name, F per_element, Cost cost_of, bool field_batch = false,
                           int component = 0) {
    return {name, [=](std::span<const Arg* const> tables) {
                const SetPtr set = std::make_shared<const CoilSet>(read_coil_set(*tables[0]));
                Prepared p{[set, per_element](const double* a) { return per_element(*set, a); }, cost_of(*set), {}, {},
                           {}};
                if (field_batch)
                    p.batch = [set, component](const double* const* columns, std::size_t n, double* out) {
                        std::vector<double> b(3 * n);
                        set_field_batch(*set, columns[0], columns[1], columns[2], n, b.data(), b.data() + n,
                                        b.data() + 2 * n);
                        for (std::size_t i = 0; i < n; ++i)
                            out[i] = component < 3 ? b[component * n + i]
                                                   : std::sqrt(b[i] * b[i] + b[n + i] * b[n + i] + b[2 * n + i] * b[2 * n + i]);
                        return true;
                    };
                return p;
            }};
}

// |B| the same way in the batch and per element (bit-identical results).
double magnitude(const Eigen::Vector3d& b) { return std::sqrt(b.x() * b.x() + b.y() * b.y() + b.z() * b.z()); }

Implementation field_component(const char* name, int component) {
    return on_coil_set(
        name,
        [component](const CoilSet& set, const double* a) {
            const Eigen::Vector3d b = set_field(set, {a[0], a[1], a[2]});
            return component < 3 ? b[component] : magnitude(b);
        },
        [](const CoilSet& set) { return set_point_cost(set); }, true, component);
}

std::string check_set(std::span<const Arg* const> tables) {
    if (tables[0]->form == Arg::Form::Scalar) throw DomainError("set must be a range (or an inline array) of 12 to 15 columns");
    try {
        const CoilSet set = read_coil_set(*tables[0]);
        const std::size_t n = set.size(), m = set.circuit_count();
        return "OK: " + std::to_string(n) + (n == 1 ? " coil, " : " coils, ") + std::to_string(m) +
               (m == 1 ? " circuit" : " circuits");
    } catch (const DomainError& e) {
        return e.what();
    }
}

// The set index of the row the user numbers `label` (1 = top row of the range).
std::size_t index_of_label(const CoilSet& set, double label) {
    for (std::size_t i = 0; i < set.size(); ++i)
        if (static_cast<double>(set.label(i)) == label) return i;
    throw DomainError("row " + std::to_string(label) + " is not a coil row of the set (blank, or outside it)");
}

// The numbers of a table-kind argument (all its cells, row by row); a missing one is `fallback`.
std::vector<double> numbers_of(const Arg& arg, const char* name, double fallback) {
    if (arg.form == Arg::Form::Missing) return {fallback};
    std::vector<double> out;
    for (std::size_t r = 0; r < arg.rows; ++r)
        for (std::size_t c = 0; c < arg.cols; ++c) {
            const Cell& cell = arg.at(r, c);
            if (cell.kind != CellKind::Number)
                throw DomainError(std::string(name) + (cell.kind == CellKind::Empty ? " has a blank cell" : " has text where a number is needed"));
            out.push_back(cell.number);
        }
    if (out.empty()) throw DomainError(std::string(name) + " is empty");
    return out;
}

Implementation currents() {
    return {"SET_CURRENTS", [](std::span<const Arg* const> tables) {
                const CoilSet set = read_coil_set(*tables[0]);
                const char* names[6] = {"bx", "by", "bz", "x", "y", "z"};
                std::vector<double> v[6];
                std::size_t n = 1;
                for (int k = 0; k < 6; ++k) {
                    v[k] = numbers_of(*tables[1 + k], names[k], 0.0);
                    if (v[k].size() == 1) continue;
                    if (n != 1 && v[k].size() != n)
                        throw DomainError(std::string(names[k]) + " has " + std::to_string(v[k].size()) +
                                          " values, the other ranges " + std::to_string(n) +
                                          ": give one value per point, or a single value");
                    n = v[k].size();
                }
                if (n > 10000) throw DomainError("at most 10000 points");
                std::vector<Eigen::Vector3d> points, targets;
                const auto at = [&](int k, std::size_t i) { return v[k].size() == 1 ? v[k][0] : v[k][i]; };
                for (std::size_t i = 0; i < n; ++i) {
                    targets.emplace_back(at(0, i), at(1, i), at(2, i));
                    points.emplace_back(at(3, i), at(4, i), at(5, i));
                }
                const Eigen::VectorXd i = set_currents(set, points, targets);
                Prepared p;
                p.cost = 1.0;
                p.shaped = [i](const double*) {
                    CallResult r;
                    r.rows = static_cast<std::size_t>(i.size());
                    r.cols = 1;
                    r.values.assign(i.data(), i.data() + i.size());
                    r.errors.assign(r.values.size(), CellError::None);
                    return r;
                };
                return p;
            }};
}

Implementation inductance_matrix_of_set() {
    return {"SET_LMATRIX", [](std::span<const Arg* const> tables) {
                const auto set = std::make_shared<const CoilSet>(read_coil_set(*tables[0]));
                Prepared p;
                p.cost = 2e4 * static_cast<double>(set->size() * set->size());
                p.shaped = [set](const double* a) {
                    const Eigen::MatrixXd l = set_inductance_matrix(*set, a[0]);
                    CallResult r;
                    r.rows = static_cast<std::size_t>(l.rows());
                    r.cols = static_cast<std::size_t>(l.cols());
                    for (Eigen::Index i = 0; i < l.rows(); ++i)
                        for (Eigen::Index j = 0; j < l.cols(); ++j) r.values.push_back(l(i, j));
                    r.errors.assign(r.values.size(), CellError::None);
                    return r;
                };
                return p;
            }};
}

// SET_FORCE and SET_TORQUE: (row, component) after the set.
Implementation force_like(const char* name, Eigen::Vector3d (*quantity)(const CoilSet&, std::size_t)) {
    return on_coil_set(
        name,
        [quantity](const CoilSet& set, const double* a) {
            const Eigen::Vector3d f = quantity(set, index_of_label(set, a[0]));
            const int k = static_cast<int>(a[1]);
            return k < 3 ? f[k] : f.norm();
        },
        // Line integrals along the turn of the field of every other row (x 16 for a thick row).
        [](const CoilSet& set) { return 16.0 * 400.0 * set_point_cost(set); });
}

Implementation rig3() {
    return {"RIG3_COILS", [](std::span<const Arg* const>) {
                Prepared p;
                p.cost = 100.0;
                p.shaped = [](const double* a) {
                    return coil_set_result(rig3_coils(a[0], a[1], a[2], a[3] == 0.0 ? SetShape::Circle : SetShape::Rect));
                };
                return p;
            }};
}

}  // namespace

std::vector<Implementation> set_functions() {
    return {
        field_component("SET_BX", 0),
        field_component("SET_BY", 1),
        field_component("SET_BZ", 2),
        field_component("SET_B", 3),
        text_result("SET_CHECK", check_set),
        currents(),
        on_coil_set(
            "SET_UNIFORM_SPHERE",
            [](const CoilSet& set, const double* a) { return set_uniform_sphere(set, a[0], {a[1], a[2], a[3]}); },
            // Up to a few hundred shells of 256 directions and their refinement.
            [](const CoilSet& set) { return 2e5 * set_point_cost(set); }),
        inductance_matrix_of_set(),
        force_like("SET_FORCE", set_force),
        force_like("SET_TORQUE", set_torque),
        rig3(),
    };
}

}  // namespace coilwright::sheet
