// Errors the engine reports. The add-in maps each kind to a spreadsheet error cell.
#pragma once

#include <stdexcept>
#include <string>

namespace coilwright {

// An argument outside its domain (negative radius, inner > outer, NaN, ...).
class DomainError : public std::invalid_argument {
public:
    using std::invalid_argument::invalid_argument;
};

// A point where the field is singular (on a current filament or sheet), or a result
// that is not representable as a finite double.
class SingularPointError : public DomainError {
public:
    using DomainError::DomainError;
};

// An iterative method (quadrature, root finding) that did not reach its tolerance.
class ConvergenceError : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

}  // namespace coilwright
