"""Bad input over EVERY catalogue function and EVERY argument, typed into a real headless Calc.

For each function in idl/functions/*.toml the cases in tests/e2e/bad_inputs/*.py give a valid
call and the bad values specific to each argument's domain. This runner adds, for every argument,
the generic bad values (text, a number as text, the argument left empty or the call cut short,
an error from another cell, an overflowing expression, a NaN-producing expression) and checks:
the valid call gives a number (or text for a text function); every bad variant gives an error
cell, never a number; ranges of mismatched shapes, ranges with blanks, text and errors, and huge
ranges give errors (or are computed) without hanging; LibreOffice stays up; and the valid call
afterwards gives exactly the same value; and CALL_CHECK with the same arguments gives the reason
in words (a bad value of one argument: a reason that names that argument), or the same error
cell where Calc refuses the arguments before any add-in sees them (an error in a referenced
cell, an overflowing expression). A catalogue function without cases FAILS the run, so a
new function cannot slip through. Many formulas go into one sheet per function and are
calculated together, so the whole matrix costs one LibreOffice start.

A function with a coil table is run twice: as itself, whose table is a cell range (the runner
writes every inline-array table of the cases into cells and passes its reference), and as its
array twin NAME_ARRAY, which takes the tables as the cases write them.

Keys of a case besides good, bad and bad_calls: "text": True for a function that returns text;
"shaped": True for one whose result has its own shape (single values besides its table);
"table_row_arg": i when argument i numbers the rows of the table by position in the range.
"""
import importlib.util
import math
import pathlib
import time
import unittest

from bad_input_check import TableCells, callables_of, column_name, parse_inline_array
from catalogue import load as load_catalogue
from e2e_support import CalcTestCase

HERE = pathlib.Path(__file__).resolve().parent
IDL_DIR = HERE.parents[1] / "idl"
CASES_DIR = HERE / "bad_inputs"

# Calc's FormulaResultType2 (com.sun.star.sheet.FormulaResult): VALUE 1, STRING 2, ERROR 4.
RESULT_VALUE, RESULT_STRING, RESULT_ERROR = 1, 2, 4

ERROR_CELL = "$AMJ$1"  # =1/0 on every sheet: the error a bad argument refers to
ERROR_CELL_NA = "$AMJ$2"  # =NA()
BLANK_CELL = "$AMJ$3"  # never written
GENERIC_BAD = [
    ("text", '"abc"'),
    ("number as text", '"1"'),
    ("error in the referenced cell", ERROR_CELL),
    ("#N/A in the referenced cell", ERROR_CELL_NA),
    ("overflowing expression", "1E308*10"),
    ("NaN-producing expression", "SQRT(-1)"),
]


def load_cases():
    """Every CASES dict of bad_inputs/*.py, merged; a function listed twice is an error."""
    cases = {}
    for path in sorted(CASES_DIR.glob("*.py")):
        spec = importlib.util.spec_from_file_location(f"bad_inputs_{path.stem}", path)
        module = importlib.util.module_from_spec(spec)
        spec.loader.exec_module(module)
        for name, case in module.CASES.items():
            if name in cases:
                raise ValueError(f"{path.name}: {name} has cases in two files")
            cases[name] = dict(case, source=path.name)
    return cases


def call(name, args):
    return f"={name}({';'.join(args)})"


def callables(catalogue):
    """(name as typed, catalogue entry, tables given as cell ranges?) for every function and
    every array twin."""
    for fn in catalogue.values():
        yield from callables_of(fn)


