// Coil sets: circular and rectangular coils anywhere in space, with any orientation. The field
// vector anywhere, the currents for a target field, the uniform sphere, the inductance matrix
// per circuit, forces and torques, and a ready three-axis rig.
#pragma once

#include <Eigen/Core>
#include <cstddef>
#include <optional>
#include <string>
#include <vector>

namespace coilwright {

enum class SetShape { Circle, Rect };

// One row of the coil-set table (SI units). The current's positive sense is counter-clockwise
// seen from the tip of the axis. Sizes are those of the winding's centre line (the mean turn).
struct SetCoil {
    SetShape shape = SetShape::Circle;
    Eigen::Vector3d centre = Eigen::Vector3d::Zero();  // m
    Eigen::Vector3d axis = Eigen::Vector3d::UnitZ();   // any length > 0
    double size = 0.0;      // radius (circle) or width (rect), m
    double height = 0.0;    // rect: extent across the width, m (0 for a circle)
    double roll_deg = 0.0;  // rect: turn of the width direction about the axis, degrees
    double turns = 0.0;
    double current = 0.0;   // A per turn
    std::optional<double> circuit;  // circuit number (a whole number >= 1); none: its own circuit
    double depth = 0.0;     // radial extent of a thick winding, m (0: thin)
    double breadth = 0.0;   // extent along the axis of a thick winding, m (0: thin)

    bool thick() const { return depth > 0.0 || breadth > 0.0; }
};

// The local frame of a coil: u along the width (rect), v = n x u, n the unit axis.
struct CoilFrame {
    Eigen::Vector3d centre, u, v, n;
    // Written out, in one order of operations that the batch code repeats (same bits).
    Eigen::Vector3d to_local(const Eigen::Vector3d& p) const {
        const double dx = p.x() - centre.x(), dy = p.y() - centre.y(), dz = p.z() - centre.z();
        return {dx * u.x() + dy * u.y() + dz * u.z(), dx * v.x() + dy * v.y() + dz * v.z(),
                dx * n.x() + dy * n.y() + dz * n.z()};
    }
    Eigen::Vector3d to_global(const Eigen::Vector3d& w) const { return w.x() * u + w.y() * v + w.z() * n; }
};

// The width direction u = normalise(axis x z-hat), or x-hat when the axis is parallel to z
// (within 1e-12 rad), turned by roll (right-handed about the axis); v = n x u.
CoilFrame coil_frame(const Eigen::Vector3d& axis, double roll_deg, const Eigen::Vector3d& centre);

// A validated coil set. Circuits are numbered 0..circuit_count()-1: the numbered circuits in
// ascending number, then each row without a number in table order. Rows of one circuit are in
// series: their currents must agree up to the sign, which gives the sense of connection.
class CoilSet {
public:
    // Throws DomainError naming the row (`labels[i]`, as the user counts rows) for a bad row.
    CoilSet(std::vector<SetCoil> coils, std::vector<std::size_t> labels);
    explicit CoilSet(std::vector<SetCoil> coils);  // labels 1..n

    std::size_t size() const { return coils_.size(); }
    const SetCoil& coil(std::size_t i) const { return coils_[i]; }
    const CoilFrame& frame(std::size_t i) const { return frames_[i]; }
    std::size_t label(std::size_t i) const { return labels_[i]; }
    const std::vector<SetCoil>& coils() const { return coils_; }

    std::size_t circuit_count() const { return circuit_numbers_.size(); }
    std::size_t circuit_of(std::size_t row) const { return circuit_index_[row]; }
    // +1 or -1: the sense in which the row is connected in its circuit (sign of its current).
    double polarity(std::size_t row) const { return polarity_[row]; }
    // "circuit 3" for a numbered circuit, "row 5" for a row of its own.
    std::string circuit_name(std::size_t c) const;

private:
    std::vector<SetCoil> coils_;
    std::vector<std::size_t> labels_;
    std::vector<CoilFrame> frames_;
    std::vector<std::optional<double>> circuit_numbers_;  // per circuit: its number, or none
    std::vector<std::size_t> circuit_first_row_;
    std::vector<std::size_t> circuit_index_;
    std::vector<double> polarity_;
};

// Validates one row; throws DomainError with "row <label>: ..." in the message.
void validate(const SetCoil& coil, std::size_t label);

// Field (T) of one coil at a point (m). A point on a filament (or on a thin sheet) is a
// SingularPointError; inside a thick winding the field is finite and computed.
Eigen::Vector3d coil_field(const SetCoil& coil, const CoilFrame& frame, const Eigen::Vector3d& point);

// Field (T) of the whole set at a point (m): the sum of the rows. Errors name the row.
Eigen::Vector3d set_field(const CoilSet& set, const Eigen::Vector3d& point);

// Field of the set at n points (x[i], y[i], z[i]) into bx, by, bz. Every finite result equals
// set_field's bit for bit; a point where set_field would throw gets NaN (ask set_field for
// its error). Returns the number of such points.
std::size_t set_field_batch(const CoilSet& set, const double* x, const double* y, const double* z, std::size_t n,
                            double* bx, double* by, double* bz);


// Field (T) at the point per ampere of each circuit (3 x circuits), rows connected with their
// polarity; the table's own currents are not used.
Eigen::MatrixXd circuit_field_matrix(const CoilSet& set, const Eigen::Vector3d& point);

// Currents (A) of the circuits, in circuit order, whose field at the points (m) best equals
// the targets (T), in the least-squares sense (one 3-vector of target per point). Throws
// DomainError saying why when the circuits cannot produce the target.
Eigen::VectorXd set_currents(const CoilSet& set, const std::vector<Eigen::Vector3d>& points,
                             const std::vector<Eigen::Vector3d>& targets);

// Radius (m) of the largest sphere around `centre` within which |B - B0| / |B0| <= tolerance,
// B0 the field at the centre.
double set_uniform_sphere(const CoilSet& set, double tolerance, const Eigen::Vector3d& centre);

// Mutual inductance (H) between two coils (all their turns, N1 N2 M), any positions and tilts.
double coil_mutual_inductance(const SetCoil& a, const CoilFrame& fa, const SetCoil& b, const CoilFrame& fb);

// Self-inductance (H) of one coil of round wire (diameter: of the wire, or of the round bundle
// of its turns); a thick winding uses its own cross-section instead.
double coil_self_inductance(const SetCoil& coil, double wire_diameter);

// Inductance matrix (H) per circuit: L_cd = sum over rows i in c, j in d of p_i p_j L_ij.
Eigen::MatrixXd set_inductance_matrix(const CoilSet& set, double wire_diameter);

// Force (N) on row `row` (0-based) from all the other rows, and torque (N m) about its centre.
Eigen::Vector3d set_force(const CoilSet& set, std::size_t row);
Eigen::Vector3d set_torque(const CoilSet& set, std::size_t row);

// A three-axis rig: three orthogonal pairs of circles (shape Circle) or squares (Rect), pair
// axes along x, y, z, nested so that they do not collide (`size` is the diameter or side of the
// largest pair), each pair at its flattest spacing, circuits 1, 2, 3 for x, y, z.
std::vector<SetCoil> rig3_coils(double size, double turns, double current, SetShape shape);

}  // namespace coilwright
