#include "freeze_cells.hpp"

#include <com/sun/star/beans/XPropertySet.hpp>
#include <com/sun/star/container/XIndexAccess.hpp>
#include <com/sun/star/container/XNamed.hpp>
#include <com/sun/star/sheet/CellFlags.hpp>
#include <com/sun/star/sheet/FormulaResult.hpp>
#include <com/sun/star/sheet/XArrayFormulaRange.hpp>
#include <com/sun/star/sheet/XCellRangeAddressable.hpp>
#include <com/sun/star/sheet/XCellRangesQuery.hpp>
#include <com/sun/star/sheet/XSheetAnnotation.hpp>
#include <com/sun/star/sheet/XSheetAnnotationAnchor.hpp>
#include <com/sun/star/sheet/XSheetAnnotations.hpp>
#include <com/sun/star/sheet/XSheetAnnotationsSupplier.hpp>
#include <com/sun/star/sheet/XSheetCellCursor.hpp>
#include <com/sun/star/sheet/XSheetCellRange.hpp>
#include <com/sun/star/sheet/XSheetCellRanges.hpp>
#include <com/sun/star/sheet/XSpreadsheet.hpp>
#include <com/sun/star/table/XCell.hpp>
#include <com/sun/star/text/XSimpleText.hpp>
#include <com/sun/star/text/XText.hpp>

#include <set>
#include <utility>

#include "formula_calls.hpp"
#include "share_support.hpp"

namespace coilwright::share {

namespace {

struct Shown {
    enum class Kind { Number, Text, Error } kind = Kind::Number;
    double number = 0.0;
    rtl::OUString text;
    sal_Int32 error = 0;
};

Shown shown(const Reference<css::table::XCell>& cell) {
    Shown s;
    if ((s.error = cell->getError()) != 0) {
        s.kind = Shown::Kind::Error;
        return s;
    }
    sal_Int32 type = 0;
    Reference<css::beans::XPropertySet>(cell, UNO_QUERY_THROW)->getPropertyValue("FormulaResultType2") >>= type;
    if (type == css::sheet::FormulaResult::STRING) {
        s.kind = Shown::Kind::Text;
        s.text = Reference<css::text::XText>(cell, UNO_QUERY_THROW)->getString();
        return s;
    }
    s.number = cell->getValue();
    return s;
}

void put(const Reference<css::table::XCell>& cell, const Shown& s, CellFreeze& count, const std::string& where) {
    switch (s.kind) {
        case Shown::Kind::Number:
            cell->setValue(s.number);
            break;
        case Shown::Kind::Text:
            Reference<css::text::XSimpleText>(cell, UNO_QUERY_THROW)->setString(s.text);
            break;
        case Shown::Kind::Error:
            cell->setFormula(error_formula(s.error));
            ++count.errors;
            if (cell->getError() != s.error)
                count.warnings.push_back(where + ": error " + std::to_string(s.error) +
                                         " has no native form; it now shows error " + std::to_string(cell->getError()));
            break;
    }
}

void comment(const Reference<css::sheet::XSpreadsheet>& sheet, const Reference<css::table::XCell>& cell,
             const css::table::CellAddress& at, const rtl::OUString& formula) {
    rtl::OUString text = "Frozen value. Computed with the Coilwright add-in by:\n" +
                         ustr(without_prefix(utf8(formula), addin_prefix()));
    // A comment the author wrote stays, above ours.
    Reference<css::sheet::XSheetAnnotationAnchor> anchor(cell, UNO_QUERY);
    if (anchor.is()) {
        const rtl::OUString existing = Reference<css::text::XSimpleText>(anchor->getAnnotation(), UNO_QUERY_THROW)->getString();
        if (!existing.isEmpty()) text = existing + "\n\n" + text;
    }
    Reference<css::sheet::XSheetAnnotationsSupplier>(sheet, UNO_QUERY_THROW)->getAnnotations()->insertNew(at, text);
}

}  // namespace

CellFreeze freeze_addin_cells(const Reference<css::sheet::XSpreadsheetDocument>& document, sal_Int32 quiet_sheet) {
    CellFreeze count;
    Reference<css::container::XIndexAccess> sheets(document->getSheets(), UNO_QUERY_THROW);
    for (sal_Int32 s = 0; s < sheets->getCount(); ++s) {
        Reference<css::sheet::XSpreadsheet> sheet(sheets->getByIndex(s), UNO_QUERY_THROW);
        const std::string sheet_name = utf8(Reference<css::container::XNamed>(sheet, UNO_QUERY_THROW)->getName());
        const auto formulas = Reference<css::sheet::XCellRangesQuery>(sheet, UNO_QUERY_THROW)
                                  ->queryContentCells(css::sheet::CellFlags::FORMULA)
                                  ->getRangeAddresses();
        std::set<std::pair<sal_Int32, sal_Int32>> done;  // (row, column) of array elements already replaced
        for (const auto& range : formulas)
            for (sal_Int32 row = range.StartRow; row <= range.EndRow; ++row)
                for (sal_Int32 col = range.StartColumn; col <= range.EndColumn; ++col) {
                    if (done.count({row, col})) continue;
                    const Reference<css::table::XCell> cell = sheet->getCellByPosition(col, row);
                    const rtl::OUString formula = cell->getFormula();
                    if (!calls_addin(formula)) continue;
                    css::table::CellRangeAddress block{static_cast<sal_Int16>(s), col, row, col, row};
                    const bool array = formula.startsWith("{");
                    if (array) {
                        Reference<css::sheet::XSheetCellCursor> cursor =
                            sheet->createCursorByRange(Reference<css::sheet::XSheetCellRange>(cell, UNO_QUERY_THROW));
                        cursor->collapseToCurrentArray();
                        block = Reference<css::sheet::XCellRangeAddressable>(cursor, UNO_QUERY_THROW)->getRangeAddress();
                    }
                    // Read the whole block before changing any of it.
                    std::vector<Shown> values;
                    for (sal_Int32 r = block.StartRow; r <= block.EndRow; ++r)
                        for (sal_Int32 c = block.StartColumn; c <= block.EndColumn; ++c)
                            values.push_back(shown(sheet->getCellByPosition(c, r)));
                    if (array)
                        Reference<css::sheet::XArrayFormulaRange>(
                            sheet->getCellRangeByPosition(block.StartColumn, block.StartRow, block.EndColumn, block.EndRow),
                            UNO_QUERY_THROW)
                            ->setArrayFormula("");
                    std::size_t k = 0;
                    for (sal_Int32 r = block.StartRow; r <= block.EndRow; ++r)
                        for (sal_Int32 c = block.StartColumn; c <= block.EndColumn; ++c) {
                            put(sheet->getCellByPosition(c, r), values[k++], count, sheet_name + "." + cell_name(c, r));
                            done.insert({r, c});
                            ++count.cells;
                        }
                    if (array) ++count.arrays;
                    if (s != quiet_sheet) {
                        const css::table::CellAddress top_left{static_cast<sal_Int16>(s), block.StartColumn, block.StartRow};
                        comment(sheet, sheet->getCellByPosition(block.StartColumn, block.StartRow), top_left, formula);
                    }
                }
    }
    return count;
}

}  // namespace coilwright::share
