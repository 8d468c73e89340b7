// Argument checks shared by every engine entry point, so messages read the same everywhere.
#pragma once

#include <cmath>
#include <string>

#include "coilwright/errors.hpp"

namespace coilwright::check {

inline double finite(double v, const char* name) {
    if (!std::isfinite(v)) throw DomainError(std::string(name) + " must be a finite number");
    return v;
}

inline double positive(double v, const char* name) {
    if (!(std::isfinite(v) && v > 0.0))
        throw DomainError(std::string(name) + " must be a finite number > 0");
    return v;
}

inline double non_negative(double v, const char* name) {
    if (!(std::isfinite(v) && v >= 0.0))
        throw DomainError(std::string(name) + " must be a finite number >= 0");
    return v;
}

// Results leave the engine only when finite: an overflow near a filament is an error, not inf.
inline double finite_result(double v, const char* what) {
    if (!std::isfinite(v))
        throw SingularPointError(std::string(what) + " is not finite here (too close to a current filament?)");
    return v;
}

}  // namespace coilwright::check
