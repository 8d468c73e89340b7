// Replaces every formula cell that calls the add-in by what it shows: a number, a text, or a
// native formula that gives the same error code without the add-in. Array formulas are
// replaced element by element. The formula's text goes into a cell comment.
#pragma once

#include <com/sun/star/sheet/XSpreadsheetDocument.hpp>

#include <string>
#include <vector>

namespace coilwright::share {

struct CellFreeze {
    sal_Int32 cells = 0;   // cells replaced, array elements included
    sal_Int32 arrays = 0;  // array formulas among them
    sal_Int32 errors = 0;  // cells that now hold a native error formula
    std::vector<std::string> warnings;
};

// `quiet_sheet`: index of a sheet whose cells get no comment (the frozen-values sheet, which
// shows each call beside its value), or -1.
CellFreeze freeze_addin_cells(const css::uno::Reference<css::sheet::XSpreadsheetDocument>& document,
                              sal_Int32 quiet_sheet);

}  // namespace coilwright::share
