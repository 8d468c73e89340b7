#include "coilwright/design/scaling.hpp"

#include "coilwright/field/gradient.hpp"
#include "coilwright/field/table_field.hpp"
#include "numerics/checks.hpp"
#include "numerics/policy.hpp"

namespace coilwright {

using namespace internal;

double scale_for_field(const CoilTable& table, double target, double z, double r) {
    check::finite(target, "target");
    const double b = table_field(table, z, r).bz;
    if (b == 0.0) internal::raise_domain_error("the table gives no axial field at this point: no scale reaches the target");
    return check::finite_result(target / b, "scale");
}

double scale_for_gradient(const CoilTable& table, double target, double z, double r) {
    check::finite(target, "target");
    const double g = table_gradient(table, z, r);
    if (g == 0.0)
        internal::raise_domain_error("the table gives no axial gradient at this point: no scale reaches the target");
    return check::finite_result(target / g, "scale");
}

}  // namespace coilwright
