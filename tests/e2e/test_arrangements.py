"""Ready-made coil tables in real Calc, as arrays and nested in STACK_ functions."""
import unittest

from bad_input_check import check_family
from e2e_support import CalcTestCase

MU0 = 1.25663706127e-6  # CODATA 2022


class Arrangements(CalcTestCase):
    def test_helmholtz_table_fills_cells_and_nests(self):
        got = self.array("A1:F2", "=PAIR_COILS(0.2;0.2;0;10;2)")
        self.assertEqual(got[0][:3], [0.2, 0.2, 0.0])
        self.assert_rel(got[1][3] - got[0][3], 0.2, 1e-14, "Helmholtz spacing")
        b0 = self.value("H1", "=STACK_BZ_ARRAY(PAIR_COILS(0.2;0.2;0;10;2);0)")
        self.assert_rel(b0, (4 / 5) ** 1.5 * MU0 * 10 * 2 / 0.2, 1e-14, "Helmholtz centre field")  # textbook

    def test_maxwell_table_is_flat_to_fourth_order(self):
        d0 = self.value("A1", "=STACK_DNBZ_ARRAY(MAXWELL_COILS(0.5;64;1);0)")
        d2 = self.value("A2", "=STACK_DNBZ_ARRAY(MAXWELL_COILS(0.5;64;1);2)")
        d4 = self.value("A3", "=STACK_DNBZ_ARRAY(MAXWELL_COILS(0.5;64;1);4)")
        self.assertLess(abs(d2) * 0.25 / d0, 1e-13)
        self.assertLess(abs(d4) * 0.0625 / d0, 1e-12)

    def test_bad_inputs(self):
        check_family(self, "arrangements", ["PAIR_COILS", "GRADPAIR_COILS", "MAXWELL_COILS"])


if __name__ == "__main__":
    unittest.main()
