#include "ods_values.hpp"

#include <cctype>
#include <cstdlib>
#include <vector>

namespace coilwright::share {

namespace {

struct Attribute {
    std::string_view name;
    std::size_t value_begin = 0;  // offsets of the value (without quotes) in the document
    std::size_t value_end = 0;
};

struct Tag {
    std::string_view name;
    std::vector<Attribute> attributes;
    std::size_t end = 0;  // just past '>'
    bool closing = false;
};

bool space(char c) { return c == ' ' || c == '\t' || c == '\n' || c == '\r'; }

// The element tag starting at text[at] == '<' (not a comment, declaration or instruction).
Tag read_tag(std::string_view text, std::size_t at) {
    Tag tag;
    std::size_t i = at + 1;
    if (i < text.size() && text[i] == '/') {
        tag.closing = true;
        ++i;
    }
    const std::size_t name_start = i;
    while (i < text.size() && !space(text[i]) && text[i] != '>' && text[i] != '/') ++i;
    tag.name = text.substr(name_start, i - name_start);
    while (i < text.size()) {
        while (i < text.size() && space(text[i])) ++i;
        if (i >= text.size()) break;
        if (text[i] == '>') {
            tag.end = i + 1;
            return tag;
        }
        if (text[i] == '/') {
            ++i;
            continue;
        }
        const std::size_t attr_start = i;
        while (i < text.size() && text[i] != '=' && !space(text[i]) && text[i] != '>') ++i;
        Attribute attribute;
        attribute.name = text.substr(attr_start, i - attr_start);
        while (i < text.size() && text[i] != '"' && text[i] != '\'') ++i;
        if (i >= text.size()) break;
        const char quote = text[i++];
        attribute.value_begin = i;
        while (i < text.size() && text[i] != quote) ++i;
        attribute.value_end = i;
        if (i < text.size()) ++i;
        tag.attributes.push_back(attribute);
    }
    tag.end = text.size();
    return tag;
}

const Attribute* find(const Tag& tag, std::string_view name) {
    for (const auto& a : tag.attributes)
        if (a.name == name) return &a;
    return nullptr;
}

std::int64_t repeat(std::string_view text, const Tag& tag, std::string_view name) {
    const Attribute* a = find(tag, name);
    if (!a) return 1;
    const std::string digits(text.substr(a->value_begin, a->value_end - a->value_begin));
    const long long n = std::strtoll(digits.c_str(), nullptr, 10);
    return n > 0 ? n : 1;
}

std::size_t skip_markup(std::string_view text, std::size_t at) {
    // Comments, CDATA and declarations: <!-- -->, <![CDATA[ ]]>, <!...>, <? ?>
    if (text.compare(at, 4, "<!--") == 0) {
        const auto e = text.find("-->", at + 4);
        return e == std::string_view::npos ? text.size() : e + 3;
    }
    if (text.compare(at, 9, "<![CDATA[") == 0) {
        const auto e = text.find("]]>", at + 9);
        return e == std::string_view::npos ? text.size() : e + 3;
    }
    const auto e = text.find('>', at);
    return e == std::string_view::npos ? text.size() : e + 1;
}

bool number_type(std::string_view type) { return type == "float" || type == "percentage" || type == "currency"; }

}  // namespace

ValueRewrite rewrite_cell_values(std::string_view xml, const ValueLookup& value_at, const NumberTexts& texts) {
    ValueRewrite out;
    out.xml.reserve(xml.size() + xml.size() / 16);
    std::int32_t sheet = -1;
    std::int64_t next_row = 0, row = 0, row_repeat = 1, col = 0;
    std::size_t copied = 0;  // xml[0, copied) is already in out.xml
    std::size_t i = 0;
    while ((i = xml.find('<', i)) != std::string_view::npos) {
        const char next = i + 1 < xml.size() ? xml[i + 1] : '\0';
        if (next == '!' || next == '?') {
            i = skip_markup(xml, i);
            continue;
        }
        const Tag tag = read_tag(xml, i);
        i = tag.end;
        if (tag.closing) continue;
        if (tag.name == "table:table") {
            ++sheet;
            next_row = 0;
            continue;
        }
        if (tag.name == "table:table-row") {
            row = next_row;
            row_repeat = repeat(xml, tag, "table:number-rows-repeated");
            next_row += row_repeat;
            col = 0;
            continue;
        }
        if (tag.name != "table:table-cell" && tag.name != "table:covered-table-cell") continue;
        const std::int64_t col_repeat = repeat(xml, tag, "table:number-columns-repeated");
        const std::int64_t first_col = col;
        col += col_repeat;
        const Attribute* type = find(tag, "office:value-type");
        const Attribute* value = find(tag, "office:value");
        if (!type || !value || !number_type(xml.substr(type->value_begin, type->value_end - type->value_begin)))
            continue;
        const std::string saved(xml.substr(value->value_begin, value->value_end - value->value_begin));
        const CellKey key{sheet, static_cast<std::int32_t>(row), static_cast<std::int32_t>(first_col)};
        const std::optional<double> v = value_at(key);
        // Every cell a repeated element stands for must hold the same number.
        bool consistent = v.has_value() && texts.as_saved(*v) == saved;
        for (std::int64_t r = 0; consistent && r < row_repeat && r < 64; ++r)
            for (std::int64_t c = 0; consistent && c < col_repeat && c < 64; ++c) {
                const auto other = value_at({sheet, static_cast<std::int32_t>(row + r), static_cast<std::int32_t>(first_col + c)});
                consistent = other.has_value() && *other == *v;
            }
        if (!consistent) {
            if (out.mismatched++ == 0)
                out.first_mismatch = "table " + std::to_string(sheet + 1) + " row " + std::to_string(row + 1) +
                                     " column " + std::to_string(first_col + 1) + ": saved " + saved +
                                     (v ? ", document " + texts.exact(*v) : ", no number in the document");
            continue;
        }
        const std::string exact = texts.exact(*v);
        if (exact == saved) {
            ++out.already_exact;
            continue;
        }
        out.xml.append(xml.substr(copied, value->value_begin - copied));
        out.xml.append(exact);
        copied = value->value_end;
        ++out.rewritten;
    }
    out.xml.append(xml.substr(copied));
    return out;
}

}  // namespace coilwright::share
