#include "cell_range_arg.hpp"

#include <com/sun/star/beans/XPropertySet.hpp>
#include <com/sun/star/beans/XPropertySetInfo.hpp>
#include <com/sun/star/sheet/CellFlags.hpp>
#include <com/sun/star/sheet/XCellRangeAddressable.hpp>
#include <com/sun/star/sheet/XCellRangeData.hpp>
#include <com/sun/star/sheet/XCellRangesQuery.hpp>
#include <com/sun/star/sheet/XSheetCellRanges.hpp>

#include <algorithm>
#include <cstddef>
#include <string>

#include "coilwright/errors.hpp"

#include "../core/range_limits.hpp"
#include "any_conversion.hpp"

namespace coilwright::uno_glue {

namespace uno = css::uno;

namespace {

// Ranges of at most this many cells are read whole, without asking for their last filled row.
constexpr std::size_t kWholeReadCells = 4096;

// Calc's range object names its sheets in its AbsoluteName: "$Sheet1.$K$1:$P$2" on one sheet,
// "$Sheet1.$K$1:$Sheet2.$P$2" across sheets. Its address (getRangeAddress) has room for one
// sheet only, and its cells and queries show only the first one, so the name is the one place
// that tells. A sheet name cannot contain ':' (Calc refuses it), so what follows the last ':'
// names a sheet exactly when it holds a '.'.
bool spans_several_sheets(const uno::Reference<css::table::XCellRange>& range) {
    static const rtl::OUString kName("AbsoluteName");
    uno::Reference<css::beans::XPropertySet> properties(range, uno::UNO_QUERY_THROW);
    // Asked first so that Calc throws nothing into the add-in (component.cpp says why).
    const uno::Reference<css::beans::XPropertySetInfo> info = properties->getPropertySetInfo();
    if (!info.is() || !info->hasPropertyByName(kName)) return true;  // cannot tell: refused
    rtl::OUString name;
    properties->getPropertyValue(kName) >>= name;
    const sal_Int32 colon = name.lastIndexOf(':');
    return colon >= 0 && name.indexOf('.', colon) >= 0;
}

// Rows from the top of the range to its last filled cell (0 for an empty range): blank rows are
// skipped by every table reader, so the ones below the last filled row need not be read. Calc
// finds the filled cells from its own column storage, without visiting blank ones.
std::size_t rows_to_last_filled(const uno::Reference<css::table::XCellRange>& range, sal_Int32 first_row) {
    namespace flags = css::sheet::CellFlags;
    uno::Reference<css::sheet::XCellRangesQuery> query(range, uno::UNO_QUERY_THROW);
    const uno::Reference<css::sheet::XSheetCellRanges> filled =
        query->queryContentCells(flags::VALUE | flags::DATETIME | flags::STRING | flags::FORMULA);
    std::size_t rows = 0;
    if (!filled.is()) return rows;
    const uno::Sequence<css::table::CellRangeAddress> parts = filled->getRangeAddresses();
    for (const css::table::CellRangeAddress& part : parts)
        rows = std::max(rows, static_cast<std::size_t>(part.EndRow - first_row + 1));
    return rows;
}

// Calc's data array of a range (getDataArray) gives a blank cell as an empty string and a cell
// whose formula gives an error as nothing at all (void); blank rows are skipped by the table
// readers, so an error there would vanish: refuse the range instead, naming the cell.
void refuse_error_values(const uno::Sequence<uno::Sequence<uno::Any>>& rows, const sheet::ArgSpec& spec) {
    for (sal_Int32 r = 0; r < rows.getLength(); ++r)
        for (sal_Int32 c = 0; c < rows[r].getLength(); ++c)
            if (!rows[r][c].hasValue())
                throw DomainError(std::string(spec.name) + " holds an error value (row " + std::to_string(r + 1) +
                                  ", column " + std::to_string(c + 1) + " of the range)");
}

}  // namespace

sheet::Arg read_cell_range(const uno::Reference<css::table::XCellRange>& range, const sheet::ArgSpec& spec) {
    uno::Reference<css::sheet::XCellRangeAddressable> addressable(range, uno::UNO_QUERY_THROW);
    const css::table::CellRangeAddress address = addressable->getRangeAddress();
    if (spans_several_sheets(range)) sheet::refuse_several_sheets(spec);
    const std::size_t cols = static_cast<std::size_t>(address.EndColumn - address.StartColumn + 1);
    const std::size_t all_rows = static_cast<std::size_t>(address.EndRow - address.StartRow + 1);
    const bool one_cell = cols == 1 && all_rows == 1;
    if (!one_cell && sheet::plan_range(spec, 0, cols) == sheet::RangePlan::WidthOnly)
        return sheet::Arg::array(0, cols, {});
    // A small range is read whole (one call); a large one only down to its last filled row,
    // which Calc finds first (a query costs more than reading a few thousand cells).
    uno::Reference<css::table::XCellRange> block = range;
    std::size_t rows = all_rows;
    if (all_rows > kWholeReadCells / cols) {
        rows = rows_to_last_filled(range, address.StartRow);
        sheet::plan_range(spec, rows, cols);  // throws beyond the limits, before any cell is read
        if (rows == 0) return sheet::Arg::array(0, cols, {});
        block = range->getCellRangeByPosition(0, 0, static_cast<sal_Int32>(cols - 1), static_cast<sal_Int32>(rows - 1));
    }
    uno::Reference<css::sheet::XCellRangeData> data(block, uno::UNO_QUERY_THROW);
    const uno::Sequence<uno::Sequence<uno::Any>> cells = data->getDataArray();
    refuse_error_values(cells, spec);
    // One cell is one value, as Calc passes a single cell to an `any` parameter.
    if (one_cell && cells.getLength() == 1 && cells[0].getLength() == 1) return sheet::Arg::scalar(to_cell(cells[0][0]));
    return from_rows(cells, spec);
}

}  // namespace coilwright::uno_glue
