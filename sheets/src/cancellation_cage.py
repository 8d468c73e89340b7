"""Demo scenario (invented): a three-axis cancellation cage of square coils around a sensor.

Requirement: cancel a measured ambient field (about 46 uT, tilted) inside a 0.2 m cube around a
sensor to within 1 % of the ambient field. Three orthogonal pairs of square coils (RIG3_COILS),
the three currents from the measured field (SET_CURRENTS), the residual field map over the
volume, power and voltage per axis, the coupling between the axes (SET_LMATRIX), cautions.
"""

TITLE = "Field-cancellation cage"

COLS = "FGHIJKLMNOPQR"  # the 13 columns of a coil set
GRID = [(-0.1 + 0.025 * i) for i in range(9)]


def build(book):
    book.set_info(TITLE, "Coilwright example: a three-axis cancellation cage of square coils (invented scenario).")
    s = book.sheet("Design")
    s.widths(A=74, B=30, C=18, D=70, E=16)
    s.text("A1", "Three-axis field-cancellation cage (Coilwright example)", bold=True, size=14)
    s.text("A2", "Invented scenario: null the ambient field around a sensor. "
                 "Yellow cells are inputs; blue cells are computed.")

    s.header("A4", "Requirement and choices")
    s.input(5, "Ambient field measured at the sensor, x", "amb_x", 18.5, "uT", "with the cage off", fmt="0.00")
    s.input(6, "Ambient field, y", "amb_y", -3.2, "uT", "", fmt="0.00")
    s.input(7, "Ambient field, z", "amb_z", -42.8, "uT", "", fmt="0.00")
    s.input(8, "Sensor volume: half the side of the cube", "half", 0.1, "m", "centred in the cage", fmt="0.000")
    s.input(9, "Allowed residual in the volume", "allowed", 0.01, "", "fraction of the ambient field", fmt="0.000")
    s.input(10, "Cage size: side of the outer (x) pair", "cage_size", 1.2, "m", "y and z pairs 0.9 and 0.81 of it",
            fmt="0.000")
    s.input(11, "Turns per coil", "turns", 30, "", "", fmt="0")
    s.text("A12", "Wire gauge (AWG)")
    s.text("B12", "18", fill=0xFFF5CC)
    s.define_name("gauge", "B12")
    s.input(13, "Supply voltage per axis", "supply_v", 12, "V", "one channel per axis", fmt="0.0")

    s.header("A15", "Currents that cancel the ambient field at the centre")
    for row, axis in ((16, "x"), (17, "y"), (18, "z")):
        s.text(f"A{row}", f"Current, {axis} pair")
        s.text(f"C{row}", "A")
    s.array("B16:B18", "=SET_CURRENTS(rig;-amb_x*1E-6;-amb_y*1E-6;-amb_z*1E-6)", fmt="0.0000")
    s.format("B16:B18", "0.0000")
    for row in (16, 17, 18):
        s.cell(f"B{row}").CellBackColor = 0xE6F0FA
    s.define_name("currents", "B16:B18")
    s.result(19, "Residual at the centre", "res_centre",
             "=SQRT((SET_BX(cage;0;0;0)+amb_x*1E-6)^2+(SET_BY(cage;0;0;0)+amb_y*1E-6)^2+"
             "(SET_BZ(cage;0;0;0)+amb_z*1E-6)^2)*1E9", "nT", "zero up to rounding", fmt="0.000000")
    s.result(20, "Ambient field magnitude", "amb_mag", "=SQRT(amb_x^2+amb_y^2+amb_z^2)", "uT", "", fmt="0.00")
    s.result(21, "Worst residual in the sensor volume (map)", "res_worst", f"=MAX(F25:N33)", "nT",
             "over the map in the mid-plane", fmt="0.0")
    s.result(22, "Worst residual on the volume's corners", "res_corner", "=MAX(T25:T32)", "nT",
             "the eight corners of the cube", fmt="0.0")
    s.result(23, "Allowed residual", "res_allowed", "=allowed*amb_mag*1000", "nT", "", fmt="0.0")
    s.check(24, "Residual check", "MAX(res_worst;res_corner)<=res_allowed", "cancelled well enough",
            "RESIDUAL TOO LARGE")
    s.result(25, "Sphere where the cage's field is uniform to the allowed fraction", "sphere",
             "=SET_UNIFORM_SPHERE(cage;allowed)", "m", "radius around the centre", fmt="0.000")

    s.header("A27", "Wire, power and voltage per axis (both coils of a pair in series)")
    s.result(28, "Bare wire diameter", "wire_d", "=AWG_DIAMETER(gauge)", "m", "ASTM B258", fmt="0.000000")
    for row, axis, set_row in ((29, "x", 6), (32, "y", 8), (35, "z", 10)):
        s.result(row, f"Resistance of the {axis} pair at 20 C", f"r_{axis}",
                 f"=WIRE_RESISTANCE(wire_d;2*turns*4*M{set_row})", "ohm", "sharp-cornered square turns", fmt="0.000")
        s.result(row + 1, f"Voltage, {axis} pair", f"v_{axis}", f"=ABS(INDEX(currents;{(row - 29) // 3 + 1}))*r_{axis}",
                 "V", "", fmt="0.000")
        s.result(row + 2, f"Power, {axis} pair", f"p_{axis}", f"=INDEX(currents;{(row - 29) // 3 + 1})^2*r_{axis}", "W",
                 "", fmt="0.000")
    s.check(38, "Supply check", "MAX(v_x;v_y;v_z)<=supply_v", "supply suffices", "SUPPLY TOO SMALL")

    s.header("A40", "Coupling between the axes")
    s.header("K36", "Inductance matrix per circuit (H)")
    for col, text in zip("KLM", ("x", "y", "z")):
        s.text(f"{col}37", text, bold=True)
    s.array("K38:M40", "=SET_LMATRIX(rig;wire_d)", fmt="0.000E+00")
    s.define_name("lmatrix", "K38:M40")
    s.text("A41", "Inductance matrix per circuit: at K38 (x, y, z)")
    s.result(42, "Largest coupling coefficient between two axes", "coupling",
             "=ROUND(MAX(ABS(L38)/SQRT(K38*L39);ABS(M38)/SQRT(K38*M40);ABS(M39)/SQRT(L39*M40));12)", "",
             "orthogonal pairs: zero by symmetry (rounded to 1e-12: below it the computed value is rounding)",
             fmt="0.0E+00")
    s.result(43, "Stored energy at the cancelling currents", "energy",
             "=0.5*SUMPRODUCT(MMULT(lmatrix;currents);currents)", "J", "", fmt="0.000E+00")

    s.header("F4", "Coil set of the rig (RIG3_COILS, 1 A per turn)")
    headers = ("shape", "centre x", "centre y", "centre z", "axis x", "axis y", "axis z", "width (m)", "height (m)",
               "roll", "turns", "current (A)", "circuit")
    for col, text in zip(COLS, headers):
        s.text(f"{col}5", text, bold=True)
    s.array("F6:R11", '=RIG3_COILS(cage_size;turns;1;"square")', fmt="0.0000")
    s.define_name("rig", "F6:R11")

    s.header("F13", "The cage at the cancelling currents (current column from the currents above)")
    for col, text in zip(COLS, headers):
        s.text(f"{col}14", text, bold=True)
    for r in range(6):
        for k, col in enumerate(COLS):
            if col == "Q":
                s.formula(f"Q{15 + r}", f"=INDEX(currents;R{15 + r})", fmt="0.0000", fill=0xE6F0FA)
            else:
                s.formula(f"{col}{15 + r}", f"={col}{6 + r}", fmt="0.0000", fill=0xE6F0FA)
    s.define_name("cage", "F15:R20")

    s.header("E23", "Residual |B| (nT) in the mid-plane z = 0: x across, y down")
    for j, x in enumerate(GRID):
        s.value(f"{COLS[j]}24", x, fmt="0.000")
    for i, y in enumerate(GRID):
        s.value(f"E{25 + i}", y, fmt="0.000")
    field = "(SET_B{c}(cage;F24:N24;E25:E33;0)+amb_{a}*1E-6)^2"
    s.array("F25:N33", "=SQRT(" + "+".join(field.format(c=c, a=a) for c, a in (("X", "x"), ("Y", "y"), ("Z", "z")))
            + ")*1E9", fmt="0.0")

    s.header("P23", "Corners of the sensor volume")
    for k, col in enumerate("PQRS"):
        s.text(f"{col}24", ("x (m)", "y (m)", "z (m)", "")[k], bold=True)
    s.text("T24", "residual (nT)", bold=True)
    for c in range(8):
        row = 25 + c
        for k, col in enumerate("PQR"):
            s.formula(f"{col}{row}", f"={'-' if (c >> k) & 1 else ''}half", fmt="0.000")
        fields = "+".join(f"(SET_B{a.upper()}(cage;P{row};Q{row};R{row})+amb_{a}*1E-6)^2" for a in "xyz")
        s.formula(f"T{row}", f"=SQRT({fields})*1E9", fmt="0.0", fill=0xE6F0FA)

    s.header("F36", "Residual |B| (nT) along the axes through the centre")
    for col, text in zip("FGHI", ("position (m)", "along x", "along y", "along z")):
        s.text(f"{col}37", text, bold=True)
    n, first = 41, 38
    last = first + n - 1
    s.array(f"F{first}:F{last}", f"=(ROW(F{first}:F{last})-{first})/({n}-1)*0.4-0.2", fmt="0.000")
    pos = f"F{first}:F{last}"
    for col, point in (("G", f"{pos};0;0"), ("H", f"0;{pos};0"), ("I", f"0;0;{pos}")):
        fields = "+".join(f"(SET_B{a.upper()}(cage;{point})+amb_{a}*1E-6)^2" for a in "xyz")
        s.array(f"{col}{first}:{col}{last}", f"=SQRT({fields})*1E9", fmt="0.0")

    s.cautions(48, [
        "The residual map assumes the ambient field is uniform over the cage; steel nearby (desks, racks,",
        "reinforcement) bends it: measure at several points with the cage off, and again with it on.",
        "The ambient field drifts (traffic, lifts, the day's variation): a fixed current cancels one moment.",
        "Coils heat; keep the winding under its insulation class. Switching the current of a large cage",
        "makes a voltage spike: ramp it or provide a flyback path.",
    ])

    charts = book.sheet("Charts")
    charts.text("A1", "Field-cancellation cage: charts (data on the Design sheet)", bold=True, size=12)
    charts.chart("residual", "A3", (160, 95), f"Design.F37:I{last}", "Residual field along the axes",
                 "position from the centre (m)", "|B| residual (nT)")