def scalar_variants(fn, case, name=None, bind=list):
    """(label, formula) pairs that must each give an error cell; bind(args) turns the arguments
    into what is typed (tables into cell references for a function that takes ranges)."""
    name, args, good = name or fn["name"], fn["args"], case["good"]
    out = []
    required = sum(1 for a in args if "default" not in a)
    for i, arg in enumerate(args):
        values = list(GENERIC_BAD)
        if arg["kind"] == "raw":  # passed on whole: CALL_CHECK's arguments are checked by its callee
            continue
        if arg["kind"] == "gauge":  # "1" is a valid gauge written as text
            values = [v for v in values if v[0] != "number as text"]
        if "default" not in arg:
            values.append(("left empty", ""))
        values += [(f"specific {v}", v) for v in case.get("bad", {}).get(i, [])]
        for label, value in values:
            substituted = list(good)
            substituted[i] = value
            out.append((f"{arg['name']}: {label}", call(name, bind(substituted)), arg["name"]))
    for k in range(required):
        out.append((f"call cut short after {k} arguments", call(name, bind(good[:k])), None))
    for bad in case.get("bad_calls", []):
        out.append(("bad call", call(name, bind(bad)), None))
    return out


def words_of(arg_name):
    """How a reason may name an argument: its name, its words ("innerRadius": "inner radius"),
    or its last word ("radius")."""
    words = "".join(" " + c.lower() if c.isupper() else c for c in arg_name.rstrip("0123456789")).split()
    names = {arg_name.lower(), " ".join(words), words[-1], words[-1].rstrip("s")}
    if arg_name.rstrip("0") in ("x", "y", "z", "r"):
        names.add("point")  # a coordinate: the reason may speak of the point
    if arg_name in ("coils", "set"):
        names.update(("row", "table", "column"))  # a table: the reason names the row or the shape
    return names


def reason_formula(formula):
    """The CALL_CHECK formula for a call typed as =NAME(args)."""
    name, rest = formula[1:].split("(", 1)
    return f'=CALL_CHECK("{name}"' + (";" + rest if rest != ")" else ")")


def table_mutations(table):
    """Wrong-shape and non-numeric variants of a valid inline-array table."""
    rows = [list(r) for r in table]
    out = []
    if len(rows[0]) > 1:
        out.append(("a column too few", [r[:-1] for r in rows]))
    out.append(("a column too many", [r + ["1"] for r in rows]))
    text_cell = [list(r) for r in rows]
    text_cell[0][0] = '"x"'
    out.append(("text in a row", text_cell))
    out.append(("a text row added", rows + [['"x"'] * len(rows[0])]))
    return [(label, "{" + "|".join(";".join(r) for r in m) + "}") for label, m in out]


