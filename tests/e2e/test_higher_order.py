"""Higher-order designs and the real turns of a layer winding in real Calc."""
import csv
import math
import os
import pathlib
import unittest


from bad_input_check import check_family
from e2e_support import CalcTestCase

MU0 = 1.25663706127e-6  # CODATA 2022
REFERENCE = pathlib.Path(os.environ.get("COILWRIGHT_REFERENCE_DIR",
                                        pathlib.Path(__file__).resolve().parents[1] / "reference"))


def reference_rows(name):
    with open(REFERENCE / name) as f:
        return list(csv.DictReader(line for line in f if not line.startswith("#")))


class HigherOrderDesigns(CalcTestCase):
    def test_designs_null_their_derivatives_through_stack_dnbz(self):
        # Each design's nulled Taylor coefficients d^nBz/dz^n R^n / (n! B0) <= 1e-10, read with
        # STACK_DNBZ on the nested table (orders up to 12, the most STACK_DNBZ gives).
        designs = [("UNIFORM_COILS(0.3;2;100)", 0, [2, 4, 6]),
                   ('UNIFORM_COILS(0.3;2;100;"sphere";"loop")', 0, [2, 4, 6, 8]),
                   ("UNIFORM_COILS(0.3;3;100)", 0, [2, 4, 6, 8, 10]),
                   ("GRADIENT_COILS(0.3;2;100)", 1, [3, 5, 7]),
                   ('GRADIENT_COILS(0.3;3;100;"sphere")', 1, [3, 5, 7, 9, 11])]
        row = 1
        for table, ref, orders in designs:
            b_ref = self.value(f"A{row}", f"=STACK_DNBZ_ARRAY({table};{ref})")
            for n in orders:
                d = self.value(f"B{row}", f"=STACK_DNBZ_ARRAY({table};{n})")
                self.assertLessEqual(abs(d) * 0.3 ** (n - ref) / math.factorial(n) / abs(b_ref), 1e-10,
                                     f"{table} order {n}")
                row += 1
            order = self.value(f"C{row}", f"=STACK_ORDER_ARRAY({table})")
            self.assertEqual(order, orders[-1] + 2, table)
            row += 1

    def test_helmholtz_and_maxwell_reproduced(self):
        got = self.array("A1:F2", "=UNIFORM_COILS(0.2;1;50)")
        self.assert_rel(got[1][3] - got[0][3], 0.2, 1e-14, "Helmholtz spacing = radius")
        mx = self.array("A4:F6", '=UNIFORM_COILS(0.5;1;64;"sphere";"loop")')
        self.assert_rel(mx[2][3], 0.5 * math.sqrt(3 / 7), 1e-14, "Maxwell z = R sqrt(3/7) (Treatise art. 715)")
        self.assert_rel(mx[2][5], 49.0, 1e-13, "Maxwell 49/64 of the centre's ampere-turns")
        grad = self.array("A8:F9", "=GRADIENT_COILS(0.3;1;10)")
        self.assert_rel(grad[1][3] - grad[0][3], 0.3 * math.sqrt(3), 1e-14, "anti-Helmholtz spacing R sqrt 3")

    def test_against_mpmath_solutions(self):
        # tests/reference/higher_order_designs.csv (generate_higher_order_reference.py, 40 digits)
        rows = [r for r in reference_rows("higher_order_designs.csv")
                if r["kind"] == "uniform" and r["constraint"] == "cylinder" and r["pairs"] == "3"]
        got = self.array("A1:F6", "=UNIFORM_COILS(1;3;1)")
        for r in rows:
            i = int(r["index"])
            self.assertAlmostEqual(got[i][3], float(r["z"]), delta=1e-12)
            self.assertAlmostEqual(got[i][5], float(r["ampere_turns"]), delta=1e-11)

    def test_thick_pair_equals_pair_spacing(self):
        got = self.array("A1:F2", "=MULTIPAIR_COILS(0.1;0.12;0.03;1;100)")
        spacing = self.value("H1", "=PAIR_SPACING(0.1;0.12;0.03)")
        self.assert_rel(got[1][3] - got[0][3], spacing, 1e-12, "one pair is PAIR_SPACING's")
        grad = self.array("A4:F5", "=GRADMULTIPAIR_COILS(0.1;0.12;0.03;1;100)")
        gspacing = self.value("H2", "=GRADPAIR_SPACING(0.1;0.12;0.03)")
        self.assert_rel(grad[1][3] - grad[0][3], gspacing, 1e-12, "one pair is GRADPAIR_SPACING's")
        four = self.array("A7:F10", "=MULTIPAIR_COILS(0.1;0.12;0.03;2;100)")
        self.assertEqual(self.value("H3", "=STACK_ORDER_ARRAY(A7:F10)"), 8)
        self.assertEqual(four[0][0], 0.1)

    def test_stack_order_sees_a_detuned_spacing(self):
        self.assertEqual(self.value("A1", "=STACK_ORDER_ARRAY({0.1;0.1;0;-0.05;1;1|0.1;0.1;0;0.05;1;1})"), 4)
        self.assertEqual(self.value("A2", "=STACK_ORDER_ARRAY({0.1;0.1;0;-0.0501;1;1|0.1;0.1;0;0.0501;1;1})"), 2)

    def test_bad_inputs(self):
        check_family(self, "higher_order", ["UNIFORM_COILS", "GRADIENT_COILS", "MULTIPAIR_COILS",
                                            "GRADMULTIPAIR_COILS", "STACK_ORDER", "TURNS_BZ", "TURNS_BR",
                                            "TURNS_B", "TURNS_BPHI", "TURNS_MODEL_ERROR", "TURNS_SENSITIVITY"])


