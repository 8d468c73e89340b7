// Currents for a target field, the uniform sphere, the three-axis rig, forces and torques.
#include <gtest/gtest.h>

#include <Eigen/Geometry>
#include <cmath>
#include <random>

#include "coilwright/constants.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/inductance/mutual.hpp"
#include "coilwright/field/rect.hpp"
#include "coilwright/design.hpp"
#include "coilwright/sets.hpp"
#include "set_test_support.hpp"

using namespace coilwright;
using namespace coilwright::set_test;

namespace {
const Eigen::Vector3d kZ = Eigen::Vector3d::UnitZ();

std::string message_of(const std::function<void()>& f) {
    try {
        f();
    } catch (const std::exception& e) {
        return e.what();
    }
    return "";
}
}  // namespace

// The currents found make the target field at the point (the field is linear in them).
TEST(SetCurrents, ReachesTargetAtOnePoint) {
    const CoilSet rig(rig3_coils(1.0, 50, 1.0, SetShape::Rect));
    const Eigen::Vector3d target(20e-6, -5e-6, 45e-6), origin = Eigen::Vector3d::Zero();
    const Eigen::VectorXd i = set_currents(rig, {origin}, {target});
    ASSERT_EQ(i.size(), 3);
    const Eigen::Vector3d made = circuit_field_matrix(rig, origin) * i;
    EXPECT_LT((made - target).norm(), 1e-14 * target.norm());
    // Per-axis field of a square pair at its flattest spacing (rect.hpp's pair field).
    const double side = 1.0, spacing = rect_pair_spacing(side, side);
    const double bx_per_amp = rect_pair_field({side, side, 50, 1.0}, spacing, {0, 0, 0}).z();
    EXPECT_NEAR(i[0], target.x() / bx_per_amp, 1e-12 * std::fabs(i[0]));
}

// Several points: the least-squares currents (normal equations solved independently here).
TEST(SetCurrents, LeastSquaresOverPoints) {
    const CoilSet rig(rig3_coils(0.8, 30, 1.0, SetShape::Circle));
    std::vector<Eigen::Vector3d> pts, targets;
    std::mt19937_64 rng(5);
    std::uniform_real_distribution<double> uni(-0.05, 0.05);
    for (int k = 0; k < 10; ++k) {
        pts.emplace_back(uni(rng), uni(rng), uni(rng));
        targets.emplace_back(10e-6 + uni(rng) * 1e-5, -3e-6, 7e-6);
    }
    const Eigen::VectorXd i = set_currents(rig, pts, targets);
    Eigen::MatrixXd a(30, 3);
    Eigen::VectorXd b(30);
    for (int k = 0; k < 10; ++k) {
        a.middleRows(3 * k, 3) = circuit_field_matrix(rig, pts[k]);
        b.segment(3 * k, 3) = targets[k];
    }
    const Eigen::VectorXd normal = (a.transpose() * a).ldlt().solve(a.transpose() * b);
    EXPECT_LT((i - normal).norm(), 1e-9 * normal.norm());
}

// A target the circuits cannot make, or circuits that are not independent: errors saying why.
TEST(SetCurrents, ErrorsSayWhy) {
    // Two circuits (x and y pairs) cannot make a field along z at the centre.
    std::vector<SetCoil> two = rig3_coils(1.0, 10, 1.0, SetShape::Circle);
    two.resize(4);
    const CoilSet xy(two);
    const std::string unreachable = message_of([&] { set_currents(xy, {Eigen::Vector3d::Zero()}, {{0, 0, 1e-5}}); });
    EXPECT_NE(unreachable.find("cannot make this field"), std::string::npos) << unreachable;
    // Two circuits with the same field at the point.
    const CoilSet twins({circle({0, 0, -0.05}, kZ, 0.1, 1, 1), circle({0, 0, 0.05}, kZ, 0.1, 1, 1)});
    const std::string parallel = message_of([&] { set_currents(twins, {Eigen::Vector3d::Zero()}, {{0, 0, 1e-5}}); });
    EXPECT_NE(parallel.find("parallel"), std::string::npos) << parallel;
    // A circuit without turns.
    const CoilSet dead({circle({0, 0, 0}, kZ, 0.1, 0, 1), circle({0, 0, 0}, {1, 0, 0}, 0.1, 1, 1)});
    const std::string none = message_of([&] { set_currents(dead, {Eigen::Vector3d::Zero()}, {{1e-5, 0, 0}}); });
    EXPECT_NE(none.find("row 1 makes no field"), std::string::npos) << none;
}

