#include "any_conversion.hpp"

#include <cstdint>
#include <cstring>

#include <com/sun/star/uno/Sequence.hxx>
#include <rtl/ustring.hxx>

namespace coilwright::uno_glue {

using css::uno::Any;
using css::uno::Sequence;
using namespace css::uno;  // TypeClass_* enumerators

namespace {

sheet::Cell to_cell(const Any& v) {
    switch (v.getValueTypeClass()) {
        case TypeClass_VOID:
            return {};
        case TypeClass_STRING: {
            rtl::OUString s;
            v >>= s;
            // Calc passes the blank cells of a range as empty strings (checked with LibreOffice 7.4).
            if (s.isEmpty()) return {};
            return sheet::Cell::of_text(rtl::OUStringToOString(s, RTL_TEXTENCODING_UTF8).getStr());
        }
        case TypeClass_DOUBLE:
            return sheet::Cell::of(*static_cast<const double*>(v.getValue()));
        default: {
            double d = 0.0;
            if (v >>= d) return sheet::Cell::of(d);  // other numeric types, booleans
            return sheet::Cell::of_text("(unsupported value)");
        }
    }
}

}  // namespace

sheet::Arg to_arg(const Any& value) {
    if (!value.hasValue()) return sheet::Arg::missing();
    Sequence<Sequence<Any>> range;
    if (value.getValueTypeClass() == TypeClass_SEQUENCE && (value >>= range)) {
        const std::size_t rows = static_cast<std::size_t>(range.getLength());
        std::size_t cols = 0;
        for (const auto& row : range) cols = std::max(cols, static_cast<std::size_t>(row.getLength()));
        std::vector<sheet::Cell> cells(rows * cols);  // ragged rows leave blanks
        for (std::size_t r = 0; r < rows; ++r) {
            const auto& row = range[static_cast<sal_Int32>(r)];
            for (sal_Int32 c = 0; c < row.getLength(); ++c) cells[r * cols + c] = to_cell(row[c]);
        }
        return sheet::Arg::array(rows, cols, std::move(cells));
    }
    if (value.getValueTypeClass() == TypeClass_SEQUENCE)
        return sheet::Arg::scalar(sheet::Cell::of_text("(unsupported array)"));
    return sheet::Arg::scalar(to_cell(value));
}

double calc_error_value(sheet::CellError error) {
    std::uint64_t bits = 0x7FF8000000000000ULL | static_cast<std::uint32_t>(error);
    double d;
    std::memcpy(&d, &bits, sizeof d);
    return d;
}

Any to_any(const sheet::CallResult& result) {
    if (result.is_text) return Any(rtl::OUString::fromUtf8(result.text.c_str()));
    if (!result.is_array) return Any(result.values.at(0));
    Sequence<Sequence<double>> out(static_cast<sal_Int32>(result.rows));
    auto* rows = out.getArray();
    for (std::size_t r = 0; r < result.rows; ++r) {
        Sequence<double> row(static_cast<sal_Int32>(result.cols));
        double* dst = row.getArray();
        for (std::size_t c = 0; c < result.cols; ++c) {
            const std::size_t at = r * result.cols + c;
            dst[c] = result.errors[at] == sheet::CellError::None ? result.values[at]
                                                                  : calc_error_value(result.errors[at]);
        }
        rows[r] = std::move(row);
    }
    return Any(out);
}

}  // namespace coilwright::uno_glue
