// How much one argument may bring into a call, decided from its shape alone, before any of its
// cells is copied: Calc hands over ranges of any size (a whole sheet is a billion cells).
#pragma once

#include <cstddef>

#include "catalogue.hpp"

namespace coilwright::sheet {

// Rows a coil table may have, counted from the top of its range to its last filled row (a
// table of that many coils already takes seconds per field point).
inline constexpr std::size_t kMaxTableRows = 100'000;

enum class RangePlan {
    Read,       // copy the cells
    WidthOnly,  // a table of the wrong width: pass on rows = 0 and its width, which the table
                // reader refuses by the width alone (STACK_CHECK says so in words)
};

// The plan for a range of rows x cols cells given for an argument of this spec. Throws
// DomainError (shown as Err:502 with its message) for a range that may not be read: a number
// argument with more cells than a result may have, a table with more than kMaxTableRows rows.
RangePlan plan_range(const ArgSpec& spec, std::size_t rows, std::size_t cols);

// DomainError for a reference that spans several sheets (Sheet1.A1:Sheet2.B2): Calc would pass
// only its first sheet.
[[noreturn]] void refuse_several_sheets(const ArgSpec& spec);

}  // namespace coilwright::sheet
