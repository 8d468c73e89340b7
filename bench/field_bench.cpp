// field-bench: cost per point of the engine's field kernels on fixed pseudo-random points.
//
// Prints one line per kernel, "<kernel> <ns per point>", the median (or with --best the
// fastest) of several timed passes (after a warm-up pass) of this thread's processor time,
// which a busy machine disturbs less than the wall clock. The points are the same on every run and machine
// (splitmix64 with a fixed seed), so figures from different runs compare like with like.
//
//   field-bench [--points N] [--repeat R] [--best] [--kernel NAME]... [--write-points FILE]
//               [--write-field FILE]
//
// --write-points writes the points as raw little-endian doubles (all z, then all r) and
// --write-field the loop_offaxis result (all Bz, then all Br), for bench/numpy_compare.py.
//
// Adding a kernel is one line in kKernels below.
#include <algorithm>
#include <boost/math/special_functions/ellint_1.hpp>
#include <boost/math/special_functions/ellint_2.hpp>
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <fstream>
#include <string>
#include <time.h>
#include <vector>

#include "coilwright/field.hpp"
#include "coilwright/constants.hpp"
#include "coilwright/inductance.hpp"
#include "coilwright/sets.hpp"

namespace {

using namespace coilwright;

// The points every kernel is timed on, in metres, around coils of radius kRadius centred at 0.
struct Points {
    std::size_t n = 0;
    std::vector<double> z, r, zero, k;  // k: elliptic modulus of the loop at (z, r), for the reference
    std::vector<double> x3, y3, z3;     // points in space for the coil-set kernels
};

// Where every kernel writes its result; the sum of all results is printed to stderr so the
// compiler cannot drop the work.
struct Output {
    std::vector<double> bz, br;
};

constexpr double kRadius = 0.1;
const LoopSpec kLoop{kRadius, 100, 1.5};
// A Helmholtz pair as a two-row stack: loops at z = -a/2 and z = +a/2.
constexpr double kStackCentres[] = {-kRadius / 2, kRadius / 2};

void loop_offaxis(const Points& p, Output& o) {
    loop_field_batch(kLoop, p.z.data(), p.r.data(), p.n, o.bz.data(), o.br.data());
}

void loop_offaxis_scalar(const Points& p, Output& o) {
    for (std::size_t i = 0; i < p.n; ++i) {
        const FieldRZ f = loop_field(kLoop, p.z[i], p.r[i]);
        o.bz[i] = f.bz;
        o.br[i] = f.br;
    }
}

void loop_onaxis(const Points& p, Output& o) {
    loop_field_batch(kLoop, p.z.data(), p.zero.data(), p.n, o.bz.data(), o.br.data());
}

void stack2_loops(const Points& p, Output& o) {
    std::fill(o.bz.begin(), o.bz.end(), 0.0);
    std::fill(o.br.begin(), o.br.end(), 0.0);
    for (double centre : kStackCentres)
        add_loop_field_batch(kLoop, centre, p.z.data(), p.r.data(), p.n, o.bz.data(), o.br.data());
}

// Models that have no batch API: one call per point. A point on a winding (probability zero
// for these random points, but possible) counts as 0.
template <class F>
void per_point(const Points& p, Output& o, F field) {
    for (std::size_t i = 0; i < p.n; ++i) {
        try {
            const FieldRZ f = field(p.z[i], p.r[i]);
            o.bz[i] = f.bz;
            o.br[i] = f.br;
        } catch (const std::exception&) {
            o.bz[i] = o.br[i] = 0.0;
        }
    }
}

template <class F>
void per_point_indexed(const Points& p, Output& o, F field) {
    for (std::size_t i = 0; i < p.n; ++i) {
        try {
            const FieldRZ f = field(i);
            o.bz[i] = f.bz;
            o.br[i] = f.br;
        } catch (const std::exception&) {
            o.bz[i] = o.br[i] = 0.0;
        }
    }
}

// A thin solenoid as long as its diameter; a thick coil of 30 % radial build as long as its
// radius (the points fall inside its winding, in its bore and around it); a three-row table.
const SolenoidSpec kSolenoid{kRadius, 2 * kRadius, 100, 1.5};
const ThickCoilSpec kThick{kRadius, 1.3 * kRadius, kRadius, 100, 1.5};
const CoilTable kMixed({{kRadius, kRadius, 0, -kRadius, 50, 1.5},
                        {0.8 * kRadius, 0.8 * kRadius, 2 * kRadius, 0, 100, 1.5},
                        {kRadius, 1.3 * kRadius, kRadius, kRadius, 100, 1.5}});

void solenoid_offaxis(const Points& p, Output& o) {
    per_point(p, o, [](double z, double r) { return solenoid_field(kSolenoid, z, r); });
}

void thick_offaxis(const Points& p, Output& o) {
    per_point(p, o, [](double z, double r) { return thick_coil_field(kThick, z, r); });
}

// Points within a tenth of the winding's radial build of one of its four corners (cycling
// through them), at distances spread evenly in logarithm from 1e-6 to 0.1 of the build, in
// every direction: inside and outside the winding.
void thick_near_corner(const Points& p, Output& o) {
    const double build = kThick.outer_radius - kThick.inner_radius, h = 0.5 * kThick.length;
    per_point_indexed(p, o, [&](std::size_t i) {
        const double corner_r = (i & 1) ? kThick.outer_radius : kThick.inner_radius;
        const double corner_z = (i & 2) ? h : -h;
        const double distance = build * std::pow(10.0, -6.0 + 5.0 * p.r[i] / (3.0 * kRadius));
        const double angle = kPi * p.z[i] / (3.0 * kRadius);  // -pi..pi
        return thick_coil_field(kThick, corner_z + distance * std::sin(angle), corner_r + distance * std::cos(angle));
    });
}

// A layer winding of 10 turns x 10 layers summed turn by turn (TURNS_BZ and friends).
const LayerWinding kTurns{kRadius, 0.01 * kRadius, 10, 10, 1.5, Packing::Square};

void real_turns_100(const Points& p, Output& o) {
    per_point(p, o, [](double z, double r) { return real_turns_field(kTurns, z, r); });
}

void stack3_mixed(const Points& p, Output& o) {
    per_point(p, o, [](double z, double r) { return table_field(kMixed, z, r); });
}

// Reference: Boost.Math's complete elliptic integrals K(k) and E(k), one scalar call each.
void boost_ellint_1_2(const Points& p, Output& o) {
    for (std::size_t i = 0; i < p.n; ++i) {
        o.bz[i] = boost::math::ellint_1(p.k[i]);
        o.br[i] = boost::math::ellint_2(p.k[i]);
    }
}

// Three-axis rigs of six coils (three orthogonal pairs, the outermost of radius or half-side 3a) at
// points in space within 3 loop radii of the centre: all three field components per point.
const CoilSet kRigCircles(rig3_coils(6 * kRadius, 100, 1.5, SetShape::Circle));
const CoilSet kRigSquares(rig3_coils(6 * kRadius, 100, 1.5, SetShape::Rect));

void rig6(const CoilSet& rig, const Points& p, Output& o) {
    // Bx and By land in the output; Bz in a scratch column (counted by the checksum through Bx).
    static thread_local std::vector<double> bz3;
    bz3.resize(p.n);
    set_field_batch(rig, p.x3.data(), p.y3.data(), p.z3.data(), p.n, o.bz.data(), o.br.data(), bz3.data());
    for (std::size_t i = 0; i < p.n; ++i) o.bz[i] += bz3[i];
}

void rig6_circles(const Points& p, Output& o) { rig6(kRigCircles, p, o); }
void rig6_squares(const Points& p, Output& o) { rig6(kRigSquares, p, o); }

// Thick-coil inductance and force: one call per element of a fixed list of kCalls cases (the
// figure printed is per call). The thick coil above (30 % build, as long as its radius), with
// lengths spread by up to 2 %; against a second winding (0.8a..1.2a, 0.5a long) at the
// benchmark's axial positions in -3a..3a: nested, overlapping, touching and apart.
constexpr std::size_t kCalls = 400;
const CoilSection kThickSection{kThick.inner_radius, kThick.outer_radius, kThick.length};
const CoilSection kOtherSection{0.8 * kRadius, 1.2 * kRadius, 0.5 * kRadius};

void coil_self(const Points& p, Output& o) {
    for (std::size_t i = 0; i < kCalls; ++i) {
        const CoilSection w{kThickSection.inner_radius, kThickSection.outer_radius,
                            kThickSection.length * (1.0 + 0.02 * p.r[i] / (3.0 * kRadius))};
        o.bz[i] = coil_self_inductance(w, 100.0);
    }
}

void coil_mutual(const Points& p, Output& o) {
    for (std::size_t i = 0; i < kCalls; ++i) o.bz[i] = coil_mutual_inductance(kThickSection, 100.0, kOtherSection, 50.0, p.z[i]);
}

void coil_force(const Points& p, Output& o) {
    for (std::size_t i = 0; i < kCalls; ++i)
        o.bz[i] = coil_axial_force(kThickSection, 100.0, 1.5, kOtherSection, 50.0, 2.0, p.z[i]);
}

struct Kernel {
    const char* name;
    void (*run)(const Points&, Output&);
    std::size_t calls = 0;  // 0: one call per point; otherwise this many calls per pass
};

// One line per kernel.
const Kernel kKernels[] = {
    {"loop_offaxis", loop_offaxis},                // Bz and Br at off-axis points, batch API
    {"loop_offaxis_scalar", loop_offaxis_scalar},  // the same through loop_field, one call per point
    {"loop_onaxis", loop_onaxis},                  // Bz and Br on the axis (r = 0), batch API
    {"stack2_loops", stack2_loops},                // two-row stack of loops (Helmholtz pair)
    {"solenoid_offaxis", solenoid_offaxis},        // thin current sheet, one call per point
    {"thick_offaxis", thick_offaxis},              // thick winding, inside it and around it
    {"stack3_mixed", stack3_mixed},                // loop + thin solenoid + thick coil table
    {"real_turns_100", real_turns_100},            // layer winding of 100 turns summed turn by turn
    {"rig6_circles", rig6_circles},                // coil set: three-axis rig of circles, Bx, By, Bz
    {"rig6_squares", rig6_squares},                // coil set: three-axis rig of squares, Bx, By, Bz
    {"thick_near_corner", thick_near_corner},      // thick winding within 0.1 build of a corner
    {"boost_ellint_1_2", boost_ellint_1_2},        // reference: ellint_1 + ellint_2, scalar
    {"coil_self", coil_self, kCalls},              // thick-coil self-inductance (COIL_L), ns per call
    {"coil_mutual", coil_mutual, kCalls},          // two thick coils' mutual inductance (COIL_M), ns per call
    {"coil_force", coil_force, kCalls},            // their axial force (COIL_FZ), ns per call
};

// splitmix64 (S. Vigna, 2015): a fixed, portable stream of pseudo-random numbers.
struct SplitMix64 {
    std::uint64_t state;
    std::uint64_t next() {
        std::uint64_t x = (state += 0x9E3779B97F4A7C15ULL);
        x = (x ^ (x >> 30)) * 0xBF58476D1CE4E5B9ULL;
        x = (x ^ (x >> 27)) * 0x94D049BB133111EBULL;
        return x ^ (x >> 31);
    }
    double uniform() { return static_cast<double>(next() >> 11) * 0x1.0p-53; }  // [0, 1)
};

// z uniform in [-3a, 3a], r uniform in [0, 3a]: the working volume of a coil and around it.
// Points within 1e-6 a of the wire are moved away (the field is singular on it).
Points make_points(std::size_t n) {
    Points p;
    p.n = n;
    p.z.resize(n);
    p.r.resize(n);
    p.zero.assign(n, 0.0);
    p.k.resize(n);
    SplitMix64 rng{20240611};
    for (std::size_t i = 0; i < n; ++i) {
        double z = (6.0 * rng.uniform() - 3.0) * kRadius;
        const double r = 3.0 * rng.uniform() * kRadius;
        if (std::hypot(z, r - kRadius) < 1e-6 * kRadius) z = 1e-3 * kRadius;
        p.z[i] = z;
        p.r[i] = r;
        const double beta2 = (kRadius + r) * (kRadius + r) + z * z;
        p.k[i] = std::sqrt(4.0 * kRadius * r / beta2);
    }
    SplitMix64 rng3{20261202};
    p.x3.resize(n);
    p.y3.resize(n);
    p.z3.resize(n);
    for (std::size_t i = 0; i < n; ++i) {
        p.x3[i] = (6.0 * rng3.uniform() - 3.0) * kRadius;
        p.y3[i] = (6.0 * rng3.uniform() - 3.0) * kRadius;
        p.z3[i] = (6.0 * rng3.uniform() - 3.0) * kRadius;
    }
    return p;
}

double median(std::vector<double> v) {
    std::sort(v.begin(), v.end());
    const std::size_t m = v.size() / 2;
    return v.size() % 2 ? v[m] : 0.5 * (v[m - 1] + v[m]);
}

// Processor time of this thread, so that other processes on a busy machine count less.
double thread_seconds() {
    timespec ts{};
    clock_gettime(CLOCK_THREAD_CPUTIME_ID, &ts);
    return static_cast<double>(ts.tv_sec) + 1e-9 * static_cast<double>(ts.tv_nsec);
}

double time_kernel(const Kernel& k, const Points& p, Output& o, int repeat, bool best) {
    k.run(p, o);  // warm-up: caches, page faults, branch predictors
    std::vector<double> ns_per_point;
    for (int i = 0; i < repeat; ++i) {
        const double t0 = thread_seconds();
        k.run(p, o);
        const double t1 = thread_seconds();
        ns_per_point.push_back((t1 - t0) * 1e9 / static_cast<double>(k.calls ? k.calls : p.n));
    }
    return best ? *std::min_element(ns_per_point.begin(), ns_per_point.end()) : median(ns_per_point);
}

bool write_doubles(const std::string& path, const std::vector<double>& a, const std::vector<double>& b) {
    std::ofstream f(path, std::ios::binary);
    f.write(reinterpret_cast<const char*>(a.data()), static_cast<std::streamsize>(a.size() * sizeof(double)));
    f.write(reinterpret_cast<const char*>(b.data()), static_cast<std::streamsize>(b.size() * sizeof(double)));
    return static_cast<bool>(f);
}

[[noreturn]] void usage() {
    std::fprintf(stderr,
                 "usage: field-bench [--points N] [--repeat R] [--best] [--kernel NAME]... [--write-points FILE] "
                 "[--write-field FILE]\nkernels:");
    for (const Kernel& k : kKernels) std::fprintf(stderr, " %s", k.name);
    std::fprintf(stderr, "\n");
    std::exit(2);
}

}  // namespace

