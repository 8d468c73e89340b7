"""Demo scenario (invented): an opposed-current gradient pair for a particle-tracking bench.

Requirement: 0.5 T/m at the centre, linear within 5 % over +/-20 mm, from a 48 V supply, class H
insulation. Spacing for the most linear gradient, turns and current, linear region, forces
pushing the coils apart, inductance, heating, and the field and gradient along the axis.
"""

TITLE = "Gradient coil pair"


def build(book):
    book.set_info(TITLE, "Coilwright example: an anti-Helmholtz gradient pair (invented scenario).")
    s = book.sheet("Design")
    s.widths(A=80, B=34, C=18, D=96, F=20, G=24, H=24)
    s.text("A1", "Gradient coil pair (Coilwright example)", bold=True, size=14)
    s.text("A2", "Invented scenario: 0.5 T/m for a particle-tracking test bench. "
                 "Yellow cells are inputs; blue cells are computed.")

    s.header("A4", "Requirement and choices")
    s.input(5, "Target gradient at the centre", "target_g", 0.5, "T/m", "", fmt="0.000")
    s.input(6, "Required linear half-length", "need_half", 0.02, "m", "+/- this on the axis", fmt="0.000")
    s.input(7, "Allowed gradient deviation", "tol", 0.05, "", "fraction of the centre gradient", fmt="0.00")
    s.input(8, "Inner radius", "inner", 0.045, "m", "", fmt="0.0000")
    s.input(9, "Winding build (radial)", "build", 0.04, "m", "", fmt="0.0000")
    s.input(10, "Winding width (axial)", "width", 0.04, "m", "", fmt="0.0000")
    s.text("A11", "Wire gauge (AWG)")
    s.text("B11", "16", fill=0xFFF5CC)
    s.define_name("gauge", "B11")
    s.input(12, "Enamel thickness added to the diameter", "enamel", 0.00008, "m", "demo value", fmt="0.00000")
    s.input(13, "Supply voltage available", "supply_v", 48, "V", "", fmt="0.0")
    s.input(14, "Ambient temperature", "ambient", 25, "C", "", fmt="0.0")
    s.input(15, "Heat-transfer coefficient", "h_conv", 10, "W/(m^2 K)", "still air, common practice", fmt="0.0")
    s.text("A16", "Insulation thermal class")
    s.text("B16", "H", fill=0xFFF5CC)
    s.define_name("ins_class", "B16")

    s.header("A18", "Geometry and winding")
    s.result(19, "Outer radius", "outer", "=inner+build", "m", "", fmt="0.0000")
    s.result(20, "Most linear spacing (centre to centre)", "spacing", "=GRADPAIR_SPACING(inner;outer;width)", "m",
             "d3B/dz3 = 0 at the centre", fmt="0.00000")
    s.result(21, "Bare wire diameter", "wire_d", "=AWG_DIAMETER(gauge)", "m", "ASTM B258", fmt="0.000000")
    s.result(22, "Turns that fit each winding", "turns", '=WINDING_TURNS(build;width;wire_d+enamel;"hexagonal")', "",
             "orthocyclic packing", fmt="0")
    s.result(23, "Gradient per ampere", "g_per_a", "=GRADPAIR_GRADIENT(inner;outer;width;turns;1;spacing)", "T/(m A)",
             "", fmt="0.00000")
    s.result(24, "Current needed", "current", "=target_g/g_per_a", "A", "", fmt="0.000")

    s.header("F4", "Coil table")
    for col, text in zip("FGHIJK", ("inner (m)", "outer (m)", "length (m)", "centre z (m)", "turns", "current (A)")):
        s.text(f"{col}5", text, bold=True)
    for row, sign in ((6, "-"), (7, "")):
        for col, formula in zip("FGHIJK", ("=inner", "=outer", "=width", f"={sign}spacing/2", "=turns",
                                           f"={sign}current")):
            s.formula(f"{col}{row}", formula, fmt="0.00000", fill=0xE6F0FA)
    s.define_name("coils", "F6:K7")

    s.header("A26", "Gradient")
    s.result(27, "Centre gradient (check)", "g_centre", "=STACK_DNBZ(coils;1)", "T/m", "", fmt="0.00000")
    s.check(28, "Gradient check", "ABS(g_centre/target_g-1)<1E-9", "as required", "NOT THE TARGET")
    s.result(29, "Third derivative at the centre", "third_derivative", "=STACK_DNBZ(coils;3)", "T/m^3", "zero at this spacing",
             fmt="0.000E+00")
    s.result(30, "Linear half-length", "linear_half", "=STACK_LINEAR_Z(coils;tol)", "m", "", fmt="0.0000")
    s.check(31, "Linearity check", "linear_half>=need_half", "linear enough", "TOO SHORT")

    s.header("A33", "Budget")
    s.result(34, "Resistance at 20 C, per coil", "r_cold",
             '=COIL_RESISTANCE(turns;WINDING_MEAN_TURN(inner;outer);wire_d;"copper";20)', "ohm", "", fmt="0.000")
    s.result(35, "Cooling area, per coil", "area", "=COIL_COOLING_AREA(inner;outer;width)", "m^2", "", fmt="0.00000")
    s.result(36, "Steady winding temperature", "t_hot", "=COIL_HOT_TEMPERATURE(r_cold;current;area;ambient;h_conv)", "C",
             "", fmt="0.0")
    s.result(37, "Supply voltage, both coils in series", "v_total",
             "=2*COIL_VOLTAGE(COIL_HOT_RESISTANCE(r_cold;current;area;ambient;h_conv);current)", "V", "", fmt="0.00")
    s.check(38, "Supply check", "v_total<=supply_v", "supply suffices", "SUPPLY TOO SMALL")
    s.result(39, "Margin to the insulation class", "margin", "=INSULATION_MARGIN(ins_class;t_hot)", "K", "", fmt="0.0")
    s.check(40, "Temperature check", "margin>=0", "within class", "TOO HOT")
    s.result(41, "Inductance in series, opposed", "l_total", "=STACK_L(coils)", "H",
             "the opposed connection lowers it by 2M", fmt="0.0000E+00")
    s.result(42, "Stored energy", "energy", "=COIL_ENERGY(l_total;current)", "J", "", fmt="0.0000")
    s.result(43, "Force on the upper coil", "force",
             "=COIL_FZ(inner;outer;width;turns;current;inner;outer;width;turns;-current;spacing)", "N",
             "positive: the coils push apart; the former must hold it", fmt="0.000")

    s.header("F9", "Axial table")
    for col, text in zip("FGH", ("z (m)", "Bz (mT)", "dBz/dz (T/m)")):
        s.text(f"{col}10", text, bold=True)
    n, first = 61, 11
    last = first + n - 1
    s.array(f"F{first}:F{last}", f"=(ROW(F{first}:F{last})-{first})/({n}-1)*0.2-0.1", fmt="0.000")
    s.array(f"G{first}:G{last}", f"=STACK_BZ(coils;F{first}:F{last})*1000", fmt="0.000")
    s.array(f"H{first}:H{last}", f"=STACK_DNBZ(coils;1;F{first}:F{last})", fmt="0.0000")

    s.cautions(46, [
        "The coils push apart with the force above: the former and clamps must hold it. Coils heat: keep the",
        "winding under its insulation class. Opening the circuit at full current makes a flyback spike:",
        "use a flyback diode or a controlled ramp. The winding runs hot on an open bench (the temperature",
        "above): guard it against touch and keep it off flammable surfaces.",
    ])

    charts = book.sheet("Charts")
    charts.text("A1", "Gradient coil pair: charts (data on the Design sheet)", bold=True, size=12)
    charts.chart("field", "A3", (135, 85), f"Design.F10:G{last}", "Field along the axis", "z (m)", "Bz (mT)")
    charts.chart("gradient", "J3", (135, 85), [f"Design.F10:F{last}", f"Design.H10:H{last}"],
                 "Gradient along the axis", "z (m)", "dBz/dz (T/m)")
