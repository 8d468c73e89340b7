// LOOP_* : N coincident thin circular turns.
#include <algorithm>
#include <cmath>
#include <cstring>

#include "coilwright/errors.hpp"
#include "coilwright/field.hpp"
#include "../core/registry.hpp"

namespace coilwright::sheet {

namespace {

// Argument order as in idl/functions/10_loop.toml: radius, turns, current, z, r.
enum class Component { Bz, Br, Magnitude };

double component(Component which, double bz, double br) {
    switch (which) {
        case Component::Bz: return bz;
        case Component::Br: return br;
        case Component::Magnitude: break;
    }
    return std::hypot(bz, br);  // as FieldRZ::magnitude
}

ElementFn element(Component which) {
    return [which](const double* a) {
        const FieldRZ f = loop_field({a[0], a[1], a[2]}, a[3], a[4]);
        return component(which, f.bz, f.br);
    };
}

bool same_throughout(const double* column, std::size_t n) {
    return std::all_of(column, column + n, [&](double v) { return std::memcmp(&v, column, sizeof v) == 0; });
}

// An array of points around one loop (radius, turns and current the same throughout) goes
// through loop_field_batch, which gives loop_field's values bit for bit and NaN where it
// throws; the call layer then asks the element function for those errors.
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

}  // namespace

std::vector<Implementation> loop_functions() {
    return {
        numeric("LOOP_BZ", element(Component::Bz), 1.0, batch(Component::Bz)),
        numeric("LOOP_BR", element(Component::Br), 1.0, batch(Component::Br)),
        numeric("LOOP_B", element(Component::Magnitude), 1.0, batch(Component::Magnitude)),
    };
}

}  // namespace coilwright::sheet
