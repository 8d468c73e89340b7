"""SOLENOID_*, COIL_*, STACK_* and STACK_CHECK in a real headless Calc with the built extension."""
import math
import unittest

from bad_input_check import check_family, load_cases
from e2e_support import ERR_DIV_ZERO, ERR_PARAMETER_LIST, ERR_VALUE, CalcTestCase, read_reference

MU0 = 1.25663706127e-6  # CODATA 2022


class FieldFunctionsInCalc(CalcTestCase):
    def test_solenoid_on_axis_typed_as_a_user_would(self):
        # Textbook on-axis field mu0 n I (cos a1 - cos a2) / 2 (Griffiths problem 5.11): 50 mm
        # radius, 200 mm, 500 turns, 2 A, at the centre and beyond an end.
        a, length, n, i = 0.05, 0.2, 500, 2.0
        for k, z in enumerate((0.0, 0.15)):
            h = length / 2
            want = MU0 * n / length * i / 2 * ((z + h) / math.hypot(z + h, a) - (z - h) / math.hypot(z - h, a))
            got = self.value(f"A{k + 1}", f"=SOLENOID_BZ(0.05;0.2;500;2;{z})")
            self.assert_rel(got, want, 2e-15, f"z={z}")
        self.assertEqual(self.value("B1", "=SOLENOID_BR(0.05;0.2;500;2;0.03;0)"), 0.0)
        self.assertEqual(self.cell("A1").getFormula(), "=ORG.COILWRIGHT.FUNCTIONS.SOLENOID_BZ(0.05;0.2;500;2;0)")

    def test_solenoid_agrees_with_mpmath_reference(self):
        # tests/reference/solenoid_field.csv (see its generator); inputs go in as cell values.
        rows = read_reference("solenoid_field.csv")
        for k, row in enumerate(rows):
            for col, key in enumerate(("radius_m", "length_m", "turns", "current_A", "z_m", "r_m")):
                self.sheet.getCellByPosition(col, k).setValue(float(row[key]))
            n = k + 1
            args = f"A{n};B{n};C{n};D{n};E{n};F{n}"
            bz = self.value(f"G{n}", f"=SOLENOID_BZ({args})")
            br = self.value(f"H{n}", f"=SOLENOID_BR({args})")
            b = self.value(f"I{n}", f"=SOLENOID_B({args})")
            self.assert_field_matches(row, bz, br, b)

    def test_coils_and_spirals_agree_with_mpmath_reference(self):
        # tests/reference/coil_field.csv: thick rows through COIL_*, flat spirals as one-row tables.
        rows = read_reference("coil_field.csv")
        for k, row in enumerate(rows):
            n = k + 1
            vals = [float(row[key]) for key in ("inner_m", "outer_m", "length_m", "turns", "current_A", "z_m", "r_m")]
            label = f"{row['kind']} {row['case']} z={row['z_m']} r={row['r_m']}"
            bz_ref, br_ref = float(row["bz_T"]), float(row["br_T"])
            mag = math.hypot(bz_ref, br_ref)
            if row["kind"] == "thick":
                for col, v in enumerate(vals):
                    self.sheet.getCellByPosition(col, k).setValue(v)
                args = f"A{n};B{n};C{n};D{n};E{n};F{n};G{n}"
                bz = self.value(f"H{n}", f"=COIL_BZ({args})")
                br = self.value(f"I{n}", f"=COIL_BR({args})")
            else:
                a1, a2, _, turns, current, z, r = vals
                for col, v in enumerate((a1, a2, 0.0, 0.0, turns, current, z, r)):
                    self.sheet.getCellByPosition(col, k).setValue(v)
                bz = self.value(f"J{n}", f"=STACK_BZ(A{n}:F{n};G{n};H{n})")
                br = self.value(f"K{n}", f"=STACK_BR(A{n}:F{n};G{n};H{n})")
            self.assertLessEqual(abs(bz - bz_ref), 1e-10 * max(abs(bz_ref), 1e-2 * mag), label)
            self.assertLessEqual(abs(br - br_ref), 1e-10 * (abs(br_ref) if br_ref else mag), label)

    def test_field_map_through_a_thick_winding_is_one_array_formula(self):
        # z down a column, r along a row, crossing the winding (50..80 mm, 100 mm long): every
        # cell is a finite number, inside the winding too.
        got = self.array("A1:E3", "=COIL_BZ(0.05;0.08;0.1;800;3;{0|0.03|0.06};{0;0.04;0.06;0.08;0.1})")
        for row in got:
            for v in row:
                self.assertIsInstance(v, float)
                self.assertTrue(math.isfinite(v))
        self.assertGreater(got[0][0], got[0][3])  # the field falls from the bore across the winding

    def test_stack_table_in_cells_equals_its_rows(self):
        # Superposition: a loop, a thin solenoid and a thick coil in one table (with a blank row)
        # equal the sum of the single-coil functions at their centres.
        table = [(0.1, 0.1, 0.0, -0.05, 10, 1.0), None, (0.04, 0.04, 0.12, 0.02, 300, -0.5),
                 (0.05, 0.06, 0.03, -0.12, 200, 0.75)]
        for k, row in enumerate(table):
            for col, v in enumerate(row or ()):
                self.sheet.getCellByPosition(col, k).setValue(v)
        zs = [0.0, 0.03, -0.2]
        self.put_column(7, 0, zs)
        got = self.array("I1:I3", "=STACK_BZ(A1:F4;H1:H3;0.02)")
        for k, z in enumerate(zs):
            want = (self.value("K1", f"=LOOP_BZ(0.1;10;1;{z}+0.05;0.02)")
                    + self.value("K2", f"=SOLENOID_BZ(0.04;0.12;300;-0.5;{z}-0.02;0.02)")
                    + self.value("K3", f"=COIL_BZ(0.05;0.06;0.03;200;0.75;{z}+0.12;0.02)"))
            self.assert_rel(got[k][0], want, 1e-14, f"z={z}")
        self.assertEqual(self.text("L1", "=STACK_CHECK(A1:F4)"), "OK: 3 coils (1 loop, 1 thin solenoid, 1 thick coil)")

    def test_stack_check_names_the_bad_row_as_text(self):
        # Tables typed as inline arrays go to the array twins (NAME_ARRAY).
        self.assertEqual(self.text("A1", "=STACK_CHECK_ARRAY({0.1;0.1;0;0;10;1|0.2;0.1;0;0;10;1})"),
                         "row 2: outer radius must be >= inner radius")
        self.assertEqual(self.text("A2", '=STACK_CHECK_ARRAY({0.1;0.1;0;0;"ten";1})'), "row 1: turns is text, not a number")
        self.assertIn("6 columns", self.text("A3", "=STACK_CHECK_ARRAY({0.1;0.1;0;0;10})"))
        # The same tables are error cells for the field functions.
        self.assert_error("=STACK_BZ_ARRAY({0.1;0.1;0;0;10;1|0.2;0.1;0;0;10;1};0)")
        self.assert_error("=STACK_CHECK_ARRAY(5)")
        self.assert_error('=STACK_CHECK_ARRAY("A1:F3")')
        self.assert_error("=STACK_CHECK_ARRAY()")
        self.assert_error("=STACK_CHECK_ARRAY(1/0)", ERR_DIV_ZERO)
        # In cells, the same explanations.
        self.put_column(0, 10, [0.1, 0.1])
        self.put_column(1, 10, [0.1, 0.1])
        self.put_column(2, 10, [0, 0])
        self.put_column(3, 10, [0, 0])
        self.put_column(4, 10, [10, "ten"])
        self.put_column(5, 10, [1, 1])
        self.assertEqual(self.text("H1", "=STACK_CHECK(A11:F12)"), "row 2: turns is text, not a number")
        self.assertIn("6 columns", self.text("H2", "=STACK_CHECK(A11:E12)"))

    def test_a_table_function_takes_cell_ranges_only(self):
        # Its table parameter is a cell range: Calc itself refuses anything else before the
        # add-in is called (Err:504), and an error value keeps its own code.
        for text in ("=STACK_CHECK(5)", '=STACK_CHECK("A1:F3")', "=STACK_CHECK({0.1;0.1;0;0;10;1})",
                     "=STACK_BZ(PAIR_COILS(0.1;0.1;0;10;1);0)", "=STACK_CHECK(A1:F2*1)"):
            with self.subTest(text=text):
                self.assertIn(self.formula("Z1", text).getError(), (ERR_PARAMETER_LIST, ERR_VALUE))
        self.assert_error("=STACK_CHECK(1/0)", ERR_DIV_ZERO)
        self.assert_error("=STACK_BZ(;0)")  # the table left out
        self.assert_error("=STACK_CHECK(Z100)")  # a single cell is no table

    def test_bad_inputs_give_error_cells(self):
        # The domain-specific bad inputs listed in tests/e2e/bad_inputs/{solenoid,coil,stack}.py.
        for family in ("solenoid", "coil", "stack"):
            check_family(self, family, list(load_cases(family)))

    def text(self, name, formula):
        c = self.formula(name, formula)
        self.assertEqual(c.getError(), 0, f"{formula} gave Err:{c.getError()}")
        return c.getString()


if __name__ == "__main__":
    unittest.main()
