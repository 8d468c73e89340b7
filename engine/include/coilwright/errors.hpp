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

// An engine error kept as data, for one entry of a result that could not be computed while
// the others could (an inductance matrix, a column of forces): its kind and its message.
struct Problem {
    enum class Kind : unsigned char { None, Domain, Convergence };
    Kind kind = Kind::None;
    std::string message;

    explicit operator bool() const { return kind != Kind::None; }

    // The error being handled (inside a catch block of the engine's errors), its message
    // prefixed with `where`.
    static Problem domain(const std::string& where, const DomainError& e) { return {Kind::Domain, where + e.what()}; }
    static Problem convergence(const std::string& where, const ConvergenceError& e) {
        return {Kind::Convergence, where + e.what()};
    }

    // Throws it again as the error it was.
    [[noreturn]] void raise() const {
        if (kind == Kind::Convergence) throw ConvergenceError(message);
        throw DomainError(message);
    }
};

}  // namespace coilwright
