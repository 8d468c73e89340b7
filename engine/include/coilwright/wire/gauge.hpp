// Round magnet wire: American Wire Gauge sizes.
#pragma once

#include <string_view>

namespace coilwright {

// Gauge number from text: "1/0".."4/0" (also "0", "00", "000", "0000") and plain integers.
// "1/0" is gauge 0, "2/0" is -1, "3/0" is -2, "4/0" is -3. Throws DomainError otherwise.
double parse_awg_gauge(std::string_view text);

// Bare diameter (m) of AWG gauge n per ASTM B258: d = 0.005 in * 92^((36 - n) / 39),
// for whole gauges from -3 (4/0) to 56.
double awg_diameter(double gauge);

}  // namespace coilwright
