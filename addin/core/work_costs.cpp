#include "work_costs.hpp"

namespace coilwright::sheet::work {

double field_point(const CoilTable& table) {
    double cost = 0.0;
    for (const CoilRow& row : table.rows()) {
        switch (row.kind()) {
            case CoilRow::Kind::Loop: cost += kLoopField; break;
            case CoilRow::Kind::ThinSolenoid: cost += kSolenoidField; break;
            case CoilRow::Kind::FlatSpiral: cost += kFlatSpiralField; break;
            case CoilRow::Kind::Thick: cost += kThickField; break;
        }
    }
    return cost;
}

double inductance_matrix(const CoilTable& table) {
    // A self term costs about a thick-coil inductance; a pair as much, or up to several times
    // more when the coils are far apart compared with their size (extended precision or the
    // cubature): kThickPairInductance.
    const double n = static_cast<double>(table.size());
    return kThickInductance * n + kThickPairInductance * n * (n - 1) / 2;
}

double set_point(const CoilSet& set) {
    double cost = 0.0;
    for (const SetCoil& c : set.coils()) {
        if (!c.thick()) cost += c.shape == SetShape::Circle ? kLoopField : kRectFilamentField;
        else cost += c.shape == SetShape::Circle ? kThickField : kThickRectField;
    }
    return cost;
}

}  // namespace coilwright::sheet::work
