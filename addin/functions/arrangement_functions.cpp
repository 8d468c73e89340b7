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

// A function of single numbers whose result is a coil table: make(const Fn::Args&).
template <class Fn, class F>
Implementation table_maker(F make) {
    return prepared<Fn>([make](std::span<const Arg* const>) {
        Prepared p;
        p.cost = work::kPairSpacingSearch;
        p.shaped = [make](const double* a) { return table_result(make(Fn::Args::from(a))); };
        return p;
    });
}

}  // namespace

template <> Implementation implement<fn::PAIR_COILS>() {
    return table_maker<fn::PAIR_COILS>([](const fn::PAIR_COILS::Args& a) {
        return flat_pair_table({a.innerRadius, a.outerRadius, a.length}, a.turns, a.current);
    });
}

template <> Implementation implement<fn::GRADPAIR_COILS>() {
    return table_maker<fn::GRADPAIR_COILS>([](const fn::GRADPAIR_COILS::Args& a) {
        return gradient_pair_table({a.innerRadius, a.outerRadius, a.length}, a.turns, a.current);
    });
}

template <> Implementation implement<fn::MAXWELL_COILS>() {
    return table_maker<fn::MAXWELL_COILS>(
        [](const fn::MAXWELL_COILS::Args& a) { return maxwell_table(a.radius, a.turns, a.current); });
}

}  // namespace coilwright::sheet
