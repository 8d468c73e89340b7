"""Cells that once froze LibreOffice (issue: nothing a user types may freeze or kill it), typed
into real Calc. Each must come back as a value or an error cell; the time each takes is printed
by bench/calc_long_cells.py (speed is measured there, not asserted here)."""
import unittest

from e2e_support import CalcTestCase

# Found in real Calc: the sheet kernel's copy of the elliptic-integral iteration had no step cap,
# and a 1e308 m solenoid sent it spinning for ever (no answer after 120 s).
SOLENOID_HANG = "=SOLENOID_BZ(1E308;2;1;1;1+2^-51;1E308)"

# Single cells that held Calc for 10-17 s (thick-coil force over 3999 points, the thick-coil
# field over 2 million points within a micrometre of a winding corner, inductance over 3999
# cells). The thick-coil inductance and force are now closed forms under one angle integral
# (tens of microseconds per element): those cells return their values; the field cell is still
# ended by the work bound or the call deadline with an error.
FAST_NOW = [
    "=SUMPRODUCT(COIL_FZ(0.05;0.07;0.02;100;1;0.05;0.07;0.02;100;1;0.05+ROW($A$1:$A$3999)*1E-7))",
    "=SUMPRODUCT(COIL_L(0.05;0.08;0.1+ROW($A$1:$A$3999)*1E-6;800))",
]
LONG_CELLS = [
    FAST_NOW[0],
    "=SUMPRODUCT(COIL_B(0.05;0.08;0.1;800;3;0.05+ROW($A$1:$A$2000)*1E-9;0.08+COLUMN($A$1:$ALL$1)*1E-9))",
    FAST_NOW[1],
    # The real turns of a 100000-turn winding at 400 points (about 50 ms a point), and a turn's
    # uniform-region sensitivity for 100 turns of a 4975-turn winding: ended by the deadline or
    # refused by the work bound.
    "=SUMPRODUCT(TURNS_BZ(0.05;0.0005;1000;100;1;ROW($A$1:$A$400)*1E-4;0.01))",
    '=SUMPRODUCT(TURNS_SENSITIVITY(0.05;0.0005;100;50;1;1;ROW($A$1:$A$100);"position";1E-5;"uniform"))',
]


class LongCells(CalcTestCase):
    def assert_value_or_error(self, formula):
        cell = self.formula("A1", formula)
        self.assertTrue(cell.getError() in (0, 502, 523), f"{formula} gave Err:{cell.getError()}")
        if cell.getError() == 0:
            self.assertTrue(abs(cell.getValue()) < float("inf"))
        self.assertTrue(self.session.alive(), f"LibreOffice died on {formula}")
        return cell

    def test_the_solenoid_that_froze_calc_is_an_error(self):
        cell = self.assert_value_or_error(SOLENOID_HANG)
        self.assertEqual(cell.getError(), 502)
        reason = self.formula("B1", '=CALL_CHECK("SOLENOID_BZ";1E308;2;1;1;1+2^-51;1E308)').getString()
        self.assertTrue(reason.startswith("Err:502: "), reason)

    def test_cells_that_held_calc_for_seconds_come_back(self):
        for formula in LONG_CELLS:
            with self.subTest(formula=formula):
                self.assert_value_or_error(formula)

    def test_thick_coil_inductance_and_force_over_thousands_of_cells_return_values(self):
        # Within the deadline now: values, not its error. The sums are checked against the
        # single cells at the middle of the range (a smooth function of the varied argument: the
        # sum of 3999 elements lies within 1e-3 of 3999 times the middle element).
        middle = {FAST_NOW[0]: "=COIL_FZ(0.05;0.07;0.02;100;1;0.05;0.07;0.02;100;1;0.05+2000*1E-7)",
                  FAST_NOW[1]: "=COIL_L(0.05;0.08;0.1+2000*1E-6;800)"}
        for formula in FAST_NOW:
            with self.subTest(formula=formula):
                cell = self.assert_value_or_error(formula)
                self.assertEqual(cell.getError(), 0, formula)
                single = self.formula("B1", middle[formula])
                self.assertEqual(single.getError(), 0)
                self.assertLess(abs(cell.getValue() / (3999 * single.getValue()) - 1), 1e-3)


if __name__ == "__main__":
    unittest.main()
