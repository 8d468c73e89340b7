#include "error_route.hpp"

#include <exception>
#include <new>

namespace coilwright::sheet {

CellFailure current_failure() {
    try {
        throw;
    } catch (const ConvergenceError& e) {
        return {CellError::NoConvergence, e.what()};
    } catch (const DomainError& e) {
        return {CellError::IllegalArgument, e.what()};
    } catch (const std::bad_alloc&) {
        return {CellError::NoValue, "not enough memory for this call"};
    } catch (const std::exception& e) {
        return {CellError::NoValue, e.what()};
    } catch (...) {
        return {CellError::NoValue, "the call failed"};
    }
}

CellError cell_error_of(Problem::Kind kind) {
    switch (kind) {
        case Problem::Kind::None: return CellError::None;
        case Problem::Kind::Domain: return CellError::IllegalArgument;
        case Problem::Kind::Convergence: return CellError::NoConvergence;
    }
    return CellError::NoValue;
}

}  // namespace coilwright::sheet
