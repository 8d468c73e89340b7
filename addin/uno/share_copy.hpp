// A frozen copy of an open workbook for colleagues without the add-in: the .ods and a PDF.
// The copy is written from the document as it is in memory and opened hidden; every add-in
// formula, named expression, conditional format and validity rule is frozen there (see
// freeze_cells.hpp, freeze_rules.hpp); the document itself is not changed.
#pragma once

#include <com/sun/star/frame/XModel.hpp>
#include <com/sun/star/uno/XComponentContext.hpp>
#include <rtl/ustring.hxx>

#include <string>
#include <vector>

namespace coilwright::share {

struct ShareOutcome {
    rtl::OUString copy_url;
    rtl::OUString pdf_url;
    sal_Int32 cells = 0, arrays = 0, errors = 0;
    sal_Int32 names = 0, conditional_formats = 0, validations = 0;
    std::size_t exact_values = 0;  // numbers written with more digits than LibreOffice writes
    std::vector<std::string> warnings;
};

// "file:///x/design.ods" -> "file:///x/design-shared.ods"; empty for a document never saved.
rtl::OUString default_copy_url(const rtl::OUString& document_url);

// Writes the frozen copy to `copy_url` (an .ods file URL) and the PDF beside it (same name,
// .pdf). Throws css::uno::Exception with a message for the user when it cannot.
ShareOutcome write_frozen_copy(const css::uno::Reference<css::uno::XComponentContext>& context,
                               const css::uno::Reference<css::frame::XModel>& document, const rtl::OUString& copy_url);

}  // namespace coilwright::share
