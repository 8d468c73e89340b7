// PAIR_COILS, GRADPAIR_COILS, MAXWELL_COILS: coil tables of the classic arrangements.
#include "coilwright/design.hpp"
#include "../core/registry.hpp"
#include "../core/table_result.hpp"

namespace coilwright::sheet {

namespace {

// A function of single numbers whose result is a coil table: make(const Fn::Args&).
template <class Fn, class F>
Implementation table_maker(F make) {
    return prepared<Fn>([make](std::span<const Arg* const>) {
        Prepared p;
        p.cost = work::kPairSpacingSearch;
        p.shaped = [make](const double* a) { return coil_table_result(make(Fn::Args::from(a))); };
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
