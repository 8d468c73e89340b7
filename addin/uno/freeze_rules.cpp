#include "freeze_rules.hpp"

#include <com/sun/star/beans/XPropertySet.hpp>
#include <com/sun/star/container/XIndexAccess.hpp>
#include <com/sun/star/container/XNamed.hpp>
#include <com/sun/star/sheet/ComplexReference.hpp>
#include <com/sun/star/sheet/ConditionEntryType.hpp>
#include <com/sun/star/sheet/FormulaToken.hpp>
#include <com/sun/star/sheet/ReferenceFlags.hpp>
#include <com/sun/star/sheet/SingleReference.hpp>
#include <com/sun/star/sheet/ValidationType.hpp>
#include <com/sun/star/sheet/XCalculatable.hpp>
#include <com/sun/star/sheet/XCellFormatRangesSupplier.hpp>
#include <com/sun/star/sheet/XCellRangeAddressable.hpp>
#include <com/sun/star/sheet/XConditionEntry.hpp>
#include <com/sun/star/sheet/XConditionalFormat.hpp>
#include <com/sun/star/sheet/XConditionalFormats.hpp>
#include <com/sun/star/sheet/XFormulaTokens.hpp>
#include <com/sun/star/sheet/XNamedRange.hpp>
#include <com/sun/star/sheet/XSheetCellRanges.hpp>
#include <com/sun/star/sheet/XSheetCondition2.hpp>
#include <com/sun/star/sheet/XSheetConditionalEntries.hpp>
#include <com/sun/star/sheet/XSheetConditionalEntry.hpp>
#include <com/sun/star/sheet/XSpreadsheet.hpp>
#include <com/sun/star/sheet/XSpreadsheets.hpp>
#include <com/sun/star/table/XCell.hpp>
#include <com/sun/star/table/XColumnRowRange.hpp>
#include <com/sun/star/table/XTableColumns.hpp>
#include <com/sun/star/table/XTableRows.hpp>
#include <com/sun/star/text/XSimpleText.hpp>

#include <algorithm>
#include <cctype>
#include <map>
#include <set>

#include "formula_calls.hpp"
#include "share_support.hpp"

using css::table::CellAddress;
using css::table::CellRangeAddress;
using css::sheet::FormulaToken;

namespace coilwright::share {

namespace {

constexpr sal_Int64 kMaxCellsPerCall = 100000;  // per-cell copies of one call beyond this are refused
constexpr sal_Int32 kFirstValueRow = 3;         // rows 1 and 2 explain the sheet
// A flag of our own, beyond css::sheet::ReferenceFlags, marking a reference written without a
// sheet (removed before the tokens go into a cell).
constexpr sal_Int32 kNamedNoSheet = 1 << 20;
const char* const kValuesSheet = "Frozen values";

// One add-in call inside one formula of a rule.
struct Use {
    std::string where;
    rtl::OUString call;           // API grammar, relative to `source`
    CellAddress source;           // the position the rule's formulas are relative to
    bool sheet_of_user = false;   // a named expression: unqualified references follow the cell using it
    std::vector<CellRangeAddress> ranges;  // the cells the rule applies to (none for a name)
    Sequence<FormulaToken> tokens;  // read at `source` on the values sheet
    bool per_cell = false;
    bool refused = false;         // cannot be frozen (see uses_own_position)
    rtl::OUString reference;      // what replaces the call; empty when it could not be placed
};

struct Formula {
    rtl::OUString text;
    std::vector<CallSpan> spans;
    std::vector<std::size_t> uses;

