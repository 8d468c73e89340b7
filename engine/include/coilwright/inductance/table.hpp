// Inductance matrix, series inductance, stored energy and axial forces of a coaxial coil table.
#pragma once

#include <Eigen/Core>
#include <optional>
#include <string>
#include <vector>

#include "coilwright/coil_table.hpp"
#include "coilwright/errors.hpp"

namespace coilwright {

// Values with the error of each one that could not be computed (none where valid).
struct MatrixWithProblems {
    Eigen::MatrixXd values;          // NaN where a problem is recorded
    std::vector<Problem> problems;   // row-major, rows() * cols() entries
    bool valid(Eigen::Index i, Eigen::Index j) const {
        return !problems[static_cast<std::size_t>(i * values.cols() + j)];
    }
};

// The optional wire diameter of a table's loop rows as a sheet gives it: 0 means not given;
// otherwise it must be > 0 (DomainError).
std::optional<double> optional_wire_diameter(double diameter);

// L_ij = N_i N_j M_ij (H): mutual inductances off the diagonal, self-inductances on it. A loop
// row (inner = outer, length 0) has a self-inductance only with a wire diameter: rows that are
// loops use `loop_wire_diameter` (m; the round bundle's diameter for several turns) and, without
// it, get a problem on their diagonal entry. Coincident loops give problems off the diagonal.
MatrixWithProblems inductance_matrix(const CoilTable& table, std::optional<double> loop_wire_diameter);

// Inductance (H) of the rows connected in series, each with the polarity of the sign of its
// current (rows with current 0 are not in the circuit): sum_ij s_i s_j L_ij. Throws
// DomainError naming the entry when one that is needed is missing.
double series_inductance(const CoilTable& table, std::optional<double> loop_wire_diameter);

// Magnetic energy (J) of the table's currents: (1/2) sum_ij I_i L_ij I_j.
double stored_energy(const CoilTable& table, std::optional<double> loop_wire_diameter);

// Axial force (N, positive towards +z) on each row from all the other rows: an n x 1 column.
MatrixWithProblems axial_forces(const CoilTable& table);

// A bound of the work (in kernel evaluations) the functions above may need, for refusing
// tables that would freeze a spreadsheet.
double table_work_estimate(const CoilTable& table);

}  // namespace coilwright
