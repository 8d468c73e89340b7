#include "range_limits.hpp"

#include <limits>
#include <string>

#include "coilwright/errors.hpp"
#include "evaluate.hpp"

namespace coilwright::sheet {

RangePlan plan_range(const ArgSpec& spec, std::size_t rows, std::size_t cols) {
    if (spec.kind == ArgKind::Table) {
        if (cols < spec.min_columns || cols > spec.max_columns) return RangePlan::WidthOnly;
        if (rows > kMaxTableRows)
            throw DomainError(std::string(spec.name) + ": the table has " + std::to_string(rows) +
                              " rows up to its last filled one; the limit is " + std::to_string(kMaxTableRows));
        return RangePlan::Read;
    }
    // rows * cols without overflow: a range of more cells than a result may have cannot be computed.
    if (cols != 0 && rows > kMaxResultCells / cols)
        throw DomainError(std::string(spec.name) + " is a range of " + std::to_string(rows) + " x " +
                          std::to_string(cols) + " cells; the limit is " + std::to_string(kMaxResultCells) +
                          " cells");
    return RangePlan::Read;
}

void refuse_several_sheets(const ArgSpec& spec) {
    throw DomainError(std::string(spec.name) +
                      " spans several sheets; Calc would pass only the first one: give a range on one sheet");
}

}  // namespace coilwright::sheet
