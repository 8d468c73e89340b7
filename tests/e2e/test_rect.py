"""RECT_* and RECTPAIR_* in a real headless Calc with the built extension installed."""
import math
import unittest

from bad_input_check import check_family
from e2e_support import CalcTestCase, read_reference

MU0 = 1.25663706127e-6  # CODATA 2022
NAMES = ["RECT_BX", "RECT_BY", "RECT_BZ", "RECT_B", "RECTPAIR_BX", "RECTPAIR_BY", "RECTPAIR_BZ", "RECTPAIR_B",
         "RECTPAIR_SPACING"]


class RectFunctionsInCalc(CalcTestCase):
    def test_square_centre_typed_as_a_user_would(self):
        # Textbook centre field of a square loop of side s: 2 sqrt(2) mu0 N I / (pi s).
        got = self.value("A1", "=RECT_BZ(0.5;0.5;10;2;0;0;0)")
        self.assert_rel(got, 2 * math.sqrt(2) * MU0 * 10 * 2 / (math.pi * 0.5), 2e-15, "centre")
        self.assertEqual(self.value("A2", "=RECT_BX(0.5;0.5;10;2;0;0;0.3)"), 0.0)
        self.assertEqual(self.value("A3", "=RECT_B(0.5;0.5;10;2;0;0;0)"), got)
        self.assertEqual(self.cell("A1").getFormula(), "=ORG.COILWRIGHT.FUNCTIONS.RECT_BZ(0.5;0.5;10;2;0;0;0)")

    def test_agrees_with_mpmath_reference(self):
        # tests/reference/rect_field.csv: mpmath Biot-Savart line integrals at 40 digits.
        rows = read_reference("rect_field.csv")
        worst = 0.0
        for i, row in enumerate(rows):
            keys = ("width_m", "height_m", "turns", "current_A", "x_m", "y_m", "z_m")
            for col, key in enumerate(keys):
                self.sheet.getCellByPosition(col, i).setValue(float(row[key]))
            n = i + 1
            args = f"A{n};B{n};C{n};D{n};E{n};F{n};G{n}"
            ref = [float(row[k]) for k in ("bx_T", "by_T", "bz_T")]
            mag = math.sqrt(sum(v * v for v in ref))
            for col, name, want in (("H", "RECT_BX", ref[0]), ("I", "RECT_BY", ref[1]), ("J", "RECT_BZ", ref[2]),
                                    ("K", "RECT_B", mag)):
                got = self.value(f"{col}{n}", f"={name}({args})")
                label = f"{name} {row['case']} at {row['x_m']},{row['y_m']},{row['z_m']}"
                if want == 0.0:
                    self.assertEqual(got, 0.0, label)
                    continue
                scale = mag if row["case"] == "sign change" and abs(want) < 0.1 * mag else abs(want)
                self.assertLessEqual(abs(got - want), 1e-14 * scale, label)
                worst = max(worst, abs(got - want) / scale)
        print(f"\nrect field through Calc: worst relative error {worst:.2e} over {len(rows)} points")

    def test_axial_table_and_map_are_one_array_formula(self):
        zs = [i * 0.05 for i in range(-10, 11)]
        self.put_column(0, 0, zs)
        got = self.array("B1:B21", "=RECT_BZ(0.6;0.4;1;1;0;0;A1:A21)")
        w, h = 0.6, 0.4
        for z, row in zip(zs, got):
            # On-axis closed form, summed side by side.
            A, B = w * w / 4, h * h / 4
            want = MU0 * w * h / (4 * math.pi * math.sqrt(A + B + z * z)) * (1 / (A + z * z) + 1 / (B + z * z))
            self.assert_rel(row[0], want, 4e-15, f"z={z}")
        # x along a row, z down a column.
        grid = self.array("D1:G3", "=RECT_BX(0.6;0.4;1;1;{0.1;0.2;-0.1;-0.2};0.05;{-0.1|0|0.1})")
        for j in range(4):
            self.assertEqual(grid[1][j], 0.0)              # loop plane: Bx = 0
            self.assertEqual(grid[0][j], -grid[2][j])      # odd in z
        self.assertEqual(grid[0][0], -grid[0][2])          # odd in x

    def test_pair_spacing_and_uniformity(self):
        # Square pair: 0.5445 s (from memory, A. H. Firester, Rev. Sci. Instrum. 37, 1264 (1966));
        # our mpmath value 0.5445056430...
        s = self.value("A1", "=RECTPAIR_SPACING(1;1)")
        self.assertAlmostEqual(s, 0.5445056430202056, delta=1e-15)
        # At that spacing Bz is flat to fourth order: 1 % of the side off the centre it changes by
        # about 1e-7 (the fourth-order term); at a spacing 10 % larger by about 1e-5 (second order).
        b0 = self.value("A2", "=RECTPAIR_BZ(1;1;A1;1;1;0;0;0)")
        b1 = self.value("A3", "=RECTPAIR_BZ(1;1;A1;1;1;0;0;0.01)")
        self.assertLess(abs(b1 - b0) / b0, 1e-6)
        c0 = self.value("B2", "=RECTPAIR_BZ(1;1;1.1*A1;1;1;0;0;0)")
        c1 = self.value("B3", "=RECTPAIR_BZ(1;1;1.1*A1;1;1;0;0;0.01)")
        self.assertGreater(abs(c1 - c0) / c0, 1e-5)
        self.assertEqual(self.value("A4", "=RECTPAIR_B(1;1;A1;1;1;0;0;0)"), b0)
        self.assertEqual(self.value("A5", "=RECTPAIR_BY(1;1;A1;1;1;0;0;0.2)"), 0.0)
        self.assertEqual(self.value("A6", "=RECTPAIR_BX(1;1;A1;1;1;0;0.1;0.2)"), 0.0)

    def test_bad_inputs(self):
        check_family(self, "rect", NAMES)

    def test_bad_elements_of_an_array_are_error_cells(self):
        self.put_column(0, 0, [0.0, -0.2, "x", 0.05])      # y: second row is on the side y = -0.2
        got = self.array("B1:B4", "=RECT_BZ(0.6;0.4;1;1;0.1;A1:A4;0)")
        self.assertGreater(got[0][0], 0)
        self.assertEqual(got[1][0], ("error", 502))
        self.assertEqual(got[2][0], ("error", 502))
        self.assertGreater(got[3][0], 0)


if __name__ == "__main__":
    unittest.main()
