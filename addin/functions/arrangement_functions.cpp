// PAIR_COILS, GRADPAIR_COILS, MAXWELL_COILS: coil tables of the classic arrangements.
#include "coilwright/design.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

namespace {

CallResult table_result(const CoilTable& table) {
    CallResult r;
    r.rows = table.size();
    r.cols = kCoilTableColumns;
    for (const CoilRow& row : table.rows())
        for (double v : {row.inner_radius, row.outer_radius, row.length, row.centre_z, row.turns, row.current})
            r.values.push_back(v);
    r.errors.assign(r.values.size(), CellError::None);
    return r;
}

// A function of single numbers whose result is a coil table.
template <class F>
Implementation table_maker(const char* name, F make) {
    return {name, [make](std::span<const Arg* const>) {
                Prepared p;
                p.cost = 500.0;  // a spacing search
                p.shaped = [make](const double* a) { return table_result(make(a)); };
                return p;
            }};
}

}  // namespace

std::vector<Implementation> arrangement_functions() {
    return {
        table_maker("PAIR_COILS", [](const double* a) { return flat_pair_table({a[0], a[1], a[2]}, a[3], a[4]); }),
        table_maker("GRADPAIR_COILS",
                    [](const double* a) { return gradient_pair_table({a[0], a[1], a[2]}, a[3], a[4]); }),
        table_maker("MAXWELL_COILS", [](const double* a) { return maxwell_table(a[0], a[1], a[2]); }),
    };
}

}  // namespace coilwright::sheet