// The sphere found: every direction on it is within the tolerance (checked on 4000 random
// directions), and a slightly larger sphere has a direction beyond it.
TEST(SetUniformSphere, VerifiedOnRandomDirections) {
    const CoilSet rig(rig3_coils(1.0, 50, 1.0, SetShape::Rect));
    const double tol = 1e-3;
    const double radius = set_uniform_sphere(rig, tol, Eigen::Vector3d::Zero());
    EXPECT_GT(radius, 0.01);
    EXPECT_LT(radius, 0.5);
    const Eigen::Vector3d b0 = set_field(rig, Eigen::Vector3d::Zero());
    std::mt19937_64 rng(9);
    std::normal_distribution<double> g;
    double worst_in = 0.0, worst_out = 0.0;
    for (int k = 0; k < 4000; ++k) {
        const Eigen::Vector3d d = Eigen::Vector3d(g(rng), g(rng), g(rng)).normalized();
        worst_in = std::max(worst_in, (set_field(rig, radius * d) - b0).norm() / b0.norm());
        worst_out = std::max(worst_out, (set_field(rig, 1.01 * radius * d) - b0).norm() / b0.norm());
    }
    EXPECT_LE(worst_in, tol * (1 + 1e-6));
    EXPECT_GT(worst_out, tol);
}

// The rig: three orthogonal pairs at their flattest spacing, nested without touching.
TEST(Rig3, GeometryAndField) {
    for (SetShape shape : {SetShape::Circle, SetShape::Rect}) {
        const std::vector<SetCoil> rows = rig3_coils(1.0, 10, 2.0, shape);
        ASSERT_EQ(rows.size(), 6u);
        const CoilSet rig(rows);
        EXPECT_EQ(rig.circuit_count(), 3u);
        // Each pair alone gives a field along its own axis at the centre.
        for (int axis = 0; axis < 3; ++axis) {
            const CoilSet pair({rows[2 * axis], rows[2 * axis + 1]});
            const Eigen::Vector3d b = set_field(pair, Eigen::Vector3d::Zero());
            for (int k = 0; k < 3; ++k) {
                if (k != axis) {
                    EXPECT_LT(std::fabs(b[k]), 1e-15 * b.norm());
                }
            }
            EXPECT_GT(b[axis], 0.0);
        }
        // Circles: Helmholtz spacing (the radius), so d2Bz/dz2 = 0 at the centre:
        // the centre field is (4/5)^(3/2) mu0 N I / R.
        if (shape == SetShape::Circle) {
            const CoilSet pair({rows[4], rows[5]});
            const double r = rows[4].size;
            EXPECT_NEAR(set_field(pair, Eigen::Vector3d::Zero()).z(), std::pow(0.8, 1.5) * kMu0 * 10 * 2.0 / r,
                        1e-15 * kMu0 * 20 / r);
        }
        // Sampled closest approach between coils of different pairs: at least 4 % of the size.
        double closest = 1e9;
        for (std::size_t i = 0; i < rows.size(); ++i)
            for (std::size_t j = i + 1; j < rows.size(); ++j) {
                if (*rows[i].circuit == *rows[j].circuit) continue;
                const CoilFrame fi = rig.frame(i), fj = rig.frame(j);
                for (int a = 0; a < 400; ++a)
                    for (int b = 0; b < 400; ++b) {
                        const auto pt = [&](const SetCoil& c, const CoilFrame& f, int k) -> Eigen::Vector3d {
                            const double t = 2 * kPi * k / 400;
                            if (c.shape == SetShape::Circle)
                                return f.centre + c.size * (std::cos(t) * f.u + std::sin(t) * f.v);
                            // a point on the square's perimeter, by the angle from its centre
                            const double cu = std::cos(t), sv = std::sin(t);
                            const double s = 0.5 * c.size / std::max(std::fabs(cu), std::fabs(sv));
                            return f.centre + s * (cu * f.u + sv * f.v);
                        };
                        closest = std::min(closest, (pt(rows[i], fi, a) - pt(rows[j], fj, b)).norm());
                    }
            }
        EXPECT_GT(closest, 0.04);
    }
    EXPECT_THROW(rig3_coils(-1, 1, 1, SetShape::Circle), DomainError);
}

