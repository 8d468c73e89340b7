#include "matrix_result.hpp"

#include "error_route.hpp"

namespace coilwright::sheet {

CallResult matrix_call_result(const MatrixWithProblems& m) {
    CallResult r;
    r.rows = static_cast<std::size_t>(m.values.rows());
    r.cols = static_cast<std::size_t>(m.values.cols());
    r.values.resize(r.rows * r.cols);
    r.errors.resize(r.rows * r.cols);
    for (std::size_t i = 0; i < r.rows; ++i)
        for (std::size_t j = 0; j < r.cols; ++j) {
            const std::size_t at = i * r.cols + j;
            r.values[at] = m.values(static_cast<Eigen::Index>(i), static_cast<Eigen::Index>(j));
            r.errors[at] = cell_error_of(m.problems[at].kind);
        }
    return r;
}

}  // namespace coilwright::sheet
