"""The example workbooks in sheets/: current, reproducible from their sources, shareable.

- Saved values are not stale: the results cached in each .ods (read from its content.xml, so
  this does not depend on whether Calc recalculates on load) equal what Calc computes now.
- Each .ods is what its text source (sheets/src/NAME.py) builds: same inputs and formulas.
- The frozen share copy opens in a LibreOffice WITHOUT the add-in with no error cells and the
  same numbers, and its charts survive.
- The workbooks carry no macros.
"""
import math
import pathlib
import sys
import tempfile
import unittest
import zipfile

import uno

ROOT = pathlib.Path(__file__).resolve().parents[2]
sys.path.insert(0, str(ROOT / "tools"))

from calc_session import CalcSession  # noqa: E402
from e2e_support import CalcSessionTestCase  # noqa: E402
from ods_cells import read_cells  # noqa: E402
import build_workbooks  # noqa: E402
import share_workbook  # noqa: E402
from workbook_builder import Book  # noqa: E402

WORKBOOKS = sorted((ROOT / "sheets").glob("*.ods"))
FORMULA = uno.Enum("com.sun.star.table.CellContentType", "FORMULA")


def same_number(a, b, rel=1e-11, scale=0.0):
    """Equal within 1e-11 relative, plus 1e-14 of `scale` (the largest magnitude in the value's
    array block), plus 1e-20. Saved values carry 15 significant digits but at most 20 decimal
    places (LibreOffice 7.4 writes them in fixed notation: 2.03e-13 keeps 8 digits), and a table
    of B/B0 - 1 in ppm turns a last-bit change of the engine into a larger relative change near
    its zero; anything beyond these bounds is stale."""
    return a == b or abs(a - b) <= rel * max(abs(a), abs(b)) + 1e-14 * scale + 1e-20


def block_scales(cells):
    """Largest computed magnitude per array formula block."""
    scales = {}
    for cell in cells.values():
        if cell.block is not None and cell.value_type == "float":
            scales[cell.block] = max(scales.get(cell.block, 0.0), abs(float(cell.value)))
    return scales


def column_scales(cells):
    """Largest magnitude of computed numbers per (sheet, column): the scale a column's rounding
    errors are measured against (a shared copy stores 15 significant digits, and a native formula
    such as B/B0 - 1 turns that into an absolute error near zero)."""
    scales = {}
    for (sheet, _row, col), cell in cells.items():
        if cell.computed and cell.value_type == "float":
            key = (sheet, col)
            scales[key] = max(scales.get(key, 0.0), abs(float(cell.value)))
    return scales


def live_result(cell):
    """(kind, value) of a formula cell as Calc has it now."""
    if cell.getError():
        return "error", cell.getError()
    if cell.FormulaResultType2 == 2:
        return "string", cell.getString()
    return "float", cell.getValue()


class Workbooks(CalcSessionTestCase):
    def test_there_are_workbooks_and_sources_for_each(self):
        self.assertGreaterEqual(len(WORKBOOKS), 1)
        sources = {p.stem for p in (ROOT / "sheets" / "src").glob("*.py")}
        self.assertEqual({p.stem for p in WORKBOOKS}, sources)

    def test_saved_values_are_current(self):
        for path in WORKBOOKS:
            saved = read_cells(path)
            scales = block_scales(saved)
            doc = self.session.open_document(path)
            try:
                doc.calculateAll()
                checked = 0
                for (sheet_name, row, col), cell in saved.items():
                    if not cell.computed:
                        continue
                    live = doc.Sheets.getByName(sheet_name).getCellByPosition(col, row)
                    kind, value = live_result(live)
                    where = f"{path.name} {sheet_name} row {row + 1} col {col + 1}: {cell.formula or '(array)'}"
                    self.assertNotEqual(kind, "error", f"{where} is an error cell now")
                    if kind == "string":
                        self.assertEqual(cell.value, value, f"{where}: saved {cell.value!r}, now {value!r}")
                    else:
                        saved_value = float(cell.value)
                        self.assertTrue(same_number(saved_value, value, scale=scales.get(cell.block, 0.0)),
                                        f"{where}: saved {saved_value!r}, now {value!r} (stale?)")
                    checked += 1
                self.assertGreater(checked, 10, path.name)
            finally:
                doc.close(True)

    def test_workbooks_are_built_from_their_sources(self):
        with tempfile.TemporaryDirectory() as tmp:
            for path in WORKBOOKS:
                book = Book(self.session)
                build_workbooks.load_description(ROOT / "sheets" / "src" / f"{path.stem}.py").build(book)
                fresh_path = pathlib.Path(tmp) / path.name
                book.save(fresh_path)
                book.close()
                committed, fresh = read_cells(path), read_cells(fresh_path)
                self.assertEqual(set(committed), set(fresh), f"{path.name}: cells differ from its source")
                for key, cell in committed.items():
                    other = fresh[key]
                    self.assertEqual(cell.formula, other.formula, f"{path.name} {key}")
                    if not cell.computed:
                        self.assertEqual((cell.value_type, cell.value, cell.text),
                                         (other.value_type, other.value, other.text), f"{path.name} {key}")

    def test_share_copies_open_cleanly_without_the_addin(self):
        with tempfile.TemporaryDirectory() as tmp:
            for path in WORKBOOKS:
                doc = self.session.open_document(path)
                report = share_workbook.share_document(self.session, doc, pathlib.Path(tmp) / path.name)
                doc.close(True)
                self.assertGreater(report["FrozenCells"], 0, path.name)
                self.assertEqual(list(report["Warnings"]), [], path.name)
            # A second LibreOffice without the extension, as a colleague would have.
            with CalcSession(None) as bare:
                for path in WORKBOOKS:
                    expected = read_cells(path)
                    scales = column_scales(expected)
                    doc = bare.open_document(pathlib.Path(tmp) / path.name)
                    try:
                        doc.calculateAll()
                        charts = sum(sheet.Charts.getCount() for sheet in doc.Sheets)
                        self.assertGreaterEqual(charts, 1, f"{path.name}: the charts survive")
                        for (sheet_name, row, col), cell in expected.items():
                            live = doc.Sheets.getByName(sheet_name).getCellByPosition(col, row)
                            self.assertEqual(live.getError(), 0, f"{path.name} {sheet_name} {row + 1},{col + 1}")
                            if cell.computed and cell.value_type == "float":
                                want, got = float(cell.value), live.getValue()
                                self.assertLessEqual(abs(want - got), 1e-11 * scales[(sheet_name, col)],
                                                     f"{path.name} {sheet_name} {row + 1},{col + 1}: {want} {got}")
                    finally:
                        doc.close(True)

    def test_workbooks_carry_no_macros(self):
        for path in WORKBOOKS:
            with zipfile.ZipFile(path) as z:
                names = z.namelist()
                self.assertFalse([n for n in names if n.startswith(("Basic/", "Scripts/"))], path.name)
                self.assertNotIn(b"script:event-listener", z.read("content.xml"), path.name)


if __name__ == "__main__":
    unittest.main()
