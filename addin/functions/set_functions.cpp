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

// The numbers of a range of points (all its cells, row by row, entirely blank rows skipped); a
// missing argument is the single value 0.
std::vector<double> point_coordinates(const Arg& arg, const char* name) {
    if (arg.form == Arg::Form::Missing) return {0.0};
    std::vector<double> out;
    for (std::size_t r = 0; r < arg.rows; ++r) {
        bool blank = true;
        for (std::size_t c = 0; c < arg.cols; ++c) blank = blank && arg.at(r, c).kind == CellKind::Empty;
        if (blank) continue;
        for (std::size_t c = 0; c < arg.cols; ++c) {
            const Cell& cell = arg.at(r, c);
            if (cell.kind != CellKind::Number)
                throw DomainError(std::string(name) + (cell.kind == CellKind::Empty ? " has a blank cell"
                                                                                  : " has text where a number is needed"));
            out.push_back(cell.number);
        }
    }
    if (out.empty()) throw DomainError(std::string(name) + " has no numbers");
    return out;
}

Implementation currents() {
    return {"SET_CURRENTS", [](std::span<const Arg* const> tables) {
                const auto set = std::make_shared<const CoilSet>(read_coil_set(*tables[0]));
                const std::vector<double> x = point_coordinates(*tables[1], "x"), y = point_coordinates(*tables[2], "y"),
                                          z = point_coordinates(*tables[3], "z");
                if (y.size() != x.size() || z.size() != x.size())
                    throw DomainError("x, y and z must have one value per point: they have " + std::to_string(x.size()) +
                                      ", " + std::to_string(y.size()) + " and " + std::to_string(z.size()));
                if (x.size() > 10000) throw DomainError("at most 10000 points");
                std::vector<Eigen::Vector3d> points;
                for (std::size_t i = 0; i < x.size(); ++i) points.emplace_back(x[i], y[i], z[i]);
                Prepared p;
                p.cost = set_point_cost(*set) * static_cast<double>(points.size());
                p.shaped = [set, points](const double* a) {
                    const std::vector<Eigen::Vector3d> targets(points.size(), Eigen::Vector3d(a[0], a[1], a[2]));
                    const Eigen::VectorXd i = set_currents(*set, points, targets);
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
        // Line integrals along the turn of the field of every other row (up to 2000 points near
        // another winding), 16 times for a thick row.
        [](const CoilSet& set) { return 16.0 * 2000.0 * set_point_cost(set); });
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
