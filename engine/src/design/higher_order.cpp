#include "coilwright/design/higher_order.hpp"

#include <algorithm>
#include <cmath>
#include <string>
#include <vector>

#include "design/design_newton.hpp"
#include "design/higher_order_seeds.hpp"
#include "field/axial_jet.hpp"
#include "numerics/checks.hpp"
#include "numerics/policy.hpp"

namespace coilwright {

using namespace internal;

namespace {

enum class Kind { Uniform, Gradient };

// One design problem: the unknowns are the pairs' positions (cylinder: z / R; sphere: cos of the
// polar angle), then the ampere-turn ratios of every loop but the reference one (the centre loop
// when there is one, else the first pair).
struct Problem {
    Kind kind;
    DesignConstraint constraint;
    int pairs;
    bool centre;
    CoilSection section;  // loops: inner = outer = R, length 0
    double scale;         // R: the length unit of the unknowns

    std::size_t unknowns() const { return static_cast<std::size_t>(2 * pairs - 1 + (centre ? 1 : 0)); }
    // The orders nulled: 2, 4, ... (uniform) or 3, 5, ... (gradient), one per unknown.
    std::size_t order(std::size_t k) const { return 2 * (k + 1) + (kind == Kind::Gradient ? 1 : 0); }
    std::size_t reference_order() const { return kind == Kind::Gradient ? 1 : 0; }

    std::vector<double> weights(const std::vector<double>& x) const {
        std::vector<double> w(static_cast<std::size_t>(pairs) + (centre ? 1 : 0), 1.0);
        const std::size_t p = static_cast<std::size_t>(pairs);
        if (centre)
            for (std::size_t i = 0; i < p; ++i) w[i] = x[p + i];  // w[p], the centre, stays 1
        else
            for (std::size_t i = 1; i < p; ++i) w[i] = x[p + i - 1];
        return w;
    }

    // The coil rows of x (unsorted), one turn each carrying `ampere_turns` times its weight.
    std::vector<CoilRow> rows(const std::vector<double>& x, double ampere_turns) const {
        const std::vector<double> w = weights(x);
        std::vector<CoilRow> out;
        for (std::size_t i = 0; i < static_cast<std::size_t>(pairs); ++i) {
            double inner = section.inner_radius, outer = section.outer_radius, z = scale * x[i];
            if (constraint == DesignConstraint::Sphere) {
                inner = outer = scale * std::sqrt(std::max(0.0, 1.0 - x[i] * x[i]));
            }
            const double sign = kind == Kind::Gradient ? -1.0 : 1.0;
            out.push_back({inner, outer, section.length, -z, 1.0, sign * w[i] * ampere_turns});
            out.push_back({inner, outer, section.length, z, 1.0, w[i] * ampere_turns});
        }
        if (centre) out.push_back({section.inner_radius, section.outer_radius, section.length, 0.0, 1.0, ampere_turns});
        return out;
    }

    bool admissible(const std::vector<double>& x) const {
        const std::size_t p = static_cast<std::size_t>(pairs);
        for (std::size_t i = 0; i < x.size(); ++i)
            if (!std::isfinite(x[i])) return false;
        for (std::size_t i = 0; i < p; ++i) {
            if (!(x[i] > 1e-3)) return false;
            if (constraint == DesignConstraint::Sphere && !(x[i] < 1.0 - 1e-3)) return false;
            if (constraint == DesignConstraint::Cylinder && !(x[i] < 20.0)) return false;
            for (std::size_t j = 0; j < i; ++j)
                if (std::fabs(x[i] - x[j]) < 1e-3) return false;
            // Windings may not overlap (each other, their mirror, the centre one).
            const double len = section.length / scale;
            if (len > 0.0) {
                if (2.0 * x[i] < len || (centre && x[i] < len)) return false;
                for (std::size_t j = 0; j < i; ++j)
                    if (std::fabs(x[i] - x[j]) < len) return false;
            }
        }
        return true;
    }

