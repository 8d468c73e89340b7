#include "formula_calls.hpp"

#include <cctype>

namespace coilwright::share {

namespace {

bool same_ignoring_case(std::string_view text, std::size_t at, std::string_view word) {
    if (text.size() - at < word.size()) return false;
    for (std::size_t i = 0; i < word.size(); ++i)
        if (std::toupper(static_cast<unsigned char>(text[at + i])) != std::toupper(static_cast<unsigned char>(word[i])))
            return false;
    return true;
}

bool name_char(char c) {
    const auto u = static_cast<unsigned char>(c);
    return std::isalnum(u) || c == '_' || c == '.' || u >= 0x80;
}

// Index just past a literal that opens at `at` with `quote` (a doubled quote stands for itself).
std::size_t skip_literal(std::string_view text, std::size_t at, char quote) {
    std::size_t i = at + 1;
    while (i < text.size()) {
        if (text[i] == quote) {
            if (i + 1 < text.size() && text[i + 1] == quote) {
                i += 2;
                continue;
            }
            return i + 1;
        }
        ++i;
    }
    return text.size();
}

// If a call of a prefixed function starts at `at`, the index of its opening parenthesis.
std::size_t call_opening(std::string_view text, std::size_t at, std::string_view prefix) {
    if (at > 0 && name_char(text[at - 1])) return std::string_view::npos;  // inside another name
    if (!same_ignoring_case(text, at, prefix)) return std::string_view::npos;
    std::size_t i = at + prefix.size();
    const std::size_t name_start = i;
    while (i < text.size() && name_char(text[i])) ++i;
    if (i == name_start) return std::string_view::npos;
    while (i < text.size() && text[i] == ' ') ++i;
    return i < text.size() && text[i] == '(' ? i : std::string_view::npos;
}

std::size_t matching_close(std::string_view text, std::size_t open) {
    int depth = 0;
    std::size_t i = open;
    while (i < text.size()) {
        const char c = text[i];
        if (c == '"' || c == '\'') {
            i = skip_literal(text, i, c);
            continue;
        }
        if (c == '(') ++depth;
        if (c == ')' && --depth == 0) return i + 1;
        ++i;
    }
    return text.size();
}

}  // namespace

std::vector<CallSpan> find_calls(std::string_view formula, std::string_view prefix) {
    std::vector<CallSpan> spans;
    std::size_t i = 0;
    while (i < formula.size()) {
        const char c = formula[i];
        if (c == '"' || c == '\'') {
            i = skip_literal(formula, i, c);
            continue;
        }
        const std::size_t open = call_opening(formula, i, prefix);
        if (open != std::string_view::npos) {
            const std::size_t end = matching_close(formula, open);
            spans.push_back({i, end});
            i = end;
            continue;
        }
        ++i;
    }
    return spans;
}

bool calls_any(std::string_view formula, std::string_view prefix) { return !find_calls(formula, prefix).empty(); }

std::string replace_calls(std::string_view formula, const std::vector<CallSpan>& spans,
                          const std::vector<std::string>& replacements) {
    std::string out;
    std::size_t at = 0;
    for (std::size_t k = 0; k < spans.size(); ++k) {
        out.append(formula.substr(at, spans[k].begin - at));
        out.append(replacements.at(k));
        at = spans[k].end;
    }
    out.append(formula.substr(at));
    return out;
}

std::string without_prefix(std::string_view formula, std::string_view prefix) {
    std::string out;
    std::size_t i = 0;
    while (i < formula.size()) {
        const char c = formula[i];
        if (c == '"' || c == '\'') {
            const std::size_t end = skip_literal(formula, i, c);
            out.append(formula.substr(i, end - i));
            i = end;
            continue;
        }
        if (call_opening(formula, i, prefix) != std::string_view::npos) {
            i += prefix.size();
            continue;
        }
        out.push_back(c);
        ++i;
    }
    return out;
}

}  // namespace coilwright::share