// Force between coaxial loops: N1 N2 I1 I2 dM/dz (LOOP_FZ's Maxwell slope); Newton's third law.
TEST(SetForce, CoaxialLoopsAndThirdLaw) {
    const CoilSet set({circle({0, 0, 0}, kZ, 0.1, 10, 2.0), circle({0, 0, 0.07}, kZ, 0.08, 5, -1.5)});
    const double expected = 10 * 2.0 * 5 * -1.5 * loop_mutual_inductance_slope(0.1, 0.08, 0.07);
    const Eigen::Vector3d f2 = set_force(set, 1), f1 = set_force(set, 0);
    EXPECT_NEAR(f2.z(), expected, 1e-12 * std::fabs(expected));
    EXPECT_LT(std::hypot(f2.x(), f2.y()), 1e-14 * std::fabs(expected));
    EXPECT_LT((f1 + f2).norm(), 1e-12 * f2.norm());
    // Tilted and mixed: still action = -reaction.
    const CoilSet mixed({circle({0.02, 0, 0}, {0.2, 0.1, 1}, 0.1, 10, 2.0), rect({0, 0.03, 0.09}, {0, 0.3, 1}, 0.15, 0.1, 25, 5, 1.0)});
    const Eigen::Vector3d g1 = set_force(mixed, 0), g2 = set_force(mixed, 1);
    EXPECT_LT((g1 + g2).norm(), 1e-11 * g1.norm());
}

// Torque on a coil about its centre equals the virtual-work derivative I1 I2 dM/dtheta of the
// mutual inductance when the coil is turned about an axis through its centre (central
// differences of coil_mutual_inductance).
TEST(SetTorque, VirtualWork) {
    const SetCoil big = circle({0, 0, 0}, kZ, 0.2, 20, 1.5);
    const SetCoil small = rect({0.03, -0.02, 0.05}, {0.3, 0.2, 1}, 0.1, 0.06, 15, 8, -2.0);
    const CoilSet set({big, small});
    const Eigen::Vector3d torque = set_torque(set, 1);
    const CoilFrame fb = coil_frame(big.axis, 0, big.centre);
    for (const Eigen::Vector3d k : {Eigen::Vector3d::UnitX(), Eigen::Vector3d::UnitY(), Eigen::Vector3d::UnitZ()}) {
        const auto m_at = [&](double theta) {
            const Eigen::Matrix3d rot = Eigen::AngleAxisd(theta, k).toRotationMatrix();
            SetCoil s = rotated(small, rot);
            s.centre = small.centre;  // turned about its own centre
            return coil_mutual_inductance(big, fb, s, coil_frame(s.axis, s.roll_deg, s.centre));
        };
        const double h = 1e-4;
        const double dm = (8 * (m_at(h) - m_at(-h)) - (m_at(2 * h) - m_at(-2 * h))) / (12 * h);
        const double expected = 1.5 * -2.0 * dm;
        EXPECT_NEAR(torque.dot(k), expected, 1e-7 * torque.norm()) << k.transpose();
    }
}
