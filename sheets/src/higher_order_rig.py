"""Demo scenario (invented): an eighth-order four-loop field rig for magnetometer calibration,
and what the real turns of one of its windings do to the field.

Requirement: 50 uT at the centre over a long axial stretch, loops of 0.3 m radius. The sheet
takes the four-loop design of equal radii (UNIFORM_COILS), compares its uniform stretch with a
Helmholtz pair's, then winds its inner loop as a layer winding and maps where the smooth
uniform-current model of that winding can be trusted (TURNS_MODEL_ERROR), with the axial current
of the helix (TURNS_BPHI) and what one missing turn does (TURNS_SENSITIVITY).
"""

TITLE = "Higher-order field rig"


def build(book):
    book.set_info(TITLE, "Coilwright example: an eighth-order four-loop rig and the real turns of its "
                         "winding (invented scenario).")
    s = book.sheet("Design")
    s.widths(A=86, B=34, C=18, D=96, F=20, G=24, H=24, I=24, J=24, K=24)
    s.text("A1", "Higher-order field rig (Coilwright example)", bold=True, size=14)
    s.text("A2", "Invented scenario: four loops of equal radius for 50 uT over a long stretch of axis. "
                 "Yellow cells are inputs; blue cells are computed.")

    s.header("A4", "Requirement and choices")
    s.input(5, "Target centre field", "target_uT", 50, "uT", "", fmt="0.0")
    s.input(6, "Loop radius", "radius", 0.3, "m", "all four loops", fmt="0.000")
    s.input(7, "Pairs", "pairs", 2, "", "2 pairs: 8th order (Bz - B0 grows as z^8)", fmt="0")
    s.input(8, "Uniformity budget", "tol", 0.0001, "", "allowed |Bz/B0 - 1| on the axis", fmt="0.0000")

    s.header("A10", "Design")
    s.result(11, "Field per ampere-turn of the inner loops", "b_per_at",
             "=STACK_BZ_ARRAY(UNIFORM_COILS(radius;pairs;1);0)", "T/A", "", fmt="0.000E+00")
    s.result(12, "Ampere-turns of the inner loops", "at_inner", "=target_uT*1E-6/b_per_at", "A", "", fmt="0.00")
    s.result(13, "Order of the design", "order", "=STACK_ORDER(coils)", "", "first derivative not nulled",
             fmt="0")
    s.result(14, "Uniform half-length, this design", "half_design", "=STACK_UNIFORM_Z(coils;tol)", "m", "",
             fmt="0.0000")
    s.result(15, "Uniform half-length, Helmholtz pair", "half_helmholtz",
             "=STACK_UNIFORM_Z_ARRAY(PAIR_COILS(radius;radius;0;1;at_inner);tol)", "m", "same radius", fmt="0.0000")
    s.result(16, "Gain in uniform length", "gain", "=half_design/half_helmholtz", "", "", fmt="0.00")
    s.check(17, "Centre field check", "ABS(STACK_BZ(coils;0)/(target_uT*1E-6)-1)<1E-9", "as required",
            "NOT THE TARGET")

    s.header("F4", "Coil table (one turn per row, current = ampere-turns)")
    for col, text in zip("FGHIJK", ("inner (m)", "outer (m)", "length (m)", "centre z (m)", "turns", "current (A)")):
        s.text(f"{col}5", text, bold=True)
    s.array("F6:K9", "=UNIFORM_COILS(radius;pairs;at_inner)", fmt="0.00000")
    s.define_name("coils", "F6:K9")

    s.header("A19", "Winding of an inner loop, turn by turn")
    s.input(20, "Former radius", "former", 0.29, "m", "the winding's inside", fmt="0.000")
    s.input(21, "Wire diameter over insulation", "wire_d", 0.0012, "m", "demo value", fmt="0.00000")
    s.input(22, "Turns per layer", "per_layer", 10, "", "", fmt="0")
    s.input(23, "Layers", "layers", 5, "", "odd: a net axial current remains", fmt="0")
    s.result(24, "Current per turn", "current", "=at_inner/(per_layer*layers)", "A", "", fmt="0.000")
    s.result(25, "Centre field of the real turns", "b_turns",
             "=TURNS_BZ(former;wire_d;per_layer;layers;current;0)", "T", "", fmt="0.000E+00")
    s.result(26, "Centre field of the smooth model", "b_smooth",
             "=COIL_BZ(former;former+layers*wire_d;per_layer*wire_d;per_layer*layers;current;0)", "T",
             "uniform current density", fmt="0.000E+00")
    s.result(27, "Model error at the centre", "err_centre",
             "=TURNS_MODEL_ERROR(former;wire_d;per_layer;layers;current;0)", "", "", fmt="0.00E+00")
    s.result(28, "Azimuthal field 10 mm outside the winding", "bphi",
             "=TURNS_BPHI(former;wire_d;per_layer;layers;current;0;former+layers*wire_d+0.01)", "T",
             "from the helix's net axial current", fmt="0.000E+00")
    s.result(29, "Centre field change, one missing turn", "d_missing",
             '=TURNS_SENSITIVITY(former;wire_d;per_layer;layers;current;1;1;"turns")', "T", "layer 1, turn 1",
             fmt="0.000E+00")

    s.header("A31", "Model error map: log10 |B_turns - B_smooth| / |B_smooth| across the bore")
    s.text("A32", "r (m)", bold=True)
    for col, z in zip("BCD", ("0", "per_layer*wire_d/2", "per_layer*wire_d*2")):
        s.formula(f"{col}32", f"={z}", fmt="0.0000", bold=True)
    n, first = 40, 33
    last = first + n - 1
    s.array(f"A{first}:A{last}", f"=(ROW(A{first}:A{last})-{first})/({n}-1)*(former-0.002)", fmt="0.0000")
    for col in "BCD":
        s.array(f"{col}{first}:{col}{last}",
                f"=LOG10(TURNS_MODEL_ERROR(former;wire_d;per_layer;layers;current;{col}32;A{first}:A{last}))",
                fmt="0.00")
    s.text("E32", "z of each column: the centre plane, the winding's end, twice as far", color=0x555555)

    s.cautions(last + 2, [
        "Coils heat: keep the windings under their insulation class. Interrupting the current of an inductor",
        "makes a voltage spike. Fields near implants: follow the applicable guidance. Follow local codes.",
    ])

    charts = book.sheet("Charts")
    charts.text("A1", "Higher-order field rig: charts (data on the Design sheet)", bold=True, size=12)
    charts.chart("errormap", "A3", (150, 95), f"Design.A32:D{last}",
                 "Real turns against the smooth model (one line per z in m)",
                 "r (m)", "log10 relative difference")
