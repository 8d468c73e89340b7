// Cubature of a coaxial-filament kernel over two rectangular cross-sections.
//
// Cutting. Both radial extents are split at every end point of the other, so that each pair
// of pieces (P, Q) is either identical ("diagonal") or has disjoint interiors ("corner", the
// pieces possibly touching at one radius). On a diagonal pair the kernel is symmetric in
// r1 <-> r2, so the square P x P is folded onto the triangle r1 >= r2 and parametrised by the
// radial gap delta = r1 - r2 in [0, W] and t in [0, 1] (r2 = p + (W - delta) t, Jacobian
// W - delta); on a corner pair by the distances x, y of r1, r2 from the radius c where the
// pieces meet. The axial offset u is folded onto u >= 0 (kernels even or odd in u). Coincident
// filaments (delta = 0 and u = 0) then always lie on an edge or a corner of the box. Offsets
// that stay further from 0 than the radial extents are long need no cutting ("plain" cell).
//
// Refinement. A box is integrated by a tensor Gauss-Legendre rule when, along every dimension,
// it is shorter than a lower bound of its distance to the nearest singularity of the kernel's
// analytic continuation: coincidence (distance sqrt(delta^2 + u^2)) or the mirror filament
// r1 + r2 = 0. The order per dimension follows from the Bernstein-ellipse bound rho^(-2n) of the
// Gauss error (L. N. Trefethen, Approximation Theory and Approximation Practice, 2013, ch. 19),
// for an absolute target: 1e-13 of a coarse first estimate of the cell, so boxes that hold
// little get low orders. Other boxes are halved along the offending dimensions: geometric
// refinement towards the singular edge, as in the hp method of I. Babuska and B. Q. Guo (1986),
// used here for quadrature. Near boxes stop refining when their share of the cell's volume is
// below 1e-16 (with logarithmic singularities, what they hold is then negligible). Measured
// against independent references: about 1e-15 relative. The kernel evaluations per call are
// bounded (ConvergenceError beyond).
#include "numerics/policy.hpp"
#include "inductance/section_integral.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>

#include "coilwright/errors.hpp"
#include "inductance/filament_kernels.hpp"
#include "numerics/gauss_legendre.hpp"

