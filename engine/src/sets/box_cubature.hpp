// Globally adaptive Gauss-Legendre cubature of a vector function over a rectangle in (s, t)
// (either side may have zero length: then it is a line integral, or a single value).
//
// Each box carries its own tensor-rule value and the sum of the rules on its four quarters;
// their difference is its error estimate. The box with the largest error is split until the
// errors add up to the tolerance or the budget of splits is spent. Boxes start split at a
// given point (where the integrand may be singular), so singularities sit at box corners.
#pragma once

#include <Eigen/Core>
#include <algorithm>
#include <cmath>
#include <queue>
#include <vector>

#include "numerics/gauss_legendre.hpp"
#include "numerics/policy.hpp"
#include "coilwright/errors.hpp"

namespace coilwright::internal {

struct Interval {
    double lo, hi;
    double length() const { return hi - lo; }
};

struct CubatureResult {
    Eigen::Vector3d integral;  // over the box (a zero side counts as length 1)
    double error;              // estimate, same units
};

template <class F>
class BoxCubature {
public:
    BoxCubature(F& f, int order) : f_(f), rule_(gauss_rule(order)) {}

    // Integral of f over s x t, the boxes first split at (s_split, t_split) (clamped into the
    // box). Stops at relative error `rel_tol` (of the sum of the boxes' absolute contributions);
    // after `max_splits` splits, accepts `fallback_tol` or throws ConvergenceError.
    CubatureResult integrate(Interval s, Interval t, double s_split, double t_split, double rel_tol,
                             double fallback_tol, int max_splits) {
        std::priority_queue<Node> queue;
        const double ss = std::clamp(s_split, s.lo, s.hi), ts = std::clamp(t_split, t.lo, t.hi);
        for (const Interval& a : pieces(s, ss))
            for (const Interval& b : pieces(t, ts)) queue.push(make_node(a, b, rule_on(a, b)));
        double error = 0.0, scale = 0.0;
        const auto add = [&](const Node& node, double sign) {
            error += sign * node.error;
            scale += sign * node.refined.norm();
        };
        for (auto copy = queue; !copy.empty(); copy.pop()) add(copy.top(), 1.0);
        for (int splits = 0;; ++splits) {
            const bool spent = splits == max_splits;
            if (error <= rel_tol * scale || spent) {
                // Running sums drift; decide on sums taken afresh, in the queue's fixed order.
                Eigen::Vector3d total = Eigen::Vector3d::Zero();
                error = scale = 0.0;
                for (auto copy = queue; !copy.empty(); copy.pop()) {
                    total += copy.top().refined;
                    add(copy.top(), 1.0);
                }
                if (error <= rel_tol * scale || (spent && error <= fallback_tol * scale)) return {total, error};
                if (spent) raise_no_convergence("the adaptive integration did not converge (a coil too close to another winding?)");
            }
            const Node worst = queue.top();
            queue.pop();
            add(worst, -1.0);
            for (int k = 0; k < 4; ++k) {
                if (!worst.child_valid[k]) continue;
                Node child = make_node(worst.child_s[k], worst.child_t[k], worst.child_value[k]);
                add(child, 1.0);
                queue.push(std::move(child));
            }
        }
    }

private:
    struct Node {
        Eigen::Vector3d refined;  // the sum of the children's rules
        double error;
        Interval child_s[4], child_t[4];
        Eigen::Vector3d child_value[4];
        bool child_valid[4];
        bool operator<(const Node& o) const { return error < o.error; }
    };

    static std::vector<Interval> pieces(Interval i, double at) {
        if (i.length() == 0.0) return {i};
        std::vector<Interval> out;
        if (at > i.lo) out.push_back({i.lo, at});
        if (at < i.hi) out.push_back({at, i.hi});
        return out;
    }

    Node make_node(Interval s, Interval t, const Eigen::Vector3d& own) {
        Node node{};
        const double sm = 0.5 * (s.lo + s.hi), tm = 0.5 * (t.lo + t.hi);
        const Interval ss[2] = {{s.lo, sm}, {sm, s.hi}}, ts[2] = {{t.lo, tm}, {tm, t.hi}};
        const int ns = s.length() == 0.0 ? 1 : 2, nt = t.length() == 0.0 ? 1 : 2;
        Eigen::Vector3d sum = Eigen::Vector3d::Zero();
        for (int a = 0; a < 2; ++a)
            for (int b = 0; b < 2; ++b) {
                const int k = 2 * a + b;
                node.child_valid[k] = a < ns && b < nt;
                if (!node.child_valid[k]) continue;
                node.child_s[k] = ns == 1 ? s : ss[a];
                node.child_t[k] = nt == 1 ? t : ts[b];
                node.child_value[k] = rule_on(node.child_s[k], node.child_t[k]);
                sum += node.child_value[k];
            }
        node.refined = sum;
        node.error = (sum - own).norm();
        return node;
    }

    // The tensor Gauss-Legendre rule on one box (a zero side: one node of weight 1).
    Eigen::Vector3d rule_on(Interval s, Interval t) {
        const int ns = s.length() == 0.0 ? 1 : rule_.n, nt = t.length() == 0.0 ? 1 : rule_.n;
        const double ls = s.length() == 0.0 ? 1.0 : s.length(), lt = t.length() == 0.0 ? 1.0 : t.length();
        Eigen::Vector3d sum = Eigen::Vector3d::Zero();
        for (int i = 0; i < ns; ++i) {
            const double sv = ns == 1 ? s.lo : s.lo + ls * rule_.x[i], ws = ns == 1 ? 1.0 : rule_.w[i];
            for (int j = 0; j < nt; ++j) {
                const double tv = nt == 1 ? t.lo : t.lo + lt * rule_.x[j], wt = nt == 1 ? 1.0 : rule_.w[j];
                sum += (ws * wt) * f_(sv, tv);
            }
        }
        return (ls * lt) * sum;
    }

    F& f_;
    const GaussRule& rule_;
};

}  // namespace coilwright::internal
