// Gauss-Legendre rules on [0, 1], built once on first use (thread-safe static initialisation).
#pragma once

#include <array>

namespace coilwright::internal {

inline constexpr int kMaxGaussOrder = 20;

struct GaussRule {
    int n = 0;
    std::array<double, kMaxGaussOrder> x{};  // nodes in (0, 1)
    std::array<double, kMaxGaussOrder> w{};  // weights, summing to 1
};

// The n-point rule, 1 <= n <= kMaxGaussOrder.
const GaussRule& gauss_legendre(int n);

}  // namespace coilwright::internal
