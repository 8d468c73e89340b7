#include "coilwright/wire/gauge.hpp"

#include <cctype>
#include <cmath>
#include <string>

#include "coilwright/errors.hpp"
#include "numerics/policy.hpp"

namespace coilwright {

using namespace internal;

namespace {
constexpr double kInch = 0.0254;
constexpr double kMinGauge = -3.0;  // 4/0
constexpr double kMaxGauge = 56.0;

std::string_view trim(std::string_view s) {
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.front()))) s.remove_prefix(1);
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.back()))) s.remove_suffix(1);
    return s;
}
}  // namespace

double parse_awg_gauge(std::string_view text) {
    const std::string_view t = trim(text);
    const std::string bad = "gauge \"" + std::string(t) + "\" is not an AWG size (use 4/0..1/0 or 0..56)";
    if (t.size() == 3 && t[1] == '/' && t[2] == '0' && t[0] >= '1' && t[0] <= '4')
        return 1.0 - (t[0] - '0');
    if (t.size() >= 2 && t.size() <= 4 && t.find_first_not_of('0') == std::string_view::npos)
        return 1.0 - static_cast<double>(t.size());
    if (t.empty() || t.size() > 3 || t.find_first_not_of("0123456789") != std::string_view::npos)
        raise_domain_error(bad);
    return std::stod(std::string(t));
}

double awg_diameter(double gauge) {
    if (!std::isfinite(gauge) || gauge != std::floor(gauge) || gauge < kMinGauge || gauge > kMaxGauge)
        raise_domain_error("gauge must be a whole AWG number from -3 (4/0) to 56");
    return 0.005 * kInch * std::pow(92.0, (36.0 - gauge) / 39.0);
}

}  // namespace coilwright
