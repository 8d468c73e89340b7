#include "coilwright/coil_table.hpp"

#include <cmath>
#include <numeric>
#include <string>

#include "coilwright/errors.hpp"
#include "numerics/checks.hpp"

namespace coilwright {

using namespace internal;

void validate(const CoilSection& section, const char* which) {
    check::radial_extent(section.inner_radius, section.outer_radius, which);
    check::non_negative(section.length, (std::string(which) + "length").c_str());
}

CoilRow::Kind CoilRow::kind() const {
    const bool flat_radially = inner_radius == outer_radius;
    if (flat_radially) return length == 0.0 ? Kind::Loop : Kind::ThinSolenoid;
    return length == 0.0 ? Kind::FlatSpiral : Kind::Thick;
}

void validate(const CoilRow& row, std::size_t label) {
    const std::string where = "row " + std::to_string(label) + ": ";
    const auto fail = [&](const std::string& what) { raise_domain_error(where + what); };
    for (double v : {row.inner_radius, row.outer_radius, row.length, row.centre_z, row.turns, row.current})
        if (!std::isfinite(v)) fail("every value must be a finite number");
    if (!(row.inner_radius > 0.0)) fail("inner radius must be > 0");
    if (row.outer_radius < row.inner_radius) fail("outer radius must be >= inner radius");
    if (row.length < 0.0) fail("length must be >= 0");
    if (row.turns < 0.0) fail("turns must be >= 0");
}

CoilTable::CoilTable(std::vector<CoilRow> rows, std::vector<std::size_t> row_labels)
    : rows_(std::move(rows)), labels_(std::move(row_labels)) {
    if (labels_.size() != rows_.size()) raise_domain_error("coil table: one label per row is needed");
    if (rows_.empty()) raise_domain_error("the coil table has no rows");
    for (std::size_t i = 0; i < rows_.size(); ++i) validate(rows_[i], labels_[i]);
}

CoilTable::CoilTable(std::vector<CoilRow> rows)
    : CoilTable(rows, [&] {
          std::vector<std::size_t> labels(rows.size());
          std::iota(labels.begin(), labels.end(), std::size_t{1});
          return labels;
      }()) {}

}  // namespace coilwright
