// The share command's UNO-free text work: finding the add-in's calls in a formula, and rewriting
// the numbers of an .ods content.xml by cell position (addin/uno/formula_calls.hpp, ods_values.hpp).
#include <gtest/gtest.h>

#include <map>
#include <string>
#include <tuple>

#include "uno/formula_calls.hpp"
#include "uno/ods_values.hpp"

namespace coilwright::share {
namespace {

const std::string kPrefix = "ORG.COILWRIGHT.FUNCTIONS.";

std::vector<std::string> calls(const std::string& formula) {
    std::vector<std::string> out;
    for (const auto& s : find_calls(formula, kPrefix)) out.push_back(formula.substr(s.begin, s.end - s.begin));
    return out;
}

TEST(FormulaCalls, FindsOutermostCallsInAnyCase) {
    EXPECT_EQ(calls("=ORG.COILWRIGHT.FUNCTIONS.LOOP_BZ(0.1;10;2;A1)*2"),
              std::vector<std::string>{"ORG.COILWRIGHT.FUNCTIONS.LOOP_BZ(0.1;10;2;A1)"});
    EXPECT_EQ(calls("org.coilwright.functions.loop_bz(a;(b+c);SUM(d;e))+org.coilwright.functions.stack_l(coils)"),
              (std::vector<std::string>{"org.coilwright.functions.loop_bz(a;(b+c);SUM(d;e))",
                                        "org.coilwright.functions.stack_l(coils)"}));
    // A call inside another call's arguments belongs to the outer one.
    EXPECT_EQ(calls("ORG.COILWRIGHT.FUNCTIONS.COIL_VOLTAGE(ORG.COILWRIGHT.FUNCTIONS.COIL_RESISTANCE(1);2)").size(), 1u);
}

TEST(FormulaCalls, IgnoresLiteralsQuotedSheetsAndLongerNames) {
    EXPECT_TRUE(calls("=\"ORG.COILWRIGHT.FUNCTIONS.LOOP_BZ(1)\"&'ORG.COILWRIGHT.FUNCTIONS.X('.A1").empty());
    EXPECT_TRUE(calls("=XORG.COILWRIGHT.FUNCTIONS.LOOP_BZ(1)").empty());
    EXPECT_TRUE(calls("=ORG.COILWRIGHT.FUNCTIONS.").empty());
    // A parenthesis inside a string argument does not end the call.
    EXPECT_EQ(calls("=ORG.COILWRIGHT.FUNCTIONS.COIL_RESISTANCE(1;2;3;\"cop)per\";20)+1"),
              std::vector<std::string>{"ORG.COILWRIGHT.FUNCTIONS.COIL_RESISTANCE(1;2;3;\"cop)per\";20)"});
    EXPECT_EQ(calls("=ORG.COILWRIGHT.FUNCTIONS.LOOP_BZ('it''s (1)'.A1)"),
              std::vector<std::string>{"ORG.COILWRIGHT.FUNCTIONS.LOOP_BZ('it''s (1)'.A1)"});
}

TEST(FormulaCalls, ReplacesCallsAndDropsThePrefixForReaders) {
    const std::string f = "B4>ORG.COILWRIGHT.FUNCTIONS.LOOP_BZ(a;b)*ORG.COILWRIGHT.FUNCTIONS.LOOP_BR(c)";
    EXPECT_EQ(replace_calls(f, find_calls(f, kPrefix), {"$'Frozen values'.$B$4", "X9"}),
              "B4>$'Frozen values'.$B$4*X9");
    EXPECT_EQ(without_prefix("{=ORG.COILWRIGHT.FUNCTIONS.LOOP_BZ(1;\"ORG.COILWRIGHT.FUNCTIONS.\")}", kPrefix),
              "{=LOOP_BZ(1;\"ORG.COILWRIGHT.FUNCTIONS.\")}");
}

// A content.xml in the shape LibreOffice writes: repeated rows and columns, covered cells,
// text cells, comments and a second table.
const char* const kContent =
    R"(<?xml version="1.0" encoding="UTF-8"?><office:document-content><office:body><office:spreadsheet>)"
    R"(<table:table table:name="A"><table:table-column table:number-columns-repeated="4"/>)"
    R"(<table:table-row><table:table-cell office:value-type="string"><text:p>x &gt; 1</text:p></table:table-cell>)"
    R"(<table:table-cell office:value-type="float" office:value="0.00000000000020333719" calcext:value-type="float"><text:p>2E-13</text:p>)"
    R"(<office:annotation><text:p>note</text:p></office:annotation></table:table-cell></table:table-row>)"
    R"(<table:table-row table:number-rows-repeated="2"><table:table-cell table:number-columns-repeated="2"/>)"
    R"(<table:table-cell table:formula="of:=[.B1]&gt;0" office:value-type="percentage" office:value="0.333333333333333"/></table:table-row>)"
    R"(<!-- <table:table-row><table:table-cell office:value-type="float" office:value="9"/></table:table-row> -->)"
    R"(</table:table><table:table table:name="B"><table:table-row>)"
    R"(<table:covered-table-cell/><table:table-cell office:value-type="float" office:value='1.5'/>)"
    R"(<table:table-cell office:value-type="date" office:date-value="2024-01-01"/></table:table-row></table:table>)"
    R"(</office:spreadsheet></office:body></office:document-content>)";

// The saved-text rule of the test: what LibreOffice 7.4 wrote for these values.
std::string as_saved(double v) {
    if (v == 2.033371874506761e-13) return "0.00000000000020333719";
    if (v == 1.0 / 3.0) return "0.333333333333333";
    if (v == 1.5) return "1.5";
    return "?";
}
std::string exact(double v) {
    if (v == 2.033371874506761e-13) return "2.033371874506761e-13";
    if (v == 1.0 / 3.0) return "0.3333333333333333";
    return "1.5";
}

TEST(OdsValues, RewritesNumberCellsByPosition) {
    std::map<std::tuple<int, int, int>, double> values{{{0, 0, 1}, 2.033371874506761e-13},
                                                       {{0, 1, 2}, 1.0 / 3.0},
                                                       {{0, 2, 2}, 1.0 / 3.0},
                                                       {{1, 0, 1}, 1.5}};
    std::vector<CellKey> asked;
    const ValueRewrite r = rewrite_cell_values(
        kContent,
        [&](const CellKey& k) -> std::optional<double> {
            asked.push_back(k);
            auto it = values.find({k.sheet, k.row, k.col});
            if (it == values.end()) return std::nullopt;
            return it->second;
        },
        {as_saved, exact});
    EXPECT_EQ(r.mismatched, 0u) << r.first_mismatch;
    EXPECT_EQ(r.rewritten, 2u);
    EXPECT_EQ(r.already_exact, 1u);
    EXPECT_NE(r.xml.find(R"(office:value="2.033371874506761e-13")"), std::string::npos);
    EXPECT_NE(r.xml.find(R"(office:value="0.3333333333333333")"), std::string::npos);
    EXPECT_NE(r.xml.find("office:value='1.5'"), std::string::npos);
    EXPECT_NE(r.xml.find(R"(office:date-value="2024-01-01")"), std::string::npos);  // dates untouched
    EXPECT_NE(r.xml.find("office:value=\"9\""), std::string::npos);                   // comments untouched
    // Only the text around the values changed.
    EXPECT_EQ(r.xml.size(), std::string(kContent).size() + (21 - 22) + (18 - 17));
}

TEST(OdsValues, RefusesWhenTheDocumentDoesNotMatch) {
    // A value at a shifted position, as if rows were miscounted: nothing may be written.
    const ValueRewrite r = rewrite_cell_values(
        kContent, [](const CellKey& k) -> std::optional<double> { return k.col == 1 ? 1.5 : 1.0 / 3.0; },
        {as_saved, exact});
    EXPECT_GT(r.mismatched, 0u);
    EXPECT_NE(r.first_mismatch.find("table 1 row 1 column 2"), std::string::npos) << r.first_mismatch;
}

}  // namespace
}  // namespace coilwright::share
