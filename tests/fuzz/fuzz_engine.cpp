// libFuzzer harness for the engine's entry points. Each entry point takes its arguments from
// the fuzzer's bytes and must either return finite numbers or throw one of the engine's
// documented errors (DomainError, SingularPointError, ConvergenceError). Anything else, an
// uncaught exception, a non-finite result, a sanitizer report or a hang, is a finding.
// To cover a new entry point, add one line to kEntryPoints.
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <string>
#include <vector>

#include "coilwright/bulirsch_cel.hpp"
#include "coilwright/coil_table.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/loop.hpp"
#include "coilwright/sets.hpp"
#include "coilwright/wire.hpp"
#include "fuzz_input.hpp"

using namespace coilwright;
using coilwright::fuzz::FuzzInput;

namespace {

// A coil set of up to three rows from the fuzzer's bytes (shapes, thickness and circuits too).
CoilSet fuzz_set(FuzzInput& in) {
    std::vector<SetCoil> coils(1 + in.below(3));
    for (auto& c : coils) {
        c.shape = in.below(2) == 0 ? SetShape::Circle : SetShape::Rect;
        c.centre = {in.number(), in.number(), in.number()};
        c.axis = {in.number(), in.number(), in.number()};
        c.size = in.number();
        c.height = c.shape == SetShape::Rect ? in.number() : 0.0;
        c.roll_deg = in.number();
        c.turns = in.number();
        c.current = in.number();
        if (in.below(2) == 0) c.circuit = in.number();
        if (in.below(3) == 0) {
            c.depth = in.number();
            c.breadth = in.number();
        }
    }
    return CoilSet(coils);
}

void require_finite(double v, const char* what) {
    if (!std::isfinite(v)) {
        std::fprintf(stderr, "%s returned a non-finite value %g\n", what, v);
        std::abort();
    }
}

struct EntryPoint {
    const char* name;
    void (*run)(FuzzInput&);
};

const EntryPoint kEntryPoints[] = {
    {"loop_field",
     [](FuzzInput& in) {
         const LoopSpec loop{in.number(), in.number(), in.number()};
         const double z = in.number(), r = in.number();
         const FieldRZ f = loop_field(loop, z, r);
         require_finite(f.bz, "loop_field Bz");
         require_finite(f.br, "loop_field Br");
         require_finite(f.magnitude(), "loop_field |B|");
     }},
    {"cel",
     [](FuzzInput& in) {
         // Documented domain: p > 0 and kc != 0, all finite. Inside it the iteration must end;
         // the value may legitimately overflow for extreme a, b.
         const double kc = in.number(), p = in.number(), a = in.number(), b = in.number();
         if (!(std::isfinite(kc) && kc != 0.0 && std::isfinite(p) && p > 0.0 && std::isfinite(a) && std::isfinite(b)))
             return;
         (void)cel(kc, p, a, b);
     }},
    {"parse_awg_gauge",
     [](FuzzInput& in) {
         const double g = parse_awg_gauge(in.text());
         require_finite(g, "parse_awg_gauge");
         require_finite(awg_diameter(g), "awg_diameter");
     }},
    {"awg_diameter", [](FuzzInput& in) { require_finite(awg_diameter(in.number()), "awg_diameter"); }},
    {"set_field",
     [](FuzzInput& in) {
         const CoilSet set = fuzz_set(in);
         const Eigen::Vector3d b = set_field(set, {in.number(), in.number(), in.number()});
         for (int k = 0; k < 3; ++k) require_finite(b[k], "set_field");
     }},
    {"set_field_batch",
     [](FuzzInput& in) {
         const CoilSet set = fuzz_set(in);
         double x[3], y[3], z[3], bx[3], by[3], bz[3];
         for (int i = 0; i < 3; ++i) x[i] = in.number(), y[i] = in.number(), z[i] = in.number();
         (void)set_field_batch(set, x, y, z, 3, bx, by, bz);  // NaN where set_field would throw
     }},
    {"set_currents",
     [](FuzzInput& in) {
         const CoilSet set = fuzz_set(in);
         const Eigen::VectorXd i = set_currents(set, {{in.number(), in.number(), in.number()}},
                                                {{in.number(), in.number(), in.number()}});
         for (Eigen::Index k = 0; k < i.size(); ++k) require_finite(i[k], "set_currents");
     }},
    {"set_inductance_matrix",
     [](FuzzInput& in) {
         const CoilSet set = fuzz_set(in);
         const Eigen::MatrixXd l = set_inductance_matrix(set, in.number());
         for (Eigen::Index k = 0; k < l.size(); ++k) require_finite(l.data()[k], "set_inductance_matrix");
     }},
    {"set_force_torque",
     [](FuzzInput& in) {
         const CoilSet set = fuzz_set(in);
         const std::size_t row = in.below(set.size());
         const Eigen::Vector3d f = in.below(2) == 0 ? set_force(set, row) : set_torque(set, row);
         for (int k = 0; k < 3; ++k) require_finite(f[k], "set_force/set_torque");
     }},
    {"rig3_coils",
     [](FuzzInput& in) {
         const CoilSet rig(rig3_coils(in.number(), in.number(), in.number(), in.below(2) ? SetShape::Rect : SetShape::Circle));
         require_finite(set_uniform_sphere(rig, in.number(), {in.number(), in.number(), in.number()}), "uniform sphere");
     }},
    {"coil_table",
     [](FuzzInput& in) {
         std::vector<CoilRow> rows(in.below(4));
         for (auto& row : rows) row = {in.number(), in.number(), in.number(), in.number(), in.number(), in.number()};
         const CoilTable table(rows);
         for (const auto& row : table.rows()) (void)row.kind();
     }},
};

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    FuzzInput in(data, size);
    const EntryPoint& entry = kEntryPoints[in.below(std::size(kEntryPoints))];
    try {
        entry.run(in);
    } catch (const DomainError&) {       // also SingularPointError
    } catch (const ConvergenceError&) {
    }
    return 0;
}
