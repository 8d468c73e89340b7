"""LOOP_BZ / LOOP_BR / LOOP_B in a real headless Calc with the built extension installed."""
import unittest

from e2e_support import CalcTestCase, ERR_DIV_ZERO, ERR_OVERFLOW, read_reference

MU0 = 1.25663706127e-6  # CODATA 2022


class LoopFunctionsInCalc(CalcTestCase):
    def test_centre_field_typed_as_a_user_would(self):
        # Textbook centre field mu0 N I / (2 a) (Griffiths; Jackson 5.5): 0.1 m, 10 turns, 2 A.
        got = self.value("A1", "=LOOP_BZ(0.1;10;2;0)")
        self.assert_rel(got, MU0 * 10 * 2 / (2 * 0.1), 1e-15, "centre")
        # The optional r may be given, and LOOP_B equals |Bz| on the axis.
        self.assertEqual(self.value("A2", "=LOOP_BZ(0.1;10;2;0;0)"), got)
        self.assertEqual(self.value("A3", "=LOOP_B(0.1;10;2;0)"), got)
        self.assertEqual(self.value("A4", "=LOOP_BR(0.1;10;2;0.3;0)"), 0.0)
        # Saved under the fixed programmatic name.
        self.assertEqual(self.cell("A1").getFormula(), "=ORG.COILWRIGHT.FUNCTIONS.LOOP_BZ(0.1;10;2;0)")

    def test_agrees_with_mpmath_reference_at_hard_points(self):
        # tests/reference/loop_field.csv: mpmath Biot-Savart quadrature at 40 digits (see its
        # generator). Inputs go in as cell values so they reach the add-in bit-exact.
        rows = read_reference("loop_field.csv")
        for i, row in enumerate(rows):
            for col, key in enumerate(("radius_m", "turns", "current_A", "z_m", "r_m")):
                self.sheet.getCellByPosition(col, i).setValue(float(row[key]))
            n = i + 1
            bz = self.value(f"F{n}", f"=LOOP_BZ(A{n};B{n};C{n};D{n};E{n})")
            br = self.value(f"G{n}", f"=LOOP_BR(A{n};B{n};C{n};D{n};E{n})")
            b = self.value(f"H{n}", f"=LOOP_B(A{n};B{n};C{n};D{n};E{n})")
            self.assert_field_matches(row, bz, br, b)

    def test_axial_table_is_one_array_formula(self):
        zs = [i * 0.01 for i in range(-20, 21)]
        self.put_column(0, 0, zs)
        got = self.array("B1:B41", "=LOOP_BZ(0.2;5;1;A1:A41)")
        a = 0.2
        for z, row in zip(zs, got):
            self.assert_rel(row[0], MU0 * 5 * a * a / (2 * (a * a + z * z) ** 1.5), 2e-15, f"z={z}")

    def test_field_map_column_by_row(self):
        # z down a column, r along a row: one call fills the whole map.
        got = self.array("C1:F3", "=LOOP_BR(0.5;1;1;{-0.1|0|0.1};{0.1;0.2;0.3;0.4})")
        self.assertEqual(len(got), 3)
        self.assertEqual(len(got[0]), 4)
        for j in range(4):
            self.assertEqual(got[1][j], 0.0)            # loop plane: Br = 0
            self.assertEqual(got[0][j], -got[2][j])     # odd in z
            self.assertNotEqual(got[2][j], 0.0)

    def test_bad_input_gives_error_cells(self):
        for text in ("=LOOP_BZ(0;1;1;0)", "=LOOP_BZ(-0.1;1;1;0)", "=LOOP_BZ(0.1;-1;1;0)",
                     "=LOOP_BZ(0.1;1;1;0;-0.01)", '=LOOP_BZ(0.1;1;"1";0)', '=LOOP_BZ("x";1;1;0)',
                     "=LOOP_BZ(0.1;;1;0)", "=LOOP_BZ(0.1;1;1)", "=LOOP_BR(0.1;1;1;0.2)",
                     "=LOOP_BZ(0.1;1;1;0;0.1)",              # on the filament
                     "=LOOP_B(0.1;1;1;0;0.1)", "=LOOP_BR(0.1;1;1;0;0.1)",
                     "=LOOP_BZ(0.1;1E10;1E308;0;0.05)",        # overflows: an error, not inf
                     "=LOOP_BZ(0.1;1;1;{1;2};{1|2|3})*0+LOOP_BZ(0.1;1;1;{1;2;3};{1;2})"):
            with self.subTest(text=text):
                self.assert_error(text, where="A1")
        # Errors of other cells and expressions propagate unchanged.
        self.assert_error("=LOOP_BZ(1/0;1;1;0)", ERR_DIV_ZERO)
        self.assert_error("=LOOP_BZ(1E308*10;1;1;0)", ERR_OVERFLOW)
        # A huge but finite answer is a number, not an error.
        self.assert_rel(self.value("B2", "=LOOP_BZ(0.1;1;1E300;0)"), MU0 * 1e300 / 0.2, 1e-15, "huge current")

    def test_bad_elements_of_an_array_are_error_cells_the_rest_computed(self):
        self.put_column(0, 0, [0.0, 0.01, "text", None, 0.0])
        self.put_column(1, 0, [0.05, 0.05, 0.05, 0.05, 0.1])   # last row: on the wire
        got = self.array("C1:C5", "=LOOP_BZ(0.1;1;1;A1:A5;B1:B5)")
        self.assertGreater(got[0][0], 0)
        self.assertGreater(got[1][0], 0)
        self.assertEqual(got[2][0], ("error", 502))
        self.assertEqual(got[3][0], ("error", 502))
        self.assertEqual(got[4][0], ("error", 502))

    def test_still_right_after_many_errors(self):
        for i in range(200):
            self.formula(f"A{i + 1}", "=LOOP_BZ(0.1;1;1;0;0.1)")
        self.assert_rel(self.value("B1", "=LOOP_BZ(0.1;10;2;0)"), MU0 * 10 * 2 / 0.2, 1e-15, "after errors")


if __name__ == "__main__":
    unittest.main()
