// Helpers shared by the coil-set tests.
#pragma once

#include <Eigen/Geometry>
#include <cmath>

#include "coilwright/sets.hpp"

namespace coilwright::set_test {

inline SetCoil circle(Eigen::Vector3d centre, Eigen::Vector3d axis, double radius, double turns, double current) {
    SetCoil c;
    c.shape = SetShape::Circle;
    c.centre = centre;
    c.axis = axis;
    c.size = radius;
    c.turns = turns;
    c.current = current;
    return c;
}

inline SetCoil rect(Eigen::Vector3d centre, Eigen::Vector3d axis, double width, double height, double roll,
                    double turns, double current) {
    SetCoil c;
    c.shape = SetShape::Rect;
    c.centre = centre;
    c.axis = axis;
    c.size = width;
    c.height = height;
    c.roll_deg = roll;
    c.turns = turns;
    c.current = current;
    return c;
}

// Relative difference of two vectors, relative to the larger.
inline double rel(const Eigen::Vector3d& a, const Eigen::Vector3d& b) {
    return (a - b).norm() / std::max(a.norm(), b.norm());
}

// The coil turned by `rot` about the origin: centre and axis rotated, and the roll chosen so
// that the width direction is the rotated one.
inline SetCoil rotated(const SetCoil& c, const Eigen::Matrix3d& rot) {
    SetCoil r = c;
    r.centre = rot * c.centre;
    r.axis = rot * c.axis;
    if (c.shape == SetShape::Rect) {
        const Eigen::Vector3d u_wanted = rot * coil_frame(c.axis, c.roll_deg, c.centre).u;
        const CoilFrame f0 = coil_frame(r.axis, 0.0, r.centre);
        r.roll_deg = std::atan2(u_wanted.dot(f0.v), u_wanted.dot(f0.u)) * 180.0 / 3.14159265358979323846;
    }
    return r;
}

}  // namespace coilwright::set_test
