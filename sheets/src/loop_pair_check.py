"""Demo scenario (invented): a bench check coil for a fluxgate magnetometer.

Two 150 mm loops of 20 turns, spaced one radius apart (Helmholtz spacing), fed 0.5 A by a
bench supply. The sheet computes the centre field, an axial table, an off-axis map and the
uniformity, all with LOOP_BZ / LOOP_BR array formulas.
"""

TITLE = "Loop pair check coil"


def build(book):
    book.set_info(TITLE, "Coilwright demo: a two-loop check coil for a bench magnetometer (invented scenario).")
    s = book.sheet("Design")
    s.widths(A=58, B=30, C=16, D=95, F=22, G=26, H=26, I=26, J=26, K=26)
    s.text("A1", "Loop pair check coil (Coilwright demo)", bold=True, size=14)
    s.text("A2", "Invented scenario: two thin loops at Helmholtz spacing for a bench magnetometer check.")

    s.header("A4", "Inputs")
    s.input(5, "Loop radius", "radius", 0.150, "m", "mean radius of each loop")
    s.input(6, "Turns per loop", "turns", 20, "", "", fmt="0")
    s.input(7, "Current", "current", 0.5, "A", "bench supply, constant current")
    s.input(8, "Spacing between loop planes", "spacing", 0.150, "m", "equal to the radius: Helmholtz spacing")
    s.input(9, "Uniformity budget", "budget_ppm", 1000, "ppm", "allowed |B/B0 - 1| over the test volume", fmt="0")
    s.input(10, "Test volume half-length", "half_length", 0.02, "m", "sensor travel along the axis")

    s.header("A12", "Results")
    s.result(13, "Centre field B0", "b0",
             "=LOOP_BZ(radius;turns;current;spacing/2)+LOOP_BZ(radius;turns;current;-spacing/2)",
             "T", "sum of both loops at z = 0", fmt="0.000000E+00")
    s.result(14, "Centre field B0", None, "=b0*1E6", "uT", "", fmt="0.000")
    s.result(15, "Helmholtz textbook value", "b_helmholtz",
             "=(4/5)^1.5*1.25663706127E-6*turns*current/radius", "T",
             "(4/5)^(3/2) mu0 N I / R, valid at exact Helmholtz spacing", fmt="0.000000E+00")
    s.result(16, "Field at the test-volume end", "b_end",
             "=LOOP_BZ(radius;turns;current;half_length-spacing/2)+LOOP_BZ(radius;turns;current;half_length+spacing/2)",
             "T", "", fmt="0.000000E+00")
    s.result(17, "Axial non-uniformity at the end", "dev_ppm", "=(b_end/b0-1)*1E6", "ppm", "", fmt="0.0")
    s.check(18, "Uniformity check", "ABS(dev_ppm)<=budget_ppm", "within budget", "OUT OF BUDGET",
            "compares the end-of-travel deviation with the budget")

    # Axial table: one array formula per column.
    s.header("F4", "Axial table")
    for col, text in zip("FGH", ("z (m)", "Bz (uT)", "B/B0 - 1 (ppm)")):
        s.text(f"{col}5", text, bold=True)
    n = 41
    first, last = 6, 6 + n - 1
    s.array(f"F{first}:F{last}", f"=(ROW(F{first}:F{last})-{first})/({n}-1)*2*radius-radius", fmt="0.000")
    s.array(f"G{first}:G{last}",
            f"=(LOOP_BZ(radius;turns;current;F{first}:F{last}-spacing/2)"
            f"+LOOP_BZ(radius;turns;current;F{first}:F{last}+spacing/2))*1E6", fmt="0.0000")
    s.array(f"H{first}:H{last}", f"=(G{first}:G{last}/(b0*1E6)-1)*1E6", fmt="0.0")
    s.chart("axial", "A21", (150, 85), f"F5:G{last}", "Axial field of the loop pair", "z (m)", "Bz (uT)")

    # Off-axis map: z down, r across.
    map_row = last + 3
    s.header(f"F{map_row}", "Off-axis map: Bz (uT), z down, r across")
    rs = [0.0, 0.02, 0.04, 0.06]
    for j, r in enumerate(rs):
        s.value(f"{'GHIJ'[j]}{map_row + 1}", r, "0.000")
    zs = [-0.04, -0.02, 0.0, 0.02, 0.04]
    for i, z in enumerate(zs):
        s.value(f"F{map_row + 2 + i}", z, "0.000")
    zr = f"F{map_row + 2}:F{map_row + 1 + len(zs)}"
    rr = f"G{map_row + 1}:J{map_row + 1}"
    s.array(f"G{map_row + 2}:J{map_row + 1 + len(zs)}",
            f"=(LOOP_BZ(radius;turns;current;{zr}-spacing/2;{rr})+LOOP_BZ(radius;turns;current;{zr}+spacing/2;{rr}))*1E6",
            fmt="0.0000")

    s.cautions(40, [
        "Fields of this size are harmless, but the same sheet scales to strong coils: keep fields near",
        "pacemakers and other implants below the limits of the standard your site applies.",
        "Coils heat; check the winding against its insulation class. Interrupting the current of a coil",
        "makes a voltage spike: use a flyback path.",
    ])