namespace coilwright::internal {

void OffsetWeights::add_piece(double lo, double hi, double w_lo, double w_hi, int parity) {
    if (!(hi > lo)) return;
    if (lo < 0.0 && hi > 0.0) {
        const double w0 = w_lo + (w_hi - w_lo) * (-lo / (hi - lo));
        add_piece(lo, 0.0, w_lo, w0, parity);
        add_piece(0.0, hi, w0, w_hi, parity);
        return;
    }
    Piece piece = hi <= 0.0 ? Piece{-hi, -lo, parity * w_hi, parity * w_lo} : Piece{lo, hi, w_lo, w_hi};
    // A symmetric trapezoid folds onto itself: merge instead of integrating twice.
    for (int i = 0; i < piece_count; ++i) {
        if (pieces[i].lo == piece.lo && pieces[i].hi == piece.hi) {
            pieces[i].w_lo += piece.w_lo;
            pieces[i].w_hi += piece.w_hi;
            return;
        }
    }
    if (piece_count == static_cast<int>(pieces.size())) raise_no_convergence("the inductance integral needs more offset pieces than it holds");
    pieces[piece_count++] = piece;
}

void OffsetWeights::add_point(double u, double mass, int parity) {
    if (u < 0.0) {
        u = -u;
        mass *= parity;
    }
    for (int i = 0; i < point_count; ++i) {
        if (points[i].u == u) {
            points[i].mass += mass;
            return;
        }
    }
    if (point_count == static_cast<int>(points.size())) raise_no_convergence("the inductance integral needs more offset points than it holds");
    points[point_count++] = {u, mass};
}

namespace {

// A piece of the offsets' weight whose true width is `width`. Far away (lengths below a few
// units in the last place of the distance) the rounded ends misstate the width, and so the
// piece's share: its weight is rescaled to the true share, and a piece that rounds to nothing
// becomes a point of that share (the kernel hardly varies over it).
void add_offset_piece(OffsetWeights& w, double lo, double hi, double width, double w_lo, double w_hi, int parity) {
    if (hi > lo) {
        const double scale = width / (hi - lo);
        w.add_piece(lo, hi, w_lo * scale, w_hi * scale, parity);
    } else {
        w.add_point(lo, 0.5 * (w_lo + w_hi) * width, parity);
    }
}

}  // namespace

// The weight of u = z2 - z1 for windings of lengths h1, h2 whose centres are d apart.
OffsetWeights winding_offsets(double h1, double h2, double d, int parity) {
    OffsetWeights w;
    if (h1 == 0.0 && h2 == 0.0) {
        w.add_point(d, 1.0, parity);
    } else if (h1 == 0.0 || h2 == 0.0) {
        const double h = h1 + h2;
        add_offset_piece(w, d - 0.5 * h, d + 0.5 * h, h, 1.0 / h, 1.0 / h, parity);
    } else {
        const double shorter = std::fmin(h1, h2), longer = std::fmax(h1, h2), height = 1.0 / longer;
        const double a = d - 0.5 * (h1 + h2), dd = d + 0.5 * (h1 + h2);
        const double b = a + shorter, c = dd - shorter;
        add_offset_piece(w, a, b, shorter, 0.0, height, parity);
        if (longer > shorter) add_offset_piece(w, b, c, longer - shorter, height, height, parity);
        add_offset_piece(w, c, dd, shorter, height, 0.0, parity);
    }
    return w;
}

namespace {

constexpr long kEvaluationBudget = 4'000'000;  // kernel evaluations per call (about half a second)
// Target relative error of a cell. A box is integrated to the absolute error kTolerance times
// (a rough value of) the cell, and a box whose whole content is below that is not refined.
// Measured: about 1e-15 relative against references (tests/engine/test_winding_inductance.cpp).
constexpr double kTolerance = 1e-13;
constexpr double kSafety = 30.0;
constexpr int kCoarseOrder = 3;
constexpr double kFarMargin = 100.0;
// The coarse pass: this accuracy per box, and boxes below this share of the cell not refined.
constexpr double kCoarseAccuracy = 1e-4;
constexpr double kCoarseShare = 1e-9;
// A box near a singularity is not refined below this share of the cell's volume: with the
// logarithmic singularities here, what it holds is then below the target too.
constexpr double kNearShare = 1e-16;
// Every level halves a box, so the share floor above stops refinement within about 60 levels;
// deeper means the halving stalls (extreme sizes whose differences round away), and the
// recursion must end rather than exhaust the stack of the process that called it.
constexpr int kMaxDepth = 200;

using Vec3 = std::array<double, 3>;

struct Cell {
    enum class Kind { Diagonal, Corner, Plain };
    Kind kind = Kind::Plain;
    double p = 0.0, w = 0.0;  // diagonal: r2 = p + (w - delta) t, r1 = r2 + delta
    double c = 0.0;           // corner: r1 = c - x, r2 = c + y
    double a1 = 0.0, a2 = 0.0;  // plain: r1 = a1 + x, r2 = a2 + y
    bool u_fixed = false;
    double u0 = 0.0;                                  // when u_fixed
    double u_lo = 0.0, u_hi = 0.0, w_lo = 0.0, w_hi = 0.0;  // otherwise: linear weight on u
    FilamentKernel kernel = FilamentKernel::Mutual;
    std::array<bool, 3> active{};
    Vec3 lo{}, hi{};  // the whole cell
};

// Gauss order for a dimension whose length is 1/ratio (<= 1) times the distance to the nearest
// singularity: the Bernstein-ellipse bound rho^(-2n) of the error must reach `eps` (for a
// singularity level with the middle of the interval, the worst place). Far from the
// singularities the kernel decays like a power, and grows on the ellipse towards them faster
// than a logarithm does: there the bound gets a margin (measured: errors 1e-13 without it).
int order_for(double ratio, double eps) {
    const double z = 2.0 * ratio;
    const double rho = z + std::sqrt(z * z + 1.0);
    const double margin = ratio >= 2.0 ? kFarMargin : 1.0;
    const double n = std::ceil(0.5 * std::log(margin / eps) / std::log(rho));
    // A ratio that is not a number (a degenerate cell from extreme sizes) takes the highest order
    // rather than an undefined conversion; the result is checked downstream.
    if (!(n >= 2.0)) return std::isnan(n) ? kMaxGaussOrder : 2;
    return static_cast<int>(std::min(n, static_cast<double>(kMaxGaussOrder)));
}

class CellIntegrator {
public:
    // A coarse pass (loose accuracy, refinement stopped by volume share) gives the rough value of
    // the whole cell that sets the absolute target of every box of the accurate pass.
    CellIntegrator(const Cell& cell, long& budget) : c_(cell), budget_(budget) {
        coarse_ = true;
        target_ = std::fabs(integrate(c_.lo, c_.hi)) * kTolerance;
        coarse_ = false;
    }

