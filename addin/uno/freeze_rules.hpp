// Named expressions, conditional formats and validity rules that call the add-in. Each call is
// moved to a cell of a sheet of its own, "Frozen values", and the rule refers to that cell
// instead; the cell is then frozen like every other add-in cell (freeze_cells.hpp), so the rule
// works without the add-in. A call whose arguments depend on the cell the rule is applied to
// (relative references) gets one frozen cell per cell of the rule's range, at the same address
// a fixed number of rows lower, and the rule refers to it relatively.
#pragma once

#include <com/sun/star/sheet/XSpreadsheetDocument.hpp>

#include <string>
#include <vector>

namespace coilwright::share {

struct RuleFreeze {
    sal_Int32 names = 0;
    sal_Int32 conditional_formats = 0;
    sal_Int32 validations = 0;
    sal_Int32 calls = 0;              // cells of the frozen-values sheet that hold a call
    sal_Int32 values_sheet = -1;      // its index, -1 when none was needed
    std::vector<std::string> warnings;  // rules left as they were, and why
};

RuleFreeze freeze_rules(const css::uno::Reference<css::sheet::XSpreadsheetDocument>& document);

}  // namespace coilwright::share
