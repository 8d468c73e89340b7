#include "coilwright/wire/winding_heat.hpp"

#include <cmath>
#include <string>

#include "coilwright/constants.hpp"
#include "numerics/checks.hpp"
#include "wire/temperature_checks.hpp"

namespace coilwright {

using namespace internal;

namespace {

// Series are summed for |x| below this, where the closed forms cancel; 60 terms leave
// 0.25^60 ~ 1e-36 of the first.
constexpr double kSeriesBelow = 0.25;
constexpr int kSeriesTerms = 60;

// 2 (x - ln(1 + x)) + x^2 = b^2 - a^2 - 2 a^2 ln(b/a) over a^2, with x = (b - a)/a.
double outer_cooled_bracket(double x) {
    if (x >= kSeriesBelow) return 2.0 * (x - std::log1p(x)) + x * x;
    double sum = 0.0, power = -x;  // x - ln(1 + x) = sum_{n>=2} (-x)^n / n
    for (int n = 2; n <= kSeriesTerms; ++n) {
        power *= -x;
        sum += power / n;
    }
    return 2.0 * sum + x * x;
}

// 1 - u of u = rm^2 / b^2 = x (2 + x) / (2 ln(1 + x) (1 + x)^2): its numerator
// 2 ln(1 + x) (1 + x)^2 - x (2 + x) = 2 x^2 + sum_{m>=3} 2 c_m x^m, c_m the coefficients of
// (1 + x)^2 ln(1 + x), summed for small x where the two terms cancel.
double one_minus_u(double x) {
    const double y = std::log1p(x), b2 = (1.0 + x) * (1.0 + x);
    double numerator;
    if (x >= kSeriesBelow) {
        numerator = 2.0 * y * b2 - x * (2.0 + x);
    } else {
        const auto l = [](int n) { return n < 1 ? 0.0 : (n % 2 == 1 ? 1.0 : -1.0) / n; };  // of ln(1 + x)
        numerator = 2.0 * x * x;
        double power = x * x;
        for (int m = 3; m <= kSeriesTerms; ++m) {
            power *= x;
            numerator += 2.0 * (l(m) + 2.0 * l(m - 1) + l(m - 2)) * power;
        }
    }
    return numerator / (2.0 * y * b2);
}

// 1 - u + u ln u with u = 1 - w: w + (1 - w) ln(1 - w) = sum_{n>=2} w^n / (n (n - 1)).
double both_cooled_bracket(double w) {
    if (w >= kSeriesBelow) return w + (1.0 - w) * std::log1p(-w);
    double sum = 0.0, power = w;
    for (int n = 2; n <= kSeriesTerms; ++n) {
        power *= w;
        sum += power / (n * (n - 1.0));
    }
    return sum;
}

// (1 - exp(-x)) / x, 1 at x = 0; for x < 0 it grows like exp(-x) / |x| (overflows to inf).
double relaxation(double x) { return x == 0.0 ? 1.0 : -std::expm1(-x) / x; }

}  // namespace

double winding_hotspot_rise(double inner_radius, double outer_radius, double length, double power,
                            double conductivity, CooledSurfaces cooled) {
    check::radial_extent(inner_radius, outer_radius);
    if (!(outer_radius > inner_radius)) raise_domain_error("outer radius must be > inner radius: the winding needs a build");
    check::positive(length, "length");
    check::non_negative(power, "power");
    check::positive(conductivity, "thermal conductivity");
    if (cooled != CooledSurfaces::Outer && cooled != CooledSurfaces::Both)
        raise_domain_error("cooled surfaces must be \"outer\" or \"both\"");
    const double x = (outer_radius - inner_radius) / inner_radius;  // build over inner radius
    const double scale = power / (4.0 * kPi * conductivity * length);  // q a^2 x (2 + x) / (4 k)
    const double area_ratio = x * (2.0 + x);                          // (b^2 - a^2) / a^2
    const double rise = cooled == CooledSurfaces::Outer
                            ? scale * (outer_cooled_bracket(x) / area_ratio)
                            : scale * ((1.0 + x) * (1.0 + x) / area_ratio) * both_cooled_bracket(one_minus_u(x));
    return check::finite_result(rise, "hot-spot rise");
}

double coil_temperature_at_time(double r20, double current, double area, double heat_capacity, double time,
                                double ambient_c, double h, Conductor c) {
    check::positive(r20, "resistance at 20 C");
    check::finite(current, "current");
    check::positive(area, "cooling area");
    check::positive(heat_capacity, "heat capacity");
    check::non_negative(time, "time");
    check_conductor_temperature(ambient_c, "ambient temperature");
    check::positive(h, "heat-transfer coefficient");
    const double alpha = conductor_data(c).temp_coefficient;
    const double i2r = current * current * r20;
    const double p_ambient = i2r * (1.0 + alpha * (ambient_c - 20.0));  // W at the start
    const double lambda = h * area - alpha * i2r;                       // W/K
    const double rise = p_ambient * time / heat_capacity * relaxation(lambda * time / heat_capacity);
    if (!(ambient_c + rise <= kMaxConductorTemperature))
        raise_domain_error(lambda <= 0.0
                               ? "thermal runaway: the winding passes 400 C before this time (the heating grows "
                                 "faster than the cooling)"
                               : "the winding passes 400 C before this time, far beyond every insulation class");
    return check::finite_result(ambient_c + rise, "winding temperature");
}

double pulse_temperature_rise(double r20, double current, double duration, double heat_capacity, double start_c,
                              Conductor c) {
    check::positive(r20, "resistance at 20 C");
    check::finite(current, "current");
    check::non_negative(duration, "pulse time");
    check::positive(heat_capacity, "heat capacity");
    check_conductor_temperature(start_c, "start temperature");
    const double alpha = conductor_data(c).temp_coefficient;
    const double exponent = alpha * (current * current * r20) * duration / heat_capacity;
    const double rise = (1.0 / alpha + start_c - 20.0) * std::expm1(exponent);
    if (!(start_c + rise <= kMaxConductorTemperature))
        raise_domain_error("the pulse heats the conductor beyond 400 C, far beyond every insulation class");
    return check::finite_result(rise, "pulse temperature rise");
}

}  // namespace coilwright