    bool ready(const std::vector<Use>& all) const {
        return std::all_of(uses.begin(), uses.end(), [&](std::size_t u) { return !all[u].reference.isEmpty(); });
    }
    rtl::OUString rewritten(const std::vector<Use>& all) const {
        std::vector<std::string> references;
        for (std::size_t u : uses) references.push_back(utf8(all[u].reference));
        return ustr(replace_calls(utf8(text), spans, references));
    }
};

struct NameRule {
    Reference<css::sheet::XNamedRange> name;
    Formula formula;
    std::string where;
};

struct FormatEntry {
    sal_Int32 op = 0;
    rtl::OUString style;
    CellAddress source;
    Formula first, second;
};

struct FormatRule {
    Reference<css::sheet::XConditionalFormats> formats;
    sal_Int32 id = 0;
    sal_Int32 sheet = 0;
    Reference<css::beans::XPropertySet> ranges;
    std::vector<FormatEntry> entries;
    std::string where;
};

struct ValidityRule {
    Reference<css::beans::XPropertySet> range;
    Reference<css::sheet::XSheetCondition> validation;
    Formula first, second;
    std::string where;
};

bool ready(const FormatRule& rule, const std::vector<Use>& uses) {
    return std::all_of(rule.entries.begin(), rule.entries.end(),
                       [&](const FormatEntry& e) { return e.first.ready(uses) && e.second.ready(uses); });
}

std::string ranges_text(const rtl::OUString& sheet, const std::vector<CellRangeAddress>& ranges) {
    std::string text;
    for (const auto& r : ranges) {
        if (!text.empty()) text += ',';
        text += quoted_sheet(sheet);
        text += '.';
        text += range_name(r);
    }
    return text;
}

sal_Int64 cell_count(const std::vector<CellRangeAddress>& ranges) {
    sal_Int64 n = 0;
    for (const auto& r : ranges)
        n += static_cast<sal_Int64>(r.EndColumn - r.StartColumn + 1) * static_cast<sal_Int64>(r.EndRow - r.StartRow + 1);
    return n;
}

CellRangeAddress bounds(const std::vector<CellRangeAddress>& ranges) {
    CellRangeAddress b = ranges.front();
    for (const auto& r : ranges) {
        b.StartColumn = std::min(b.StartColumn, r.StartColumn);
        b.StartRow = std::min(b.StartRow, r.StartRow);
        b.EndColumn = std::max(b.EndColumn, r.EndColumn);
        b.EndRow = std::max(b.EndRow, r.EndRow);
    }
    return b;
}

// ROW() and COLUMN() without a reference give the position of the cell the formula is evaluated
// in, which a frozen-values cell cannot stand in for.
bool uses_own_position(const rtl::OUString& call) {
    std::string upper;
    for (char c : utf8(call))
        if (c != ' ') upper += static_cast<char>(std::toupper(static_cast<unsigned char>(c)));
    return upper.find("ROW()") != std::string::npos || upper.find("COLUMN()") != std::string::npos;
}

template <typename Fn>
void for_each_reference(Sequence<FormulaToken>& tokens, Fn fn) {
    FormulaToken* all = tokens.getArray();
    for (sal_Int32 i = 0; i < tokens.getLength(); ++i) {
        FormulaToken& token = all[i];
        css::sheet::SingleReference single;
        css::sheet::ComplexReference complex;
        if (token.Data >>= single) {
            fn(single);
            token.Data <<= single;
        } else if (token.Data >>= complex) {
            fn(complex.Reference1);
            fn(complex.Reference2);
            token.Data <<= complex;
        }
    }
}

// Makes the call's references, read in a cell of the scratch sheet, name their sheet: the rule's
// own sheet for those written without one (marked kNamedNoSheet: in a named expression they
// follow the sheet of the cell that uses the name, see depends_on_position).
Sequence<FormulaToken> pointed(Sequence<FormulaToken> tokens, sal_Int32 scratch_sheet, sal_Int32 rule_sheet) {
    namespace Flags = css::sheet::ReferenceFlags;
    for_each_reference(tokens, [&](css::sheet::SingleReference& ref) {
        sal_Int32 sheet = (ref.Flags & Flags::SHEET_RELATIVE) ? scratch_sheet + ref.RelativeSheet : ref.Sheet;
        if (!(ref.Flags & Flags::SHEET_3D)) {
            sheet = rule_sheet;
            ref.Flags |= kNamedNoSheet;
        }
        ref.Sheet = sheet;
        ref.RelativeSheet = 0;
        ref.Flags = (ref.Flags & ~Flags::SHEET_RELATIVE) | Flags::SHEET_3D;
    });
    return tokens;
}

// The tokens for a cell `row_shift` rows below the one their relative rows count from.
Sequence<FormulaToken> shifted(Sequence<FormulaToken> tokens, sal_Int32 row_shift) {
    namespace Flags = css::sheet::ReferenceFlags;
    for_each_reference(tokens, [&](css::sheet::SingleReference& ref) {
        ref.Flags &= ~kNamedNoSheet;
        if (ref.Flags & Flags::ROW_RELATIVE) ref.RelativeRow -= row_shift;
    });
    return tokens;
}

bool depends_on_position(Sequence<FormulaToken> tokens, bool sheet_of_user) {
    namespace Flags = css::sheet::ReferenceFlags;
    bool relative = false;
    for_each_reference(tokens, [&](css::sheet::SingleReference& ref) {
        relative = relative || (ref.Flags & (Flags::COLUMN_RELATIVE | Flags::ROW_RELATIVE)) != 0 ||
                   (sheet_of_user && (ref.Flags & kNamedNoSheet) != 0);
    });
    return relative;
}

class RuleFreezer {
public:
    explicit RuleFreezer(const Reference<css::sheet::XSpreadsheetDocument>& document)
        : document_(document), sheets_(document->getSheets(), UNO_QUERY_THROW) {}

