"""COIL_* budget and INSULATION_* functions in a real headless Calc, and a whole design walked
through from field to wire, supply and temperature, as the README tells it."""
import math
import unittest

from bad_input_check import check_family
from e2e_support import CalcTestCase

MU0 = 1.25663706127e-6  # CODATA 2022
NAMES = ["COIL_RESISTANCE", "COIL_VOLTAGE", "COIL_POWER", "COIL_CURRENT_DENSITY", "COIL_COOLING_AREA",
         "COIL_COOLING_AREA_RECT", "COIL_TEMPERATURE_RISE", "COIL_HOT_TEMPERATURE", "COIL_HOT_RESISTANCE",
         "COIL_HOT_TEMPERATURE_AT_VOLTAGE", "COIL_HOT_RESISTANCE_AT_VOLTAGE", "COIL_MAX_CURRENT",
         "INSULATION_CLASS_LIMIT", "INSULATION_MARGIN", "COIL_ENERGY", "COIL_TIME_CONSTANT"]


class BudgetFunctionsInCalc(CalcTestCase):
    def test_hot_state_hand_calculation(self):
        # R20 = 2 ohm copper, 3 A, A = 0.05 m^2, h = 10 W/(m^2 K), Ta = 25 C:
        # k = 36 K, rise = 36 * 1.01965 / (1 - 0.00393 * 36) = 42.7566 K -> 67.7566 C, R = 2.375367 ohm.
        self.assertAlmostEqual(self.value("A1", "=COIL_HOT_TEMPERATURE(2;3;0.05)"), 67.7566, delta=1e-4)
        self.assertAlmostEqual(self.value("A2", '=COIL_HOT_RESISTANCE(2;3;0.05;25;10;"copper")'), 2.375367, delta=1e-6)
        # Constant 6 V instead: rise 31.48539 K (quadratic, see tests/engine/test_budget.cpp).
        self.assertAlmostEqual(self.value("A3", "=COIL_HOT_TEMPERATURE_AT_VOLTAGE(2;6;0.05)") - 25, 31.48539, delta=1e-5)
        # 8 A runs away: an error cell, not a number.
        self.assert_error("=COIL_HOT_TEMPERATURE(2;8;0.05)")
        self.assert_error("=COIL_HOT_RESISTANCE(2;8;0.05)")
        # Class F less a 10 K allowance: 4.48523 A keeps it at 145 C.
        self.assertAlmostEqual(self.value("A4", '=COIL_MAX_CURRENT(2;0.05;INSULATION_CLASS_LIMIT("F")-10)'), 4.48523,
                               delta=1e-5)

    def test_classes_energy_and_time_constant(self):
        # IEC 60085 classes by letter, number or number as text.
        for text, want in (('"B"', 130), ('"h"', 180), ("155", 155), ('"220"', 220), ('"Y"', 90)):
            self.assertEqual(self.value("A1", f"=INSULATION_CLASS_LIMIT({text})"), want)
        self.assert_error("=INSULATION_CLASS_LIMIT(150)")
        self.assertEqual(self.value("A2", '=INSULATION_MARGIN("F";120)'), 25)
        self.assertEqual(self.value("A3", '=INSULATION_MARGIN("B";125;10)'), -5)
        self.assert_rel(self.value("A4", "=COIL_ENERGY(0.05;3)"), 0.225, 1e-15, "L I^2 / 2")
        self.assert_rel(self.value("A5", "=COIL_TIME_CONSTANT(0.05;2)"), 0.025, 1e-15, "L / R")

    def test_design_walk_through(self):
        # A 1 m square pair for 0.5 mT at its centre, fed at 3 A, wound with AWG 17 copper whose
        # insulated diameter is 1.22 mm (an invented catalogue value), in a 20 mm wide channel on a
        # sharp-cornered square former, cooled by still air at 25 C.
        steps = [
            ("B1", "=RECTPAIR_SPACING(1;1)"),                       # spacing, m
            ("B2", "=RECTPAIR_BZ(1;1;B1;1;1;0;0;0)"),               # T per ampere-turn
            ("B3", "=ROUNDUP(0.0005/B2/3;0)"),                      # turns per coil at 3 A
            ("B4", "=WIRE_DIAMETER_FOR_CURRENT(3;3E6)"),            # bare diameter for 3 A/mm^2
            ("B5", "=AWG_DIAMETER(17)"),                            # the chosen wire
            ("B6", "=WINDING_TURNS_PER_LAYER(0.02;0.00122)"),
            ("B7", "=WINDING_BUILD(B3;0.02;0.00122)"),
            ("B8", "=WINDING_MEAN_TURN_RECT(1;1;B7)"),
            ("B9", "=COIL_RESISTANCE(B3;B8;B5)"),                   # per coil, 20 C
            ("B10", "=WIRE_MASS(B5;B3*B8)"),                        # copper per coil, kg
            ("B11", "=COIL_CURRENT_DENSITY(3;B5)"),
            ("B12", "=COIL_COOLING_AREA_RECT(1;1;B7;0.02)"),
            ("B13", "=COIL_TEMPERATURE_RISE(COIL_POWER(B9;3);B12)"),  # ignoring the resistance rise
            ("B14", "=COIL_HOT_TEMPERATURE(B9;3;B12)"),
            ("B15", "=COIL_HOT_RESISTANCE(B9;3;B12)"),
            ("B16", "=COIL_VOLTAGE(2*B15;3)"),                      # both coils in series, hot
            ("B17", "=COIL_POWER(2*B15;3)"),
            ("B18", '=INSULATION_MARGIN("B";B14)'),
            ("B19", '=COIL_MAX_CURRENT(B9;B12;INSULATION_CLASS_LIMIT("B")-10)'),
            ("B20", "=COIL_ENERGY(0.08;3)"),                        # 80 mH assumed for the pair
            ("B21", "=COIL_TIME_CONSTANT(0.08;2*B15)"),
        ]
        v = {}
        for where, text in steps:
            v[where] = self.value(where, text)
        print("\ndesign walk-through:", ", ".join(f"{k}={v[k]:.6g}" for k, _ in steps))
        # Cross-checks by hand formulas.
        s = 1.0
        D = v["B1"]
        A = s * s / 4
        z = D / 2
        per_loop = MU0 * s * s / (4 * math.pi * math.sqrt(2 * A + z * z)) * (2 / (A + z * z))
        self.assert_rel(v["B2"], 2 * per_loop, 1e-14, "pair centre field per ampere-turn")
        self.assertEqual(v["B3"], math.ceil(0.0005 / v["B2"] / 3))
        self.assertEqual(v["B6"], 16)
        layers = math.ceil(v["B3"] / 16)
        self.assert_rel(v["B7"], layers * 0.00122, 1e-15, "build")
        self.assert_rel(v["B8"], 4 + math.pi * v["B7"], 1e-15, "mean turn")
        area = math.pi / 4 * v["B5"] ** 2
        self.assert_rel(v["B9"], v["B3"] * v["B8"] / 58e6 / area, 1e-14, "resistance")
        self.assert_rel(v["B10"], 8890 * area * v["B3"] * v["B8"], 1e-14, "mass")
        k = 9 * v["B9"] / (10 * v["B12"])
        rise = k * (1 + 0.00393 * 5) / (1 - 0.00393 * k)
        self.assert_rel(v["B14"], 25 + rise, 1e-13, "hot temperature")
        self.assert_rel(v["B18"], 130 - v["B14"] - 10, 1e-13, "margin")
        self.assertGreater(v["B18"], 0)
        self.assert_rel(v["B20"], 0.36, 1e-15, "energy")

    def test_bad_inputs(self):
        check_family(self, "budget", NAMES)


if __name__ == "__main__":
    unittest.main()
