"""Coils at a frequency and pickup coils (SKIN_DEPTH ... PICKUP_NEF) in a real headless Calc."""
import cmath
import math
import unittest

from bad_input_check import check_family
from e2e_support import CalcTestCase, read_reference

AC_NAMES = ["SKIN_DEPTH", "WIRE_RAC_RATIO", "COIL_RAC_RATIO", "COIL_C_SELF", "COIL_SRF", "COIL_Z", "COIL_PHASE",
            "COIL_VOLTAGE_AC", "RESONANCE_C", "RESONANCE_CAP_VOLTAGE"]
PICKUP_NAMES = ["PICKUP_EMF", "PICKUP_AREA", "PICKUP_SENSITIVITY", "PICKUP_NOISE", "PICKUP_NEF"]

MU0 = 1.25663706127e-6       # CODATA 2022
RHO_CU = 1e-6 / 58           # IEC 60028, ohm m at 20 C
K_B = 1.380649e-23           # J/K, exact (SI 2019)


def dowell(delta, m):
    """P. L. Dowell, Proc. IEE 113(8), 1966: Re[ah coth ah] + (m^2-1)/3 Re[2 ah tanh(ah/2)], ah = (1+j) Delta."""
    ah = complex(delta, delta)
    return (ah / cmath.tanh(ah)).real + (m * m - 1) / 3 * (2 * ah * cmath.tanh(ah / 2)).real


class AcFunctionsInCalc(CalcTestCase):
    def test_skin_depth_is_its_formula(self):
        for i, f in enumerate((50, 1e3, 1e6)):
            self.assert_rel(self.value(f"A{i + 1}", f"=SKIN_DEPTH({f})"), math.sqrt(RHO_CU / (math.pi * f * MU0)),
                            1e-15, f"{f} Hz")
        hot = RHO_CU * (1 + 0.00393 * 80)
        self.assert_rel(self.value("B1", '=SKIN_DEPTH(1000;"copper";100)'), math.sqrt(hot / (math.pi * 1e3 * MU0)),
                        1e-15, "100 C")

    def test_wire_rac_ratio_against_mpmath(self):
        # Source: mpmath Kelvin functions at 50 digits (tests/reference/kelvin.csv).
        delta = math.sqrt(RHO_CU / (math.pi * 1e5 * MU0))
        rows = read_reference("kelvin.csv")[::3]
        for i, row in enumerate(rows):
            d = float(row["x"]) * math.sqrt(2) * delta
            got = self.value(f"A{i + 1}", f"=WIRE_RAC_RATIO({d!r};1E5)")
            self.assert_rel(got, float(row["rac_ratio"]), 1e-12, f"x = {row['x']}")
        self.assertEqual(self.value("B1", "=WIRE_RAC_RATIO(0.001;0)"), 1.0)

    def test_coil_rac_ratio_is_dowell_with_porosity(self):
        d, p, f, m = 0.5e-3, 0.55e-3, 2e4, 6
        delta = math.sqrt(RHO_CU / (math.pi * f * MU0))
        big_delta = (math.pi / 4) ** 0.75 * d / delta * math.sqrt(d / p)
        self.assert_rel(self.value("A1", f"=COIL_RAC_RATIO({d};{p};{f};{m})"), dowell(big_delta, m), 1e-13, "solid")
        # Litz: 25 strands of 0.1 mm in a 0.6 mm bundle, 5 strand layers per layer at pitch 0.12 mm.
        ds, pb, n = 0.1e-3, 0.6e-3, 25
        ds_delta = (math.pi / 4) ** 0.75 * ds / delta * math.sqrt(ds / (pb / 5))
        self.assert_rel(self.value("A2", f"=COIL_RAC_RATIO({ds};{pb};{f};{m};{n})"), dowell(ds_delta, m * 5), 1e-13,
                        "litz")
        self.assertEqual(self.value("A3", f"=COIL_RAC_RATIO({d};{p};0;{m})"), 1.0)

    def test_self_capacitance_and_resonance(self):
        # Medhurst's table (Wireless Engineer 24, 1947): l/D = 3 -> H = 0.61 pF/cm; D = 10 cm.
        self.assert_rel(self.value("A1", "=COIL_C_SELF(0.0495;0.3;100;1;0.0009;0.001)"), 6.1e-12, 1e-14, "Medhurst")
        # Several layers: 4/(3 n^2) sum over the layer gaps of (turns per layer) * cell capacitance.
        ri, turns, n, dc, do, er = 0.02, 400, 8, 0.5e-3, 0.55e-3, 3.5
        ln = math.log(do / dc)
        theta = 2 * math.asin(math.sqrt(ln / (2 * er)))
        eps0 = 1 / (MU0 * 299792458.0 ** 2)
        cell = eps0 * (er * theta / ln + 1 / math.tan(theta / 2) - 1 / math.tan(math.pi / 12))
        gaps = sum(2 * math.pi * (ri + k * do) for k in range(1, n))
        expected = 4 / (3 * n * n) * (turns / n) * cell * gaps
        c = self.value("A2", f"=COIL_C_SELF({ri};0.05;{turns};{n};{dc};{do};{er})")
        self.assert_rel(c, expected, 1e-13, "multilayer")
        self.assert_rel(self.value("A3", "=COIL_SRF(0.01;A2)"), 1 / (2 * math.pi * math.sqrt(0.01 * c)), 1e-14, "SRF")

    def test_impedance_phase_and_drive(self):
        r, l, c = 12.0, 8e-3, 150e-12
        for i, f in enumerate((0, 50, 1e3, 1e5)):
            w = 2 * math.pi * f
            z = 1 / (1 / complex(r, w * l) + 1j * w * c)
            self.assert_rel(self.value(f"A{i + 1}", f"=COIL_Z({r};{l};{f};{c})"), abs(z), 1e-13, f"|Z| {f}")
            self.assertAlmostEqual(self.value(f"B{i + 1}", f"=COIL_PHASE({r};{l};{f};{c})"),
                                   math.degrees(cmath.phase(z)), delta=1e-11)
        self.assert_error(f"=COIL_Z({r};{l};2E5;{c})")  # above the self-resonance (145 kHz)
        self.assert_rel(self.value("C1", f"=COIL_VOLTAGE_AC({r};{l};1000;2)"), 2 * abs(complex(r, 2e3 * math.pi * l)),
                        1e-15, "drive")

    def test_series_resonance(self):
        c = self.value("A1", "=RESONANCE_C(0.012;1000)")
        self.assert_rel(c, 1 / ((2 * math.pi * 1e3) ** 2 * 0.012), 1e-15, "C")
        self.assert_rel(self.value("A2", "=RESONANCE_CAP_VOLTAGE(2.5;0.012;1000)"), 2.5 / (2 * math.pi * 1e3 * c),
                        1e-14, "capacitor voltage")

    def test_bad_inputs(self):
        check_family(self, "ac", AC_NAMES)