    RuleFreeze run() {
        collect_names();
        for (sal_Int32 s = 0; s < sheets_->getCount(); ++s) {
            collect_validations(s);
            collect_formats(s);
        }
        if (uses_.empty()) {
            warn_unresolved();
            return std::move(result_);
        }
        Reference<css::sheet::XCalculatable> calc(document_, UNO_QUERY_THROW);
        const bool automatic = calc->isAutomaticCalculationEnabled();
        calc->enableAutomaticCalculation(false);
        create_values_sheet();
        write(0, 0, "Values of Coilwright calls made by named expressions, conditional formats and validity rules");
        write(0, 1, "Each value was computed with the Coilwright add-in and frozen; the rules refer to these cells, "
                    "so the copy works without the add-in.");
        std::size_t from = 0;
        // A cell shows the formulas of its first conditional format only, so formats that overlap
        // become readable one round after the format before them was rewritten.
        for (int round = 0; round < 64 && from < uses_.size(); ++round) {
            read_tokens(from);
            lay_out(from);
            apply();
            from = uses_.size();
            for (sal_Int32 s = 0; s < values_index_; ++s) collect_formats(s);
        }
        warn_unresolved();
        calc->enableAutomaticCalculation(automatic);
        return std::move(result_);
    }

private:
    Reference<css::sheet::XSpreadsheet> sheet(sal_Int32 index) const {
        return Reference<css::sheet::XSpreadsheet>(sheets_->getByIndex(index), UNO_QUERY_THROW);
    }
    rtl::OUString sheet_name(sal_Int32 index) const {
        return Reference<css::container::XNamed>(sheets_->getByIndex(index), UNO_QUERY_THROW)->getName();
    }

    Formula analyse(const rtl::OUString& text, const CellAddress& source, const std::string& where,
                    const std::vector<CellRangeAddress>& ranges, bool sheet_of_user) {
        Formula f;
        f.text = text;
        const std::string code = utf8(text);
        f.spans = find_calls(code, addin_prefix());
        for (const auto& span : f.spans) {
            Use use;
            use.where = where;
            use.call = ustr(code.substr(span.begin, span.end - span.begin));
            use.source = source;
            use.sheet_of_user = sheet_of_user;
            use.ranges = ranges;
            f.uses.push_back(uses_.size());
            uses_.push_back(std::move(use));
        }
        return f;
    }

    void collect_names_of(const Reference<css::container::XIndexAccess>& names, const std::string& scope) {
        if (!names.is()) return;
        for (sal_Int32 i = 0; i < names->getCount(); ++i) {
            Reference<css::sheet::XNamedRange> name(names->getByIndex(i), UNO_QUERY);
            if (!name.is() || !calls_addin(name->getContent())) continue;
            NameRule rule;
            rule.name = name;
            rule.where = "named expression " + scope + utf8(Reference<css::container::XNamed>(name, UNO_QUERY_THROW)->getName());
            rule.formula = analyse(name->getContent(), name->getReferencePosition(), rule.where, {}, true);
            names_.push_back(std::move(rule));
        }
    }

