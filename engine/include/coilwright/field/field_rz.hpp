// Field values in cylindrical components about a coil axis.
#pragma once

#include <cmath>

namespace coilwright {

// Which field components to compute (the other is returned as 0): saves work for Bz or Br alone.
enum class Components { Both, Axial, Radial };

struct FieldRZ {
    double bz = 0.0;  // axial component, T
    double br = 0.0;  // radial component (away from the axis), T

    double magnitude() const { return std::hypot(bz, br); }
    FieldRZ& operator+=(const FieldRZ& o) {
        bz += o.bz;
        br += o.br;
        return *this;
    }
};

inline FieldRZ operator*(double s, FieldRZ f) { return {s * f.bz, s * f.br}; }

}  // namespace coilwright
