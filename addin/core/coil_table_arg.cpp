#include "coil_table_arg.hpp"

#include <string>

#include "coilwright/errors.hpp"

namespace coilwright::sheet {

namespace {
constexpr const char* kColumnNames[kCoilTableColumns] = {"inner radius", "outer radius", "length",
                                                         "centre z", "turns", "current"};
}

CoilTable read_coil_table(const Arg& table) {
    if (table.form == Arg::Form::Missing) throw DomainError("the coil table is required");
    if (table.cols != kCoilTableColumns)
        throw DomainError("the coil table needs 6 columns (inner radius, outer radius, length, centre z, "
                          "turns, current); this range has " + std::to_string(table.cols));
    std::vector<CoilRow> rows;
    std::vector<std::size_t> labels;
    for (std::size_t r = 0; r < table.rows; ++r) {
        bool blank = true;
        for (std::size_t c = 0; c < kCoilTableColumns; ++c) blank = blank && table.at(r, c).kind == CellKind::Empty;
        if (blank) continue;
        double v[kCoilTableColumns];
        for (std::size_t c = 0; c < kCoilTableColumns; ++c) {
            const Cell& cell = table.at(r, c);
            if (cell.kind != CellKind::Number)
                throw DomainError("row " + std::to_string(r + 1) + ": " + kColumnNames[c] +
                                  (cell.kind == CellKind::Empty ? " is blank" : " is text, not a number"));
            v[c] = cell.number;
        }
        rows.push_back({v[0], v[1], v[2], v[3], v[4], v[5]});
        labels.push_back(r + 1);
    }
    return CoilTable(std::move(rows), std::move(labels));
}

}  // namespace coilwright::sheet