    void collect_names() {
        Reference<css::beans::XPropertySet> props(document_, UNO_QUERY_THROW);
        collect_names_of(Reference<css::container::XIndexAccess>(props->getPropertyValue("NamedRanges"), UNO_QUERY), "");
        for (sal_Int32 s = 0; s < sheets_->getCount(); ++s) {
            Reference<css::beans::XPropertySet> sheet_props(sheets_->getByIndex(s), UNO_QUERY_THROW);
            if (!sheet_props->getPropertySetInfo()->hasPropertyByName("NamedRanges")) continue;
            collect_names_of(Reference<css::container::XIndexAccess>(sheet_props->getPropertyValue("NamedRanges"), UNO_QUERY),
                             quoted_sheet(sheet_name(s)) + ".");
        }
    }

    // The older per-cell interface shows a conditional format's formulas in the API grammar with
    // their source position; the newer one lists the formats. Find the cell whose first format
    // is this one (same entries and styles).
    Reference<css::container::XIndexAccess> api_view(sal_Int32 s, const std::vector<CellRangeAddress>& ranges,
                                                     const std::vector<rtl::OUString>& styles) const {
        const auto sh = sheet(s);
        int tries = 0;
        for (const auto& r : ranges)
            for (sal_Int32 row = r.StartRow; row <= r.EndRow; ++row)
                for (sal_Int32 col = r.StartColumn; col <= r.EndColumn; ++col) {
                    if (++tries > 512) return {};
                    Reference<css::beans::XPropertySet> cell(sh->getCellByPosition(col, row), UNO_QUERY_THROW);
                    Reference<css::container::XIndexAccess> entries(cell->getPropertyValue("ConditionalFormat"), UNO_QUERY);
                    if (!entries.is() || entries->getCount() != static_cast<sal_Int32>(styles.size())) continue;
                    bool same = true;
                    for (sal_Int32 i = 0; same && i < entries->getCount(); ++i)
                        same = Reference<css::sheet::XSheetConditionalEntry>(entries->getByIndex(i), UNO_QUERY_THROW)
                                   ->getStyleName() == styles[static_cast<std::size_t>(i)];
                    if (same) return entries;
                }
        return {};
    }