    // The nulled Taylor coefficients, each times R^n and over the reference coefficient times
    // R^reference: dimensionless, O(1) for a single loop.
    std::vector<double> residuals(const std::vector<double>& x) const {
        const Jet<kDesignJetSize> jet = axial_jet_n<kDesignJetSize>(CoilTable(rows(x, 1.0)), 0.0);
        const double ref = jet.c[reference_order()] * std::pow(scale, static_cast<double>(reference_order()));
        std::vector<double> f(unknowns());
        for (std::size_t k = 0; k < f.size(); ++k)
            f[k] = jet.c[order(k)] * std::pow(scale, static_cast<double>(order(k))) / ref;
        return f;
    }
};

constexpr double kNewtonTarget = 1e-14;
// What every returned design must meet (the promise of the header), above the rounding floor.
constexpr double kDesignTolerance = 1e-11;

std::vector<double> solve(const Problem& problem, std::vector<double> start) {
    double residual = 0.0;
    std::vector<double> x = damped_newton([&](const std::vector<double>& v) { return problem.residuals(v); },
                                          [&](const std::vector<double>& v) { return problem.admissible(v); },
                                          std::move(start), kNewtonTarget, residual);
    if (!(residual <= kDesignTolerance))
        raise_no_convergence("the design equations were not solved (largest nulled coefficient " +
                             std::to_string(residual) + ")");
    return x;
}

std::vector<double> seed_of(const Problem& problem) {
    const DesignSeed* seed = find_seed(problem.kind == Kind::Gradient, problem.constraint == DesignConstraint::Sphere,
                                       problem.pairs, problem.centre);
    if (seed == nullptr) raise_domain_error("no such design is offered (see the list of designs)");
    return std::vector<double>(seed->x, seed->x + problem.unknowns());
}

void check_pairs(int pairs) {
    if (pairs < 1 || pairs > kMaxDesignPairs)
        raise_domain_error("pairs must be a whole number from 1 to " + std::to_string(kMaxDesignPairs));
}

// The rows sorted by z, lengths times `unit`, scaled so that the loop nearest the centre carries
// ampere_turns. (Designs are solved at unit size: they are scale-free, and the jets stay far from
// underflow and overflow whatever the size asked for.)
CoilTable finished(const Problem& problem, const std::vector<double>& x, double ampere_turns, double unit) {
    std::vector<CoilRow> rows = problem.rows(x, 1.0);
    for (CoilRow& r : rows) {
        r.inner_radius = check::finite_result(r.inner_radius * unit, "a radius");
        r.outer_radius = check::finite_result(r.outer_radius * unit, "a radius");
        r.length = check::finite_result(r.length * unit, "a length");
        r.centre_z = check::finite_result(r.centre_z * unit, "a position");
        if (!(r.inner_radius > 0.0)) raise_domain_error("the radius is too small for the design to be represented");
    }
    std::sort(rows.begin(), rows.end(), [](const CoilRow& a, const CoilRow& b) { return a.centre_z < b.centre_z; });
    const CoilRow* nearest = &rows.front();
    for (const CoilRow& r : rows)
        if (std::fabs(r.centre_z) < std::fabs(nearest->centre_z) ||
            (std::fabs(r.centre_z) == std::fabs(nearest->centre_z) && r.centre_z > nearest->centre_z))
            nearest = &r;
    const double reference = std::fabs(nearest->current);
    for (CoilRow& r : rows)
        r.current = check::finite_result(r.current / reference * ampere_turns, "an ampere-turn ratio");
    return CoilTable(std::move(rows));
}

void check_no_overlap(const CoilTable& table) {
    const auto& rows = table.rows();
    for (std::size_t i = 1; i < rows.size(); ++i)
        if (rows[i].centre_z - rows[i - 1].centre_z < rows[i].length)
            raise_domain_error(
                "the windings of this design would overlap (their length is too large for the "
                "positions the design needs): shorten them");
}

CoilTable loop_design(Kind kind, double radius, int pairs, double ampere_turns, DesignConstraint constraint,
                      bool centre) {
    check::positive(radius, "radius");
    check_pairs(pairs);
    check::finite(ampere_turns, "ampere-turns");
    if (constraint != DesignConstraint::Cylinder && constraint != DesignConstraint::Sphere)
        raise_domain_error("constraint must be cylinder or sphere");
    const Problem problem{kind, constraint, pairs, centre, {1.0, 1.0, 0.0}, 1.0};
    return finished(problem, solve(problem, seed_of(problem)), ampere_turns, radius);
}

// Continuation: the loop design at the mean radius, then the section grown to its size in
// steps, each solved from the one before.
CoilTable thick_design(Kind kind, const CoilSection& coil, int pairs, double ampere_turns, bool centre) {
    validate(coil);
    check_pairs(pairs);
    check::finite(ampere_turns, "ampere-turns");
    const double mean = 0.5 * (coil.inner_radius + coil.outer_radius);
    if (!std::isfinite(mean)) raise_domain_error("the radii are too large");
    const double inner = coil.inner_radius / mean, outer = coil.outer_radius / mean, length = coil.length / mean;
    if (!std::isfinite(length)) raise_domain_error("the length is too large for the radius");
    Problem problem{kind, DesignConstraint::Cylinder, pairs, centre, {1.0, 1.0, 0.0}, 1.0};
    std::vector<double> x = solve(problem, seed_of(problem));
    constexpr int kSteps = 8;
    for (int k = 1; k <= kSteps; ++k) {
        const double t = static_cast<double>(k) / kSteps;
        const double half_build = 0.5 * t * (outer - inner);
        problem.section = {1.0 - half_build, 1.0 + half_build, t * length};
        if (!problem.admissible(x))
            raise_domain_error(
                "the windings of this design would overlap (their length is too large for the "
                "positions the design needs): shorten them");
        x = solve(problem, x);
    }
    problem.section = {inner, outer, length};  // the exact section for the rows
    std::vector<CoilRow> rows = finished(problem, x, ampere_turns, mean).rows();
    for (CoilRow& r : rows) {  // the section exactly as given
        r.inner_radius = coil.inner_radius;
        r.outer_radius = coil.outer_radius;
        r.length = coil.length;
    }
    CoilTable table(std::move(rows));
    check_no_overlap(table);
    return table;
}

}  // namespace

CoilTable uniform_coils(double radius, int pairs, double ampere_turns, DesignConstraint constraint, CentreLoop centre) {
    return loop_design(Kind::Uniform, radius, pairs, ampere_turns, constraint, centre == CentreLoop::Loop);
}

CoilTable gradient_coils(double radius, int pairs, double ampere_turns, DesignConstraint constraint) {
    return loop_design(Kind::Gradient, radius, pairs, ampere_turns, constraint, false);
}

CoilTable uniform_thick_coils(const CoilSection& coil, int pairs, double ampere_turns, CentreLoop centre) {
    return thick_design(Kind::Uniform, coil, pairs, ampere_turns, centre == CentreLoop::Loop);
}

CoilTable gradient_thick_coils(const CoilSection& coil, int pairs, double ampere_turns) {
    return thick_design(Kind::Gradient, coil, pairs, ampere_turns, false);
}

}  // namespace coilwright