    double integrate(const Vec3& lo, const Vec3& hi, int depth = 0) {
        if (depth > kMaxDepth) raise_no_convergence("the inductance integral does not settle for these sizes");
        // Lower bounds over the box of the radial gap |r1 - r2| and of r1 + r2. The kernel is
        // singular where (r1 - r2)^2 + u^2 = 0 (coincidence) and where (r1 + r2)^2 + u^2 = 0
        // (the mirror filament): lower bounds of the distances to these, in any direction, are
        // hypot(gap, u) and hypot(sum, u) >= the first. Along t (the diagonal's position
        // r2 at fixed gap) only the second exists, at half that distance.
        double gap, sum;
        const bool diagonal = c_.kind == Cell::Kind::Diagonal;
        if (diagonal) {
            gap = lo[0];
            sum = 2.0 * (c_.p + (c_.w - hi[0]) * lo[1]) + gap;
        } else if (c_.kind == Cell::Kind::Corner) {
            gap = lo[0] + lo[1];
            sum = (c_.c - hi[0]) + (c_.c + lo[1]);
        } else {
            const double r1lo = c_.a1 + lo[0], r1hi = c_.a1 + hi[0], r2lo = c_.a2 + lo[1], r2hi = c_.a2 + hi[1];
            gap = std::max(0.0, std::max(r1lo, r2lo) - std::min(r1hi, r2hi));
            sum = r1lo + r2lo;
        }
        const double u_lo = c_.u_fixed ? c_.u0 : lo[2];
        const double near = std::hypot(gap, u_lo);
        const Vec3 extent = {hi[0] - lo[0], diagonal ? (c_.w - lo[0]) * (hi[1] - lo[1]) : hi[1] - lo[1],
                             hi[2] - lo[2]};
        const Vec3 distance = {near, diagonal ? 0.5 * std::hypot(sum, u_lo) : near, near};

        // A box shorter than its distance to the singularities in every dimension holds a smooth
        // integrand (its centre value is representative). Any other box is split, unless what it
        // can hold is negligible: its share of the cell's volume is below the floor.
        std::array<bool, 3> fails{};
        double largest_failure = 0.0, share = 1.0;
        for (int i = 0; i < 3; ++i) {
            if (!c_.active[i]) continue;
            share *= (hi[i] - lo[i]) / (c_.hi[i] - c_.lo[i]);
            if (distance[i] < extent[i]) {
                fails[i] = true;
                largest_failure = std::max(largest_failure, extent[i]);
            }
        }
        if (largest_failure == 0.0) {
            double eps = kCoarseAccuracy;
            if (!coarse_) {
                // What the box holds, from its centre value (kSafety for the logarithm's growth).
                double volume = 1.0;
                for (int i = 0; i < 3; ++i)
                    if (c_.active[i]) volume *= hi[i] - lo[i];
                const double content =
                    kSafety * volume *
                    std::fabs(value(0.5 * (lo[0] + hi[0]), 0.5 * (lo[1] + hi[1]), 0.5 * (lo[2] + hi[2])));
                if (content <= target_) return coarse_gauss(lo, hi);  // all it holds is below the target
                eps = std::clamp(target_ / content, 1e-16, 1e-2);
            }
            std::array<int, 3> order{1, 1, 1};
            for (int i = 0; i < 3; ++i)
                if (c_.active[i]) order[i] = order_for(distance[i] / extent[i], eps);
            return gauss(lo, hi, order);
        }
        if (share < (coarse_ ? kCoarseShare : kNearShare)) return coarse_gauss(lo, hi);

        // Halve the failing dimensions that are not much shorter than the longest one.
        std::array<bool, 3> split{};
        for (int i = 0; i < 3; ++i) split[i] = fails[i] && extent[i] >= 0.5 * largest_failure;
        double total = 0.0;
        for (int mask = 0; mask < 8; ++mask) {
            bool valid = true;
            Vec3 clo = lo, chi = hi;
            for (int i = 0; i < 3; ++i) {
                const bool upper = (mask >> i) & 1;
                if (!split[i]) {
                    valid = valid && !upper;
                    continue;
                }
                const double mid = 0.5 * (lo[i] + hi[i]);
                (upper ? clo[i] : chi[i]) = mid;
            }
            if (valid) total += integrate(clo, chi, depth + 1);
        }
        return total;
    }

private:
    double coarse_gauss(const Vec3& lo, const Vec3& hi) {
        std::array<int, 3> order{1, 1, 1};
        for (int i = 0; i < 3; ++i)
            if (c_.active[i]) order[i] = kCoarseOrder;
        return gauss(lo, hi, order);
    }