    void collect_formats(sal_Int32 s) {
        Reference<css::beans::XPropertySet> props(sheets_->getByIndex(s), UNO_QUERY_THROW);
        Reference<css::sheet::XConditionalFormats> formats(props->getPropertyValue("ConditionalFormats"), UNO_QUERY);
        if (!formats.is()) return;
        const auto list = formats->getConditionalFormats();
        for (const auto& format : list) {
            Reference<css::beans::XPropertySet> fp(format, UNO_QUERY_THROW);
            Reference<css::container::XIndexAccess> entries(format, UNO_QUERY_THROW);
            Reference<css::sheet::XSheetCellRanges> ranges(fp->getPropertyValue("Range"), UNO_QUERY_THROW);
            const auto addresses = ranges->getRangeAddresses();
            std::vector<CellRangeAddress> where_ranges(addresses.begin(), addresses.end());
            if (where_ranges.empty()) continue;
            const std::string where = "conditional format on " + ranges_text(sheet_name(s), where_ranges);
            bool mentions = false, representable = true;
            std::vector<rtl::OUString> styles;
            for (sal_Int32 i = 0; i < entries->getCount(); ++i) {
                Reference<css::sheet::XConditionEntry> entry(entries->getByIndex(i), UNO_QUERY_THROW);
                if (entry->getType() != css::sheet::ConditionEntryType::CONDITION) {
                    representable = false;
                    continue;
                }
                Reference<css::beans::XPropertySet> ep(entry, UNO_QUERY_THROW);
                rtl::OUString f1, f2, style;
                sal_Int32 op = 0;
                ep->getPropertyValue("Formula1") >>= f1;
                ep->getPropertyValue("Formula2") >>= f2;
                ep->getPropertyValue("StyleName") >>= style;
                ep->getPropertyValue("Operator") >>= op;
                // ConditionEntryOperator: comparisons, duplicates and "formula is" have a form in
                // the interface that rewrites the format; "begins with", "top 10" and so on do not.
                representable = representable && (op <= 9 || op == 24);
                mentions = mentions || names_addin_function(f1) || names_addin_function(f2);
                styles.push_back(style);
            }
            if (!mentions) continue;
            const auto view = representable ? api_view(s, where_ranges, styles) : Reference<css::container::XIndexAccess>();
            sal_Int32 id = 0;
            fp->getPropertyValue("ID") >>= id;
            const auto key = std::make_pair(s, id);
            if (given_up_.count(key)) continue;
            if (!view.is()) {
                unresolved_[key] = where + (representable ? ": overlaps another conditional format that could not be "
                                                            "rewritten; left as it was"
                                                          : ": has entries of a kind that cannot be rewritten "
                                                            "(colour scale, data bar, icon set, date, text or top-N "
                                                            "condition); left as it was");
                continue;
            }
            unresolved_.erase(key);
            FormatRule rule;
            rule.formats = formats;
            rule.id = id;
            rule.sheet = s;
            rule.ranges.set(ranges, UNO_QUERY_THROW);
            rule.where = where;
            for (sal_Int32 i = 0; i < view->getCount(); ++i) {
                Reference<css::sheet::XSheetCondition2> condition(view->getByIndex(i), UNO_QUERY_THROW);
                FormatEntry e;
                e.op = condition->getConditionOperator();
                e.style = Reference<css::sheet::XSheetConditionalEntry>(condition, UNO_QUERY_THROW)->getStyleName();
                e.source = condition->getSourcePosition();
                e.first = analyse(condition->getFormula1(), e.source, where, where_ranges, false);
                e.second = analyse(condition->getFormula2(), e.source, where, where_ranges, false);
                rule.entries.push_back(std::move(e));
            }
            formats_.push_back(std::move(rule));
        }
    }

    void collect_validations(sal_Int32 s) {
        Reference<css::sheet::XCellFormatRangesSupplier> supplier(sheets_->getByIndex(s), UNO_QUERY_THROW);
        const auto ranges = supplier->getCellFormatRanges();
        for (sal_Int32 i = 0; i < ranges->getCount(); ++i) {
            Reference<css::beans::XPropertySet> range(ranges->getByIndex(i), UNO_QUERY_THROW);
            Reference<css::sheet::XSheetCondition> validation(range->getPropertyValue("Validation"), UNO_QUERY);
            if (!validation.is()) continue;
            css::sheet::ValidationType type = css::sheet::ValidationType_ANY;
            Reference<css::beans::XPropertySet>(validation, UNO_QUERY_THROW)->getPropertyValue("Type") >>= type;
            if (type == css::sheet::ValidationType_ANY) continue;
            if (!calls_addin(validation->getFormula1()) && !calls_addin(validation->getFormula2())) continue;
            const CellRangeAddress address = Reference<css::sheet::XCellRangeAddressable>(range, UNO_QUERY_THROW)->getRangeAddress();
            ValidityRule rule;
            rule.range = range;
            rule.validation = validation;
            rule.where = "validity rule on " + ranges_text(sheet_name(s), {address});
            const CellAddress source = validation->getSourcePosition();
            rule.first = analyse(validation->getFormula1(), source, rule.where, {address}, false);
            rule.second = analyse(validation->getFormula2(), source, rule.where, {address}, false);
            validations_.push_back(std::move(rule));
        }
    }

