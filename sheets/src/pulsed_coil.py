"""Demo scenario (invented): a pulsed multilayer coil for a magnetic-sensor test stand.

Requirement: 50 mT pulses at the centre of a 40 mm bore, uniform to 1 % over an 8 mm sensor,
50 ms flat top once every 2 s, from a current-regulated driver with 48 V of compliance and a
100 V clamp for turn-off. The sheet sizes the winding, then follows one pulse: rise and fall
times, stored energy against the clamp's rating, the clamp voltage against the insulation's voltage
rating, heat per pulse (adiabatic) and on average, the warm-up, the hot spot by conduction through the
winding, the force that presses the two halves of the winding together, and the stray field against
the site's limit for implant wearers.
"""

TITLE = "Pulsed test coil"


def build(book):
    book.set_info(TITLE, "Coilwright example: a multilayer coil driven in pulses (invented scenario).")
    s = book.sheet("Design")
    s.widths(A=82, B=34, C=20, D=100, F=22, G=24, H=24, I=24, J=24, K=24)
    s.text("A1", "Pulsed test coil (Coilwright example)", bold=True, size=14)
    s.text("A2", "Invented scenario: 50 mT pulses for a sensor test stand (8 mm sensor). "
                 "Yellow cells are inputs; blue cells are computed.")

    s.header("A4", "Requirement and choices")
    s.input(5, "Target field at the centre (flat top)", "target_mT", 50, "mT", "", fmt="0.0")
    s.input(6, "Sensor half-length along the axis", "sensor_half", 0.004, "m", "", fmt="0.000")
    s.input(7, "Allowed deviation over the sensor", "tol", 0.01, "", "fraction of the centre field", fmt="0.000")
    s.input(8, "Former (inner) radius", "inner", 0.020, "m", "", fmt="0.0000")
    s.input(9, "Winding length", "length", 0.060, "m", "", fmt="0.000")
    s.text("A10", "Wire gauge (AWG)")
    s.text("B10", "20", fill=0xFFF5CC)
    s.define_name("gauge", "B10")
    s.input(11, "Enamel thickness added to the diameter", "enamel", 0.00006, "m", "demo value", fmt="0.00000")
    s.input(12, "Layers", "layers", 8, "", "whole layers, orthocyclic (hexagonal) packing", fmt="0")
    s.input(13, "Driver compliance voltage", "supply_v", 48, "V", "current-regulated driver", fmt="0.0")
    s.input(14, "Flat-top length", "t_flat", 0.05, "s", "", fmt="0.000")
    s.input(15, "Pulse period", "period", 2, "s", "one pulse every", fmt="0.00")
    s.input(16, "Turn-off clamp voltage", "clamp_v", 100, "V", "suppressor across the coil", fmt="0.0")
    s.input(17, "Clamp energy rating per pulse", "clamp_j", 5, "J", "from the suppressor's data sheet (demo value)",
            fmt="0.00")
    s.input(18, "Ambient temperature", "ambient", 25, "C", "", fmt="0.0")
    s.input(19, "Heat-transfer coefficient", "h_conv", 10, "W/(m^2 K)", "still room air (common practice)", fmt="0.0")
    s.text("A20", "Insulation thermal class")
    s.text("B20", "F", fill=0xFFF5CC)
    s.define_name("ins_class", "B20")
    s.input(21, "Specific heat of copper", "c_cu", 385, "J/(kg K)",
            "pure copper, 300 K (Incropera, Heat and Mass Transfer, table A.1)", fmt="0")
    s.input(22, "SITE INPUT: field limit for implant wearers", "implant_mT", 0.5, "mT",
            "DEMO VALUE (common practice): enter the limit of your site's standard",
            fmt="0.00")
    s.input(23, "Voltage rating of the winding's insulation", "ins_v", 500, "V",
            "wire or former data sheet (demo value)", fmt="0")

    s.header("A24", "Winding")
    s.result(25, "Bare wire diameter", "wire_d", "=AWG_DIAMETER(gauge)", "m", "ASTM B258", fmt="0.000000")
    s.result(26, "Wire diameter over enamel", "wire_od", "=wire_d+enamel", "m", "", fmt="0.000000")
    s.result(27, "Turns per layer", "per_layer", "=WINDING_TURNS_PER_LAYER(length;wire_od)", "", "", fmt="0")
    s.result(28, "Turns", "turns", "=layers*per_layer", "", "", fmt="0")
    s.result(29, "Build of the winding", "build", '=WINDING_BUILD(turns;length;wire_od;"hexagonal")', "m", "",
             fmt="0.00000")
    s.result(30, "Outer radius", "outer", "=inner+build", "m", "", fmt="0.00000")
    s.result(31, "Centre field per ampere", "b_per_a", "=COIL_BZ(inner;outer;length;turns;1;0)", "T/A",
             "thick winding, uniform current density", fmt="0.0000E+00")
    s.result(32, "Flat-top current", "i_set", "=target_mT*1E-3/b_per_a", "A", "", fmt="0.000")
    s.result(33, "Current density in the copper", "j_cu", "=COIL_CURRENT_DENSITY(i_set;wire_d)/1E6", "A/mm^2",
             "during the pulse", fmt="0.00")

    # The winding as two halves, so the table also gives the force between them.
    s.header("F4", "Coil table (the winding as two halves)")
    for col, text in zip("FGHIJK", ("inner (m)", "outer (m)", "length (m)", "centre z (m)", "turns", "current (A)")):
        s.text(f"{col}5", text, bold=True)
    for row, centre in ((6, "=-length/4"), (7, "=length/4")):
        for col, formula in zip("FGHIJK", ("=inner", "=outer", "=length/2", centre, "=turns/2", "=i_set")):
            s.formula(f"{col}{row}", formula, fmt="0" if col == "J" else "0.00000", fill=0xE6F0FA)
    s.define_name("coils", "F6:K7")

    s.header("A35", "Field over the sensor")
    s.result(36, "Centre field", "b0", "=STACK_BZ(coils;0)", "T", "", fmt="0.000000E+00")
    s.result(37, "Uniform half-length on the axis", "uniform_half", "=STACK_UNIFORM_Z(coils;tol)", "m", "",
             fmt="0.0000")
    s.check(38, "Uniformity check", "uniform_half>=sensor_half", "sensor is covered", "SENSOR TOO LONG")

    s.header("A40", "One pulse")
    s.result(41, "Mean turn length", "mean_turn", "=WINDING_MEAN_TURN(inner;outer)", "m", "", fmt="0.0000")
    s.result(42, "Wire length", "wire_len", '=WINDING_WIRE_LENGTH(inner;length;wire_od;turns;"hexagonal")', "m", "",
             fmt="0.0")
    s.result(43, "Resistance at 20 C", "r_cold", '=COIL_RESISTANCE(turns;mean_turn;wire_d;"copper";20)', "ohm", "",
             fmt="0.000")
    s.result(44, "Inductance", "l_coil", "=COIL_L(inner;outer;length;turns)", "H", "thick winding", fmt="0.00000E+00")
    s.result(45, "Time constant L/R (cold)", "tau", "=COIL_TIME_CONSTANT(l_coil;r_cold)", "s", "", fmt="0.000E+00")
    # With the driver at its compliance voltage V: L di/dt = V - R i, so i reaches i_set after
    # tau ln(V / (V - R i_set)); a clamp of voltage Vc takes it back to 0 in tau ln(1 + R i_set / Vc).
    s.result(46, "Rise time to the flat top", "t_rise",
             "=IF(i_set*r_cold<supply_v;-tau*LN(1-i_set*r_cold/supply_v);NA())", "s",
             "driver at its compliance voltage, cold winding", fmt="0.000E+00")
    s.result(47, "Fall time through the clamp", "t_fall", "=tau*LN(1+i_set*r_cold/clamp_v)", "s", "",
             fmt="0.000E+00")
    s.result(48, "Stored energy at the flat top", "energy", "=COIL_ENERGY(l_coil;i_set)", "J",
             "the clamp takes most of it at every turn-off", fmt="0.0000")
    s.check(49, "Clamp check", "energy<=clamp_j", "clamp rating suffices", "CLAMP TOO SMALL")
    s.result(50, "Flat-top voltage (hot)", "v_flat", "=COIL_VOLTAGE(r_hot;i_set)", "V", "", fmt="0.00")
    s.check(51, "Driver check", "v_flat<supply_v", "compliance suffices", "DRIVER TOO WEAK")
    s.result(52, "Voltage across the winding at turn-off", "v_off", "=clamp_v", "V",
             "the clamp holds L di/dt there", fmt="0.0")
    s.check(53, "Insulation voltage check", "v_off<=ins_v", "rating suffices", "INSULATION TOO WEAK",
            "clamp voltage against the rating")

    s.header("A55", "Heating")
    s.result(56, "RMS current (upper bound)", "i_rms", "=i_set*SQRT((t_rise+t_flat+t_fall)/period)", "A",
             "full current from switch-on to the end of the fall", fmt="0.000")
    s.result(57, "Cooling area", "area", "=COIL_COOLING_AREA(inner;outer;length)", "m^2", "outer surface and ends",
             fmt="0.00000")
    s.result(58, "Steady winding temperature", "t_hot", "=COIL_HOT_TEMPERATURE(r_cold;i_rms;area;ambient;h_conv)",
             "C", "pulses averaged", fmt="0.0")
    s.result(59, "Hot resistance", "r_hot", "=COIL_HOT_RESISTANCE(r_cold;i_rms;area;ambient;h_conv)", "ohm", "",
             fmt="0.000")
    s.result(60, "Copper mass", "mass", "=WIRE_MASS(wire_d;wire_len)", "kg", "", fmt="0.000")
    s.result(61, "Heat capacity of the copper", "heat_cap", "=mass*c_cu", "J/K", "former and varnish left out",
             fmt="0.0")
    s.result(62, "Winding temperature 10 minutes after the start", "t_10min",
             "=COIL_TEMPERATURE_AT_TIME(r_cold;i_rms;area;heat_cap;600;ambient;h_conv)", "C",
             "from cold, pulses averaged", fmt="0.0")
    s.result(63, "Heat of one pulse (upper bound)", "e_pulse", "=i_set^2*r_hot*(t_rise+t_flat+t_fall)", "J", "",
             fmt="0.00")
    s.result(64, "Temperature step within one pulse", "dt_pulse",
             "=COIL_PULSE_TEMPERATURE_RISE(r_cold;i_set;t_rise+t_flat+t_fall;heat_cap;t_hot)", "K",
             "adiabatic, from the steady temperature", fmt="0.000")
    s.input(65, "Radial thermal conductivity of the winding", "k_wind", 0.7, "W/(m K)",
            "demo; varnished round wire measures 0.5 to 1", fmt="0.00")
    s.result(66, "Hot spot above the winding's surface", "hotspot",
             "=COIL_HOTSPOT_RISE(inner;outer;length;i_rms^2*r_hot;k_wind)", "K",
             "conduction to the outer surface", fmt="0.00")
    s.result(67, "Margin to the insulation class", "margin", "=INSULATION_MARGIN(ins_class;t_hot+dt_pulse;hotspot)",
             "K", "hottest point: steady + one pulse + hot spot", fmt="0.0")
    s.check(68, "Temperature check", "margin>=0", "within class", "TOO HOT")

    s.header("A70", "Forces at the flat top")
    s.result(71, "Axial force on the upper half", "f_half", "=INDEX(STACK_FZ(coils);2;1)", "N",
             "negative: the halves press together", fmt="0.000")
    s.result(72, "Magnetic pressure on the winding", "pressure",
             "=SOLENOID_PRESSURE((inner+outer)/2;length;turns;i_set)", "Pa", "outward, mean radius", fmt="0")

    s.header("A74", "Stray field along the axis (site limit for implant wearers)")
    for row, z in zip(range(75, 79), (0.1, 0.15, 0.2, 0.3)):
        s.value(f"A{row}", z, "0.00")
        s.formula(f"B{row}", f"=STACK_B(coils;A{row})*1000", fmt="0.000", fill=0xE6F0FA)
        s.text(f"C{row}", "mT")
        s.formula(f"D{row}", f'=IF(B{row}>implant_mT;"above the site limit: keep implant wearers out";"below the site limit")')
    s.text("A79", "(z in m from the centre along the axis, during the flat top)", color=0x555555)

    s.header("F9", "Axial table")
    for col, text in zip("FGH", ("z (m)", "Bz (mT)", "B/B0 - 1 (%)")):
        s.text(f"{col}10", text, bold=True)
    n, first = 41, 11
    last = first + n - 1
    s.array(f"F{first}:F{last}", f"=(ROW(F{first}:F{last})-{first})/({n}-1)*0.16-0.08", fmt="0.000")
    s.array(f"G{first}:G{last}", f"=STACK_BZ(coils;F{first}:F{last})*1000", fmt="0.000")
    s.array(f"H{first}:H{last}", f"=(G{first}:G{last}/(b0*1000)-1)*100", fmt="0.00")

    top = last + 3
    s.header(f"F{top}", "Bore map: |B| (mT), z down, r across")
    s.text(f"F{top + 1}", "z (m) \\ r (m)", bold=True)
    rs = [0.0, 0.005, 0.01, 0.015, 0.019]
    for j, r in enumerate(rs):
        s.value(f"{'GHIJK'[j]}{top + 1}", r, "0.000")
    zs = [0.0, 0.01, 0.02, 0.03, 0.04, 0.05]
    for i, z in enumerate(zs):
        s.value(f"F{top + 2 + i}", z, "0.000")
    zr, rr = f"F{top + 2}:F{top + 1 + len(zs)}", f"G{top + 1}:K{top + 1}"
    s.array(f"G{top + 2}:K{top + 1 + len(zs)}", f"=STACK_B(coils;{zr};{rr})*1000", fmt="0.00")

    # Edges of the pulse from the circuit equations above (native formulas).
    edge = top + len(zs) + 4
    m = 31
    s.header(f"F{edge}", "Pulse edges: turn-on (left), turn-off through the clamp (right)")
    for col, text in zip("FGHIJK", ("t (ms)", "current (A)", "Bz centre (mT)", "t (ms)", "current (A)",
                                    "coil voltage (V)")):
        s.text(f"{col}{edge + 1}", text, bold=True)
    a, b = edge + 2, edge + 1 + m
    steps = f"(ROW(F{a}:F{b})-{a})/({m}-1)"
    s.array(f"F{a}:F{b}", f"={steps}*2*t_rise*1000", fmt="0.0000")
    s.array(f"G{a}:G{b}",
            f"=IF(supply_v/r_cold*(1-EXP(-F{a}:F{b}/1000/tau))<i_set;"
            f"supply_v/r_cold*(1-EXP(-F{a}:F{b}/1000/tau));i_set)", fmt="0.000")
    s.array(f"H{a}:H{b}", f"=G{a}:G{b}*b_per_a*1000", fmt="0.00")
    s.array(f"I{a}:I{b}", f"={steps}*1.5*t_fall*1000", fmt="0.0000")
    s.array(f"J{a}:J{b}",
            f"=IF((i_set+clamp_v/r_cold)*EXP(-I{a}:I{b}/1000/tau)-clamp_v/r_cold>0;"
            f"(i_set+clamp_v/r_cold)*EXP(-I{a}:I{b}/1000/tau)-clamp_v/r_cold;0)", fmt="0.000")
    s.array(f"K{a}:K{b}", f"=IF(J{a}:J{b}>0;-clamp_v;0)", fmt="0")

    s.cautions(81, [
        "Every turn-off drives the coil's stored energy into the clamp: without a working clamp or",
        "flyback path the voltage rises until something breaks down, so never open the circuit at",
        "current, size the suppressor for the energy and the repetition rate, and keep its voltage",
        "below the insulation's rating (the check above). The flat-top field is 100 times the demo",
        "implant limit: mark the area and keep implant wearers out (see the stray-field rows). Pulses",
        "heat the winding on average and within each pulse: check the temperature in service against",
        "the insulation class. Forces press the winding halves together at every pulse: bond or clamp",
        "the layers.",
    ])

    charts = book.sheet("Charts")
    charts.text("A1", "Pulsed test coil: charts (data on the Design sheet)", bold=True, size=12)
    charts.chart("axial", "A3", (135, 85), f"Design.F10:G{last}", "Axial field at the flat top", "z (m)", "Bz (mT)")
    charts.chart("map", "J3", (135, 85), f"Design.F{top + 1}:K{top + 1 + len(zs)}",
                 "Field magnitude in the bore (one line per r in m)", "z (m)", "|B| (mT)")
    charts.chart("turn_on", "A22", (135, 85), f"Design.F{edge + 1}:G{b}", "Turn-on: current against time",
                 "t (ms)", "current (A)")
    charts.chart("turn_off", "J22", (135, 85), f"Design.I{edge + 1}:J{b}", "Turn-off through the clamp",
                 "t (ms)", "current (A)")