int main(int argc, char** argv) {
    std::size_t n = 100000;
    int repeat = 15;
    std::vector<std::string> wanted;
    std::string points_file, field_file;
    bool best = false;
    for (int i = 1; i < argc; ++i) {
        const std::string arg = argv[i];
        if (arg == "--best") {
            best = true;
            continue;
        }
        if (i + 1 >= argc) usage();
        const char* value = argv[++i];
        if (arg == "--points") n = std::strtoul(value, nullptr, 10);
        else if (arg == "--repeat") repeat = std::atoi(value);
        else if (arg == "--kernel") wanted.emplace_back(value);
        else if (arg == "--write-points") points_file = value;
        else if (arg == "--write-field") field_file = value;
        else usage();
    }
    if (n < kCalls || repeat <= 0) usage();
    for (const std::string& w : wanted)
        if (std::none_of(std::begin(kKernels), std::end(kKernels), [&](const Kernel& k) { return w == k.name; }))
            usage();

    const Points points = make_points(n);
    Output out{std::vector<double>(n), std::vector<double>(n)};
    if (!points_file.empty() && !write_doubles(points_file, points.z, points.r)) return 1;

    double checksum = 0.0;
    for (const Kernel& k : kKernels) {
        if (!wanted.empty() && std::find(wanted.begin(), wanted.end(), k.name) == wanted.end()) continue;
        const double ns = time_kernel(k, points, out, repeat, best);
        std::printf("%s %.1f\n", k.name, ns);
        std::fflush(stdout);
        for (std::size_t i = 0; i < n; ++i) checksum += out.bz[i] + out.br[i];
        if (k.run == loop_offaxis && !field_file.empty() && !write_doubles(field_file, out.bz, out.br)) return 1;
    }
    std::fprintf(stderr, "# %zu points, %s of %d passes; checksum %.17g\n", n, best ? "best" : "median", repeat,
                 checksum);
    return 0;
}
