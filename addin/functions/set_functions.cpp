// SET_* and RIG3_COILS: coils anywhere in space. Thin bindings: the physics is in
// engine/include/coilwright/sets.hpp.
#include <cmath>
#include <memory>
#include <string>
#include <vector>

#include "coilwright/errors.hpp"
#include "coilwright/sets.hpp"
#include "../core/coil_set_arg.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

namespace {

using SetPtr = std::shared_ptr<const CoilSet>;

// A function of a coil set (its first argument, read once per call) and numbers:
// per_element(set, const Fn::Args&); cost_of(set) the work per element.
template <class Fn, class F, class Cost>
Prepared on_set(const SetPtr& set, F per_element, Cost cost_of) {
    return Prepared{[set, per_element](const double* a) { return per_element(*set, Fn::Args::from(a)); },
                    cost_of(*set), {}, {}, {}};
}

// |B| the same way in the batch and per element (bit-identical results).
double magnitude(const Eigen::Vector3d& b) { return std::sqrt(b.x() * b.x() + b.y() * b.y() + b.z() * b.z()); }

double pick(const Eigen::Vector3d& b, int component) { return component < 3 ? b[component] : magnitude(b); }

// SET_BX, SET_BY, SET_BZ, SET_B: a batch through set_field_batch for array formulas (columns
// x, y, z in catalogue order).
template <class Fn>
Implementation field_component(int component) {
    return prepared<Fn>([component](std::span<const Arg* const> tables) {
        const SetPtr set = std::make_shared<const CoilSet>(read_coil_set(*tables[0]));
        Prepared p = on_set<Fn>(
            set,
            [component](const CoilSet& s, const typename Fn::Args& a) {
                return pick(set_field(s, {a.x, a.y, a.z}), component);
            },
            work::set_point);
        p.batch = [set, component](const double* const* columns, std::size_t n, double* out) {
            std::vector<double> b(3 * n);
            set_field_batch(*set, columns[0], columns[1], columns[2], n, b.data(), b.data() + n, b.data() + 2 * n);
            for (std::size_t i = 0; i < n; ++i)
                out[i] = component < 3 ? b[static_cast<std::size_t>(component) * n + i]
                                       : magnitude({b[i], b[n + i], b[2 * n + i]});
            return true;
        };
        return p;
    });
}

std::string check_set(std::span<const Arg* const> tables) {
    if (tables[0]->form == Arg::Form::Scalar)
        throw DomainError("set must be a range (or an inline array) of 12 to 15 columns");
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
    if (arg.form == Arg::Form::Scalar) {
        if (arg.value.kind != CellKind::Number) throw DomainError(std::string(name) + " must be a number");
        return {arg.value.number};
    }
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

CallResult column_result(const Eigen::VectorXd& v) {
    CallResult r;
    r.rows = static_cast<std::size_t>(v.size());
    r.cols = 1;
    r.values.assign(v.data(), v.data() + v.size());
    r.errors.assign(r.values.size(), CellError::None);
    return r;
}

CallResult matrix_result(const Eigen::MatrixXd& m) {
    CallResult r;
    r.rows = static_cast<std::size_t>(m.rows());
    r.cols = static_cast<std::size_t>(m.cols());
    for (Eigen::Index i = 0; i < m.rows(); ++i)
        for (Eigen::Index j = 0; j < m.cols(); ++j) r.values.push_back(m(i, j));
    r.errors.assign(r.values.size(), CellError::None);
    return r;
}

// SET_FORCE and SET_TORQUE: (row, component) after the set.
template <class Fn>
Implementation force_like(Eigen::Vector3d (*quantity)(const CoilSet&, std::size_t)) {
    return prepared<Fn>([quantity](std::span<const Arg* const> tables) {
        const SetPtr set = std::make_shared<const CoilSet>(read_coil_set(*tables[0]));
        return on_set<Fn>(
            set,
            [quantity](const CoilSet& s, const typename Fn::Args& a) {
                return pick(quantity(s, index_of_label(s, a.row)), static_cast<int>(a.component));
            },
            [](const CoilSet& s) { return work::kForceLinePoints * work::set_point(s); });
    });
}

}  // namespace

template <> Implementation implement<fn::SET_BX>() { return field_component<fn::SET_BX>(0); }
template <> Implementation implement<fn::SET_BY>() { return field_component<fn::SET_BY>(1); }
template <> Implementation implement<fn::SET_BZ>() { return field_component<fn::SET_BZ>(2); }
template <> Implementation implement<fn::SET_B>() { return field_component<fn::SET_B>(3); }
template <> Implementation implement<fn::SET_CHECK>() { return text_result<fn::SET_CHECK>(check_set); }

template <> Implementation implement<fn::SET_CURRENTS>() {
    return prepared<fn::SET_CURRENTS>([](std::span<const Arg* const> whole) {
        const SetPtr set = std::make_shared<const CoilSet>(read_coil_set(*whole[0]));
        const std::vector<double> x = point_coordinates(*whole[1], "x"), y = point_coordinates(*whole[2], "y"),
                                  z = point_coordinates(*whole[3], "z");
        if (y.size() != x.size() || z.size() != x.size())
            throw DomainError("x, y and z must have one value per point: they have " + std::to_string(x.size()) +
                              ", " + std::to_string(y.size()) + " and " + std::to_string(z.size()));
        if (x.size() > 10000) throw DomainError("at most 10000 points");
        std::vector<Eigen::Vector3d> points;
        for (std::size_t i = 0; i < x.size(); ++i) points.emplace_back(x[i], y[i], z[i]);
        Prepared p;
        p.cost = work::set_point(*set) * static_cast<double>(points.size());
        p.shaped = [set, points](const double* numbers) {
            const auto a = fn::SET_CURRENTS::Args::from(numbers);
            const std::vector<Eigen::Vector3d> targets(points.size(), Eigen::Vector3d(a.bx, a.by, a.bz));
            return column_result(set_currents(*set, points, targets));
        };
        return p;
    });
}

template <> Implementation implement<fn::SET_UNIFORM_SPHERE>() {
    return prepared<fn::SET_UNIFORM_SPHERE>([](std::span<const Arg* const> tables) {
        const SetPtr set = std::make_shared<const CoilSet>(read_coil_set(*tables[0]));
        return on_set<fn::SET_UNIFORM_SPHERE>(
            set,
            [](const CoilSet& s, const fn::SET_UNIFORM_SPHERE::Args& a) {
                return set_uniform_sphere(s, a.tolerance, {a.x, a.y, a.z});
            },
            [](const CoilSet& s) { return work::kSetSphereSearchPoints * work::set_point(s); });
    });
}

template <> Implementation implement<fn::SET_LMATRIX>() {
    return prepared<fn::SET_LMATRIX>([](std::span<const Arg* const> tables) {
        const SetPtr set = std::make_shared<const CoilSet>(read_coil_set(*tables[0]));
        Prepared p;
        p.cost = work::kSetInductancePerPair * static_cast<double>(set->size() * set->size());
        p.shaped = [set](const double* numbers) {
            const auto a = fn::SET_LMATRIX::Args::from(numbers);
            return matrix_result(set_inductance_matrix(*set, a.conductorDiameter));
        };
        return p;
    });
}

template <> Implementation implement<fn::SET_FORCE>() { return force_like<fn::SET_FORCE>(set_force); }
template <> Implementation implement<fn::SET_TORQUE>() { return force_like<fn::SET_TORQUE>(set_torque); }

template <> Implementation implement<fn::RIG3_COILS>() {
    return prepared<fn::RIG3_COILS>([](std::span<const Arg* const>) {
        Prepared p;
        p.cost = work::kRigDesign;
        p.shaped = [](const double* numbers) {
            const auto a = fn::RIG3_COILS::Args::from(numbers);
            return coil_set_result(rig3_coils(a.size, a.turns, a.current, a.shape));
        };
        return p;
    });
}

}  // namespace coilwright::sheet
