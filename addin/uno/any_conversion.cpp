#include "any_conversion.hpp"

#include <algorithm>
#include <cstddef>
#include <cstdint>
#include <cstring>
#include <string>
#include <utility>

#include <com/sun/star/table/XCellRange.hpp>
#include <com/sun/star/uno/Sequence.hxx>
#include <rtl/ustring.hxx>

#include "../core/range_limits.hpp"
#include "cell_range_arg.hpp"

namespace coilwright::uno_glue {

using css::uno::Any;
using css::uno::Sequence;
using namespace css::uno;  // TypeClass_* enumerators

sheet::Cell to_cell(const Any& v) {
    switch (v.getValueTypeClass()) {
        case TypeClass_VOID:
            return {};
        case TypeClass_STRING: {
            rtl::OUString s;
            v >>= s;
            // Calc passes blank cells of a range as empty strings (ScRangeToSequence::FillMixedArray).
            if (s.isEmpty()) return {};
            // Every character, NULs included (a text is judged whole: core/evaluate.cpp refuses
            // control characters); getStr() alone would stop at the first NUL.
            const rtl::OString utf8 = rtl::OUStringToOString(s, RTL_TEXTENCODING_UTF8);
            return sheet::Cell::of_text(std::string(utf8.getStr(), static_cast<std::size_t>(utf8.getLength())));
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

sheet::Arg from_rows(const Sequence<Sequence<Any>>& view, const sheet::ArgSpec& spec) {
    const std::size_t rows = static_cast<std::size_t>(view.getLength());
    std::size_t cols = 0;
    for (const auto& row : view) cols = std::max(cols, static_cast<std::size_t>(row.getLength()));
    if (sheet::plan_range(spec, rows, cols) == sheet::RangePlan::WidthOnly) return sheet::Arg::array(0, cols, {});
    std::vector<sheet::Cell> cells(rows * cols);  // ragged rows leave blanks
    for (std::size_t r = 0; r < rows; ++r) {
        const auto& row = view[static_cast<sal_Int32>(r)];
        sheet::Cell* out = cells.data() + r * cols;
        for (sal_Int32 c = 0; c < row.getLength(); ++c) {
            const Any& v = row[c];
            if (v.getValueTypeClass() == TypeClass_DOUBLE) {  // the usual cell: no temporary
                out[c].kind = sheet::CellKind::Number;
                out[c].number = *static_cast<const double*>(v.getValue());
            } else {
                out[c] = to_cell(v);
            }
        }
    }
    return sheet::Arg::array(rows, cols, std::move(cells));
}

sheet::Arg to_arg(const Any& value, const sheet::ArgSpec& spec) {
    if (!value.hasValue()) return sheet::Arg::missing();
    switch (value.getValueTypeClass()) {
        case TypeClass_SEQUENCE: {
            Sequence<Sequence<Any>> range;  // built only here: even an empty one costs a type lookup
            // Read through a const view: the non-const accessors would copy the shared sequence.
            if (value >>= range) return from_rows(std::as_const(range), spec);
            return sheet::Arg::scalar(sheet::Cell::of_text("(unsupported array)"));
        }
        case TypeClass_INTERFACE: {
            css::uno::Reference<css::table::XCellRange> range(value, css::uno::UNO_QUERY);
            if (!range.is()) return sheet::Arg::missing();  // an omitted range argument
            return read_cell_range(range, spec);
        }
        default:
            return sheet::Arg::scalar(to_cell(value));
    }
}

bool plain_numbers(const Any* const* args, std::size_t count, double* numbers, std::uint32_t& omitted) {
    omitted = 0;
    for (std::size_t k = 0; k < count; ++k) {
        const Any& v = *args[k];
        switch (v.getValueTypeClass()) {
            case TypeClass_DOUBLE:
                numbers[k] = *static_cast<const double*>(v.getValue());
                break;
            case TypeClass_VOID:
                numbers[k] = 0.0;
                omitted |= std::uint32_t{1} << k;
                break;
            default:
                return false;
        }
    }
    return true;
}

double calc_error_value(sheet::CellError error) {
    std::uint64_t bits = 0x7FF8000000000000ULL | static_cast<std::uint32_t>(error);
    double d;
    std::memcpy(&d, &bits, sizeof d);
    return d;
}

namespace {

// An array with text cells: a sequence of sequences of Any (text or number per cell).
Any mixed_array(const sheet::CallResult& result) {
    Sequence<Sequence<Any>> out(static_cast<sal_Int32>(result.rows));
    auto* rows = out.getArray();
    for (std::size_t r = 0; r < result.rows; ++r) {
        Sequence<Any> row(static_cast<sal_Int32>(result.cols));
        Any* dst = row.getArray();
        for (std::size_t c = 0; c < result.cols; ++c) {
            const std::size_t at = r * result.cols + c;
            if (at < result.texts.size() && !result.texts[at].empty())
                dst[c] <<= rtl::OUString::fromUtf8(result.texts[at].c_str());
            else
                dst[c] <<= result.errors[at] == sheet::CellError::None ? result.values[at]
                                                                      : calc_error_value(result.errors[at]);
        }
        rows[r] = std::move(row);
    }
    return Any(out);
}

}  // namespace

Any to_any(const sheet::CallResult& result) {
    if (result.is_text) return Any(rtl::OUString::fromUtf8(result.text.c_str()));
    if (!result.is_array) return Any(result.values.at(0));
    if (!result.texts.empty()) return mixed_array(result);
    Sequence<Sequence<double>> out(static_cast<sal_Int32>(result.rows));
    auto* rows = out.getArray();
    const auto cols = static_cast<sal_Int32>(result.cols);
    for (std::size_t r = 0; r < result.rows; ++r) {
        const std::size_t first = r * result.cols;
        const bool clean = std::all_of(result.errors.begin() + static_cast<std::ptrdiff_t>(first),
                                       result.errors.begin() + static_cast<std::ptrdiff_t>(first + result.cols),
                                       [](sheet::CellError e) { return e == sheet::CellError::None; });
        if (clean) {  // copied in one go
            rows[r] = Sequence<double>(result.values.data() + first, cols);
            continue;
        }
        Sequence<double> row(cols);
        double* dst = row.getArray();
        for (std::size_t c = 0; c < result.cols; ++c) {
            const std::size_t at = first + c;
            dst[c] = result.errors[at] == sheet::CellError::None ? result.values[at]
                                                                  : calc_error_value(result.errors[at]);
        }
        rows[r] = std::move(row);
    }
    return Any(out);
}

}  // namespace coilwright::uno_glue
