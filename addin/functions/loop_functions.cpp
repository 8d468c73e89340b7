// LOOP_* : N coincident thin circular turns.
#include <algorithm>
#include <cmath>
#include <cstring>

#include "coilwright/field.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

namespace {

enum class Component { Bz, Br, Magnitude };

double component(Component which, double bz, double br) {
    switch (which) {
        case Component::Bz: return bz;
        case Component::Br: return br;
        case Component::Magnitude: break;
    }
    return std::hypot(bz, br);  // as FieldRZ::magnitude
}

bool same_throughout(const double* column, std::size_t n) {
    return std::all_of(column, column + n, [&](double v) { return std::memcmp(&v, column, sizeof v) == 0; });
}

// An array of points around one loop (radius, turns and current the same throughout) goes
// through loop_field_batch, which gives loop_field's values bit for bit and NaN where it
// throws; the call layer then asks the element function for those errors. Columns are the
// arguments in catalogue order: radius, turns, current, z, r.
BatchFn batch(Component which) {
    return [which](const double* const* columns, std::size_t n, double* out) {
        if (n == 0) return true;
        for (int k = 0; k < 3; ++k)
            if (!same_throughout(columns[k], n)) return false;
        const LoopSpec loop{columns[0][0], columns[1][0], columns[2][0]};
        try {
            validate(loop);
        } catch (const DomainError&) {
            return false;  // every element is then the same error
        }
        constexpr std::size_t kStep = 256;
        double bz[kStep], br[kStep];
        for (std::size_t start = 0; start < n; start += kStep) {
            const std::size_t m = std::min(kStep, n - start);
            loop_field_batch(loop, columns[3] + start, columns[4] + start, m, bz, br);
            for (std::size_t i = 0; i < m; ++i) out[start + i] = component(which, bz[i], br[i]);
        }
        return true;
    };
}

template <class Fn>
Implementation loop_component(Component which) {
    return numeric<Fn>(
        [which](const typename Fn::Args& a) {
            const FieldRZ f = loop_field({a.radius, a.turns, a.current}, a.z, a.r);
            return component(which, f.bz, f.br);
        },
        work::kLoopField, batch(which));
}

}  // namespace

template <> Implementation implement<fn::LOOP_BZ>() { return loop_component<fn::LOOP_BZ>(Component::Bz); }
template <> Implementation implement<fn::LOOP_BR>() { return loop_component<fn::LOOP_BR>(Component::Br); }
template <> Implementation implement<fn::LOOP_B>() { return loop_component<fn::LOOP_B>(Component::Magnitude); }

}  // namespace coilwright::sheet
