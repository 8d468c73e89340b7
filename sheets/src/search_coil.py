"""Demo scenario (invented): a search coil that resolves 1 nT from 10 Hz to 10 kHz.

Requirement: a multilayer air-core induction coil on a 20 mm former must show a 1 nT (amplitude)
field anywhere from 10 Hz to 10 kHz with a signal-to-noise ratio of 10 in a 1 Hz resolution
bandwidth, read by a low-noise amplifier. The sheet winds the coil (turns, gauge, layers), finds
its resistance, inductance, self-capacitance and self-resonance (which must lie above the band),
and tabulates over the band the sensitivity, the EMF of 1 nT, the noise-equivalent field and the
signal-to-noise ratio, with a chart of the sensitivity curve.
"""

TITLE = "Search coil for 1 nT"


def build(book):
    book.set_info(TITLE, "Coilwright example: a search (induction) coil for 1 nT from 10 Hz to 10 kHz (invented).")
    s = book.sheet("Design")
    s.widths(A=84, B=34, C=22, D=100, F=22, G=26, H=26, I=26, J=26, K=22)
    s.text("A1", "Search coil for 1 nT, 10 Hz to 10 kHz (Coilwright example)", bold=True, size=14)
    s.text("A2", "Invented scenario. Fields and EMFs are amplitudes; noise is RMS. Yellow cells are inputs; "
                 "blue cells are computed.")

    s.header("A4", "Requirement and choices")
    s.input(5, "Field to resolve (amplitude)", "b_min_nT", 1, "nT", "", fmt="0.00")
    s.input(6, "Lowest frequency", "f_low", 10, "Hz", "", fmt="0")
    s.input(7, "Highest frequency", "f_high", 10000, "Hz", "", fmt="0")
    s.input(8, "Resolution bandwidth", "bw", 1, "Hz", "of the spectrum analyser or lock-in", fmt="0.00")
    s.input(9, "Required signal-to-noise ratio", "snr_min", 10, "", "RMS signal / RMS noise", fmt="0.0")
    s.input(10, "Former (inner) radius", "inner", 0.01, "m", "", fmt="0.0000")
    s.input(11, "Winding length", "length", 0.02, "m", "", fmt="0.000")
    s.text("A12", "Wire gauge (AWG)")
    s.text("B12", "36", fill=0xFFF5CC)
    s.define_name("gauge", "B12")
    s.input(13, "Enamel thickness added to the diameter", "enamel", 0.00001, "m", "demo value", fmt="0.000000")
    s.input(14, "Layers", "layers", 24, "", "whole layers, square packing", fmt="0")
    s.input(15, "Amplifier input noise", "amp_noise", 4e-9, "V/sqrt(Hz)", "demo value", fmt="0.0E+00")
    s.input(16, "Coil temperature", "temp", 20, "C", "", fmt="0.0")

    s.header("A18", "Winding")
    s.result(19, "Bare wire diameter", "wire_d", "=AWG_DIAMETER(gauge)", "m", "ASTM B258", fmt="0.000000")
    s.result(20, "Wire diameter over enamel", "wire_od", "=wire_d+enamel", "m", "", fmt="0.000000")
    s.result(21, "Turns per layer", "per_layer", "=WINDING_TURNS_PER_LAYER(length;wire_od)", "", "", fmt="0")
    s.result(22, "Turns", "turns", "=layers*per_layer", "", "", fmt="0")
    s.result(23, "Outer radius", "outer", "=inner+WINDING_BUILD(turns;length;wire_od)", "m", "", fmt="0.00000")
    s.result(24, "Effective area (sum over the turns)", "area_sum", "=PICKUP_AREA(inner;outer;length;turns)", "m^2",
             "flux linkage per tesla", fmt="0.0000")
    s.result(25, "Mean area of one turn", "area", "=area_sum/turns", "m^2", "", fmt="0.000E+00")
    s.result(26, "Resistance", "r_coil",
             "=COIL_RESISTANCE(turns;WINDING_MEAN_TURN(inner;outer);wire_d;\"copper\";temp)", "ohm", "at the coil "
             "temperature", fmt="0.0")
    s.result(27, "Inductance", "l_coil", "=COIL_L(inner;outer;length;turns)", "H", "thick winding", fmt="0.0000")
    s.result(28, "Self-capacitance", "c_coil", "=COIL_C_SELF(inner;length;turns;layers;wire_d;wire_od)", "F",
             "layer-to-layer, enamel 3.5", fmt="0.000E+00")
    s.result(29, "Self-resonant frequency", "srf", "=COIL_SRF(l_coil;c_coil)", "Hz", "", fmt="0")
    s.check(30, "Band check", "srf>=1.5*f_high", "self-resonance above the band", "SELF-RESONANCE IN THE BAND",
            "one and a half times the highest frequency (common practice)")
    s.result(31, "Johnson noise of the coil", "e_coil", "=PICKUP_NOISE(r_coil;temp;bw)", "V",
             "RMS in the resolution bandwidth", fmt="0.00E+00")
    s.result(32, "Sensitivity at the lowest frequency", "s_low",
             "=PICKUP_SENSITIVITY(turns;area;f_low;r_coil;l_coil;c_coil)", "V/T", "", fmt="0.000")
    s.result(33, "EMF of the field at the lowest frequency", "emf_low", "=PICKUP_EMF(turns;area;f_low;b_min_nT*1E-9)",
             "V", "amplitude (Faraday)", fmt="0.00E+00")
    s.result(34, "Worst signal-to-noise ratio in the band", "snr_worst", f"=MIN(K11:K41)", "", "see the table",
             fmt="0.0")
    s.check(35, "Resolution check", "snr_worst>=snr_min", "1 nT resolved over the band", "NOT RESOLVED")

    # Band table: 31 frequencies spaced evenly in log f from f_low to f_high.
    s.header("F9", "Over the band (1 Hz resolution bandwidth)")
    for col, text in zip("FGHIJK", ("f (Hz)", "sensitivity (V/T)", "EMF of 1 nT (uV)", "NEF (fT/sqrt(Hz))",
                                    "noise floor (pT RMS)", "SNR")):
        s.text(f"{col}10", text, bold=True)
    n, first = 31, 11
    last = first + n - 1
    rows = f"F{first}:F{last}"
    s.array(rows, f"=f_low*(f_high/f_low)^((ROW({rows})-{first})/({n}-1))", fmt="0.0")
    s.array(f"G{first}:G{last}", f"=PICKUP_SENSITIVITY(turns;area;{rows};r_coil;l_coil;c_coil)", fmt="0.000")
    s.array(f"H{first}:H{last}", f"=G{first}:G{last}*b_min_nT*1E-9*1E6", fmt="0.0000")
    s.array(f"I{first}:I{last}", f"=PICKUP_NEF(turns;area;{rows};r_coil;temp;l_coil;c_coil;amp_noise)*1E15",
            fmt="0.00")
    s.array(f"J{first}:J{last}", f"=I{first}:I{last}*SQRT(bw)*1E-3", fmt="0.0000")
    # RMS of the 1 nT sine over the RMS noise in the bandwidth.
    s.array(f"K{first}:K{last}", f"=b_min_nT*1E3/SQRT(2)/J{first}:J{last}", fmt="0.0")

    s.cautions(37, [
        "The sensitivity rises towards the self-resonance and the lumped model stops at it: keep the",
        "self-resonance above the band, or load the coil with a damping resistor and check the response.",
        "Electric fields couple into a coil through its capacitance: shield it electrostatically (a slit",
        "shield, not a closed loop). Mains fields and their harmonics exceed 1 nT by far near buildings;",
        "the self-capacitance model is a first estimate (measure the built coil's resonance).",
    ])

    charts = book.sheet("Charts")
    charts.text("A1", "Search coil: charts (data on the Design sheet)", bold=True, size=12)
    sens = charts.chart("sensitivity", "A3", (135, 85), f"Design.F10:G{last}", "Sensitivity against frequency",
                        "f (Hz)", "V/T")
    sens.Diagram.XAxis.Logarithmic = True
    sens.Diagram.YAxis.Logarithmic = True
    nef = charts.chart("nef", "J3", (135, 85), [f"Design.F10:F{last}", f"Design.I10:I{last}"],
                       "Noise-equivalent field against frequency", "f (Hz)", "fT/sqrt(Hz)")
    nef.Diagram.XAxis.Logarithmic = True
    nef.Diagram.YAxis.Logarithmic = True