    double value(double q0, double q1, double q2) const {
        double r1, r2, diff, jacobian = 1.0;
        if (c_.kind == Cell::Kind::Diagonal) {
            r2 = c_.p + (c_.w - q0) * q1;
            r1 = r2 + q0;
            diff = q0;
            if (c_.w > 0.0) jacobian = c_.w - q0;
        } else if (c_.kind == Cell::Kind::Corner) {
            r1 = c_.c - q0;
            r2 = c_.c + q1;
            diff = -(q0 + q1);
        } else {
            r1 = c_.a1 + q0;
            r2 = c_.a2 + q1;
            diff = r1 - r2;  // far from coincidence: no precision to protect
        }
        double u = c_.u0, weight = 1.0;
        if (!c_.u_fixed) {
            u = q2;
            weight = c_.w_lo + (c_.w_hi - c_.w_lo) * ((u - c_.u_lo) / (c_.u_hi - c_.u_lo));
        }
        const double k = c_.kernel == FilamentKernel::Mutual ? filament_mutual(r1, r2, diff, u)
                                                              : filament_mutual_slope(r1, r2, diff, u);
        return jacobian * weight * k;
    }

    double gauss(const Vec3& lo, const Vec3& hi, const std::array<int, 3>& order) {
        const GaussRule& g0 = gauss_rule(order[0]);
        const GaussRule& g1 = gauss_rule(order[1]);
        const GaussRule& g2 = gauss_rule(order[2]);
        // Inactive dimensions are fixed coordinates (lo == hi) with weight 1.
        const auto node = [&](const GaussRule& g, int i, int k, double& weight) {
            if (!c_.active[i]) {
                weight = 1.0;
                return lo[i];
            }
            const double len = hi[i] - lo[i];
            weight = len * g.w[k];
            return lo[i] + len * g.x[k];
        };
        double total = 0.0;
        for (int a = 0; a < g0.n; ++a) {
            double wa;
            const double qa = node(g0, 0, a, wa);
            for (int b = 0; b < g1.n; ++b) {
                double wb;
                const double qb = node(g1, 1, b, wb);
                double inner = 0.0;
                for (int e = 0; e < g2.n; ++e) {
                    double we;
                    const double qe = node(g2, 2, e, we);
                    inner += we * value(qa, qb, qe);
                }
                total += wa * wb * inner;
            }
        }
        budget_ -= static_cast<long>(g0.n) * g1.n * g2.n;
        if (budget_ < 0)
            raise_no_convergence("the inductance integral needs more work than one call may do");
        return total;
    }

