"""Demo scenario (invented): a Helmholtz calibration rig for magnetometer tests.

Requirement: 100 uT at the centre, uniform within 1000 ppm over a sphere of 50 mm radius, a
24 V bench supply, class B insulation. The sheet goes from that requirement to the winding, the supply, the
temperature, the inductance, the forces and the tolerances, with an axial table, an off-axis
uniformity map and their charts.
"""

TITLE = "Helmholtz calibration rig"


def build(book):
    book.set_info(TITLE, "Coilwright example: Helmholtz pair sized from a field requirement to winding, "
                         "supply and temperature (invented scenario).")
    s = book.sheet("Design")
    s.widths(A=80, B=34, C=18, D=100, F=20, G=24, H=24, I=24, J=24, K=24, L=24)
    s.text("A1", "Helmholtz calibration rig (Coilwright example)", bold=True, size=14)
    s.text("A2", "Invented scenario: a pair of thick coils giving 100 uT for magnetometer calibration. "
                 "Yellow cells are inputs; blue cells are computed.")

    s.header("A4", "Requirement and choices")
    s.input(5, "Target centre field", "target_uT", 100, "uT", "what the magnetometer needs", fmt="0.0")
    s.input(6, "Mean winding radius", "radius", 0.40, "m", "radius to the middle of the winding")
    s.input(7, "Winding build (radial depth)", "build", 0.016, "m", "", fmt="0.0000")
    s.input(8, "Winding width (axial)", "width", 0.016, "m", "", fmt="0.0000")
    s.text("A9", "Wire gauge (AWG)")
    s.text("B9", "20", fill=0xFFF5CC)
    s.define_name("gauge", "B9")
    s.text("D9", "ASTM B258 size; 4/0..1/0 may be typed as text", color=0x555555)
    s.input(10, "Enamel thickness added to the diameter", "enamel", 0.00007, "m", "from the wire's datasheet (demo value)", fmt="0.00000")
    s.input(11, "Uniformity budget", "tol_ppm", 1000, "ppm", "allowed ||B|/B0 - 1| over the test volume", fmt="0")
    s.input(12, "Required radius of the uniform sphere", "need_radius", 0.05, "m", "the calibration volume",
            fmt="0.000")
    s.input(13, "Supply voltage available", "supply_v", 24, "V", "bench supply, constant current", fmt="0.0")
    s.input(14, "Ambient temperature", "ambient", 25, "C", "", fmt="0.0")
    s.input(15, "Heat-transfer coefficient", "h_conv", 10, "W/(m^2 K)", "still air, common practice", fmt="0.0")
    s.text("A16", "Insulation thermal class")
    s.text("B16", "B", fill=0xFFF5CC)
    s.define_name("ins_class", "B16")
    s.text("D16", "IEC 60085 class of the enamel", color=0x555555)

    s.header("A18", "Geometry and winding")
    s.result(19, "Inner radius", "inner", "=radius-build/2", "m", "", fmt="0.0000")
    s.result(20, "Outer radius", "outer", "=radius+build/2", "m", "", fmt="0.0000")
    s.result(21, "Flattest spacing (centre to centre)", "spacing", "=PAIR_SPACING(inner;outer;width)", "m",
             "d2B/dz2 = 0 at the centre for these thick coils", fmt="0.00000")
    s.result(22, "Bare wire diameter", "wire_d", "=AWG_DIAMETER(gauge)", "m", "ASTM B258", fmt="0.000000")
    s.result(23, "Wire diameter over enamel", "wire_od", "=wire_d+enamel", "m", "", fmt="0.000000")
    s.result(24, "Turns that fit each winding", "turns", '=WINDING_TURNS(build;width;wire_od;"square")', "",
             "layer by layer, square packing", fmt="0")
    s.result(25, "Copper fill factor", "fill", "=WINDING_FILL(turns;wire_d;build;width)", "", "", fmt="0.000")
    s.result(26, "Centre field per ampere-turn", "b_per_at", "=PAIR_B0(inner;outer;width;1;1;spacing)", "T/A",
             "both coils, one turn each, 1 A", fmt="0.0000E+00")
    s.result(27, "Current needed", "current", "=target_uT*1E-6/(b_per_at*turns)", "A", "", fmt="0.0000")

    # The coil table every STACK_ function reads: one row per coil.
    s.header("F4", "Coil table")
    for col, text in zip("FGHIJK", ("inner (m)", "outer (m)", "length (m)", "centre z (m)", "turns", "current (A)")):
        s.text(f"{col}5", text, bold=True)
    for row, sign in ((6, "-"), (7, "")):
        for col, formula in zip("FGHIJK", ("=inner", "=outer", "=width", f"={sign}spacing/2", "=turns", "=current")):
            s.formula(f"{col}{row}", formula, fmt="0.00000" if col in "FGHI" else "0.0000", fill=0xE6F0FA)
    s.define_name("coils", "F6:K7")
    s.formula("F8", "=STACK_CHECK(coils)")

    s.header("A29", "Field and uniformity")
    s.result(30, "Centre field (check)", "b0", "=STACK_BZ(coils;0)", "T", "must equal the target", fmt="0.000000E+00")
    s.check(31, "Centre field check", "ABS(b0/(target_uT*1E-6)-1)<1E-9", "as required", "NOT THE TARGET")
    s.result(32, "Radius of the uniform sphere", "sphere", "=STACK_UNIFORM_SPHERE(coils;tol_ppm*1E-6)", "m",
             "||B|/B0 - 1| within the budget everywhere inside", fmt="0.0000")
    s.check(33, "Uniform volume check", "sphere>=need_radius", "large enough", "TOO SMALL")
    s.result(34, "Uniform half-length along the axis", "uniform_half", "=STACK_UNIFORM_Z(coils;tol_ppm*1E-6)", "m",
             "", fmt="0.0000")
    s.result(35, "Uniform radius in the centre plane", "uniform_r", "=STACK_UNIFORM_R(coils;tol_ppm*1E-6)", "m",
             "", fmt="0.0000")

    s.header("A36", "Electrical and thermal budget (per coil unless noted)")
    s.result(37, "Mean turn length", "mean_turn", "=WINDING_MEAN_TURN(inner;outer)", "m", "", fmt="0.0000")
    s.result(38, "Resistance at 20 C", "r_cold", '=COIL_RESISTANCE(turns;mean_turn;wire_d;"copper";20)', "ohm",
             "IEC 60028 copper", fmt="0.000")
    s.result(39, "Cooling area", "area", "=COIL_COOLING_AREA(inner;outer;width)", "m^2", "", fmt="0.0000")
    s.result(40, "Steady winding temperature", "t_hot", "=COIL_HOT_TEMPERATURE(r_cold;current;area;ambient;h_conv)",
             "C", "resistance rises with temperature: solved together", fmt="0.0")
    s.result(41, "Hot resistance", "r_hot", "=COIL_HOT_RESISTANCE(r_cold;current;area;ambient;h_conv)", "ohm", "", fmt="0.000")
    s.result(42, "Supply voltage, both coils in series", "v_total", "=2*COIL_VOLTAGE(r_hot;current)", "V", "", fmt="0.00")
    s.check(43, "Supply check", "v_total<=supply_v", "supply suffices", "SUPPLY TOO SMALL")
    s.result(44, "Power, both coils", "p_total", "=2*COIL_POWER(r_hot;current)", "W", "", fmt="0.00")
    s.result(45, "Current density in the copper", "j_cu", "=COIL_CURRENT_DENSITY(current;wire_d)/1E6", "A/mm^2", "", fmt="0.00")
    s.result(46, "Margin to the insulation class", "margin", "=INSULATION_MARGIN(ins_class;t_hot)", "K",
             "after a 10 K hot-spot allowance", fmt="0.0")
    s.check(47, "Temperature check", "margin>=0", "within class", "TOO HOT")
    s.result(48, "Copper mass, both coils", "mass",
             '=2*WIRE_MASS(wire_d;WINDING_WIRE_LENGTH(inner;width;wire_od;turns;"square"))', "kg", "", fmt="0.00")

    s.header("A50", "Inductance, energy, forces")
    s.result(51, "Inductance of the pair in series", "l_total", "=STACK_L(coils)", "H", "", fmt="0.0000E+00")
    s.result(52, "Stored energy", "energy", "=COIL_ENERGY(l_total;current)", "J", "", fmt="0.000E+00")
    s.result(53, "Time constant L/R", "tau", "=COIL_TIME_CONSTANT(l_total;2*r_hot)", "s", "", fmt="0.000E+00")
    s.result(54, "Axial force between the coils", "force",
             "=COIL_FZ(inner;outer;width;turns;current;inner;outer;width;turns;current;spacing)", "N",
             "on the upper coil; negative: the coils attract", fmt="0.000E+00")

    # Axial table and chart.
    s.header("F10", "Axial table")
    for col, text in zip("FGH", ("z (m)", "Bz (uT)", "B/B0 - 1 (ppm)")):
        s.text(f"{col}11", text, bold=True)
    n, first = 61, 12
    last = first + n - 1
    s.array(f"F{first}:F{last}", f"=(ROW(F{first}:F{last})-{first})/({n}-1)*0.6-0.3", fmt="0.000")
    s.array(f"G{first}:G{last}", f"=STACK_BZ(coils;F{first}:F{last})*1E6", fmt="0.0000")
    s.array(f"H{first}:H{last}", f"=(G{first}:G{last}/(b0*1E6)-1)*1E6", fmt="0.0")

    # Off-axis uniformity map: deviation of |B| in ppm, z down, r across.
    top = last + 3
    s.header(f"F{top}", "Off-axis map: |B|/B0 - 1 (ppm), z down, r across")
    s.text(f"F{top + 1}", "z (m) \\ r (m)", bold=True)
    rs = [0.0, 0.025, 0.05, 0.075, 0.1]
    for j, r in enumerate(rs):
        s.value(f"{'GHIJK'[j]}{top + 1}", r, "0.000")
    zs = [-0.1 + 0.025 * i for i in range(9)]
    for i, z in enumerate(zs):
        s.value(f"F{top + 2 + i}", round(z, 3), "0.000")
    zr, rr = f"F{top + 2}:F{top + 1 + len(zs)}", f"G{top + 1}:K{top + 1}"
    s.array(f"G{top + 2}:K{top + 1 + len(zs)}", f"=(STACK_B(coils;{zr};{rr})/b0-1)*1E6", fmt="0")

    # Tolerance sensitivity: one array formula gives the matrix (rows: coils; columns: what is in error).
    sens = top + 12
    s.header(f"F{sens}", "Tolerances: change of B0 per mm or per turn (ppm)")
    for col, text in zip("GHI", ("radius /mm", "position /mm", "turns /turn")):
        s.text(f"{col}{sens + 1}", text, bold=True)
    s.text(f"F{sens + 2}", "lower coil")
    s.text(f"F{sens + 3}", "upper coil")
    s.array(f"G{sens + 2}:I{sens + 3}",
            '=STACK_SENSITIVITY(coils;{1|2};{"radius";"position";"turns"})/b0*1E6*{1E-3;1E-3;1}', fmt="0.0")

    s.cautions(62, [
        "Coils heat: keep the winding under its insulation class (IEC 60085); the temperature here is a",
        "first estimate for still air. Switching the supply off under load makes a flyback voltage: use a",
        "supply with a controlled ramp or a flyback diode. Fields here are small, but keep strong fields",
        "away from pacemakers and other implants, below the limit the standard at your site sets.",
    ])

    charts = book.sheet("Charts")
    charts.text("A1", "Helmholtz calibration rig: charts (data on the Design sheet)", bold=True, size=12)
    charts.chart("axial", "A3", (135, 85), f"Design.F11:G{last}", "Axial field of the rig", "z (m)", "Bz (uT)")
    charts.chart("map", "J3", (135, 85), f"Design.F{top + 1}:K{top + 1 + len(zs)}",
                 "Uniformity across the working volume (one line per r in m)", "z (m)", "|B|/B0 - 1 (ppm)")
