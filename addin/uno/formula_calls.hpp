// Where a formula calls the add-in's functions: the text spans of the outermost calls in a
// formula written in Calc's API grammar (English names, ';' between arguments). UNO-free.
#pragma once

#include <cstddef>
#include <string>
#include <string_view>
#include <vector>

namespace coilwright::share {

// One call: formula.substr(begin, end - begin) is "PREFIX.NAME(...)", closing parenthesis included.
struct CallSpan {
    std::size_t begin = 0;
    std::size_t end = 0;
};

// The outermost calls of functions whose name starts with `prefix` (compared without regard to
// case, e.g. "ORG.COILWRIGHT.FUNCTIONS."), in order. Text inside "string literals" and
// 'quoted sheet names' is skipped. A call whose parenthesis is never closed ends at the end of
// the text.
std::vector<CallSpan> find_calls(std::string_view formula, std::string_view prefix);

bool calls_any(std::string_view formula, std::string_view prefix);

// The formula with each span replaced by the text at the same index of `replacements`.
std::string replace_calls(std::string_view formula, const std::vector<CallSpan>& spans,
                          const std::vector<std::string>& replacements);

// The formula with every occurrence of `prefix` (any case, outside literals) removed: what a
// reader sees in the Function Wizard ("LOOP_BZ(...)").
std::string without_prefix(std::string_view formula, std::string_view prefix);

}  // namespace coilwright::share
