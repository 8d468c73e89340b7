// HELMHOLTZ_B0, PAIR_*, GRADPAIR_*: pairs of identical coaxial coils.
#include "coilwright/design.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

namespace {

template <class Args>
CoilSection section(const Args& a) {
    return {a.innerRadius, a.outerRadius, a.length};
}

}  // namespace

template <> Implementation implement<fn::HELMHOLTZ_B0>() {
    return numeric<fn::HELMHOLTZ_B0>(
        [](const fn::HELMHOLTZ_B0::Args& a) { return helmholtz_centre_field(a.radius, a.turns, a.current); });
}

template <> Implementation implement<fn::PAIR_SPACING>() {
    return numeric<fn::PAIR_SPACING>([](const fn::PAIR_SPACING::Args& a) { return flat_pair_spacing(section(a)); },
                                     work::kPairSpacingSearch);
}

template <> Implementation implement<fn::PAIR_B0>() {
    return numeric<fn::PAIR_B0>(
        [](const fn::PAIR_B0::Args& a) { return pair_centre_field(section(a), a.turns, a.current, a.spacing); });
}

template <> Implementation implement<fn::GRADPAIR_SPACING>() {
    return numeric<fn::GRADPAIR_SPACING>(
        [](const fn::GRADPAIR_SPACING::Args& a) { return gradient_pair_spacing(section(a)); }, work::kPairSpacingSearch);
}

template <> Implementation implement<fn::GRADPAIR_GRADIENT>() {
    return numeric<fn::GRADPAIR_GRADIENT>([](const fn::GRADPAIR_GRADIENT::Args& a) {
        return gradient_pair_gradient(section(a), a.turns, a.current, a.spacing);
    });
}

}  // namespace coilwright::sheet
