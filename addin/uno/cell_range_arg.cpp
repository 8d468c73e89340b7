#include "cell_range_arg.hpp"

#include <com/sun/star/beans/XPropertySet.hpp>
#include <com/sun/star/beans/XPropertySetInfo.hpp>
#include <com/sun/star/sheet/CellFlags.hpp>
#include <com/sun/star/sheet/FormulaResult.hpp>
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

// A cell whose formula gives an error reads as blank in the range's data array (Calc's
// getDataArray), and blank rows are skipped: refuse the range instead, naming the cells.
void refuse_error_values(const uno::Reference<css::table::XCellRange>& block, const sheet::ArgSpec& spec) {
    uno::Reference<css::sheet::XCellRangesQuery> query(block, uno::UNO_QUERY_THROW);
    const uno::Reference<css::sheet::XSheetCellRanges> errors =
        query->queryFormulaCells(css::sheet::FormulaResult::ERROR);
    if (!errors.is() || !errors->getRangeAddresses().hasElements()) return;
    throw DomainError(std::string(spec.name) + " holds error values (" +
                      rtl::OUStringToOString(errors->getRangeAddressesAsString(), RTL_TEXTENCODING_UTF8).getStr() +
                      ")");
}

}  // namespace

sheet::Arg read_cell_range(const uno::Reference<css::table::XCellRange>& range, const sheet::ArgSpec& spec) {
    uno::Reference<css::sheet::XCellRangeAddressable> addressable(range, uno::UNO_QUERY_THROW);
    const css::table::CellRangeAddress address = addressable->getRangeAddress();
    if (spans_several_sheets(range)) sheet::refuse_several_sheets(spec);
    const std::size_t cols = static_cast<std::size_t>(address.EndColumn - address.StartColumn + 1);
    const bool one_cell = cols == 1 && address.StartRow == address.EndRow;
    if (!one_cell && sheet::plan_range(spec, 0, cols) == sheet::RangePlan::WidthOnly)
        return sheet::Arg::array(0, cols, {});
    const std::size_t rows = one_cell ? 1 : rows_to_last_filled(range, address.StartRow);
    sheet::plan_range(spec, one_cell ? 0 : rows, cols);  // throws beyond the limits, before any cell is read
    if (rows == 0) return sheet::Arg::array(0, cols, {});
    const uno::Reference<css::table::XCellRange> block =
        range->getCellRangeByPosition(0, 0, static_cast<sal_Int32>(cols - 1), static_cast<sal_Int32>(rows - 1));
    refuse_error_values(block, spec);
    uno::Reference<css::sheet::XCellRangeData> data(block, uno::UNO_QUERY_THROW);
    const uno::Sequence<uno::Sequence<uno::Any>> cells = data->getDataArray();
    // One cell is one value, as Calc passes a single cell to an `any` parameter.
    if (one_cell && cells.getLength() == 1 && cells[0].getLength() == 1) return sheet::Arg::scalar(to_cell(cells[0][0]));
    return from_rows(cells, spec);
}

}  // namespace coilwright::uno_glue