    const Cell& c_;
    long& budget_;
    double target_ = 0.0;
    bool coarse_ = false;
};

double integrate_cell(const Cell& cell, long& budget) {
    CellIntegrator integrator(cell, budget);
    return integrator.integrate(cell.lo, cell.hi);
}

// Splits an extent at the break points strictly inside it; returns the number of pieces.
int cut(RadialExtent e, const std::array<double, 4>& breaks, std::array<RadialExtent, 4>& out) {
    if (e.lo == e.hi) {
        out[0] = e;
        return 1;
    }
    int n = 0;
    double from = e.lo;
    for (double b : breaks) {
        if (b > from && b < e.hi) {
            out[n++] = {from, b};
            from = b;
        }
    }
    out[n++] = {from, e.hi};
    return n;
}

}  // namespace

namespace {

// Integrates every offset piece and point against one radial cell.
double integrate_offsets(const Cell& radial, double factor, const OffsetWeights& u, long& budget) {
    double total = 0.0;
    for (int k = 0; k < u.piece_count; ++k) {
        const auto& piece = u.pieces[k];
        if (piece.w_lo == 0.0 && piece.w_hi == 0.0) continue;
        Cell cell = radial;
        cell.active[2] = true;
        cell.u_lo = cell.lo[2] = piece.lo;
        cell.u_hi = cell.hi[2] = piece.hi;
        cell.w_lo = piece.w_lo;
        cell.w_hi = piece.w_hi;
        total += factor * integrate_cell(cell, budget);
    }
    for (int k = 0; k < u.point_count; ++k) {
        const auto& point = u.points[k];
        if (point.mass == 0.0) continue;
        Cell cell = radial;
        if (cell.kind == Cell::Kind::Diagonal && cell.w == 0.0 && point.u == 0.0)
            raise_singular_point("two circles of the windings coincide: the result is infinite");
        cell.u_fixed = true;
        cell.u0 = cell.lo[2] = cell.hi[2] = point.u;
        total += factor * point.mass * integrate_cell(cell, budget);
    }
    return total;
}

// The offsets' nearest approach to 0.
double closest_offset(const OffsetWeights& u) {
    double closest = HUGE_VAL;
    for (int k = 0; k < u.piece_count; ++k) closest = std::min(closest, u.pieces[k].lo);
    for (int k = 0; k < u.point_count; ++k) closest = std::min(closest, u.points[k].u);
    return closest;
}

}  // namespace

double average_over_sections(RadialExtent r1, RadialExtent r2, const OffsetWeights& u, FilamentKernel kernel) {
    const double f1 = r1.hi > r1.lo ? 1.0 / (r1.hi - r1.lo) : 1.0;
    const double f2 = r2.hi > r2.lo ? 1.0 / (r2.hi - r2.lo) : 1.0;
    long budget = kEvaluationBudget;

    // Offsets that stay further from 0 than the radial extents are long keep the kernel smooth:
    // no cutting needed.
    if (closest_offset(u) >= std::max(r1.hi - r1.lo, r2.hi - r2.lo)) {
        Cell plain;
        plain.kind = Cell::Kind::Plain;
        plain.kernel = kernel;
        plain.a1 = r1.lo;
        plain.a2 = r2.lo;
        plain.active = {r1.hi > r1.lo, r2.hi > r2.lo, false};
        plain.hi[0] = r1.hi - r1.lo;
        plain.hi[1] = r2.hi - r2.lo;
        return integrate_offsets(plain, f1 * f2, u, budget);
    }

    std::array<double, 4> breaks = {r1.lo, r1.hi, r2.lo, r2.hi};
    std::sort(breaks.begin(), breaks.end());
    std::array<RadialExtent, 4> pieces1{}, pieces2{};
    const int n1 = cut(r1, breaks, pieces1), n2 = cut(r2, breaks, pieces2);
    double total = 0.0;
    for (int i = 0; i < n1; ++i) {
        for (int j = 0; j < n2; ++j) {
            const RadialExtent P = pieces1[i], Q = pieces2[j];
            Cell radial;
            radial.kernel = kernel;
            double factor = f1 * f2;
            if (P.lo == Q.lo && P.hi == Q.hi) {
                radial.kind = Cell::Kind::Diagonal;
                radial.p = P.lo;
                radial.w = P.hi - P.lo;
                radial.active[0] = radial.active[1] = radial.w > 0.0;
                radial.hi[0] = radial.w;
                radial.hi[1] = radial.w > 0.0 ? 1.0 : 0.0;
                if (radial.w > 0.0) factor *= 2.0;  // both triangles of the square
            } else {
                const RadialExtent L = P.hi <= Q.lo ? P : Q, R = P.hi <= Q.lo ? Q : P;
                radial.kind = Cell::Kind::Corner;
                radial.c = L.hi;
                radial.active[0] = L.hi > L.lo;
                radial.active[1] = R.hi > R.lo;
                radial.hi[0] = L.hi - L.lo;
                radial.lo[1] = R.lo - L.hi;
                radial.hi[1] = R.hi - L.hi;
            }
            total += integrate_offsets(radial, factor, u, budget);
        }
    }
    return total;
}

}  // namespace coilwright::internal
