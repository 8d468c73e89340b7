"""CALL_CHECK in real Calc: the reason behind every error cell, in words, from the same call."""
import unittest

from e2e_support import CalcTestCase


class CallCheck(CalcTestCase):
    def text(self, name, formula):
        cell = self.formula(name, formula)
        return cell.getString()

    def test_a_point_on_the_filament_is_an_error_and_says_so(self):
        self.assert_error("=LOOP_BZ(0.1;10;2;0;0.1)")
        reason = self.text("A1", '=CALL_CHECK("LOOP_BZ";0.1;10;2;0;0.1)')
        self.assertTrue(reason.startswith("Err:502: "), reason)
        self.assertIn("filament", reason)

    def test_a_good_call_is_ok_with_its_value(self):
        # mu0 N I / (2 a) = 1.2566e-4 T at the centre (any electromagnetism text).
        self.assertTrue(self.text("A1", '=CALL_CHECK("LOOP_BZ";0.1;10;2;0)').startswith("OK: 0.000125663"))

    def test_thermal_runaway_says_so(self):
        # 20 A through 1 ohm cooled by 0.01 m^2 at 10 W/(m^2 K) heats without bound.
        self.assert_error("=COIL_HOT_TEMPERATURE(1;20;0.01)")
        reason = self.text("A1", '=CALL_CHECK("COIL_HOT_TEMPERATURE";1;20;0.01)')
        self.assertTrue(reason.startswith("Err:502: thermal runaway"), reason)

    def test_a_range_call_names_its_first_failing_element(self):
        for row, z in enumerate((0.05, 0, 0), start=1):
            self.formula(f"B{row}", f"={z}")
        reason = self.text("A1", '=CALL_CHECK("LOOP_BR";0.1;10;2;B1:B3;0.1)')
        self.assertTrue(reason.startswith("Err:502: element (row 2, column 1) of 3 x 1: "), reason)
        self.assertIn("(2 of 3 elements fail)", reason)

    def test_a_coil_table_in_cells_is_explained_by_row(self):
        for col, v in zip("CDEFGH", (0.2, 0.1, 0, 0, 10, 1)):  # outer radius below inner
            self.formula(f"{col}1", f"={v}")
        self.assert_error("=STACK_BZ(C1:H1;0)")
        reason = self.text("A1", '=CALL_CHECK("STACK_BZ";C1:H1;0)')
        self.assertTrue(reason.startswith("Err:502: row 1: outer radius"), reason)

    def test_a_name_that_is_no_function_is_explained(self):
        self.assertEqual(self.text("A1", '=CALL_CHECK("LOOP_BQ";1)'), 'no Coilwright function is named "LOOP_BQ"')


if __name__ == "__main__":
    unittest.main()
