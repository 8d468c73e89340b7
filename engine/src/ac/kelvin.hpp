// Kelvin functions of order 0 and their derivatives (A&S 9.9, DLMF 10.61), the skin effect's
// Bessel functions: ber x + i bei x = J0(x e^{3 pi i/4}), ber' x + i bei' x = -e^{3 pi i/4} J1(...).
#pragma once

namespace coilwright::internal {

// ber, bei, ber', bei' at x, each multiplied by e^{-log_scale}: the true value of ber x is
// ber * exp(log_scale). log_scale is 0 where the power series is used and x / sqrt(2) beyond,
// where the functions grow like e^{x/sqrt(2)} (so nothing overflows at any x).
struct Kelvin0 {
    double ber;
    double bei;
    double dber;
    double dbei;
    double log_scale;
};

// Up to x = kKelvinSeriesLimit: the ascending series (A&S 9.9.10, 9.9.12) summed in extended
// precision, whose 19 digits absorb the e^{0.29 x} growth of its alternating terms; beyond it
// Hankel's asymptotic expansions of J0 and J1 (DLMF 10.17.3) at x e^{3 pi i/4}, both
// exponentials kept (the smaller one is DLMF 10.67's ker/kei term), whose smallest term there
// is below 1e-20. Every series is capped; not settling within the cap is a ConvergenceError.
inline constexpr double kKelvinSeriesLimit = 24.0;

// x must be finite and >= 0 (DomainError otherwise).
Kelvin0 kelvin0(double x);

// Ratio of AC to DC resistance of an isolated round wire at x = sqrt(2) a / delta:
// (x/2) (ber bei' - bei ber') / (ber'^2 + bei'^2), exactly 1 at x = 0.
double round_wire_resistance_ratio(double x);

}  // namespace coilwright::internal
