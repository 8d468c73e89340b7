// Coil-table inductance matrix, series inductance, energy and forces from the winding
// functions. Each pair is computed once (M_ij = M_ji; force on j = - force on i).
#include "coilwright/inductance/table.hpp"

#include <cmath>
#include <limits>
#include <string>

#include "numerics/checks.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/inductance/mutual.hpp"
#include "coilwright/inductance/self.hpp"

namespace coilwright {

using namespace internal;

namespace {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();

CoilSection shape(const CoilRow& row) { return {row.inner_radius, row.outer_radius, row.length}; }

std::string row_name(const CoilTable& table, Eigen::Index i) {
    return "row " + std::to_string(table.label(static_cast<std::size_t>(i)));
}

std::string pair_name(const CoilTable& table, Eigen::Index i, Eigen::Index j) {
    return row_name(table, i) + " and " + row_name(table, j) + ": ";
}

MatrixWithProblems empty(Eigen::Index rows, Eigen::Index cols) {
    MatrixWithProblems m;
    m.values = Eigen::MatrixXd::Zero(rows, cols);
    m.problems.assign(static_cast<std::size_t>(rows * cols), Problem{});
    return m;
}

void set_problem(MatrixWithProblems& m, Eigen::Index i, Eigen::Index j, const Problem& why) {
    m.values(i, j) = kNaN;
    m.problems[static_cast<std::size_t>(i * m.values.cols() + j)] = why;
}

// The first problem of a pair is kept on both rows of a force column.
void mark_pair(MatrixWithProblems& f, Eigen::Index i, Eigen::Index j, const Problem& why) {
    if (f.valid(i, 0)) set_problem(f, i, 0, why);
    if (f.valid(j, 0)) set_problem(f, j, 0, why);
}

double self_inductance(const CoilRow& row, std::optional<double> loop_wire_diameter) {
    if (row.kind() == CoilRow::Kind::Loop) {
        if (!loop_wire_diameter)
            raise_domain_error("a loop's self-inductance needs the wire diameter (the optional argument)");
        return loop_self_inductance(row.inner_radius, *loop_wire_diameter, row.turns);
    }
    return row.turns * row.turns * coil_self_inductance(shape(row));
}

}  // namespace

MatrixWithProblems inductance_matrix(const CoilTable& table, std::optional<double> loop_wire_diameter) {
    if (loop_wire_diameter) check::positive(*loop_wire_diameter, "wire diameter");
    const auto& rows = table.rows();
    const Eigen::Index n = static_cast<Eigen::Index>(rows.size());
    MatrixWithProblems m = empty(n, n);
    for (Eigen::Index i = 0; i < n; ++i) {
        const CoilRow& ri = rows[static_cast<std::size_t>(i)];
        try {
            m.values(i, i) =
                ri.turns == 0.0 ? 0.0 : check::finite_result(self_inductance(ri, loop_wire_diameter), "the self-inductance");
        } catch (const DomainError& e) {
            set_problem(m, i, i, Problem::domain(row_name(table, i) + ": ", e));
        } catch (const ConvergenceError& e) {
            set_problem(m, i, i, Problem::convergence(row_name(table, i) + ": ", e));
        }
        for (Eigen::Index j = i + 1; j < n; ++j) {
            const CoilRow& rj = rows[static_cast<std::size_t>(j)];
            try {
                const double nn = ri.turns * rj.turns;
                const double mij =
                    nn == 0.0 ? 0.0 : nn * coil_mutual_inductance(shape(ri), shape(rj), rj.centre_z - ri.centre_z);
                m.values(i, j) = m.values(j, i) = check::finite_result(mij, "the mutual inductance");
            } catch (const DomainError& e) {
                const Problem why = Problem::domain(pair_name(table, i, j), e);
                set_problem(m, i, j, why);
                set_problem(m, j, i, why);
            } catch (const ConvergenceError& e) {
                const Problem why = Problem::convergence(pair_name(table, i, j), e);
                set_problem(m, i, j, why);
                set_problem(m, j, i, why);
            }
        }
    }
    return m;
}

namespace {

// sum_ij w_i w_j L_ij over the rows with w != 0, or DomainError for a missing entry.
double quadratic_form(const CoilTable& table, const Eigen::VectorXd& w, std::optional<double> loop_wire_diameter) {
    // Rows outside the circuit are left out before the matrix is computed.
    std::vector<CoilRow> used;
    std::vector<std::size_t> labels;
    std::vector<double> weights;
    for (std::size_t i = 0; i < table.size(); ++i) {
        if (w[static_cast<Eigen::Index>(i)] == 0.0 || table.rows()[i].turns == 0.0) continue;
        used.push_back(table.rows()[i]);
        labels.push_back(table.label(i));
        weights.push_back(w[static_cast<Eigen::Index>(i)]);
    }
    if (used.empty()) return 0.0;
    const CoilTable sub(used, labels);
    const MatrixWithProblems m = inductance_matrix(sub, loop_wire_diameter);
    for (const Problem& problem : m.problems)
        if (problem) problem.raise();
    const Eigen::Map<const Eigen::VectorXd> v(weights.data(), static_cast<Eigen::Index>(weights.size()));
    return v.dot(m.values * v);
}

}  // namespace

double series_inductance(const CoilTable& table, std::optional<double> loop_wire_diameter) {
    Eigen::VectorXd polarity(static_cast<Eigen::Index>(table.size()));
    bool any = false;
    for (std::size_t i = 0; i < table.size(); ++i) {
        const double current = table.rows()[i].current;
        polarity[static_cast<Eigen::Index>(i)] = current > 0.0 ? 1.0 : current < 0.0 ? -1.0 : 0.0;
        any = any || current != 0.0;
    }
    if (!any) raise_domain_error("no row carries current: the signs of the currents set which rows are in series");
    return check::finite_result(quadratic_form(table, polarity, loop_wire_diameter), "the inductance");
}

double stored_energy(const CoilTable& table, std::optional<double> loop_wire_diameter) {
    Eigen::VectorXd current(static_cast<Eigen::Index>(table.size()));
    for (std::size_t i = 0; i < table.size(); ++i) current[static_cast<Eigen::Index>(i)] = table.rows()[i].current;
    return check::finite_result(0.5 * quadratic_form(table, current, loop_wire_diameter), "the energy");
}

MatrixWithProblems axial_forces(const CoilTable& table) {
    const auto& rows = table.rows();
    const Eigen::Index n = static_cast<Eigen::Index>(rows.size());
    MatrixWithProblems f = empty(n, 1);
    for (Eigen::Index i = 0; i < n; ++i) {
        const CoilRow& ri = rows[static_cast<std::size_t>(i)];
        for (Eigen::Index j = i + 1; j < n; ++j) {
            const CoilRow& rj = rows[static_cast<std::size_t>(j)];
            const double scale = ri.ampere_turns() * rj.ampere_turns();
            if (scale == 0.0) continue;
            try {
                // Force on row j from row i: N_i N_j I_i I_j dM/d(z_j - z_i); row i feels the opposite.
                const double slope = coil_mutual_inductance_slope(shape(ri), shape(rj), rj.centre_z - ri.centre_z);
                const double fj = check::finite_result(scale * slope, "the force");
                f.values(j, 0) += fj;
                f.values(i, 0) -= fj;
            } catch (const DomainError& e) {
                mark_pair(f, i, j, Problem::domain(pair_name(table, i, j), e));
            } catch (const ConvergenceError& e) {
                mark_pair(f, i, j, Problem::convergence(pair_name(table, i, j), e));
            }
        }
    }
    for (Eigen::Index i = 0; i < n; ++i)
        if (f.valid(i, 0) && !std::isfinite(f.values(i, 0)))
            set_problem(f, i, 0, {Problem::Kind::Domain, row_name(table, i) + ": the force is not finite"});
    return f;
}

}  // namespace coilwright
