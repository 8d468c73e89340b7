// Helpers shared by the engine tests.
#pragma once

#include <cmath>

namespace coilwright::test {

// |a - b| / |b|: the relative error of a against the reference b.
inline double rel(double a, double b) { return std::fabs(a - b) / std::fabs(b); }

// df/dx at x by central differences with Richardson extrapolation (error O(h^4)).
template <class F>
double derivative(F f, double x, double h) {
    const double d1 = (f(x + h) - f(x - h)) / (2 * h);
    const double d2 = (f(x + h / 2) - f(x - h / 2)) / h;
    return (4 * d2 - d1) / 3;
}

}  // namespace coilwright::test
