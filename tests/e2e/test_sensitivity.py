"""STACK_SENSITIVITY in real Calc: a whole sensitivity matrix from one array formula."""
import unittest

from bad_input_check import check_family
from e2e_support import CalcTestCase

MU0 = 1.25663706127e-6  # CODATA 2022


class Sensitivity(CalcTestCase):
    def test_matrix_of_rows_by_parameters(self):
        table = [[0.3, 0.3, 0, -0.15, 50, 1], [0.3, 0.3, 0, 0.15, 50, 1]]
        for r, row in enumerate(table):
            for c, v in enumerate(row):
                self.sheet.getCellByPosition(c, r).setValue(v)
        got = self.array("H1:J2", '=STACK_SENSITIVITY(A1:F2;{1|2};{"radius";"position";"turns"})')
        # Turns: each loop's share of the centre field per turn, mu0 I R^2 / (2 (R^2 + (R/2)^2)^(3/2))
        # (Jackson 5.5, on-axis loop field at distance R/2).
        per_turn = MU0 * 0.09 / (2 * (0.09 + 0.0225) ** 1.5)
        self.assert_rel(got[0][2], per_turn, 1e-14, "turns")
        self.assertAlmostEqual(got[0][1] / got[1][1], -1.0, places=12)   # mirror symmetry
        self.assertLess(got[0][0], 0)  # a bigger loop gives less field at the centre
        self.assertAlmostEqual(got[0][0] / got[1][0], 1.0, places=12)
        shrink = self.value("L1", '=STACK_SENSITIVITY(A1:F2;1;"position";"uniform")')
        self.assertLess(shrink, 0)

    def test_bad_inputs(self):
        check_family(self, "sensitivity", ["STACK_SENSITIVITY"])


if __name__ == "__main__":
    unittest.main()
