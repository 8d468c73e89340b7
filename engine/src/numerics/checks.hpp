// Argument checks shared by every engine entry point, so messages read the same everywhere.
#pragma once

#include <cmath>
#include <string>

#include "numerics/policy.hpp"

namespace coilwright::internal::check {

inline double finite(double v, const char* name) {
    if (!std::isfinite(v)) raise_domain_error(std::string(name) + " must be a finite number");
    return v;
}

inline double positive(double v, const char* name) {
    if (!(std::isfinite(v) && v > 0.0))
        raise_domain_error(std::string(name) + " must be a finite number > 0");
    return v;
}

inline double non_negative(double v, const char* name) {
    if (!(std::isfinite(v) && v >= 0.0))
        raise_domain_error(std::string(name) + " must be a finite number >= 0");
    return v;
}

// What drives a winding: turns >= 0 and a finite current (any sign).
inline void turns_and_current(double turns, double current) {
    non_negative(turns, "turns");
    finite(current, "current");
}

// The radial extent of a winding: both radii finite and > 0, outer >= inner. `which` prefixes
// the messages (e.g. "coil 1 "); they are built only on failure, so this costs nothing on the
// field functions' hot path.
inline void radial_extent(double inner, double outer, const char* which = "") {
    const auto fail = [which](const char* what) { raise_domain_error(std::string(which) + what); };
    if (!(std::isfinite(inner) && inner > 0.0)) fail("inner radius must be a finite number > 0");
    if (!(std::isfinite(outer) && outer > 0.0)) fail("outer radius must be a finite number > 0");
    if (outer < inner) fail("outer radius must be >= inner radius");
}

// Results leave the engine only when finite: an overflow near a filament is an error, not inf.
inline double finite_result(double v, const char* what) {
    if (!std::isfinite(v))
        raise_singular_point(std::string(what) + " is not finite here (too close to a current filament?)");
    return v;
}

}  // namespace coilwright::internal::check
