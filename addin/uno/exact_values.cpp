#include "exact_values.hpp"

#include <com/sun/star/container/XIndexAccess.hpp>
#include <com/sun/star/embed/ElementModes.hpp>
#include <com/sun/star/embed/StorageFactory.hpp>
#include <com/sun/star/embed/XStorage.hpp>
#include <com/sun/star/embed/XTransactedObject.hpp>
#include <com/sun/star/io/XStream.hpp>
#include <com/sun/star/io/XTruncate.hpp>
#include <com/sun/star/lang/XComponent.hpp>
#include <com/sun/star/sheet/CellFlags.hpp>
#include <com/sun/star/sheet/XCellRangesQuery.hpp>
#include <com/sun/star/sheet/XSheetCellRanges.hpp>
#include <com/sun/star/sheet/XSpreadsheet.hpp>
#include <com/sun/star/sheet/XCellRangeData.hpp>
#include <com/sun/star/uno/RuntimeException.hpp>
#include <rtl/math.hxx>

#include <charconv>
#include <vector>

#include "share_support.hpp"

namespace coilwright::share {

std::optional<double> NumberSnapshot::at(const CellKey& key) const {
    const auto it = values_.find(pack(key));
    if (it == values_.end()) return std::nullopt;
    return it->second;
}

NumberSnapshot collect_numbers(const Reference<css::sheet::XSpreadsheetDocument>& document) {
    NumberSnapshot snapshot;
    Reference<css::container::XIndexAccess> sheets(document->getSheets(), UNO_QUERY_THROW);
    for (sal_Int32 s = 0; s < sheets->getCount(); ++s) {
        Reference<css::sheet::XSpreadsheet> sheet(sheets->getByIndex(s), UNO_QUERY_THROW);
        Reference<css::sheet::XCellRangesQuery> query(sheet, UNO_QUERY_THROW);
        const auto ranges = query->queryContentCells(css::sheet::CellFlags::VALUE | css::sheet::CellFlags::FORMULA);
        for (const auto& r : ranges->getRangeAddresses()) {
            Reference<css::sheet::XCellRangeData> data(
                sheet->getCellRangeByPosition(r.StartColumn, r.StartRow, r.EndColumn, r.EndRow), UNO_QUERY_THROW);
            const Sequence<Sequence<Any>> rows = data->getDataArray();
            for (sal_Int32 i = 0; i < rows.getLength(); ++i)
                for (sal_Int32 j = 0; j < rows[i].getLength(); ++j) {
                    double v = 0.0;
                    if (rows[i][j].getValueTypeClass() == css::uno::TypeClass_DOUBLE && (rows[i][j] >>= v))
                        snapshot.set({s, r.StartRow + i, r.StartColumn + j}, v);
                }
        }
    }
    return snapshot;
}

namespace {

double read_like_libreoffice(const std::string& text) {
    // ODF import reads numbers with rtl::math::stringToDouble ('.' decimal separator).
    return rtl::math::stringToDouble(ustr(text), '.', ',');
}

}  // namespace

std::string saved_number_text(double value) {
    return utf8(rtl::math::doubleToUString(value, rtl_math_StringFormat_Automatic, rtl_math_DecimalPlaces_Max, '.', true));
}

std::string exact_number_text(double value) {
    char buffer[64];
    const auto shortest = std::to_chars(buffer, buffer + sizeof buffer, value);
    std::string text(buffer, shortest.ptr);
    if (read_like_libreoffice(text) == value) return text;
    const auto full = std::to_chars(buffer, buffer + sizeof buffer, value, std::chars_format::general, 17);
    text.assign(buffer, full.ptr);
    if (read_like_libreoffice(text) == value) return text;
    throw css::uno::RuntimeException(ustr("no decimal text reads back as " + text));
}

namespace {

std::string read_all(const Reference<css::io::XInputStream>& in) {
    std::string data;
    Sequence<sal_Int8> chunk;
    for (;;) {
        const sal_Int32 n = in->readBytes(chunk, 1 << 16);
        if (n <= 0) break;
        data.append(reinterpret_cast<const char*>(chunk.getConstArray()), static_cast<std::size_t>(n));
    }
    return data;
}

struct DisposeOnExit {
    Reference<css::lang::XComponent> component;
    ~DisposeOnExit() {
        try {
            if (component.is()) component->dispose();
        } catch (const css::uno::Exception&) {
        }
    }
};

}  // namespace

std::size_t write_numbers_exactly(const Reference<css::uno::XComponentContext>& context, const rtl::OUString& url,
                                  const NumberSnapshot& snapshot) {
    namespace ElementModes = css::embed::ElementModes;
    const auto factory = css::embed::StorageFactory::create(context);
    Sequence<Any> arguments(2);
    arguments.getArray()[0] <<= url;
    arguments.getArray()[1] <<= ElementModes::READWRITE;
    // The storage factory has only this (deprecated) way to open a package by URL.
#pragma GCC diagnostic push
#pragma GCC diagnostic ignored "-Wdeprecated-declarations"
    Reference<css::embed::XStorage> storage(factory->createInstanceWithArguments(arguments), UNO_QUERY_THROW);
#pragma GCC diagnostic pop
    DisposeOnExit storage_guard{Reference<css::lang::XComponent>(storage, UNO_QUERY)};

    Reference<css::io::XStream> stream = storage->openStreamElement("content.xml", ElementModes::READWRITE);
    DisposeOnExit stream_guard{Reference<css::lang::XComponent>(stream, UNO_QUERY)};
    const std::string xml = read_all(stream->getInputStream());

    const NumberTexts texts{saved_number_text, exact_number_text};
    const ValueRewrite result =
        rewrite_cell_values(xml, [&](const CellKey& key) { return snapshot.at(key); }, texts);
    if (result.mismatched != 0)
        throw css::uno::RuntimeException(ustr("the saved copy does not match the document (" +
                                              std::to_string(result.mismatched) + " cells, first " +
                                              result.first_mismatch + "); numbers left as LibreOffice wrote them"));
    if (result.rewritten == 0) return 0;

    Reference<css::io::XTruncate>(stream, UNO_QUERY_THROW)->truncate();
    auto out = stream->getOutputStream();
    out->writeBytes(Sequence<sal_Int8>(reinterpret_cast<const sal_Int8*>(result.xml.data()),
                                       static_cast<sal_Int32>(result.xml.size())));
    out->flush();
    stream_guard.component->dispose();
    stream_guard.component.clear();
    Reference<css::embed::XTransactedObject>(storage, UNO_QUERY_THROW)->commit();
    return result.rewritten;
}

}  // namespace coilwright::share
