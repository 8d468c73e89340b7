"""Printed example workbooks show every label, unit and number whole.

Each sheets/*.ods is recalculated in Calc with the add-in and exported to PDF as a user would
print it; the PDF's text (pdftotext from poppler-utils, -layout: the printed lines) must hold
the displayed text of every non-empty cell of every sheet as whole words: a label clipped by the
next cell ("W/(m^2 K" for "W/(m^2 K)"), a header run into its neighbour ("centre z (m)turns")
or a text cut at the edge of the printed area fails, and so does a number too wide for its
column (Calc prints it as ###). Wrapped cells break over lines, so their words are checked
one by one.
"""
import pathlib
import re
import shutil
import subprocess
import sys
import tempfile
import unittest

import uno

ROOT = pathlib.Path(__file__).resolve().parents[2]
sys.path.insert(0, str(ROOT / "tools"))

from calc_session import cell_name, props, used_cells  # noqa: E402
from e2e_support import CalcSessionTestCase  # noqa: E402

WORKBOOKS = sorted((ROOT / "sheets").glob("*.ods"))
EMPTY = uno.Enum("com.sun.star.table.CellContentType", "EMPTY")


def flat(text):
    return " ".join(text.split())


def printed_cells(doc):
    """(sheet, cell name, displayed text, wrapped) of every non-empty cell."""
    for sheet, cell in used_cells(doc):
        if cell.getType() == EMPTY:
            continue
        shown = flat(cell.getString())
        if shown:
            yield sheet.Name, cell_name(cell), shown, bool(cell.IsTextWrapped)

def missing_labels(cells, pdf_text):
    """The cells whose displayed text the printed text lacks as whole words."""
    printed = flat(pdf_text)
    words = set(printed.split())
    missing = []
    for sheet, name, shown, wrapped in cells:
        if wrapped:
            whole = all(word in words for word in shown.split())
        else:
            whole = re.search(r"(?<!\S)" + re.escape(shown) + r"(?!\S)", printed) is not None
        if not whole:
            missing.append(f"{sheet}.{name}: {shown!r}")
    return missing


class MissingLabels(unittest.TestCase):
    """The check itself, on made-up printed text: it can fail."""

    def test_clipped_unit_run_together_header_and_hash_marks_are_found(self):
        cells = [("S", "C15", "W/(m^2 K)", False), ("S", "I5", "centre z (m)", False),
                 ("S", "J5", "turns", False), ("S", "B4", "0.5000", False),
                 ("S", "D2", "a wrapped note", True)]
        printed = "10.0 W/(m^2 Kstill air\ncentre z (m)turns current (A)\n###\nnote wrapped\na"
        self.assertEqual(missing_labels(cells, printed),
                         ["S.C15: 'W/(m^2 K)'", "S.I5: 'centre z (m)'", "S.J5: 'turns'", "S.B4: '0.5000'"])
        self.assertEqual(missing_labels(cells, "W/(m^2 K) centre z (m) turns 0.5000 a note wrapped"), [])


@unittest.skipUnless(shutil.which("pdftotext"), "pdftotext (poppler-utils) is needed")
class PrintedLabels(CalcSessionTestCase):
    def test_every_cell_prints_whole(self):
        self.assertGreaterEqual(len(WORKBOOKS), 1)
        with tempfile.TemporaryDirectory() as tmp:
            for path in WORKBOOKS:
                with self.subTest(workbook=path.name):
                    doc = self.session.open_document(path)
                    try:
                        doc.calculateAll()
                        pdf = pathlib.Path(tmp) / f"{path.stem}.pdf"
                        doc.storeToURL(uno.systemPathToFileUrl(str(pdf)), props(FilterName="calc_pdf_Export"))
                        cells = list(printed_cells(doc))
                    finally:
                        doc.close(True)
                    text = subprocess.run(["pdftotext", "-layout", str(pdf), "-"], check=True,
                                          capture_output=True, text=True).stdout
                    self.assertGreater(len(cells), 20, path.name)
                    self.assertNotIn("###", text, f"{path.name}: a number too wide for its column")
                    self.assertEqual(missing_labels(cells, text), [], f"{path.name}: cut in print")


if __name__ == "__main__":
    unittest.main()
