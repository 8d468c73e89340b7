// A coil table as a cell result: one row per coil, the six columns of a sheet row.
#pragma once

#include "cells.hpp"
#include "coilwright/coil_table.hpp"

namespace coilwright::sheet {

inline CallResult coil_table_result(const CoilTable& table) {
    CallResult r;
    r.rows = table.size();
    r.cols = kCoilTableColumns;
    for (const CoilRow& row : table.rows())
        for (double v : {row.inner_radius, row.outer_radius, row.length, row.centre_z, row.turns, row.current})
            r.values.push_back(v);
    r.errors.assign(r.values.size(), CellError::None);
    return r;
}

}  // namespace coilwright::sheet
