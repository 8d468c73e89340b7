"""STACK_DNBZ / STACK_UNIFORM_Z / STACK_LINEAR_Z and the pair functions in real Calc."""
import math
import unittest

from bad_input_check import check_family
from e2e_support import CalcTestCase

MU0 = 1.25663706127e-6  # CODATA 2022
R, N, I = 0.3, 50, 1.0
HELMHOLTZ = "{0.3;0.3;0;-0.15;50;1|0.3;0.3;0;0.15;50;1}"


def loop_axis(z, a=R, turns=N, current=I):
    """Textbook on-axis loop field (Jackson 5.5), independent of the add-in."""
    return MU0 * turns * current * a * a / (2 * (a * a + z * z) ** 1.5)


class AxisAndPairs(CalcTestCase):
    def test_helmholtz_pair_from_an_inline_table(self):
        b0 = (4 / 5) ** 1.5 * MU0 * N * I / R  # textbook Helmholtz centre field
        self.assert_rel(self.value("A1", f"=STACK_DNBZ_ARRAY({HELMHOLTZ};0)"), b0, 1e-14, "B0")
        self.assertLess(abs(self.value("A2", f"=STACK_DNBZ_ARRAY({HELMHOLTZ};2)")) * R * R / b0, 1e-13)
        self.assert_rel(self.value("A3", "=HELMHOLTZ_B0(0.3;50;1)"), b0, 1e-15, "HELMHOLTZ_B0")
        # Orders as a range: one call, a column of derivatives.
        got = self.array("B1:B5", f"=STACK_DNBZ_ARRAY({HELMHOLTZ};{{0|1|2|3|4}})")
        self.assert_rel(got[4][0], -144 / 125 * 24 * b0 / R ** 4, 1e-12, "fourth derivative")
        self.assertEqual(got[1][0], 0.0)

    def test_table_from_a_sheet_range_with_a_blank_row(self):
        rows = [[0.3, 0.3, 0, -0.15, 50, 1], None, [0.3, 0.3, 0, 0.15, 50, 1]]
        for r, row in enumerate(rows):
            if row:
                for c, v in enumerate(row):
                    self.sheet.getCellByPosition(c, r).setValue(v)
        with_blank = self.value("H1", "=STACK_DNBZ(A1:F3;0;0.02)")
        self.assert_rel(with_blank, loop_axis(0.02 - 0.15) + loop_axis(0.02 + 0.15), 1e-14, "blank row")

    def test_uniform_region_matches_a_direct_search(self):
        tol = 1e-3
        b0 = loop_axis(-0.15) + loop_axis(0.15)
        lo, hi = 0.0, R
        for _ in range(200):
            mid = (lo + hi) / 2
            if abs((loop_axis(mid - 0.15) + loop_axis(mid + 0.15)) / b0 - 1) > tol:
                hi = mid
            else:
                lo = mid
        self.assert_rel(self.value("A1", f"=STACK_UNIFORM_Z_ARRAY({HELMHOLTZ};0.001)"), lo, 1e-9, "uniform half-length")

    def test_pair_geometry(self):
        self.assert_rel(self.value("A1", "=PAIR_SPACING(0.25;0.25;0)"), 0.25, 1e-14, "Helmholtz spacing")
        s = self.value("A2", "=GRADPAIR_SPACING(0.25;0.25;0)")
        self.assert_rel(s, math.sqrt(3) * 0.25, 1e-14, "gradient pair spacing")
        # Gradient of opposed loops: 3 mu0 N I R^2 (s/2) / (R^2 + s^2/4)^(5/2) (derivative of Jackson 5.5).
        g = 3 * MU0 * 40 * 2 * 0.25 ** 2 * (s / 2) / (0.25 ** 2 + s * s / 4) ** 2.5
        self.assert_rel(self.value("A3", f"=GRADPAIR_GRADIENT(0.25;0.25;0;40;2;{s!r})"), g, 1e-13, "gradient")
        self.assert_rel(self.value("A4", "=PAIR_B0(0.3;0.3;0;50;1;0.3)"), (4 / 5) ** 1.5 * MU0 * 50 / 0.3, 1e-14, "pair B0")
        # The linear region of that gradient pair exists and is a fraction of the radius.
        h = self.value("A5", f"=STACK_LINEAR_Z_ARRAY({{0.25;0.25;0;{-s / 2!r};40;-2|0.25;0.25;0;{s / 2!r};40;2}};0.01)")
        self.assertTrue(0.02 < h < 0.25, h)

    def test_bad_inputs(self):
        check_family(self, "stack_axis", ["STACK_DNBZ", "STACK_UNIFORM_Z", "STACK_LINEAR_Z"])
        check_family(self, "pair", ["HELMHOLTZ_B0", "PAIR_SPACING", "PAIR_B0", "GRADPAIR_SPACING", "GRADPAIR_GRADIENT"])


if __name__ == "__main__":
    unittest.main()
