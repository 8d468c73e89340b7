#include "share_support.hpp"

#include <cctype>

#include "../core/catalogue.hpp"
#include "formula_calls.hpp"

namespace coilwright::share {

std::string utf8(const rtl::OUString& text) { return rtl::OUStringToOString(text, RTL_TEXTENCODING_UTF8).getStr(); }

rtl::OUString ustr(std::string_view text) {
    return rtl::OUString(text.data(), static_cast<sal_Int32>(text.size()), RTL_TEXTENCODING_UTF8);
}

css::beans::PropertyValue property(const char* name, const css::uno::Any& value) {
    css::beans::PropertyValue p;
    p.Name = rtl::OUString::createFromAscii(name);
    p.Value = value;
    return p;
}

const std::string& addin_prefix() {
    static const std::string prefix = [] {
        std::string name = sheet::addin_service_name();
        for (char& c : name) c = static_cast<char>(std::toupper(static_cast<unsigned char>(c)));
        return name + ".";
    }();
    return prefix;
}

bool calls_addin(const rtl::OUString& formula) { return calls_any(utf8(formula), addin_prefix()); }

bool names_addin_function(const rtl::OUString& display_formula) {
    if (calls_addin(display_formula)) return true;
    const std::string text = utf8(display_formula);
    std::size_t i = 0;
    while (i < text.size()) {
        const char c = text[i];
        if (c == '"' || c == '\'') {  // literals
            const std::size_t close = text.find(c, i + 1);
            i = close == std::string::npos ? text.size() : close + 1;
            continue;
        }
        if (std::isalpha(static_cast<unsigned char>(c)) || c == '_') {
            std::size_t j = i;
            while (j < text.size() && (std::isalnum(static_cast<unsigned char>(text[j])) || text[j] == '_' || text[j] == '.')) ++j;
            std::string word = text.substr(i, j - i);
            for (char& w : word) w = static_cast<char>(std::toupper(static_cast<unsigned char>(w)));
            if (j < text.size() && text[j] == '(' && sheet::function_index(word) >= 0) return true;
            i = j;
            continue;
        }
        ++i;
    }
    return false;
}

std::string column_letters(sal_Int32 column) {
    std::string letters;
    for (sal_Int32 n = column + 1; n > 0; n = (n - 1) / 26) letters.insert(letters.begin(), static_cast<char>('A' + (n - 1) % 26));
    return letters;
}

std::string cell_name(sal_Int32 column, sal_Int32 row) { return column_letters(column) + std::to_string(row + 1); }

std::string range_name(const css::table::CellRangeAddress& r) {
    const std::string first = cell_name(r.StartColumn, r.StartRow);
    if (r.StartColumn == r.EndColumn && r.StartRow == r.EndRow) return first;
    return first + ":" + cell_name(r.EndColumn, r.EndRow);
}

std::string quoted_sheet(const rtl::OUString& name) {
    const std::string text = utf8(name);
    bool plain = !text.empty() && !std::isdigit(static_cast<unsigned char>(text[0]));
    for (char c : text) plain = plain && (std::isalnum(static_cast<unsigned char>(c)) || c == '_');
    if (plain) return text;
    std::string quoted = "'";
    for (char c : text) {
        if (c == '\'') quoted += '\'';
        quoted += c;
    }
    return quoted + "'";
}

rtl::OUString error_formula(sal_Int32 code) {
    // #N/A has no numbered form: LibreOffice accepts "#ERRnnn!" only for its other codes.
    if (code == 32767) return "=#N/A";
    return ustr("=#ERR" + std::to_string(code) + "!");
}

}  // namespace coilwright::share
