// libFuzzer harness for the engine's public entry points (every function the public headers
// declare; tests/fuzz/check_fuzz_coverage.py fails when one is missing here). Each takes its
// arguments from the fuzzer's bytes and must either return finite numbers or throw one of the
// engine's own errors (DomainError, SingularPointError, ConvergenceError). Anything else, an
// uncaught exception, a non-finite result, a sanitizer report or a hang (-timeout), is a
// finding. Numbers come from fuzz_input.hpp: raw bits, edge values from 1e-310 to 1e308 and
// values one ulp to a few per cent from an earlier one.
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <optional>
#include <string>
#include <vector>

#include "coilwright/ac.hpp"
#include "coilwright/design.hpp"
#include "coilwright/errors.hpp"
#include "coilwright/field.hpp"
#include "coilwright/inductance.hpp"
#include "coilwright/sets.hpp"
#include "coilwright/wire.hpp"
#include "fuzz_input.hpp"
#include "numerics/bulirsch_cel.hpp"

using namespace coilwright;
using coilwright::fuzz::FuzzInput;

namespace {

void finite(double v, const char* what) {
    if (!std::isfinite(v)) {
        std::fprintf(stderr, "%s returned a non-finite value %g\n", what, v);
        std::abort();
    }
}

void finite(const FieldRZ& f, const char* what) {
    finite(f.bz, what);
    finite(f.br, what);
}

void finite(const CoilTable& t, const char* what) {
    for (const CoilRow& row : t.rows())
        for (double v : {row.inner_radius, row.outer_radius, row.length, row.centre_z, row.turns, row.current})
            finite(v, what);
}

void finite(const MatrixWithProblems& m, const char* what) {
    for (Eigen::Index i = 0; i < m.values.rows(); ++i)
        for (Eigen::Index j = 0; j < m.values.cols(); ++j)
            if (m.valid(i, j)) finite(m.values(i, j), what);
}

void finite(const HotState& s, const char* what) {
    finite(s.temperature, what);
    finite(s.resistance, what);
}

template <class Derived>
void finite(const Eigen::DenseBase<Derived>& m, const char* what) {
    for (Eigen::Index i = 0; i < m.size(); ++i) finite(m.derived().data()[i], what);
}

void finite(const std::vector<double>& v, const char* what) {
    for (double x : v) finite(x, what);
}

// A table of one to three rows (bigger tables only cost time, not coverage).
CoilTable table(FuzzInput& in) {
    std::vector<CoilRow> rows(1 + in.below(3));
    for (auto& row : rows) row = {in.number(), in.number(), in.number(), in.number(), in.number(), in.number()};
    return CoilTable(rows);
}

CoilSection section(FuzzInput& in) { return {in.number(), in.number(), in.number()}; }

// A coil set of one to three rows (shapes, thickness and circuits too).
std::vector<SetCoil> set_rows(FuzzInput& in) {
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
    return coils;
}

CoilSet coil_set(FuzzInput& in) { return CoilSet(set_rows(in)); }
Conductor conductor(FuzzInput& in) { return static_cast<Conductor>(in.below(3)); }  // 2 names none
Packing packing(FuzzInput& in) { return static_cast<Packing>(in.below(3)); }
CoilParameter parameter(FuzzInput& in) { return static_cast<CoilParameter>(in.below(8)); }
std::size_t row_index(FuzzInput& in) { return in.below(4); }
DesignConstraint constraint(FuzzInput& in) { return static_cast<DesignConstraint>(in.below(3)); }  // 2 names none
CentreLoop centre(FuzzInput& in) { return static_cast<CentreLoop>(in.below(2)); }
int pairs(FuzzInput& in) { return static_cast<int>(in.below(6)); }  // 0 and 5 are out of range
LayerWinding layer_winding(FuzzInput& in) {
    return {in.number(), in.number(), in.number(), in.number(), in.number(), packing(in)};
}

void finite(const std::vector<TurnPosition>& turns, const char* what) {
    for (const TurnPosition& t : turns) {
        finite(t.radius, what);
        finite(t.z, what);
    }
}

void finite(const ThickCoilSpec& s, const char* what) {
    for (double v : {s.inner_radius, s.outer_radius, s.length, s.turns, s.current}) finite(v, what);
}
Eigen::Vector3d point(FuzzInput& in) { return {in.number(), in.number(), in.number()}; }

struct EntryPoint {
    const char* name;
    void (*run)(FuzzInput&);
};

#define ENTRY(name, ...) {#name, [](FuzzInput& in) { __VA_ARGS__; }}
#define N in.number()

const EntryPoint kEntryPoints[] = {
    // field
    ENTRY(loop_field, finite(loop_field({N, N, N}, N, N), "loop_field")),
    ENTRY(loop_field_batch, {
        const LoopSpec loop{N, N, N};
        const double z[3] = {N, N, N}, r[3] = {N, N, N};
        double bz[3], br[3];
        loop_field_batch(loop, z, r, 3, bz, br);
        for (int i = 0; i < 3; ++i)
            if (!std::isnan(bz[i])) finite(bz[i], "loop_field_batch");
    }),
    ENTRY(add_loop_field_batch, {
        const LoopSpec loop{N, N, N};
        const double centre = N, z[2] = {N, N}, r[2] = {N, N};
        double bz[2] = {0, 0}, br[2] = {0, 0};
        add_loop_field_batch(loop, centre, z, r, 2, bz, br);
    }),
    ENTRY(solenoid_field, finite(solenoid_field({N, N, N, N}, N, N, static_cast<Components>(in.below(3))), "solenoid_field")),
    ENTRY(thick_coil_field, finite(thick_coil_field({N, N, N, N, N}, N, N, static_cast<Components>(in.below(3))), "thick_coil_field")),
    ENTRY(flat_spiral_field, finite(flat_spiral_field({N, N, N, N}, N, N), "flat_spiral_field")),
    ENTRY(rect_field, finite(rect_field({N, N, N, N}, point(in)), "rect_field")),
    ENTRY(rect_pair_field, finite(rect_pair_field({N, N, N, N}, N, point(in)), "rect_pair_field")),
    ENTRY(validate, {
        validate(LoopSpec{N, N, N});
        validate(SolenoidSpec{N, N, N, N});
        validate(ThickCoilSpec{N, N, N, N, N});
        validate(FlatSpiralSpec{N, N, N, N});
        validate(RectSpec{N, N, N, N});
        validate(section(in), "coil ");
        validate(CoilRow{N, N, N, N, N, N}, 1);
    }),
    ENTRY(table_field, finite(table_field(table(in), N, N), "table_field")),
    ENTRY(row_field, finite(row_field({N, N, N, N, N, N}, N, N), "row_field")),
    ENTRY(axial_field, finite(axial_field(table(in), N), "axial_field")),
    ENTRY(axial_derivatives, finite(axial_derivatives(table(in), N, static_cast<int>(in.below(16)) - 1), "axial_derivatives")),
    ENTRY(table_gradient, finite(table_gradient(table(in), N, N), "table_gradient")),
    // inductance
    ENTRY(loop_mutual_inductance, finite(loop_mutual_inductance(N, N, N), "loop_mutual_inductance")),
    ENTRY(loop_mutual_inductance_slope, finite(loop_mutual_inductance_slope(N, N, N), "loop_mutual_inductance_slope")),
    ENTRY(coil_mutual_inductance, finite(coil_mutual_inductance(section(in), section(in), N), "coil_mutual_inductance")),
    ENTRY(coil_mutual_inductance_slope, finite(coil_mutual_inductance_slope(section(in), section(in), N), "coil_mutual_inductance_slope")),
    ENTRY(loop_self_inductance, finite(loop_self_inductance(N, N, N), "loop_self_inductance")),
    ENTRY(solenoid_inductance, finite(solenoid_inductance(N, N, N), "solenoid_inductance")),
    ENTRY(nagaoka_coefficient, finite(nagaoka_coefficient(N), "nagaoka_coefficient")),
    ENTRY(solenoid_inductance_radius_slope, finite(solenoid_inductance_radius_slope(N, N, N), "solenoid_inductance_radius_slope")),
    ENTRY(solenoid_mean_pressure, finite(solenoid_mean_pressure(N, N, N, N), "solenoid_mean_pressure")),
    ENTRY(coil_self_inductance, {
        const CoilSection s = section(in);
        finite(in.below(2) ? coil_self_inductance(s) : coil_self_inductance(s, N), "coil_self_inductance");
    }),
    ENTRY(loop_coupling, finite(loop_coupling(N, N, N, N, N), "loop_coupling")),
    ENTRY(coil_coupling, finite(coil_coupling(section(in), section(in), N), "coil_coupling")),
    ENTRY(loop_axial_force, finite(loop_axial_force(N, N, N, N, N, N, N), "loop_axial_force")),
    ENTRY(coil_axial_force, finite(coil_axial_force(section(in), N, N, section(in), N, N, N), "coil_axial_force")),
    ENTRY(optional_wire_diameter, { const auto d = optional_wire_diameter(N); if (d) finite(*d, "optional_wire_diameter"); }),
    ENTRY(inductance_matrix, finite(inductance_matrix(table(in), optional_wire_diameter(in.below(2) ? N : 0.0)), "inductance_matrix")),
    ENTRY(series_inductance, finite(series_inductance(table(in), optional_wire_diameter(in.below(2) ? N : 0.0)), "series_inductance")),
    ENTRY(stored_energy, finite(stored_energy(table(in), optional_wire_diameter(in.below(2) ? N : 0.0)), "stored_energy")),
    ENTRY(axial_forces, finite(axial_forces(table(in)), "axial_forces")),
    // design
    ENTRY(flat_pair_spacing, finite(flat_pair_spacing(section(in)), "flat_pair_spacing")),
    ENTRY(gradient_pair_spacing, finite(gradient_pair_spacing(section(in)), "gradient_pair_spacing")),
    ENTRY(pair_centre_field, finite(pair_centre_field(section(in), N, N, N), "pair_centre_field")),
    ENTRY(gradient_pair_gradient, finite(gradient_pair_gradient(section(in), N, N, N), "gradient_pair_gradient")),
    ENTRY(helmholtz_centre_field, finite(helmholtz_centre_field(N, N, N), "helmholtz_centre_field")),
    ENTRY(rect_pair_spacing, finite(rect_pair_spacing(N, N), "rect_pair_spacing")),
    ENTRY(flat_pair_table, finite(flat_pair_table(section(in), N, N), "flat_pair_table")),
    ENTRY(gradient_pair_table, finite(gradient_pair_table(section(in), N, N), "gradient_pair_table")),
    ENTRY(maxwell_table, finite(maxwell_table(N, N, N), "maxwell_table")),
    ENTRY(axial_uniform_half_length, finite(axial_uniform_half_length(table(in), N, N), "axial_uniform_half_length")),
    ENTRY(axial_linear_half_length, finite(axial_linear_half_length(table(in), N, N), "axial_linear_half_length")),
    ENTRY(radial_uniform_extent, finite(radial_uniform_extent(table(in), N, N), "radial_uniform_extent")),
    ENTRY(spherical_uniform_radius, finite(spherical_uniform_radius(table(in), N, N), "spherical_uniform_radius")),
    ENTRY(scale_for_field, finite(scale_for_field(table(in), N, N, N), "scale_for_field")),
    ENTRY(scale_for_gradient, finite(scale_for_gradient(table(in), N, N, N), "scale_for_gradient")),
    ENTRY(field_sensitivity, finite(field_sensitivity(table(in), row_index(in), parameter(in), N), "field_sensitivity")),
    ENTRY(uniform_length_sensitivity, finite(uniform_length_sensitivity(table(in), row_index(in), parameter(in), N, N), "uniform_length_sensitivity")),
    ENTRY(sensitivity, finite(sensitivity(table(in), row_index(in), parameter(in), static_cast<SensitivityQuantity>(in.below(3)), N, N), "sensitivity")),
    ENTRY(perturbed, finite(perturbed(table(in), row_index(in), parameter(in), N), "perturbed")),
    ENTRY(uniform_coils, finite(uniform_coils(N, pairs(in), N, constraint(in), centre(in)), "uniform_coils")),
    ENTRY(gradient_coils, finite(gradient_coils(N, pairs(in), N, constraint(in)), "gradient_coils")),
    ENTRY(uniform_thick_coils, finite(uniform_thick_coils(section(in), pairs(in), N, centre(in)), "uniform_thick_coils")),
    ENTRY(gradient_thick_coils, finite(gradient_thick_coils(section(in), pairs(in), N), "gradient_thick_coils")),
    ENTRY(design_order, finite(static_cast<double>(design_order(table(in), N)), "design_order")),
    ENTRY(turn_sensitivity, finite(turn_sensitivity(layer_winding(in), N, N, parameter(in), N,
                                                    static_cast<SensitivityQuantity>(in.below(3)), N, N), "turn_sensitivity")),
    // wire
    ENTRY(parse_awg_gauge, finite(parse_awg_gauge(in.text()), "parse_awg_gauge")),
    ENTRY(awg_diameter, finite(awg_diameter(N), "awg_diameter")),
    ENTRY(conductor_data, finite(conductor_data(conductor(in)).resistivity_20, "conductor_data")),
    ENTRY(resistivity, finite(resistivity(conductor(in), N), "resistivity")),
    ENTRY(wire_area, finite(wire_area(N), "wire_area")),
    ENTRY(wire_resistance, finite(wire_resistance(N, N, conductor(in), N), "wire_resistance")),
    ENTRY(wire_mass, finite(wire_mass(N, N, conductor(in)), "wire_mass")),
    ENTRY(wire_diameter_for_current, finite(wire_diameter_for_current(N, N), "wire_diameter_for_current")),
    ENTRY(winding_layers, finite(winding_layers(N, N, packing(in)), "winding_layers")),
    ENTRY(winding_turns_per_layer, finite(winding_turns_per_layer(N, N), "winding_turns_per_layer")),
    ENTRY(winding_turns, finite(winding_turns(N, N, N, packing(in)), "winding_turns")),
    ENTRY(winding_build, finite(winding_build(N, N, N, packing(in)), "winding_build")),
    ENTRY(winding_wire_length, finite(winding_wire_length(N, N, N, N, packing(in)), "winding_wire_length")),
    ENTRY(winding_fill, finite(winding_fill(N, N, N, N), "winding_fill")),
    ENTRY(winding_mean_turn, finite(winding_mean_turn(N, N), "winding_mean_turn")),
    ENTRY(winding_turn_positions, finite(winding_turn_positions(layer_winding(in)), "winding_turn_positions")),
    ENTRY(layer_turns, finite(layer_turns(layer_winding(in), static_cast<int>(in.below(4))), "layer_turns")),
    ENTRY(winding_total_turns, finite(winding_total_turns(layer_winding(in)), "winding_total_turns")),
    ENTRY(real_turns_field, finite(real_turns_field(layer_winding(in), N, N), "real_turns_field")),
    ENTRY(real_turns_bphi, finite(real_turns_bphi(layer_winding(in), N, N), "real_turns_bphi")),
    ENTRY(smooth_winding, finite(smooth_winding(layer_winding(in)), "smooth_winding")),
    ENTRY(real_turns_model_error, finite(real_turns_model_error(layer_winding(in), N, N), "real_turns_model_error")),
    ENTRY(winding_mean_turn_rect, finite(winding_mean_turn_rect(N, N, N), "winding_mean_turn_rect")),
    ENTRY(coil_resistance, finite(coil_resistance(N, N, N, conductor(in), N), "coil_resistance")),
    ENTRY(coil_voltage, finite(coil_voltage(N, N), "coil_voltage")),
    ENTRY(coil_power, finite(coil_power(N, N), "coil_power")),
    ENTRY(coil_current_density, finite(coil_current_density(N, N), "coil_current_density")),
    ENTRY(coil_cooling_area, finite(coil_cooling_area(N, N, N), "coil_cooling_area")),
    ENTRY(coil_cooling_area_rect, finite(coil_cooling_area_rect(N, N, N, N), "coil_cooling_area_rect")),
    ENTRY(coil_temperature_rise, finite(coil_temperature_rise(N, N, N), "coil_temperature_rise")),
    ENTRY(hot_state_at_current, finite(hot_state_at_current(N, N, N, N, N, conductor(in)), "hot_state_at_current")),
    ENTRY(hot_state_at_voltage, finite(hot_state_at_voltage(N, N, N, N, N, conductor(in)), "hot_state_at_voltage")),
    ENTRY(coil_max_current, finite(coil_max_current(N, N, N, N, N, conductor(in)), "coil_max_current")),
    ENTRY(insulation_class_limit, finite(insulation_class_limit(N), "insulation_class_limit")),
    ENTRY(insulation_margin, finite(insulation_margin(N, N, N), "insulation_margin")),
    ENTRY(coil_energy, finite(coil_energy(N, N), "coil_energy")),
    ENTRY(coil_time_constant, finite(coil_time_constant(N, N), "coil_time_constant")),
    ENTRY(winding_hotspot_rise, finite(winding_hotspot_rise(N, N, N, N, N, static_cast<CooledSurfaces>(in.below(3))),
                                       "winding_hotspot_rise")),
    ENTRY(coil_temperature_at_time,
          finite(coil_temperature_at_time(N, N, N, N, N, N, N, conductor(in)), "coil_temperature_at_time")),
    ENTRY(pulse_temperature_rise, finite(pulse_temperature_rise(N, N, N, N, N, conductor(in)), "pulse_temperature_rise")),
    // ac
    ENTRY(skin_depth, finite(skin_depth(N, conductor(in), N), "skin_depth")),
    ENTRY(wire_rac_ratio, finite(wire_rac_ratio(N, N, conductor(in), N), "wire_rac_ratio")),
    ENTRY(dowell_factor, finite(dowell_factor(N, N), "dowell_factor")),
    ENTRY(coil_rac_ratio, finite(coil_rac_ratio(N, N, N, N, N, conductor(in), N), "coil_rac_ratio")),
    ENTRY(coil_self_capacitance, finite(coil_self_capacitance(N, N, N, N, N, N, N), "coil_self_capacitance")),
    ENTRY(coil_srf, finite(coil_srf(N, N), "coil_srf")),
    ENTRY(coil_impedance, {
        const Impedance z = coil_impedance(N, N, N, N);
        finite(z.magnitude, "coil_impedance |Z|");
        finite(z.phase, "coil_impedance phase");
    }),
    ENTRY(coil_voltage_ac, finite(coil_voltage_ac(N, N, N, N), "coil_voltage_ac")),
    ENTRY(resonance_capacitance, finite(resonance_capacitance(N, N), "resonance_capacitance")),
    ENTRY(resonance_cap_voltage, finite(resonance_cap_voltage(N, N, N), "resonance_cap_voltage")),
    ENTRY(pickup_emf, finite(pickup_emf(N, N, N, N), "pickup_emf")),
    ENTRY(pickup_area, finite(pickup_area(N, N, N, N), "pickup_area")),
    ENTRY(pickup_sensitivity, finite(pickup_sensitivity(N, N, N, N, N, N), "pickup_sensitivity")),
    ENTRY(johnson_noise, finite(johnson_noise(N, N, N), "johnson_noise")),
    ENTRY(pickup_nef, finite(pickup_nef(N, N, N, N, N, N, N, N), "pickup_nef")),
    // sets
    ENTRY(coil_frame, {
        const CoilFrame f = coil_frame(point(in), N, point(in));
        finite(f.u, "coil_frame");
        finite(f.v, "coil_frame");
    }),
    ENTRY(coil_field, {
        const std::vector<SetCoil> rows = set_rows(in);
        const CoilSet set(rows);  // validates the row
        finite(coil_field(set.coils()[0], set.frame(0), point(in)), "coil_field");
    }),
    ENTRY(set_field, finite(set_field(coil_set(in), point(in)), "set_field")),
    ENTRY(set_field_batch, {
        const CoilSet set = coil_set(in);
        const double x[3] = {N, N, N}, y[3] = {N, N, N}, z[3] = {N, N, N};
        double bx[3], by[3], bz[3];
        (void)set_field_batch(set, x, y, z, 3, bx, by, bz);  // NaN where set_field would throw
    }),
    ENTRY(circuit_field_matrix, finite(circuit_field_matrix(coil_set(in), point(in)), "circuit_field_matrix")),
    ENTRY(set_currents, {
        const CoilSet set = coil_set(in);
        finite(set_currents(set, {point(in)}, {point(in)}), "set_currents");
    }),
    ENTRY(set_uniform_sphere, finite(set_uniform_sphere(coil_set(in), N, point(in)), "set_uniform_sphere")),
    ENTRY(set_inductance_matrix, finite(set_inductance_matrix(coil_set(in), N), "set_inductance_matrix")),
    ENTRY(set_force, { const CoilSet set = coil_set(in); finite(set_force(set, in.below(4)), "set_force"); }),
    ENTRY(set_torque, { const CoilSet set = coil_set(in); finite(set_torque(set, in.below(4)), "set_torque"); }),
    ENTRY(rig3_coils, finite(set_field(CoilSet(rig3_coils(N, N, N, static_cast<SetShape>(in.below(3)))), point(in)), "rig3_coils")),
    // the engine's own numerics, in their documented domain (p > 0, kc != 0, all finite)
    ENTRY(cel, {
        const double kc = N, p = N, a = N, b = N;
        if (std::isfinite(kc) && kc != 0.0 && std::isfinite(p) && p > 0.0 && std::isfinite(a) && std::isfinite(b))
            (void)internal::cel(kc, p, a, b);
    }),
};

#undef N
#undef ENTRY

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    FuzzInput in(data, size);
    const EntryPoint& entry = kEntryPoints[in.below(std::size(kEntryPoints))];
    try {
        entry.run(in);
    } catch (const DomainError&) {  // also SingularPointError
    } catch (const ConvergenceError&) {
    }
    return 0;
}
