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

#include "coilwright/ac.hpp"
#include "coilwright/coil_table.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field.hpp"
#include "coilwright/wire.hpp"
#include "fuzz_input.hpp"
#include "numerics/bulirsch_cel.hpp"

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
         (void)internal::cel(kc, p, a, b);
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
    // Coils at a frequency (coilwright/ac.hpp); the conductor drawn from the two materials.
    {"skin_depth",
     [](FuzzInput& in) {
         const double f = in.number();
         require_finite(skin_depth(f, static_cast<Conductor>(in.below(2)), in.number()), "skin_depth");
     }},
    {"wire_rac_ratio",
     [](FuzzInput& in) {
         const double d = in.number(), f = in.number();
         require_finite(wire_rac_ratio(d, f, static_cast<Conductor>(in.below(2)), in.number()), "wire_rac_ratio");
     }},
    {"dowell_factor", [](FuzzInput& in) { require_finite(dowell_factor(in.number(), in.number()), "dowell_factor"); }},
    {"coil_rac_ratio",
     [](FuzzInput& in) {
         const double d = in.number(), w = in.number(), f = in.number(), m = in.number(), n = in.number();
         require_finite(coil_rac_ratio(d, w, f, m, n, static_cast<Conductor>(in.below(2)), in.number()),
                        "coil_rac_ratio");
     }},
    {"coil_self_capacitance",
     [](FuzzInput& in) {
         const double ri = in.number(), l = in.number(), n = in.number(), m = in.number(), dc = in.number(),
                      d_o = in.number(), er = in.number();
         require_finite(coil_self_capacitance(ri, l, n, m, dc, d_o, er), "coil_self_capacitance");
     }},
    {"coil_srf", [](FuzzInput& in) { require_finite(coil_srf(in.number(), in.number()), "coil_srf"); }},
    {"coil_impedance",
     [](FuzzInput& in) {
         const double r = in.number(), l = in.number(), f = in.number(), c = in.number();
         const Impedance z = coil_impedance(r, l, f, c);
         require_finite(z.magnitude, "coil_impedance |Z|");
         require_finite(z.phase, "coil_impedance phase");
     }},
    {"coil_voltage_ac",
     [](FuzzInput& in) {
         const double r = in.number(), l = in.number(), f = in.number(), i = in.number();
         require_finite(coil_voltage_ac(r, l, f, i), "coil_voltage_ac");
     }},
    {"resonance",
     [](FuzzInput& in) {
         const double i = in.number(), l = in.number(), f = in.number();
         require_finite(resonance_capacitance(l, f), "resonance_capacitance");
         require_finite(resonance_cap_voltage(i, l, f), "resonance_cap_voltage");
     }},
    {"pickup",
     [](FuzzInput& in) {
         const double n = in.number(), a = in.number(), f = in.number(), b = in.number(), r = in.number(),
                      l = in.number(), c = in.number(), t = in.number(), ea = in.number();
         require_finite(pickup_emf(n, a, f, b), "pickup_emf");
         require_finite(pickup_area(a, b, r, n), "pickup_area");
         require_finite(pickup_sensitivity(n, a, f, r, l, c), "pickup_sensitivity");
         require_finite(johnson_noise(r, t, b), "johnson_noise");
         require_finite(pickup_nef(n, a, f, r, t, l, c, ea), "pickup_nef");
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
