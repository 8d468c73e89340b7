"""Demo scenario (invented): an AC Helmholtz exposure rig at 1 kHz, fed through a series resonance.

Requirement: 1 mT (amplitude) at 1 kHz at the centre of a Helmholtz pair of 150 mm radius,
uniform to 1 % over a sample dish, from an audio power amplifier of 40 V amplitude. A capacitor
in series tunes the coils to 1 kHz, so the amplifier only has to overcome the AC resistance;
the capacitor then carries Q times the amplifier's voltage. The sheet sizes the winding, its AC
losses (skin and proximity effect), the series capacitor and its voltage, the temperature, the
self-resonance, the tuning curve, and the distance beyond which the field is below the exposure
limit the site applies (an input, not a figure of this sheet).
"""

TITLE = "AC Helmholtz exposure rig"


def build(book):
    book.set_info(TITLE, "Coilwright example: an AC Helmholtz rig driven through a series resonance (invented).")
    s = book.sheet("Design")
    s.widths(A=84, B=34, C=20, D=104, F=24, G=26, H=26)
    s.text("A1", "AC Helmholtz exposure rig at 1 kHz (Coilwright example)", bold=True, size=14)
    s.text("A2", "Invented scenario. Currents, voltages and fields are amplitudes (peak); RMS = amplitude / "
                 "sqrt(2). Yellow cells are inputs; blue cells are computed.")

    s.header("A4", "Requirement and choices")
    s.input(5, "Field amplitude at the centre", "target_uT", 1000, "uT", "", fmt="0.0")
    s.input(6, "Frequency", "freq", 1000, "Hz", "", fmt="0")
    s.input(7, "Sample radius (sphere)", "sample_r", 0.03, "m", "", fmt="0.000")
    s.input(8, "Allowed deviation over the sample", "tol", 0.01, "", "fraction of the centre field", fmt="0.000")
    s.input(9, "Former (inner) radius of each coil", "inner", 0.15, "m", "", fmt="0.000")
    s.input(10, "Winding length (axial) of each coil", "length", 0.02, "m", "", fmt="0.000")
    s.text("A11", "Wire gauge (AWG)")
    s.text("B11", "18", fill=0xFFF5CC)
    s.define_name("gauge", "B11")
    s.input(12, "Enamel thickness added to the diameter", "enamel", 0.00006, "m", "demo value", fmt="0.00000")
    s.input(13, "Layers per coil", "layers", 10, "", "whole layers, square packing", fmt="0")
    s.input(14, "Amplifier output (amplitude)", "amp_v", 40, "V", "demo value", fmt="0.0")
    s.input(15, "Capacitor voltage rating (amplitude)", "cap_rating", 400, "V",
            "from the capacitor's data sheet, for AC at this frequency (demo value)", fmt="0")
    s.input(16, "Ambient temperature", "ambient", 25, "C", "", fmt="0.0")
    s.input(17, "Heat-transfer coefficient", "h_conv", 10, "W/(m^2 K)", "still room air (common practice)", fmt="0.0")
    s.text("A18", "Insulation thermal class")
    s.text("B18", "B", fill=0xFFF5CC)
    s.define_name("ins_class", "B18")
    s.input(19, "SITE INPUT: exposure limit for people", "limit_uT", 50, "uT",
            "field amplitude. DEMO VALUE: enter the limit of the guideline your site applies at this frequency",
            fmt="0.0")

    s.header("A21", "Winding")
    s.result(22, "Bare wire diameter", "wire_d", "=AWG_DIAMETER(gauge)", "m", "ASTM B258", fmt="0.000000")
    s.result(23, "Wire diameter over enamel", "wire_od", "=wire_d+enamel", "m", "", fmt="0.000000")
    s.result(24, "Turns per layer", "per_layer", "=WINDING_TURNS_PER_LAYER(length;wire_od)", "", "", fmt="0")
    s.result(25, "Turns per coil", "turns", "=layers*per_layer", "", "", fmt="0")
    s.result(26, "Outer radius", "outer", "=inner+WINDING_BUILD(turns;length;wire_od)", "m", "", fmt="0.00000")
    s.result(27, "Helmholtz spacing of the real windings", "spacing", "=PAIR_SPACING(inner;outer;length)", "m",
             "flattest centre field", fmt="0.00000")
    s.result(28, "Centre field per ampere", "b_per_a", "=PAIR_B0(inner;outer;length;turns;1;spacing)", "T/A", "",
             fmt="0.0000E+00")
    s.result(29, "Current amplitude", "i_amp", "=target_uT*1E-6/b_per_a", "A",
             "field functions take an amplitude and give one", fmt="0.0000")
    s.result(30, "RMS current", "i_rms", "=i_amp/SQRT(2)", "A", "what heats the winding", fmt="0.0000")

    s.header("F4", "Coil table (both coils in series)")
    for col, text in zip("FGHIJK", ("inner (m)", "outer (m)", "length (m)", "centre z (m)", "turns", "current (A)")):
        s.text(f"{col}5", text, bold=True)
    for row, centre in ((6, "=-spacing/2"), (7, "=spacing/2")):
        for col, formula in zip("FGHIJK", ("=inner", "=outer", "=length", centre, "=turns", "=i_amp")):
            s.formula(f"{col}{row}", formula, fmt="0" if col == "J" else "0.00000", fill=0xE6F0FA)
    s.define_name("coils", "F6:K7")

    s.header("A32", "Field over the sample")
    s.result(33, "Centre field (amplitude)", "b0", "=STACK_BZ(coils;0)", "T", "", fmt="0.000000E+00")
    s.result(34, "Radius of the sphere within the tolerance", "uniform_r", "=STACK_UNIFORM_SPHERE(coils;tol)", "m",
             "", fmt="0.0000")
    s.check(35, "Uniformity check", "uniform_r>=sample_r", "sample is covered", "SAMPLE TOO LARGE")

    s.header("A37", "AC resistance, inductance, self-resonance")
    s.result(38, "Skin depth at the frequency", "delta", "=SKIN_DEPTH(freq)", "m", "copper, 20 C", fmt="0.000E+00")
    s.result(39, "Skin effect alone (isolated wire)", "k_skin", "=WIRE_RAC_RATIO(wire_d;freq)", "",
             "R_ac / R_dc", fmt="0.00000")
    s.result(40, "Skin and proximity effect in the winding", "k_ac", "=COIL_RAC_RATIO(wire_d;wire_od;freq;layers)", "",
             "Dowell, R_ac / R_dc", fmt="0.00000")
    s.result(41, "Mean turn length", "mean_turn", "=WINDING_MEAN_TURN(inner;outer)", "m", "", fmt="0.0000")
    s.result(42, "DC resistance, both coils, 20 C", "r_dc", "=2*COIL_RESISTANCE(turns;mean_turn;wire_d)", "ohm", "",
             fmt="0.000")
    s.result(43, "AC resistance, both coils, 20 C", "r_ac", "=k_ac*r_dc", "ohm", "", fmt="0.000")
    s.result(44, "Inductance of both coils in series", "l_pair", "=STACK_L(coils)", "H", "self and mutual",
             fmt="0.00000E+00")
    s.result(45, "Self-capacitance of one coil", "c_coil", "=COIL_C_SELF(inner;length;turns;layers;wire_d;wire_od)",
             "F", "layer-to-layer, enamel 3.5", fmt="0.000E+00")
    s.result(46, "Self-resonance of the pair", "srf", "=COIL_SRF(l_pair;c_coil/2)", "Hz",
             "the two coils' capacitances in series", fmt="0")
    s.check(47, "Self-resonance check", "srf>=10*freq", "far above the drive", "TOO CLOSE TO THE SELF-RESONANCE",
            "at least ten times the frequency (common practice)")
    s.result(48, "Impedance of the coils alone", "z_coil", "=COIL_Z(r_ac;l_pair;freq;c_coil/2)", "ohm", "",
             fmt="0.000")
    s.result(49, "Its phase", "phase", "=COIL_PHASE(r_ac;l_pair;freq;c_coil/2)", "degree", "almost pure inductance",
             fmt="0.00")
    s.result(50, "Drive without a capacitor", "v_direct", "=COIL_VOLTAGE_AC(r_ac;l_pair;freq;i_amp)", "V",
             "amplitude: beyond the amplifier", fmt="0.0")

    s.header("A52", "Series resonance")
    s.result(53, "Series capacitor", "c_series", "=RESONANCE_C(l_pair;freq)", "F", "", fmt="0.000E+00")
    s.result(54, "Capacitor voltage (amplitude)", "v_cap", "=RESONANCE_CAP_VOLTAGE(i_amp;l_pair;freq)", "V",
             "equals the coils' reactive voltage", fmt="0.0")
    s.check(55, "Capacitor check", "v_cap<=cap_rating", "within its rating", "CAPACITOR OVER ITS RATING")
    s.result(56, "Quality factor w L / R", "q", "=2*PI()*freq*l_pair/r_hot", "", "hot winding", fmt="0.0")
    s.result(57, "Amplifier voltage at resonance", "v_drive", "=COIL_VOLTAGE(r_hot;i_amp)", "V",
             "amplitude; only the AC resistance is left", fmt="0.00")
    s.check(58, "Amplifier check", "v_drive<=amp_v", "amplifier suffices", "AMPLIFIER TOO WEAK")

    s.header("A60", "Heating")
    s.result(61, "Cooling area of one coil", "area", "=COIL_COOLING_AREA(inner;outer;length)", "m^2", "",
             fmt="0.0000")
    s.result(62, "Mean power, both coils (cold)", "p_cold", "=COIL_POWER(r_ac;i_rms)", "W",
             "I_rms^2 R_ac = amplitude^2 R_ac / 2", fmt="0.00")
    s.result(63, "Steady winding temperature", "t_hot", "=COIL_HOT_TEMPERATURE(r_ac/2;i_rms;area;ambient;h_conv)",
             "C", "RMS current and AC resistance; per coil", fmt="0.0")
    s.result(64, "Hot AC resistance, both coils", "r_hot", "=2*COIL_HOT_RESISTANCE(r_ac/2;i_rms;area;ambient;h_conv)",
             "ohm", "", fmt="0.000")
    s.result(65, "Margin to the insulation class", "margin", "=INSULATION_MARGIN(ins_class;t_hot)", "K",
             "after a 10 K hot-spot allowance", fmt="0.0")
    s.check(66, "Temperature check", "margin>=0", "within class", "TOO HOT")

    s.header("A68", "Field outside the rig along the axis (exposure of people)")
    for row, z in zip(range(69, 75), (0.3, 0.4, 0.5, 0.7, 1.0, 1.5)):
        s.value(f"A{row}", z, "0.00")
        s.formula(f"B{row}", f"=STACK_B(coils;A{row})*1E6", fmt="0.00", fill=0xE6F0FA)
        s.text(f"C{row}", "uT")
        s.formula(f"D{row}", f'=IF(B{row}>limit_uT;"ABOVE the site limit: keep people out";"below the site limit")')
    s.text("A75", "(z in m from the centre along the axis; amplitude at the drive current)", color=0x555555)

    # Tuning curve: the amplifier at the voltage that gives the target at resonance, current
    # I(f) = V / |R + j (w L - 1 / (w C))| (native formulas on the results above).
    s.header("F9", "Tuning: centre field against frequency at fixed drive")
    for col, text in zip("FGH", ("f (Hz)", "Bz centre (uT)", "capacitor (V)")):
        s.text(f"{col}10", text, bold=True)
    n, first = 41, 11
    last = first + n - 1
    rows = f"F{first}:F{last}"
    s.array(rows, f"=freq*(0.9+0.2*(ROW({rows})-{first})/({n}-1))", fmt="0.0")
    current = (f"v_drive/SQRT(r_hot^2+(2*PI()*{rows}*l_pair-1/(2*PI()*{rows}*c_series))^2)")
    s.array(f"G{first}:G{last}", f"={current}*b_per_a*1E6", fmt="0.00")
    s.array(f"H{first}:H{last}", f"={current}/(2*PI()*{rows}*c_series)", fmt="0.0")

    s.cautions(77, [
        "At resonance the series capacitor carries Q times the amplifier's voltage (here hundreds of volts",
        "from a 40 V amplifier): use a capacitor rated for that AC voltage at this frequency, insulate its",
        "terminals and the coil leads for it, and never touch the circuit while it is driven. Detuning",
        "(a capacitor off its value, a coil warming up) changes the field: monitor it with a pickup coil.",
        "The exposure limit is a site input: enter the value of the guideline that applies to your site",
        "and this frequency, and keep people out of the zone where the field exceeds it (rows above).",
        "Fields near pacemakers and other implants: keep implant wearers away. Coils heat: check the",
        "temperature in service against the insulation class.",
    ])

    charts = book.sheet("Charts")
    charts.text("A1", "AC exposure rig: charts (data on the Design sheet)", bold=True, size=12)
    charts.chart("tuning", "A3", (135, 85), f"Design.F10:G{last}", "Centre field against frequency (fixed drive)",
                 "f (Hz)", "Bz (uT)")
    charts.chart("capacitor", "J3", (135, 85), [f"Design.F10:F{last}", f"Design.H10:H{last}"],
                 "Capacitor voltage against frequency (fixed drive)", "f (Hz)", "V (amplitude)")
