// Truncated Taylor series ("jets") in one variable: c[k] = f^(k)(x0) / k!.
//
// Evaluating a closed-form expression on jets yields all its derivatives at x0 to rounding
// accuracy at once (automatic differentiation in Taylor mode; e.g. A. Griewank and A. Walther,
// Evaluating Derivatives, 2nd ed., SIAM 2008, ch. 13). The recurrences below are the standard
// ones for products, quotients, powers and logarithms of power series (D. E. Knuth, TAOCP
// vol. 2, sec. 4.7).
#pragma once

#include <array>
#include <cmath>
#include <cstddef>

namespace coilwright::internal {

template <std::size_t N>  // N coefficients: derivatives of order 0 .. N-1
struct Jet {
    std::array<double, N> c{};

    static Jet constant(double v) {
        Jet j;
        j.c[0] = v;
        return j;
    }
    static Jet variable(double x0) {  // the independent variable itself
        Jet j;
        j.c[0] = x0;
        if constexpr (N > 1) j.c[1] = 1.0;
        return j;
    }
    // k-th derivative: k! c[k].
    double derivative(std::size_t k) const {
        double f = 1.0;
        for (std::size_t i = 2; i <= k; ++i) f *= static_cast<double>(i);
        return f * c[k];
    }

    Jet& operator+=(const Jet& o) {
        for (std::size_t k = 0; k < N; ++k) c[k] += o.c[k];
        return *this;
    }
    Jet& operator-=(const Jet& o) {
        for (std::size_t k = 0; k < N; ++k) c[k] -= o.c[k];
        return *this;
    }
    Jet& operator*=(double s) {
        for (auto& v : c) v *= s;
        return *this;
    }
};

template <std::size_t N> Jet<N> operator+(Jet<N> a, const Jet<N>& b) { return a += b; }
template <std::size_t N> Jet<N> operator-(Jet<N> a, const Jet<N>& b) { return a -= b; }
template <std::size_t N> Jet<N> operator*(double s, Jet<N> a) { return a *= s; }
template <std::size_t N> Jet<N> operator+(Jet<N> a, double s) { a.c[0] += s; return a; }

template <std::size_t N>
Jet<N> operator*(const Jet<N>& a, const Jet<N>& b) {
    Jet<N> r;
    for (std::size_t k = 0; k < N; ++k) {
        double s = 0.0;
        for (std::size_t j = 0; j <= k; ++j) s += a.c[j] * b.c[k - j];
        r.c[k] = s;
    }
    return r;
}

template <std::size_t N>
Jet<N> operator/(const Jet<N>& a, const Jet<N>& b) {
    Jet<N> r;
    for (std::size_t k = 0; k < N; ++k) {
        double s = a.c[k];
        for (std::size_t j = 1; j <= k; ++j) s -= b.c[j] * r.c[k - j];
        r.c[k] = s / b.c[0];
    }
    return r;
}

// a^p for real p, a.c[0] > 0: from a y' = p a' y.
template <std::size_t N>
Jet<N> pow(const Jet<N>& a, double p) {
    Jet<N> y;
    y.c[0] = std::pow(a.c[0], p);
    for (std::size_t k = 1; k < N; ++k) {
        double s = 0.0;
        for (std::size_t j = 1; j <= k; ++j)
            s += (p * static_cast<double>(j) - static_cast<double>(k - j)) * a.c[j] * y.c[k - j];
        y.c[k] = s / (static_cast<double>(k) * a.c[0]);
    }
    return y;
}

template <std::size_t N>
Jet<N> sqrt(const Jet<N>& a) {
    return pow(a, 0.5);
}

// log(a), a.c[0] > 0: from a l' = a'.
template <std::size_t N>
Jet<N> log(const Jet<N>& a) {
    Jet<N> l;
    l.c[0] = std::log(a.c[0]);
    for (std::size_t k = 1; k < N; ++k) {
        double s = static_cast<double>(k) * a.c[k];
        for (std::size_t j = 1; j < k; ++j) s -= static_cast<double>(j) * l.c[j] * a.c[k - j];
        l.c[k] = s / (static_cast<double>(k) * a.c[0]);
    }
    return l;
}

}  // namespace coilwright::internal