class PickupFunctionsInCalc(CalcTestCase):
    def test_emf_and_area(self):
        # Faraday: w N A B.
        self.assert_rel(self.value("A1", "=PICKUP_EMF(1000;0.001;100;1E-9)"), 2 * math.pi * 100 * 1000 * 1e-3 * 1e-9,
                        1e-15, "EMF")
        self.assert_rel(self.value("A2", "=PICKUP_AREA(0.01;0.03;0.02;1000)"),
                        1000 * math.pi * (1e-4 + 3e-4 + 9e-4) / 3, 1e-15, "area")

    def test_sensitivity_curve_as_one_array_formula(self):
        freqs = [10, 100, 1e3, 1e4]
        self.put_column(0, 0, freqs)
        got = self.array("B1:B4", "=PICKUP_SENSITIVITY(2000;0.001;A1:A4;150;0.2;2E-10)")
        for (s,), f in zip(got, freqs):
            w = 2 * math.pi * f
            self.assert_rel(s, w * 2000 * 1e-3 / abs(complex(1 - w * w * 0.2 * 2e-10, w * 150 * 2e-10)), 1e-13,
                            f"{f} Hz")

    def test_noise_is_4ktr(self):
        self.assert_rel(self.value("A1", "=PICKUP_NOISE(1000;20)"), math.sqrt(4 * K_B * 293.15 * 1000), 1e-15,
                        "density")
        self.assert_rel(self.value("A2", "=PICKUP_NOISE(1000;20;10000)"), math.sqrt(4 * K_B * 293.15 * 1000 * 1e4),
                        1e-15, "in 10 kHz")
        w = 2 * math.pi * 100
        expected = math.sqrt(4 * K_B * 293.15 * 50) / (w * 1000 * 1e-3)
        self.assert_rel(self.value("A3", "=PICKUP_NEF(1000;0.001;100;50;20)"), expected, 1e-14, "NEF")

    def test_bad_inputs(self):
        check_family(self, "pickup", PICKUP_NAMES)


if __name__ == "__main__":
    unittest.main()
