// A table argument passed by reference (its parameter is a com.sun.star.table.XCellRange in
// the generated interface): Calc hands over the range itself, not its cells, so a whole
// column or a whole sheet costs nothing until it is read.
#pragma once

#include <com/sun/star/table/XCellRange.hpp>

#include "../core/catalogue.hpp"
#include "../core/cells.hpp"

namespace coilwright::uno_glue {

// Reads the range as an argument of `spec`: refuses a range over several sheets; decides from
// the width and from the rows up to its last filled one (core/range_limits.hpp) whether to read
// it at all; then copies those rows only. Throws DomainError for a refused range (and UNO
// exceptions if Calc's range object fails).
sheet::Arg read_cell_range(const css::uno::Reference<css::table::XCellRange>& range, const sheet::ArgSpec& spec);

}  // namespace coilwright::uno_glue