    void create_values_sheet() {
        Reference<css::container::XNameAccess> names(sheets_, UNO_QUERY_THROW);
        rtl::OUString name = rtl::OUString::createFromAscii(kValuesSheet);
        for (int n = 2; names->hasByName(name); ++n) name = ustr(std::string(kValuesSheet) + " " + std::to_string(n));
        values_index_ = sheets_->getCount();
        document_->getSheets()->insertNewByName(name, static_cast<sal_Int16>(values_index_));
        values_ = sheet(values_index_);
        values_name_ = name;
        result_.values_sheet = values_index_;
        auto columns = Reference<css::table::XColumnRowRange>(values_, UNO_QUERY_THROW)->getColumns();
        Reference<css::beans::XPropertySet>(columns->getByIndex(0), UNO_QUERY_THROW)->setPropertyValue("Width", Any(sal_Int32(9000)));
        Reference<css::beans::XPropertySet>(columns->getByIndex(1), UNO_QUERY_THROW)->setPropertyValue("Width", Any(sal_Int32(3500)));
        max_rows_ = Reference<css::table::XColumnRowRange>(values_, UNO_QUERY_THROW)->getRows()->getCount();
    }

    // Each call is written once into the cell at its source position on a scratch sheet, so
    // Calc reads its references relative to that position; the tokens keep them.
    void read_tokens(std::size_t from) {
        Reference<css::container::XNameAccess> names(sheets_, UNO_QUERY_THROW);
        rtl::OUString name = "Coilwright scratch";
        for (int n = 2; names->hasByName(name); ++n) name = ustr("Coilwright scratch " + std::to_string(n));
        const sal_Int32 scratch_index = sheets_->getCount();
        document_->getSheets()->insertNewByName(name, static_cast<sal_Int16>(scratch_index));
        const auto scratch_sheet = sheet(scratch_index);
        for (std::size_t u = from; u < uses_.size(); ++u) {
            Use& use = uses_[u];
            const auto scratch = scratch_sheet->getCellByPosition(use.source.Column, use.source.Row);
            scratch->setFormula("=" + use.call);
            use.tokens = pointed(Reference<css::sheet::XFormulaTokens>(scratch, UNO_QUERY_THROW)->getTokens(),
                                 scratch_index, use.source.Sheet);
            scratch->setFormula("");
            use.per_cell = depends_on_position(use.tokens, use.sheet_of_user);
            use.refused = uses_own_position(use.call);
            if (use.refused)
                result_.warnings.push_back(use.where + ": a call uses ROW() or COLUMN() of the cell itself; left as it was");
        }
        document_->getSheets()->removeByName(name);  // the last sheet: no other sheet moves
    }

    void write(sal_Int32 col, sal_Int32 row, const std::string& text) {
        Reference<css::text::XSimpleText>(values_->getCellByPosition(col, row), UNO_QUERY_THROW)->setString(ustr(text));
    }

    void place_call(sal_Int32 col, sal_Int32 row, const Use& use, sal_Int32 row_shift) {
        Reference<css::sheet::XFormulaTokens>(values_->getCellByPosition(col, row), UNO_QUERY_THROW)
            ->setTokens(shifted(use.tokens, row_shift));
        ++result_.calls;
    }

    // Uses from `from` on: first one row per distinct call that does not depend on the cell it
    // serves, then one block per call that does, each value at the address of the cell it
    // serves, `shift` rows lower. Everything goes below the rows used so far.
    void lay_out(std::size_t from) {
        std::string sheet_ref = quoted_sheet(values_name_);
        sheet_ref.insert(sheet_ref.begin(), '$');
        sheet_ref += '.';
        for (std::size_t u = from; u < uses_.size(); ++u) {
            Use& use = uses_[u];
            if (use.per_cell || use.refused) continue;
            const std::string key = std::to_string(use.source.Sheet) + "|" + utf8(use.call);
            auto it = single_rows_.find(key);
            if (it == single_rows_.end()) {
                it = single_rows_.emplace(key, free_row_++).first;
                write(0, it->second, use.where);
                place_call(1, it->second, use, 0);
                write(2, it->second, without_prefix(utf8(use.call), addin_prefix()));
            }
            use.reference = ustr(sheet_ref + "$B$" + std::to_string(it->second + 1));
        }
        ++free_row_;
        for (std::size_t u = from; u < uses_.size(); ++u) {
            Use& use = uses_[u];
            if (!use.per_cell || use.refused) continue;
            if (use.sheet_of_user) {
                result_.warnings.push_back(use.where + ": its call depends on the cell that uses the name; left as it was");
                continue;
            }
            const CellRangeAddress box = bounds(use.ranges);
            const sal_Int32 top = std::max(free_row_ + 1, box.StartRow);
            const sal_Int32 shift = top - box.StartRow;
            const sal_Int32 height = box.EndRow - box.StartRow + 1;
            if (cell_count(use.ranges) > kMaxCellsPerCall || top + height > max_rows_ ||
                use.source.Row + shift >= max_rows_) {
                result_.warnings.push_back(use.where + ": its call depends on the cell and the range is too large to "
                                                       "freeze cell by cell; left as it was");
                continue;
            }
            write(box.StartColumn, top - 1,
                  "Values of " + without_prefix(utf8(use.call), addin_prefix()) + " for the " + use.where +
                      ": each cell serves the cell " + std::to_string(shift) + " rows higher on its sheet");
            for (const auto& r : use.ranges)
                for (sal_Int32 row = r.StartRow; row <= r.EndRow; ++row)
                    for (sal_Int32 col = r.StartColumn; col <= r.EndColumn; ++col) place_call(col, row + shift, use, shift);
            use.reference = ustr(sheet_ref + cell_name(use.source.Column, use.source.Row + shift));
            free_row_ = top + height + 1;
        }
    }

