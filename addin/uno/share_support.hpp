// Small helpers shared by the files of the share command (UNO side).
#pragma once

#include <com/sun/star/beans/PropertyValue.hpp>
#include <com/sun/star/table/CellAddress.hpp>
#include <com/sun/star/table/CellRangeAddress.hpp>
#include <com/sun/star/uno/Any.hxx>
#include <rtl/ustring.hxx>

#include <string>
#include <string_view>

namespace coilwright::share {

// The UNO names every file of the share command uses.
using css::uno::Any;
using css::uno::Reference;
using css::uno::Sequence;
using css::uno::UNO_QUERY;
using css::uno::UNO_QUERY_THROW;

std::string utf8(const rtl::OUString& text);
rtl::OUString ustr(std::string_view text);

css::beans::PropertyValue property(const char* name, const css::uno::Any& value);

// "ORG.COILWRIGHT.FUNCTIONS.": how Calc's API grammar writes a call of the add-in.
const std::string& addin_prefix();
// True when a formula (API grammar, or Calc's own display with function names alone) calls
// a catalogue function.
bool calls_addin(const rtl::OUString& formula);
bool names_addin_function(const rtl::OUString& display_formula);

std::string column_letters(sal_Int32 column);
std::string cell_name(sal_Int32 column, sal_Int32 row);  // "B5"
std::string range_name(const css::table::CellRangeAddress& range);  // "B5:C9" or "B5"
// Sheet name as a formula writes it: quoted when it is not a plain word.
std::string quoted_sheet(const rtl::OUString& name);

// A native formula that shows Calc's error `code` in a LibreOffice without the add-in, and
// stores as such in the file: "=#ERR502!" (Err:502), "=#ERR523!", "=#VALUE!", "=#N/A".
rtl::OUString error_formula(sal_Int32 code);

}  // namespace coilwright::share
