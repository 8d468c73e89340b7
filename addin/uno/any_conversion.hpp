// Conversion between UNO Any values and the add-in's UNO-free cells.
#pragma once

#include <com/sun/star/uno/Any.hxx>
#include <com/sun/star/uno/Sequence.hxx>

#include <cstddef>
#include <cstdint>

#include "../core/catalogue.hpp"
#include "../core/cells.hpp"

namespace coilwright::uno_glue {

// What Calc passes for an argument: void (omitted), double, string, a range or array as
// sequence< sequence< any > > (for an `any` parameter), or a cell range object (for a table
// parameter, see cell_range_arg.hpp). The range's shape is checked against the argument's
// limits (core/range_limits.hpp) before any cell is copied; throws DomainError beyond them.
sheet::Arg to_arg(const css::uno::Any& value, const sheet::ArgSpec& spec);

// One value as Calc passes it: void (blank), double (or another number type), string.
sheet::Cell to_cell(const css::uno::Any& value);

// Rows of cells as Calc passes them (or as a cell range's data array gives them), for `spec`.
sheet::Arg from_rows(const css::uno::Sequence<css::uno::Sequence<css::uno::Any>>& rows, const sheet::ArgSpec& spec);

// The common cell: every argument a double or omitted (void). Fills numbers[0..count) and sets
// bit k of `omitted` for an omitted argument k; false as soon as one is anything else.
bool plain_numbers(const css::uno::Any* const* args, std::size_t count, double* numbers, std::uint32_t& omitted);

// A double for one value, a string for a text result, or sequence< sequence< double > > with
// error elements encoded as Calc's error NaNs. Whole-call failures are thrown by the caller.
css::uno::Any to_any(const sheet::CallResult& result);

// Calc's in-band error value: a quiet NaN whose low 32 bits carry the error number
// (LibreOffice formula/errorcodes.hxx, CreateDoubleError).
double calc_error_value(sheet::CellError error);

}  // namespace coilwright::uno_glue
