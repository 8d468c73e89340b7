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

#include "numerics/bulirsch_cel.hpp"
#include "coilwright/coil_table.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field.hpp"
#include "coilwright/wire.hpp"
#include "fuzz_input.hpp"

using namespace coilwright;
using coilwright::fuzz::FuzzInput;

namespace {

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
