// Cost per field point of each model (process CPU time, so other load on the machine matters
// less), printed for the README, with generous bounds that catch a runaway (a loop that stops
// converging, a quadrature that subdivides without end) rather than small regressions.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <ctime>
#include <functional>
#include <random>
#include <vector>

#include "coilwright/coil_stack.hpp"
#include "coilwright/flat_spiral.hpp"
#include "coilwright/loop.hpp"
#include "coilwright/solenoid.hpp"
#include "coilwright/thick_coil.hpp"

using namespace coilwright;

namespace {

double cpu_seconds() {
    timespec ts{};
    clock_gettime(CLOCK_PROCESS_CPUTIME_ID, &ts);
    return static_cast<double>(ts.tv_sec) + 1e-9 * static_cast<double>(ts.tv_nsec);
}

struct Point {
    double z, r;
};

// Mean CPU nanoseconds per point of f over the points (repeated until 20 ms have passed).
double ns_per_point(const std::vector<Point>& points, const std::function<FieldRZ(double, double)>& f) {
    volatile double sink = 0;
    std::size_t done = 0;
    const double start = cpu_seconds();
    double elapsed = 0;
    do {
        for (const Point& p : points) sink = sink + f(p.z, p.r).bz;
        done += points.size();
        elapsed = cpu_seconds() - start;
    } while (elapsed < 0.02);
    return 1e9 * elapsed / static_cast<double>(done);
}

std::vector<Point> box(std::mt19937_64& rng, double z0, double z1, double r0, double r1, int n = 400) {
    std::uniform_real_distribution<double> u(0, 1);
    std::vector<Point> out;
    for (int i = 0; i < n; ++i) out.push_back({z0 + (z1 - z0) * u(rng), r0 + (r1 - r0) * u(rng)});
    return out;
}

}  // namespace

TEST(FieldTiming, CostPerPointStaysBounded) {
    std::mt19937_64 rng(7);
    const LoopSpec loop{0.05, 100, 1.0};
    const SolenoidSpec sol{0.05, 0.2, 500, 2.0};
    const ThickCoilSpec coil{0.05, 0.08, 0.1, 800, 3.0};
    const FlatSpiralSpec spiral{0.02, 0.06, 30, 1.5};
    const CoilTable table({{0.10, 0.10, 0.00, -0.05, 20, 1.0},
                           {0.04, 0.04, 0.12, 0.02, 300, -0.5},
                           {0.02, 0.07, 0.00, 0.10, 15, 2.0},
                           {0.05, 0.06, 0.03, -0.12, 200, 0.75}});
    struct Case {
        const char* name;
        std::vector<Point> points;
        std::function<FieldRZ(double, double)> f;
        double bound_ns;
    };
    const auto L = [&](double z, double r) { return loop_field(loop, z, r); };
    const auto S = [&](double z, double r) { return solenoid_field(sol, z, r); };
    const auto C = [&](double z, double r) { return thick_coil_field(coil, z, r); };
    const auto Cz = [&](double z, double r) { return thick_coil_field(coil, z, r, Components::Axial); };
    const auto P = [&](double z, double r) { return flat_spiral_field(spiral, z, r); };
    const auto T = [&](double z, double r) { return stack_field(table, z, r); };
    std::vector<Point> corners;
    for (int i = 0; i < 40; ++i) {
        const double d = std::pow(10.0, -1 - 0.25 * i);  // 0.1 down to 1e-11 of the size
        corners.push_back({0.05 * (1 - d), 0.08 * (1 - d)});
        corners.push_back({0.05 * (1 + d), 0.05 * (1 + d)});
    }
    const std::vector<Case> cases = {
        {"loop, near (reference)", box(rng, -0.1, 0.1, 0.0, 0.1), L, 2000},
        {"solenoid, inside", box(rng, -0.09, 0.09, 0.0, 0.049), S, 5000},
        {"solenoid, outside near", box(rng, -0.15, 0.15, 0.051, 0.15), S, 5000},
        {"solenoid, beyond the ends", box(rng, 0.11, 0.4, 0.0, 0.15), S, 5000},
        {"solenoid, far", box(rng, -5, 5, 1, 5), S, 5000},
        {"thick coil, inside winding", box(rng, -0.05, 0.05, 0.05, 0.08), C, 60000},
        {"thick coil, bore", box(rng, -0.07, 0.07, 0.0, 0.05), C, 60000},
        {"thick coil, outside near", box(rng, -0.1, 0.1, 0.08, 0.16), C, 60000},
        {"thick coil, far", box(rng, -3, 3, 0.3, 3), C, 60000},
        {"thick coil, Bz only, inside", box(rng, -0.05, 0.05, 0.05, 0.08), Cz, 60000},
        {"thick coil, next to corners", corners, C, 500000},
        {"flat spiral, near", box(rng, -0.02, 0.02, 0.0, 0.08), P, 60000},
        {"flat spiral, far", box(rng, -3, 3, 0.3, 3), P, 60000},
        {"table of 4 coils, near", box(rng, -0.15, 0.15, 0.0, 0.12), T, 200000},
    };
    std::printf("%-32s %12s\n", "model, region", "ns per point");
    for (const Case& c : cases) {
        std::vector<Point> ok;  // skip points that are errors (on a sheet or a spiral)
        for (const Point& p : c.points) {
            try {
                c.f(p.z, p.r);
                ok.push_back(p);
            } catch (const std::exception&) {
            }
        }
        ASSERT_GT(ok.size(), c.points.size() / 2) << c.name;
        const double ns = ns_per_point(ok, c.f);
        std::printf("%-32s %12.0f\n", c.name, ns);
        EXPECT_LT(ns, c.bound_ns) << c.name;
    }
}