class BadInputMatrix(CalcTestCase):
    @classmethod
    def setUpClass(cls):
        cls.catalogue = {fn["name"]: fn for fn in load_catalogue(IDL_DIR)["function"]}
        cls.cases = load_cases()
        super().setUpClass()

    # --- helpers ------------------------------------------------------------------------------
    def new_sheet(self, name):
        sheets = self.doc.Sheets
        sheets.insertNewByName(name, sheets.getCount())
        sheet = sheets.getByName(name)
        sheet.getCellRangeByName(ERROR_CELL).setFormula("=1/0")
        sheet.getCellRangeByName(ERROR_CELL_NA).setFormula("=NA()")
        return sheet

    def put_formulas(self, sheet, column, formulas):
        """All formulas into one column with a single API call: one recalculation."""
        if not formulas:
            return
        rng = sheet.getCellRangeByPosition(column, 0, column, len(formulas) - 1)
        rng.setFormulaArray(tuple((f,) for f in formulas))

    @staticmethod
    def outcome(cell):
        kind = cell.getPropertyValue("FormulaResultType2")
        if kind == RESULT_ERROR or cell.getError():
            return ("error", cell.getError())
        if kind == RESULT_STRING:
            return ("text", cell.getString())
        return ("number", cell.getValue())

    def check_good(self, fn, case, outcome, formula):
        want = "text" if case.get("text") else "number"
        self.assertEqual(outcome[0], want, f"{formula} gave {outcome}")
        if want == "number":
            self.assertTrue(math.isfinite(outcome[1]), f"{formula} gave {outcome}")

    # --- the catalogue is fully covered ---------------------------------------------------------
    def test_every_catalogue_function_has_bad_input_cases(self):
        missing = sorted(set(self.catalogue) - set(self.cases))
        self.assertEqual(missing, [], "catalogue functions without tests/e2e/bad_inputs/ cases")
        stale = sorted(set(self.cases) - set(self.catalogue))
        self.assertEqual(stale, [], "bad-input cases for functions not in the catalogue")
        for name, case in self.cases.items():
            n = len(self.catalogue[name]["args"])
            self.assertEqual(len(case["good"]), n, f"{name}: 'good' must give all {n} arguments")
            for i in case.get("bad", {}):
                self.assertTrue(0 <= i < n, f"{name}: bad argument index {i}")
            for bad in case.get("bad_calls", []):
                self.assertLessEqual(len(bad), n, f"{name}: bad call {bad} has too many arguments")

    # --- every function, every argument, scalar bad values -------------------------------------
    def test_every_bad_value_of_every_argument_is_an_error_cell(self):
        total = 0
        start = time.time()
        for name, fn, by_reference in callables(self.catalogue):
            case = self.cases.get(fn["name"])
            if case is None:
                continue  # reported by test_every_catalogue_function_has_bad_input_cases
            with self.subTest(function=name):
                sheet = self.new_sheet(name)
                tables = TableCells(sheet)
                bind = lambda args: tables.bind(fn, by_reference, args)  # noqa: E731
                good = call(name, bind(case["good"]))
                variants = scalar_variants(fn, case, name, bind)
                self.put_formulas(sheet, 0, [good] + [f for _, f, _ in variants])
                explain = not case.get("text") and fn["name"] != "CALL_CHECK"
                if explain:
                    self.put_formulas(sheet, 2, [reason_formula(good)] + [reason_formula(f) for _, f, _ in variants])
                first = self.outcome(sheet.getCellByPosition(0, 0))
                self.check_good(fn, case, first, good)
                silent, unexplained = [], []
                for row, (label, formula, arg_name) in enumerate(variants, start=1):
                    got = self.outcome(sheet.getCellByPosition(0, row))
                    if got[0] != "error":
                        silent.append(f"{label}: {formula} gave {got}")
                    elif explain:
                        problem = self.reason_problem(got, self.outcome(sheet.getCellByPosition(2, row)), arg_name)
                        if problem:
                            unexplained.append(f"{label}: {formula}: {problem}")
                self.assertEqual(silent, [], f"{name}: bad input gave a value instead of an error cell")
                self.assertEqual(unexplained, [], f"{name}: CALL_CHECK does not explain the error")
                if explain:
                    self.assertTrue(self.outcome(sheet.getCellByPosition(2, 0))[1].startswith("OK: "))
                self.assertTrue(self.session.alive(), f"LibreOffice died on {name}")
                after = sheet.getCellByPosition(1, 0)
                after.setFormula(good)
                self.assertEqual(self.outcome(after), first, f"{name}: the valid call changed after bad ones")
                total += len(variants)
        print(f"\nbad-input matrix: {total} bad formulas over {len(list(callables(self.catalogue)))} functions "
              f"in {time.time() - start:.1f} s", flush=True)

    @staticmethod
    def reason_problem(error, reason, arg_name):
        """What is wrong with CALL_CHECK's reason for a call that gave `error`, or None."""
        if reason[0] == "error":
            # Calc refused CALL_CHECK's own arguments (an error value among them) before calling
            # the add-in, as it refused or passed on the failing call's.
            return None
        text = reason[1]
        if error[1] == 504:
            # Calc's own "error in the parameter list": it refused a value for a range argument
            # before calling the add-in. CALL_CHECK, which takes any value, gives its reason.
            return None if text and not text.startswith("OK") else f"reason {text!r} for Calc's Err:504"
        code = {502: "Err:502", 523: "Err:523", 519: "#VALUE!"}.get(error[1])
        if code is None:
            return f"the call gave {error}, which the add-in never returns"
        if not text.startswith(code + ": ") or len(text) < len(code) + 12:
            return f"reason {text!r} for {code}"
        if arg_name is not None and not any(w in text.lower() for w in words_of(arg_name)):
            return f"reason {text!r} does not name {arg_name}"
        return None

    # --- ranges: shapes, blanks, text, errors, tables ------------------------------------------
    def test_ranges_of_mismatched_shape_blanks_text_and_errors(self):
        for name, fn, by_reference in callables(self.catalogue):
            case = self.cases.get(fn["name"])
            if case is None:
                continue
            with self.subTest(function=name):
                sheet = self.new_sheet(name)
                tables = TableCells(sheet)
                self.check_ranges(sheet, fn, case, name, lambda args: tables.bind(fn, by_reference, args))

    def check_ranges(self, sheet, fn, case, name, bind):
        good = bind(case["good"])
        good_cell = sheet.getCellByPosition(0, 0)
        good_cell.setFormula(call(name, good))
        want = self.outcome(good_cell)
        numeric = [i for i, a in enumerate(fn["args"]) if a["kind"] not in ("table", "raw")]
        column = 2
        # Two numeric arguments as rows of 2 and 3 elements: shapes that do not broadcast.
        if len(numeric) >= 2 and not case.get("text"):
            i, j = numeric[-2], numeric[-1]
            args = list(good)
            args[i] = f"({{1;1}}*({good[i]}))"
            args[j] = f"({{1;1;1}}*({good[j]}))"
            rng = sheet.getCellRangeByPosition(column, 0, column + 2, 0)
            rng.setArrayFormula(call(name, args))
            for c in range(3):
                got = self.outcome(sheet.getCellByPosition(column + c, 0))
                self.assertEqual(got[0], "error", f"{name}: mismatched shapes gave {got} in element {c}")
        # A reference to a single blank cell is passed as 0 by Calc (as to its own functions):
        # the same outcome as typing 0, whatever that is.
        for i in numeric:
            for col, value in ((3, BLANK_CELL), (4, "0")):
                args = list(good)
                args[i] = value
                sheet.getCellByPosition(col, 2).setFormula(call(name, args))
            blank, zero = (self.outcome(sheet.getCellByPosition(col, 2)) for col in (3, 4))
            self.assertEqual(blank, zero, f"{name}: {fn['args'][i]['name']} as a blank cell and as 0")
        # Each numeric argument as a column holding the valid value, a blank, text and an error.
        # A function whose result has its own shape (an inductance matrix) takes single values
        # only: a range there must fail the whole call.
        column = 6
        if case.get("shaped"):
            for i in numeric:
                args = list(good)
                args[i] = f"({{1;1}}*({good[i]}))"
                c = sheet.getCellByPosition(column, 0)
                c.setFormula(call(name, args))
                self.assertEqual(self.outcome(c)[0], "error", f"{name}: a range for {fn['args'][i]['name']}")
            numeric = []
        for i in numeric:
            data_col, out_col = column, column + 1
            cells = [good[i], None, '"abc"', "=1/0"]
            for r, v in enumerate(cells):
                c = sheet.getCellByPosition(data_col, r)
                if v is not None:
                    c.setFormula(v if v.startswith("=") else "=" + v)
            ref = f"{column_name(data_col)}1:{column_name(data_col)}4"
            args = list(good)
            args[i] = ref
            sheet.getCellRangeByPosition(out_col, 0, out_col, 3).setArrayFormula(call(name, args))
            got = [self.outcome(sheet.getCellByPosition(out_col, r)) for r in range(4)]
            for r in (1, 2, 3):
                self.assertEqual(got[r][0], "error", f"{name}: {fn['args'][i]['name']} range element "
                                                     f"{cells[r]!r} gave {got[r]}")
            # The valid element is computed, or Calc refuses the whole range because of the error
            # cell in it (Err:504): never a different number.
            self.assertIn(got[0], (want, ("error", 504)), f"{name}: valid element of a range")
            # Without the error cell, the valid element must be computed and the others be errors.
            sheet.getCellByPosition(data_col, 3).setString("")
            got = [self.outcome(sheet.getCellByPosition(out_col, r)) for r in range(4)]
            self.assertEqual(got[0], want, f"{name}: valid element next to blank and text")
            self.assertTrue(all(g[0] == "error" for g in got[1:]), f"{name}: blank/text elements gave {got}")
            column += 2
        # Table arguments: wrong shapes and text rows are errors; a blank row is skipped.
        for i, arg in enumerate(fn["args"]):
            if arg["kind"] != "table":
                continue
            table = parse_inline_array(case["good"][i])
            self.assertIsNotNone(table, f"{name}: give the valid {arg['name']} as an inline array")
            for label, bad in table_mutations(table):
                args = list(good)
                args[i] = bind([a if k != i else bad for k, a in enumerate(case["good"])])[i]
                c = sheet.getCellByPosition(column, 0)
                c.setFormula(call(name, args))
                self.assert_rejected(c, case, want, f"{name}: table with {label}")
            # The same table typed into cells, with a blank row in the middle (skipped) ...
            top = 10
            rows = table[:1] + [None] + table[1:]
            for r, row in enumerate(rows):
                for k, v in enumerate(row or []):
                    sheet.getCellByPosition(column + k, top + r).setFormula("=" + v)
            ref = (f"{column_name(column)}{top + 1}:"
                   f"{column_name(column + len(table[0]) - 1)}{top + len(rows)}")
            args = list(good)
            args[i] = ref
            row_arg = case.get("table_row_arg")
            if row_arg is not None and float(good[row_arg]) >= 2:
                # Rows are numbered by position in the range: the blank row moves the later ones.
                args[row_arg] = repr(float(good[row_arg]) + 1)
            c = sheet.getCellByPosition(column, 0)
            c.setFormula(call(name, args))
            self.assertEqual(self.outcome(c), want, f"{name}: table with a blank row")
            # ... then a blank cell inside a row, then an error cell inside the table.
            sheet.getCellByPosition(column + 1, top).setString("")
            c.setFormula(call(name, args))
            self.assert_rejected(c, case, want, f"{name}: table with a blank cell in a row")
            sheet.getCellByPosition(column + 1, top).setFormula("=1/0")
            c.setFormula(call(name, args))
            self.assertEqual(self.outcome(c)[0], "error", f"{name}: table with an error cell")
            column += len(table[0]) + 1
        self.assertTrue(self.session.alive())

    def assert_rejected(self, cell, case, want, what):
        """A bad table gives an error cell; a function whose job is to explain tables in words
        ("text") gives a text that differs from its verdict on the good table instead."""
        got = self.outcome(cell)
        if case.get("text"):
            self.assertIn(got[0], ("error", "text"), f"{what}: {got}")
            self.assertNotEqual(got, want, f"{what}: the explanation equals the good table's")
        else:
            self.assertEqual(got[0], "error", f"{what}: {got}")

    # --- huge ranges: refused quickly or computed, never a hang --------------------------------
    def test_huge_broadcast_is_refused_quickly_for_every_function(self):
        # 3000 x 3000 = 9 million elements, over the 4 million limit: refused before any work.
        tables = TableCells(self.sheet)
        for name, fn, by_reference in callables(self.catalogue):
            case = self.cases.get(fn["name"])
            numeric = [i for i, a in enumerate(fn["args"]) if a["kind"] not in ("table", "raw")]
            if case is None or len(numeric) < 2 or case.get("text"):
                continue
            with self.subTest(function=name):
                i, j = numeric[-2], numeric[-1]
                args = tables.bind(fn, by_reference, case["good"])
                args[i] = f"(({args[i]})+0*ROW($A$1:$A$3000))"
                args[j] = f"(({args[j]})+0*TRANSPOSE(ROW($A$1:$A$3000)))"
                c = self.cell("A1")
                start = time.time()
                c.setFormula(f"=SUMPRODUCT({call(name, args)[1:]})")
                self.assertEqual(self.outcome(c)[0], "error", f"{name}: 9 million elements")
                elapsed = time.time() - start
                self.assertLess(elapsed, 10.0, f"{name}: refusing took {elapsed:.1f} s")
                print(f"\n{name}: 3000 x 3000 broadcast refused in {elapsed:.3f} s", end="", flush=True)

    def test_million_row_z_column_is_computed(self):
        # A real 1,000,000-row column of z values (filled by Calc itself), one array formula.
        from com.sun.star.sheet.FillDirection import TO_BOTTOM
        from com.sun.star.sheet.FillMode import LINEAR
        from com.sun.star.sheet.FillDateMode import FILL_DATE_DAY
        n = 1_000_000
        self.cell("A1").setValue(0.0)
        start = time.time()
        self.cell(f"A1:A{n}").fillSeries(TO_BOTTOM, LINEAR, FILL_DATE_DAY, 1e-6, 10.0)
        self.assertAlmostEqual(self.cell(f"A{n}").getValue(), (n - 1) * 1e-6, places=9)
        fill = time.time() - start
        start = time.time()
        c = self.formula("C1", f"=SUMPRODUCT(LOOP_BZ(0.1;10;2;A1:A{n}))")
        self.assertEqual(c.getError(), 0)
        elapsed = time.time() - start
        # On-axis closed form mu0 N I a^2 / (2 (a^2 + z^2)^(3/2)) (Griffiths; Jackson 5.5), summed.
        mu0, a = 1.25663706127e-6, 0.1
        want = math.fsum(mu0 * 20 * a * a / (2 * (a * a + (k * 1e-6) ** 2) ** 1.5) for k in range(n))
        self.assert_rel(c.getValue(), want, 1e-12, "sum over a million rows")
        print(f"\nmillion-row column: filled in {fill:.2f} s, computed in {elapsed:.2f} s", flush=True)
        self.assertLess(elapsed, 60.0)
        # A whole-column reference (1,048,576 rows, the blank ones errors) is computed or refused,
        # not a hang.
        start = time.time()
        c = self.formula("D1", "=SUMPRODUCT(ISERROR(LOOP_BZ(0.1;10;2;A:A)))")
        self.assertLess(time.time() - start, 60.0)
        self.assertEqual(c.getValue(), 1_048_576 - n)  # exactly the blank rows
        self.assertTrue(self.session.alive())