    void warn_unresolved() {
        for (const auto& [key, text] : unresolved_) result_.warnings.push_back(text);
    }

    // Rewrites the rules collected since the last call (each rule once).
    void apply() {
        for (auto& rule : names_) {
            if (!rule.formula.ready(uses_)) continue;
            rule.name->setContent(rule.formula.rewritten(uses_));
            ++result_.names;
        }
        for (auto& rule : formats_) {
            if (!ready(rule, uses_)) {
                given_up_.insert({rule.sheet, rule.id});
                continue;
            }
            rule.formats->removeByID(rule.id);
            Reference<css::sheet::XSheetConditionalEntries> entries(rule.ranges->getPropertyValue("ConditionalFormat"),
                                                                    UNO_QUERY_THROW);
            entries->clear();
            for (const auto& e : rule.entries) {
                Sequence<css::beans::PropertyValue> props(5);
                auto* p = props.getArray();
                p[0] = property("Operator", Any(e.op));
                p[1] = property("Formula1", Any(e.first.rewritten(uses_)));
                p[2] = property("Formula2", Any(e.second.rewritten(uses_)));
                p[3] = property("StyleName", Any(e.style));
                p[4] = property("SourcePosition", Any(e.source));
                entries->addNew(props);
            }
            rule.ranges->setPropertyValue("ConditionalFormat", Any(entries));
            ++result_.conditional_formats;
        }
        for (auto& rule : validations_) {
            if (!rule.first.ready(uses_) || !rule.second.ready(uses_)) continue;
            rule.validation->setFormula1(rule.first.rewritten(uses_));
            rule.validation->setFormula2(rule.second.rewritten(uses_));
            rule.range->setPropertyValue("Validation", Any(rule.validation));
            ++result_.validations;
        }
        names_.clear();
        formats_.clear();
        validations_.clear();
    }

    Reference<css::sheet::XSpreadsheetDocument> document_;
    Reference<css::container::XIndexAccess> sheets_;
    Reference<css::sheet::XSpreadsheet> values_;
    rtl::OUString values_name_;
    sal_Int32 values_index_ = -1;
    sal_Int32 max_rows_ = 0;
    std::vector<Use> uses_;
    std::vector<NameRule> names_;
    std::vector<FormatRule> formats_;
    std::vector<ValidityRule> validations_;
    std::map<std::pair<sal_Int32, sal_Int32>, std::string> unresolved_;  // (sheet, format ID) -> why
    std::set<std::pair<sal_Int32, sal_Int32>> given_up_;  // formats whose calls could not be placed
    std::map<std::string, sal_Int32> single_rows_;
    sal_Int32 free_row_ = kFirstValueRow;
    RuleFreeze result_;
};

}  // namespace

RuleFreeze freeze_rules(const Reference<css::sheet::XSpreadsheetDocument>& document) {
    return RuleFreezer(document).run();
}

}  // namespace coilwright::share
