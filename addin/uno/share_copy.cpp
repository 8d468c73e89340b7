#include "share_copy.hpp"

#include <com/sun/star/document/MacroExecMode.hpp>
#include <com/sun/star/document/UpdateDocMode.hpp>
#include <com/sun/star/document/XDocumentProperties.hpp>
#include <com/sun/star/document/XDocumentPropertiesSupplier.hpp>
#include <com/sun/star/frame/Desktop.hpp>
#include <com/sun/star/frame/XStorable.hpp>
#include <com/sun/star/io/IOException.hpp>
#include <com/sun/star/lang/IllegalArgumentException.hpp>
#include <com/sun/star/sheet/XCalculatable.hpp>
#include <com/sun/star/sheet/XSpreadsheetDocument.hpp>
#include <com/sun/star/util/XCloseable.hpp>

#include "exact_values.hpp"
#include "freeze_cells.hpp"
#include "freeze_rules.hpp"
#include "share_support.hpp"

namespace coilwright::share {

namespace {

class ClosesOnExit {
public:
    explicit ClosesOnExit(const Reference<css::lang::XComponent>& c) : component_(c) {}
    ~ClosesOnExit() { close(); }
    void close() {
        if (!component_.is()) return;
        try {
            Reference<css::util::XCloseable> closeable(component_, UNO_QUERY);
            if (closeable.is())
                closeable->close(true);
            else
                component_->dispose();
        } catch (const css::uno::Exception&) {
        }
        component_.clear();
    }

private:
    Reference<css::lang::XComponent> component_;
};

Sequence<css::beans::PropertyValue> filter(const char* name) {
    Sequence<css::beans::PropertyValue> args(2);
    args.getArray()[0] = property("FilterName", Any(rtl::OUString::createFromAscii(name)));
    args.getArray()[1] = property("Overwrite", Any(true));
    return args;
}

rtl::OUString pdf_beside(const rtl::OUString& ods) {
    const sal_Int32 dot = ods.lastIndexOf('.');
    const sal_Int32 slash = ods.lastIndexOf('/');
    return (dot > slash ? ods.copy(0, dot) : ods) + ".pdf";
}

void note_sharing(const Reference<css::lang::XComponent>& copy) {
    auto info = Reference<css::document::XDocumentPropertiesSupplier>(copy, UNO_QUERY_THROW)->getDocumentProperties();
    const rtl::OUString before = info->getDescription();
    info->setDescription((before.isEmpty() ? rtl::OUString() : before + "\n") +
                         "Shared copy: Coilwright results frozen as values; formulas shown in cell comments.");
}

}  // namespace

rtl::OUString default_copy_url(const rtl::OUString& document_url) {
    if (document_url.isEmpty()) return {};
    const sal_Int32 dot = document_url.lastIndexOf('.');
    const sal_Int32 slash = document_url.lastIndexOf('/');
    const rtl::OUString stem = dot > slash ? document_url.copy(0, dot) : document_url;
    return stem + "-shared.ods";
}

ShareOutcome write_frozen_copy(const Reference<css::uno::XComponentContext>& context,
                               const Reference<css::frame::XModel>& document, const rtl::OUString& copy_url) {
    Reference<css::sheet::XSpreadsheetDocument> source(document, UNO_QUERY);
    if (!source.is()) throw css::lang::IllegalArgumentException("The document is not a spreadsheet.", {}, 0);
    if (!copy_url.startsWithIgnoreAsciiCase("file:///"))
        throw css::lang::IllegalArgumentException("The copy must go to a file (file:///...): " + copy_url, {}, 0);
    if (copy_url == document->getURL())
        throw css::lang::IllegalArgumentException("The copy would replace the workbook itself: " + copy_url, {}, 0);

    ShareOutcome outcome;
    outcome.copy_url = copy_url;
    outcome.pdf_url = pdf_beside(copy_url);

    // The copy starts as the document exactly as it is in memory, numbers included.
    try {
        Reference<css::frame::XStorable>(document, UNO_QUERY_THROW)->storeToURL(copy_url, filter("calc8"));
    } catch (const css::io::IOException&) {
        throw css::io::IOException("LibreOffice could not write " + copy_url +
                                   ": is that file open, or the folder read-only?");
    }
    write_numbers_exactly(context, copy_url, collect_numbers(source));

    Sequence<css::beans::PropertyValue> load(3);
    load.getArray()[0] = property("Hidden", Any(true));
    load.getArray()[1] = property("MacroExecutionMode", Any(css::document::MacroExecMode::NEVER_EXECUTE));
    load.getArray()[2] = property("UpdateDocMode", Any(css::document::UpdateDocMode::NO_UPDATE));
    const auto desktop = css::frame::Desktop::create(context);
    Reference<css::lang::XComponent> copy = desktop->loadComponentFromURL(copy_url, "_blank", 0, load);
    if (!copy.is()) throw css::uno::RuntimeException("LibreOffice could not open the copy it wrote: " + copy_url);
    ClosesOnExit closer(copy);
    Reference<css::sheet::XSpreadsheetDocument> frozen(copy, UNO_QUERY_THROW);
    Reference<css::sheet::XCalculatable> calc(copy, UNO_QUERY_THROW);

    calc->calculateAll();
    const RuleFreeze rules = freeze_rules(frozen);
    if (rules.values_sheet >= 0) calc->calculateAll();
    const CellFreeze cells = freeze_addin_cells(frozen, rules.values_sheet);
    calc->calculateAll();
    note_sharing(copy);

    Reference<css::frame::XStorable> storable(copy, UNO_QUERY_THROW);
    storable->store();
    storable->storeToURL(outcome.pdf_url, filter("calc_pdf_Export"));
    const NumberSnapshot numbers = collect_numbers(frozen);
    closer.close();
    outcome.exact_values = write_numbers_exactly(context, copy_url, numbers);

    outcome.cells = cells.cells;
    outcome.arrays = cells.arrays;
    outcome.errors = cells.errors;
    outcome.names = rules.names;
    outcome.conditional_formats = rules.conditional_formats;
    outcome.validations = rules.validations;
    outcome.warnings = rules.warnings;
    outcome.warnings.insert(outcome.warnings.end(), cells.warnings.begin(), cells.warnings.end());
    return outcome;
}

}  // namespace coilwright::share
