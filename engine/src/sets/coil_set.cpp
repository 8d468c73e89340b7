// The coil-set table: validation of each row and the grouping of rows into circuits.
#include <algorithm>
#include <cmath>
#include <map>
#include <string>

#include "coilwright/errors.hpp"
#include "coilwright/sets.hpp"
#include "numerics/policy.hpp"

namespace coilwright {

using namespace internal;

namespace {

[[noreturn]] void fail(std::size_t label, const std::string& what) {
    raise_domain_error("row " + std::to_string(label) + ": " + what);
}

void finite_vector(const Eigen::Vector3d& v, std::size_t label, const char* what) {
    if (!v.allFinite()) fail(label, std::string(what) + " must be three finite numbers");
}

std::string number_text(double v) {
    const double r = std::nearbyint(v);
    return r == v && std::fabs(v) < 1e15 ? std::to_string(static_cast<long long>(r)) : std::to_string(v);
}

}  // namespace

void validate(const SetCoil& c, std::size_t label) {
    finite_vector(c.centre, label, "the centre");
    finite_vector(c.axis, label, "the axis");
    const double scale = c.axis.cwiseAbs().maxCoeff();
    if (!(scale > 0.0)) fail(label, "the axis is the zero vector; give its direction, e.g. 0, 0, 1");
    const bool circle = c.shape == SetShape::Circle;
    if (!(std::isfinite(c.size) && c.size > 0.0))
        fail(label, circle ? "radius must be a finite number > 0" : "width must be a finite number > 0");
    if (circle) {
        if (c.height != 0.0) fail(label, "a circle has no height (leave it empty or 0)");
    } else if (!(std::isfinite(c.height) && c.height > 0.0)) {
        fail(label, "height must be a finite number > 0 for a rect");
    }
    if (!std::isfinite(c.roll_deg)) fail(label, "roll must be a finite number of degrees");
    if (!(std::isfinite(c.turns) && c.turns >= 0.0)) fail(label, "turns must be a finite number >= 0");
    if (!std::isfinite(c.current)) fail(label, "current must be a finite number");
    if (c.circuit) {
        const double k = *c.circuit;
        if (!(std::isfinite(k) && k >= 1.0 && k <= 1e9 && k == std::nearbyint(k)))
            fail(label, "circuit must be a whole number from 1 to 1e9 (or empty: a circuit of its own)");
    }
    if (!(std::isfinite(c.depth) && c.depth >= 0.0)) fail(label, "winding depth must be a finite number >= 0");
    if (!(std::isfinite(c.breadth) && c.breadth >= 0.0)) fail(label, "winding width must be a finite number >= 0");
    if (circle && !(c.depth < 2.0 * c.size))
        fail(label, "winding depth must be less than twice the radius (the winding would reach the axis)");
    if (!circle && !(c.depth < std::min(c.size, c.height)))
        fail(label, "winding depth must be less than the width and the height (the winding would close its window)");
}

CoilSet::CoilSet(std::vector<SetCoil> coils) : CoilSet(std::move(coils), {}) {}

CoilSet::CoilSet(std::vector<SetCoil> coils, std::vector<std::size_t> labels)
    : coils_(std::move(coils)), labels_(std::move(labels)) {
    if (labels_.empty())
        for (std::size_t i = 0; i < coils_.size(); ++i) labels_.push_back(i + 1);
    if (labels_.size() != coils_.size()) raise_domain_error("coil set: one label per row is needed");
    if (coils_.empty()) raise_domain_error("the coil set has no coils (every row is blank)");
    for (std::size_t i = 0; i < coils_.size(); ++i) {
        validate(coils_[i], labels_[i]);
        frames_.push_back(coil_frame(coils_[i].axis, coils_[i].roll_deg, coils_[i].centre));
    }
    // Circuits: numbered ones in ascending number, then each unnumbered row in table order.
    std::map<double, std::vector<std::size_t>> numbered;
    for (std::size_t i = 0; i < coils_.size(); ++i)
        if (coils_[i].circuit) numbered[*coils_[i].circuit].push_back(i);
    circuit_index_.assign(coils_.size(), 0);
    polarity_.assign(coils_.size(), 1.0);
    for (const auto& [number, rows] : numbered) {
        const double magnitude = std::fabs(coils_[rows.front()].current);
        for (std::size_t i : rows) {
            if (std::fabs(coils_[i].current) != magnitude)
                fail(labels_[i], "circuit " + number_text(number) + " is in series: its current must equal row " +
                                     std::to_string(labels_[rows.front()]) + "'s up to the sign");
            circuit_index_[i] = circuit_numbers_.size();
        }
        circuit_numbers_.push_back(number);
        circuit_first_row_.push_back(rows.front());
    }
    for (std::size_t i = 0; i < coils_.size(); ++i) {
        if (coils_[i].circuit) continue;
        circuit_index_[i] = circuit_numbers_.size();
        circuit_numbers_.push_back(std::nullopt);
        circuit_first_row_.push_back(i);
    }
    for (std::size_t i = 0; i < coils_.size(); ++i) polarity_[i] = coils_[i].current < 0.0 ? -1.0 : 1.0;
}

std::string CoilSet::circuit_name(std::size_t c) const {
    if (circuit_numbers_[c]) return "circuit " + number_text(*circuit_numbers_[c]);
    return "row " + std::to_string(labels_[circuit_first_row_[c]]);
}

}  // namespace coilwright