class RealTurns(CalcTestCase):
    def test_against_mpmath_loop_sums(self):
        # tests/reference/real_turns.csv: sums of elliptic-integral loop fields in mpmath, 1.5 A
        for i, r in enumerate(reference_rows("real_turns.csv")):
            args = f'{r["inner"]};{r["d"]};{r["n"]};{r["layers"]};1.5;{r["z"]};{r["r"]};"{r["packing"]}"'
            bz = self.value(f"A{i + 1}", f"=TURNS_BZ({args})")
            br = self.value(f"B{i + 1}", f"=TURNS_BR({args})")
            b = self.value(f"C{i + 1}", f"=TURNS_B({args})")
            scale = math.hypot(float(r["bz"]), float(r["br"]))
            self.assertLessEqual(abs(bz - float(r["bz"])), 1e-13 * scale)
            self.assertLessEqual(abs(br - float(r["br"])), 1e-13 * scale)
            self.assert_rel(b, scale, 1e-13)

    def test_far_field_agrees_with_coil_bz(self):
        # Fine wire: the turns and the uniform-density coil agree to 1e-6 far away.
        turns = self.value("A1", "=TURNS_BZ(0.05;0.0001;100;4;2;3;0.5)")
        smooth = self.value("A2", "=COIL_BZ(0.05;0.05+4*0.0001;100*0.0001;400;2;3;0.5)")
        self.assert_rel(turns, smooth, 1e-6, "far field")
        err = self.value("A3", "=TURNS_MODEL_ERROR(0.05;0.0001;100;4;2;3;0.5)")
        self.assertLess(err, 1e-6)

    def test_error_map_is_an_array(self):
        got = self.array("A1:C2", "=TURNS_MODEL_ERROR(0.02;0.001;10;3;1;{0|0.004};{0;0.01;0.019})")
        self.assertTrue(all(isinstance(v, float) for row in got for v in row), got)
        self.assertGreater(got[0][2], got[0][0])  # near the turns the smooth model is worse

    def test_bphi_follows_ampere(self):
        # Middle of a 2 m coil of 3 layers, outside: mu0 I / (2 pi r) (Ampere's law), to the
        # segment's end correction (r/L)^2.
        b = self.value("A1", "=TURNS_BPHI(0.01;0.001;2000;3;2;0;0.02)")
        self.assert_rel(b, MU0 * 2 / (2 * math.pi * 0.02), 1e-3, "Ampere's law")
        self.assertEqual(self.value("A2", "=TURNS_BPHI(0.01;0.001;2000;2;2;0;0.0)"), 0.0)

    def test_sensitivity_of_a_missing_turn(self):
        got = self.value("A1", '=TURNS_SENSITIVITY(0.02;0.001;10;3;1.5;2;1;"turns")')
        # The missing turn's own loop field on the axis: mu0 I a^2 / (2 (a^2 + z^2)^1.5) (textbook).
        a, z = 0.0215, 0.0045
        self.assert_rel(got, -MU0 * 1.5 * a * a / (2 * (a * a + z * z) ** 1.5), 1e-13, "missing turn")
        shrink = self.value("A2", '=TURNS_SENSITIVITY(0.02;0.001;10;3;1.5;1;1;"turns";0;"uniform")')
        self.assertLess(shrink, 0)


if __name__ == "__main__":
    unittest.main()
