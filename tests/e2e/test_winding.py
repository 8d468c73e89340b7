"""WINDING_* in a real headless Calc with the built extension installed."""
import math
import unittest

from bad_input_check import check_family
from e2e_support import CalcTestCase

NAMES = ["WINDING_LAYERS", "WINDING_TURNS_PER_LAYER", "WINDING_TURNS", "WINDING_BUILD", "WINDING_WIRE_LENGTH",
         "WINDING_FILL", "WINDING_MEAN_TURN", "WINDING_MEAN_TURN_RECT"]


class WindingFunctionsInCalc(CalcTestCase):
    def test_hand_counts(self):
        # 1 mm wire in a 5 mm x 10 mm window. Square: 5 layers of 10 = 50 turns. Hexagonal: layers
        # 1 + floor(4 / 0.866) = 5, odd layers 10 turns, even layers 9: 48.
        self.assertEqual(self.value("A1", "=WINDING_LAYERS(0.005;0.001)"), 5)
        self.assertEqual(self.value("A2", "=WINDING_TURNS_PER_LAYER(0.01;0.001)"), 10)
        self.assertEqual(self.value("A3", "=WINDING_TURNS(0.005;0.01;0.001)"), 50)
        self.assertEqual(self.value("A4", '=WINDING_TURNS(0.005;0.01;0.001;"hexagonal")'), 48)
        self.assertEqual(self.value("A5", '=WINDING_TURNS(0.005;0.01;0.001;"Orthocyclic")'), 48)
        self.assertEqual(self.value("A6", '=WINDING_LAYERS(0.01;0.001;"hex")'), 11)
        # A binary-inexact exact fit still counts: 100 mm / 1 mm is 100 turns.
        self.assertEqual(self.value("A7", "=WINDING_TURNS_PER_LAYER(0.1;0.001)"), 100)

    def test_build_wire_length_and_fill(self):
        # 25 turns, 10 mm long, 1 mm wire, on a 10 mm radius former: 10 turns at 10.5 mm radius,
        # 10 at 11.5 mm, 5 at 12.5 mm; build 3 mm.
        self.assertAlmostEqual(self.value("A1", "=WINDING_BUILD(25;0.01;0.001)"), 0.003, delta=1e-18)
        self.assert_rel(self.value("A2", "=WINDING_WIRE_LENGTH(0.01;0.01;0.001;25)"),
                        2 * math.pi * (10 * 10.5 + 10 * 11.5 + 5 * 12.5) * 1e-3, 1e-14, "wire length")
        self.assert_rel(self.value("A3", '=WINDING_BUILD(25;0.01;0.001;"hexagonal")'), (1 + math.sqrt(3)) * 1e-3, 1e-15,
                        "hex build")
        self.assert_rel(self.value("A4", "=WINDING_FILL(50;0.0009;0.005;0.01)"), math.pi * 0.81 / 4, 1e-15, "fill")
        self.assert_rel(self.value("A5", "=WINDING_MEAN_TURN(0.1;0.12)"), math.pi * 0.22, 1e-15, "mean turn")
        self.assert_rel(self.value("A6", "=WINDING_MEAN_TURN_RECT(0.5;0.3;0.02)"), 1.6 + math.pi * 0.02, 1e-15,
                        "mean turn rect")
        # A whole table of turn counts against wire size is one array formula.
        got = self.array("B1:B3", "=WINDING_TURNS(0.01;0.02;{0.0005|0.001|0.002})")
        self.assertEqual([r[0] for r in got], [800, 200, 50])

    def test_bad_inputs(self):
        check_family(self, "winding", NAMES)


if __name__ == "__main__":
    unittest.main()