class CaseHelpers(unittest.TestCase):
    """The runner's own helpers, checked without LibreOffice."""

    def test_inline_array_mutations(self):
        table = parse_inline_array("{0.1;0.1;0;0;10;1|0.2;0.2;0.1;0;5;1}")
        self.assertEqual(len(table), 2)
        self.assertEqual(len(table[0]), 6)
        labels = dict(table_mutations(table))
        self.assertEqual(labels["a column too few"], "{0.1;0.1;0;0;10|0.2;0.2;0.1;0;5}")
        self.assertTrue(labels["a text row added"].endswith('|"x";"x";"x";"x";"x";"x"}'))
        self.assertIsNone(parse_inline_array("A1:F3"))

    def test_column_names(self):
        self.assertEqual([column_name(i) for i in (0, 25, 26, 1023)], ["A", "Z", "AA", "AMJ"])

    def test_variants_cover_every_argument(self):
        fn = {"name": "F", "args": [{"name": "x", "kind": "number"}, {"name": "y", "kind": "number", "default": 0}]}
        variants = scalar_variants(fn, {"good": ["1", "2"], "bad": {0: ["-1"]}})
        labels = [label for label, _, _ in variants]
        self.assertIn("x: left empty", labels)
        self.assertNotIn("y: left empty", labels)  # optional: empty means the default
        self.assertIn("x: specific -1", labels)
        self.assertIn("call cut short after 0 arguments", labels)
        self.assertEqual(sum(label.startswith("y: ") for label in labels), len(GENERIC_BAD))


if __name__ == "__main__":
    unittest.main()
