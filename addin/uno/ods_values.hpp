// Rewrites the numbers of an .ods content.xml exactly. LibreOffice 7.4 writes every cell value
// (office:value) with at most 15 significant digits and at most 20 decimals (rtl::math's
// "automatic" format), so 2.033371874506761e-13 is saved as 0.00000000000020333719: values
// between 1e-14 and 1e-7 keep 7 to 14 digits, all others 15, against the 17 a double needs.
// UNO-free: the caller supplies the exact values and both ways of writing a number.
#pragma once

#include <cstddef>
#include <cstdint>
#include <functional>
#include <optional>
#include <string>
#include <string_view>

namespace coilwright::share {

struct CellKey {
    std::int32_t sheet = 0;  // index of the table:table element, from 0
    std::int32_t row = 0;
    std::int32_t col = 0;
};

struct ValueRewrite {
    std::string xml;
    std::size_t rewritten = 0;  // office:value attributes now exact
    std::size_t already_exact = 0;
    // Cells the caller had no value for, or whose saved text is not what the saved-text rule
    // gives for the caller's value: the positions do not match and nothing may be written.
    std::size_t mismatched = 0;
    std::string first_mismatch;
};

struct NumberTexts {
    std::function<std::string(double)> as_saved;  // how LibreOffice wrote the value
    std::function<std::string(double)> exact;     // how it must be written to read back exactly
};

using ValueLookup = std::function<std::optional<double>(const CellKey&)>;

// Walks the cells of every table in order (rows and columns repeated as the file says) and
// replaces the office:value of each number cell (value types float, percentage, currency) by
// texts.exact(value at that cell).
ValueRewrite rewrite_cell_values(std::string_view content_xml, const ValueLookup& value_at, const NumberTexts& texts);

}  // namespace coilwright::share
