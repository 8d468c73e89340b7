// RECT_* and RECTPAIR_*: rectangular loops and pairs of them.
#include "coilwright/design.hpp"
#include "coilwright/field.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

namespace {

template <class Fn, class Pick>
Implementation rect_component(Pick pick) {
    return numeric<Fn>([pick](const typename Fn::Args& a) {
        return pick(rect_field({a.width, a.height, a.turns, a.current}, {a.x, a.y, a.z}));
    });
}

template <class Fn, class Pick>
Implementation rect_pair_component(Pick pick) {
    return numeric<Fn>(
        [pick](const typename Fn::Args& a) {
            return pick(rect_pair_field({a.width, a.height, a.turns, a.current}, a.spacing, {a.x, a.y, a.z}));
        },
        work::kRectPairField);
}

const auto kX = [](const Eigen::Vector3d& b) { return b.x(); };
const auto kY = [](const Eigen::Vector3d& b) { return b.y(); };
const auto kZ = [](const Eigen::Vector3d& b) { return b.z(); };
const auto kNorm = [](const Eigen::Vector3d& b) { return b.stableNorm(); };

}  // namespace

template <> Implementation implement<fn::RECT_BX>() { return rect_component<fn::RECT_BX>(kX); }
template <> Implementation implement<fn::RECT_BY>() { return rect_component<fn::RECT_BY>(kY); }
template <> Implementation implement<fn::RECT_BZ>() { return rect_component<fn::RECT_BZ>(kZ); }
template <> Implementation implement<fn::RECT_B>() { return rect_component<fn::RECT_B>(kNorm); }
template <> Implementation implement<fn::RECTPAIR_BX>() { return rect_pair_component<fn::RECTPAIR_BX>(kX); }
template <> Implementation implement<fn::RECTPAIR_BY>() { return rect_pair_component<fn::RECTPAIR_BY>(kY); }
template <> Implementation implement<fn::RECTPAIR_BZ>() { return rect_pair_component<fn::RECTPAIR_BZ>(kZ); }
template <> Implementation implement<fn::RECTPAIR_B>() { return rect_pair_component<fn::RECTPAIR_B>(kNorm); }

template <> Implementation implement<fn::RECTPAIR_SPACING>() {
    return numeric<fn::RECTPAIR_SPACING>(
        [](const fn::RECTPAIR_SPACING::Args& a) { return rect_pair_spacing(a.width, a.height); },
        work::kRectPairSpacingSearch);
}

}  // namespace coilwright::sheet
