// Numbers of a spreadsheet written into its saved .ods with every digit (see ods_values.hpp for
// why LibreOffice's own file loses some).
#pragma once

#include <com/sun/star/sheet/XSpreadsheetDocument.hpp>
#include <com/sun/star/uno/XComponentContext.hpp>
#include <rtl/ustring.hxx>

#include <cstdint>
#include <optional>
#include <string>
#include <unordered_map>

#include "ods_values.hpp"

namespace coilwright::share {

// The number in every cell of a document that holds one (a value or a formula's result).
class NumberSnapshot {
public:
    void set(const CellKey& key, double value) { values_[pack(key)] = value; }
    std::optional<double> at(const CellKey& key) const;
    std::size_t size() const { return values_.size(); }

private:
    static std::uint64_t pack(const CellKey& k) {
        return (static_cast<std::uint64_t>(k.sheet) << 48) | (static_cast<std::uint64_t>(k.row) << 24) |
               static_cast<std::uint64_t>(k.col);
    }
    std::unordered_map<std::uint64_t, double> values_;
};

NumberSnapshot collect_numbers(const css::uno::Reference<css::sheet::XSpreadsheetDocument>& document);

// The shortest text that LibreOffice reads back as exactly `value`, and the text it writes itself.
std::string exact_number_text(double value);
std::string saved_number_text(double value);

// Rewrites content.xml inside the .ods at `url` (a document that is not open) so that each
// number cell holds its value from `snapshot` exactly. Throws when a saved cell does not match
// the snapshot (the file is then left as it was). Returns how many values were rewritten.
std::size_t write_numbers_exactly(const css::uno::Reference<css::uno::XComponentContext>& context,
                                  const rtl::OUString& url, const NumberSnapshot& snapshot);

}  // namespace coilwright::share
