"""Coil-table ranges a careless user may give, in real Calc: a whole sheet, whole columns, a
range over two sheets, a table too long to read, error values inside a table.

A coil table is passed to the add-in as the range itself (a cell range parameter), so its width
and size are known before any cell is read. When tables were converted cell by cell by Calc
(an `any` parameter), =STACK_CHECK(A:AMJ) grew LibreOffice to 24 GB until the kernel killed it:
LibreOffice runs here under an address-space limit, so that such a regression fails this test
(with std::bad_alloc, or LibreOffice gone) instead of taking the machine's memory.
"""
import resource
import unittest

from e2e_support import ERR_ILLEGAL_ARGUMENT, CalcTestCase

ADDRESS_SPACE_LIMIT = 8 * 2**30  # bytes; LibreOffice 7.4 starts and works in far less
PEAK_GROWTH_LIMIT_MIB = 256  # a refused whole-sheet range costs a few MiB (bench/calc_ranges.py)
PAIR = [[0.1, 0.1, 0.0, -0.05, 10, 1.0], [0.1, 0.1, 0.0, 0.05, 10, 1.0]]  # two loops (invented)
WIDTH_MESSAGE = "the coil table needs 6 columns"


class WideRanges(CalcTestCase):
    @classmethod
    def setUpClass(cls):
        resource.setrlimit(resource.RLIMIT_AS, (ADDRESS_SPACE_LIMIT, ADDRESS_SPACE_LIMIT))  # inherited
        super().setUpClass()

    def setUp(self):
        super().setUp()
        self.sheet.getCellRangeByName("K1:P2").setDataArray(tuple(tuple(r) for r in PAIR))

    def text(self, where, formula):
        c = self.formula(where, formula)
        self.assertEqual(c.getError(), 0, f"{formula} gave Err:{c.getError()}")
        return c.getString()

    def peak_growth_mib(self, formula, where="H6"):
        """The formula's effect on LibreOffice's peak resident memory, in MiB."""
        pid = self.session.soffice_pid()

        def status(key):
            with open(f"/proc/{pid}/status") as f:
                return next(int(line.split()[1]) for line in f if line.startswith(key + ":"))

        with open(f"/proc/{pid}/clear_refs", "w") as f:
            f.write("5")  # peak := current
        before = status("VmRSS")
        cell = self.formula(where, formula)
        cell.getError()  # computed when first asked for
        return cell, (status("VmHWM") - before) / 1024

    def test_a_whole_sheet_table_is_refused_by_its_width_without_being_read(self):
        cell, growth = self.peak_growth_mib("=STACK_CHECK(A:AMJ)")
        self.assertEqual(cell.getError(), 0)
        self.assertIn(WIDTH_MESSAGE, cell.getString())
        self.assertIn("this range has 1024", cell.getString())
        self.assertLess(growth, PEAK_GROWTH_LIMIT_MIB, "LibreOffice's memory grew")
        cell, growth = self.peak_growth_mib("=STACK_BZ(A:AMJ;0)", "H7")
        self.assertEqual(cell.getError(), ERR_ILLEGAL_ARGUMENT)
        self.assertLess(growth, PEAK_GROWTH_LIMIT_MIB, "LibreOffice's memory grew")
        self.assertTrue(self.session.alive())

    def test_wrong_width_whole_columns_say_so(self):
        self.assertIn("this range has 20", self.text("H1", "=STACK_CHECK(K:AD)"))
        self.assert_error("=STACK_B(K:AD;0)")

    def test_whole_columns_of_the_right_width_read_to_the_last_filled_row(self):
        self.assertEqual(self.text("H1", "=STACK_CHECK(K:P)"), "OK: 2 coils (2 loops)")
        self.assertEqual(self.value("H2", "=STACK_BZ(K:P;0.01)"), self.value("H3", "=STACK_BZ(K1:P2;0.01)"))
        # Rows are still counted from the top of the range: a bad fourth row is "row 4".
        self.sheet.getCellRangeByName("K4:P4").setDataArray(((0.2, 0.1, 0.0, 0.0, 10, 1.0),))
        self.assertEqual(self.text("H4", "=STACK_CHECK(K:P)"), "row 4: outer radius must be >= inner radius")

    def test_a_table_longer_than_the_limit_is_refused(self):
        # One value 100,001 rows below the top: the range up to its last filled row is longer than
        # the 100,000 rows a table may have (addin/core/range_limits.hpp).
        self.sheet.getCellRangeByName("K100002").setValue(1.0)
        self.assert_error("=STACK_CHECK(K:P)", where="H1")
        self.assert_error("=STACK_BZ(K:P;0)", where="H2")
        self.sheet.getCellRangeByName("K100002").setString("")
        self.assertEqual(self.text("H1", "=STACK_CHECK(K:P)"), "OK: 2 coils (2 loops)")

    def test_a_table_over_two_sheets_is_an_error(self):
        # Calc passes only the first sheet of such a range: "OK: 2 coils" here would hide the bad
        # row on the second sheet.
        self.doc.Sheets.insertNewByName("Second", 1)
        second = self.doc.Sheets.getByName("Second")
        second.getCellRangeByName("K1:P2").setDataArray(((0.1, 0.1, 0.0, 0.0, 10, 1.0), (0.2, 0.1, 0.0, 0.0, 10, 1.0)))
        first = self.sheet.getName()
        self.assert_error(f"=STACK_CHECK(${first}.K1:$Second.P2)", where="H1")
        self.assert_error(f"=STACK_BZ(${first}.K1:$Second.P2;0)", where="H2")
        self.assert_error(f"=STACK_LMATRIX(${first}.K1:$Second.P2)", where="H3")
        # One sheet named at both ends is one sheet.
        self.assertEqual(self.text("H4", f"=STACK_CHECK(${first}.K1:${first}.P2)"), "OK: 2 coils (2 loops)")
        self.assertEqual(self.text("H5", "=STACK_CHECK($Second.K1:$Second.P2)"),
                         "row 2: outer radius must be >= inner radius")

    def test_an_error_value_in_a_table_is_an_error(self):
        # Calc's range object reads an error cell as blank; a row of blanks would be skipped.
        self.formula("K3", "=1/0")
        self.assert_error("=STACK_CHECK(K1:P3)", where="H1")
        self.assert_error("=STACK_BZ(K:P;0)", where="H2")

    def test_the_array_twin_takes_inline_arrays_and_function_results(self):
        self.sheet.getCellRangeByName("R1:W2").setArrayFormula("=PAIR_COILS(0.1;0.1;0;10;1)")
        in_cells = self.value("H1", "=STACK_BZ(R1:W2;0)")
        self.assertEqual(self.value("H2", "=STACK_BZ_ARRAY(PAIR_COILS(0.1;0.1;0;10;1);0)"), in_cells)
        typed = "{" + "|".join(";".join(repr(v) for v in row) for row in PAIR) + "}"
        self.assertEqual(self.value("H3", f"=STACK_BZ_ARRAY({typed};0.01)"), self.value("H4", "=STACK_BZ(K1:P2;0.01)"))


if __name__ == "__main__":
    unittest.main()
