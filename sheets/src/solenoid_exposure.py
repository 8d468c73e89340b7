"""Demo scenario (invented): a solenoid exposure coil for cell-culture dishes.

Requirement: 2.0 mT along a 150 mm sample zone within +/-2 %, from a 48 V laboratory supply,
class F insulation. A multilayer winding on a 120 mm former: wire, layers, resistance hot and
cold, power, temperature, inductance (exact current sheet and thick winding), energy, time
constant, and where the stray field falls below the site's limit for implant wearers (an input).
"""

TITLE = "Solenoid exposure coil"


def build(book):
    book.set_info(TITLE, "Coilwright example: a multilayer solenoid with its thermal and supply budget "
                         "(invented scenario).")
    s = book.sheet("Design")
    s.widths(A=80, B=34, C=18, D=100, F=20, G=24, H=24, I=24, J=24, K=24)
    s.text("A1", "Solenoid exposure coil (Coilwright example)", bold=True, size=14)
    s.text("A2", "Invented scenario: 2 mT over a 150 mm sample zone for cell-culture exposure. "
                 "Yellow cells are inputs; blue cells are computed.")

    s.header("A4", "Requirement and choices")
    s.input(5, "Target field at the centre", "target_mT", 2.0, "mT", "", fmt="0.000")
    s.input(6, "Sample zone half-length", "zone_half", 0.075, "m", "dishes sit within +/- this on the axis", fmt="0.000")
    s.input(7, "Allowed deviation over the zone", "tol", 0.02, "", "fraction of the centre field", fmt="0.000")
    s.input(8, "Former (inner) radius", "inner", 0.060, "m", "", fmt="0.0000")
    s.input(9, "Winding length", "length", 0.45, "m", "", fmt="0.000")
    s.text("A10", "Wire gauge (AWG)")
    s.text("B10", "17", fill=0xFFF5CC)
    s.define_name("gauge", "B10")
    s.input(11, "Enamel thickness added to the diameter", "enamel", 0.00008, "m", "demo value", fmt="0.00000")
    s.input(12, "Layers", "layers", 4, "", "whole layers, orthocyclic (hexagonal) packing", fmt="0")
    s.input(13, "Supply voltage available", "supply_v", 48, "V", "", fmt="0.0")
    s.input(14, "Ambient temperature", "ambient", 30, "C", "incubator room", fmt="0.0")
    s.input(15, "Heat-transfer coefficient", "h_conv", 8, "W/(m^2 K)", "still air, horizontal cylinder (common practice)", fmt="0.0")
    s.text("A16", "Insulation thermal class")
    s.text("B16", "F", fill=0xFFF5CC)
    s.define_name("ins_class", "B16")
    s.input(17, "SITE INPUT: field limit for implant wearers", "implant_mT", 0.5, "mT",
            "DEMO VALUE (common practice): enter the limit of your site's standard",
            fmt="0.00")

    s.header("A19", "Winding")
    s.result(20, "Bare wire diameter", "wire_d", "=AWG_DIAMETER(gauge)", "m", "ASTM B258", fmt="0.000000")
    s.result(21, "Wire diameter over enamel", "wire_od", "=wire_d+enamel", "m", "", fmt="0.000000")
    s.result(22, "Turns per layer", "per_layer", "=WINDING_TURNS_PER_LAYER(length;wire_od)", "", "", fmt="0")
    s.result(23, "Build of the winding", "build", '=WINDING_BUILD(layers*per_layer;length;wire_od;"hexagonal")', "m",
             "", fmt="0.00000")
    s.result(24, "Outer radius", "outer", "=inner+build", "m", "", fmt="0.00000")
    s.result(25, "Turns", "turns", "=layers*per_layer", "", "", fmt="0")
    s.result(26, "Centre field per ampere", "b_per_a", "=COIL_BZ(inner;outer;length;turns;1;0)", "T/A",
             "thick winding, uniform current density", fmt="0.0000E+00")
    s.result(27, "Current needed", "current", "=target_mT*1E-3/b_per_a", "A", "", fmt="0.000")
    s.result(28, "Current density in the copper", "j_cu", "=COIL_CURRENT_DENSITY(current;wire_d)/1E6", "A/mm^2", "",
             fmt="0.00")

    s.header("F4", "Coil table")
    for col, text in zip("FGHIJK", ("inner (m)", "outer (m)", "length (m)", "centre z (m)", "turns", "current (A)")):
        s.text(f"{col}5", text, bold=True)
    for col, formula in zip("FGHIJK", ("=inner", "=outer", "=length", "=0", "=turns", "=current")):
        s.formula(f"{col}6", formula, fmt="0.00000", fill=0xE6F0FA)
    s.define_name("coils", "F6:K6")

    s.header("A30", "Field over the sample zone")
    s.result(31, "Centre field", "b0", "=COIL_BZ(inner;outer;length;turns;current;0)", "T", "", fmt="0.000000E+00")
    s.result(32, "Field at the zone end (axis)", "b_end", "=COIL_BZ(inner;outer;length;turns;current;zone_half)", "T",
             "", fmt="0.000000E+00")
    s.result(33, "Field at the zone end, 20 mm off axis", "b_corner",
             "=COIL_B(inner;outer;length;turns;current;zone_half;0.02)", "T", "edge of a dish", fmt="0.000000E+00")
    s.result(34, "Uniform half-length on the axis", "uniform_half", "=STACK_UNIFORM_Z(coils;tol)", "m", "", fmt="0.0000")
    s.check(35, "Uniformity check", "uniform_half>=zone_half", "zone is uniform", "ZONE TOO LONG")

    s.header("A37", "Electrical and thermal budget")
    s.result(38, "Mean turn length", "mean_turn", "=WINDING_MEAN_TURN(inner;outer)", "m", "", fmt="0.0000")
    s.result(39, "Wire length", "wire_len", '=WINDING_WIRE_LENGTH(inner;length;wire_od;turns;"hexagonal")', "m", "",
             fmt="0.0")
    s.result(40, "Resistance at 20 C", "r_cold", '=COIL_RESISTANCE(turns;mean_turn;wire_d;"copper";20)', "ohm", "",
             fmt="0.000")
    s.result(41, "Cooling area", "area", "=COIL_COOLING_AREA(inner;outer;length)", "m^2", "outer surface and ends",
             fmt="0.0000")
    s.result(42, "Steady winding temperature", "t_hot", "=COIL_HOT_TEMPERATURE(r_cold;current;area;ambient;h_conv)",
             "C", "", fmt="0.0")
    s.result(43, "Hot resistance", "r_hot", "=COIL_HOT_RESISTANCE(r_cold;current;area;ambient;h_conv)", "ohm", "",
             fmt="0.000")
    s.result(44, "Supply voltage needed", "v_need", "=COIL_VOLTAGE(r_hot;current)", "V", "", fmt="0.00")
    s.check(45, "Supply check", "v_need<=supply_v", "supply suffices", "SUPPLY TOO SMALL")
    s.result(46, "Power", "power", "=COIL_POWER(r_hot;current)", "W", "", fmt="0.0")
    s.result(47, "Margin to the insulation class", "margin", "=INSULATION_MARGIN(ins_class;t_hot)", "K",
             "after a 10 K hot-spot allowance", fmt="0.0")
    s.check(48, "Temperature check", "margin>=0", "within class", "TOO HOT")
    s.result(49, "Largest current within the class", "i_max",
             "=COIL_MAX_CURRENT(r_cold;area;INSULATION_CLASS_LIMIT(ins_class)-10;ambient;h_conv)", "A", "", fmt="0.000")
    s.result(50, "Copper mass", "mass", "=WIRE_MASS(wire_d;wire_len)", "kg", "", fmt="0.00")

    s.header("A52", "Inductance and energy")
    s.result(53, "Inductance, thick winding", "l_coil", "=COIL_L(inner;outer;length;turns)", "H", "", fmt="0.00000E+00")
    s.result(54, "Inductance, current sheet at the mean radius", "l_sheet", "=SOLENOID_L((inner+outer)/2;length;turns)",
             "H", "exact current-sheet formula, for comparison", fmt="0.00000E+00")
    s.result(55, "Stored energy", "energy", "=COIL_ENERGY(l_coil;current)", "J", "", fmt="0.000")
    s.result(56, "Time constant L/R", "tau", "=COIL_TIME_CONSTANT(l_coil;r_hot)", "s", "", fmt="0.0000")
    s.result(57, "Magnetic pressure on the winding", "pressure", "=SOLENOID_PRESSURE((inner+outer)/2;length;turns;current)",
             "Pa", "", fmt="0.0")

    s.header("A59", "Stray field along the axis (site limit for implant wearers)")
    for row, z in zip(range(60, 64), (0.25, 0.35, 0.5, 0.75)):
        s.value(f"A{row}", z, "0.00")
        s.formula(f"B{row}", f"=COIL_B(inner;outer;length;turns;current;A{row})*1000", fmt="0.000", fill=0xE6F0FA)
        s.text(f"C{row}", "mT")
        s.formula(f"D{row}", f'=IF(B{row}>implant_mT;"above the site limit: keep implant wearers out";"below the site limit")')
    s.text("A64", "(z in m from the centre along the axis)", color=0x555555)

    s.header("F9", "Axial table")
    for col, text in zip("FGH", ("z (m)", "Bz (mT)", "B/B0 - 1 (%)")):
        s.text(f"{col}10", text, bold=True)
    n, first = 61, 11
    last = first + n - 1
    s.array(f"F{first}:F{last}", f"=(ROW(F{first}:F{last})-{first})/({n}-1)*1.2-0.6", fmt="0.000")
    s.array(f"G{first}:G{last}", f"=COIL_BZ(inner;outer;length;turns;current;F{first}:F{last})*1000", fmt="0.0000")
    s.array(f"H{first}:H{last}", f"=(G{first}:G{last}/(b0*1000)-1)*100", fmt="0.00")

    top = last + 3
    s.header(f"F{top}", "Cross-section map: |B| (mT), z down, r across")
    s.text(f"F{top + 1}", "z (m) \\ r (m)", bold=True)
    for j, r in enumerate([0.0, 0.02, 0.04, 0.05, 0.058]):
        s.value(f"{'GHIJK'[j]}{top + 1}", r, "0.000")
    zs = [0.0, 0.05, 0.1, 0.15, 0.2, 0.25, 0.3]
    for i, z in enumerate(zs):
        s.value(f"F{top + 2 + i}", z, "0.000")
    zr, rr = f"F{top + 2}:F{top + 1 + len(zs)}", f"G{top + 1}:K{top + 1}"
    s.array(f"G{top + 2}:K{top + 1 + len(zs)}", f"=COIL_B(inner;outer;length;turns;current;{zr};{rr})*1000", fmt="0.000")

    s.cautions(66, [
        "2 mT is above the demo limit for pacemakers and other implants (a site input): mark",
        "the area and keep implant wearers out (see the stray-field table). The coil dissipates power all",
        "the time it runs: check its temperature in service against the class and keep it off flammable",
        "surfaces; an incubator traps heat, so measure the winding's resistance rise there.",
        "Opening the circuit at full current makes a flyback spike: use a flyback diode or a controlled",
        "ramp.",
    ])

    charts = book.sheet("Charts")
    charts.text("A1", "Solenoid exposure coil: charts (data on the Design sheet)", bold=True, size=12)
    charts.chart("axial", "A3", (135, 85), f"Design.F10:G{last}", "Axial field of the exposure coil", "z (m)",
                 "Bz (mT)")
    charts.chart("map", "J3", (135, 85), f"Design.F{top + 1}:K{top + 1 + len(zs)}",
                 "Field magnitude inside the bore (one line per r in m)", "z (m)", "|B| (mT)")
